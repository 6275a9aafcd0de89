package org.ladderkin.validation;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.sample.Matrix;
import org.ladderkin.units.PhysicalConstants;

/**
 * Every matrix of models/matrices against a reference: density, specific heat, thermal conductivity and boiling
 * point. The heat budget of the planner rests on ρ·c and κ, the boiling point on the tolerable rise.
 */
class MatrixHandbookValuesTest {

    private static final MaterialLibrary LIB = MaterialLibrary.fromHome();

    private static final String COOLPROP = "CoolProp 8.0.0 (git ae81610), PropsSI('D'|'C'|'L', 'T', 298.15, 'P', "
            + "101325, fluid) and PropsSI('T', 'P', 101325, 'Q', 0, fluid), evaluated outside the build; its fluids are "
            + "the reference equations of state of n-hexane (Thol et al., Fluid Phase Equilib. 2019), n-octane "
            + "(Beckmüller et al., Int. J. Thermophys. 2019) and toluene (Lemmon & Span, J. Chem. Eng. Data 2006) and "
            + "the thermal-conductivity correlations of Assael et al. (J. Phys. Chem. Ref. Data 2013, n-hexane; 2012, "
            + "toluene) and Huber et al. (Fluid Phase Equilib. 2005, n-octane)";

    private static double gPerCm3(Matrix m) {
        return m.densityKgPerM3().value() / 1e3;
    }

    private static double jPerGK(Matrix m) {
        return m.specificHeatJPerKgK().value() / 1e3;
    }

    private static double celsius(Matrix m) {
        return m.boilingPointK().value() - PhysicalConstants.CELSIUS_ZERO_K;
    }

    @Test
    @CheckedAgainst(source = COOLPROP, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void hydrocarbonSolventsAgainstTheReferenceEquationsOfState() {
        String[] keys = {"hexane", "octane", "toluene"};
        double[] densityGPerCm3 = {0.654854, 0.698577, 0.862238};
        double[] cpJPerGK = {2.272529, 2.227624, 1.701110};
        double[] kappaWPerMK = {0.119993, 0.124596, 0.130348};
        double[] boilingC = {68.7156, 125.6438, 110.5957};
        for (int i = 0; i < keys.length; i++) {
            Matrix m = LIB.matrix(keys[i]);
            // the library keeps three or four digits
            Reference.checkRelative(keys[i] + " density at 298.15 K (g/cm³)", gPerCm3(m), densityGPerCm3[i], 1e-3);
            Reference.checkRelative(keys[i] + " specific heat at 298.15 K (J/(g·K))", jPerGK(m), cpJPerGK[i], 3e-3);
            // the correlations' own uncertainty near 298 K is a few per cent
            Reference.checkRelative(keys[i] + " thermal conductivity at 298.15 K (W/(m·K))",
                    m.thermalConductivityWPerMK().value(), kappaWPerMK[i], 1e-2);
            Reference.check(keys[i] + " normal boiling point (°C)", celsius(m), boilingC[i], 0.05);
        }
    }

    @Test
    @CheckedAgainst(source = "Ewing & Ochoa, J. Chem. Thermodyn. 38, 283 (2006), abstract: from comparative ebulliometry "
            + "the normal boiling temperature of n-hexane is T_b = 341.866 K", kind = CheckedAgainst.Kind.PUBLISHED)
    void hexaneBoilingPointAgainstEbulliometry() {
        Reference.check("hexane normal boiling point (K)", LIB.matrix("hexane").boilingPointK().value(), 341.866, 0.05);
    }

    @Test
    @CheckedAgainst(source = "Great Soviet Encyclopedia, 3rd ed. (1970–1979), entry «Chloroform», read in a stored copy: "
            + "boiling point 61.15 °C, density 1.488 g/cm³ at 20 °C; the library's density is for 25 °C, and 1 % "
            + "covers the 5 K between them (about −0.0018 g cm⁻³ K⁻¹)", kind = CheckedAgainst.Kind.PUBLISHED)
    void chloroformAgainstTheEncyclopedia() {
        Matrix m = LIB.matrix("chloroform");
        Reference.check("chloroform boiling point (°C)", celsius(m), 61.15, 0.06);
        Reference.checkRelative("chloroform density, 25 °C vs 20 °C (g/cm³)", gPerCm3(m), 1.488, 0.01);
    }

    @Test
    @CheckedAgainst(source = "IARC Monographs on the Evaluation of Carcinogenic Risks to Humans, vol. 106 (2014), "
            + "Tetrachloroethylene, sec. 1.1.3 (after O'Neil et al., The Merck Index, 2006), read in a stored copy: "
            + "boiling point 121 °C, density 1.6230 at 20 °C; the boiling point is given to the degree, the library's "
            + "density is for 25 °C (1 % covers the 5 K)", kind = CheckedAgainst.Kind.PUBLISHED)
    void tetrachloroethyleneAgainstTheIarcMonograph() {
        Matrix m = LIB.matrix("tetrachloroethylene");
        Reference.check("tetrachloroethylene boiling point (°C)", celsius(m), 121.0, 0.5);
        Reference.checkRelative("tetrachloroethylene density, 25 °C vs 20 °C (g/cm³)", gPerCm3(m), 1.6230, 0.01);
    }

    @Test
    @CheckedAgainst(source = "PMMA property table read in a stored copy (matmake.com), citing Cardarelli, Materials "
            + "Handbook (Springer 2018) and the CRC Handbook of Chemistry and Physics, 97th ed. (2016): density "
            + "1180–1190 kg/m³, thermal conductivity 0.17–0.19 W/(m·K), specific heat 1450 J/(kg·K); the specific "
            + "heat of PMMA differs by grade (another stored table gives 1260), hence 3 %", kind = CheckedAgainst.Kind.PUBLISHED)
    void pmmaAgainstAHandbookTable() {
        Matrix m = LIB.matrix("pmma");
        // the table gives a range; the check asks for its mid-point within the half-width, plus rounding
        Reference.check("PMMA density, in 1.18–1.19 (g/cm³)", gPerCm3(m), 1.185, 0.0051);
        Reference.check("PMMA thermal conductivity, in 0.17–0.19 (W/(m·K))", m.thermalConductivityWPerMK().value(), 0.18, 0.0101);
        Reference.checkRelative("PMMA specific heat (J/(g·K))", jPerGK(m), 1.45, 0.03);
    }

    @Test
    @CheckedAgainst(source = "from memory: chloroform and tetrachloroethylene thermal conductivities 0.117 and 0.11 "
            + "W/(m·K), tetrachloroethylene specific heat 0.86 J/(g·K) (no table for either liquid's conductivity nor "
            + "for C₂Cl₄'s heat capacity is stored here; CoolProp does not carry these fluids)",
            kind = CheckedAgainst.Kind.FROM_MEMORY)
    void chlorinatedSolventConstantsWithoutAStoredSource() {
        Reference.checkRelative("chloroform thermal conductivity (W/(m·K))",
                LIB.matrix("chloroform").thermalConductivityWPerMK().value(), 0.117, 1e-9);
        Reference.checkRelative("tetrachloroethylene thermal conductivity (W/(m·K))",
                LIB.matrix("tetrachloroethylene").thermalConductivityWPerMK().value(), 0.11, 1e-9);
        Reference.checkRelative("tetrachloroethylene specific heat (J/(g·K))", jPerGK(LIB.matrix("tetrachloroethylene")),
                0.86, 1e-9);
    }
}
