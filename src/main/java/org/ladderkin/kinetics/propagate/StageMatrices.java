package org.ladderkin.kinetics.propagate;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;

/**
 * The linear systems of a Radau IIA step, factored with Hipparchus {@link LUDecomposition}: the Newton matrix with
 * blocks δᵢⱼ I − h aᵢⱼ Jⱼ and the n×n error filter I − hγ₀J.
 * <p>
 * When the three stages share one Jacobian (simplified Newton, or a linear system whose Jacobian did not change
 * across the step), the Newton system is transformed with the eigenbasis of A into an n×n and a 2n×2n real system
 * (Hairer &amp; Wanner II, Sect. IV.8), about three times cheaper to factor than the full one; the n×n block is then
 * also the error filter. Stage Jacobians that differ (linear time-dependent systems) use the full real 3n×3n matrix,
 * which makes one Newton iteration exact.
 */
final class StageMatrices {

    /** Pivots below this are exact singularity; I − hA⊗J is otherwise well scaled by its identity part. */
    private static final double SINGULARITY_THRESHOLD = 1e-300;

    private final int n;
    private boolean split;
    private DecompositionSolver full;
    private DecompositionSolver realBlock;
    private DecompositionSolver pairBlock;
    private DecompositionSolver errorFilter;
    private final double[] work;

    StageMatrices(int n) {
        this.n = n;
        this.work = new double[3 * n];
    }

    /**
     * Factors the Newton matrix for step h with stage Jacobians J₁..J₃ and returns the number of LU factorizations
     * done. The split form is used when the three Jacobians are equal; the caller may then adopt its real block as
     * error filter ({@link #adoptRealBlockAsErrorFilter()}).
     *
     * @throws org.hipparchus.exception.MathIllegalArgumentException when a matrix is singular
     */
    int factorNewton(double h, double[][][] stageJacobians) {
        boolean shared = same(stageJacobians[0], stageJacobians[1]) && same(stageJacobians[0], stageJacobians[2]);
        full = null;
        realBlock = null;
        pairBlock = null;
        if (shared) {
            factorSplit(h, stageJacobians[0]);
            split = true;
            return 2;
        }
        factorFull(h, stageJacobians);
        split = false;
        return 1;
    }

    /** Whether the last Newton factorization was the split form. */
    boolean isSplit() {
        return split;
    }

    /** Uses the split real block I − hλ₀₀J (λ₀₀ = γ₀) as the error filter; valid only right after a split factorization. */
    void adoptRealBlockAsErrorFilter() {
        errorFilter = realBlock;
    }

    private void factorFull(double h, double[][][] stageJacobians) {
        double[][] lambda = RadauIIATableau.A;
        full = lu(blockMatrix(h, lambda, 0, 3, stageJacobians));
    }

    private void factorSplit(double h, double[][] jacobian) {
        double[][][] js = {jacobian, jacobian, jacobian};
        realBlock = lu(blockMatrix(h, RadauIIATableau.LAMBDA, 0, 1, js));
        pairBlock = lu(blockMatrix(h, RadauIIATableau.LAMBDA, 1, 2, js));
    }

    /** Blocks δ_pq I − h·coef[p][q]·J_q for p, q in [first, first + count). */
    private double[][] blockMatrix(double h, double[][] coef, int first, int count, double[][][] jacobians) {
        int m = count * n;
        double[][] w = new double[m][m];
        for (int p = 0; p < count; p++) {
            for (int q = 0; q < count; q++) {
                double hc = h * coef[first + p][first + q];
                double[][] jac = jacobians[first + q];
                for (int r = 0; r < n; r++) {
                    double[] row = w[p * n + r];
                    double[] jr = jac[r];
                    for (int c = 0; c < n; c++) {
                        row[q * n + c] = -hc * jr[c];
                    }
                    if (p == q) {
                        row[q * n + r] += 1.0;
                    }
                }
            }
        }
        return w;
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
        errorFilter = lu(w);
    }

    /** Solves the Newton system; {@code rhs} (length 3n, stage-major) is overwritten with the solution. */
    void solveNewton(double[] rhs) {
        if (!split) {
            solveInPlace(full, rhs, 0, 3 * n);
            return;
        }
        // W = (T⁻¹ ⊗ I)·R, solve the blocks, ΔZ = (T ⊗ I)·W
        transform(RadauIIATableau.T_INV, rhs);
        solveInPlace(realBlock, rhs, 0, n);
        solveInPlace(pairBlock, rhs, n, 2 * n);
        transform(RadauIIATableau.T, rhs);
    }

    /** Solves the error filter system; {@code rhs} (length n) is overwritten with the solution. */
    void solveErrorFilter(double[] rhs) {
        solveInPlace(errorFilter, rhs, 0, n);
    }

    private void transform(double[][] m, double[] v) {
        for (int k = 0; k < n; k++) {
            double a = v[k];
            double b = v[n + k];
            double c = v[2 * n + k];
            work[k] = m[0][0] * a + m[0][1] * b + m[0][2] * c;
            work[n + k] = m[1][0] * a + m[1][1] * b + m[1][2] * c;
            work[2 * n + k] = m[2][0] * a + m[2][1] * b + m[2][2] * c;
        }
        System.arraycopy(work, 0, v, 0, 3 * n);
    }

    private static void solveInPlace(DecompositionSolver solver, double[] v, int from, int length) {
        double[] part = new double[length];
        System.arraycopy(v, from, part, 0, length);
        double[] x = solver.solve(new ArrayRealVector(part, false)).toArray();
        System.arraycopy(x, 0, v, from, length);
    }

    private static DecompositionSolver lu(double[][] w) {
        return new LUDecomposition(new Array2DRowRealMatrix(w, false), SINGULARITY_THRESHOLD).getSolver();
    }

    private static boolean same(double[][] a, double[][] b) {
        return a == b || java.util.Arrays.deepEquals(a, b);
    }
}
