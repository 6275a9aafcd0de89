package org.ladderkin.archive;

import java.util.Arrays;

/** What a trend puts on its y axis: a fitted parameter, by the trade key the fit results use. */
public enum TrendQuantity {
    TAU_AUGER2("tauAuger2", "tauAuger2Ps", "τ₂ (ps)"),
    TAU_AUGER3("tauAuger3", "tauAuger3Ps", "τ₃ (ps)"),
    CROSS_SECTION("crossSection", "crossSectionCm2", "σ (cm²)"),
    TAU_RAD("tauRad", "tauRadNs", "τ_rad (ns)"),
    MULTIPLICATION_YIELD("multiplicationYield", "multiplicationYield", "multiplication yield");

    private final String key;
    private final String parameterKey;
    private final String label;

    TrendQuantity(String key, String parameterKey, String label) {
        this.key = key;
        this.parameterKey = parameterKey;
        this.label = label;
    }

    /** Command-line name ("tauAuger2"). */
    public String key() {
        return key;
    }

    /** The fit result's parameter key, unit included ("tauAuger2Ps"). */
    public String parameterKey() {
        return parameterKey;
    }

    public String label() {
        return label;
    }

    /** The quantity named {@code key}, or an {@link ArchiveException} listing the names. */
    public static TrendQuantity of(String key) {
        return Arrays.stream(values()).filter(q -> q.key.equalsIgnoreCase(key.trim())).findFirst()
                .orElseThrow(() -> new ArchiveException(ArchiveException.Kind.INVALID, "unknown --y quantity '" + key
                        + "' (tauAuger2, tauAuger3, crossSection, tauRad, multiplicationYield)"));
    }
}
