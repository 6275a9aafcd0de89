package org.ladderkin.kinetics.propagate;

/**
 * Convergence monitor of the simplified Newton iteration, after Hairer's radau5 (Hairer &amp; Wanner II,
 * Sect. IV.8): estimates the contraction rate θ from successive increments, stops when the remaining error
 * θ/(1 − θ)·‖ΔZ‖ is below the Newton tolerance, and gives up early (with a suggested step factor) when θ predicts
 * that the iteration cannot converge within the allowed iterations. θ is kept between steps: a small θ lets the
 * stepper keep its Jacobian.
 */
final class NewtonMonitor {

    private static final double EPS = Math.ulp(1.0);

    private final int maxIterations;
    private final double tolerance;

    private double theta;
    private double facCon = 1.0;
    private double previousNorm;
    private double previousRatio;
    private double failureFactor;
    private String failure = "none";

    /**
     * @param maxIterations iterations allowed per step
     * @param tolerance     stopping threshold in units of the local error tolerance
     */
    NewtonMonitor(int maxIterations, double tolerance) {
        this.maxIterations = maxIterations;
        this.tolerance = tolerance;
    }

    /** Begins a new iteration; the previous convergence rate seeds the first stopping test. */
    void start() {
        facCon = Math.pow(Math.max(facCon, EPS), 0.8);
        previousNorm = 0;
        previousRatio = 0;
    }

    /**
     * Judges iteration {@code iteration} (from 1) with scaled increment norm {@code norm}, before the increment is
     * applied. Returns false when the iteration should be abandoned ({@link #failureFactor()} then suggests how
     * to shrink the step).
     */
    boolean proceed(int iteration, double norm) {
        if (!Double.isFinite(norm)) {
            return fail(0.5, "non-finite Newton increment");
        }
        if (iteration > 1 && iteration < maxIterations) {
            double ratio = norm / previousNorm;
            theta = iteration == 2 ? ratio : Math.sqrt(ratio * previousRatio);
            previousRatio = ratio;
            if (theta >= 0.99) {
                return fail(0.5, "Newton diverges (contraction " + theta + ")");
            }
            facCon = theta / (1 - theta);
            // predicted error after the remaining iterations, relative to the tolerance
            double predicted = facCon * norm * Math.pow(theta, maxIterations - 1 - iteration) / tolerance;
            if (predicted >= 1) {
                double q = Math.max(1e-4, Math.min(20, predicted));
                return fail(0.8 * Math.pow(q, -1.0 / (4 + maxIterations - 1 - iteration)),
                        "Newton too slow (contraction " + theta + ")");
            }
        }
        previousNorm = Math.max(norm, EPS);
        return true;
    }

    /** Whether the iterate, after applying an increment of scaled norm {@code norm}, is accurate enough. */
    boolean converged(double norm) {
        return facCon * norm <= tolerance;
    }

    /** Records that the iteration ran out of iterations. */
    void exhausted() {
        fail(0.5, "Newton did not converge in " + maxIterations + " iterations");
    }

    private boolean fail(double stepFactor, String why) {
        failureFactor = stepFactor;
        failure = why;
        facCon = 1.0;
        return false;
    }

    /** Last contraction-rate estimate θ. */
    double theta() {
        return theta;
    }

    /** Step factor suggested by the last failure. */
    double failureFactor() {
        return failureFactor;
    }

    /** Why the last iteration failed. */
    String failure() {
        return failure;
    }
}
