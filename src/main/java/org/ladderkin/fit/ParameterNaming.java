package org.ladderkin.fit;

import java.util.HashMap;
import java.util.Map;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.units.Units;

/**
 * The trade names of fit parameters: the key with its unit ({@code tauAuger2Ps}, {@code crossSectionCm2}) and the
 * factor from the SI value, and the label a person reads ("σ (cm²)", "τ₂ (ps)"). One table for every output, so the
 * JSON result (keys), the HTML report, the fit tab and the terminal summary (labels) name a parameter the same way.
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

    /** Symbols of fittable lifetimes whose registry label does not end in one. */
    private static final Map<String, String> SYMBOLS = Map.of("tauTrap", "τ_trap");

    /** Internal SI key → symbol and trade unit for people; fittable process lifetimes come from the registry. */
    private static final Map<String, Label> LABELS = labels();

    private static Map<String, Label> labels() {
        Map<String, Label> t = new HashMap<>(Map.of(
                "crossSectionM2", new Label("σ", "cm²"),
                "occupancyPerJ", new Label("⟨N⟩ per pulse energy", "per nJ"),
                "occupancyScale", new Label("factor on the given ⟨N⟩", ""),
                "timeZeroS", new Label("time zero", "ps"),
                "multiplicationYield", new Label("η", ""),
                "irfFwhmS", new Label("IRF FWHM", "ps"),
                "amplitudeOd", new Label("shared amplitude", ""),
                "amplitude", new Label("amplitude", ""),
                "baseline", new Label("baseline", "")));
        for (ProcessParameter p : ProcessRegistry.fittable()) {
            String label = p.label();
            int tau = label.lastIndexOf('τ');
            String symbol = SYMBOLS.getOrDefault(p.fitKey(), tau >= 0 ? label.substring(tau) : label);
            t.put(LadderBleachModel.kineticKey(p), new Label(symbol, p.tradeUnit()));
        }
        return Map.copyOf(t);
    }

    private ParameterNaming() {
    }

    /**
     * What a person reads for a parameter.
     *
     * @param symbol e.g. "τ₂", "σ", "time zero"
     * @param unit   the trade unit its value is shown in, "" for a pure number
     */
    public record Label(String symbol, String unit) {
        public Label {
            if (symbol == null || symbol.isBlank()) {
                throw new IllegalArgumentException("a label needs a symbol");
            }
            java.util.Objects.requireNonNull(unit, "unit");
        }

        /** "σ (cm²)", or the symbol alone for a pure number. */
        public String withUnit() {
            return unit.isEmpty() ? symbol : symbol + " (" + unit + ")";
        }
    }

    /**
     * The label of internal key {@code siKey}; a per-trace key "timeZeroS[2]" reads "time zero of trace 3". A key
     * without an entry is shown as it is (a test keeps every key the ladder fit uses in the table).
     */
    public static Label label(String siKey) {
        int bracket = siKey.indexOf('[');
        if (bracket > 0 && siKey.endsWith("]")) {
            Label l = label(siKey.substring(0, bracket));
            int trace = Integer.parseInt(siKey.substring(bracket + 1, siKey.length() - 1));
            return new Label(l.symbol() + " of trace " + (trace + 1), l.unit());
        }
        Label l = LABELS.get(siKey);
        return l != null ? l : new Label(siKey, "");
    }

    /** Whether {@code siKey} has a label of its own (else {@link #label} shows the key). */
    public static boolean labelled(String siKey) {
        return LABELS.containsKey(siKey);
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

    /** "τ₂ = 41.3 ps": a parameter's label with its value in trade units (per-trace keys "key[i]" too). */
    public static String shown(String key, double valueSi) {
        int bracket = key.indexOf('[');
        ParameterNaming.TradeKey t = ParameterNaming.trade(bracket > 0 ? key.substring(0, bracket) : key);
        ParameterNaming.Label l = ParameterNaming.label(key);
        return l.symbol() + " = " + Projection.brief(valueSi * t.factor()) + (l.unit().isEmpty() ? "" : " " + l.unit());
    }
}
