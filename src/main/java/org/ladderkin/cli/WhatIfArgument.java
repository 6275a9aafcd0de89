package org.ladderkin.cli;

import java.util.Locale;
import org.ladderkin.plan.WhatIfChange;
import org.ladderkin.sample.Refresh;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * The {@code --what-if} argument: {@code refresh=static}, {@code refresh=stirred},
 * {@code refresh=flowing:5 mL/min:0.5 mL} or {@code rate=80 MHz} (the laser at that rate with no pulse picking).
 */
final class WhatIfArgument {

    private WhatIfArgument() {
    }

    /** The typed change that {@code change} writes. */
    static WhatIfChange parse(String change) {
        String[] kv = change.split("=", 2);
        if (kv.length != 2) {
            throw new IllegalArgumentException("what-if '" + change + "' must look like refresh=static or rate=80 MHz");
        }
        String key = kv[0].strip();
        String value = kv[1].strip();
        return switch (key) {
            case "refresh" -> new WhatIfChange.RefreshChange(refresh(value));
            case "rate" -> new WhatIfChange.RepetitionRateChange(Quantity.parseSi(value, Dimension.FREQUENCY));
            default -> throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "unknown what-if '%s' (known: refresh=static|stirred|flowing:<flow>:<cell volume>[:<cross-section>], rate=<frequency>)", key));
        };
    }

    private static Refresh refresh(String value) {
        String[] parts = value.split(":");
        return switch (parts[0].strip()) {
            case "static" -> Refresh.stationary();
            case "stirred" -> Refresh.stirred();
            case "flowing" -> {
                if (parts.length != 3 && parts.length != 4) {
                    throw new IllegalArgumentException("what-if refresh=flowing needs flow rate and cell volume, and "
                            + "optionally the cell's cross-section, e.g. refresh=flowing:5 mL/min:0.5 mL:10 mm2");
                }
                yield Refresh.flowing(Quantity.parseSi(parts[1], Dimension.VOLUMETRIC_FLOW),
                        Quantity.parseSi(parts[2], Dimension.VOLUME),
                        parts.length == 4 ? Quantity.parseSi(parts[3], Dimension.AREA) : Double.NaN);
            }
            default -> throw new IllegalArgumentException("what-if refresh must be static, stirred or flowing, was '"
                    + parts[0] + "'");
        };
    }
}
