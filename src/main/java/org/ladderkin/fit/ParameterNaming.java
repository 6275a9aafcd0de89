package org.ladderkin.fit;

import java.util.HashMap;
import java.util.Map;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.units.Units;

/**
 * The trade names of fit parameters: the key with its unit ({@code tauAuger2Ps}, {@code crossSectionCm2}) and the
 * factor from the SI value. One table for every output, so the JSON result, the HTML report and the terminal summary
 * name a parameter the same way.
 */
public final class ParameterNaming {

    /** Internal SI key → the key and factor used in outputs; fittable process lifetimes come from the registry. */
    private static final Map<String, TradeKey> TRADE = table();

    private static Map<String, TradeKey> table() {
        Map<String, TradeKey> t = new HashMap<>(Map.of(
                "crossSectionM2", new TradeKey("crossSectionCm2", 1 / Units.of("cm²").factorToSi()),
                "occupancyPerJ", new TradeKey("occupancyPerNj", Units.of("nJ").factorToSi()),
                "timeZeroS", new TradeKey("timeZeroPs", 1 / Units.of("ps").factorToSi()),
                "irfFwhmS", new TradeKey("irfFwhmPs", 1 / Units.of("ps").factorToSi())));
        for (ProcessParameter p : ProcessRegistry.fittable()) {
            String unit = p.tradeUnit();
            t.put(LadderBleachModel.kineticKey(p), new TradeKey(p.fitKey() + Character.toUpperCase(unit.charAt(0))
                    + unit.substring(1), 1 / Units.of(unit).factorToSi()));
        }
        return Map.copyOf(t);
    }

    private ParameterNaming() {
    }

    /** A parameter's key in outputs, and the factor from its SI value to the value shown with that key. */
    public record TradeKey(String key, double factor) {
        public TradeKey {
            if (key == null || key.isBlank()) {
                throw new IllegalArgumentException("a trade key needs a name");
            }
            if (!(factor > 0) || Double.isInfinite(factor)) {
                throw new IllegalArgumentException("factor must be finite and > 0, got " + factor);
            }
        }
    }

    /** The output key and factor of the internal key {@code siKey} (unchanged for pure numbers). */
    public static TradeKey trade(String siKey) {
        return TRADE.getOrDefault(siKey, new TradeKey(siKey, 1));
    }
}
