package org.ladderkin.excite;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Integrals over [0, 1], split at given breakpoints, with Hipparchus' iterative Legendre–Gauss rule on each piece.
 * Every average in this package is written over a unit interval (normalised radius, or fractional depth), so one rule
 * serves all.
 */
final class UnitQuadrature {

    private static final double RELATIVE_ACCURACY = 1e-11;
    private static final double ABSOLUTE_ACCURACY = 1e-15;
    private static final int MAX_EVALUATIONS = 2_000_000;

    private UnitQuadrature() {
    }

    /** ∫₀¹ g(t) dt with breakpoints (values outside (0, 1) are ignored). */
    static double integrate(DoubleUnaryOperator g, double... breakpoints) {
        double[] cuts = Arrays.stream(breakpoints).filter(b -> b > 0 && b < 1).sorted().distinct().toArray();
        double sum = 0;
        double lo = 0;
        for (int i = 0; i <= cuts.length; i++) {
            double hi = i < cuts.length ? cuts[i] : 1;
            if (hi > lo) {
                IterativeLegendreGaussIntegrator rule =
                        new IterativeLegendreGaussIntegrator(8, RELATIVE_ACCURACY, ABSOLUTE_ACCURACY, 2, 64);
                sum += rule.integrate(MAX_EVALUATIONS, g::applyAsDouble, lo, hi);
            }
            lo = hi;
        }
        return sum;
    }
}
