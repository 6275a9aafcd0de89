package org.ladderkin.kinetics.propagate;

/**
 * Exact propagation for a generator with a fast transient: a set S of states that Q never leaves (an invariant
 * subspace, e.g. dots without hot excitons) and a settle time t_s after which the mass outside S is below
 * {@link #LEAK} for every start (the caller proves that bound, e.g. from the cooling rate).
 *
 * <p>Why: a modal (eigenvector) method fails on ladders that resolve hot excitons, whose rates h·k_cool are equally
 * spaced; their eigenbasis is conditioned like binomial coefficients. Uniformization ({@link Uniformization}) has
 * no such problem (all its terms are ≥ 0) but costs Λt products, so it is used only on [0, t_s]. After t_s the
 * population lives on S, where Q restricted to S (the plain ladder) has a well-conditioned modal decomposition:
 * p(t) = exp(Q_S·(t − t_s))·p_S(t_s), with the dropped outside mass below LEAK, checked at run time.
 */
public final class SettlingPropagator implements Propagator {

    /** Largest mass outside S accepted at t_s, relative to the total (the caller's bound is far smaller). */
    public static final double LEAK = 1e-15;

    final int n;
    final int[] settled;
    private final double settleTimeS;
    private final double[][] q;
    final Uniformization forward;
    final ExactPropagator late;
    private final boolean conservative;
    private double[][] settleRows;
    private Uniformization adjoint;

    private SettlingPropagator(double[][] q, int[] settled, double settleTimeS) {
        this.n = q.length;
        this.q = q;
        this.settled = settled;
        this.settleTimeS = settleTimeS;
        this.forward = Uniformization.of(q);
        double[][] sub = new double[settled.length][settled.length];
        for (int a = 0; a < settled.length; a++) {
            for (int b = 0; b < settled.length; b++) {
                sub[a][b] = q[settled[a]][settled[b]];
            }
        }
        this.late = ExactPropagator.of(sub);
        this.conservative = DenseLinear.columnsSumToZero(q) && groundFeedsNothing(q);
    }

    /**
     * @param q generator (1/s), off-diagonal entries ≥ 0 (not modified)
     * @param settled indices of the invariant set S, increasing
     * @param settleTimeS t_s (s), after which at most {@link #LEAK} of the mass is outside S
     */
    public static SettlingPropagator of(double[][] q, int[] settled, double settleTimeS) {
        int n = q.length;
        if (!(settleTimeS >= 0) || !Double.isFinite(settleTimeS)) {
            throw new IllegalArgumentException("settle time must be finite and >= 0, was " + settleTimeS + " s");
        }
        boolean[] in = new boolean[n];
        int previous = -1;
        for (int s : settled) {
            if (s <= previous || s >= n) {
                throw new IllegalArgumentException("settled states must be increasing indices below " + n + ", got " + s);
            }
            in[s] = true;
            previous = s;
        }
        for (int j : settled) {
            for (int i = 0; i < n; i++) {
                if (!in[i] && q[i][j] != 0) {
                    throw new IllegalArgumentException("settled set is not invariant: Q[" + i + "][" + j + "] = "
                            + q[i][j] + " 1/s leads out of it");
                }
            }
        }
        double[][] copy = new double[n][];
        for (int i = 0; i < n; i++) {
            copy[i] = q[i].clone();
        }
        return new SettlingPropagator(copy, settled.clone(), settleTimeS);
    }

    /** Sparse products needed to reach t_s: the cost of one trace (about Λ·t_s). */
    public int stepsToSettle() {
        return forward.window(settleTimeS).last();
    }

    /**
     * The steps to settle, or Λ·t_s (the Poisson mean of the settle window) where the window itself would refuse a
     * mean beyond an int.
     */
    public double settleStepsEstimate() {
        double m = forward.rateBoundPerS() * settleTimeS;
        return m <= Integer.MAX_VALUE / 4.0 ? stepsToSettle() : m;
    }

    /** Estimated multiply-adds of one trace from one start (the uniformization up to t_s). */
    public double operationsPerStart() {
        return settleStepsEstimate() * forward.nonZeros();
    }

    public double settleTimeS() {
        return settleTimeS;
    }

    @Override
    public int dimension() {
        return n;
    }

    @Override
    public double[] propagate(double[] p0, double tS) {
        Propagator.requireTime(tS);
        double[] early = forward.propagate(p0, Math.min(tS, settleTimeS));
        complementGround(early, p0);
        if (tS <= settleTimeS) {
            return early;
        }
        double[] pS = late.propagate(restrict(early, p0), tS - settleTimeS);
        double[] p = new double[n];
        for (int a = 0; a < settled.length; a++) {
            p[settled[a]] = pS[a];
        }
        return p;
    }

    /**
     * For a conservative Q, state 0 takes the complement of the others, as in {@link ExactPropagator#propagate}. Why
     * here: the ground state gathers small inflows into a value near 1, and each step rounds them away a little
     * (Σp drifted by 1.7e-12 after 1.8e5 steps, measured); the other entries are not affected because state 0 feeds
     * nothing back between pulses.
     */
    void complementGround(double[] p, double[] p0) {
        if (!conservative || n < 2) {
            return;
        }
        double total = 0;
        for (double x : p0) {
            total += x;
        }
        double others = 0;
        for (int i = 1; i < n; i++) {
            others += p[i];
        }
        p[0] = total - others;
    }

    /** p restricted to S, after checking that the mass outside S is negligible. */
    double[] restrict(double[] p, double[] p0) {
        double total = 0;
        for (double x : p0) {
            total += Math.abs(x);
        }
        double outside = 0;
        for (double x : p) {
            outside += Math.abs(x);
        }
        double[] pS = new double[settled.length];
        for (int a = 0; a < settled.length; a++) {
            pS[a] = p[settled[a]];
            outside -= Math.abs(pS[a]);
        }
        if (outside > LEAK * total + 1e-300) {
            throw new IllegalStateException("settle time " + settleTimeS + " s too short: " + outside
                    + " of the population is still outside the settled states");
        }
        return pS;
    }

    @Override
    public double[][] matrix(double tS) {
        Propagator.requireTime(tS);
        double[][] out = new double[n][n];
        if (tS <= settleTimeS) {
            double[] e = new double[n];
            for (int col = 0; col < n; col++) {
                e[col] = 1;
                double[] c = forward.propagate(e, tS);
                e[col] = 0;
                for (int i = 0; i < n; i++) {
                    out[i][col] = c[i];
                }
            }
            return out;
        }
        WorkBound.require(settled.length * operationsPerStart() + (double) n * settled.length * settled.length,
                "the one-period propagator of " + n + " states (" + settled.length + " settled, about "
                        + WorkBound.sci(settleStepsEstimate()) + " uniformization steps to settle)",
                "a lower ⟨N⟩ or a faster cooling");
        double[][] rows = settleRows();
        double[][] m = late.matrix(tS - settleTimeS);
        for (int a = 0; a < settled.length; a++) {
            double[] target = out[settled[a]];
            for (int b = 0; b < settled.length; b++) {
                double f = m[a][b];
                if (f == 0) {
                    continue;
                }
                double[] r = rows[b];
                for (int j = 0; j < n; j++) {
                    target[j] += f * r[j];
                }
            }
        }
        return out;
    }

    /**
     * The rows of exp(Q·t_s) that belong to S, from uniformization of Qᵀ (|S| runs instead of n). For a conservative
     * Q each column of these rows must hold all but LEAK of the probability, which is checked.
     */
    synchronized double[][] settleRows() {
        if (settleRows != null) {
            return settleRows;
        }
        Uniformization adjoint = adjoint();
        double[][] rows = new double[settled.length][];
        double[] e = new double[n];
        for (int a = 0; a < settled.length; a++) {
            e[settled[a]] = 1;
            rows[a] = adjoint.propagate(e, settleTimeS);
            e[settled[a]] = 0;
        }
        if (conservative) {
            for (int j = 0; j < n; j++) {
                double kept = 0;
                for (double[] r : rows) {
                    kept += r[j];
                }
                if (settled[0] == 0) {
                    // same rounding drift as in complementGround, seen from the adjoint side; checked first
                    double others = kept - rows[0][j];
                    rows[0][j] = 1 - others;
                }
                if (Math.abs(1 - kept) > LEAK + 64 * stepsToSettle() * Math.ulp(1.0)) {
                    throw new IllegalStateException("settle time " + settleTimeS + " s too short: from state " + j
                            + ", " + (1 - kept) + " of the population is still outside the settled states");
                }
            }
        }
        settleRows = rows;
        return rows;
    }

    /** P = I + Qᵀ/Λ, for rows of exp(Qt) (same Λ as the forward one, since the diagonal is shared). */
    synchronized Uniformization adjoint() {
        if (adjoint == null) {
            double[][] qt = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    qt[j][i] = q[i][j];
                }
            }
            adjoint = Uniformization.of(qt);
        }
        return adjoint;
    }

    private static boolean groundFeedsNothing(double[][] q) {
        for (double[] row : q) {
            if (row[0] != 0) {
                return false;
            }
        }
        return true;
    }

    @Override
    public TraceGrid onGrid(double[] timesS) {
        for (double t : timesS) {
            Propagator.requireTime(t);
        }
        return new SettlingGrid(this, timesS.clone());
    }

}
