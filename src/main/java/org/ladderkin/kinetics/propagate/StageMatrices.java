package org.ladderkin.kinetics.propagate;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;

/**
 * The two linear systems of a Radau IIA step, factored with Hipparchus {@link LUDecomposition}: the real 3n×3n
 * Newton matrix with blocks δᵢⱼ I − h aᵢⱼ Jⱼ, and the n×n error filter I − hγ₀J.
 * <p>
 * We factor the full real 3n×3n matrix rather than the complex-split form of Hairer's code: it costs about five
 * times more per factorization, but it accepts a different Jacobian per stage, which makes one Newton
 * iteration exact for linear time-dependent systems.
 */
final class StageMatrices {

    /** Pivots below this are exact singularity; I − hA⊗J is otherwise well scaled by its identity part. */
    private static final double SINGULARITY_THRESHOLD = 1e-300;

    private final int n;
    private DecompositionSolver newton;
    private DecompositionSolver errorFilter;

    StageMatrices(int n) {
        this.n = n;
    }

    /**
     * Factors the Newton matrix for step h with stage Jacobians J₁..J₃ (the same array three times for simplified
     * Newton).
     *
     * @throws org.hipparchus.exception.MathIllegalArgumentException when the matrix is singular
     */
    void factorNewton(double h, double[][][] stageJacobians) {
        int m = RadauIIATableau.STAGES * n;
        double[][] w = new double[m][m];
        for (int i = 0; i < RadauIIATableau.STAGES; i++) {
            for (int j = 0; j < RadauIIATableau.STAGES; j++) {
                double ha = h * RadauIIATableau.A[i][j];
                double[][] jac = stageJacobians[j];
                for (int r = 0; r < n; r++) {
                    double[] row = w[i * n + r];
                    double[] jr = jac[r];
                    for (int c = 0; c < n; c++) {
                        row[j * n + c] = -ha * jr[c];
                    }
                    if (i == j) {
                        row[j * n + r] += 1.0;
                    }
                }
            }
        }
        newton = new LUDecomposition(new Array2DRowRealMatrix(w, false), SINGULARITY_THRESHOLD).getSolver();
    }

    /**
     * Factors the error filter I − hγ₀J.
     *
     * @throws org.hipparchus.exception.MathIllegalArgumentException when the matrix is singular
     */
    void factorErrorFilter(double h, double[][] jacobian) {
        double hg = h * RadauIIATableau.GAMMA0;
        double[][] w = new double[n][n];
        for (int r = 0; r < n; r++) {
            for (int c = 0; c < n; c++) {
                w[r][c] = -hg * jacobian[r][c];
            }
            w[r][r] += 1.0;
        }
        errorFilter = new LUDecomposition(new Array2DRowRealMatrix(w, false), SINGULARITY_THRESHOLD).getSolver();
    }

    /** Solves the Newton system; {@code rhs} (length 3n) is overwritten with the solution. */
    void solveNewton(double[] rhs) {
        double[] x = newton.solve(new ArrayRealVector(rhs, false)).toArray();
        System.arraycopy(x, 0, rhs, 0, rhs.length);
    }

    /** Solves the error filter system; {@code rhs} (length n) is overwritten with the solution. */
    void solveErrorFilter(double[] rhs) {
        double[] x = errorFilter.solve(new ArrayRealVector(rhs, false)).toArray();
        System.arraycopy(x, 0, rhs, 0, rhs.length);
    }
}
