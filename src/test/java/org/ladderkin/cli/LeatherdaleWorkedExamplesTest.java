package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Three calculations a user makes with the CdSe cross-section of Leatherdale et al. (2002), run end to end through
 * the {@code excite} command and redone here by hand. The law is the one read in the paper's abstract; the pulse,
 * spot, size and absorbance are ours, because no stored copy shows a worked case of the paper itself.
 */
class LeatherdaleWorkedExamplesTest {

    private static final String SOURCE = "Leatherdale, Woo, Mikulec, Bawendi, J. Phys. Chem. B 106, 7619 (2002), abstract: "
            + "C_abs(350 nm) = 5.501e5·a³ cm², a = radius in cm; worked here by hand for a 4 nm CdSe dot (a = 2 nm: "
            + "σ = 4.4008e-15 cm²) with the SI defining constants h, c, N_A (SI Brochure 2019)";

    // SI defining constants, typed here so the hand calculation shares nothing with the production code
    private static final double H = 6.62607015e-34;
    private static final double C = 299_792_458.0;
    private static final double NA = 6.02214076e23;

    private static final double SIGMA_CM2 = 5.501e5 * Math.pow(2e-7, 3);
    private static final double PHOTON_J = H * C / 350e-9;

    private static JsonNode excite(String... extra) throws Exception {
        String[] base = {"excite", "--material", "CdSe", "--diameter", "4nm", "--pump", "350nm", "--rep-rate", "1kHz",
            "--pump-radius", "100um", "--probe-radius", "40um", "--no-depth-average", "--format", "json"};
        String[] all = ExciteCommandTest.with(base, extra);
        MainTest.Run r = MainTest.run(all);
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        return new ObjectMapper().readTree(r.out());
    }

    @Test
    @CheckedAgainst(source = SOURCE + ": ⟨N⟩₀ = σ·2E/(πw²)/(hc/λ) for E = 50 nJ, w = 100 µm", kind = CheckedAgainst.Kind.PUBLISHED)
    void pulseEnergySpotAndCrossSectionGiveTheOnAxisOccupancy() throws Exception {
        JsonNode j = excite("--energy", "50nJ", "--concentration", "1uM", "--path", "1mm");
        double wCm = 100e-4;
        double photonsPerCm2 = 2 * 50e-9 / (Math.PI * wCm * wCm) / PHOTON_J;
        Reference.checkRelative("excite: σ(350 nm) of a 4 nm CdSe dot (cm²)", j.get("crossSectionCm2").asDouble(), SIGMA_CM2, 1e-9);
        Reference.checkRelative("excite: on-axis ⟨N⟩ for 50 nJ in w = 100 µm at 350 nm", j.get("nAvgPeak").asDouble(),
                SIGMA_CM2 * photonsPerCm2, 1e-9);
    }

    @Test
    @CheckedAgainst(source = SOURCE + ": E(⟨N⟩₀ = 1) = πw²·(hc/λ)/(2σ) for w = 100 µm", kind = CheckedAgainst.Kind.PUBLISHED)
    void targetOccupancyGivesThePulseEnergy() throws Exception {
        JsonNode j = excite("--energy", "50nJ", "--concentration", "1uM", "--path", "1mm", "--target-n", "1");
        double wCm = 100e-4;
        Reference.checkRelative("excite: pulse energy for on-axis ⟨N⟩ = 1 (J)", j.get("pulseEnergyForTargetJ").asDouble(),
                Math.PI * wCm * wCm * PHOTON_J / (2 * SIGMA_CM2), 1e-9);
    }

    @Test
    @CheckedAgainst(source = SOURCE + ": c = A/(ε·l) with ε = σ·N_A/(1000·ln10) M⁻¹cm⁻¹, for A(350 nm) = 0.2 over 1 cm",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void absorbanceAndSizeGiveTheConcentration() throws Exception {
        JsonNode j = excite("--energy", "50nJ", "--od", "0.2", "--od-at", "350nm", "--path", "10mm");
        double epsilonPerMPerCm = SIGMA_CM2 * NA / (1000 * Math.log(10));
        Reference.checkRelative("excite: ε(350 nm) of a 4 nm CdSe dot (M⁻¹cm⁻¹)", j.get("extinctionPerMPerCm").asDouble(),
                epsilonPerMPerCm, 1e-9);
        Reference.checkRelative("excite: concentration from A(350 nm) = 0.2 over 1 cm (µM)",
                j.get("sample").get("concentrationMicroMolar").asDouble(), 0.2 / (epsilonPerMPerCm * 1.0) * 1e6, 1e-9);
    }
}
