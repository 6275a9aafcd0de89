package org.ladderkin.kinetics.propagate;

import java.util.Arrays;
import org.hipparchus.exception.MathIllegalArgumentException;

/**
 * One Radau IIA step from a base point (t, y): solves the collocation equations Z = h(A⊗I)F(y + Z) by simplified
 * Newton iterations (Hairer &amp; Wanner II, Sect. IV.8) and estimates the local error. Holds the Jacobian and the
 * factorizations between steps so that they can be reused. One instance serves one integration on one thread.
 * <p>
 * Linear systems ({@link StiffSystem#isLinear()}) take a short-cut: the Newton matrix is built with the exact
 * Jacobian of each stage time, so a single Newton iteration from Z = 0 solves the collocation equations exactly,
 * and the factorization is reused while the step and the stage Jacobians stay the same.
 */
final class RadauStepper {

    /** Newton iterations allowed per step (radau5's NIT). */
    static final int MAX_NEWTON = 7;

    /** Keep the Jacobian for the next step when Newton contracted faster than this (radau5's THET). */
    private static final double JACOBIAN_REUSE_THETA = 1e-3;

    private static final double EPS = Math.ulp(1.0);

    /** Outcome of one attempt. {@code hFactor} is the suggested step factor when Newton failed. */
    record Attempt(boolean converged, double errorNorm, int newtonIterations, double hFactor) {
        static Attempt newtonFailure(double hFactor) {
            return new Attempt(false, Double.POSITIVE_INFINITY, 0, hFactor);
        }
    }

    private final int maxNewton;
    private final StiffSystem system;
    private final int n;
    private final boolean linear;
    private final ErrorScale scale;
    private final StageMatrices algebra;

    private int jacobianEvaluations;
    private int factorizations;
    private String lastFailure = "none";
    /** Step factor suggested by the last failed Newton iteration. */
    private double failureFactor;

    private double t;
    private final double[] y;
    private final double[] f0;
    private boolean f0Valid;

    private final double[][] jac0;
    private boolean jac0Valid;
    private boolean jacobianAtBase;
    private final double[][][] stageJac;
    private final double[][][] stageJacTrial;
    private boolean newtonValid;
    private double newtonH = Double.NaN;
    private boolean filterValid;
    private double filterH = Double.NaN;

    private final double[] zPrev;
    private double hPrev;
    private boolean havePrev;
    private final NewtonMonitor monitor;

    private final double[] z;
    private final double[] dz;
    private final double[] stageY;
    private final double[][] stageF;
    private final double[] yNew;
    private final double[] err;

    RadauStepper(StiffSystem system, Tolerances tolerances) {
        this(system, tolerances, MAX_NEWTON);
    }

    /** @param maxNewton Newton iterations allowed per step; more than {@link #MAX_NEWTON} only for fixed steps */
    RadauStepper(StiffSystem system, Tolerances tolerances, int maxNewton) {
        this.maxNewton = maxNewton;
        this.system = system;
        this.n = system.dimension();
        this.linear = system.isLinear();
        this.scale = new ErrorScale(tolerances);
        this.algebra = new StageMatrices(n);
        double rtol = tolerances.relative();
        // radau5's stopping criterion for Newton, in units of the local tolerance, floored at round-off
        double newtonTolerance = rtol > 0 ? Math.max(10 * EPS / rtol, Math.min(0.03, Math.sqrt(rtol))) : 0.03;
        this.monitor = new NewtonMonitor(maxNewton, newtonTolerance);
        int m = RadauIIATableau.STAGES * n;
        y = new double[n];
        f0 = new double[n];
        jac0 = new double[n][n];
        stageJac = new double[3][n][n];
        stageJacTrial = new double[3][n][n];
        zPrev = new double[m];
        z = new double[m];
        dz = new double[m];
        stageY = new double[n];
        stageF = new double[3][n];
        yNew = new double[n];
        err = new double[n];
    }

    int jacobianEvaluations() {
        return jacobianEvaluations;
    }

    int factorizations() {
        return factorizations;
    }

    String lastFailure() {
        return lastFailure;
    }

    /** The state at the end of the last attempt (valid after a converged attempt). */
    double[] endState() {
        return yNew;
    }

    /** f(t, y) at the base point, evaluated on demand. */
    double[] baseDerivative() {
        ensureBaseDerivative();
        return f0;
    }

    /** Moves the base point (start of integration, or after an accepted step). */
    void setBasePoint(double tS, double[] state) {
        t = tS;
        System.arraycopy(state, 0, y, 0, n);
        f0Valid = false;
        jacobianAtBase = false;
        if (linear) {
            if (havePrev) {
                // stage 3 of the accepted step sits at the new base time: its Jacobian is J(t)
                if (!Arrays.deepEquals(jac0, stageJac[2])) {
                    copy(stageJac[2], jac0);
                    filterValid = false;
                }
                jac0Valid = true;
            }
        } else if (monitor.theta() > JACOBIAN_REUSE_THETA) {
            jac0Valid = false;
        }
    }

    /** Records the accepted step h so the next step can predict its stages from this step's polynomial. */
    void accept(double h) {
        System.arraycopy(z, 0, zPrev, 0, z.length);
        hPrev = h;
        havePrev = true;
    }

    /** After a rejected step: a Jacobian reused from an earlier point is refreshed before the retry. */
    void reject() {
        if (!linear && !jacobianAtBase) {
            jac0Valid = false;
        }
    }

    /** Attempts a step of size h from the base point. */
    Attempt attempt(double h, boolean improveErrorEstimate) {
        ensureBaseDerivative();
        try {
            prepareMatrices(h);
        } catch (MathIllegalArgumentException singular) {
            lastFailure = "singular Newton matrix (h = " + h + " s)";
            return Attempt.newtonFailure(0.5);
        }
        predictStages(h);
        int iterations = linear ? linearSolve(h) : newton(h);
        if (iterations < 0) {
            return Attempt.newtonFailure(failureFactor);
        }
        double errorNorm = errorEstimate(h, improveErrorEstimate);
        return new Attempt(true, errorNorm, iterations, 1.0);
    }

    private void ensureBaseDerivative() {
        if (!f0Valid) {
            system.derivatives(t, y, f0);
            if (!allFinite(f0)) {
                throw new StiffIntegrationException("non-finite derivative f(t, y) " + Arrays.toString(f0), t, y);
            }
            f0Valid = true;
        }
    }

    private void prepareMatrices(double h) {
        if (linear) {
            if (!jac0Valid) {
                evaluateJacobian(t, jac0);
                jac0Valid = true;
                filterValid = false;
            }
            for (int j = 0; j < 3; j++) {
                evaluateJacobian(t + RadauIIATableau.C[j] * h, stageJacTrial[j]);
            }
            if (!(newtonValid && h == newtonH && Arrays.deepEquals(stageJac, stageJacTrial))) {
                for (int j = 0; j < 3; j++) {
                    copy(stageJacTrial[j], stageJac[j]);
                }
                factorNewton(h, stageJac);
            }
        } else {
            if (!jac0Valid) {
                evaluateJacobian(t, jac0);
                jac0Valid = true;
                jacobianAtBase = true;
                newtonValid = false;
                filterValid = false;
            }
            if (!(newtonValid && h == newtonH)) {
                factorNewton(h, new double[][][] {jac0, jac0, jac0});
            }
        }
        if (!(filterValid && h == filterH)) {
            filterValid = false;
            algebra.factorErrorFilter(h, jac0);
            factorizations++;
            filterValid = true;
            filterH = h;
        }
    }

    private void factorNewton(double h, double[][][] jacobians) {
        newtonValid = false;
        factorizations += algebra.factorNewton(h, jacobians);
        newtonValid = true;
        newtonH = h;
        if (algebra.isSplit() && Arrays.deepEquals(jacobians[0], jac0)) {
            // the split real block is I − hγ₀J with J = J(t₀): exactly the error filter
            algebra.adoptRealBlockAsErrorFilter();
            filterValid = true;
            filterH = h;
        }
    }

    private void evaluateJacobian(double tS, double[][] target) {
        system.jacobian(tS, y, target);
        jacobianEvaluations++;
        for (double[] row : target) {
            if (!allFinite(row)) {
                throw new StiffIntegrationException("non-finite Jacobian at t = " + tS + " s", t, y);
            }
        }
    }

    /** Starting values: the previous step's collocation polynomial extrapolated (nonlinear), or zero (linear). */
    private void predictStages(double h) {
        if (linear || !havePrev) {
            Arrays.fill(z, 0.0);
            return;
        }
        for (int j = 0; j < 3; j++) {
            double s = 1.0 + RadauIIATableau.C[j] * h / hPrev;
            double l0 = RadauIIATableau.lagrange(0, s);
            double l1 = RadauIIATableau.lagrange(1, s);
            double l2 = RadauIIATableau.lagrange(2, s);
            for (int k = 0; k < n; k++) {
                z[j * n + k] = l0 * zPrev[k] + l1 * zPrev[n + k] + l2 * zPrev[2 * n + k] - zPrev[2 * n + k];
            }
        }
    }

    /** Newton residual −Z + h(A⊗I)F(y + Z) into dz; false when F is not finite. */
    private boolean residual(double h) {
        for (int j = 0; j < 3; j++) {
            for (int k = 0; k < n; k++) {
                stageY[k] = y[k] + z[j * n + k];
            }
            system.derivatives(t + RadauIIATableau.C[j] * h, stageY, stageF[j]);
            if (!allFinite(stageF[j])) {
                lastFailure = "non-finite derivative in stage " + (j + 1) + " at t = " + (t + RadauIIATableau.C[j] * h)
                        + " s";
                return false;
            }
        }
        for (int i = 0; i < 3; i++) {
            double[] a = RadauIIATableau.A[i];
            for (int k = 0; k < n; k++) {
                dz[i * n + k] = -z[i * n + k] + h * (a[0] * stageF[0][k] + a[1] * stageF[1][k] + a[2] * stageF[2][k]);
            }
        }
        return true;
    }

    /** One exact Newton iteration for a linear system; returns 1, or −1 on failure. */
    private int linearSolve(double h) {
        if (!residual(h)) {
            return newtonFailed(0.5);
        }
        algebra.solveNewton(dz);
        for (int i = 0; i < z.length; i++) {
            z[i] += dz[i];
        }
        if (!allFinite(z)) {
            lastFailure = "non-finite stage values";
            return newtonFailed(0.5);
        }
        return 1;
    }

    /**
     * Simplified Newton iterations judged by {@link NewtonMonitor}; returns the iteration count, or −1 when the
     * iteration diverges or is too slow (the suggested step factor is then in {@link #failureFactor}).
     */
    private int newton(double h) {
        monitor.start();
        for (int newt = 1; newt <= maxNewton; newt++) {
            if (!residual(h)) {
                return newtonFailed(0.5);
            }
            algebra.solveNewton(dz);
            double norm = scale.rmsNorm(dz, y);
            if (!monitor.proceed(newt, norm)) {
                lastFailure = monitor.failure();
                return newtonFailed(monitor.failureFactor());
            }
            for (int i = 0; i < z.length; i++) {
                z[i] += dz[i];
            }
            if (monitor.converged(norm)) {
                return newt;
            }
        }
        monitor.exhausted();
        lastFailure = monitor.failure();
        return newtonFailed(0.5);
    }

    private int newtonFailed(double hFactor) {
        if (!jacobianAtBase) {
            jac0Valid = false;
        }
        failureFactor = hFactor;
        return -1;
    }

    /** Scaled max-norm of the embedded error estimate; also fills {@link #endState()}. */
    private double errorEstimate(double h, boolean improve) {
        for (int k = 0; k < n; k++) {
            yNew[k] = y[k] + z[2 * n + k];
        }
        fillErrorRhs(h, f0);
        algebra.solveErrorFilter(err);
        double norm = scale.maxNorm(err, y, yNew);
        if (norm >= 1 && improve) {
            // first step or after a rejection: one more filtering tames the estimate for very stiff components
            double[] w = new double[n];
            for (int k = 0; k < n; k++) {
                w[k] = y[k] + err[k];
            }
            double[] fw = new double[n];
            system.derivatives(t, w, fw);
            if (allFinite(fw)) {
                fillErrorRhs(h, fw);
                algebra.solveErrorFilter(err);
                norm = scale.maxNorm(err, y, yNew);
            }
        }
        return norm;
    }

    private void fillErrorRhs(double h, double[] f) {
        double[] e = RadauIIATableau.E;
        double hg = h * RadauIIATableau.GAMMA0;
        for (int k = 0; k < n; k++) {
            err[k] = hg * f[k] + e[0] * z[k] + e[1] * z[n + k] + e[2] * z[2 * n + k];
        }
    }

    private static void copy(double[][] from, double[][] to) {
        for (int r = 0; r < from.length; r++) {
            System.arraycopy(from[r], 0, to[r], 0, from[r].length);
        }
    }

    static boolean allFinite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
