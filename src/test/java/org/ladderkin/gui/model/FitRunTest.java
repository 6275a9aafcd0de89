package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.gui.model.FitFixture.waitFor;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.units.Quantity;

/** The fit job on its own: run, progress, cancel, a newer run replacing an older one, options, push back. */
class FitRunTest {

    @TempDir
    Path dir;
    FitFixture fx;
    FitJobs jobs = new FitJobs();
    FitRun run;
    Dataset data;

    @BeforeEach
    void simulateASeries() throws Exception {
        fx = FitFixture.in(dir);
        data = fx.excited();
        run = new FitRun(jobs, FitFixture.DIRECT);
    }

    @AfterEach
    void close() {
        run.close();
    }

    private void fitToTheEnd(PlanInputs plan) {
        run.start(data, plan);
        waitFor("the fit", () -> run.state() != FitRun.RunState.RUNNING);
        assertThat(run.state()).as(run.message()).isEqualTo(FitRun.RunState.DONE);
    }

    @Test
    void aFitRecoversTheTrueTau2AndSigmaWithinAFewStandardErrors() {
        assertThat(run.free()).containsExactlyInAnyOrder("scale", "tau-auger2");
        run.start(data, fx.plan());
        assertThat(run.state()).isIn(FitRun.RunState.RUNNING, FitRun.RunState.DONE);
        waitFor("the fit", () -> run.state() != FitRun.RunState.RUNNING);
        assertThat(run.state()).as(run.message()).isEqualTo(FitRun.RunState.DONE);
        assertThat(run.message()).startsWith("fit ");
        ParameterEstimate tau = run.outcome().orElseThrow().result().estimate("tauAuger2S");
        assertThat(Math.abs(tau.value() - fx.series().tau2S())).as(tau.value() + " ± " + tau.stdError() + " vs " + fx.series().tau2S())
                .isLessThan(4 * tau.stdError());
        ParameterEstimate sigma = run.outcome().orElseThrow().result().estimate("crossSectionM2");
        assertThat(Math.abs(sigma.value() - fx.series().sigmaM2())).isLessThan(4 * sigma.stdError());
        assertThat(run.progressText()).matches("done in \\d+:\\d\\d · \\d+ model evaluations · best χ²/ν [0-9.e+-]+");
    }

    @Test
    void progressWhileRunningIsElapsedTimeEvaluationsAndTheBestChiSquareSoFar() {
        List<String> seen = new CopyOnWriteArrayList<>();
        run.addListener(() -> {
            if (run.state() == FitRun.RunState.RUNNING && run.best().isPresent()) {
                seen.add(run.progressText());
            }
        });
        fitToTheEnd(fx.plan());
        assertThat(seen).isNotEmpty().allMatch(t -> t.matches("\\d+:\\d\\d elapsed · \\d+ model evaluations? · best χ²/ν [0-9.e+-]+"));
        // the best χ² shown only falls, and ends at the finished fit's quality
        double[] chi = seen.stream().mapToDouble(t -> Double.parseDouble(t.substring(t.lastIndexOf(' ') + 1))).toArray();
        for (int i = 1; i < chi.length; i++) {
            assertThat(chi[i]).isLessThanOrEqualTo(chi[i - 1]);
        }
        assertThat(run.best().orElseThrow().reducedChiSquare()).isCloseTo(run.outcome().orElseThrow().quality().reducedChiSquare(),
                org.assertj.core.data.Percentage.withPercentage(1e-6));
        assertThat(FitRun.elapsed(62_500_000_000L)).isEqualTo("1:02");
        assertThat(FitRun.elapsed(3_723_000_000_000L)).isEqualTo("1:02:03");
    }

    @Test
    void aCancelledFitShowsItsBestPointSoFarAsNotConverged() {
        int[] bests = {0};
        run.addListener(() -> {
            if (run.state() == FitRun.RunState.RUNNING && run.best().isPresent() && run.best().get().evaluations() > 1
                    && bests[0]++ == 0) {
                run.cancel();
            }
        });
        run.start(data, fx.plan());
        waitFor("the cancel", () -> run.state() != FitRun.RunState.RUNNING);
        assertThat(run.state()).isEqualTo(FitRun.RunState.CANCELLED);
        assertThat(run.message()).startsWith("fit cancelled after ").contains("best point so far (not converged): χ²/ν ")
                .containsPattern("τ₂ = [0-9.e+-]+ ps");
        assertThat(run.progressText()).startsWith("cancelled after ").contains("best χ²/ν");
        assertThat(run.pushBack().edits()).isEmpty();
    }

    @Test
    void cancellingMidRunGivesCancelledAndNoOutcome() {
        int[] progressSeen = {0};
        run.addListener(() -> {
            if (run.state() == FitRun.RunState.RUNNING && run.stage().contains("evaluation") && progressSeen[0]++ == 0) {
                run.cancel();
            }
        });
        run.start(data, fx.plan());
        waitFor("the cancel", () -> run.state() != FitRun.RunState.RUNNING);
        assertThat(run.state()).isEqualTo(FitRun.RunState.CANCELLED);
        assertThat(run.message()).startsWith("fit cancelled");
        assertThat(run.outcome()).isEmpty();
        assertThat(progressSeen[0]).isEqualTo(1);
        // nothing of the cancelled fit arrives later, and the worker is free for the next one
        assertThat(run.outcome()).isEmpty();
        fitToTheEnd(fx.plan());
        assertThat(progressSeen[0]).isGreaterThan(1);
    }

    @Test
    void aNewerRunReplacesAnOlderOneWhichNeverArrives() {
        List<FitRun.RunState> states = new CopyOnWriteArrayList<>();
        run.addListener(() -> states.add(run.state()));
        int[] restarts = {0};
        run.addListener(() -> {
            // while the first fit is certainly running, start a second one with σ held
            if (run.state() == FitRun.RunState.RUNNING && run.stage().contains("evaluation") && restarts[0]++ == 0) {
                run.setFree("scale", false);
                run.start(data, fx.plan());
            }
        });
        run.start(data, fx.plan());
        waitFor("the fit", () -> run.state() != FitRun.RunState.RUNNING);
        assertThat(run.state()).as(run.message()).isEqualTo(FitRun.RunState.DONE);
        long entered = java.util.stream.IntStream.range(0, states.size())
                .filter(i -> states.get(i) == FitRun.RunState.DONE && (i == 0 || states.get(i - 1) != FitRun.RunState.DONE)).count();
        assertThat(entered).as("fits that arrived").isEqualTo(1);
        // the result shown is the second run's: σ held
        assertThat(run.outcome().orElseThrow().result().estimate("crossSectionM2").fixed()).isTrue();
    }

    @Test
    void aCancelledRunLeavesThePreviousResultAndAnInputChangeClearsIt() {
        fitToTheEnd(fx.plan());
        var first = run.outcome().orElseThrow();
        PushBack firstPush = run.pushBack();

        run.setFree("tau-rad", true);
        assertThat(run.outcome()).as("choosing parameters keeps the finished fit").containsSame(first);
        run.start(data, fx.plan());
        assertThat(run.outcome()).as("hidden while a new fit runs").isEmpty();
        assertThat(run.pushBack().edits()).isEmpty();
        run.cancel();
        assertThat(run.state()).isEqualTo(FitRun.RunState.CANCELLED);
        assertThat(run.outcome()).containsSame(first);
        assertThat(run.pushBack()).isEqualTo(firstPush);

        run.inputsChanged();
        assertThat(run.outcome()).isEmpty();
        assertThat(run.pushBack().notes()).containsExactly("run a fit first");
    }

    @Test
    void aPulseTrainFitUsesThePlansRateAndStillFindsTau2() {
        fitToTheEnd(fx.plan());
        double onePulse = run.outcome().orElseThrow().result().estimate("tauAuger2S").value();
        assertThat(run.setPulseTrain(true)).isTrue();
        assertThat(run.setPulseTrain(true)).isFalse();
        assertThat(run.state()).as("a finished fit no longer matches").isEqualTo(FitRun.RunState.IDLE);
        assertThat(run.message()).isEqualTo("inputs changed: run the fit again");
        assertThat(run.outcome()).isEmpty();
        fitToTheEnd(fx.plan());
        // the planner judges the rates at the highest ⟨N⟩ its design can reach: the CdSe demo runs at 1 kHz ÷ 2
        assertThat(jobs.planRepetitionRateHz()).contains(500.0);
        ParameterEstimate tau = run.outcome().orElseThrow().result().estimate("tauAuger2S");
        // the demo sample is stirred and ionises rarely: at 500 Hz the steady state barely differs from fresh dots
        assertThat(Math.abs(tau.value() - fx.series().tau2S())).isLessThan(4 * tau.stdError());
        assertThat(tau.value()).as("the model did change").isNotEqualTo(onePulse);
    }

    @Test
    void thePlansGaussianResponseIsHeldAtItsFwhmWhenAsked() {
        assertThat(FitJobs.planResponse(fx.plan())).hasValue("Gaussian, FWHM 200 fs");
        run.setInstrumentResponse(true);
        run.setFree("time-zero", true);
        fitToTheEnd(fx.plan());
        ParameterEstimate irf = run.outcome().orElseThrow().result().estimate("irfFwhmS");
        assertThat(irf.fixed()).isTrue();
        assertThat(irf.value()).isEqualTo(fx.plan().instruments().get(0).irfFwhmS());
        assertThat(run.outcome().orElseThrow().result().estimate("timeZeroS").fixed()).isFalse();
    }

    @Test
    void aMeasuredResponseInThePlanIsUsedAsMeasured() throws Exception {
        Files.copy(FitFixture.HOME.resolve("experiments-plan/fh-ta-irf.csv"), dir.resolve("ta-irf.csv"));
        fx.editor().edit(fx.formField("instruments[0].irfFwhm"), "");
        fx.editor().edit(fx.formField("instruments[0].irfFile"), "ta-irf.csv");
        assertThat(fx.editor().check().valid()).as(String.valueOf(fx.editor().check().problem())).isTrue();
        PlanInputs plan = fx.editor().lastValid().orElseThrow();
        assertThat(FitJobs.planResponse(plan)).hasValueSatisfying(r -> assertThat(r).startsWith("measured (").contains("ta-irf.csv"));
        run.setInstrumentResponse(true);
        fitToTheEnd(plan);
        assertThat(run.outcome().orElseThrow().measuredIrf()).isNotNull();
        assertThat(run.outcome().orElseThrow().measuredIrf().fwhmS()).isEqualTo(plan.instruments().get(0).irfFwhmS());
    }

    @Test
    void fittedValuesGoIntoThePlanAsOneUndoStep() {
        PlanEditor editor = fx.editor();
        String before = editor.text();
        run.setFree("tau-rad", true);
        fitToTheEnd(fx.plan());
        PushBack p = run.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString())
                .containsExactly("model.biexcitonLifetime", "sample.crossSection.value", "sample.crossSection.at");
        // the demo plan keeps the default quantum yield 0.5: τ_rad is not τ₁, so it is left out with the reason
        assertThat(p.notes()).anyMatch(n -> n.startsWith("τ_rad is not written"));

        run.applyTo(editor);
        double tau2 = run.outcome().orElseThrow().result().estimate("tauAuger2S").value();
        FieldSpec tauField = PushBack.field("model.biexcitonLifetime");
        assertThat(Quantity.parse(editor.text(tauField)).si() / tau2).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        assertThat(editor.text(PushBack.field("sample.crossSection.at"))).isEqualTo(
                Quantity.formatBest(fx.series().pumpM(), org.ladderkin.units.Dimension.LENGTH, 4));
        assertThat(editor.check().valid()).as(editor.check().problem()).isTrue();
        assertThat(editor.isDirty()).isTrue();

        editor.undo();
        assertThat(editor.text()).isEqualTo(before);
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.canUndo()).isFalse();
        editor.redo();
        assertThat(Quantity.parse(editor.text(tauField)).si() / tau2).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        assertThat(editor.text(PushBack.field("sample.crossSection.value"))).isNotEmpty();
    }

    @Test
    void withQuantumYieldOneTauRadIsTheSingleExcitonLifetimeAndIsWritten() {
        fx.editor().edit(PushBack.field("model.plQuantumYield"), "1");
        run.setFree("tau-rad", true);
        fitToTheEnd(fx.editor().lastValid().orElseThrow());
        PushBack p = run.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString()).contains("model.singleExcitonLifetime");
        assertThat(p.notes()).noneMatch(n -> n.startsWith("τ_rad"));
        double tauRad = run.outcome().orElseThrow().result().estimate("tauRadS").value();
        String written = p.edits().stream().filter(e -> e.getKey().path().toString().equals("model.singleExcitonLifetime"))
                .findFirst().orElseThrow().getValue();
        assertThat(Quantity.parse(written).si() / tauRad).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
    }

    @Test
    void withPulseEnergiesTheScaleIsNotSigmaAndIsNotWritten() {
        FitData typed = new FitData();
        typed.load(List.of(fx.csv()));
        for (int i = 0; i < typed.traceCount(); i++) {
            // any common factor will do: the fit frees ⟨N⟩ per joule
            typed.setExcitation(i, String.format(java.util.Locale.ROOT, "%.4g nJ", 10 * FitDemoSeries.MEAN_N[i]));
        }
        data = typed.excited().orElseThrow();
        fitToTheEnd(fx.plan());
        PushBack p = run.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString()).containsExactly("model.biexcitonLifetime");
        assertThat(p.notes()).anyMatch(n -> n.startsWith("σ is not written: with pulse energies"));
        assertThat(FitCharts.rows(run.outcome().orElseThrow()))
                .anyMatch(r -> r.name().startsWith("⟨N⟩ per pulse energy") && r.value().endsWith("per nJ"));
        ParameterEstimate tau = run.outcome().orElseThrow().result().estimate("tauAuger2S");
        assertThat(Math.abs(tau.value() - fx.series().tau2S())).isLessThan(4 * tau.stdError());
    }

    @Test
    void nothingIsPushedBeforeAFitAndUnknownParametersAreRefused() {
        assertThat(run.pushBack().edits()).isEmpty();
        assertThat(run.pushBack().notes()).containsExactly("run a fit first");
        assertThatThrownBy(() -> run.setFree("tau-auger9", true)).hasMessageContaining("not a ladder fit parameter");
        // the process registry's fittable lifetimes (τ₃ included) between the scale and time zero
        assertThat(FitRun.offered()).extracting(FitOptions.FreeParameter::key)
                .containsExactly("scale", "tau-auger2", "tau-rad", "tau-trap", "tau-auger3", "time-zero");
    }
}
