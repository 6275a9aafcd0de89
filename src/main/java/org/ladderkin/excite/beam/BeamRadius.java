package org.ladderkin.excite.beam;

import java.util.Objects;

/**
 * A measured 1/e² intensity radius with its standard error and the method that gave it.
 *
 * @param radiusM    1/e² intensity radius
 * @param stdErrorM  standard error of the radius (0 when the data carry no noise to estimate it from)
 * @param method     how the radius was measured
 */
public record BeamRadius(double radiusM, double stdErrorM, Method method) {

    /** How a radius was measured. */
    public enum Method {
        /** Error-function fit to a knife-edge scan. */
        KNIFE_EDGE,
        /** Second moments of a camera image (ISO 11146-1 D4σ), reported as the equivalent radius √(wx·wy). */
        SECOND_MOMENTS
    }

    public BeamRadius {
        if (!(radiusM > 0) || Double.isInfinite(radiusM)) {
            throw new IllegalArgumentException("beam radius must be > 0 and finite, was " + radiusM + " m");
        }
        if (!(stdErrorM >= 0)) {
            throw new IllegalArgumentException("standard error of the beam radius must be >= 0, was " + stdErrorM + " m");
        }
        Objects.requireNonNull(method, "method");
    }

    /**
     * The equivalent radius √(wx·wy) of an elliptical spot from its radii along two perpendicular axes (the radius of the
     * round beam with the same peak fluence per joule), its error propagated from independent errors of the two.
     */
    public static BeamRadius equivalent(BeamRadius x, BeamRadius y) {
        if (x.method() != y.method()) {
            throw new IllegalArgumentException("radii measured by " + x.method() + " and " + y.method() + " are not combined");
        }
        double r = Math.sqrt(x.radiusM() * y.radiusM());
        double rel = 0.5 * Math.hypot(x.stdErrorM() / x.radiusM(), y.stdErrorM() / y.radiusM());
        return new BeamRadius(r, r * rel, x.method());
    }
}
