package org.ladderkin.gui.model;

import org.ladderkin.plan.PlanFitBasis;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executor;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.io.InputException;
import org.ladderkin.io.MissingValuePolicy;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceSidecarCodec;
import org.ladderkin.io.TraceTableReader;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartSpec;

/**
 * The fit view's state, without Swing: the loaded traces and each one's excitation text (checked as the user types),
 * the freed parameters, single pulse or pulse-train steady state, the run state with its progress, the outcome, and
 * what the view draws (charts as {@link ChartSpec}, parameter rows, diagnostics). Before a fit the traces are drawn
 * over the plan's own model (a ladder fit with nothing freed: only per-trace amplitude and baseline are solved);
 * after a fit over the fitted curves. Fits run on a {@link LatestJobRunner}; everything arrives through its
 * {@code deliver} executor. Methods are synchronized so a direct executor (tests) is as safe as the event thread.
 */
public final class FitSession implements AutoCloseable {

    /** Where a fit stands. */
    public enum RunState { IDLE, RUNNING, DONE, FAILED, CANCELLED }

    /** Told after every change, on the thread that made it (the deliver executor for run results). */
    @FunctionalInterface
    public interface Listener {
        void sessionChanged();
    }

    /** Model evaluations that make the progress bar half full; ladder fits usually take a few tens. */
    static final double HALF_BAR_EVALUATIONS = 25;
    /** Sidecar file next to a trace table: {@code NAME.traces.json} for {@code NAME.csv}. */
    static final String SIDECAR_SUFFIX = ".traces.json";

    private final LatestJobRunner runner;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();

    private Dataset data;
    private List<String> texts = List.of();
    private List<ExcitationText.Reading> readings = List.of();
    private String loadProblem = "";
    private final Set<LadderParameter> free = new LinkedHashSet<>(List.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2));
    private boolean pulseTrain;
    private boolean instrumentResponse;
    private PlanInputs plan;
    private volatile CachedBasis basisCache;

    private RunState state = RunState.IDLE;
    private double progress;
    private String stage = "";
    private String message = "";
    private FitView fitted;

    private FitView preview;
    private String previewProblem = "";
    private long previewGeneration = -1;
    private boolean previewWanted;

    /** A finished fit or preview and what it was computed from. */
    record FitView(LadderFit.Outcome outcome, Dataset data, PlanFitBasis basis, Set<LadderParameter> free) {
    }

    private record CachedBasis(PlanInputs inputs, PlanFitBasis basis) {
    }

    /** @param deliver runs results and progress (e.g. {@code SwingUtilities::invokeLater}) */
    public FitSession(Executor deliver) {
        this.runner = new LatestJobRunner("ladderkin-fit", deliver);
    }

    public void addListener(Listener l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    // ---- traces and excitations --------------------------------------------------------------------------------

    /**
     * Loads trace tables (a {@code NAME.traces.json} sidecar next to a file supplies excitations). On bad input the
     * session keeps its previous state and the one-line, located message is returned (also in {@link #loadProblem()}).
     * A successful load cancels a running fit and clears the old outcome.
     */
    public synchronized Optional<String> load(List<Path> files) {
        Dataset read;
        try {
            read = TraceTableReader.readAll(files, new TableOptions(null, MissingValuePolicy.DROP));
            for (Path f : files) {
                Path sidecar = sidecarOf(f);
                if (Files.isRegularFile(sidecar)) {
                    read = TraceSidecarCodec.apply(sidecar, read);
                }
            }
        } catch (InputException | IllegalArgumentException e) {
            loadProblem = e.getMessage();
            fire();
            return Optional.of(loadProblem);
        }
        loadProblem = "";
        List<String> t = new ArrayList<>();
        for (Trace trace : read.traces()) {
            t.add(initialText(trace.metadata()));
        }
        stopFit();
        data = read;
        texts = List.copyOf(t);
        readings = readAll(read, texts);
        fitted = null;
        state = RunState.IDLE;
        message = "loaded " + read.size() + " trace" + (read.size() == 1 ? "" : "s") + " from "
                + String.join(", ", read.sourceFiles().stream().map(s -> Path.of(s).getFileName().toString()).toList())
                + (read.droppedMissing() > 0 ? "; " + read.missingSummary() : "");
        preview = null;
        requestPreview();
        fire();
        return Optional.empty();
    }

    /** The loaded traces, if any. */
    public synchronized Optional<Dataset> data() {
        return Optional.ofNullable(data);
    }

    /** The message of the last load that failed, or "" after a good load. */
    public synchronized String loadProblem() {
        return loadProblem;
    }

    /** Number of loaded traces. */
    public synchronized int traceCount() {
        return data == null ? 0 : data.size();
    }

    /** Label of trace {@code i}. */
    public synchronized String label(int i) {
        return data.traces().get(i).label();
    }

    /** The excitation text of trace {@code i}. */
    public synchronized String excitationText(int i) {
        return texts.get(i);
    }

    /** Why trace {@code i}'s excitation text cannot be used, or empty. */
    public synchronized Optional<String> excitationProblem(int i) {
        return Optional.ofNullable(readings.get(i).problem());
    }

    /** Why {@code text} would not do as trace {@code i}'s excitation, or empty: for checking while the user types. */
    public synchronized Optional<String> checkExcitation(int i, String text) {
        return Optional.ofNullable(ExcitationText.read(text, data.traces().get(i).metadata().photonEnergyJ()).problem());
    }

    /** Sets trace {@code i}'s excitation text; a change clears the old fit (it no longer matches the inputs). */
    public synchronized void setExcitation(int i, String text) {
        Objects.requireNonNull(text, "text");
        if (texts.get(i).equals(text)) {
            return;
        }
        List<String> t = new ArrayList<>(texts);
        t.set(i, text);
        texts = List.copyOf(t);
        readings = readAll(data, texts);
        inputsChanged();
    }

    // ---- fit settings ------------------------------------------------------------------------------------------

    /** The shared parameters the next fit frees. */
    public synchronized Set<LadderParameter> free() {
        return Set.copyOf(free);
    }

    /** Frees or holds one shared parameter for the next fit. */
    public synchronized void setFree(LadderParameter p, boolean isFree) {
        if (isFree ? free.add(p) : free.remove(p)) {
            fire();
        }
    }

    /** The plan's chosen repetition rate used for pulse-train fits, once the plan's curves have been computed. */
    public Optional<Double> planRepetitionRateHz() {
        CachedBasis c = basisCache;
        return c == null ? Optional.empty() : Optional.of(c.basis().repetitionRateHz());
    }

    /**
     * Whether the model is convolved with the instrument response of the plan's transient-absorption instrument: its
     * measured table when the plan gives an IRF file, else a Gaussian of its FWHM. The width is held, not fitted.
     */
    public synchronized boolean instrumentResponse() {
        return instrumentResponse;
    }

    public synchronized void setInstrumentResponse(boolean on) {
        if (on != instrumentResponse) {
            instrumentResponse = on;
            inputsChanged();
        }
    }

    /** What the plan's TA instrument response is, for the option's label ("Gaussian, FWHM 200 fs"), if it has one. */
    public synchronized Optional<String> planResponse() {
        return plan == null ? Optional.empty() : taInstrument(plan).map(i -> i.measuredIrf() != null
                ? "measured (" + i.measuredIrf().origin() + "), FWHM " + formatFs(i.irfFwhmS())
                : "Gaussian, FWHM " + formatFs(i.irfFwhmS()));
    }

    private static String formatFs(double s) {
        return org.ladderkin.units.Quantity.formatBest(s, org.ladderkin.units.Dimension.TIME, 3);
    }

    private static Optional<org.ladderkin.plan.Instrument> taInstrument(PlanInputs inputs) {
        return inputs.instruments().stream()
                .filter(i -> i.kind() == org.ladderkin.plan.Instrument.Kind.TRANSIENT_ABSORPTION).findFirst();
    }

    /** The fit set-up for the current choices; the response comes from {@code inputs} when asked for. */
    private static LadderFitSetup setup(PlanFitBasis basis, PlanInputs inputs, boolean train, boolean response,
                                        Set<LadderParameter> freed, double scaleStart) {
        org.ladderkin.plan.Instrument ta = response ? taInstrument(inputs).orElse(null) : null;
        double fwhm = ta == null || ta.measuredIrf() != null ? Double.NaN : ta.irfFwhmS();
        return new LadderFitSetup(basis.base(), train ? basis.periodS() : Double.NaN, freed, scaleStart, 0, fwhm, false,
                false, ta == null ? null : ta.measuredIrf());
    }

    /** Whether fits run in the pulse-train steady state at the plan's chosen repetition rate (else one pulse). */
    public synchronized boolean pulseTrain() {
        return pulseTrain;
    }

    public synchronized void setPulseTrain(boolean on) {
        if (on != pulseTrain) {
            pulseTrain = on;
            inputsChanged();
        }
    }

    /**
     * The plan currently edited (its last valid state). Redraws the "before a fit" curves; a finished fit is kept, so
     * pushing fitted values into the plan does not throw the fit away.
     */
    public synchronized void setPlan(PlanInputs inputs) {
        if (Objects.equals(plan, inputs)) {
            return;
        }
        plan = inputs;
        requestPreview();
        fire();
    }

    /** Why a fit cannot start now, or empty when it can. */
    public synchronized Optional<String> runProblem() {
        if (data == null) {
            return Optional.of("load measured traces first");
        }
        for (int i = 0; i < readings.size(); i++) {
            if (!readings.get(i).ok()) {
                return Optional.of("trace '" + label(i) + "': " + readings.get(i).problem());
            }
        }
        Excitation.Kind kind = readings.get(0).excitation().kind();
        for (int i = 1; i < readings.size(); i++) {
            Excitation.Kind k = readings.get(i).excitation().kind();
            if (k != kind) {
                return Optional.of("trace '" + label(i) + "' gives " + ExcitationText.kindLabel(k) + " but trace '" + label(0)
                        + "' " + ExcitationText.kindLabel(kind) + " (use one kind for the whole series)");
            }
        }
        if (plan == null) {
            return Optional.of("the plan is not valid yet: the fit starts from the plan's model");
        }
        return Optional.empty();
    }

    // ---- running -----------------------------------------------------------------------------------------------

    /**
     * Starts a fit (cancelling an older one), or returns why it cannot start (state unchanged).
     */
    public synchronized Optional<String> run() {
        Optional<String> problem = runProblem();
        if (problem.isPresent()) {
            message = problem.get();
            fire();
            return problem;
        }
        Dataset withExcitation = withExcitations();
        PlanInputs inputs = plan;
        Set<LadderParameter> freed = free();
        boolean train = pulseTrain;
        boolean response = instrumentResponse;
        if (previewGeneration >= 0) {
            previewWanted = true; // the fit replaces the preview job on the runner: redo it afterwards
            previewGeneration = -1;
        }
        state = RunState.RUNNING;
        progress = 0;
        stage = "starting";
        message = "fitting " + withExcitation.size() + " traces";
        fitted = null;
        runner.submit(p -> {
            PlanFitBasis basis = basis(inputs);
            LadderFitSetup setup = setup(basis, inputs, train, response, freed, planScale(kindOf(withExcitation), basis));
            return new FitView(LadderFit.fit(withExcitation, setup, p), withExcitation, basis, freed);
        }, new LatestJobRunner.Callback<FitView>() {
            @Override
            public void progress(String s, int done, int total) {
                fitProgress(s, done, total);
            }

            @Override
            public void finished(FitView value) {
                fitFinished(value);
            }

            @Override
            public void failed(String why) {
                fitFailed(why);
            }
        });
        fire();
        return Optional.empty();
    }

    /** Cancels a running fit: the state becomes CANCELLED at once and nothing of that fit is shown. */
    public synchronized void cancel() {
        if (state != RunState.RUNNING) {
            return;
        }
        runner.cancel();
        state = RunState.CANCELLED;
        message = "fit cancelled";
        stage = "";
        progress = 0;
        afterFit();
        fire();
    }

    public synchronized RunState state() {
        return state;
    }

    /** Progress of a running fit, 0 to 1 (asymptotic: a fit's number of evaluations is not known in advance). */
    public synchronized double progress() {
        return progress;
    }

    /** What the running fit is doing, e.g. "12 model evaluations". */
    public synchronized String stage() {
        return stage;
    }

    /** One line about the last action (loaded, fitting, cancelled, failed: why). */
    public synchronized String message() {
        return message;
    }

    /** The fit's outcome, present only when the state is DONE. */
    public synchronized Optional<LadderFit.Outcome> outcome() {
        return state == RunState.DONE && fitted != null ? Optional.of(fitted.outcome()) : Optional.empty();
    }

    /** Why the plan's curves could not be drawn, or "". */
    public synchronized String previewProblem() {
        return previewProblem;
    }

    /** Whether the plan's curves ("before a fit") are available. */
    public synchronized boolean hasPreview() {
        return preview != null;
    }

    // ---- what the view shows -----------------------------------------------------------------------------------

    /** The measured traces (points) over the fitted curves after a fit, else over the plan's model. */
    public synchronized ChartSpec overlayChart() {
        FitView shown = shown();
        return FitCharts.overlay(data, shown == null ? null : shown.outcome(), shown == fitted);
    }

    /** Data minus the curves of {@link #overlayChart()}. */
    public synchronized ChartSpec residualChart() {
        FitView shown = shown();
        return FitCharts.residuals(data, shown == null ? null : shown.outcome(), shown == fitted);
    }

    /** Parameter rows of the fit, or of the plan's model (all held) before a fit. */
    public synchronized List<FitCharts.ParameterRow> parameterRows() {
        FitView shown = shown();
        return shown == null ? List.of() : FitCharts.rows(shown.outcome());
    }

    /** Diagnostics, warnings and the χ² line of the fit (or of the plan's model before a fit). */
    public synchronized List<String> diagnostics() {
        FitView shown = shown();
        return shown == null ? List.of() : FitCharts.diagnostics(shown.outcome(), shown == fitted);
    }

    /** What "Use fitted values in the plan" would write, and what it leaves out and why. */
    public synchronized PushBack pushBack() {
        return state == RunState.DONE && fitted != null ? PushBack.of(fitted.outcome(), fitted.data(), fitted.basis(), fitted.free())
                : PushBack.nothing("run a fit first");
    }

    /** Writes {@link #pushBack()}'s values into the plan as one undo step; returns what was done. */
    public PushBack applyTo(PlanEditor editor) {
        PushBack p = pushBack();
        editor.editAll(p.edits());
        return p;
    }

    @Override
    public void close() {
        runner.close();
    }

    // ---- internals ---------------------------------------------------------------------------------------------

    private FitView shown() {
        return state == RunState.DONE && fitted != null ? fitted : preview;
    }

    private synchronized void fitProgress(String s, int done, int total) {
        if (state != RunState.RUNNING) {
            return;
        }
        if (s.equals("evaluation")) {
            progress = done / (done + HALF_BAR_EVALUATIONS);
            stage = done + " model evaluation" + (done == 1 ? "" : "s");
        } else {
            stage = s + " " + done + " of " + total;
        }
        fire();
    }

    private synchronized void fitFinished(FitView value) {
        if (state != RunState.RUNNING) {
            return;
        }
        var r = value.outcome().result();
        state = r.ok() ? RunState.DONE : RunState.FAILED;
        fitted = r.ok() ? value : null;
        progress = r.ok() ? 1 : 0;
        stage = "";
        message = r.ok() ? "fit " + r.status().name().toLowerCase(java.util.Locale.ROOT) + (r.message().isEmpty() ? "" : ": " + r.message())
                : "fit failed: " + r.message();
        afterFit();
        fire();
    }

    private synchronized void fitFailed(String why) {
        if (state != RunState.RUNNING) {
            return;
        }
        state = RunState.FAILED;
        fitted = null;
        progress = 0;
        stage = "";
        message = "fit failed: " + why;
        afterFit();
        fire();
    }

    private void afterFit() {
        if (previewWanted) {
            previewWanted = false;
            requestPreview();
        }
    }

    private void stopFit() {
        if (state == RunState.RUNNING) {
            runner.cancel();
        }
    }

    /** Excitations or the pulse mode changed: an old fit no longer matches, a running one is stopped. */
    private void inputsChanged() {
        if (state == RunState.RUNNING) {
            stopFit();
            state = RunState.CANCELLED;
            message = "fit cancelled: its inputs changed";
        } else if (state == RunState.DONE || state == RunState.FAILED) {
            state = RunState.IDLE;
            message = "inputs changed: run the fit again";
        }
        fitted = null;
        progress = 0;
        stage = "";
        requestPreview();
        fire();
    }

    /**
     * Recomputes the plan's curves in the background, unless a fit holds the runner. The old curves stay on show
     * until the new ones arrive (a fraction of a second; no flicker while the plan is typed).
     */
    private void requestPreview() {
        if (runProblem().isPresent()) {
            preview = null;
            previewProblem = "";
            previewGeneration = -1;
            return;
        }
        if (state == RunState.RUNNING) {
            previewWanted = true;
            return;
        }
        Dataset withExcitation = withExcitations();
        PlanInputs inputs = plan;
        boolean train = pulseTrain;
        boolean response = instrumentResponse;
        previewProblem = "";
        previewGeneration = runner.submit(p -> {
            PlanFitBasis basis = basis(inputs);
            LadderFitSetup setup = setup(basis, inputs, train, response, Set.of(), planScale(kindOf(withExcitation), basis));
            return new FitView(LadderFit.fit(withExcitation, setup, org.ladderkin.fit.FitProgress.NONE), withExcitation, basis, Set.of());
        }, new LatestJobRunner.Callback<FitView>() {
            @Override
            public void progress(String s, int done, int total) {
            }

            @Override
            public void finished(FitView value) {
                previewArrived(value, null);
            }

            @Override
            public void failed(String why) {
                previewArrived(null, why);
            }
        });
    }

    private synchronized void previewArrived(FitView value, String why) {
        if (previewGeneration < 0 || previewGeneration != runner.generation()) {
            return;
        }
        previewGeneration = -1;
        if (value != null && value.outcome().result().ok()) {
            preview = value;
            previewProblem = "";
        } else {
            preview = null;
            previewProblem = "the plan's model could not be drawn: " + (why != null ? why : value.outcome().result().message());
        }
        fire();
    }

    /** The plan's ladder for {@code inputs}, computed once per plan state (on the worker thread). */
    private PlanFitBasis basis(PlanInputs inputs) {
        CachedBasis c = basisCache;
        if (c != null && c.inputs().equals(inputs)) {
            return c.basis();
        }
        PlanFitBasis b = PlanFitBasis.of(inputs);
        basisCache = new CachedBasis(inputs, b);
        return b;
    }

    /** The plan's value of the excitation scale: σ for photon fluences, ⟨N⟩ per J for pulse energies, 1 for ⟨N⟩. */
    static double planScale(Excitation.Kind kind, PlanFitBasis basis) {
        return switch (kind) {
            case PHOTON_FLUENCE_PER_M2 -> basis.crossSectionM2();
            case PULSE_ENERGY_J -> basis.occupancyPerJ();
            case MEAN_OCCUPANCY -> 1;
        };
    }

    private static Excitation.Kind kindOf(Dataset d) {
        return d.traces().get(0).metadata().excitation().orElseThrow().kind();
    }

    private Dataset withExcitations() {
        List<TraceMetadata> meta = new ArrayList<>();
        for (int i = 0; i < data.size(); i++) {
            TraceMetadata m = data.traces().get(i).metadata();
            meta.add(m.with(Optional.of(readings.get(i).excitation()), m.photonEnergyJ()));
        }
        return data.withMetadata(meta);
    }

    private static List<ExcitationText.Reading> readAll(Dataset d, List<String> texts) {
        List<ExcitationText.Reading> out = new ArrayList<>();
        for (int i = 0; i < texts.size(); i++) {
            OptionalDouble photon = d.traces().get(i).metadata().photonEnergyJ();
            out.add(ExcitationText.read(texts.get(i), photon));
        }
        return List.copyOf(out);
    }

    /** The excitation the file or sidecar gave, else the column header when it reads as one ("2 nJ"), else "". */
    private static String initialText(TraceMetadata m) {
        if (m.excitation().isPresent()) {
            return ExcitationText.format(m.excitation().get());
        }
        ExcitationText.Reading fromLabel = ExcitationText.read(m.label(), m.photonEnergyJ());
        // a bare number as a column header is more likely an index than ⟨N⟩: only headers with a unit count
        return fromLabel.ok() && fromLabel.excitation().kind() != Excitation.Kind.MEAN_OCCUPANCY ? m.label().strip() : "";
    }

    static Path sidecarOf(Path table) {
        String name = table.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return table.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + SIDECAR_SUFFIX);
    }

    private void fire() {
        for (Listener l : listeners) {
            l.sessionChanged();
        }
    }
}
