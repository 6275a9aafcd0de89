package org.ladderkin.gui.model;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import org.ladderkin.plan.PlanInputs;

/**
 * Recomputes the prediction in the background after edits: requests are debounced (a burst of keystrokes costs one
 * computation), a newer request cancels the older one, and only the result of the newest request is delivered.
 * The work runs on a {@link LatestJobRunner}; results go through {@code deliver} (the event thread in the planner,
 * the caller's thread in tests), and its generation counter makes sure a slow stale computation can never overwrite
 * a fresh one. The quick prediction is a preview; once the full plan of the same edit is known
 * ({@link #showDesigned}) it replaces the preview and a late preview of that edit is dropped.
 *
 * <p>No prediction may hold the planner: one that runs longer than its time limit is cancelled (its thread is
 * interrupted; the engine stops at its next step) and a result carrying a one-line reason is delivered instead, so
 * the window says what happened and the next edit is computed at once.
 */
public final class RecomputeService implements AutoCloseable {

    /** Longest a prediction may run before it is stopped (the engine's own work bound is about ten seconds a step). */
    public static final long DEFAULT_TIMEOUT_MILLIS = 20_000;

    /**
     * One delivered outcome.
     *
     * @param generation which request it answers (increasing)
     * @param prediction the prediction, or null when it failed
     * @param error      why it failed, or null
     * @param computeNanos how long the computation took (not counting the debounce)
     */
    public record Result(long generation, Prediction prediction, String error, long computeNanos) {
    }

    private final PredictionSource source;
    private final long debounceMillis;
    private final Consumer<Result> onResult;
    private final LatestJobRunner runner;
    private final Executor deliver;
    private final long timeoutMillis;
    private final ScheduledExecutorService watchdog;
    /** Newest generation whose designed prediction was shown; previews up to it are outdated (guarded by this). */
    private long designedGeneration;

    /**
     * @param debounceMillis wait this long after the last request before computing
     * @param deliver        runs the result callback (e.g. {@code SwingUtilities::invokeLater})
     * @param onResult       receives each current result
     */
    public RecomputeService(PredictionSource source, long debounceMillis, Executor deliver, Consumer<Result> onResult) {
        this(source, debounceMillis, DEFAULT_TIMEOUT_MILLIS, deliver, onResult);
    }

    /**
     * @param timeoutMillis a prediction running longer than this is stopped and reported as failed
     */
    public RecomputeService(PredictionSource source, long debounceMillis, long timeoutMillis, Executor deliver,
                            Consumer<Result> onResult) {
        this.source = Objects.requireNonNull(source, "source");
        if (debounceMillis < 0) {
            throw new IllegalArgumentException("debounce must be >= 0 ms, was " + debounceMillis);
        }
        if (timeoutMillis <= 0) {
            throw new IllegalArgumentException("time limit must be > 0 ms, was " + timeoutMillis);
        }
        this.debounceMillis = debounceMillis;
        this.timeoutMillis = timeoutMillis;
        this.onResult = Objects.requireNonNull(onResult, "onResult");
        this.deliver = Objects.requireNonNull(deliver, "deliver");
        this.runner = new LatestJobRunner("ladderkin-recompute", deliver);
        this.watchdog = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "ladderkin-recompute-watchdog");
            t.setDaemon(true);
            return t;
        });
    }

    /** Asks for a prediction of {@code inputs}, replacing any request not yet delivered; returns its generation. */
    public synchronized long request(PlanInputs inputs) {
        Objects.requireNonNull(inputs, "inputs");
        // this service is the runner's only client and requests are serialised, so the next generation is known
        long gen = runner.generation() + 1;
        long submitted = runner.submit(debounceMillis, progress -> compute(gen, inputs), new LatestJobRunner.Callback<Result>() {
            @Override
            public void progress(String stage, int done, int total) {
            }

            @Override
            public void finished(Result value) {
                if (!supersededByDesign(value.generation())) {
                    onResult.accept(value);
                }
            }

            @Override
            public void failed(String message) {
                if (!supersededByDesign(gen)) {
                    onResult.accept(new Result(gen, null, message, 0));
                }
            }
        });
        if (submitted != gen) {
            throw new IllegalStateException("recompute runner shared with another client (generation " + submitted
                    + ", expected " + gen + ")");
        }
        return gen;
    }

    /**
     * Shows the full plan's prediction for the newest request in place of its preview: call it with what the design
     * search delivered for the same edit (the caller checks that no newer edit came in meanwhile). Delivered through
     * the same callback, on the calling thread (the event thread in the planner).
     */
    public void showDesigned(Prediction designed, long computeNanos) {
        Objects.requireNonNull(designed, "designed");
        long gen;
        synchronized (this) {
            gen = runner.generation();
            designedGeneration = gen;
        }
        onResult.accept(new Result(gen, designed, null, computeNanos));
    }

    private synchronized boolean supersededByDesign(long generation) {
        return generation <= designedGeneration;
    }

    /** The generation of the newest request. */
    public long generation() {
        return runner.generation();
    }

    /** One prediction; a failure becomes a result carrying its reason, a cancellation is passed on (and dropped). */
    private Result compute(long gen, PlanInputs inputs) {
        long t0 = System.nanoTime();
        ScheduledFuture<?> dog = watchdog.schedule(() -> timedOut(gen, t0), timeoutMillis, TimeUnit.MILLISECONDS);
        try {
            return new Result(gen, source.predict(inputs), null, System.nanoTime() - t0);
        } catch (java.util.concurrent.CancellationException e) {
            throw e;
        } catch (RuntimeException e) {
            return new Result(gen, null, e.getMessage() == null ? e.toString() : e.getMessage(), System.nanoTime() - t0);
        } finally {
            dog.cancel(false);
        }
    }

    /** The watchdog: stops the prediction of {@code gen} if it is still the newest and says so. */
    private void timedOut(long gen, long startNanos) {
        synchronized (this) {
            if (runner.generation() != gen || supersededByDesign(gen)) {
                return;
            }
            runner.cancel();
        }
        long elapsed = System.nanoTime() - startNanos;
        String message = String.format(java.util.Locale.ROOT, "stopped after %.1f s, too much work to predict while"
                + " editing: lower the highest fluence (⟨N⟩) or simplify the model (charges, cooling)", elapsed / 1e9);
        deliver.execute(() -> onResult.accept(new Result(gen, null, message, elapsed)));
    }

    /** Stops the worker; pending requests are dropped. */
    @Override
    public void close() {
        runner.close();
        watchdog.shutdownNow();
    }
}
