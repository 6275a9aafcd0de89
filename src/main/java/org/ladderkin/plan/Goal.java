package org.ladderkin.plan;

import java.util.Arrays;
import java.util.stream.Collectors;

/** What a campaign sets out to measure. The key is how plan files name it. */
public enum Goal {
    BIEXCITON_AUGER("biexciton-auger", "biexciton Auger lifetime τ2"),
    HIGHER_AUGER("higher-auger", "triexciton and higher Auger lifetimes"),
    CROSS_SECTION("cross-section", "absorption cross-section at the pump wavelength"),
    SINGLE_EXCITON_LIFETIME("single-exciton-lifetime", "single-exciton lifetime τ1"),
    MULTIPLICATION_YIELD("multiplication-yield", "carrier-multiplication quantum yield"),
    GAIN_THRESHOLD("gain-threshold", "optical-gain threshold ⟨N⟩"),
    TRION_LIFETIME("trion-lifetime", "trion Auger lifetime");

    private final String key;
    private final String description;

    Goal(String key, String description) {
        this.key = key;
        this.description = description;
    }

    public String key() {
        return key;
    }

    public String description() {
        return description;
    }

    /** The goal a plan file names {@code key}, or null. */
    public static Goal byKey(String key) {
        for (Goal g : values()) {
            if (g.key.equals(key)) {
                return g;
            }
        }
        return null;
    }

    /** All keys, for messages. */
    public static String keys() {
        return Arrays.stream(values()).map(Goal::key).collect(Collectors.joining(", "));
    }
}
