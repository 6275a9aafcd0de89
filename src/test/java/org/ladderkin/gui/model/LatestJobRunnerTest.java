package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** The fit thread: newest job wins, cancel interrupts and silences, failures arrive as one line, all via deliver. */
class LatestJobRunnerTest {

    final LinkedBlockingQueue<Runnable> delivered = new LinkedBlockingQueue<>();
    final LatestJobRunner runner = new LatestJobRunner("ladderkin-test", delivered::add);
    final List<String> seen = new CopyOnWriteArrayList<>();

    @AfterEach
    void close() {
        runner.close();
    }

    LatestJobRunner.Callback<String> recorder(String name) {
        return new LatestJobRunner.Callback<>() {
            @Override
            public void progress(String stage, int done, int total) {
                seen.add(name + " progress " + stage + " " + done + "/" + total);
            }

            @Override
            public void finished(String value) {
                seen.add(name + " finished " + value);
            }

            @Override
            public void failed(String message) {
                seen.add(name + " failed " + message);
            }
        };
    }

    /** Runs what the worker handed over, on this thread, until {@code n} callbacks were seen. */
    void drainUntil(int n) throws InterruptedException {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (seen.size() < n && System.nanoTime() < end) {
            Runnable r = delivered.poll(50, TimeUnit.MILLISECONDS);
            if (r != null) {
                r.run();
            }
        }
    }

    @Test
    void progressAndResultArriveThroughDeliver() throws Exception {
        runner.submit(p -> {
            p.update("evaluation", 1, 10);
            return "ok";
        }, recorder("a"));
        drainUntil(2);
        assertThat(seen).containsExactly("a progress evaluation 1/10", "a finished ok");
    }

    @Test
    void aNewerJobInterruptsTheOlderWhoseResultNeverArrives() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch interrupted = new CountDownLatch(1);
        runner.submit(p -> {
            started.countDown();
            try {
                Thread.sleep(60_000);
            } catch (InterruptedException e) {
                interrupted.countDown();
            }
            return "stale";
        }, recorder("old"));
        assertThat(started.await(30, TimeUnit.SECONDS)).isTrue();
        runner.submit(p -> "fresh", recorder("new"));
        assertThat(interrupted.await(30, TimeUnit.SECONDS)).as("the older job was interrupted").isTrue();
        drainUntil(1);
        assertThat(seen).containsExactly("new finished fresh");
    }

    @Test
    void cancelSilencesTheRunningJob() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch interrupted = new CountDownLatch(1);
        runner.submit(p -> {
            started.countDown();
            try {
                Thread.sleep(60_000);
            } catch (InterruptedException e) {
                interrupted.countDown();
            }
            p.update("evaluation", 2, 10);
            return "late";
        }, recorder("a"));
        assertThat(started.await(30, TimeUnit.SECONDS)).isTrue();
        runner.cancel();
        assertThat(interrupted.await(30, TimeUnit.SECONDS)).isTrue();
        runner.submit(p -> "next", recorder("b"));
        drainUntil(1);
        assertThat(seen).containsExactly("b finished next");
    }

    @Test
    void aJobThatThrowsArrivesAsItsMessage() throws Exception {
        runner.submit(p -> {
            throw new IllegalArgumentException("fitting τ₂ needs a model with biexciton Auger decay switched on");
        }, recorder("a"));
        drainUntil(1);
        assertThat(seen).containsExactly("a failed fitting τ₂ needs a model with biexciton Auger decay switched on");
    }
}
