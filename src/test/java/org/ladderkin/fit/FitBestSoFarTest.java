package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import org.junit.jupiter.api.Test;

/** An optimiser stopped at its limit leaves the best point it met, marked as not converged and explained. */
class FitBestSoFarTest {

    /** Options with an iteration limit far below what the biexponential series needs, recording every best. */
    private static FitOptions cut(int iterations, List<FitProgress.Best> bests) {
        FitOptions d = FitOptions.defaults();
        return new FitOptions(List.of(), iterations, d.maxEvaluations(), false, d.autocorrelationLags(), List.of(),
                new FitProgress() {
                    @Override
                    public void update(String stage, int done, int total) {
                    }

                    @Override
                    public void improved(Best best) {
                        bests.add(best);
                    }
                });
    }

    @Test
    void theIterationLimitLeavesTheBestPointMetMarkedAsNotConverged() {
        FitProblem problem = GlobalFitterTest.biexponential(42, false);
        List<FitProgress.Best> bests = new ArrayList<>();
        FitResult r = GlobalFitter.fit(problem, cut(2, bests));

        assertThat(r.status()).as(r.message()).isEqualTo(FitResult.Status.NOT_CONVERGED);
        assertThat(r.ok()).isTrue();
        assertThat(r.converged()).isFalse();
        assertThat(r.statusText()).isEqualTo("not converged");
        assertThat(r.message()).startsWith("the optimiser reached its 2-iteration limit before converging")
                .contains("the values shown are the best point so far").contains("not converged");
        // the result is the lowest χ² the progress listener was told of, and better than the start
        assertThat(bests).hasSizeGreaterThan(1);
        FitProgress.Best last = bests.get(bests.size() - 1);
        assertThat(last.reducedChiSquare()).isLessThan(bests.get(0).reducedChiSquare());
        assertThat(r.estimate("tau1S").value()).isEqualTo(last.values().get("tau1S"));
        assertThat(r.estimate("tau2S").value()).isEqualTo(last.values().get("tau2S"));
        assertThat(r.estimate("tau1S").stdError()).isNaN();
        assertThat(r.residuals()).hasSize(4);
        // the reduced χ² a listener sees is measured against the data's noise, as the finished fit's quality is
        FitQuality q = FitQuality.of(problem.data(), r);
        assertThat(last.reducedChiSquare()).isCloseTo(q.reducedChiSquare(), org.assertj.core.data.Percentage.withPercentage(1e-6));
    }

    @Test
    void aStoppedRunNamesTheParametersStillMoving() {
        FitResult r = GlobalFitter.fit(GlobalFitterTest.biexponential(42, false), cut(2, new ArrayList<>()));
        assertThat(r.status()).isEqualTo(FitResult.Status.NOT_CONVERGED);
        assertThat(r.message()).containsPattern("still moving at the end: [^;]*\\([+-]\\d+ %\\)");
    }

    @Test
    void aConvergedFitIsUnchanged() {
        List<FitProgress.Best> bests = new ArrayList<>();
        FitResult r = GlobalFitter.fit(GlobalFitterTest.biexponential(42, false), cut(200, bests));
        assertThat(r.status()).as(r.message()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(r.converged()).isTrue();
        FitProgress.Best last = bests.get(bests.size() - 1);
        assertThat(last.values().get("tau2S")).isEqualTo(r.estimate("tau2S").value());
        // white noise of 2e-5 against its own scatter: near 1
        assertThat(last.reducedChiSquare()).isBetween(0.8, 1.25);
    }

    @Test
    void aCancelledFitHasToldItsListenerTheBestPointBeforeStopping() {
        List<FitProgress.Best> bests = new ArrayList<>();
        FitOptions d = FitOptions.defaults();
        FitOptions options = new FitOptions(List.of(), 200, d.maxEvaluations(), false, 5, List.of(), new FitProgress() {
            @Override
            public void update(String stage, int done, int total) {
            }

            @Override
            public void improved(Best best) {
                bests.add(best);
                if (bests.size() == 3) {
                    Thread.currentThread().interrupt();
                }
            }
        });
        try {
            GlobalFitter.fit(GlobalFitterTest.biexponential(42, false), options);
            throw new AssertionError("the fit should have been cancelled");
        } catch (CancellationException expected) {
            assertThat(Thread.interrupted()).isTrue();
        }
        assertThat(bests).hasSize(3);
        assertThat(bests.get(2).evaluations()).isGreaterThan(bests.get(0).evaluations());
        assertThat(bests.get(2).values()).containsKeys("tau1S", "tau2S", "weight2");
    }
}
