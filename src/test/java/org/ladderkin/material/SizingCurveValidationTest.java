package org.ladderkin.material;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * The sizing curves shipped in models/materials, evaluated through the library, against the published formulas typed
 * here independently. The formulas are recalled (quoted by secondary sources; the papers' equations are not stored
 * here, only their abstracts), hence FROM_MEMORY: one row per recalled formula, the largest deviation over its sizes,
 * since the sizes test one remembered source, not three.
 */
class SizingCurveValidationTest {

    private static final double EV = PhysicalConstants.ELECTRONVOLT_J;

    private static final String YU_UNREAD = "the paper's equations are not readable here: only its first page is "
            + "stored; the same polynomials appear in public repositories that transcribe the paper, used as hints, "
            + "not sources";
    private static final String MOREELS_UNREAD = "quoted by secondary sources; from memory: only the abstract is "
            + "stored here, which states no equation";

    private static SizingCurve curve(String key) {
        return MaterialLibrary.fromHome().material(key).sizing().orElseThrow();
    }

    /** Yu 2003 CdSe: D(nm) = 1.6122e-9 λ⁴ − 2.6575e-6 λ³ + 1.6242e-3 λ² − 0.4277 λ + 41.57, λ in nm. */
    private static double yuCdSeNm(double lambdaNm) {
        double l = lambdaNm;
        return 1.6122e-9 * l * l * l * l - 2.6575e-6 * l * l * l + 1.6242e-3 * l * l - 0.4277 * l + 41.57;
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003): CdSe D = 1.6122e-9 λ⁴ − 2.6575e-6 λ³ "
            + "+ 1.6242e-3 λ² − 0.4277 λ + 41.57 (from memory: " + YU_UNREAD + ")", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void cdseYuCurveAtThreeSizes() {
        SizingCurve c = curve("CdSe");
        double worst = 0;
        for (double lambdaNm : new double[] {500, 550, 620}) {
            double dNm = c.diameterM(Photon.energyJ(lambdaNm * 1e-9)) * 1e9;
            worst = Math.max(worst, Math.abs(dNm / yuCdSeNm(lambdaNm) - 1));
        }
        Reference.check("CdSe diameter: largest relative deviation from the recalled curve at 500, 550, 620 nm peaks", worst,
                0, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., ACS Nano 3, 3023 (2009): PbS E₀ = 0.41 + 1/(0.0252 d² + 0.283 d) eV "
            + "(" + MOREELS_UNREAD + ")", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void pbsMoreelsCurveAtThreeSizes() {
        SizingCurve c = curve("PbS");
        double worst = 0;
        for (double d : new double[] {3.5, 5, 8}) {
            double ref = 0.41 + 1 / (0.0252 * d * d + 0.283 * d);
            worst = Math.max(worst, Math.abs(c.firstExcitonEnergyJ(d * 1e-9) / EV / ref - 1));
        }
        Reference.check("PbS first-exciton energy: largest relative deviation from the recalled curve at 3.5, 5, 8 nm", worst,
                0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., Chem. Mater. 19, 6101 (2007): PbSe E₀ = 0.278 + 1/(0.016 d² + 0.209 d + 0.45) eV "
            + "(" + MOREELS_UNREAD + ")", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void pbseMoreelsCurveAtThreeSizes() {
        SizingCurve c = curve("PbSe");
        double worst = 0;
        for (double d : new double[] {3.5, 5, 8}) {
            double ref = 0.278 + 1 / (0.016 * d * d + 0.209 * d + 0.45);
            worst = Math.max(worst, Math.abs(c.firstExcitonEnergyJ(d * 1e-9) / EV / ref - 1));
        }
        Reference.check("PbSe first-exciton energy: largest relative deviation from the recalled curve at 3.5, 5, 8 nm", worst,
                0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003): CdTe D = 9.8127e-7 λ³ − 1.7147e-3 λ² "
            + "+ 1.0064 λ − 194.84 (from memory: " + YU_UNREAD + ")", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void cdteYuCurveAtThreeSizes() {
        double worst = 0;
        for (double l : new double[] {550, 600, 650}) {
            double d = curve("CdTe").diameterM(Photon.energyJ(l * 1e-9)) * 1e9;
            double ref = 9.8127e-7 * l * l * l - 1.7147e-3 * l * l + 1.0064 * l - 194.84;
            worst = Math.max(worst, Math.abs(d / ref - 1));
        }
        Reference.check("CdTe diameter: largest relative deviation from the recalled curve at 550, 600, 650 nm peaks",
                worst, 0, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003): CdS D = −6.6521e-8 λ³ + 1.9557e-4 λ² "
            + "− 9.2352e-2 λ + 13.29 (from memory: " + YU_UNREAD + ")", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void cdsYuCurveAtThreeSizes() {
        double worst = 0;
        for (double l : new double[] {380, 410, 440}) {
            double d = curve("CdS").diameterM(Photon.energyJ(l * 1e-9)) * 1e9;
            double ref = -6.6521e-8 * l * l * l + 1.9557e-4 * l * l - 9.2352e-2 * l + 13.29;
            worst = Math.max(worst, Math.abs(d / ref - 1));
        }
        Reference.check("CdS diameter: largest relative deviation from the recalled curve at 380, 410, 440 nm peaks",
                worst, 0, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "derived: each curve's inverse (size from energy) must return the size its forward form "
            + "(energy from size) was given; checked on the library's own curves, whatever their coefficients",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void inversesReturnTheSizeGiven() {
        SizingCurve cdse = curve("CdSe");
        Reference.checkRelative("CdSe first-exciton peak back from the diameter of a 580 nm dot (nm)",
                Photon.wavelengthM(cdse.firstExcitonEnergyJ(cdse.diameterM(Photon.energyJ(580e-9)))) * 1e9, 580, 1e-9);
        for (String key : new String[] {"PbS", "PbSe"}) {
            SizingCurve c = curve(key);
            for (double d : new double[] {3.5, 5, 8}) {
                Reference.checkRelative(key + " diameter back from the first-exciton energy of a " + d + " nm dot (nm)",
                        c.diameterM(c.firstExcitonEnergyJ(d * 1e-9)) * 1e9, d, 1e-9);
            }
        }
    }
}
