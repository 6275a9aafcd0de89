package org.ladderkin.units;

import java.util.List;
import java.util.Objects;

/**
 * A unit of a {@link Dimension}: value_SI = value · factorToSi + offsetSi. Only temperatures in °C use an offset.
 *
 * @param symbol    the canonical way to write it, used when formatting
 * @param dimension what it measures
 * @param factorToSi multiply a value in this unit by this to get SI
 * @param offsetSi  added after scaling (°C → K); zero otherwise
 * @param aliases   other spellings accepted on input (after µ/μ/u and superscript normalisation)
 */
public record Unit(String symbol, Dimension dimension, double factorToSi, double offsetSi, List<String> aliases) {

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
        if (!(factorToSi > 0) || Double.isInfinite(factorToSi)) {
            throw new IllegalArgumentException("unit factor must be > 0 and finite, was " + factorToSi + " for " + symbol);
        }
        aliases = List.copyOf(aliases);
    }

    /** Converts a value written in this unit to SI. */
    public double toSi(double value) {
        return value * factorToSi + offsetSi;
    }

    /** Converts an SI value to this unit. */
    public double fromSi(double valueSi) {
        return (valueSi - offsetSi) / factorToSi;
    }
}
