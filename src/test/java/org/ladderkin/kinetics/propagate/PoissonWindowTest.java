package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.hipparchus.distribution.discrete.PoissonDistribution;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The truncated Poisson weights behind uniformization: right values, and the dropped tails really below 1e-18. */
class PoissonWindowTest {

    static final String HIPPARCHUS = "Hipparchus 4.0.3 PoissonDistribution.probability (Loader's saddle-point expansion)";
    static final double[] MEANS = {1e-3, 0.5, 7.3, 100, 1730, 5e4};

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void keptWeightsAreThePoissonProbabilities() {
        for (double m : MEANS) {
            PoissonWindow w = PoissonWindow.of(m);
            PoissonDistribution ref = new PoissonDistribution(m);
            double worst = 0;
            for (int k = w.first(); k <= w.last(); k++) {
                double p = ref.probability(k);
                worst = Math.max(worst, Math.abs(w.weight(k) - p) / Math.max(p, 1e-300));
            }
            // the weights come from products of ratios, about √m + 10 roundings away from the mode
            Reference.check("max relative error of the kept Poisson weights, mean " + m, worst, 0, 1e-12);
        }
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void droppedTailsAreBelowTheStatedBound() {
        for (double m : MEANS) {
            PoissonWindow w = PoissonWindow.of(m);
            PoissonDistribution ref = new PoissonDistribution(m);
            double dropped = 0;
            for (int k = 0; k < w.first(); k++) {
                dropped += ref.probability(k);
            }
            for (int k = w.last() + 1; k < w.last() + 100 + 20 * Math.sqrt(m); k++) {
                dropped += ref.probability(k);
            }
            Reference.check("Poisson mass outside the window, mean " + m + " (bound 1e-18)", dropped, 0, PoissonWindow.TAIL);
        }
    }

    @Test
    void zeroMeanKeepsOnlyTheFirstTerm() {
        PoissonWindow w = PoissonWindow.of(0);
        assertThat(w.first()).isZero();
        assertThat(w.weights()).containsExactly(1.0);
    }
}
