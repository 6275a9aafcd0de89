package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.Trace;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.units.Photon;

class TraceSidecarCodecTest {

    private static final Dataset DATA = new Dataset(List.of(
            Trace.of("low", new double[] {0, 1, 2}, new double[] {1, 0.5, 0.2}),
            Trace.of("high", new double[] {0, 1, 2}, new double[] {2, 1, 0.3})), List.of("x.csv"));

    private static Dataset apply(String json) {
        return TraceSidecarCodec.apply(JsonTree.parse(json, "side.json"), DATA);
    }

    @Test
    void entriesInOrderWithSharedPump() {
        Dataset d = apply("{\"schema\":\"ladderkin.traces/1\",\"pump\":\"400 nm\",\"traces\":["
                + "{\"pulseEnergy\":\"1 nJ\"},{\"photonFluence\":\"3e14 photons/cm²\"}]}");
        var low = d.traces().get(0).metadata();
        assertThat(low.excitation().orElseThrow().kind()).isEqualTo(Excitation.Kind.PULSE_ENERGY_J);
        assertThat(low.excitation().orElseThrow().value()).isCloseTo(1e-9, within(1e-24));
        assertThat(low.photonEnergyJ().getAsDouble()).isCloseTo(Photon.energyJ(400e-9), within(1e-30));
        assertThat(d.traces().get(1).metadata().excitation().orElseThrow().value()).isCloseTo(3e18, within(1e3));
    }

    @Test
    void entriesByLabelWithOwnPumpAndEnergyFluence() {
        Dataset d = apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":["
                + "{\"label\":\"high\",\"meanOccupancy\":0.9,\"pump\":\"3.1 eV\"},"
                + "{\"label\":\"low\",\"energyFluence\":\"0.1 mJ/cm²\",\"pump\":\"400 nm\"}]}");
        assertThat(d.traces().get(1).metadata().excitation().orElseThrow().value()).isEqualTo(0.9);
        double photons = 1.0 / Photon.energyJ(400e-9);
        assertThat(d.traces().get(0).metadata().excitation().orElseThrow().value()).isCloseTo(photons, within(photons * 1e-12));
    }

    @Test
    void forAFitEveryTraceNeedsItsExcitationAndOneWithoutIsRefusedAtItsEntry(@org.junit.jupiter.api.io.TempDir java.nio.file.Path dir)
            throws Exception {
        java.nio.file.Path noValue = dir.resolve("a.traces.json");
        java.nio.file.Files.writeString(noValue, "{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"label\":\"low\"},"
                + "{\"label\":\"high\",\"pulseEnergy\":\"1 nJ\"}]}");
        assertThatThrownBy(() -> TraceSidecarCodec.applyForFit(noValue, DATA)).satisfies(t -> {
            InputException e = (InputException) t;
            assertThat(e.key()).isEqualTo(InputProblem.MISSING_FIELD);
            assertThat(e.field()).isEqualTo("traces[0]");
            assertThat(e.getMessage()).startsWith(noValue + ":1:").contains("trace 'low' has no excitation").doesNotContain("\n");
        });
        java.nio.file.Path missingEntry = dir.resolve("b.traces.json");
        java.nio.file.Files.writeString(missingEntry, "{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"label\":\"high\",\"pulseEnergy\":\"1 nJ\"}]}");
        assertThatThrownBy(() -> TraceSidecarCodec.applyForFit(missingEntry, DATA)).satisfies(t -> {
            InputException e = (InputException) t;
            assertThat(e.field()).isEqualTo("traces");
            assertThat(e.getMessage()).contains("no entry gives trace 'low' its excitation");
        });
        // the desktop planner may load the same sidecar and have the excitation typed afterwards
        assertThat(TraceSidecarCodec.apply(noValue, DATA).traces().get(0).metadata().excitation()).isEmpty();
    }

    @Test
    void rejections() {
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"pulseEnergy\":\"1 nJ\"}]}"))
                .satisfies(input(InputProblem.MISMATCH, "side.json:1:41", "traces"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"label\":\"mid\",\"pulseEnergy\":\"1 nJ\"}]}"))
                .satisfies(input(InputProblem.MISMATCH, "side.json:1:51", "traces[0].label"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"pulseEnergy\":\"1 nJ\",\"colour\":1},{}]}"))
                .satisfies(input(InputProblem.UNKNOWN_FIELD, "side.json:1:73", "traces[0].colour"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"pulseEnergy\":\"1 nJ\",\"meanOccupancy\":1},{}]}"))
                .satisfies(input(InputProblem.CONFLICT, "side.json:1:42", "traces[0]"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"pulseEnergy\":\"1 ps\"},{}]}"))
                .satisfies(input(InputProblem.WRONG_UNIT, "side.json:1:57", "traces[0].pulseEnergy"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"traces\":[{\"energyFluence\":\"1 mJ/cm²\"},{}]}"))
                .satisfies(input(InputProblem.MISSING_FIELD, "side.json:1:59", "traces[0].energyFluence"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.traces/1\",\"pump\":\"5 ps\",\"traces\":[{},{}]}"))
                .satisfies(input(InputProblem.WRONG_UNIT, "side.json:1:39", "pump"));
        assertThatThrownBy(() -> apply("{\"schema\":\"ladderkin.plan/1\",\"traces\":[{},{}]}"))
                .satisfies(input(InputProblem.WRONG_SCHEMA, "side.json:1:11", "schema"));
    }

    @Test
    void argumentsInColumnOrder() {
        Dataset d = TraceArguments.apply(DATA, List.of("1e13 photons/cm²", "0.2 mJ/cm²"), "400nm", "--fluences");
        assertThat(d.traces().get(0).metadata().excitation().orElseThrow().value()).isCloseTo(1e17, within(1e3));
        double expected = 2.0 / Photon.energyJ(400e-9);
        assertThat(d.traces().get(1).metadata().excitation().orElseThrow().value()).isCloseTo(expected, within(expected * 1e-12));
        assertThatThrownBy(() -> TraceArguments.apply(DATA, List.of("1 nJ"), null, "--fluences"))
                .satisfies(input(InputProblem.MISMATCH, "--fluences", null));
        assertThatThrownBy(() -> TraceArguments.apply(DATA, List.of("1 nJ", "5 ps"), null, "--fluences"))
                .satisfies(input(InputProblem.INVALID_VALUE, "--fluences", "[2]"));
        assertThatThrownBy(() -> TraceArguments.apply(DATA, List.of("1 nJ", "0.2 mJ/cm²"), null, "--fluences"))
                .satisfies(input(InputProblem.MISSING_FIELD, "--fluences", "[2]"));
    }
}
