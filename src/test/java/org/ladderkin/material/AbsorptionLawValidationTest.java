package org.ladderkin.material;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Absorption laws shipped in models/materials against the published forms typed here independently. */
class AbsorptionLawValidationTest {

    private static Material material(String key) {
        return MaterialLibrary.fromHome().material(key);
    }

    /** ε in M⁻¹cm⁻¹ of a cross-section in m²: ε = σ·N_A/ln10, and 1 M⁻¹cm⁻¹ = 0.1 m²/mol. */
    private static double epsilonPerMPerCm(double sigmaM2) {
        return sigmaM2 * PhysicalConstants.AVOGADRO_PER_MOL / Math.log(10) * 10;
    }

    @Test
    @CheckedAgainst(source = "derived: Beer–Lambert, σ = 1000·ln10·ε/N_A, i.e. σ[cm²] = 3.8235e-21·ε[M⁻¹cm⁻¹]",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void crossSectionFromExtinction() {
        double sigmaCm2 = AbsorptionLaw.crossSectionM2(0.1) * 1e4; // ε = 1 M⁻¹cm⁻¹ = 0.1 m²/mol
        Reference.checkRelative("σ of ε = 1 M⁻¹cm⁻¹ (cm²)", sigmaCm2, 3.8235e-21, 2e-5);
        Reference.checkRelative("σ of ε = 1 M⁻¹cm⁻¹, exact (cm²)", sigmaCm2, 1000 * Math.log(10) / 6.02214076e23, 1e-14);
        Reference.checkRelative("ε back from σ = 3.8235e-16 cm² (M⁻¹cm⁻¹)", epsilonPerMPerCm(3.8235e-20), 1e5, 2e-5);
    }

    @Test
    @CheckedAgainst(source = "Leatherdale, Woo, Mikulec, Bawendi, J. Phys. Chem. B 106, 7619 (2002), abstract: "
            + "σ(350 nm) = 5.501e5·a³ cm², a = radius in cm", kind = CheckedAgainst.Kind.PUBLISHED)
    void cdseLeatherdaleCrossSectionAt350nm() {
        AbsorptionLaw law = material("CdSe").highEnergyAbsorption().orElseThrow();
        Reference.check("CdSe law wavelength (nm)", law.wavelengthM() * 1e9, 350, 1e-9);
        for (double aNm : new double[] {1.5, 2.0, 3.0}) {
            double aCm = aNm * 1e-7;
            Reference.checkRelative("CdSe σ(350 nm) of radius " + aNm + " nm (cm²)", law.crossSectionM2At(2 * aNm * 1e-9) * 1e4,
                    5.501e5 * aCm * aCm * aCm, 1e-12);
        }
    }

    @Test
    @CheckedAgainst(source = "Yu, Qu, Guo, Peng, Chem. Mater. 15, 2854 (2003): CdSe ε(first exciton) = 5857·D^2.65 M⁻¹cm⁻¹ "
            + "(quoted by secondary sources; from memory: only the abstract is stored here, whose square-to-cubic trend "
            + "PublishedSizeTrendsTest checks)", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void cdseYuExtinctionAtFirstExciton() {
        AbsorptionLaw law = material("CdSe").firstExcitonAbsorption().orElseThrow();
        double worst = 0;
        for (double d : new double[] {2.5, 3.5, 5.0}) {
            worst = Math.max(worst, Math.abs(epsilonPerMPerCm(law.crossSectionM2At(d * 1e-9)) / (5857 * Math.pow(d, 2.65)) - 1));
        }
        Reference.check("CdSe ε(first exciton): largest relative deviation from the recalled law at 2.5, 3.5, 5 nm", worst, 0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., ACS Nano 3, 3023 (2009): PbS ε(400 nm) = 0.0233·d³ µM⁻¹cm⁻¹ (coefficient "
            + "quoted by secondary sources, from memory: the paper's table is not stored here; the d³ scaling of the "
            + "abstract is checked in PublishedSizeTrendsTest)", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void pbsMoreelsExtinctionAt400nm() {
        AbsorptionLaw law = material("PbS").highEnergyAbsorption().orElseThrow();
        double worst = 0;
        for (double d : new double[] {3.0, 5.0, 8.0}) {
            worst = Math.max(worst, Math.abs(epsilonPerMPerCm(law.crossSectionM2At(d * 1e-9)) / (0.0233 * d * d * d * 1e6) - 1));
        }
        Reference.check("PbS ε(400 nm): largest relative deviation from the recalled law at 3, 5, 8 nm", worst, 0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Moreels et al., Chem. Mater. 19, 6101 (2007): PbSe ε(400 nm) = 0.0277·d³ µM⁻¹cm⁻¹ "
            + "(quoted by secondary sources; from memory: the paper's table is not stored here; the volume scaling of the "
            + "abstract is checked in PublishedSizeTrendsTest)", kind = CheckedAgainst.Kind.FROM_MEMORY)
    void pbseMoreelsExtinctionAt400nm() {
        AbsorptionLaw law = material("PbSe").highEnergyAbsorption().orElseThrow();
        double worst = 0;
        for (double d : new double[] {3.0, 5.0, 8.0}) {
            worst = Math.max(worst, Math.abs(epsilonPerMPerCm(law.crossSectionM2At(d * 1e-9)) / (0.0277 * d * d * d * 1e6) - 1));
        }
        Reference.check("PbSe ε(400 nm): largest relative deviation from the recalled law at 3, 5, 8 nm", worst, 0, 1e-12);
    }
}
