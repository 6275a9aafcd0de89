package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/**
 * The PbSe preset lists both charges while ionisation leaves only positive dots; the pulses to steady state used to
 * count the never-populated negative states (3681 for every ⟨N⟩). From the reachable states: 2635 at ⟨N⟩ = 1 and
 * 1677 at ⟨N⟩ = 3 (issue figures, from an independent computation), with the time beside them.
 */
class SimulatePulsesToSteadyStateTest {

    @Test
    void pbsePresetAt80MHzCountsReachableStatesOnly() throws Exception {
        MainTest.Run r = MainTest.run("simulate", MainTest.HOME.resolve("models/presets/pbse-5nm.model.json").toString(),
                "--rep-rate", "80MHz", "--nmax", "14", "--n-avg", "1,3", "--delays", "1ps", "--format", "json");
        assertThat(r.exit()).as(r.err()).isZero();
        JsonNode series = new ObjectMapper().readTree(r.out()).get("series");
        long atOne = series.get(0).get("steadyState").get("pulsesToWithinOnePercent").asLong();
        long atThree = series.get(1).get("steadyState").get("pulsesToWithinOnePercent").asLong();
        assertThat((double) atOne).isCloseTo(2635, org.assertj.core.data.Percentage.withPercentage(1));
        assertThat((double) atThree).isCloseTo(1677, org.assertj.core.data.Percentage.withPercentage(1));
        assertThat(series.get(0).get("steadyState").get("timeToWithinOnePercentS").asDouble())
                .isCloseTo(atOne / 80e6, org.assertj.core.data.Offset.offset(1e-15));
    }
}
