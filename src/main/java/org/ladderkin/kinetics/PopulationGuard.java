package org.ladderkin.kinetics;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * The invariants of a probability vector: total 1 within {@value #SUM_TOLERANCE} and no entry below
 * −{@value #NEGATIVE_TOLERANCE}. A violation is a numerical failure or a bug, never physics, so it throws with the
 * state and the time.
 */
public final class PopulationGuard {

    public static final double SUM_TOLERANCE = 1e-12;
    public static final double NEGATIVE_TOLERANCE = 1e-15;

    private PopulationGuard() {
    }

    /** Checks {@code p} at time {@code tS} (seconds, in the frame named by {@code where}). */
    public static void check(LadderSpace space, double[] p, double tS, String where) {
        double sum = 0;
        for (int s = 0; s < p.length; s++) {
            if (!(p[s] >= -NEGATIVE_TOLERANCE)) {
                throw new IllegalStateException("population of state " + space.describe(s) + " is " + p[s] + " at t = "
                        + tS + " s " + where + " (below -" + NEGATIVE_TOLERANCE + ")");
            }
            sum += p[s];
        }
        if (!(Math.abs(sum - 1) <= SUM_TOLERANCE)) {
            throw new IllegalStateException("total probability is 1 " + (sum >= 1 ? "+ " : "- ") + Math.abs(sum - 1)
                    + " at t = " + tS + " s " + where + " (allowed ±" + SUM_TOLERANCE + "; largest state "
                    + space.describe(largest(p)) + ")");
        }
    }

    private static int largest(double[] p) {
        int k = 0;
        for (int s = 1; s < p.length; s++) {
            if (p[s] > p[k]) {
                k = s;
            }
        }
        return k;
    }
}
