package org.ladderkin.material;

import java.util.Locale;

/**
 * Where the lowest electron and the highest hole of a core/shell dot live. The choice decides which volume the Auger
 * rate scales with, the sign of the biexciton interaction and how much the electron–hole overlap falls.
 */
public enum BandAlignment {
    /** Both carriers confined to the core (the shell's gap straddles the core's): CdSe/ZnS. */
    TYPE_I,
    /** One carrier in the core, the other spread over core and shell (one band offset small): CdSe/CdS. */
    QUASI_TYPE_II,
    /** Electron and hole in different materials (staggered band edges): CdTe/CdSe, CdS/ZnSe. */
    TYPE_II;

    /** The key used in sample files, e.g. "quasi-type-II". */
    public String key() {
        return switch (this) {
            case TYPE_I -> "type-I";
            case QUASI_TYPE_II -> "quasi-type-II";
            case TYPE_II -> "type-II";
        };
    }

    /** The alignment for a sample-file key, case-insensitive. */
    public static BandAlignment ofKey(String key) {
        for (BandAlignment a : values()) {
            if (a.key().toLowerCase(Locale.ROOT).equals(key.toLowerCase(Locale.ROOT))) {
                return a;
            }
        }
        throw new IllegalArgumentException("unknown band alignment '" + key + "' (allowed: type-I, quasi-type-II, type-II)");
    }
}
