package org.ladderkin.gui.model;

import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.Executor;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;
import org.ladderkin.fit.FitProgress;

/**
 * Runs background work where only the newest request matters (the live prediction, fits, the fit tab's preview
 * curves) on one daemon worker thread: a newer job cancels the older one by interrupting it (the fitter and the
 * planner stop at their next step), an optional delay lets a burst of requests cost one job, progress and results go
 * through {@code deliver} (the event thread in the planner), and a generation counter drops anything a newer job or
 * a cancel has made stale.
 */
public final class LatestJobRunner implements AutoCloseable {

    /** Work done on the worker thread. */
    @FunctionalInterface
    public interface Job<T> {
        T run(FitProgress progress);
    }

    /** Told about one job, through {@code deliver}; nothing arrives once the job is stale. */
    public interface Callback<T> {
        /** A progress report from the fitter. */
        void progress(String stage, int done, int total);

        /** The job's result. */
        void finished(T value);

        /** The job threw; {@code message} is one line. */
        void failed(String message);
    }

    private final Executor deliver;
    private final ScheduledExecutorService worker;
    private final AtomicLong generation = new AtomicLong();
    private Future<?> pending;

    /**
     * @param threadName names the worker thread (seen in thread dumps)
     * @param deliver    runs the callbacks (e.g. {@code SwingUtilities::invokeLater})
     */
    public LatestJobRunner(String threadName, Executor deliver) {
        Objects.requireNonNull(threadName, "threadName");
        this.deliver = Objects.requireNonNull(deliver, "deliver");
        this.worker = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, threadName);
            t.setDaemon(true);
            return t;
        });
    }

    /** Starts {@code job}, cancelling any older one; returns its generation. */
    public <T> long submit(Job<T> job, Callback<T> callback) {
        return submit(0, job, callback);
    }

    /** Starts {@code job} after {@code delayMillis} unless a newer job arrives first; cancels any older one. */
    public synchronized <T> long submit(long delayMillis, Job<T> job, Callback<T> callback) {
        Objects.requireNonNull(job, "job");
        Objects.requireNonNull(callback, "callback");
        if (delayMillis < 0) {
            throw new IllegalArgumentException("delay must be >= 0 ms, was " + delayMillis);
        }
        long gen = generation.incrementAndGet();
        if (pending != null) {
            pending.cancel(true);
        }
        pending = worker.schedule(() -> execute(gen, job, callback), delayMillis, TimeUnit.MILLISECONDS);
        return gen;
    }

    /** Cancels the running job (if any): it is interrupted and nothing more of it is delivered. */
    public synchronized void cancel() {
        generation.incrementAndGet();
        if (pending != null) {
            pending.cancel(true);
            pending = null;
        }
    }

    /** The generation of the newest job (or cancel). */
    public long generation() {
        return generation.get();
    }

    private <T> void execute(long gen, Job<T> job, Callback<T> callback) {
        if (gen != generation.get()) {
            return;
        }
        FitProgress progress = (stage, done, total) -> {
            if (gen == generation.get()) {
                deliver.execute(() -> {
                    if (gen == generation.get()) {
                        callback.progress(stage, done, total);
                    }
                });
            }
        };
        Runnable outcome;
        try {
            T value = job.run(progress);
            outcome = () -> callback.finished(value);
        } catch (CancellationException e) {
            return;
        } catch (RuntimeException e) {
            String message = e.getMessage() == null ? e.toString() : e.getMessage();
            outcome = () -> callback.failed(message);
        }
        if (Thread.currentThread().isInterrupted() || gen != generation.get()) {
            return;
        }
        Runnable delivered = outcome;
        deliver.execute(() -> {
            if (gen == generation.get()) {
                delivered.run();
            }
        });
    }

    /** Stops the worker; a running job is interrupted. */
    @Override
    public void close() {
        cancel();
        worker.shutdownNow();
    }
}
