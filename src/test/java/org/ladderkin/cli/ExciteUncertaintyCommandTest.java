package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/** {@code excite} states how well ⟨N⟩ is known, from the calibration flags or the project's defaults. */
class ExciteUncertaintyCommandTest {

    @Test
    void jsonCarriesTheBudgetAndItsTotal() throws Exception {
        MainTest.Run r = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "--energy-uncertainty", "4%",
                "--radius-uncertainty", "3%", "--probe-radius-uncertainty", "10%", "--cross-section-uncertainty", "20%",
                "--format", "json"));
        assertThat(r.exit()).as(r.err()).isZero();
        JsonNode u = new ObjectMapper().readTree(r.out()).get("uncertainty");
        double total = 0;
        for (JsonNode item : u.get("budget")) {
            total += item.get("rel").asDouble() * item.get("rel").asDouble();
        }
        assertThat(u.get("nAvgProbeWeightedRel").asDouble()).isCloseTo(Math.sqrt(total), org.assertj.core.data.Offset.offset(1e-12));
        assertThat(u.get("budget").findValuesAsText("source"))
                .containsExactly("pulse energy", "pump radius", "probe radius", "cross-section σ");
        // pump 100 µm, probe 40 µm: the pump radius counts 2·100²/(100² + 40²) = 1.72 times its 3 %
        assertThat(u.get("budget").get(1).get("rel").asDouble()).isCloseTo(0.03 * 2 * 1e4 / (1e4 + 1600), org.assertj.core.data.Offset.offset(2e-3));
        // peak photon fluence: energy and pump radius (twice) only
        assertThat(u.get("photonFluencePeakRel").asDouble()).isCloseTo(Math.hypot(0.04, 0.06), org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void textPrintsNWithItsUncertaintyAndTheLargestContribution() {
        MainTest.Run r = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "--cross-section-uncertainty", "25%"));
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(r.out()).containsPattern("probe-weighted ⟨N⟩ [0-9.]+ ± [0-9.]+ %, largest: cross-section σ \\(25 %\\)");
        // without the flag σ counts with the uncertainty its law states (PbSe at 400 nm: the high-energy law)
        MainTest.Run defaults = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "--format", "json"));
        assertThat(defaults.out()).contains("\"source\" : \"cross-section σ\"");
    }

    @Test
    void anImpossibleUncertaintyIsOneLineOfBadInput() {
        MainTest.Run r = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "--energy-uncertainty", "120%"));
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("ladderkin: --energy-uncertainty: must be a relative uncertainty from 0 to below 100 %, was 120%");
    }
}
