package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.ladderkin.gui.model.FitFixture.waitFor;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.plan.PlanFitBasis;

/**
 * The rules that tie the fit tab's three models together, headless: what a load, an excitation edit or a plan edit
 * does to the fit and the preview, what blocks a fit, and what the charts and status line show.
 */
class FitSessionTest {

    @TempDir
    Path dir;
    FitFixture fx;
    FitSession session;

    @BeforeEach
    void simulateASeries() throws Exception {
        fx = FitFixture.in(dir);
        session = new FitSession(FitFixture.DIRECT);
        session.setPlan(fx.plan());
    }

    @AfterEach
    void close() {
        session.close();
    }

    private void fitToTheEnd() {
        assertThat(session.startFit()).isEmpty();
        waitFor("the fit", () -> session.fit().state() != FitRun.RunState.RUNNING);
        assertThat(session.fit().state()).as(session.message()).isEqualTo(FitRun.RunState.DONE);
    }

    @Test
    void beforeAFitTheTracesAreDrawnOverThePlansModel() {
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces");
        assertThat(session.load(List.of(fx.csv()))).isEmpty();
        assertThat(session.message()).isEqualTo("loaded 4 traces from series.csv");
        waitFor("the plan's curves", session.preview()::hasCurves);
        assertThat(session.fit().state()).isEqualTo(FitRun.RunState.IDLE);
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces over the plan's model");
        assertThat(session.overlayChart().series()).hasSize(2 * FitDemoSeries.MEAN_N.length);
        assertThat(session.residualChart().title()).isEqualTo("Residuals (data − plan's model)");
        assertThat(session.parameterRows()).isNotEmpty().allMatch(r -> !r.free());
        assertThat(session.diagnostics().get(0)).startsWith("Before a fit");
    }

    @Test
    void theDemoSeriesNextToTheDemoPlanLoadsAndFitsAndAPlanEditKeepsTheFit() {
        Path demo = FitFixture.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv");
        assertThat(session.load(List.of(demo))).isEmpty();
        assertThat(session.runProblem()).isEmpty();
        fitToTheEnd();
        // made by FitDemoSeries.main with τ₂ = 1.3 × the plan's
        ParameterEstimate tau = session.fit().outcome().orElseThrow().result().estimate("tauAuger2S");
        double truth = FitDemoSeries.TAU2_FACTOR * PlanFitBasis.of(fx.plan()).model().tauBiexcitonS();
        assertThat(Math.abs(tau.value() - truth)).as(tau.value() + " ± " + tau.stdError()).isLessThan(4 * tau.stdError());
        assertThat(session.parameterRows()).anyMatch(r -> r.name().equals("τ₂ (ps)") && r.free()
                && Double.parseDouble(r.value()) > 0 && r.error().startsWith("± "));
        assertThat(session.parameterRows()).allMatch(r -> !r.name().matches(".*\\b[a-z]+[A-Z].*"));
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces and the fit");
        assertThat(session.residualChart().series()).hasSize(session.data().traceCount());
        // the reduced χ² shown is the one against the data's noise: near 1 for the simulated series, never the
        // unweighted mean square (here of order 1e-8 in the file's units)
        String chi = session.diagnostics().stream().filter(l -> l.startsWith("reduced χ² = ")).findFirst().orElseThrow();
        double shown = Double.parseDouble(chi.substring("reduced χ² = ".length(), chi.indexOf(',')));
        var outcome = session.fit().outcome().orElseThrow();
        assertThat(shown).isCloseTo(outcome.quality().reducedChiSquare(), org.assertj.core.data.Percentage.withPercentage(0.5))
                .isBetween(0.5, 2.0);
        assertThat(outcome.result().reducedChiSquare()).isLessThan(1e-4);
        assertThat(chi).contains("the point-to-point scatter of the residuals");
        assertThat(session.diagnostics()).noneMatch(l -> l.contains("χ²/dof"));
        assertThat(session.statusLine()).isEqualTo(session.fit().message()).startsWith("fit ");

        // pushing fitted values into the plan edits the plan: the fit must survive that
        session.fit().applyTo(fx.editor());
        session.setPlan(fx.editor().lastValid().orElseThrow());
        assertThat(session.fit().outcome()).isPresent();
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces and the fit");
    }

    @Test
    void beforeAFitTwoSlowLifetimesTheDataCannotSeparateAreFlaggedAndTheDefaultChoiceIsNot() {
        Path demo = FitFixture.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv");
        assertThat(session.load(List.of(demo))).isEmpty();
        waitFor("the check of σ and τ₂", () -> !session.check().checking());
        assertThat(session.check().result()).as("the default choice was checked").isPresent();
        assertThat(session.checkLine()).as(session.check().result().toString()).isEmpty();

        session.setFree("tau-rad", true);
        session.setFree("tau-trap", true);
        waitFor("the check of τ_rad and τ_trap", () -> !session.check().checking());
        var found = session.check().result().orElseThrow();
        assertThat(found.warns()).as(found.toString()).isTrue();
        assertThat(session.checkLine()).startsWith("⚠ Before fitting: τ_rad and τ_trap cannot be told apart")
                .endsWith("— Run Fit runs it anyway.");
        // a warning, not a block
        assertThat(session.runProblem()).isEmpty();
    }

    @Test
    void anExcitationEditOutdatesTheFit() {
        session.load(List.of(fx.csv()));
        fitToTheEnd();
        session.setExcitation(0, session.data().excitationText(0));
        assertThat(session.fit().outcome()).as("the same text changes nothing").isPresent();
        session.setExcitation(0, "1e13 photons/cm²");
        assertThat(session.fit().state()).isEqualTo(FitRun.RunState.IDLE);
        assertThat(session.fit().outcome()).isEmpty();
        assertThat(session.message()).isEqualTo("inputs changed: run the fit again");
        assertThat(session.overlayChart().title()).isNotEqualTo("Measured traces and the fit");
    }

    @Test
    void aNewLoadCancelsARunningFit() {
        session.load(List.of(fx.csv()));
        int[] calls = {0};
        session.addListener(() -> {
            if (session.fit().state() == FitRun.RunState.RUNNING && session.fit().stage().contains("evaluation") && calls[0]++ == 0) {
                session.load(List.of(fx.csv()));
            }
        });
        session.startFit();
        waitFor("the load to end the fit", () -> session.fit().state() != FitRun.RunState.RUNNING);
        assertThat(session.fit().state()).isEqualTo(FitRun.RunState.IDLE);
        assertThat(session.fit().outcome()).isEmpty();
        assertThat(session.message()).startsWith("loaded 4 traces");
    }

    @Test
    void anInvalidExcitationOrNoPlanBlocksTheRunWithTheReason() throws Exception {
        assertThat(session.startFit()).hasValue("load measured traces first");
        session.load(List.of(fx.csv()));
        session.setExcitation(1, "3 nK");
        var blocked = session.startFit();
        assertThat(blocked.orElseThrow()).startsWith("trace 'F2': ");
        assertThat(session.fit().state()).isEqualTo(FitRun.RunState.IDLE);
        assertThat(session.message()).isEqualTo(blocked.get());
        assertThat(session.statusLine()).isEqualTo("⚠ " + blocked.get());

        session.setExcitation(1, "2 nJ");
        assertThat(session.startFit().orElseThrow()).contains("a pulse energy").contains("use one kind for the whole series");

        try (FitSession planless = new FitSession(FitFixture.DIRECT)) {
            planless.load(List.of(fx.csv()));
            assertThat(planless.startFit().orElseThrow()).startsWith("the plan is not valid yet");
            assertThat(planless.preview().hasCurves()).isFalse();
        }
    }

    @Test
    void aBadFileIsTheStatusLineAndTheOldTracesStay() throws Exception {
        session.load(List.of(fx.csv()));
        Path bad = dir.resolve("bad.csv");
        java.nio.file.Files.writeString(bad, "delay (ps),a\n1,0.1\n1,0.2\n3,0.1\n");
        assertThat(session.load(List.of(bad))).isPresent();
        assertThat(session.statusLine()).startsWith("⚠ " + bad + ":3:").contains("duplicate delay");
        assertThat(session.data().traceCount()).isEqualTo(FitDemoSeries.MEAN_N.length);
        assertThat(session.runProblem()).isEmpty();
    }
}
