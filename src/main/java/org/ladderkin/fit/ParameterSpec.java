package org.ladderkin.fit;

import java.util.Objects;
import java.util.regex.Pattern;

/**
 * One nonlinear model parameter as the fit sees it. Values are SI; {@code unitSuffix} completes the name the way
 * variables are named in the code ({@code tau1} + {@code S} = {@code tau1S}).
 *
 * @param name       identifier, e.g. "tauAuger2"
 * @param unitSuffix SI unit suffix, e.g. "S", "M2", or "" for a pure number
 * @param start      starting value (SI); strictly inside the bounds when the parameter is free
 * @param lower      lower bound (SI) or -∞
 * @param upper      upper bound (SI) or +∞, &gt; lower
 * @param fixed      held at {@code start} instead of fitted
 * @param scope      one value for the whole series, or one per trace
 * @param scale      typical magnitude (SI, &gt; 0): sets finite-difference steps of an unbounded parameter
 */
public record ParameterSpec(String name, String unitSuffix, double start, double lower, double upper, boolean fixed,
                            Scope scope, double scale) {

    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z][A-Za-z0-9]*");

    /** Whether one value serves all traces. */
    public enum Scope {
        /** One value for every trace (a lifetime, a cross-section). */
        SHARED,
        /** One value per trace (a time-zero shift). */
        PER_TRACE
    }

    public ParameterSpec {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unitSuffix, "unitSuffix");
        Objects.requireNonNull(scope, "scope");
        if (!IDENTIFIER.matcher(name).matches()) {
            throw new IllegalArgumentException("parameter name must be letters and digits starting with a letter, was '" + name + "'");
        }
        String key = name + unitSuffix;
        if (!Double.isFinite(start)) {
            throw new IllegalArgumentException(key + ": start must be finite, was " + start);
        }
        if (Double.isNaN(lower) || Double.isNaN(upper) || !(lower < upper)) {
            throw new IllegalArgumentException(key + ": bounds must satisfy lower < upper, were " + lower + " and " + upper);
        }
        if (fixed ? start < lower || start > upper : !(start > lower && start < upper)) {
            throw new IllegalArgumentException(key + ": start " + start + " must lie " + (fixed ? "within" : "strictly inside")
                    + " the bounds [" + lower + ", " + upper + "]");
        }
        if (!(scale > 0) || !Double.isFinite(scale)) {
            throw new IllegalArgumentException(key + ": scale must be finite and > 0, was " + scale);
        }
    }

    /** A free shared parameter with bounds; the scale is taken from the start (or the bound width when the start is 0). */
    public static ParameterSpec shared(String name, String unitSuffix, double start, double lower, double upper) {
        return new ParameterSpec(name, unitSuffix, start, lower, upper, false, Scope.SHARED, defaultScale(start, lower, upper));
    }

    /** A free shared parameter that must be positive: fitted on a log scale. */
    public static ParameterSpec positive(String name, String unitSuffix, double start) {
        return shared(name, unitSuffix, start, 0, Double.POSITIVE_INFINITY);
    }

    /** A free shared parameter without bounds; {@code scale} is its typical magnitude. */
    public static ParameterSpec unbounded(String name, String unitSuffix, double start, double scale) {
        return new ParameterSpec(name, unitSuffix, start, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, false,
                Scope.SHARED, scale);
    }

    /** Name with unit suffix, e.g. "tau1S". */
    public String key() {
        return name + unitSuffix;
    }

    /** A copy held fixed at {@code value}. */
    public ParameterSpec fixedAt(double value) {
        return new ParameterSpec(name, unitSuffix, value, Math.min(lower, value), Math.max(upper, value), true, scope, scale);
    }

    /** A copy starting at {@code value}, which must satisfy the same bound rules as any start. */
    public ParameterSpec startingAt(double value) {
        return new ParameterSpec(name, unitSuffix, value, lower, upper, fixed, scope, scale);
    }

    /** A copy with another scope. */
    public ParameterSpec withScope(Scope newScope) {
        return new ParameterSpec(name, unitSuffix, start, lower, upper, fixed, newScope, scale);
    }

    private static double defaultScale(double start, double lower, double upper) {
        if (start != 0) {
            return Math.abs(start);
        }
        return Double.isFinite(upper - lower) ? upper - lower : 1;
    }
}
