package org.ladderkin.gui.model;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executor;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitIdentifiability;
import org.ladderkin.plan.PlanInputs;

/**
 * Before a fit: whether the data can tell apart the parameters the user frees, at the plan's values where the fit
 * would start ({@link FitIdentifiability}). Checked again, after a short pause, whenever the traces, their
 * excitations, the freed parameters, the model options or the plan change; the result is a warning beside Run Fit,
 * which still runs (the user may know better, or want to see the valley).
 *
 * <p>Runs on its own {@link LatestJobRunner} so it neither waits for nor cancels a fit or a preview. Threads and
 * tickets as in {@link FitPreview}: inputs change on the caller's thread, results arrive on {@code deliver}, both under
 * this object's monitor; a result from older inputs is dropped.
 */
public final class FitCheck implements AutoCloseable {

    /** Pause after a change before the check starts, so clicking through check boxes starts one check, not five. */
    static final long PAUSE_MILLIS = 300;

    private final FitJobs jobs;
    private final LatestJobRunner runner;
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();
    /** Guarded by this. */
    private long ticket;
    /** Guarded by this. */
    private FitRequest last;
    private volatile boolean checking;
    private volatile FitIdentifiability result;
    private volatile String failure = "";

    FitCheck(FitJobs jobs, Executor deliver) {
        this.jobs = Objects.requireNonNull(jobs, "jobs");
        this.runner = new LatestJobRunner("ladderkin-fit-check", deliver);
    }

    /** {@code l} is told after every change, on the thread that made it. */
    public void addListener(Runnable l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    /** What a fit would now be run on; empty data or plan clears the check. An equal request changes nothing. */
    void inputs(Optional<Dataset> data, Optional<PlanInputs> plan, FitOptions options) {
        synchronized (this) {
            FitRequest request = data.isPresent() && plan.isPresent() ? new FitRequest(data.get(), plan.get(), options) : null;
            if (Objects.equals(request, last)) {
                return;
            }
            last = request;
            long mine = ++ticket;
            result = null;
            failure = "";
            if (request == null || options.free().isEmpty()) {
                runner.cancel();
                checking = false;
            } else {
                checking = true;
                runner.submit(PAUSE_MILLIS, p -> jobs.identifiability(request), new LatestJobRunner.Callback<FitIdentifiability>() {
                    @Override
                    public void progress(String stage, int done, int total) {
                    }

                    @Override
                    public void finished(FitIdentifiability value) {
                        arrived(mine, value, "");
                    }

                    @Override
                    public void failed(String why) {
                        arrived(mine, null, why);
                    }
                });
            }
        }
        fire();
    }

    private void arrived(long mine, FitIdentifiability value, String why) {
        synchronized (this) {
            if (mine != ticket) {
                return;
            }
            checking = false;
            result = value;
            failure = why;
        }
        fire();
    }

    /** Why the last check could not be made, or "" (the preview and the fit say the same about their inputs). */
    public String failure() {
        return failure;
    }

    /** Whether a check is pending or running. */
    public boolean checking() {
        return checking;
    }

    /** The last check's finding, when it has arrived. */
    public Optional<FitIdentifiability> result() {
        return Optional.ofNullable(result);
    }

    /** The warning a user should read before running the fit, when the last check found one. */
    public Optional<String> warning() {
        FitIdentifiability r = result;
        return r != null && r.warns() ? Optional.of(r.warning()) : Optional.empty();
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
