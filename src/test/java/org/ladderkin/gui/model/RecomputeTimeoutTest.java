package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CancellationException;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.propagate.ExactPropagator;

/** A prediction past its time limit is stopped and reported; the planner's next edit is computed at once. */
class RecomputeTimeoutTest {

    /** Stands for an engine step that runs until its thread is interrupted (the engine checks once per step). */
    private static Prediction endless() {
        while (!Thread.currentThread().isInterrupted()) {
            Thread.onSpinWait();
        }
        throw new CancellationException("interrupted");
    }

    @Test
    void aPredictionPastItsTimeLimitIsStoppedWithAClearMessage() throws Exception {
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> in.title().equals("slow") ? endless()
                : RecomputeServiceTest.titled(in), 0, 300, Runnable::run, delivered::add)) {
            long gen = s.request(RecomputeServiceTest.withTitle("slow"));
            RecomputeService.Result r = delivered.poll(10, TimeUnit.SECONDS);
            assertThat(r).isNotNull();
            assertThat(r.generation()).isEqualTo(gen);
            assertThat(r.prediction()).isNull();
            assertThat(r.error()).matches("stopped after [0-9]+\\.[0-9] s, too much work to predict while editing: .*")
                    .doesNotContain("\n");
            // the worker was freed: the next edit is predicted
            s.request(RecomputeServiceTest.withTitle("quick"));
            RecomputeService.Result next = delivered.poll(10, TimeUnit.SECONDS);
            assertThat(next).isNotNull();
            assertThat(next.prediction().basis()).isEqualTo("quick");
            assertThat(delivered.poll(400, TimeUnit.MILLISECONDS)).isNull();
        }
    }

    @Test
    void aQuickPredictionIsNotStopped() throws Exception {
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(RecomputeServiceTest::titled, 0, 300, Runnable::run,
                delivered::add)) {
            s.request(RecomputeServiceTest.withTitle("quick"));
            assertThat(delivered.poll(10, TimeUnit.SECONDS).error()).isNull();
            assertThat(delivered.poll(600, TimeUnit.MILLISECONDS)).as("no late timeout").isNull();
        }
    }

    /** The engine's loops stop on an interrupted thread instead of running their step to the end. */
    @Test
    void theEngineStopsOnAnInterruptedThread() {
        double[][] q = {{0, 1e9}, {0, -1e9}};
        ExactPropagator p = ExactPropagator.of(q);
        Thread.currentThread().interrupt();
        try {
            org.assertj.core.api.Assertions.assertThatThrownBy(() -> p.onGrid(new double[] {1e-9, 2e-9}))
                    .isInstanceOf(CancellationException.class);
        } finally {
            Thread.interrupted();
        }
    }
}
