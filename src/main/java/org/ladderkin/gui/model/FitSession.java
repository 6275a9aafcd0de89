package org.ladderkin.gui.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Executor;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartSpec;

/**
 * The fit tab's three models put together: {@link FitData} (the traces and their excitations), {@link FitRun} (the
 * fit job and its result) and {@link FitPreview} (the traces over the plan's own prediction). The models do not know
 * each other; the rules that tie them live here and nowhere else: a load or an excitation or pulse-mode change
 * outdates the fit and redraws the preview, a plan edit redraws the preview and keeps the fit (so pushing fitted
 * values into the plan does not throw the fit away), and the charts show the fit when there is one, else the preview.
 *
 * <p>Holds no state of its own. Each step below changes one model atomically; a listener may run between the steps
 * of one action and then sees every model consistent in itself (charts are drawn from the data a result was computed
 * from, never from newer traces).
 */
public final class FitSession implements AutoCloseable {

    private final FitJobs jobs = new FitJobs();
    private final FitData data = new FitData();
    private final FitRun fit;
    private final FitPreview preview;
    private final FitCheck check;

    /** @param deliver runs results and progress (e.g. {@code SwingUtilities::invokeLater}) */
    public FitSession(Executor deliver) {
        fit = new FitRun(jobs, deliver);
        preview = new FitPreview(jobs, deliver);
        check = new FitCheck(jobs, deliver);
    }

    public FitData data() {
        return data;
    }

    public FitRun fit() {
        return fit;
    }

    public FitPreview preview() {
        return preview;
    }

    /** Whether the data can tell the freed parameters apart, checked before a fit. */
    public FitCheck check() {
        return check;
    }

    /** {@code l} is told after every change of any of the three models, on the thread that made it. */
    public void addListener(Runnable l) {
        data.addListener(l);
        fit.addListener(l);
        preview.addListener(l);
        check.addListener(l);
    }

    // ---- changes that concern more than one model ----------------------------------------------------------------

    /**
     * Loads trace tables (see {@link FitData#load}); a bad file changes nothing, a good one ends the old fit and
     * draws the new traces over the plan's model.
     */
    public Optional<String> load(List<Path> files) {
        Optional<String> problem = data.load(files);
        if (problem.isEmpty()) {
            fit.reset();
            preview.setTraces(data.excited(), fit.options(), true);
            recheck();
        }
        return problem;
    }

    /** Frees or holds one shared parameter for the next fit, and checks the new choice against the data. */
    public void setFree(String key, boolean isFree) {
        fit.setFree(key, isFree);
        recheck();
    }

    /** Sets trace {@code i}'s excitation text; a change outdates the fit. */
    public void setExcitation(int i, String text) {
        if (data.setExcitation(i, text)) {
            fit.inputsChanged();
            preview.setTraces(data.excited(), fit.options(), false);
            recheck();
        }
    }

    /** One pulse on fresh dots, or the pulse-train steady state at the plan's chosen rate. */
    public void setPulseTrain(boolean on) {
        if (fit.setPulseTrain(on)) {
            preview.setTraces(data.excited(), fit.options(), false);
            recheck();
        }
    }

    /**
     * Whether the model is convolved with the instrument response of the plan's transient-absorption instrument: its
     * measured table when the plan gives an IRF file, else a Gaussian of its FWHM. The width is held, not fitted.
     */
    public void setInstrumentResponse(boolean on) {
        if (fit.setInstrumentResponse(on)) {
            preview.setTraces(data.excited(), fit.options(), false);
            recheck();
        }
    }

    /** The plan currently edited (its last valid state). */
    public void setPlan(PlanInputs inputs) {
        Optional<PlanInputs> before = preview.plan();
        preview.setPlan(inputs);
        if (!before.equals(preview.plan())) {
            recheck();
        }
    }

    /** Checks what a fit would now run on (the check drops an unchanged request and waits a moment itself). */
    private void recheck() {
        check.inputs(data.excited(), preview.plan(), fit.options());
    }

    /** Why a fit cannot start now, or empty when it can. */
    public Optional<String> runProblem() {
        return data.problem().or(() -> preview.plan().isPresent() ? Optional.empty()
                : Optional.of("the plan is not valid yet: the fit starts from the plan's model"));
    }

    /** Starts a fit (replacing a running one), or returns why it cannot start (then only the message changes). */
    public Optional<String> startFit() {
        Optional<Dataset> excited = data.excited();
        Optional<PlanInputs> plan = preview.plan();
        if (excited.isEmpty() || plan.isEmpty()) {
            String why = runProblem().orElse("the traces changed: try again");
            fit.refuse(why);
            return Optional.of(why);
        }
        fit.start(excited.get(), plan.get());
        return Optional.empty();
    }

    // ---- what the view shows -----------------------------------------------------------------------------------

    /** One line about the last action: the fit's, else what was loaded. */
    public String message() {
        String m = fit.message();
        return m.isEmpty() ? data.summary() : m;
    }

    /**
     * The status line: a failed load, else what keeps loaded traces from being fitted (marked "⚠"), else
     * {@link #message()}. A running fit is not interrupted by a complaint about what it does not use.
     */
    public String statusLine() {
        if (!data.loadProblem().isEmpty()) {
            return "⚠ " + data.loadProblem();
        }
        Optional<String> blocked = runProblem();
        return blocked.isPresent() && data.traceCount() > 0 && fit.state() != FitRun.RunState.RUNNING
                ? "⚠ " + blocked.get() : message();
    }

    /**
     * The check before a fit: "⚠ Before fitting: τ_rad and τ_trap cannot be told apart … — Run Fit runs it anyway",
     * a note while it is computed, or "" when the data tell the freed parameters apart (or nothing is loaded).
     */
    public String checkLine() {
        if (data.traceCount() == 0) {
            return "";
        }
        Optional<String> warning = check.warning();
        if (warning.isPresent()) {
            return "⚠ Before fitting: " + warning.get() + " — Run Fit runs it anyway.";
        }
        return check.checking() ? "checking whether the data can tell the freed parameters apart…" : "";
    }

    /** The plan's chosen repetition rate used for pulse-train fits, once the plan's ladder has been computed. */
    public Optional<Double> planRepetitionRateHz() {
        return jobs.planRepetitionRateHz();
    }

    /** Whether the fit tab offers the multiplication yield: the plan's pump is above twice the gap. */
    public boolean multiplicationYieldOffered() {
        return jobs.multiplicationYieldOffered();
    }

    /** The measured traces (points) over the fitted curves after a fit, else over the plan's model. */
    public ChartSpec overlayChart() {
        Shown s = shown();
        return FitCharts.overlay(s.data(), s.outcome(), s.fitted());
    }

    /** Data minus the curves of {@link #overlayChart()}. */
    public ChartSpec residualChart() {
        Shown s = shown();
        return FitCharts.residuals(s.data(), s.outcome(), s.fitted());
    }

    /** Parameter rows of the fit, or of the plan's model (all held) before a fit. */
    public List<FitCharts.ParameterRow> parameterRows() {
        Shown s = shown();
        return s.outcome() == null ? List.of() : FitSummary.rows(s.outcome());
    }

    /**
     * Diagnostics, warnings and the χ² line of the fit (or of the plan's model before a fit), after why the plan's
     * model could not be drawn when it could not.
     */
    public List<String> diagnostics() {
        Shown s = shown();
        List<String> lines = new ArrayList<>();
        if (!preview.problem().isEmpty()) {
            lines.add(preview.problem());
        }
        if (s.outcome() != null) {
            lines.addAll(FitSummary.diagnostics(s.data(), s.outcome(), s.fitted()));
        }
        return List.copyOf(lines);
    }

    private record Shown(Dataset data, LadderFit.Outcome outcome, boolean fitted) {
    }

    /** The fit's result, else the preview's curves, else the bare traces; read once so one drawing is consistent. */
    private Shown shown() {
        Optional<FitJobs.Result> fitted = fit.result();
        Optional<FitJobs.Result> r = fitted.or(preview::curves);
        return r.map(v -> new Shown(v.data(), v.outcome(), fitted.isPresent()))
                .orElseGet(() -> new Shown(data.dataset().orElse(null), null, false));
    }

    @Override
    public void close() {
        fit.close();
        preview.close();
        check.close();
    }
}
