package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Collects transitions into a dense generator Q with dp/dt = Q·p: a rate k from state i to state j adds k to
 * Q[j][i] and subtracts it from Q[i][i], so every column sums to zero and probability is conserved.
 */
public final class GeneratorBuilder {

    private final LadderSpace space;
    private final double[][] q;

    public GeneratorBuilder(LadderSpace space) {
        this.space = space;
        this.q = new double[space.size()][space.size()];
    }

    public LadderSpace space() {
        return space;
    }

    /** Adds a transition from state {@code from} to state {@code to} at {@code ratePerS} (1/s, ≥ 0). */
    public void add(int from, int to, double ratePerS) {
        if (!(ratePerS >= 0) || !Double.isFinite(ratePerS)) {
            throw new IllegalArgumentException("rate from " + space.describe(from) + " must be finite and >= 0, was "
                    + ratePerS + " 1/s");
        }
        if (from == to || ratePerS == 0) {
            return;
        }
        if (to < 0) {
            throw new IllegalArgumentException("transition from " + space.describe(from) + " leads outside the ladder");
        }
        q[to][from] += ratePerS;
        q[from][from] -= ratePerS;
    }

    /** Builds the generator from the given processes. */
    public static double[][] build(LadderSpace space, Iterable<? extends RateLaw> processes) {
        GeneratorBuilder b = new GeneratorBuilder(space);
        for (RateLaw law : processes) {
            law.contribute(space, b);
        }
        return b.matrix();
    }

    /** A copy of the generator assembled so far. */
    public double[][] matrix() {
        double[][] copy = new double[q.length][];
        for (int i = 0; i < q.length; i++) {
            copy[i] = q[i].clone();
        }
        return copy;
    }
}
