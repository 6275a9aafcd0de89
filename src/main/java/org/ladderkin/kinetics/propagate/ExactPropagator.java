// Over 400 lines: the clustered modal decomposition, its growth guard and the precomputed delay grids share one factorisation.
package org.ladderkin.kinetics.propagate;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Exact propagation p(t) = exp(Q·t)·p(0) for a constant upper-triangular generator Q (the between-pulse generator in
 * the order of {@link org.ladderkin.kinetics.state.LadderSpace}).
 *
 * <p>Method: a block Schur–Parlett decomposition in the spirit of Davies &amp; Higham, "A Schur–Parlett algorithm
 * for computing matrix functions", SIAM J. Matrix Anal. Appl. 25, 464 (2003). The eigenvalues of a triangular Q are
 * its diagonal. Diagonal entries closer than a relative gap δ are grouped into clusters; a unit upper-triangular V
 * with Q = V·B·V⁻¹ is found by back-substitution in which B keeps only within-cluster couplings and every division
 * is by a difference of eigenvalues from different clusters (never by a near-zero one). Then
 * exp(Qt) = V·exp(Bt)·V⁻¹, where singleton clusters contribute e^{λt} and each larger cluster its small triangular
 * block exponential e^{μt}·exp((B_c − μ)t), by divided differences ({@link ClusterExponential}, a few hundred flops
 * per time for blocks up to {@value ClusterExponential#MAX_SIZE} states) or {@link PadeExponential} for larger
 * blocks. Exactly and nearly coincident rates are
 * therefore handled without the breakdown of the Bateman closed form.
 *
 * <p>The conditioning of V grows as rates crowd together. If ‖V‖∞·‖V⁻¹‖∞ exceeds {@link #GROWTH_LIMIT}, δ is
 * enlarged (more is clustered) and the decomposition redone; in the limit everything is one cluster, i.e. a plain
 * Padé exponential per time.
 *
 * <p>Known limit: ladders that resolve hot excitons have, within each N, equally spaced rates (h·k_cool), whose
 * modal basis is conditioned like binomial coefficients (‖V‖·‖V⁻¹‖ ≈ 1e15 at Nmax = 20). The growth guard then
 * clusters almost everything and each delay costs a dense Padé exponential of the big block (tens of ms at 231
 * states). Correct, but slow: the engine uses {@link SettlingPropagator} for such ladders instead.
 *
 * <p>Many delays are cheap: {@link #onGrid} precomputes the mode factors for a time grid once (and keeps the last
 * grid, so every caller asking for the same delays shares it); each observable trace then costs O(delays × active
 * modes), modes with λt &lt; −745 (underflow) being skipped, and many starting vectors go through
 * {@link Grid#observeAll} as one product.
 */
public final class ExactPropagator implements Propagator {

    /** Largest accepted ‖V‖∞·‖V⁻¹‖∞ before clusters are widened. */
    public static final double GROWTH_LIMIT = 1e8;
    /** Successive relative gaps δ tried; the last one clusters everything. */
    private static final double[] DELTAS = {1e-3, 1e-2, 5e-2, 0.1, 0.2, 0.5, 1.0, Double.POSITIVE_INFINITY};
    private static final double UNDERFLOW = -745;
    /** Starting relative gap, as recommended by Davies & Higham (2003) for their blocking. */
    public static final double DEFAULT_DELTA = 0.1;
    /** Most doubles of cluster exponentials one grid caches (16 MB). */
    private static final long CACHE_LIMIT = 2_000_000;

    private final int n;
    private final double[][] v;
    private final double[][] w;
    private final double delta;
    private final double growth;
    /** Singleton modes sorted by decreasing eigenvalue (slowest first). */
    private final int[] singleIndex;
    private final double[] singleLambda;
    private final List<Cluster> clusters;
    private boolean conservative;
    /** The last grid built, shared by every caller asking for the same times (a grid is immutable once built). */
    private volatile Grid lastGrid;

    /**
     * A group of (nearly) coincident eigenvalues with its triangular block of B; {@code exact} is the block's
     * divided-difference exponential (null for blocks too large for it, which use Padé).
     */
    private record Cluster(int[] members, double[][] block, double muPerS, ClusterExponential exact) {
    }

    private ExactPropagator(int n, double[][] v, double[][] w, double delta, double growth, int[] singleIndex,
                            double[] singleLambda, List<Cluster> clusters) {
        this.n = n;
        this.v = v;
        this.w = w;
        this.delta = delta;
        this.growth = growth;
        this.singleIndex = singleIndex;
        this.singleLambda = singleLambda;
        this.clusters = clusters;
    }

    /** Decomposes an upper-triangular generator (rates in 1/s), starting from δ = 0.1. */
    public static ExactPropagator of(double[][] q) {
        return of(q, DEFAULT_DELTA);
    }

    /** Decomposes with a given starting relative gap δ (widened automatically if V is badly conditioned). */
    public static ExactPropagator of(double[][] q, double startDelta) {
        int n = q.length;
        for (int i = 0; i < n; i++) {
            if (q[i].length != n) {
                throw new IllegalArgumentException("generator must be square, row " + i + " has " + q[i].length + " entries");
            }
            for (int j = 0; j < i; j++) {
                if (q[i][j] != 0) {
                    throw new IllegalArgumentException("generator is not upper triangular: Q[" + i + "][" + j + "] = " + q[i][j]);
                }
            }
            for (int j = i; j < n; j++) {
                if (!Double.isFinite(q[i][j])) {
                    throw new IllegalArgumentException("generator entry Q[" + i + "][" + j + "] is not finite");
                }
            }
        }
        // each try is two triangular back-substitutions, about n³/3 multiply-adds, and up to all δ may be tried
        WorkBound.require(DELTAS.length * Math.pow(n, 3) / 3, "the modal decomposition of " + n + " states",
                "a lower ⟨N⟩ or a smaller model (fewer charges, no cooling)");
        ExactPropagator best = null;
        for (double d : DELTAS) {
            if (d < startDelta) {
                continue;
            }
            best = decompose(q, d);
            best.conservative = DenseLinear.columnsSumToZero(q);
            if (best.growth <= GROWTH_LIMIT) {
                return best;
            }
        }
        return best;
    }

    private static ExactPropagator decompose(double[][] q, double delta) {
        int n = q.length;
        int[] cl = clusterLabels(q, delta);
        double[][] v = new double[n][n];
        double[][] b = new double[n][n];
        // column j of V and B is built from earlier columns; vt and bt hold them as rows (vt[j][k] = V[k][j]) so the
        // inner sums run along contiguous memory (a 1081-state ladder: minutes by columns, seconds by rows)
        double[][] vt = new double[n][];
        double[][] bt = new double[n][];
        for (int j = 0; j < n; j++) {
            WorkBound.stopIfInterrupted();
            double[] vj = new double[j + 1];
            double[] bj = new double[j + 1];
            vj[j] = 1;
            bj[j] = q[j][j];
            for (int i = j - 1; i >= 0; i--) {
                double rhs = 0;
                double[] vi = v[i];
                for (int k = i + 1; k < j; k++) {
                    rhs += vi[k] * bj[k];
                }
                double[] qi = q[i];
                for (int k = i + 1; k <= j; k++) {
                    rhs -= qi[k] * vj[k];
                }
                if (cl[i] != cl[j]) {
                    // rhs is exactly 0 when j cannot reach i; then no division (the eigenvalues may even be equal)
                    vj[i] = rhs == 0 ? 0 : rhs / (q[i][i] - q[j][j]);
                } else {
                    bj[i] = -rhs;
                }
            }
            vt[j] = vj;
            bt[j] = bj;
            for (int i = 0; i <= j; i++) {
                v[i][j] = vj[i];
                b[i][j] = bj[i];
            }
        }
        double[][] w = new double[n][n];
        // W = V⁻¹ by rows of its transpose as well: W[i][j] = −Σ_k V[i][k]·W[k][j], column j of W from below
        for (int j = 0; j < n; j++) {
            double[] wj = new double[j + 1];
            wj[j] = 1;
            for (int i = j - 1; i >= 0; i--) {
                double s = 0;
                double[] vi = v[i];
                for (int k = i + 1; k <= j; k++) {
                    s -= vi[k] * wj[k];
                }
                wj[i] = s;
            }
            for (int i = 0; i <= j; i++) {
                w[i][j] = wj[i];
            }
        }
        double growth = normInf(v) * normInf(w);
        int labels = Arrays.stream(cl).max().orElse(-1) + 1;
        List<List<Integer>> members = new ArrayList<>();
        for (int c = 0; c < labels; c++) {
            members.add(new ArrayList<>());
        }
        for (int i = 0; i < n; i++) {
            members.get(cl[i]).add(i);
        }
        List<Integer> singles = new ArrayList<>();
        List<Cluster> clusters = new ArrayList<>();
        for (List<Integer> m : members) {
            if (m.size() == 1) {
                singles.add(m.get(0));
            } else if (m.size() > 1) {
                int[] idx = m.stream().mapToInt(Integer::intValue).toArray();
                double[][] block = new double[idx.length][idx.length];
                double mu = Double.NEGATIVE_INFINITY;
                for (int r = 0; r < idx.length; r++) {
                    mu = Math.max(mu, q[idx[r]][idx[r]]);
                    for (int c = 0; c < idx.length; c++) {
                        block[r][c] = b[idx[r]][idx[c]];
                    }
                }
                for (int r = 0; r < idx.length; r++) {
                    block[r][r] -= mu;
                }
                clusters.add(new Cluster(idx, block, mu,
                        idx.length <= ClusterExponential.MAX_SIZE ? new ClusterExponential(block) : null));
            }
        }
        singles.sort((x, y) -> Double.compare(q[y][y], q[x][x]));
        int[] singleIndex = singles.stream().mapToInt(Integer::intValue).toArray();
        double[] singleLambda = new double[singleIndex.length];
        for (int k = 0; k < singleIndex.length; k++) {
            singleLambda[k] = q[singleIndex[k]][singleIndex[k]];
        }
        return new ExactPropagator(n, v, w, delta, growth, singleIndex, singleLambda, List.copyOf(clusters));
    }

    /**
     * Cluster label of each diagonal entry. Two states share a cluster when their eigenvalues are within relative
     * gap δ and one can reach the other through the generator (closed transitively). States that cannot reach each
     * other never need a division by their eigenvalue difference (that entry of V is exactly 0), so they are not
     * merged; this keeps clusters small on large ladders where many unrelated states have similar lifetimes.
     */
    private static int[] clusterLabels(double[][] q, double delta) {
        int n = q.length;
        long[][] reach = new long[n][(n + 63) / 64];
        int[] parent = new int[n];
        for (int j = 0; j < n; j++) {
            parent[j] = j;
            for (int k = 0; k < j; k++) {
                if (q[k][j] != 0) {
                    reach[j][k >>> 6] |= 1L << (k & 63);
                    long[] rk = reach[k];
                    long[] rj = reach[j];
                    for (int w = 0; w < rk.length; w++) {
                        rj[w] |= rk[w];
                    }
                }
            }
        }
        for (int j = 0; j < n; j++) {
            double c = q[j][j];
            for (int i = 0; i < j; i++) {
                if ((reach[j][i >>> 6] & (1L << (i & 63))) == 0) {
                    continue;
                }
                double a = q[i][i];
                if (Math.abs(c - a) <= delta * Math.max(Math.abs(a), Math.abs(c))) {
                    int ri = find(parent, i);
                    int rj = find(parent, j);
                    if (ri != rj) {
                        parent[Math.max(ri, rj)] = Math.min(ri, rj);
                    }
                }
            }
        }
        int[] label = new int[n];
        int[] byRoot = new int[n];
        Arrays.fill(byRoot, -1);
        int next = 0;
        for (int i = 0; i < n; i++) {
            int r = find(parent, i);
            if (byRoot[r] < 0) {
                byRoot[r] = next++;
            }
            label[i] = byRoot[r];
        }
        return label;
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static double normInf(double[][] a) {
        double max = 0;
        for (double[] row : a) {
            double s = 0;
            for (double x : row) {
                s += Math.abs(x);
            }
            max = Math.max(max, s);
        }
        return max;
    }

    /** Number of states. */
    @Override
    public int dimension() {
        return n;
    }

    /** Relative gap δ finally used for clustering. */
    public double delta() {
        return delta;
    }

    /** ‖V‖∞·‖V⁻¹‖∞ of the block decomposition: rounding errors are about this times 1e-16. */
    public double growth() {
        return growth;
    }

    /** Number of states in clusters of two or more (handled by small dense exponentials). */
    public int clusteredStates() {
        return clusters.stream().mapToInt(c -> c.members.length).sum();
    }

    /**
     * p(t) = exp(Qt)·p0, t ≥ 0 in seconds. Entries within their own rounding bound of zero are set to zero. For a
     * conservative generator (columns summing to zero, as every master equation here) state 0 is computed as the
     * complement of the others, so Σp is kept to rounding even where the modal basis is ill-conditioned.
     */
    @Override
    public double[] propagate(double[] p0, double tS) {
        requireTime(tS);
        double[][][] ce = clusterExps(tS);
        double[] y = modal(p0, tS, false, ce);
        double[] yAbs = modal(p0, tS, true, ce);
        double[] p = new double[n];
        double total = 0;
        for (double x : p0) {
            total += x;
        }
        for (int i = 0; i < n; i++) {
            double s = 0;
            double bound = 0;
            double[] vi = v[i];
            for (int k = i; k < n; k++) {
                s += vi[k] * y[k];
                bound += Math.abs(vi[k]) * yAbs[k];
            }
            // a true population is ≥ 0; a negative value inside the rounding bound is rounding, not physics
            p[i] = (s < 0 && -s <= 8 * n * Math.ulp(1.0) * bound) ? 0.0 : s;
        }
        if (conservative && n > 1) {
            // 1ᵀQ = 0, so Σp(t) = Σp(0) exactly; the ground state (index 0, reached by every decay path) takes the
            // complement, which moves the basis rounding into the largest population where it is relatively smallest
            double others = 0;
            for (int i = 1; i < n; i++) {
                others += p[i];
            }
            p[0] = total - others;
        }
        return p;
    }

    /** exp(Bt)·W·p0 (or its entrywise-absolute bound). */
    private double[][][] clusterExps(double tS) {
        double[][][] ce = new double[clusters.size()][][];
        for (int c = 0; c < ce.length; c++) {
            ce[c] = clusterExp(clusters.get(c), tS);
        }
        return ce;
    }

    private double[] modal(double[] p0, double tS, boolean absolute, double[][][] ce) {
        if (p0.length != n) {
            throw new IllegalArgumentException("state vector has " + p0.length + " entries, generator " + n);
        }
        double[] wp = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            double[] wi = w[i];
            for (int k = i; k < n; k++) {
                s += absolute ? Math.abs(wi[k] * p0[k]) : wi[k] * p0[k];
            }
            wp[i] = s;
        }
        double[] y = new double[n];
        for (int k = 0; k < singleIndex.length; k++) {
            double x = singleLambda[k] * tS;
            if (x >= UNDERFLOW) {
                y[singleIndex[k]] = Math.exp(x) * wp[singleIndex[k]];
            }
        }
        for (int ci = 0; ci < ce.length; ci++) {
            Cluster c = clusters.get(ci);
            double[][] e = ce[ci];
            if (e == null) {
                continue;
            }
            int m = c.members.length;
            for (int r = 0; r < m; r++) {
                double s = 0;
                for (int col = 0; col < m; col++) {
                    s += (absolute ? Math.abs(e[r][col]) : e[r][col]) * wp[c.members[col]];
                }
                y[c.members[r]] = s;
            }
        }
        return y;
    }

    /**
     * exp(B_c·t) along a sequence of times. Dense uniform grids (an instrument-response convolution evaluates the
     * ladder every few femtoseconds) step by one m×m product with exp(B_c·h) instead of a Padé exponential per time;
     * a fresh exponential every {@link #WALK_REFRESH} steps keeps the rounding drift below about 1e-13.
     */
    private static final class ClusterWalk {
        /** Consecutive steps equal to within this relative amount reuse the step matrix. */
        private static final double SAME_STEP = 1e-11;
        private static final int WALK_REFRESH = 64;

        private final Cluster cluster;
        private double lastS = Double.NaN;
        private double[][] last;
        private double stepS = Double.NaN;
        private double[][] step;
        private int steps;

        ClusterWalk(Cluster cluster) {
            this.cluster = cluster;
        }

        /** exp(B_c·t) (caller must not modify it), or null when it underflows entirely. */
        double[][] at(double tS) {
            double d = tS - lastS;
            double[][] e;
            if (last != null && d > 0 && steps < WALK_REFRESH && Math.abs(d - stepS) <= SAME_STEP * stepS) {
                if (step == null) {
                    step = clusterExp(cluster, stepS);
                }
                e = step == null ? clusterExp(cluster, tS) : product(last, step);
                steps++;
            } else {
                e = clusterExp(cluster, tS);
                stepS = d > 0 ? d : Double.NaN;
                step = null;
                steps = 0;
            }
            lastS = tS;
            last = e;
            return e;
        }

        private static double[][] product(double[][] a, double[][] b) {
            int m = a.length;
            double[][] out = new double[m][m];
            for (int i = 0; i < m; i++) {
                double[] oi = out[i];
                for (int k = 0; k < m; k++) {
                    double aik = a[i][k];
                    if (aik != 0) {
                        double[] bk = b[k];
                        for (int j = 0; j < m; j++) {
                            oi[j] += aik * bk[j];
                        }
                    }
                }
            }
            return out;
        }
    }

    /** exp(B_c·t), or null when it underflows entirely. */
    private static double[][] clusterExp(Cluster c, double tS) {
        double x = c.muPerS * tS;
        if (x < UNDERFLOW) {
            return null;
        }
        double f = Math.exp(x);
        if (c.exact != null) {
            int m = c.members.length;
            double[][] e = new double[m][m];
            c.exact.exp(tS, f, e, new double[1 << m]);
            return e;
        }
        double[][] e = PadeExponential.exp(c.block, tS);
        for (double[] row : e) {
            for (int j = 0; j < row.length; j++) {
                row[j] *= f;
            }
        }
        return e;
    }

    /** The full propagator matrix exp(Qt). */
    @Override
    public double[][] matrix(double tS) {
        requireTime(tS);
        double[][] out = new double[n][n];
        double[] e = new double[n];
        double[][][] ce = clusterExps(tS);
        for (int col = 0; col < n; col++) {
            Arrays.fill(e, 0);
            e[col] = 1;
            double[] y = modal(e, tS, false, ce);
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int k = i; k < n; k++) {
                    s += v[i][k] * y[k];
                }
                out[i][col] = s;
            }
        }
        return out;
    }

    /**
     * Estimated multiply-adds to prepare the given times: per time, one exponential per mode and each cluster's block
     * exponential (divided differences for small blocks; a Padé exponential, about 10·m³ with its squarings, for a
     * block of m > {@value ClusterExponential#MAX_SIZE} states), skipped where the cluster has underflowed.
     */
    public double operationsFor(double[] timesS) {
        double total = 0;
        for (double t : timesS) {
            total += singleIndex.length;
            for (Cluster c : clusters) {
                if (c.muPerS * t >= UNDERFLOW) {
                    int m = c.members.length;
                    total += c.exact != null ? (double) m * m * (1 << m) : padeOperations(c, t);
                }
            }
        }
        return total;
    }

    /**
     * A Padé exponential of an upper-triangular m-block at time t: six products for the degree-13 approximant and one
     * per squaring (each m³/6 over the triangle), and the final solve (m³/3).
     */
    private static double padeOperations(Cluster c, double tS) {
        double m = c.members.length;
        double norm = 0;
        for (int j = 0; j < c.members.length; j++) {
            double col = 0;
            for (double[] row : c.block) {
                col += Math.abs(row[j]);
            }
            norm = Math.max(norm, col);
        }
        double squarings = Math.max(0, Math.ceil(Math.log(norm * tS / 5.37) / Math.log(2)));
        return (6 + squarings) * m * m * m / 6 + m * m * m / 3;
    }

    /** States in the largest cluster (1 when every mode is separate). */
    public int largestCluster() {
        return clusters.stream().mapToInt(c -> c.members.length).max().orElse(1);
    }

    /** Precomputes the mode factors at the given times (s, each ≥ 0) for cheap repeated traces. */
    @Override
    public Grid onGrid(double[] timesS) {
        Grid last = lastGrid;
        if (last != null && Arrays.equals(last.timesS, timesS)) {
            return last;
        }
        for (double t : timesS) {
            requireTime(t);
        }
        WorkBound.require(operationsFor(timesS), "the delay grid (" + timesS.length + " delays on " + n
                + " states whose rates crowd into a block of " + largestCluster() + ")",
                "fewer delays (short delays cost most), a lower ⟨N⟩ or rates that are less alike");
        Grid grid = new Grid(timesS.clone());
        lastGrid = grid;
        return grid;
    }

    private static void requireTime(double tS) {
        if (!(tS >= 0) || !Double.isFinite(tS)) {
            throw new IllegalArgumentException("propagation time must be finite and >= 0, was " + tS + " s");
        }
    }

    /** Mode factors of this propagator on a fixed time grid. */
    public final class Grid implements TraceGrid {

        private final double[] timesS;
        private final int[] active;
        private final double[][] singleFactor;
        private final double[][][][] clusterFactor;

        private Grid(double[] timesS) {
            this.timesS = timesS;
            int nt = timesS.length;
            active = new int[nt];
            singleFactor = new double[nt][];
            clusterFactor = new double[nt][clusters.size()][][];
            ClusterWalk[] walks = new ClusterWalk[clusters.size()];
            for (int c = 0; c < walks.length; c++) {
                walks[c] = cacheable(clusters.get(c), nt) ? new ClusterWalk(clusters.get(c)) : null;
            }
            for (int j = 0; j < nt; j++) {
                WorkBound.stopIfInterrupted();
                double t = timesS[j];
                int a = 0;
                while (a < singleLambda.length && singleLambda[a] * t >= UNDERFLOW) {
                    a++;
                }
                active[j] = a;
                double[] f = new double[a];
                for (int k = 0; k < a; k++) {
                    f[k] = Math.exp(singleLambda[k] * t);
                }
                singleFactor[j] = f;
                for (int c = 0; c < clusters.size(); c++) {
                    // large blocks are recomputed per trace instead of cached, to bound memory
                    clusterFactor[j][c] = walks[c] == null ? null : walks[c].at(t);
                }
            }
        }

        private static boolean cacheable(Cluster c, int times) {
            return (long) c.members.length * c.members.length * times <= CACHE_LIMIT;
        }

        @Override
        public double[] timesS() {
            return timesS.clone();
        }

        /**
         * The traces o_r·p(t_j) for each observable row o_r, starting from p0 at t = 0. Cost: O(n²) per observable
         * for the mode amplitudes, then O(active modes) per time.
         */
        @Override
        public double[][] observe(double[][] observables, double[] p0) {
            return observeAll(observables, new double[][] {p0})[0];
        }

        /**
         * The traces o_r·p_s(t_j) for every start p_s and observable o_r ([start][observable][time]): the amplitudes
         * of all (start, observable) pairs times the grid's mode factors, one matrix product.
         */
        @Override
        public double[][][] observeAll(double[][] observables, double[][] starts) {
            int no = observables.length;
            int ns = starts.length;
            double[][] u = new double[no][n];
            for (int r = 0; r < no; r++) {
                double[] o = observables[r];
                if (o.length != n) {
                    throw new IllegalArgumentException("observable has " + o.length + " entries, generator " + n);
                }
                for (int k = 0; k < n; k++) {
                    double s = 0;
                    for (int i = 0; i <= k; i++) {
                        s += o[i] * v[i][k];
                    }
                    u[r][k] = s;
                }
            }
            double[][] wps = new double[ns][];
            for (int st = 0; st < ns; st++) {
                double[] p0 = starts[st];
                if (p0.length != n) {
                    throw new IllegalArgumentException("state vector has " + p0.length + " entries, generator " + n);
                }
                double[] wp = new double[n];
                for (int i = 0; i < n; i++) {
                    double s = 0;
                    for (int k = i; k < n; k++) {
                        s += w[i][k] * p0[k];
                    }
                    wp[i] = s;
                }
                wps[st] = wp;
            }
            int rows = ns * no;
            double[][] amp = new double[rows][singleIndex.length];
            for (int st = 0; st < ns; st++) {
                for (int r = 0; r < no; r++) {
                    double[] a = amp[st * no + r];
                    for (int k = 0; k < singleIndex.length; k++) {
                        a[k] = u[r][singleIndex[k]] * wps[st][singleIndex[k]];
                    }
                }
            }
            int nt = timesS.length;
            double[][][] out = new double[ns][no][nt];
            ClusterWalk[] walks = new ClusterWalk[clusters.size()];
            for (int c = 0; c < walks.length; c++) {
                walks[c] = cacheable(clusters.get(c), nt) ? null : new ClusterWalk(clusters.get(c));
            }
            double[][][] clusterE = new double[clusters.size()][][];
            double[] y = new double[n];
            for (int j = 0; j < nt; j++) {
                WorkBound.stopIfInterrupted();
                double[] f = singleFactor[j];
                int a = active[j];
                for (int c = 0; c < clusterE.length; c++) {
                    clusterE[c] = clusterFactor[j][c] != null || cacheable(clusters.get(c), nt)
                            ? clusterFactor[j][c] : walks[c].at(timesS[j]);
                }
                for (int st = 0; st < ns; st++) {
                    double[] wp = wps[st];
                    // exp(B_c t)·W·p of each cluster, once per start (every observable reads it)
                    for (int c = 0; c < clusterE.length; c++) {
                        double[][] e = clusterE[c];
                        if (e == null) {
                            continue;
                        }
                        int[] mem = clusters.get(c).members;
                        for (int x = 0; x < mem.length; x++) {
                            double yx = 0;
                            for (int z = 0; z < mem.length; z++) {
                                yx += e[x][z] * wp[mem[z]];
                            }
                            y[mem[x]] = yx;
                        }
                    }
                    for (int r = 0; r < no; r++) {
                        double[] ar = amp[st * no + r];
                        double s = 0;
                        for (int k = 0; k < a; k++) {
                            s += ar[k] * f[k];
                        }
                        for (int c = 0; c < clusterE.length; c++) {
                            if (clusterE[c] == null) {
                                continue;
                            }
                            int[] mem = clusters.get(c).members;
                            for (int x = 0; x < mem.length; x++) {
                                s += u[r][mem[x]] * y[mem[x]];
                            }
                        }
                        out[st][r][j] = s;
                    }
                }
            }
            return out;
        }
    }
}
