package org.ladderkin.gui.model;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executor;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.plan.PlanInputs;

/**
 * The traces over the plan's own prediction, for before a fit: a ladder fit with every shared parameter held, so only
 * each trace's amplitude and baseline are solved. It holds the plan being edited (its last valid state; a fit starts
 * from it too) and is recomputed whenever the plan, the traces or their excitations, or the pulse mode change. The
 * old curves stay on show until the new ones arrive (a fraction of a second: no flicker while the plan is typed).
 *
 * <p>Runs on its own {@link LatestJobRunner}, so a plan edit during a fit neither waits for the fit nor cancels it.
 * Threads: the caller (the event thread in the planner) changes the inputs, the runner's {@code deliver} executor
 * brings the curves; both under this object's monitor. A ticket, bumped by every new request, drops curves computed
 * from older inputs. Listeners are told after the monitor is released, on the thread that changed the model.
 */
public final class FitPreview implements AutoCloseable {

    private final FitJobs jobs;
    private final LatestJobRunner runner;
    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();

    private volatile PlanInputs plan;
    /** Traces with their excitations, or null when there is nothing to draw. Guarded by this. */
    private Dataset data;
    /** Guarded by this. */
    private FitOptions options = FitOptions.initial();
    /** Guarded by this. */
    private long ticket;
    private volatile FitJobs.Result curves;
    private volatile String problem = "";

    FitPreview(FitJobs jobs, Executor deliver) {
        this.jobs = Objects.requireNonNull(jobs, "jobs");
        this.runner = new LatestJobRunner("ladderkin-fit-preview", deliver);
    }

    /** {@code l} is told after every change, on the thread that made it. */
    public void addListener(Runnable l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    /** The plan currently edited; an equal plan changes nothing. */
    void setPlan(PlanInputs inputs) {
        synchronized (this) {
            if (Objects.equals(plan, inputs)) {
                return;
            }
            plan = inputs;
            recompute();
        }
        fire();
    }

    /**
     * New traces or excitations or pulse mode.
     *
     * @param excited  the traces carrying their excitations, or empty when they cannot be drawn yet
     * @param newTraces whether these are other traces than before: then the old curves go at once (they would be
     *                  drawn over the wrong data), else they stay until the new ones arrive
     */
    void setTraces(Optional<Dataset> excited, FitOptions fitOptions, boolean newTraces) {
        synchronized (this) {
            data = excited.orElse(null);
            options = Objects.requireNonNull(fitOptions, "fitOptions");
            if (newTraces) {
                curves = null;
            }
            recompute();
        }
        fire();
    }

    /** Holding the monitor. */
    private void recompute() {
        long mine = ++ticket;
        problem = "";
        if (plan == null || data == null) {
            runner.cancel();
            curves = null;
            return;
        }
        FitRequest request = new FitRequest(data, plan, options.allHeld());
        runner.submit(p -> jobs.compute(request, FitProgress.NONE), new LatestJobRunner.Callback<FitJobs.Result>() {
            @Override
            public void progress(String stage, int done, int total) {
            }

            @Override
            public void finished(FitJobs.Result value) {
                arrived(mine, value, null);
            }

            @Override
            public void failed(String why) {
                arrived(mine, null, why);
            }
        });
    }

    private void arrived(long mine, FitJobs.Result value, String thrown) {
        synchronized (this) {
            if (mine != ticket) {
                return;
            }
            boolean ok = value != null && value.outcome().result().ok();
            curves = ok ? value : null;
            problem = ok ? "" : "the plan's model could not be drawn: " + (thrown != null ? thrown : value.outcome().result().message());
        }
        fire();
    }

    /** The plan's last valid state, once there is one. */
    public Optional<PlanInputs> plan() {
        return Optional.ofNullable(plan);
    }

    /** What the plan's TA instrument response is ("Gaussian, FWHM 200 fs"), if the plan has one. */
    public Optional<String> planResponse() {
        return plan().flatMap(FitJobs::planResponse);
    }

    /** The plan's curves over the traces, when they have arrived. */
    Optional<FitJobs.Result> curves() {
        return Optional.ofNullable(curves);
    }

    /** Whether the plan's curves are available. */
    public boolean hasCurves() {
        return curves != null;
    }

    /** Why the plan's curves could not be drawn, or "". */
    public String problem() {
        return problem;
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
