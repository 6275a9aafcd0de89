package org.ladderkin.kinetics.propagate;

/**
 * Coefficients of the 3-stage Radau IIA collocation method of order 5 (Hairer &amp; Wanner, Solving Ordinary
 * Differential Equations II, 2nd ed., Sect. IV.5 and IV.8), with its embedded error estimate.
 * <p>
 * The method is stiffly accurate (b is the last row of A) and L-stable. The error estimate is
 * (I − hγ₀J)⁻¹ [γ₀ h f(t₀, y₀) + Σᵢ eᵢ Zᵢ], where γ₀ is the real eigenvalue of A and the eᵢ are derived here
 * from an order-3 embedded quadrature that adds the node c₀ = 0 with weight γ₀ (Sect. IV.8).
 */
final class RadauIIATableau {

    /** Number of stages. */
    static final int STAGES = 3;

    /** Classical order of the method. */
    static final int ORDER = 5;

    private static final double SQ6 = Math.sqrt(6.0);

    /** Nodes c₁, c₂, c₃ = 1. */
    static final double[] C = {(4.0 - SQ6) / 10.0, (4.0 + SQ6) / 10.0, 1.0};

    /** Runge–Kutta matrix A (row i, column j). */
    static final double[][] A = {
            {(88.0 - 7.0 * SQ6) / 360.0, (296.0 - 169.0 * SQ6) / 1800.0, (-2.0 + 3.0 * SQ6) / 225.0},
            {(296.0 + 169.0 * SQ6) / 1800.0, (88.0 + 7.0 * SQ6) / 360.0, (-2.0 - 3.0 * SQ6) / 225.0},
            {(16.0 - SQ6) / 36.0, (16.0 + SQ6) / 36.0, 1.0 / 9.0}};

    /** Weights b (equal to the last row of A). */
    static final double[] B = A[2].clone();

    /**
     * The real eigenvalue γ₀ of A: A has eigenvalues γ₀ and a complex pair, the reciprocals of the eigenvalues
     * 3 + 3^(2/3) − 3^(1/3) and a complex pair of A⁻¹.
     */
    static final double GAMMA0 = (6.0 + Math.cbrt(81.0) - Math.cbrt(9.0)) / 30.0;

    /** Error-estimate weights e = A⁻ᵀ(b̂ − b), see {@link #embeddedErrorWeights()}. */
    static final double[] E = embeddedErrorWeights();

    /**
     * Real eigenbasis T = [v, u, w] of A: v the eigenvector of γ₀, u ± i·w that of the complex pair. Then
     * T⁻¹AT = {@link #LAMBDA} is block diagonal (γ₀ and a 2×2 rotation-scaling block), which splits the 3n×3n
     * Newton system into an n×n real and a 2n×2n real system when the stages share one Jacobian
     * (Hairer &amp; Wanner II, Sect. IV.8).
     */
    static final double[][] T = eigenbasis();

    /** T⁻¹. */
    static final double[][] T_INV = inverse(T);

    /** T⁻¹AT, computed so that the split system is consistent with A to rounding. */
    static final double[][] LAMBDA = product(product(T_INV, A), T);

    private RadauIIATableau() {
    }

    private static double[][] eigenbasis() {
        // the complex pair μ = α ± iβ follows from trace and determinant, since one eigenvalue is γ₀
        double trace = A[0][0] + A[1][1] + A[2][2];
        double det = A[0][0] * (A[1][1] * A[2][2] - A[1][2] * A[2][1])
                - A[0][1] * (A[1][0] * A[2][2] - A[1][2] * A[2][0])
                + A[0][2] * (A[1][0] * A[2][1] - A[1][1] * A[2][0]);
        double alpha = (trace - GAMMA0) / 2;
        double beta = Math.sqrt(det / GAMMA0 - alpha * alpha);
        // a null vector of a rank-2 3×3 matrix is the cross product of two of its rows (complex, no conjugation)
        double[] v = new double[3];
        double[] u = new double[3];
        double[] w = new double[3];
        double[][] re0 = {A[0].clone(), A[1].clone()};
        re0[0][0] -= GAMMA0;
        re0[1][1] -= GAMMA0;
        for (int k = 0; k < 3; k++) {
            int a = (k + 1) % 3;
            int b = (k + 2) % 3;
            v[k] = re0[0][a] * re0[1][b] - re0[0][b] * re0[1][a];
        }
        double[][] re = {A[0].clone(), A[1].clone()};
        re[0][0] -= alpha;
        re[1][1] -= alpha;
        double[][] im = {{-beta, 0, 0}, {0, -beta, 0}};
        for (int k = 0; k < 3; k++) {
            int a = (k + 1) % 3;
            int b = (k + 2) % 3;
            // (r0a·r1b − r0b·r1a) in complex arithmetic
            u[k] = (re[0][a] * re[1][b] - im[0][a] * im[1][b]) - (re[0][b] * re[1][a] - im[0][b] * im[1][a]);
            w[k] = (re[0][a] * im[1][b] + im[0][a] * re[1][b]) - (re[0][b] * im[1][a] + im[0][b] * re[1][a]);
        }
        return new double[][] {{v[0], u[0], w[0]}, {v[1], u[1], w[1]}, {v[2], u[2], w[2]}};
    }

    private static double[][] inverse(double[][] m) {
        double[][] inv = new double[3][3];
        for (int col = 0; col < 3; col++) {
            double[] e = new double[3];
            e[col] = 1;
            double[] x = SmallDense.solve(m, e);
            for (int r = 0; r < 3; r++) {
                inv[r][col] = x[r];
            }
        }
        return inv;
    }

    private static double[][] product(double[][] a, double[][] b) {
        double[][] p = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                for (int k = 0; k < 3; k++) {
                    p[i][j] += a[i][k] * b[k][j];
                }
            }
        }
        return p;
    }

    /**
     * The embedded method ŷ₁ = y₀ + h[γ₀ f(t₀, y₀) + Σ b̂ᵢ f(Yᵢ)] has order 3 when
     * γ₀·0^(k−1) + Σ b̂ᵢ cᵢ^(k−1) = 1/k for k = 1, 2, 3; ŷ₁ − y₁ = γ₀ h f₀ + Σ (b̂ − b)ᵢ h f(Yᵢ), and h f(Y) = A⁻¹ Z
     * turns the stage derivatives into the stage increments Z the integrator already holds.
     */
    static double[] embeddedErrorWeights() {
        double[][] vandermonde = new double[3][3];
        double[] rhs = new double[3];
        for (int k = 0; k < 3; k++) {
            for (int i = 0; i < 3; i++) {
                vandermonde[k][i] = Math.pow(C[i], k);
            }
            rhs[k] = 1.0 / (k + 1) - (k == 0 ? GAMMA0 : 0.0);
        }
        double[] bHat = SmallDense.solve(vandermonde, rhs);
        double[] diff = new double[3];
        for (int i = 0; i < 3; i++) {
            diff[i] = bHat[i] - B[i];
        }
        // e = A^{-T} (b̂ − b)  ⇔  Aᵀ e = b̂ − b
        return SmallDense.solve(SmallDense.transpose(A), diff);
    }

    /**
     * Lagrange basis on the nodes {0, c₁, c₂, c₃} for node cᵢ, evaluated at s (in units of the step): the
     * collocation polynomial of a step is u(s) = Σᵢ Zᵢ ℓᵢ(s), used to predict the next step's stages.
     */
    static double lagrange(int i, double s) {
        double num = s;
        double den = C[i];
        for (int j = 0; j < 3; j++) {
            if (j != i) {
                num *= s - C[j];
                den *= C[i] - C[j];
            }
        }
        return num / den;
    }
}
