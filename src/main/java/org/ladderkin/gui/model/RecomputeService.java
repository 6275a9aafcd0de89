package org.ladderkin.gui.model;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import org.ladderkin.plan.PlanInputs;

/**
 * Recomputes the prediction in the background after edits: requests are debounced (a burst of keystrokes costs one
 * computation), a newer request cancels the older one, and only the result of the newest request is delivered.
 * One worker thread; results go through {@code deliver} (the event thread in the planner, the caller's thread in
 * tests). A generation counter decides which result is current, so a slow stale computation can never overwrite a
 * fresh one.
 */
public final class RecomputeService implements AutoCloseable {

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
    private final Executor deliver;
    private final Consumer<Result> onResult;
    private final ScheduledExecutorService worker;
    private final AtomicLong generation = new AtomicLong();
    private Future<?> pending;

    /**
     * @param debounceMillis wait this long after the last request before computing
     * @param deliver        runs the result callback (e.g. {@code SwingUtilities::invokeLater})
     * @param onResult       receives each current result
     */
    public RecomputeService(PredictionSource source, long debounceMillis, Executor deliver, Consumer<Result> onResult) {
        this.source = Objects.requireNonNull(source, "source");
        if (debounceMillis < 0) {
            throw new IllegalArgumentException("debounce must be >= 0 ms, was " + debounceMillis);
        }
        this.debounceMillis = debounceMillis;
        this.deliver = Objects.requireNonNull(deliver, "deliver");
        this.onResult = Objects.requireNonNull(onResult, "onResult");
        this.worker = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "ladderkin-recompute");
            t.setDaemon(true);
            return t;
        });
    }

    /** Asks for a prediction of {@code inputs}, replacing any request not yet delivered; returns its generation. */
    public synchronized long request(PlanInputs inputs) {
        Objects.requireNonNull(inputs, "inputs");
        long gen = generation.incrementAndGet();
        if (pending != null) {
            pending.cancel(true);
        }
        pending = worker.schedule(() -> compute(gen, inputs), debounceMillis, TimeUnit.MILLISECONDS);
        return gen;
    }

    /** The generation of the newest request. */
    public long generation() {
        return generation.get();
    }

    private void compute(long gen, PlanInputs inputs) {
        if (gen != generation.get()) {
            return;
        }
        long t0 = System.nanoTime();
        Result result;
        try {
            Prediction p = source.predict(inputs);
            result = new Result(gen, p, null, System.nanoTime() - t0);
        } catch (RuntimeException e) {
            result = new Result(gen, null, e.getMessage() == null ? e.toString() : e.getMessage(), System.nanoTime() - t0);
        }
        if (Thread.currentThread().isInterrupted() || gen != generation.get()) {
            return;
        }
        Result delivered = result;
        deliver.execute(() -> {
            if (delivered.generation() == generation.get()) {
                onResult.accept(delivered);
            }
        });
    }

    /** Stops the worker; pending requests are dropped. */
    @Override
    public void close() {
        worker.shutdownNow();
    }
}
