package org.ladderkin.kinetics.train;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * The jump matrix E of an instantaneous pulse: a dot in (c, N, h) goes to (c, N+k, h+k) with the pulse's probability
 * of adding k excitons. Added excitons are hot when the ladder resolves hot excitons. Charged dots absorb like neutral
 * ones. Overflow: all k with N + k ≥ Nmax are lumped into N = Nmax (the added hot count then being Nmax − N), so
 * probability is conserved; choose Nmax so that this tail is negligible.
 */
public final class PulseMatrix {

    private PulseMatrix() {
    }

    /** E[to][from] for the given pulse on the given ladder. */
    public static double[][] of(LadderSpace space, PulseExcitation pulse) {
        int nMax = space.nMax();
        int length = Math.max(nMax + 1, pulse.cutoff(1e-18) + 2);
        double[] d = pulse.addedExcitons(length);
        // tail[k] = Σ_{j ≥ k} d[j], summed from the small end for accuracy
        double[] tail = new double[length + 1];
        for (int k = length - 1; k >= 0; k--) {
            tail[k] = tail[k + 1] + d[k];
        }
        int n = space.size();
        double[][] e = new double[n][n];
        for (int s = 0; s < n; s++) {
            int room = nMax - space.excitons(s);
            for (int k = 0; k <= room; k++) {
                int to = space.index(space.charge(s), space.excitons(s) + k, space.hot(s) + (space.hotResolved() ? k : 0));
                e[to][s] += k < room ? d[k] : tail[room];
            }
        }
        return e;
    }
}
