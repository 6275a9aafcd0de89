package org.ladderkin.kinetics.propagate;

/**
 * Step size selection for the Radau IIA integrator: the standard controller h_new = h·fac·err^(−1/4) (the error
 * estimate is of local order 4), with growth and shrink limits, a safety factor that falls when Newton needed
 * many iterations (Hairer &amp; Wanner II, Sect. IV.8), and the usual initial step guess (Hairer, Nørsett &amp; Wanner I,
 * Sect. II.4).
 */
final class StepSizeController {

    /** Largest growth of the step per accepted step. */
    static final double MAX_GROWTH = 8.0;
    /** Smallest shrink factor per step. */
    static final double MIN_SHRINK = 0.2;
    /** Upper end of the ratio band in which the step is kept unchanged so the Newton factorization is reused. */
    static final double HOLD_UPPER = 1.2;

    private static final double SAFETY = 0.9;

    private final int maxNewtonIterations;

    StepSizeController(int maxNewtonIterations) {
        this.maxNewtonIterations = maxNewtonIterations;
    }

    /** Factor by which to multiply the step just tried, given its scaled error norm and Newton iteration count. */
    double factor(double errorNorm, int newtonIterations) {
        // fewer iterations → more trust in the step (Hairer's radau5: fac = safe·(1+2·nit)/(newt+2·nit))
        double safety = Math.min(SAFETY, SAFETY * (2 * maxNewtonIterations + 1)
                / (newtonIterations + 2 * maxNewtonIterations));
        if (errorNorm == 0) {
            return MAX_GROWTH;
        }
        double f = safety * Math.pow(errorNorm, -1.0 / (RadauIIATableau.ORDER - 1));
        return Math.max(MIN_SHRINK, Math.min(MAX_GROWTH, f));
    }

    /**
     * Initial step from the size of y₀, f₀ and a finite-difference estimate of the second derivative, bounded by
     * the span to the first output.
     */
    static double initialStep(StiffSystem system, double t0, double[] y0, double[] f0, ErrorScale scale,
                              double spanS) {
        int n = y0.length;
        double d0 = scale.rmsNorm(y0, y0);
        double d1 = scale.rmsNorm(f0, y0);
        double h0 = (d0 < 1e-5 || d1 < 1e-5) ? 1e-6 * spanS : 0.01 * d0 / d1;
        h0 = Math.min(h0, spanS);
        double[] y1 = new double[n];
        for (int i = 0; i < n; i++) {
            y1[i] = y0[i] + h0 * f0[i];
        }
        double[] f1 = new double[n];
        system.derivatives(t0 + h0, y1, f1);
        for (int i = 0; i < n; i++) {
            f1[i] -= f0[i];
        }
        double d2 = scale.rmsNorm(f1, y0) / h0;
        double dMax = Math.max(d1, d2);
        double h1 = (dMax <= 1e-15 || !Double.isFinite(dMax)) ? Math.max(1e-6, h0 * 1e-3)
                : Math.pow(0.01 / dMax, 1.0 / (RadauIIATableau.ORDER + 1));
        return Math.min(Math.min(100 * h0, h1), spanS);
    }
}
