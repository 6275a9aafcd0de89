package org.ladderkin.fit.counting;

import org.ladderkin.fit.ParameterSpec;

/**
 * The optimiser's coordinates: log of the distance to a single bound (in units of the parameter's scale), logistic
 * between two bounds, the value over its scale without bounds. All are of order one, so one finite-difference step
 * serves every parameter.
 */
final class InternalScale {

    private InternalScale() {
    }

    static double toInternal(ParameterSpec s, double p) {
        boolean l = Double.isFinite(s.lower());
        boolean h = Double.isFinite(s.upper());
        if (l && h) {
            double x = (p - s.lower()) / (s.upper() - s.lower());
            return Math.log(x / (1 - x));
        }
        if (l) {
            return Math.log((p - s.lower()) / s.scale());
        }
        if (h) {
            return Math.log((s.upper() - p) / s.scale());
        }
        return p / s.scale();
    }

    static double toExternal(ParameterSpec s, double u) {
        boolean l = Double.isFinite(s.lower());
        boolean h = Double.isFinite(s.upper());
        if (l && h) {
            return s.lower() + (s.upper() - s.lower()) / (1 + Math.exp(-u));
        }
        if (l) {
            return s.lower() + s.scale() * Math.exp(u);
        }
        if (h) {
            return s.upper() - s.scale() * Math.exp(u);
        }
        return u * s.scale();
    }

    static double slope(ParameterSpec s, double u) {
        boolean l = Double.isFinite(s.lower());
        boolean h = Double.isFinite(s.upper());
        if (l && h) {
            double e = Math.exp(-Math.abs(u));
            return (s.upper() - s.lower()) * e / ((1 + e) * (1 + e));
        }
        if (l) {
            return s.scale() * Math.exp(u);
        }
        if (h) {
            return -s.scale() * Math.exp(u);
        }
        return s.scale();
    }
}
