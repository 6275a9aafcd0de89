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
    /**
     * The ⟨N⟩ of Poisson excitation at which some probe energy near the band edge first shows net gain when the
     * multiexciton transitions are shifted by a biexciton interaction. A dot with N excitons (m = min(N, g) of them at
     * the edge) emits on m channels at E₁ + (m − 1)Δ and absorbs on g − m channels at E₁ + mΔ (pairwise interaction:
     * E(N) = N·E₁ + N(N − 1)Δ/2); every transition has the same Gaussian line of standard deviation w. Δ > 0 is a
     * repulsive biexciton (blue-shifted). With Δ = 0 this is {@link #poissonThreshold(int)}.
     *
     * @param degeneracy     g, the band-edge degeneracy
     * @param shiftOverWidth Δ/w
     */
    public static double poissonThreshold(int degeneracy, double shiftOverWidth) {
        if (degeneracy < 1 || !Double.isFinite(shiftOverWidth)) {
            throw new IllegalArgumentException("degeneracy must be >= 1 and the shift finite, were " + degeneracy + " and "
                    + shiftOverWidth);
        }
        if (shiftOverWidth == 0) {
            return poissonThreshold(degeneracy);
        }
        double lo = 1e-6;
        double hi = 10.0 * degeneracy + 10;
        for (int i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (bestGain(mid, degeneracy, shiftOverWidth) > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** The largest net gain (emission minus absorption, in channels) over probe energies near the band edge. */
    static double bestGain(double meanExcitons, int degeneracy, double shiftOverWidth) {
        int count = Occupancy.poissonCutoff(meanExcitons, 1e-16) + 2;
        double[] p = Occupancy.poisson(meanExcitons, count);
        double[] pm = new double[degeneracy + 1];
        for (int n = 0; n < p.length; n++) {
            pm[Math.min(n, degeneracy)] += p[n];
        }
        double from = Math.min(0, (degeneracy - 1) * shiftOverWidth) - 5;
        double to = Math.max(0, degeneracy * shiftOverWidth) + 5;
        int steps = (int) Math.ceil((to - from) / 0.01);
        double best = Double.NEGATIVE_INFINITY;
        for (int k = 0; k <= steps; k++) {
            double e = from + (to - from) * k / steps;
            double g = 0;
            for (int m = 0; m <= degeneracy; m++) {
                g += pm[m] * (m * line(e - (m - 1) * shiftOverWidth) - (degeneracy - m) * line(e - m * shiftOverWidth));
            }
            best = Math.max(best, g);
        }
        return best;
    }

    private static double line(double x) {
        return Math.exp(-0.5 * x * x);
    }
}
