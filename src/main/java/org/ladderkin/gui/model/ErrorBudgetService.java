package org.ladderkin.gui.model;

import java.util.List;
import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.ExpectedError;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.plan.Planner;

/**
 * The design's expected errors of the goal parameters for the desktop planner: the optimal-design search is too slow
 * for the live prediction (seconds, against its 150 ms), so it runs here on its own worker after a longer pause, a
 * newer edit cancels it, and the table says which plan it belongs to. The numbers are the report's: the same
 * {@link Planner} with the design search. The same full plan also gives the window's designed prediction
 * ({@link PlannerPrediction#designed}), which replaces the quick preview through
 * {@link RecomputeService#showDesigned}.
 */
public final class ErrorBudgetService implements AutoCloseable {

    /**
     * One delivered outcome.
     *
     * @param generation which request it answers
     * @param errors     the goal parameters' budgets (empty when the plan has no transient-absorption goal to design)
     * @param delayPoints delay points of the scored delay plan, 0 when there is none
     * @param error      why it failed, or null
     * @param prediction the full plan's prediction (charts, risks, derived numbers as in the report), or null when
     *                   it failed
     * @param computeNanos how long the full plan took
     */
    public record Result(long generation, List<ExpectedError> errors, int delayPoints, String error, Prediction prediction,
                         long computeNanos) {
        public Result {
            errors = List.copyOf(errors);
        }

        /** An outcome without a prediction (a failure). */
        public Result(long generation, List<ExpectedError> errors, int delayPoints, String error) {
            this(generation, errors, delayPoints, error, null, 0);
        }
    }

    private final LatestJobRunner runner;
    private final long pauseMillis;
    private final Consumer<Result> onResult;

    /**
     * @param pauseMillis wait this long after the last edit before starting the search
     * @param deliver     runs the callback (the event thread in the planner)
     */
    public ErrorBudgetService(long pauseMillis, Executor deliver, Consumer<Result> onResult) {
        this.pauseMillis = pauseMillis;
        this.onResult = Objects.requireNonNull(onResult, "onResult");
        this.runner = new LatestJobRunner("ladderkin-error-budget", deliver);
    }

    /** Asks for the budget of {@code inputs}, replacing any request not yet delivered; returns its generation. */
    public synchronized long request(PlanInputs inputs) {
        Objects.requireNonNull(inputs, "inputs");
        long gen = runner.generation() + 1;
        runner.submit(pauseMillis, progress -> compute(gen, inputs), new LatestJobRunner.Callback<Result>() {
            @Override
            public void progress(String stage, int done, int total) {
            }

            @Override
            public void finished(Result value) {
                onResult.accept(value);
            }

            @Override
            public void failed(String message) {
                onResult.accept(new Result(gen, List.of(), 0, message));
            }
        });
        return gen;
    }

    /** The budget for one plan, computed on the calling thread (the worker, or a test). */
    static Result compute(long gen, PlanInputs inputs) {
        long t0 = System.nanoTime();
        CampaignPlan p = Planner.plan(inputs, PlannerPrediction.STOP_WHEN_INTERRUPTED, true);
        Prediction designed = PlannerPrediction.designed(p);
        long nanos = System.nanoTime() - t0;
        if (p.design() == null) {
            return new Result(gen, List.of(), 0, null, designed, nanos);
        }
        return new Result(gen, p.design().best().expected(), p.design().best().delaysS().length, null, designed, nanos);
    }

    @Override
    public void close() {
        runner.close();
    }
}
