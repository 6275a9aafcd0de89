package org.ladderkin.material;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.units.Photon;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Size trends of the library's absorption laws and Auger constants against what the papers' abstracts state in
 * words and numbers. The local exponent d ln ε / d ln d is taken by a central difference on the library's own law,
 * so a law replaced by a table or a different form is still held to the published trend.
 */
class PublishedSizeTrendsTest {

    private static final double STEP = 1e-4;

    private static Material material(String key) {
        return MaterialLibrary.fromHome().material(key);
    }

    private static double localExponent(AbsorptionLaw law, double sizeM) {
        double up = Math.log(law.crossSectionM2At(sizeM * (1 + STEP)));
        double down = Math.log(law.crossSectionM2At(sizeM * (1 - STEP)));
        return (up - down) / (Math.log(1 + STEP) - Math.log(1 - STEP));
    }

    /** Sizes of the dots whose first-exciton peaks are at the given wavelengths, by the library's sizing curve. */
    private static double[] sizesAtPeaksM(Material m, double... peaksNm) {
        SizingCurve c = m.sizing().orElseThrow();
        double[] out = new double[peaksNm.length];
        for (int i = 0; i < peaksNm.length; i++) {
            out[i] = c.diameterM(Photon.energyJ(peaksNm[i] * 1e-9));
        }
        return out;
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003), abstract: ε at the first excitonic "
            + "absorption peak of CdTe, CdSe and CdS nanocrystals depends on size \"between a square and a cubic "
            + "dependence\", i.e. local exponent in [2, 3]; checked at three first-peak wavelengths inside each curve's range",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void yuFirstExcitonExtinctionGrowsBetweenSquareAndCube() {
        String[] keys = {"CdTe", "CdSe", "CdS"};
        double[][] peaksNm = {{520, 600, 700}, {480, 550, 620}, {340, 400, 450}};
        for (int k = 0; k < keys.length; k++) {
            Material m = material(keys[k]);
            AbsorptionLaw law = m.firstExcitonAbsorption().orElseThrow();
            double[] sizes = sizesAtPeaksM(m, peaksNm[k]);
            for (int i = 0; i < sizes.length; i++) {
                Reference.check(keys[k] + " d ln ε₁S / d ln D at a " + (int) peaksNm[k][i] + " nm peak (D = "
                        + String.format(java.util.Locale.ROOT, "%.2f", sizes[i] * 1e9) + " nm)",
                        localExponent(law, sizes[i]), 2.5, 0.5);
            }
        }
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., ACS Nano 3, 3023 (2009), abstract: at high energies the molar extinction "
            + "coefficient of PbS dots increases with the dot volume d³", kind = CheckedAgainst.Kind.PUBLISHED)
    void pbsHighEnergyExtinctionScalesWithVolume() {
        AbsorptionLaw law = material("PbS").highEnergyAbsorption().orElseThrow();
        for (double dNm : new double[] {3, 5, 8}) {
            Reference.check("PbS d ln ε(400 nm) / d ln d at d = " + dNm + " nm", localExponent(law, dNm * 1e-9), 3, 1e-6);
        }
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., Chem. Mater. 19, 6101 (2007), abstract: at high photon energies ε of PbSe "
            + "dots scales with the nanocrystal volume, irrespective of size", kind = CheckedAgainst.Kind.PUBLISHED)
    void pbseHighEnergyExtinctionScalesWithVolume() {
        AbsorptionLaw law = material("PbSe").highEnergyAbsorption().orElseThrow();
        for (double dNm : new double[] {3, 5, 8}) {
            Reference.check("PbSe d ln ε(400 nm) / d ln d at d = " + dNm + " nm", localExponent(law, dNm * 1e-9), 3, 1e-6);
        }
    }

    @Test
    @CheckedAgainst(source = "Robel, Gresback, Kortshagen, Schaller, Klimov, Phys. Rev. Lett. 102, 177404 (2009), abstract: "
            + "Auger recombination rates of InAs, PbSe, CdSe and Ge nanocrystals converge, unlike the 4–5 orders of magnitude "
            + "between the bulk solids; the tolerance (one order of magnitude at equal size) is ours",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void cdseAndPbseAugerLifetimesConvergeAtEqualSize() {
        Material cdse = material("CdSe");
        Material pbse = material("PbSe");
        for (double dNm : new double[] {3, 5, 7}) {
            double ratio = cdse.biexcitonAugerLifetimeS(dNm * 1e-9) / pbse.biexcitonAugerLifetimeS(dNm * 1e-9);
            Reference.check("log10(τ₂ CdSe / τ₂ PbSe) at d = " + dNm + " nm", Math.log10(ratio), 0, 1);
        }
    }
}
