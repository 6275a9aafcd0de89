package org.ladderkin.kinetics.propagate;

import org.junit.jupiter.api.Test;
import org.ladderkin.excite.Occupancy;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The implicit integrator (Radau IIA) against the exact block-modal propagator on the same generator. */
class ImplicitVersusExactTest {

    @Test
    @CheckedAgainst(source = "derived: Bateman solution of the chain N → N−1 with distinct rates (relative gaps 64 %, so no"
            + " clustering), evaluated by ExactPropagator's modal back-substitution", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void radauAgreesWithExactPropagatorOn30StateLadder() {
        // 30 states N = 0..29, N → N−1 at rates geometric from 1/(1 µs) (N = 1) to 1/(1 ps) (N = 29)
        int n = 30;
        double[][] q = new double[n][n];
        for (int k = 1; k < n; k++) {
            double rate = 1e6 * Math.pow(1e6, (k - 1) / 28.0);
            q[k][k] = -rate;
            q[k - 1][k] = rate;
        }
        double[] p0 = Occupancy.poisson(8, n);
        double lost = 0;
        for (double x : p0) {
            lost += x;
        }
        p0[n - 1] += 1 - lost;
        double[] times = {1e-13, 1e-12, 1e-11, 1e-10, 1e-9, 1e-8, 1e-7, 1e-6, 3e-6};
        double[][] implicit = new ImplicitStiffIntegrator(new Tolerances(1e-14, 1e-11))
                .integrate(new GeneratorSystem(q), 0, p0, times).states();
        ExactPropagator exact = ExactPropagator.of(q);
        org.assertj.core.api.Assertions.assertThat(exact.clusteredStates()).isZero();
        double worst = 0;
        for (int j = 0; j < times.length; j++) {
            double[] ref = exact.propagate(p0, times[j]);
            for (int i = 0; i < n; i++) {
                // relative to the population itself, for every population above 1e-6
                if (ref[i] > 1e-6) {
                    worst = Math.max(worst, Math.abs(implicit[j][i] - ref[i]) / ref[i]);
                }
            }
        }
        Reference.check("max relative difference implicit vs exact, populations > 1e-6, 30-state ladder, 0.1 ps..3 µs",
                worst, 0, 1e-8);
    }
}
