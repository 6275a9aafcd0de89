package org.ladderkin.fit;

import java.util.Objects;

/**
 * A fitted (or fixed) parameter with its standard error.
 *
 * @param key      name with unit suffix ("tau1S"), or "amplitude" / "baseline" for the linear terms
 * @param trace    the trace index for per-trace values, -1 for shared ones
 * @param value    best value (SI)
 * @param stdError one standard error (SI), from the covariance scaled by the reduced χ²; 0 for fixed parameters;
 *                 NaN only when the result's status says the covariance could not be formed
 * @param fixed    whether the value was held rather than fitted
 */
public record ParameterEstimate(String key, int trace, double value, double stdError, boolean fixed) {

    public ParameterEstimate {
        Objects.requireNonNull(key, "key");
        if (trace < -1) {
            throw new IllegalArgumentException(key + ": trace index must be >= -1, was " + trace);
        }
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(key + ": estimate must be finite, was " + value);
        }
    }

    /** Whether this is a shared value. */
    public boolean shared() {
        return trace < 0;
    }
}
