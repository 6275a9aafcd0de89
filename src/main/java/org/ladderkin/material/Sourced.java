package org.ladderkin.material;

import java.util.Objects;

/**
 * A value with the source it was taken from, kept side by side so that every number shown to a user can say where it
 * comes from. The value is SI (or dimensionless); NaN means the library knows no value and the user must supply one.
 *
 * @param value  the value in SI units, or NaN when unknown
 * @param source who published it (authors, journal, year, table/equation), or "from memory" / "common practice, no source"
 */
public record Sourced(double value, String source) {

    public Sourced {
        Objects.requireNonNull(source, "source");
        if (source.isBlank()) {
            throw new IllegalArgumentException("a value needs its source (write \"from memory\" if it has none)");
        }
        if (Double.isInfinite(value)) {
            throw new IllegalArgumentException("value must be finite or unknown (NaN), was " + value);
        }
    }

    /** A value the library does not know; {@code why} says what to do instead. */
    public static Sourced unknown(String why) {
        return new Sourced(Double.NaN, why);
    }

    /** Whether a value is present. */
    public boolean known() {
        return !Double.isNaN(value);
    }

    /** Whether the source admits it was recalled or is trade practice rather than a citation. */
    public boolean unconfirmed() {
        String s = source.toLowerCase(java.util.Locale.ROOT);
        return s.startsWith("from memory") || s.startsWith("common practice") || s.contains("(from memory");
    }
}
