package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.Excitation;
import org.ladderkin.units.Quantity;

/** The fit tab's data model, without threads: loading, sidecars, excitation texts and what blocks a fit. */
class FitDataTest {

    @TempDir
    Path dir;
    FitFixture fx;
    FitData data = new FitData();

    @BeforeEach
    void simulateASeries() throws Exception {
        fx = FitFixture.in(dir);
    }

    @Test
    void excitationsComeFromTheSidecar() {
        assertThat(data.load(List.of(fx.csv()))).isEmpty();
        assertThat(data.traceCount()).isEqualTo(FitDemoSeries.MEAN_N.length);
        assertThat(data.summary()).isEqualTo("loaded 4 traces from series.csv");
        for (int i = 0; i < data.traceCount(); i++) {
            assertThat(data.excitationProblem(i)).isEmpty();
            double j = Quantity.parse(data.excitationText(i)).si();
            assertThat(j / fx.series().fluencesPerM2()[i]).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        }
        assertThat(data.problem()).isEmpty();
    }

    @Test
    void aColumnHeaderWithAUnitPrefillsTheExcitationAndABareNumberDoesNot() throws Exception {
        Path table = dir.resolve("energies.csv");
        Files.writeString(table, "delay (ps),2 nJ,5 nJ,3\n1,0.3,0.5,0.3\n2,0.2,0.4,0.2\n3,0.1,0.2,0.1\n");
        assertThat(data.load(List.of(table))).isEmpty();
        assertThat(data.excitationText(0)).isEqualTo("2 nJ");
        assertThat(data.excitationText(1)).isEqualTo("5 nJ");
        assertThat(data.excitationText(2)).isEmpty();
        assertThat(data.excitationProblem(2).orElseThrow()).startsWith("required");
        assertThat(data.checkExcitation(2, "8 nJ")).isEmpty();
        assertThat(data.checkExcitation(2, "0.3 mJ/cm²").orElseThrow()).contains("pump photon energy");
    }

    @Test
    void aBadFileGivesALocatedOneLineMessageAndKeepsTheOldState() throws Exception {
        data.load(List.of(fx.csv()));
        data.setExcitation(0, "2 nJ");
        AtomicInteger told = new AtomicInteger();
        data.addListener(told::incrementAndGet);
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "delay (ps),a,b\n1,0.1,0.2\n2,0.3\n3,0.1,0.1\n");
        var problem = data.load(List.of(bad));
        assertThat(problem).isPresent();
        assertThat(problem.get()).startsWith(bad + ":3:").contains("ragged row").doesNotContain("\n");
        assertThat(data.loadProblem()).isEqualTo(problem.get());
        assertThat(told.get()).as("the view is told to show the message").isEqualTo(1);
        assertThat(data.traceCount()).isEqualTo(FitDemoSeries.MEAN_N.length);
        assertThat(data.label(0)).isEqualTo("F1");
        assertThat(data.excitationText(0)).isEqualTo("2 nJ");
        assertThat(data.summary()).isEqualTo("loaded 4 traces from series.csv");

        // the next good load clears the message and replaces the typed texts with the file's
        assertThat(data.load(List.of(fx.csv()))).isEmpty();
        assertThat(data.loadProblem()).isEmpty();
        assertThat(data.excitationText(0)).endsWith("photons/cm²");
    }

    @Test
    void anInvalidOrMixedExcitationIsExplainedAndNothingIsFittable() {
        assertThat(data.problem()).hasValue("load measured traces first");
        assertThat(data.excited()).isEmpty();
        data.load(List.of(fx.csv()));
        assertThat(data.setExcitation(1, "3 nK")).isTrue();
        assertThat(data.setExcitation(1, "3 nK")).as("the same text is no change").isFalse();
        assertThat(data.excitationProblem(1)).isPresent();
        assertThat(data.excitationProblem(1).get()).doesNotContain("\n");
        assertThat(data.problem().orElseThrow()).startsWith("trace 'F2': ");
        assertThat(data.excited()).isEmpty();

        data.setExcitation(1, "2 nJ");
        assertThat(data.excitationProblem(1)).isEmpty();
        assertThat(data.problem().orElseThrow()).contains("a pulse energy").contains("use one kind for the whole series");
        data.setExcitation(1, "");
        assertThat(data.excitationProblem(1).orElseThrow()).startsWith("required");
    }

    @Test
    void theFittableTracesCarryTheTypedExcitations() {
        data.load(List.of(fx.csv()));
        for (int i = 0; i < data.traceCount(); i++) {
            data.setExcitation(i, (i + 1) + " nJ");
        }
        var excited = data.excited().orElseThrow();
        for (int i = 0; i < excited.size(); i++) {
            Excitation e = excited.traces().get(i).metadata().excitation().orElseThrow();
            assertThat(e.kind()).isEqualTo(Excitation.Kind.PULSE_ENERGY_J);
            assertThat(e.value()).isCloseTo((i + 1) * 1e-9, org.assertj.core.data.Offset.offset(1e-15));
        }
        assertThat(data.dataset().orElseThrow().traces().get(0).metadata().excitation())
                .as("the loaded traces keep what the file said").isNotEqualTo(excited.traces().get(0).metadata().excitation());
    }
}
