package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class GainThresholdShiftTest {

    /** The n > 0 solving f(n) = 0 by bisection on [lo, hi], f changing sign once there. */
    private static double root(java.util.function.DoubleUnaryOperator f, double lo, double hi) {
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            if (Math.signum(f.applyAsDouble(mid)) == Math.signum(f.applyAsDouble(lo))) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    @Test
    @CheckedAgainst(source = "derived: g = 2, Poisson P(N) = e^{−n}nᴺ/N!. Without a biexciton shift every transition is at "
            + "E₁: emission 2P(≥2) + P(1) against absorption 2P(0) + P(1), so gain needs P(≥2) ≥ P(0), (2 + n)e^{−n} = 1, n = 1.1461932. With "
            + "a repulsive biexciton shifted far beyond the line width, X→XX absorption and XX→X emission sit at E₁ + Δ: "
            + "there gain needs 2P(≥2) ≥ P(1), i.e. (2 + 3n)e^{−n} = 2 (n = 0.76269), and at E₁ it needs P(1) ≥ 2P(0), "
            + "n ≥ 2; the threshold is the smaller", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void thresholdOfATwofoldLevelWithAndWithoutABiexcitonShift() {
        double noShift = root(n -> (2 + n) * Math.exp(-n) - 1, 0.1, 5);
        Reference.check("gain threshold ⟨N⟩, g = 2, Δ = 0", GainThreshold.poissonThreshold(2, 0), noShift, 1e-9);
        Reference.check("gain threshold ⟨N⟩, g = 2, Δ → 0⁺ (10⁻⁵ w)", GainThreshold.poissonThreshold(2, 1e-5), noShift, 1e-4);
        double farShift = root(n -> (2 + 3 * n) * Math.exp(-n) - 2, 0.1, 5);
        Reference.check("(2 + 3n)e^{−n} = 2 by hand", farShift, 0.76269, 1e-5);
        Reference.check("gain threshold ⟨N⟩, g = 2, repulsive Δ = 40 w", GainThreshold.poissonThreshold(2, 40), farShift, 1e-4);
    }

    @Test
    void theThresholdFallsSteadilyAsTheRepulsiveShiftOutgrowsTheLine() {
        double previous = GainThreshold.poissonThreshold(2, 0);
        for (double s : new double[] {0.5, 1, 2, 4, 8}) {
            double t = GainThreshold.poissonThreshold(2, s);
            assertThat(t).isLessThan(previous + 1e-6);
            previous = t;
        }
        // a fourfold level with no shift: the two-level filling rule
        assertThat(GainThreshold.poissonThreshold(4, 0)).isEqualTo(GainThreshold.poissonThreshold(4));
    }
}
