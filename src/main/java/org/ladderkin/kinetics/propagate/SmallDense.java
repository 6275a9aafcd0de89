package org.ladderkin.kinetics.propagate;

/** Tiny dense helpers for the 3×3 algebra of the tableau (Gaussian elimination with partial pivoting). */
final class SmallDense {

    private SmallDense() {
    }

    static double[][] transpose(double[][] m) {
        double[][] t = new double[m[0].length][m.length];
        for (int i = 0; i < m.length; i++) {
            for (int j = 0; j < m[0].length; j++) {
                t[j][i] = m[i][j];
            }
        }
        return t;
    }

    /** Solves m·x = rhs for a small square non-singular m; the arguments are not modified. */
    static double[] solve(double[][] m, double[] rhs) {
        int n = rhs.length;
        double[][] a = new double[n][];
        for (int i = 0; i < n; i++) {
            a[i] = m[i].clone();
        }
        double[] x = rhs.clone();
        for (int col = 0; col < n; col++) {
            int pivot = col;
            for (int r = col + 1; r < n; r++) {
                if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) {
                    pivot = r;
                }
            }
            double[] rowTmp = a[col];
            a[col] = a[pivot];
            a[pivot] = rowTmp;
            double xTmp = x[col];
            x[col] = x[pivot];
            x[pivot] = xTmp;
            for (int r = col + 1; r < n; r++) {
                double f = a[r][col] / a[col][col];
                for (int k = col; k < n; k++) {
                    a[r][k] -= f * a[col][k];
                }
                x[r] -= f * x[col];
            }
        }
        for (int r = n - 1; r >= 0; r--) {
            double s = x[r];
            for (int k = r + 1; k < n; k++) {
                s -= a[r][k] * x[k];
            }
            x[r] = s / a[r][r];
        }
        return x;
    }
}
