package org.ladderkin.gui.model;

import org.ladderkin.plan.PlanFitBasis;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.function.BooleanSupplier;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.units.Quantity;

/** The fit view's presentation model, headless: load, excitations, run, cancel, bad input, push back. */
class FitSessionTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    static final Path DEMO = HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json");
    /** Callbacks run on the worker thread itself. */
    static final Executor DIRECT = Runnable::run;

    @TempDir
    Path dir;
    PlanEditor editor;
    PlanInputs plan;
    FitSession session;
    FitDemoSeries.Series series;
    Path csv;

    @BeforeEach
    void loadTheDemoPlanAndASimulatedSeries() throws Exception {
        Path copy = dir.resolve("demo.plan.json");
        Files.copy(DEMO, copy);
        editor = new PlanEditor();
        editor.open(copy);
        plan = editor.lastValid().orElseThrow();
        series = FitDemoSeries.simulate(plan, 40, 5);
        csv = FitDemoSeries.write(series, dir, "series");
        session = new FitSession(DIRECT);
        session.setPlan(plan);
    }

    @AfterEach
    void close() {
        session.close();
    }

    @Test
    void excitationsComeFromTheSidecarAndThePlansCurvesAreDrawnBeforeAFit() {
        assertThat(session.load(List.of(csv))).isEmpty();
        assertThat(session.traceCount()).isEqualTo(FitDemoSeries.MEAN_N.length);
        for (int i = 0; i < session.traceCount(); i++) {
            assertThat(session.excitationProblem(i)).isEmpty();
            double j = Quantity.parse(session.excitationText(i)).si();
            assertThat(j / series.fluencesPerM2()[i]).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        }
        waitFor("the plan's curves", session::hasPreview);
        assertThat(session.state()).isEqualTo(FitSession.RunState.IDLE);
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces over the plan's model");
        assertThat(session.overlayChart().series()).hasSize(2 * FitDemoSeries.MEAN_N.length);
        assertThat(session.parameterRows()).allMatch(r -> !r.free());
        // the plan's τ₂ is held and shown in ps
        assertThat(session.parameterRows()).anyMatch(r -> r.name().startsWith("τ₂") && r.value().endsWith(" ps") && r.error().isEmpty());
    }

    @Test
    void aFitRecoversTheTrueTau2WithinAFewStandardErrors() {
        session.load(List.of(csv));
        assertThat(session.free()).containsExactlyInAnyOrder(LadderParameter.SCALE, LadderParameter.TAU_AUGER2);
        assertThat(session.run()).isEmpty();
        assertThat(session.state()).isIn(FitSession.RunState.RUNNING, FitSession.RunState.DONE);
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        ParameterEstimate tau = session.outcome().orElseThrow().result().estimate("tauAuger2S");
        assertThat(Math.abs(tau.value() - series.tau2S())).as(tau.value() + " ± " + tau.stdError() + " vs " + series.tau2S())
                .isLessThan(4 * tau.stdError());
        ParameterEstimate sigma = session.outcome().orElseThrow().result().estimate("crossSectionM2");
        assertThat(Math.abs(sigma.value() - series.sigmaM2())).isLessThan(4 * sigma.stdError());
        assertThat(session.progress()).isEqualTo(1.0);
        assertThat(session.parameterRows()).anyMatch(r -> r.name().startsWith("τ₂") && r.free() && r.value().endsWith(" ps")
                && r.error().startsWith("± "));
        assertThat(session.overlayChart().title()).isEqualTo("Measured traces and the fit");
        assertThat(session.residualChart().series()).hasSize(FitDemoSeries.MEAN_N.length);
        assertThat(session.diagnostics()).anyMatch(l -> l.startsWith("χ²/dof"));
    }

    @Test
    void cancellingMidRunGivesCancelledAndNoOutcome() {
        session.load(List.of(csv));
        waitFor("the plan's curves", session::hasPreview);
        int[] progressSeen = {0};
        session.addListener(() -> {
            if (session.state() == FitSession.RunState.RUNNING && session.stage().contains("evaluation") && progressSeen[0]++ == 0) {
                session.cancel();
            }
        });
        session.run();
        waitFor("the cancel", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).isEqualTo(FitSession.RunState.CANCELLED);
        assertThat(session.outcome()).isEmpty();
        assertThat(progressSeen[0]).isEqualTo(1);
        // nothing of the cancelled fit arrives later, and the worker is free for the next one
        assertThat(session.outcome()).isEmpty();
        session.run();
        waitFor("the second fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        assertThat(progressSeen[0]).isGreaterThan(1);
    }

    @Test
    void aNewerRunReplacesAnOlderOneWhichNeverArrives() {
        session.load(List.of(csv));
        List<FitSession.RunState> states = new java.util.concurrent.CopyOnWriteArrayList<>();
        session.addListener(() -> states.add(session.state()));
        int[] restarts = {0};
        session.addListener(() -> {
            // while the first fit is certainly running, start a second one with σ held
            if (session.state() == FitSession.RunState.RUNNING && session.stage().contains("evaluation") && restarts[0]++ == 0) {
                session.setFree(LadderParameter.SCALE, false);
                session.run();
            }
        });
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        long entered = java.util.stream.IntStream.range(0, states.size())
                .filter(i -> states.get(i) == FitSession.RunState.DONE && (i == 0 || states.get(i - 1) != FitSession.RunState.DONE)).count();
        assertThat(entered).as("fits that arrived").isEqualTo(1);
        // the result shown is the second run's: σ held
        assertThat(session.outcome().orElseThrow().result().estimate("crossSectionM2").fixed()).isTrue();
    }

    @Test
    void aColumnHeaderWithAUnitPrefillsTheExcitationAndABareNumberDoesNot() throws Exception {
        Path table = dir.resolve("energies.csv");
        Files.writeString(table, "delay (ps),2 nJ,5 nJ,3\n1,0.3,0.5,0.3\n2,0.2,0.4,0.2\n3,0.1,0.2,0.1\n");
        assertThat(session.load(List.of(table))).isEmpty();
        assertThat(session.excitationText(0)).isEqualTo("2 nJ");
        assertThat(session.excitationText(1)).isEqualTo("5 nJ");
        assertThat(session.excitationText(2)).isEmpty();
        assertThat(session.excitationProblem(2).orElseThrow()).startsWith("required");
        assertThat(session.checkExcitation(2, "8 nJ")).isEmpty();
        assertThat(session.checkExcitation(2, "0.3 mJ/cm²").orElseThrow()).contains("pump photon energy");
    }

    @Test
    void aPulseTrainFitUsesThePlansRateAndStillFindsTau2() {
        session.load(List.of(csv));
        session.run();
        waitFor("the one-pulse fit", () -> session.state() != FitSession.RunState.RUNNING);
        double onePulse = session.outcome().orElseThrow().result().estimate("tauAuger2S").value();
        session.setPulseTrain(true);
        assertThat(session.state()).as("a finished fit no longer matches").isEqualTo(FitSession.RunState.IDLE);
        assertThat(session.outcome()).isEmpty();
        session.run();
        waitFor("the pulse-train fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        assertThat(session.planRepetitionRateHz()).contains(1000.0);
        ParameterEstimate tau = session.outcome().orElseThrow().result().estimate("tauAuger2S");
        // the demo sample is stirred and ionises rarely: at 1 kHz the steady state barely differs from fresh dots
        assertThat(Math.abs(tau.value() - series.tau2S())).isLessThan(4 * tau.stdError());
        assertThat(tau.value()).as("the model did change").isNotEqualTo(onePulse);
    }

    @Test
    void aNewLoadCancelsARunningFit() throws Exception {
        session.load(List.of(csv));
        int[] calls = {0};
        session.addListener(() -> {
            if (session.state() == FitSession.RunState.RUNNING && session.stage().contains("evaluation") && calls[0]++ == 0) {
                session.load(List.of(csv));
            }
        });
        session.run();
        waitFor("the load to end the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).isEqualTo(FitSession.RunState.IDLE);
        assertThat(session.outcome()).isEmpty();
    }

    @Test
    void aBadFileGivesALocatedOneLineMessageAndKeepsTheOldState() throws Exception {
        session.load(List.of(csv));
        session.setExcitation(0, "2 nJ");
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "delay (ps),a,b\n1,0.1,0.2\n2,0.3\n3,0.1,0.1\n");
        var problem = session.load(List.of(bad));
        assertThat(problem).isPresent();
        assertThat(problem.get()).startsWith(bad + ":3:").contains("ragged row").doesNotContain("\n");
        assertThat(session.loadProblem()).isEqualTo(problem.get());
        assertThat(session.traceCount()).isEqualTo(FitDemoSeries.MEAN_N.length);
        assertThat(session.label(0)).isEqualTo("F1");
        assertThat(session.excitationText(0)).isEqualTo("2 nJ");
    }

    @Test
    void anInvalidExcitationIsExplainedAndBlocksTheRun() {
        session.load(List.of(csv));
        session.setExcitation(1, "3 nK");
        assertThat(session.excitationProblem(1)).isPresent();
        assertThat(session.excitationProblem(1).get()).doesNotContain("\n");
        var blocked = session.run();
        assertThat(blocked).isPresent();
        assertThat(blocked.get()).startsWith("trace 'F2': ");
        assertThat(session.state()).isEqualTo(FitSession.RunState.IDLE);

        session.setExcitation(1, "2 nJ");
        assertThat(session.excitationProblem(1)).isEmpty();
        assertThat(session.run().orElseThrow()).contains("a pulse energy").contains("use one kind for the whole series");
        session.setExcitation(1, "");
        assertThat(session.excitationProblem(1).orElseThrow()).startsWith("required");
    }

    @Test
    void fittedValuesGoIntoThePlanAsOneUndoStep() {
        String before = editor.text();
        session.load(List.of(csv));
        session.setFree(LadderParameter.TAU_RAD, true);
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        PushBack p = session.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString())
                .containsExactly("model.biexcitonLifetime", "sample.crossSection.value", "sample.crossSection.at");
        // the demo plan keeps the default quantum yield 0.5: τ_rad is not τ₁, so it is left out with the reason
        assertThat(p.notes()).anyMatch(n -> n.startsWith("τ_rad is not written"));

        session.applyTo(editor);
        double tau2 = session.outcome().orElseThrow().result().estimate("tauAuger2S").value();
        FieldSpec tauField = PushBack.field("model.biexcitonLifetime");
        assertThat(Quantity.parse(editor.text(tauField)).si() / tau2).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        assertThat(editor.text(PushBack.field("sample.crossSection.at"))).isEqualTo(
                Quantity.formatBest(series.pumpM(), org.ladderkin.units.Dimension.LENGTH, 4));
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
    void theDemoSeriesNextToTheDemoPlanLoadsAndFits() {
        Path demo = HOME.resolve("experiments-plan/fh-cdse-ta-series.csv");
        assertThat(session.load(List.of(demo))).isEmpty();
        assertThat(session.runProblem()).isEmpty();
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        // made by FitDemoSeries.main with τ₂ = 1.3 × the plan's
        ParameterEstimate tau = session.outcome().orElseThrow().result().estimate("tauAuger2S");
        double truth = FitDemoSeries.TAU2_FACTOR * PlanFitBasis.of(plan).model().tauBiexcitonS();
        assertThat(Math.abs(tau.value() - truth)).as(tau.value() + " ± " + tau.stdError()).isLessThan(4 * tau.stdError());
    }

    FieldSpec formField(String path) {
        return editor.fields().stream().filter(f -> f.path().toString().equals(path)).findFirst().orElseThrow();
    }

    @Test
    void thePlansGaussianResponseIsHeldAtItsFwhmWhenAsked() {
        session.load(List.of(csv));
        assertThat(session.planResponse()).hasValue("Gaussian, FWHM 200 fs");
        session.setInstrumentResponse(true);
        session.setFree(LadderParameter.TIME_ZERO, true);
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        ParameterEstimate irf = session.outcome().orElseThrow().result().estimate("irfFwhmS");
        assertThat(irf.fixed()).isTrue();
        assertThat(irf.value()).isEqualTo(plan.instruments().get(0).irfFwhmS());
        assertThat(session.outcome().orElseThrow().result().estimate("timeZeroS").fixed()).isFalse();
    }

    @Test
    void aMeasuredResponseInThePlanIsUsedAsMeasured() throws Exception {
        Files.copy(HOME.resolve("experiments-plan/fh-ta-irf.csv"), dir.resolve("ta-irf.csv"));
        editor.edit(formField("instruments[0].irfFwhm"), "");
        editor.edit(formField("instruments[0].irfFile"), "ta-irf.csv");
        assertThat(editor.check().valid()).as(String.valueOf(editor.check().problem())).isTrue();
        session.setPlan(editor.lastValid().orElseThrow());
        session.load(List.of(csv));
        assertThat(session.planResponse()).hasValueSatisfying(r -> assertThat(r).startsWith("measured (").contains("ta-irf.csv"));
        session.setInstrumentResponse(true);
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        assertThat(session.outcome().orElseThrow().measuredIrf()).isNotNull();
        assertThat(session.outcome().orElseThrow().measuredIrf().fwhmS())
                .isEqualTo(editor.lastValid().orElseThrow().instruments().get(0).irfFwhmS());
    }

    @Test
    void withQuantumYieldOneTauRadIsTheSingleExcitonLifetimeAndIsWritten() {
        editor.edit(PushBack.field("model.plQuantumYield"), "1");
        session.setPlan(editor.lastValid().orElseThrow());
        session.load(List.of(csv));
        session.setFree(LadderParameter.TAU_RAD, true);
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        PushBack p = session.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString()).contains("model.singleExcitonLifetime");
        assertThat(p.notes()).noneMatch(n -> n.startsWith("τ_rad"));
        double tauRad = session.outcome().orElseThrow().result().estimate("tauRadS").value();
        String written = p.edits().stream().filter(e -> e.getKey().path().toString().equals("model.singleExcitonLifetime"))
                .findFirst().orElseThrow().getValue();
        assertThat(Quantity.parse(written).si() / tauRad).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
    }

    @Test
    void withPulseEnergiesTheScaleIsNotSigmaAndIsNotWritten() {
        session.load(List.of(csv));
        for (int i = 0; i < session.traceCount(); i++) {
            // any common factor will do: the fit frees ⟨N⟩ per joule
            session.setExcitation(i, String.format(java.util.Locale.ROOT, "%.4g nJ", 10 * FitDemoSeries.MEAN_N[i]));
        }
        session.run();
        waitFor("the fit", () -> session.state() != FitSession.RunState.RUNNING);
        assertThat(session.state()).as(session.message()).isEqualTo(FitSession.RunState.DONE);
        PushBack p = session.pushBack();
        assertThat(p.edits()).extracting(e -> e.getKey().path().toString()).containsExactly("model.biexcitonLifetime");
        assertThat(p.notes()).anyMatch(n -> n.startsWith("σ is not written: with pulse energies"));
        assertThat(session.parameterRows()).anyMatch(r -> r.name().startsWith("⟨N⟩ per pulse energy") && r.value().endsWith("per nJ"));
        ParameterEstimate tau = session.outcome().orElseThrow().result().estimate("tauAuger2S");
        assertThat(Math.abs(tau.value() - series.tau2S())).isLessThan(4 * tau.stdError());
    }

    @Test
    void nothingIsPushedBeforeAFit() {
        assertThat(session.pushBack().edits()).isEmpty();
        assertThat(session.pushBack().notes()).containsExactly("run a fit first");
    }

    /** Waits for work on the fit thread (a guard against hanging, not a speed requirement). */
    static void waitFor(String what, BooleanSupplier condition) {
        long end = System.nanoTime() + 300_000_000_000L;
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > end) {
                throw new AssertionError("gave up waiting for " + what);
            }
            try {
                Thread.sleep(20);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError(e);
            }
        }
    }
}
