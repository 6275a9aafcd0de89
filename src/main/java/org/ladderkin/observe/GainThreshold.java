package org.ladderkin.observe;

import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.ladderkin.excite.Occupancy;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;

/**
 * Optical gain in the two-level picture of a g-fold band-edge level (electrons and holes both block): the ensemble
 * is transparent when the mean filling Σ min(N, g)·P(N) reaches g/2, and shows gain above it.
 */
public final class GainThreshold {

    private GainThreshold() {
    }

    /** The ⟨N⟩ of Poisson excitation at which the band edge reaches transparency. */
    public static double poissonThreshold(int degeneracy) {
        if (degeneracy < 1) {
            throw new IllegalArgumentException("degeneracy must be >= 1, was " + degeneracy);
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-14, 1e-14, 1e-15, 5);
        return solver.solve(500, n -> meanFilling(n, degeneracy) - 0.5, 1e-6, 10.0 * degeneracy + 10);
    }

    /** Mean filling Σ min(N, g)·P(N)/g of Poisson excitation with mean ⟨N⟩. */
    public static double meanFilling(double meanExcitons, int degeneracy) {
        int count = Occupancy.poissonCutoff(meanExcitons, 1e-16) + 2;
        double[] p = Occupancy.poisson(meanExcitons, count);
        double s = 0;
        for (int n = 0; n < p.length; n++) {
            s += Math.min(n, degeneracy) * p[n];
        }
        return s / degeneracy;
    }

    /**
     * How long the band edge stays above transparency after the pulse that produced {@code afterPulse}: the first
     * time the mean two-level filling falls below 1/2, by bisection in log time. Zero when there is no gain at all.
     */
    public static double gainLifetimeS(LadderKinetics kinetics, Populations afterPulse, int degeneracy) {
        double[] o = BandEdgeFilling.twoLevel(degeneracy).observable(kinetics.space());
        // the two-level observable is w_e f_e + w_h f_h = 2f: transparency at 1
        if (afterPulse.expectation(o) <= 1) {
            return 0;
        }
        double lo = 1e-16;
        double hi = 1e-15;
        while (kinetics.propagate(afterPulse, hi).expectation(o) > 1) {
            lo = hi;
            hi *= 10;
            if (hi > 10) {
                throw new IllegalStateException("gain does not decay within 10 s: the model has no recombination");
            }
        }
        for (int i = 0; i < 100 && hi / lo > 1 + 1e-12; i++) {
            double mid = Math.sqrt(lo * hi);
            if (kinetics.propagate(afterPulse, mid).expectation(o) > 1) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.sqrt(lo * hi);
    }
}
