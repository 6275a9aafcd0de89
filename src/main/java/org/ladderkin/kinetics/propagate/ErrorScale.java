package org.ladderkin.kinetics.propagate;

/** Scaled norms sc_i = absolute + relative·|y_i| from the {@link Tolerances}. */
final class ErrorScale {

    private final double absolute;
    private final double relative;

    ErrorScale(Tolerances tolerances) {
        this.absolute = tolerances.absolute();
        this.relative = tolerances.relative();
    }

    double scale(double y) {
        return absolute + relative * Math.abs(y);
    }

    /** max_i |v_i| / (abs + rel·max(|a_i|, |b_i|)): each component must meet its own tolerance. */
    double maxNorm(double[] v, double[] a, double[] b) {
        double m = 0;
        for (int i = 0; i < v.length; i++) {
            double s = absolute + relative * Math.max(Math.abs(a[i]), Math.abs(b[i]));
            m = Math.max(m, Math.abs(v[i]) / s);
        }
        return Double.isNaN(m) ? Double.POSITIVE_INFINITY : m;
    }

    /** Root mean square of v_i / sc(y_{i mod n}), v may hold several stages of length n = y.length. */
    double rmsNorm(double[] v, double[] y) {
        int n = y.length;
        double sum = 0;
        for (int i = 0; i < v.length; i++) {
            double q = v[i] / scale(y[i % n]);
            sum += q * q;
        }
        return Math.sqrt(sum / v.length);
    }
}
