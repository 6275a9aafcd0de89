package org.ladderkin.fit;

/**
 * Maps a bounded parameter p to an unbounded internal u so the optimiser can roam freely: p = lo + e^u for a lower
 * bound only (a log scale for positive quantities), p = hi − e^u for an upper bound only, p = lo + (hi − lo)/(1 + e^−u)
 * (logistic) for both, and p = u without bounds.
 */
final class BoundTransform {

    /** Cube root of the double epsilon: the step that balances truncation and rounding error of central differences. */
    static final double CENTRAL_STEP = Math.cbrt(Math.ulp(1.0));

    private enum Kind { NONE, LOWER, UPPER, BOTH }

    private final Kind kind;
    private final double lo;
    private final double hi;
    private final double scale;

    BoundTransform(ParameterSpec spec) {
        boolean l = Double.isFinite(spec.lower());
        boolean h = Double.isFinite(spec.upper());
        kind = l && h ? Kind.BOTH : l ? Kind.LOWER : h ? Kind.UPPER : Kind.NONE;
        lo = spec.lower();
        hi = spec.upper();
        scale = spec.scale();
    }

    double toExternal(double u) {
        return switch (kind) {
            case NONE -> u;
            case LOWER -> lo + Math.exp(u);
            case UPPER -> hi - Math.exp(u);
            case BOTH -> lo + (hi - lo) / (1 + Math.exp(-u));
        };
    }

    double toInternal(double p) {
        return switch (kind) {
            case NONE -> p;
            case LOWER -> Math.log(p - lo);
            case UPPER -> Math.log(hi - p);
            case BOTH -> {
                double x = (p - lo) / (hi - lo);
                yield Math.log(x / (1 - x));
            }
        };
    }

    /** dp/du at u. */
    double derivative(double u) {
        return switch (kind) {
            case NONE -> 1;
            case LOWER -> Math.exp(u);
            case UPPER -> -Math.exp(u);
            case BOTH -> {
                double e = Math.exp(-Math.abs(u));
                yield (hi - lo) * e / ((1 + e) * (1 + e));
            }
        };
    }

    /**
     * Central-difference step in u. On the log and logistic scales u is already relative, so a fixed step is a fixed
     * relative change of p; without bounds the step follows the parameter's magnitude or its declared scale.
     */
    double step(double u) {
        return kind == Kind.NONE ? CENTRAL_STEP * Math.max(Math.abs(u), scale) : CENTRAL_STEP;
    }
}
