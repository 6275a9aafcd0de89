package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class PhotonCountingStatisticsTest {

    @Test
    @CheckedAgainst(source = "derived: photon arrival times of a mono-exponential decay recorded over a window T are a "
            + "truncated exponential, p(t) = e^{−t/τ}/(τ(1 − e^{−T/τ})); the score ∂ln p/∂τ is t/τ² + const, so the Fisher "
            + "information per count is Var(t)/τ⁴ with Var(t) = τ² − T²e^{−T/τ}/(1 − e^{−T/τ})², and the Cramér–Rao "
            + "variance of the maximum-likelihood lifetime from N counts is τ⁴/(N·Var(t)); for T ≫ τ, σ_τ/τ = 1/√N "
            + "(Poisson limit)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void precisionFactorIsTheCramerRaoBoundOfTheTruncatedExponential() {
        // a window of 30 lifetimes: Poisson-limited
        Reference.checkRelative("F for T = 30 τ", PhotonCountingStatistics.precisionFactor(1, 30), 1, 1e-9);
        // T = 2τ by hand: Var/τ² = 1 − 4e^{−2}/(1 − e^{−2})² = 1 − 0.5413411/0.7476450 = 0.2759...
        double x = 2;
        double var = 1 - x * x * Math.exp(-x) / Math.pow(1 - Math.exp(-x), 2);
        Reference.checkRelative("F for T = 2 τ", PhotonCountingStatistics.precisionFactor(45e-9, 90e-9), 1 / Math.sqrt(var), 1e-12);
        Reference.checkRelative("Var(t)/τ² for T = 2 τ, by hand", var, 0.27592, 1e-4);
        // 1 % needs F²·10⁴ counts
        Reference.checkRelative("counts for 1 % at T = 2 τ", PhotonCountingStatistics.countsFor(45e-9, 90e-9, 0.01),
                1e4 / var, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "Monte Carlo: 600 simulated decays of 2000 counts each over T = 2 τ, each fitted by maximum "
            + "likelihood (the truncated-exponential likelihood equation solved by bisection); the scatter of the fitted "
            + "lifetimes against F/√N", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void precisionFactorMatchesTheScatterOfSimulatedFits() {
        SplittableRandom rnd = new SplittableRandom(14);
        double tau = 1;
        double window = 2;
        int counts = 2000;
        int runs = 600;
        double sum = 0;
        double sum2 = 0;
        for (int r = 0; r < runs; r++) {
            double mean = 0;
            for (int i = 0; i < counts; i++) {
                // inverse transform of the truncated exponential
                double u = rnd.nextDouble();
                mean += -tau * Math.log(1 - u * (1 - Math.exp(-window / tau)));
            }
            mean /= counts;
            double fit = maximumLikelihoodTau(mean, window);
            sum += fit;
            sum2 += fit * fit;
        }
        double sd = Math.sqrt(sum2 / runs - Math.pow(sum / runs, 2));
        // 600 runs give the standard deviation to about 1/√(2·600) = 3 %
        Reference.checkRelative("σ_τ/τ of 2000 counts over T = 2 τ", sd / tau,
                PhotonCountingStatistics.relativeError(tau, window, counts), 0.1);
    }

    /** The τ whose truncated-exponential mean E[t] = τ − T/(e^{T/τ} − 1) equals the sample mean. */
    private static double maximumLikelihoodTau(double mean, double window) {
        double lo = 1e-3;
        double hi = 1e3;
        for (int i = 0; i < 200; i++) {
            double mid = Math.sqrt(lo * hi);
            double m = mid - window / Math.expm1(window / mid);
            if (m < mean) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.sqrt(lo * hi);
    }

    @Test
    void refusesWindowsAndCountsThatCannotGiveALifetime() {
        assertThatThrownBy(() -> PhotonCountingStatistics.precisionFactor(0, 1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> PhotonCountingStatistics.countsFor(1, 1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> PhotonCountingStatistics.relativeError(1, 1, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThat(PhotonCountingStatistics.precisionFactor(1, 0.5)).isGreaterThan(PhotonCountingStatistics.precisionFactor(1, 2));
    }
}
