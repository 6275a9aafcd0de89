package org.ladderkin.kinetics.propagate;

/**
 * exp(Q·t)·v by uniformization (Jensen's method): with Λ ≥ max|Q_ii| and P = I + Q/Λ,
 * exp(Qt) = Σ_k Poisson(k; Λt)·P^k. For a generator (off-diagonal entries ≥ 0) every entry of P is ≥ 0, so the sum
 * has no cancellation whatever the spread of rates; the truncated Poisson tail ({@link PoissonWindow#TAIL}) bounds
 * the error in the 1-norm because ‖P‖₁ ≤ 1. The price is Λt sparse products, so it is meant for short windows.
 * Works equally on Qᵀ (rows of exp(Qt)), where ‖Pᵀ‖∞ ≤ 1 gives the same bound per entry.
 */
final class Uniformization {

    private final int n;
    private final double lambdaPerS;
    private final int[] rowStart;
    private final int[] column;
    private final double[] value;

    private Uniformization(int n, double lambdaPerS, int[] rowStart, int[] column, double[] value) {
        this.n = n;
        this.lambdaPerS = lambdaPerS;
        this.rowStart = rowStart;
        this.column = column;
        this.value = value;
    }

    /** P = I + Q/Λ of a square matrix whose off-diagonal entries are ≥ 0, stored by rows without its zeros. */
    static Uniformization of(double[][] q) {
        int n = q.length;
        double lambda = 0;
        for (int i = 0; i < n; i++) {
            lambda = Math.max(lambda, Math.abs(q[i][i]));
        }
        // Λ = 0 means Q = 0 (off-diagonal entries ≥ 0 with zero diagonal in a generator); any Λ gives P = I then
        lambda = lambda > 0 ? lambda : 1;
        // where a column of Q sums to zero (a generator conserves probability), P's diagonal entry is taken as
        // 1 − (sum of the stored off-diagonal entries), so the column of P sums to 1 up to one rounding; otherwise the
        // rounding of 1 + Q_jj/Λ drifts Σp systematically, by about 1e-12 after 10⁵ steps (measured)
        double[] diagonal = new double[n];
        for (int j = 0; j < n; j++) {
            double off = 0;
            double sum = 0;
            double scale = 0;
            for (int i = 0; i < n; i++) {
                if (i != j) {
                    if (q[i][j] < 0) {
                        throw new IllegalArgumentException("uniformization needs off-diagonal entries >= 0, Q[" + i
                                + "][" + j + "] = " + q[i][j] + " 1/s");
                    }
                    off += q[i][j] / lambda;
                }
                sum += q[i][j];
                scale += Math.abs(q[i][j]);
            }
            diagonal[j] = Math.abs(sum) <= 1e-13 * scale ? Math.max(0, 1 - off) : Math.max(0, 1 + q[j][j] / lambda);
        }
        int nnz = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                nnz += (i == j ? diagonal[j] : q[i][j]) != 0 ? 1 : 0;
            }
        }
        int[] rowStart = new int[n + 1];
        int[] column = new int[nnz];
        double[] value = new double[nnz];
        int k = 0;
        for (int i = 0; i < n; i++) {
            rowStart[i] = k;
            for (int j = 0; j < n; j++) {
                double p = i == j ? diagonal[j] : q[i][j] / lambda;
                if (p != 0) {
                    column[k] = j;
                    value[k++] = p;
                }
            }
        }
        rowStart[n] = k;
        return new Uniformization(n, lambda, rowStart, column, value);
    }

    /** Λ (1/s): the number of products for time t is about Λt. */
    double rateBoundPerS() {
        return lambdaPerS;
    }

    int dimension() {
        return n;
    }

    /** Stored entries of P: the multiply-adds of one step. */
    int nonZeros() {
        return rowStart[n];
    }

    /** out = P·in (distinct arrays). */
    void step(double[] in, double[] out) {
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
                s += value[k] * in[column[k]];
            }
            out[i] = s;
        }
    }

    /** The Poisson window of time tS (s). */
    PoissonWindow window(double tS) {
        return PoissonWindow.of(lambdaPerS * tS);
    }

    /** exp(Qt)·v0. */
    double[] propagate(double[] v0, double tS) {
        if (v0.length != n) {
            throw new IllegalArgumentException("state vector has " + v0.length + " entries, generator " + n);
        }
        PoissonWindow win = window(tS);
        double[] v = v0.clone();
        double[] next = new double[n];
        double[] out = new double[n];
        for (int k = 0; k <= win.last(); k++) {
            double wk = win.weight(k);
            if (wk != 0) {
                for (int i = 0; i < n; i++) {
                    out[i] += wk * v[i];
                }
            }
            if (k < win.last()) {
                if ((k & 1023) == 0) {
                    WorkBound.stopIfInterrupted();
                }
                step(v, next);
                double[] swap = v;
                v = next;
                next = swap;
            }
        }
        return out;
    }
}
