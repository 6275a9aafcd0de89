package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.ladderkin.plan.PlanInputs;

class RecomputeServiceTest {

    static final PlanInputs DEMO;

    static {
        PlanEditor e = new PlanEditor();
        e.open(PlanEditorTest.DEMO);
        DEMO = e.lastValid().orElseThrow();
    }

    static PlanInputs withTitle(String title) {
        return new PlanInputs(title, DEMO.lab(), DEMO.sample(), DEMO.laser(), DEMO.instruments(), DEMO.goals(),
                DEMO.multiplicationPhotonEnergiesJ(), DEMO.limits(), DEMO.modelOverrides());
    }

    static Prediction titled(PlanInputs in) {
        return new Prediction(List.of(), List.of(), List.of(), List.of(), in.title());
    }

    @Test
    void aBurstOfRequestsIsComputedOnceForTheNewest() throws Exception {
        List<String> computed = new CopyOnWriteArrayList<>();
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> {
            computed.add(in.title());
            return titled(in);
        }, 200, Runnable::run, delivered::add)) {
            for (int i = 1; i <= 5; i++) {
                s.request(withTitle("edit " + i));
            }
            RecomputeService.Result r = delivered.poll(5, TimeUnit.SECONDS);
            assertThat(r).isNotNull();
            assertThat(r.prediction().basis()).isEqualTo("edit 5");
            assertThat(r.generation()).isEqualTo(5);
            assertThat(delivered.poll(400, TimeUnit.MILLISECONDS)).isNull();
            assertThat(computed).containsExactly("edit 5");
        }
    }

    @Test
    void theDesignedPredictionReplacesThePreviewAndALatePreviewOfTheSameEditIsDropped() throws Exception {
        CountDownLatch previewStarted = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> {
            previewStarted.countDown();
            try {
                release.await(10, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            return titled(in);
        }, 0, Runnable::run, delivered::add)) {
            long gen = s.request(withTitle("preview of edit 1"));
            assertThat(previewStarted.await(5, TimeUnit.SECONDS)).isTrue();
            Prediction designed = new Prediction(List.of(), List.of(), List.of(), List.of(), "designed", true);
            s.showDesigned(designed, 0);
            RecomputeService.Result r = delivered.poll(5, TimeUnit.SECONDS);
            assertThat(r.prediction()).isSameAs(designed);
            assertThat(r.generation()).isEqualTo(gen);
            release.countDown();
            assertThat(delivered.poll(500, TimeUnit.MILLISECONDS)).as("the late preview").isNull();
            // a newer edit's preview is shown again
            s.request(withTitle("preview of edit 2"));
            assertThat(delivered.poll(5, TimeUnit.SECONDS).prediction().basis()).isEqualTo("preview of edit 2");
        }
    }

    @Test
    void aStaleComputationIsCancelledAndNeverDelivered() throws Exception {
        CountDownLatch slowStarted = new CountDownLatch(1);
        List<String> interrupted = new CopyOnWriteArrayList<>();
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> {
            if (in.title().equals("slow")) {
                slowStarted.countDown();
                try {
                    Thread.sleep(10_000);
                } catch (InterruptedException e) {
                    interrupted.add(in.title());
                    Thread.currentThread().interrupt();
                }
            }
            return titled(in);
        }, 0, Runnable::run, delivered::add)) {
            s.request(withTitle("slow"));
            assertThat(slowStarted.await(5, TimeUnit.SECONDS)).isTrue();
            s.request(withTitle("fast"));
            RecomputeService.Result r = delivered.poll(5, TimeUnit.SECONDS);
            assertThat(r.prediction().basis()).isEqualTo("fast");
            assertThat(interrupted).containsExactly("slow");
            assertThat(delivered.poll(200, TimeUnit.MILLISECONDS)).isNull();
        }
    }

    @Test
    void aFailureIsDeliveredAsAnErrorNotThrown() throws Exception {
        BlockingQueue<RecomputeService.Result> delivered = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> {
            throw new IllegalArgumentException("no such material");
        }, 0, Runnable::run, delivered::add)) {
            s.request(DEMO);
            RecomputeService.Result r = delivered.poll(5, TimeUnit.SECONDS);
            assertThat(r.prediction()).isNull();
            assertThat(r.error()).isEqualTo("no such material");
        }
    }

    @Test
    void computationNeverRunsOnTheRequestingThread() throws Exception {
        BlockingQueue<String> threads = new LinkedBlockingQueue<>();
        try (RecomputeService s = new RecomputeService(in -> {
            threads.add(Thread.currentThread().getName());
            return titled(in);
        }, 0, Runnable::run, r -> { })) {
            s.request(DEMO);
            assertThat(threads.poll(5, TimeUnit.SECONDS)).isEqualTo("ladderkin-recompute");
        }
    }
}
