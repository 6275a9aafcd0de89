package org.ladderkin.kinetics.propagate;

import java.util.Arrays;

/**
 * exp(T·t) of a small upper-triangular block T whose diagonal entries lie close together (a cluster of coincident or
 * nearly coincident rates), without a Padé exponential per time.
 *
 * <p>For an upper-triangular T, f(T)_{ij} is the sum over increasing paths i = s₀ &lt; s₁ &lt; … &lt; s_k = j of
 * T_{s₀s₁}·…·T_{s_{k−1}s_k}·f[λ_{s₀}, …, λ_{s_k}], the divided difference of f at the path's eigenvalues (confluent
 * where they coincide); see N. J. Higham, "Functions of Matrices" (SIAM 2008), Theorem 4.11. A path is fixed by its
 * set of states, so every subset S of the block adds one term at (min S, max S). The products of T along a subset do
 * not depend on time except as t^{|S|−1}; they are computed once, and each time costs only the 2^m − 1 divided
 * differences of exp at the points λ·t.
 *
 * <p>Those are computed stably for exp: a set whose points span more than 1 uses the recurrence
 * f[S] = (f[S∖{lowest}] − f[S∖{highest}]) / (x_highest − x_lowest), whose two terms are positive with the first the
 * larger, and which divides only by a difference above 1; a set spanning at most 1 uses the series
 * f[S] = e^c·Σ_k h_k(x − c)/(k + |S| − 1)! about the set's midpoint c, with h_k the complete homogeneous symmetric
 * polynomials (each |x − c| ≤ 1/2, so {@link #TERMS} terms reach the last bit). Coincident points therefore never
 * divide by a small difference.
 */
final class ClusterExponential {

    /** Largest block handled here (2^m − 1 divided differences per time); larger blocks use Padé. */
    static final int MAX_SIZE = 6;
    /** Series terms: (1/2)^k / k! is below 1e-17 from k = 15. */
    private static final int TERMS = 16;
    private static final double[] INVERSE_FACTORIAL = new double[TERMS + MAX_SIZE + 1];

    static {
        double f = 1;
        for (int k = 0; k < INVERSE_FACTORIAL.length; k++) {
            if (k > 0) {
                f *= k;
            }
            INVERSE_FACTORIAL[k] = 1 / f;
        }
    }

    private final int m;
    /** Diagonal of the block (1/s), all ≤ 0 here because the block is shifted by the cluster's largest eigenvalue. */
    private final double[] diagonal;
    /** Per subset (bit mask): lowest and highest diagonal member, member count − 1. */
    private final int[] lowest;
    private final int[] highest;
    private final int[] order;
    /** Subsets whose path product is non-zero, with their target entry and the product. */
    private final int[] termMask;
    private final int[] termRow;
    private final int[] termCol;
    private final double[] termProduct;

    ClusterExponential(double[][] block) {
        m = block.length;
        if (m < 1 || m > MAX_SIZE) {
            throw new IllegalArgumentException("cluster of " + m + " states, handled sizes are 1.." + MAX_SIZE);
        }
        diagonal = new double[m];
        for (int i = 0; i < m; i++) {
            diagonal[i] = block[i][i];
        }
        int masks = 1 << m;
        lowest = new int[masks];
        highest = new int[masks];
        order = new int[masks];
        int[] tm = new int[masks];
        int[] tr = new int[masks];
        int[] tc = new int[masks];
        double[] tp = new double[masks];
        int terms = 0;
        for (int mask = 1; mask < masks; mask++) {
            int lo = -1;
            int hi = -1;
            int first = -1;
            int prev = -1;
            double product = 1;
            for (int i = 0; i < m; i++) {
                if ((mask & (1 << i)) == 0) {
                    continue;
                }
                if (lo < 0 || diagonal[i] < diagonal[lo]) {
                    lo = i;
                }
                if (hi < 0 || diagonal[i] > diagonal[hi]) {
                    hi = i;
                }
                if (first < 0) {
                    first = i;
                } else {
                    product *= block[prev][i];
                }
                prev = i;
            }
            lowest[mask] = lo;
            highest[mask] = hi;
            order[mask] = Integer.bitCount(mask) - 1;
            if (product != 0) {
                tm[terms] = mask;
                tr[terms] = first;
                tc[terms] = prev;
                tp[terms] = product;
                terms++;
            }
        }
        termMask = Arrays.copyOf(tm, terms);
        termRow = Arrays.copyOf(tr, terms);
        termCol = Arrays.copyOf(tc, terms);
        termProduct = Arrays.copyOf(tp, terms);
    }

    /** exp(T·t)·scale into {@code out} (m×m, overwritten), t ≥ 0; {@code dd} is scratch of length 2^m. */
    void exp(double tS, double scale, double[][] out, double[] dd) {
        int masks = 1 << m;
        double[] h = new double[TERMS];
        for (int mask = 1; mask < masks; mask++) {
            int lo = lowest[mask];
            int hi = highest[mask];
            double xLo = diagonal[lo] * tS;
            double xHi = diagonal[hi] * tS;
            int p = order[mask];
            if (p == 0) {
                dd[mask] = Math.exp(xHi);
            } else if (xHi - xLo > 1) {
                dd[mask] = (dd[mask & ~(1 << lo)] - dd[mask & ~(1 << hi)]) / (xHi - xLo);
            } else {
                double c = 0.5 * (xLo + xHi);
                Arrays.fill(h, 0);
                h[0] = 1;
                for (int i = 0; i < m; i++) {
                    if ((mask & (1 << i)) != 0) {
                        double y = diagonal[i] * tS - c;
                        for (int k = 1; k < TERMS; k++) {
                            h[k] += y * h[k - 1];
                        }
                    }
                }
                double s = 0;
                for (int k = TERMS - 1; k >= 0; k--) {
                    s += h[k] * INVERSE_FACTORIAL[k + p];
                }
                dd[mask] = Math.exp(c) * s;
            }
        }
        for (double[] row : out) {
            Arrays.fill(row, 0);
        }
        for (int k = 0; k < termMask.length; k++) {
            int mask = termMask[k];
            double tPower = 1;
            for (int e = order[mask]; e > 0; e--) {
                tPower *= tS;
            }
            out[termRow[k]][termCol[k]] += termProduct[k] * tPower * dd[mask] * scale;
        }
    }
}
