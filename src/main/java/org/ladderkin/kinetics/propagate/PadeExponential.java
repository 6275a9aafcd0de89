package org.ladderkin.kinetics.propagate;

/**
 * Dense matrix exponential by scaling and squaring with diagonal Padé approximants of degree 3, 5, 7, 9 or 13,
 * chosen from the 1-norm as in Higham, "The scaling and squaring method for the matrix exponential revisited",
 * SIAM J. Matrix Anal. Appl. 26, 1179 (2005), Algorithm 2.3 (θ_m from its Table 2.3). Used for one-period maps,
 * for the small blocks of clustered rates in {@link ExactPropagator}, and as a fallback.
 */
public final class PadeExponential {

    private static final double[] THETA = {1.495585217958292e-2, 2.539398330063230e-1, 9.504178996162932e-1,
        2.097847961257068e0, 5.371920351148152e0};
    private static final int[] DEGREE = {3, 5, 7, 9, 13};
    private static final double[][] COEFFICIENTS = {
        {120, 60, 12, 1},
        {30240, 15120, 3360, 420, 30, 1},
        {17297280, 8648640, 1995840, 277200, 25200, 1512, 56, 1},
        {17643225600.0, 8821612800.0, 2075673600, 302702400, 30270240, 2162160, 110880, 3960, 90, 1},
        {64764752532480000.0, 32382376266240000.0, 7771770303897600.0, 1187353796428800.0, 129060195264000.0,
            10559470521600.0, 670442572800.0, 33522128640.0, 1323241920, 40840800, 960960, 16380, 182, 1}};

    private PadeExponential() {
    }

    /** exp(a·t) for a square matrix a (not modified). */
    public static double[][] exp(double[][] a, double t) {
        int n = a.length;
        double[][] x = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                x[i][j] = a[i][j] * t;
            }
        }
        return exp(x);
    }

    /** exp(a) for a square matrix a (not modified). */
    public static double[][] exp(double[][] a) {
        int n = a.length;
        double norm = norm1(a);
        if (!Double.isFinite(norm)) {
            throw new IllegalArgumentException("matrix exponential of a matrix with non-finite entries");
        }
        if (n == 0) {
            return new double[0][0];
        }
        if (n == 1) {
            return new double[][] {{Math.exp(a[0][0])}};
        }
        // an upper-triangular matrix (every block the engine exponentiates) keeps that shape through every product and
        // the final solve; skipping the zeros is exact and makes each product a sixth of the dense one
        boolean upper = isUpperTriangular(a);
        for (int k = 0; k < 4; k++) {
            if (norm <= THETA[k]) {
                return solvePade(a, DEGREE[k], COEFFICIENTS[k], 1.0, upper);
            }
        }
        int s = Math.max(0, (int) Math.ceil(Math.log(norm / THETA[4]) / Math.log(2)));
        double scale = Math.scalb(1.0, -s);
        double[][] r = solvePade(a, 13, COEFFICIENTS[4], scale, upper);
        for (int k = 0; k < s; k++) {
            r = product(r, r, upper);
        }
        return r;
    }

    /** r_m(a·scale) = (V − U)⁻¹(V + U) with U the odd and V the even part of the Padé numerator. */
    private static double[][] solvePade(double[][] a0, int m, double[] b, double scale, boolean upper) {
        int n = a0.length;
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = a0[i][j] * scale;
            }
        }
        double[][] a2 = product(a, a, upper);
        double[][] u;
        double[][] v;
        if (m < 13) {
            // powers A², A⁴, ..., A^(m−1)
            int half = (m - 1) / 2;
            double[][][] pow = new double[half + 1][][];
            pow[0] = identity(n);
            pow[1] = a2;
            for (int k = 2; k <= half; k++) {
                pow[k] = product(pow[k - 1], a2, upper);
            }
            double[][] uIn = new double[n][n];
            v = new double[n][n];
            for (int k = 0; k <= half; k++) {
                addScaled(uIn, pow[k], b[2 * k + 1]);
                addScaled(v, pow[k], b[2 * k]);
            }
            u = product(a, uIn, upper);
        } else {
            double[][] a4 = product(a2, a2, upper);
            double[][] a6 = product(a4, a2, upper);
            double[][] id = identity(n);
            double[][] inner = new double[n][n];
            addScaled(inner, a6, b[13]);
            addScaled(inner, a4, b[11]);
            addScaled(inner, a2, b[9]);
            double[][] uOuter = product(a6, inner, upper);
            addScaled(uOuter, a6, b[7]);
            addScaled(uOuter, a4, b[5]);
            addScaled(uOuter, a2, b[3]);
            addScaled(uOuter, id, b[1]);
            u = product(a, uOuter, upper);
            double[][] innerV = new double[n][n];
            addScaled(innerV, a6, b[12]);
            addScaled(innerV, a4, b[10]);
            addScaled(innerV, a2, b[8]);
            v = product(a6, innerV, upper);
            addScaled(v, a6, b[6]);
            addScaled(v, a4, b[4]);
            addScaled(v, a2, b[2]);
            addScaled(v, id, b[0]);
        }
        double[][] p = new double[n][n];
        double[][] q = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                p[i][j] = v[i][j] + u[i][j];
                q[i][j] = v[i][j] - u[i][j];
            }
        }
        return upper ? solveUpper(q, p) : DenseLinear.solve(q, p);
    }

    static double norm1(double[][] a) {
        double max = 0;
        int n = a.length;
        for (int j = 0; j < n; j++) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += Math.abs(a[i][j]);
            }
            max = Math.max(max, s);
        }
        return max;
    }

    static double[][] identity(int n) {
        double[][] id = new double[n][n];
        for (int i = 0; i < n; i++) {
            id[i][i] = 1;
        }
        return id;
    }

    private static void addScaled(double[][] target, double[][] x, double c) {
        for (int i = 0; i < target.length; i++) {
            for (int j = 0; j < target.length; j++) {
                target[i][j] += c * x[i][j];
            }
        }
    }

    private static boolean isUpperTriangular(double[][] a) {
        for (int i = 1; i < a.length; i++) {
            for (int j = 0; j < i; j++) {
                if (a[i][j] != 0) {
                    return false;
                }
            }
        }
        return true;
    }

    /**
     * a·b, for upper-triangular a and b over the upper triangle only; the sums run in the same order as
     * {@link #multiply}, which only adds zeros besides, so the result is the same to the bit.
     */
    private static double[][] product(double[][] a, double[][] b, boolean upper) {
        WorkBound.stopIfInterrupted();
        if (!upper) {
            return multiply(a, b);
        }
        int n = a.length;
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            double[] ci = c[i];
            double[] ai = a[i];
            for (int l = i; l < n; l++) {
                double x = ai[l];
                if (x == 0) {
                    continue;
                }
                double[] bl = b[l];
                for (int j = l; j < n; j++) {
                    ci[j] += x * bl[j];
                }
            }
        }
        return c;
    }

    /**
     * q⁻¹·p for upper-triangular q and p by back-substitution: what {@link DenseLinear#solve} does for them (its
     * pivoting and elimination find nothing to do), without the terms that are zero.
     */
    private static double[][] solveUpper(double[][] q, double[][] p) {
        int n = q.length;
        double[][] x = new double[n][n];
        for (int i = n - 1; i >= 0; i--) {
            if (q[i][i] == 0) {
                return DenseLinear.solve(q, p);
            }
            for (int c = i; c < n; c++) {
                double s = p[i][c];
                for (int k = i + 1; k <= c; k++) {
                    s -= q[i][k] * x[k][c];
                }
                x[i][c] = s / q[i][i];
            }
        }
        return x;
    }

    /** Dense product a·b. */
    public static double[][] multiply(double[][] a, double[][] b) {
        int n = a.length;
        int m = b[0].length;
        int k = b.length;
        double[][] c = new double[n][m];
        for (int i = 0; i < n; i++) {
            double[] ci = c[i];
            double[] ai = a[i];
            for (int l = 0; l < k; l++) {
                double x = ai[l];
                if (x == 0) {
                    continue;
                }
                double[] bl = b[l];
                for (int j = 0; j < m; j++) {
                    ci[j] += x * bl[j];
                }
            }
        }
        return c;
    }
}
