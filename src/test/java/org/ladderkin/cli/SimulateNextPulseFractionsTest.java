package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/** simulate names each fraction the next pulse finds by what it counts (docs/physics.md §10), never "residual". */
class SimulateNextPulseFractionsTest {

    @Test
    void excitedChargedAndEitherAreThreeSeparatelyNamedFractions() throws Exception {
        // a slowly neutralised, often ionised sample at 1 MHz: most dots charged, few still excited after 1 µs
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--n-avg", "3",
                "--charges", "negative", "--tau-trion-negative", "200ps", "--ionisation-probability", "0.05",
                "--tau-neutralisation", "1ms", "--rep-rate", "1MHz", "--delays", "1ps", "--format", "json");
        assertThat(r.err()).isEmpty();
        JsonNode ss = new ObjectMapper().readTree(r.out()).at("/series/0/steadyState");
        assertThat(ss.has("residualExcitedFractionAtNextPulse")).as("the misreadable name is gone").isFalse();
        double excited = ss.get("excitedFractionAtNextPulse").asDouble();
        double charged = ss.get("chargedFractionAtNextPulse").asDouble();
        double either = ss.get("excitedOrChargedFractionAtNextPulse").asDouble();
        assertThat(charged).as("charged fraction of a slowly neutralised sample").isGreaterThan(0.5);
        assertThat(excited).as("excited fraction 50 radiative lifetimes after the pulse").isLessThan(1e-10);
        assertThat(either).as("excited or charged lies between the larger part and the sum")
                .isBetween(Math.max(excited, charged) - 1e-12, excited + charged + 1e-12);
    }
}
