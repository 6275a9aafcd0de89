package org.ladderkin.fit;

import java.util.Map;
import org.ladderkin.units.Units;

/**
 * The trade names of fit parameters: the key with its unit ({@code tauAuger2Ps}, {@code crossSectionCm2}) and the
 * factor from the SI value. One table for every output, so the JSON result, the HTML report and the terminal summary
 * name a parameter the same way.
 */
public final class ParameterNaming {

    /** Internal SI key → the key and factor used in outputs. */
    private static final Map<String, TradeKey> TRADE = Map.of(
            "crossSectionM2", new TradeKey("crossSectionCm2", 1 / Units.of("cm²").factorToSi()),
            "occupancyPerJ", new TradeKey("occupancyPerNj", Units.of("nJ").factorToSi()),
            "tauAuger2S", new TradeKey("tauAuger2Ps", 1 / Units.of("ps").factorToSi()),
            "tauRadS", new TradeKey("tauRadNs", 1 / Units.of("ns").factorToSi()),
            "tauTrapS", new TradeKey("tauTrapPs", 1 / Units.of("ps").factorToSi()),
            "timeZeroS", new TradeKey("timeZeroPs", 1 / Units.of("ps").factorToSi()),
            "irfFwhmS", new TradeKey("irfFwhmPs", 1 / Units.of("ps").factorToSi()));

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
