package org.ladderkin.io;

import java.util.Objects;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * How to read a trace table where the file itself does not say.
 *
 * @param defaultDelayUnit unit of delays when the delay header names none (e.g. from {@code --delay-unit}); null
 *                         means such a header is an error
 * @param missing          what to do with missing values
 */
public record TableOptions(Unit defaultDelayUnit, MissingValuePolicy missing) {

    public TableOptions {
        Objects.requireNonNull(missing, "missing");
        if (defaultDelayUnit != null && defaultDelayUnit.dimension() != Dimension.TIME) {
            throw new IllegalArgumentException("default delay unit must be a time unit, was '" + defaultDelayUnit.symbol() + "'");
        }
    }

    /** Units must be in the header; missing values are dropped. */
    public static TableOptions defaults() {
        return new TableOptions(null, MissingValuePolicy.DROP);
    }
}
