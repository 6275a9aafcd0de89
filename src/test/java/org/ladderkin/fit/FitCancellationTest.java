package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;

/** A fit stops when its thread is interrupted, and runs as before when it is not. */
class FitCancellationTest {

    private static final double SIGMA_M2 = 1e-19;

    private static Dataset series() {
        double[] j = LadderSeries.fluencesPerM2(5, SIGMA_M2);
        LadderBleachModel truth = LadderBleachModel.forModel(LadderSeries.BASE, "crossSectionM2", j, Double.NaN);
        Dataset d = LadderSeries.make(truth, List.of("crossSectionM2", "tauAuger2S"), new double[] {SIGMA_M2, 40e-12},
                SyntheticSeries.logDelays(0.5e-12, 2e-9, 50), 0.01, 0, 5e-5, 11);
        List<TraceMetadata> meta = new java.util.ArrayList<>();
        for (int i = 0; i < d.size(); i++) {
            meta.add(d.traces().get(i).metadata().with(java.util.Optional.of(
                    new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, j[i])), java.util.OptionalDouble.empty()));
        }
        return d.withMetadata(meta);
    }

    private static LadderFitSetup setup() {
        // τ₂ starts well away from the truth (40 ps) so the optimiser needs many evaluations
        return new LadderFitSetup(LadderSeries.BASE.withSeconds(org.ladderkin.kinetics.process.AugerProcess.BIEXCITON_LIFETIME, 90e-12),
                Double.NaN, Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2), 0.5 * SIGMA_M2, 0, Double.NaN,
                false, false);
    }

    @Test
    void aFitWhoseThreadIsInterruptedStopsAtTheNextModelEvaluation() {
        AtomicInteger evaluations = new AtomicInteger();
        FitProgress interruptAtThird = (stage, done, total) -> {
            if (stage.equals("evaluation") && evaluations.incrementAndGet() == 3) {
                Thread.currentThread().interrupt();
            }
        };
        try {
            assertThatThrownBy(() -> LadderFit.fit(series(), setup(), interruptAtThird))
                    .isInstanceOf(CancellationException.class).hasMessageContaining("cancelled");
            // the series is evaluated once per progress call; the interrupt is seen before the next one completes
            assertThat(evaluations.get()).isEqualTo(3);
            assertThat(Thread.currentThread().isInterrupted()).as("the flag is left for the caller").isTrue();
        } finally {
            Thread.interrupted();
        }
    }

    @Test
    void interruptingAFitRunningOnAnotherThreadEndsItPromptly() throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        AtomicReference<Throwable> thrown = new AtomicReference<>();
        Dataset data = series();
        Thread worker = new Thread(() -> {
            try {
                LadderFit.fit(data, setup(), (stage, done, total) -> {
                    if (started.getCount() > 0) {
                        started.countDown();
                        // hold the fit here until the interrupt arrives, so it cannot finish first on a busy machine
                        try {
                            new CountDownLatch(1).await(30, TimeUnit.SECONDS);
                        } catch (InterruptedException e) {
                            Thread.currentThread().interrupt();
                        }
                    }
                });
            } catch (Throwable t) {
                thrown.set(t);
            }
        }, "fit-under-test");
        worker.start();
        assertThat(started.await(30, TimeUnit.SECONDS)).isTrue();
        worker.interrupt();
        worker.join(TimeUnit.SECONDS.toMillis(30));
        assertThat(worker.isAlive()).isFalse();
        assertThat(thrown.get()).isInstanceOf(CancellationException.class);
    }

    @Test
    void anUninterruptedFitIsUnchangedByTheCheck() {
        LadderFit.Outcome quiet = LadderFit.fit(series(), setup(), FitProgress.NONE);
        LadderFit.Outcome watched = LadderFit.fit(series(), setup(), (stage, done, total) -> { });
        assertThat(quiet.result().ok()).as(quiet.result().message()).isTrue();
        ParameterEstimate tau = quiet.result().estimate("tauAuger2S");
        assertThat(Math.abs(tau.value() - 40e-12)).as(tau.value() + " ± " + tau.stdError()).isLessThan(4 * tau.stdError());
        assertThat(watched.result().estimate("tauAuger2S").value()).isEqualTo(tau.value());
        assertThat(watched.result().evaluations()).isEqualTo(quiet.result().evaluations());
    }
}
