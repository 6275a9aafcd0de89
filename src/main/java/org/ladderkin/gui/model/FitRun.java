package org.ladderkin.gui.model;

import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executor;
import java.util.function.UnaryOperator;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.plan.PlanInputs;

/**
 * The fit job: its options (freed parameters, pulse mode, instrument response), the run on its own
 * {@link LatestJobRunner} with progress and cancel, and the last result. A cancelled run leaves the previous result in
 * place; a finished one replaces it; a failed one, or a change to what the result was fitted to, clears it.
 *
 * <p>Threads: two sides change this model, the caller (start, cancel, options; the event thread in the planner) and
 * the runner's {@code deliver} executor (progress and the end of a job; also the event thread in the planner). Each
 * change happens under this object's monitor and replaces one immutable {@link Status}, so readers on any thread see
 * a whole state without locking. A ticket, bumped by every start, cancel and reset, lets a late report from an older
 * job recognise itself and drop out. Listeners are told after the monitor is released, on the thread that changed
 * the model.
 */
public final class FitRun implements AutoCloseable {

    /** Where a fit stands. */
    public enum RunState { IDLE, RUNNING, DONE, FAILED, CANCELLED }

    /**
     * @param result      the newest fit that finished and still matches its inputs; hidden while another one runs
     * @param startedNanos when the running (or last) fit started, {@link System#nanoTime()}
     * @param endedNanos  when it ended, or 0 while it runs
     * @param evaluations model evaluations of the series so far
     * @param first       the first point the optimiser told (the start), or null
     * @param best        the best point so far, or null before the first evaluation
     */
    private record Status(RunState state, String stage, String message, FitJobs.Result result, long startedNanos,
                          long endedNanos, int evaluations, FitProgress.Best first, FitProgress.Best best) {

        static final Status IDLE = new Status(RunState.IDLE, "", "", null, 0, 0, 0, null, null);

        Status ended(RunState s, String why, FitJobs.Result kept) {
            long end = endedNanos != 0 || startedNanos == 0 ? endedNanos : System.nanoTime();
            return new Status(s, "", why, kept, startedNanos, end, evaluations, first, best);
        }

        Status withMessage(String why) {
            return new Status(state, stage, why, result, startedNanos, endedNanos, evaluations, first, best);
        }
    }

    private final FitJobs jobs;
    private final LatestJobRunner runner;
    private final Executor deliver;
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();
    private volatile Status status = Status.IDLE;
    private volatile FitOptions options = FitOptions.initial();
    /** Guarded by this. */
    private long ticket;

    FitRun(FitJobs jobs, Executor deliver) {
        this.jobs = Objects.requireNonNull(jobs, "jobs");
        this.runner = new LatestJobRunner("ladderkin-fit", deliver);
        this.deliver = Objects.requireNonNull(deliver, "deliver");
    }

    /** {@code l} is told after every change, on the thread that made it. */
    public void addListener(Runnable l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    // ---- options -----------------------------------------------------------------------------------------------

    /** The parameters the view offers to free. */
    public static List<FitOptions.FreeParameter> offered() {
        return FitJobs.OFFERED;
    }

    /** The multiplication yield, offered beside {@link #offered} when the pump is above twice the gap. */
    public static FitOptions.FreeParameter multiplicationYield() {
        return FitJobs.YIELD;
    }

    public FitOptions options() {
        return options;
    }

    /** Keys of the shared parameters the next fit frees. */
    public Set<String> free() {
        return options.free();
    }

    /** Frees or holds one shared parameter for the next fit; a finished fit keeps its own choice and stays. */
    public void setFree(String key, boolean isFree) {
        FitJobs.checkKey(key);
        synchronized (this) {
            if (options.free().contains(key) == isFree) {
                return;
            }
            options = options.withFree(key, isFree);
        }
        fire();
    }

    /** @return whether it changed (then the last result no longer matches and is cleared) */
    boolean setPulseTrain(boolean on) {
        return changeModel(o -> o.withPulseTrain(on));
    }

    /** @return whether it changed (then the last result no longer matches and is cleared) */
    boolean setInstrumentResponse(boolean on) {
        return changeModel(o -> o.withInstrumentResponse(on));
    }

    /** Changes options the result depends on; {@code change} is applied under the monitor so no edit is lost. */
    private boolean changeModel(UnaryOperator<FitOptions> change) {
        synchronized (this) {
            FitOptions changed = change.apply(options);
            if (changed.equals(options)) {
                return false;
            }
            options = changed;
            outdate();
        }
        fire();
        return true;
    }

    // ---- running -----------------------------------------------------------------------------------------------

    /** Starts a fit of {@code data} (traces with their excitations) from {@code plan}, replacing a running one. */
    void start(Dataset data, PlanInputs plan) {
        synchronized (this) {
            FitRequest request = new FitRequest(data, plan, options);
            long mine = ++ticket;
            status = new Status(RunState.RUNNING, "starting", "fitting " + data.size() + " traces", status.result(),
                    System.nanoTime(), 0, 0, null, null);
            runner.submit(p -> jobs.compute(request, withBest(p, mine)), new LatestJobRunner.Callback<FitJobs.Result>() {
                @Override
                public void progress(String stage, int done, int total) {
                    progressed(mine, stage, done, total);
                }

                @Override
                public void finished(FitJobs.Result value) {
                    ended(mine, value, null);
                }

                @Override
                public void failed(String why) {
                    ended(mine, null, why);
                }
            });
        }
        fire();
    }

    /**
     * The runner's progress listener, also passing each new best point to this model (through the same
     * {@code deliver} executor, dropped once the job is no longer the newest).
     */
    private FitProgress withBest(FitProgress runnerProgress, long mine) {
        return new FitProgress() {
            @Override
            public void update(String stage, int done, int total) {
                runnerProgress.update(stage, done, total);
            }

            @Override
            public void improved(Best best) {
                deliver.execute(() -> bestArrived(mine, best));
            }
        };
    }

    /** Says why a fit could not start; nothing else changes. */
    void refuse(String why) {
        synchronized (this) {
            status = status.withMessage(why);
        }
        fire();
    }

    /** Cancels a running fit: CANCELLED at once, nothing of it arrives later, and the previous result stays. */
    public void cancel() {
        synchronized (this) {
            if (status.state() != RunState.RUNNING) {
                return;
            }
            stop();
            Status s = status;
            status = s.ended(RunState.CANCELLED, s.best() == null ? "fit cancelled" : "fit cancelled after "
                    + evaluationsText(s.evaluations()) + "; " + FitSummary.bestSoFar(s.first(), s.best()), s.result());
        }
        fire();
    }

    /** New traces were loaded: whatever ran or was fitted belongs to the old ones. */
    void reset() {
        synchronized (this) {
            stop();
            status = Status.IDLE;
        }
        fire();
    }

    /** The traces' excitations changed: the result no longer matches and a running fit is stopped. */
    void inputsChanged() {
        synchronized (this) {
            outdate();
        }
        fire();
    }

    /** Holding the monitor: the result is dropped, a running fit stopped, and the user told why. */
    private void outdate() {
        Status s = status;
        if (s.state() == RunState.RUNNING) {
            stop();
            status = s.ended(RunState.CANCELLED, "fit cancelled: its inputs changed", null);
        } else if (s.state() == RunState.DONE || s.state() == RunState.FAILED) {
            status = s.ended(RunState.IDLE, "inputs changed: run the fit again", null);
        } else {
            status = s.ended(s.state(), s.message(), null);
        }
    }

    /** Holding the monitor. */
    private void stop() {
        ticket++;
        runner.cancel();
    }

    private void progressed(long mine, String stage, int done, int total) {
        synchronized (this) {
            Status s = status;
            if (mine != ticket || s.state() != RunState.RUNNING) {
                return;
            }
            status = stage.equals("evaluation")
                    ? new Status(s.state(), evaluationsText(done), s.message(), s.result(), s.startedNanos(), 0, done, s.first(), s.best())
                    : new Status(s.state(), stage + " " + done + " of " + total, s.message(), s.result(), s.startedNanos(), 0,
                    s.evaluations(), s.first(), s.best());
        }
        fire();
    }

    private void bestArrived(long mine, FitProgress.Best best) {
        synchronized (this) {
            Status s = status;
            if (mine != ticket || s.state() != RunState.RUNNING) {
                return;
            }
            status = new Status(s.state(), s.stage(), s.message(), s.result(), s.startedNanos(), 0, s.evaluations(),
                    s.first() == null ? best : s.first(), best);
        }
        fire();
    }

    private static String evaluationsText(int n) {
        return n + " model evaluation" + (n == 1 ? "" : "s");
    }

    private void ended(long mine, FitJobs.Result value, String thrown) {
        synchronized (this) {
            if (mine != ticket || status.state() != RunState.RUNNING) {
                return;
            }
            if (value != null && value.outcome().result().ok()) {
                var r = value.outcome().result();
                status = status.ended(RunState.DONE, "fit " + r.statusText() + (r.message().isEmpty() ? "" : ": " + r.message()), value);
            } else {
                status = status.ended(RunState.FAILED, "fit failed: " + (thrown != null ? thrown : value.outcome().result().message()), null);
            }
        }
        fire();
    }

    // ---- what the view reads -------------------------------------------------------------------------------------

    public RunState state() {
        return status.state();
    }

    /**
     * What a running fit has done, live: elapsed time, model evaluations and the reduced χ² of the best point so far
     * ("0:42 elapsed · 37 model evaluations · best χ²/ν 3.21"); after a fit, the same for the whole run with how it
     * ended; "" before any fit. A fit's number of evaluations is not known in advance, so no fraction is claimed.
     */
    public String progressText() {
        Status s = status;
        if (s.startedNanos() == 0 || s.state() == RunState.IDLE) {
            return "";
        }
        long end = s.endedNanos() == 0 ? System.nanoTime() : s.endedNanos();
        String head = switch (s.state()) {
            case RUNNING -> elapsed(end - s.startedNanos()) + " elapsed";
            case DONE -> (s.result() != null && !s.result().outcome().result().converged() ? "not converged (best point so far) after "
                    : "done in ") + elapsed(end - s.startedNanos());
            case CANCELLED -> "cancelled after " + elapsed(end - s.startedNanos());
            case FAILED -> "failed after " + elapsed(end - s.startedNanos());
            case IDLE -> "";
        };
        String chi = s.best() == null ? "" : String.format(Locale.ROOT, " · best χ²/ν %.3g", s.best().reducedChiSquare());
        return head + " · " + evaluationsText(s.evaluations()) + chi;
    }

    /** The best point the running (or last) fit has met, once it has met one. */
    public Optional<FitProgress.Best> best() {
        return Optional.ofNullable(status.best());
    }

    /** "0:42", "12:05", "1:02:03". */
    static String elapsed(long nanos) {
        long s = Math.max(0, nanos) / 1_000_000_000L;
        return s >= 3600 ? String.format(Locale.ROOT, "%d:%02d:%02d", s / 3600, s / 60 % 60, s % 60)
                : String.format(Locale.ROOT, "%d:%02d", s / 60, s % 60);
    }

    /** What the running fit is doing, e.g. "12 model evaluations". */
    public String stage() {
        return status.stage();
    }

    /** One line about the last thing the fit did (fitting, cancelled, failed: why), or "" after a load. */
    public String message() {
        return status.message();
    }

    /** The last result while no fit runs: the one just finished, or the one a cancelled fit left in place. */
    Optional<FitJobs.Result> result() {
        Status s = status;
        return s.state() == RunState.RUNNING ? Optional.empty() : Optional.ofNullable(s.result());
    }

    /** The outcome of {@link #result()}. */
    public Optional<LadderFit.Outcome> outcome() {
        return result().map(FitJobs.Result::outcome);
    }

    /** What "Use fitted values in the plan" would write, and what it leaves out and why. */
    public PushBack pushBack() {
        return result().map(FitJobs.Result::pushBack).orElseGet(() -> PushBack.nothing(
                state() == RunState.RUNNING ? "wait for the running fit" : "run a fit first"));
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

    private void fire() {
        for (Runnable l : listeners) {
            l.run();
        }
    }
}
