package org.ladderkin.kinetics.propagate;

/** Small dense linear solves by Gaussian elimination with partial pivoting (no allocation beyond copies). */
public final class DenseLinear {

    private DenseLinear() {
    }

    /** Solves a·x = b for a matrix right-hand side; a and b are not modified. */
    public static double[][] solve(double[][] a0, double[][] b0) {
        int n = a0.length;
        int m = b0[0].length;
        double[][] a = new double[n][];
        double[][] b = new double[n][];
        for (int i = 0; i < n; i++) {
            a[i] = a0[i].clone();
            b[i] = b0[i].clone();
        }
        for (int col = 0; col < n; col++) {
            int piv = col;
            for (int r = col + 1; r < n; r++) {
                if (Math.abs(a[r][col]) > Math.abs(a[piv][col])) {
                    piv = r;
                }
            }
            if (a[piv][col] == 0) {
                throw new ArithmeticException("singular matrix in linear solve (column " + col + ")");
            }
            double[] t = a[piv];
            a[piv] = a[col];
            a[col] = t;
            t = b[piv];
            b[piv] = b[col];
            b[col] = t;
            double d = a[col][col];
            for (int r = col + 1; r < n; r++) {
                double f = a[r][col] / d;
                if (f == 0) {
                    continue;
                }
                double[] ar = a[r];
                double[] ac = a[col];
                for (int c = col; c < n; c++) {
                    ar[c] -= f * ac[c];
                }
                double[] br = b[r];
                double[] bc = b[col];
                for (int c = 0; c < m; c++) {
                    br[c] -= f * bc[c];
                }
            }
        }
        double[][] x = new double[n][m];
        for (int i = n - 1; i >= 0; i--) {
            for (int c = 0; c < m; c++) {
                double s = b[i][c];
                for (int k = i + 1; k < n; k++) {
                    s -= a[i][k] * x[k][c];
                }
                x[i][c] = s / a[i][i];
            }
        }
        return x;
    }

    /** Solves a·x = b for one right-hand side. */
    public static double[] solve(double[][] a, double[] b) {
        double[][] bb = new double[b.length][1];
        for (int i = 0; i < b.length; i++) {
            bb[i][0] = b[i];
        }
        double[][] x = solve(a, bb);
        double[] out = new double[b.length];
        for (int i = 0; i < b.length; i++) {
            out[i] = x[i][0];
        }
        return out;
    }

    /**
     * Whether every column of a generator sums to zero within rounding (1e-13 of the column's absolute sum), i.e. it
     * conserves probability.
     */
    static boolean columnsSumToZero(double[][] q) {
        for (int j = 0; j < q.length; j++) {
            double s = 0;
            double scale = 0;
            for (double[] row : q) {
                s += row[j];
                scale += Math.abs(row[j]);
            }
            if (Math.abs(s) > 1e-13 * scale) {
                return false;
            }
        }
        return true;
    }
}
