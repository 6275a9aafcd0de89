package org.ladderkin.archive;

import java.util.Arrays;
import java.util.Locale;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;

/** What a trend puts on its x axis: a property of the sample, in the trade unit a size-series plot uses. */
public enum TrendAxis {
    VOLUME("volume", "V", "nm³"),
    DIAMETER("diameter", "d", "nm"),
    GAP("gap", "E₁", "eV"),
    FIRST_PEAK("first-peak", "λ₁", "nm");

    private final String key;
    private final String symbol;
    private final String unit;

    TrendAxis(String key, String symbol, String unit) {
        this.key = key;
        this.symbol = symbol;
        this.unit = unit;
    }

    /** Command-line name ("first-peak"). */
    public String key() {
        return key;
    }

    /** "V (nm³)". */
    public String label() {
        return symbol + " (" + unit + ")";
    }

    public String unit() {
        return unit;
    }

    /** The sample's value in this axis's trade unit, or NaN when the sample does not say. */
    public double of(SampleEntry s) {
        return switch (this) {
            case VOLUME -> s.volumeM3() * 1e27;
            case DIAMETER -> s.sizeM() * 1e9;
            case GAP -> s.firstExcitonJ() / PhysicalConstants.ELECTRONVOLT_J;
            case FIRST_PEAK -> Double.isNaN(s.firstExcitonJ()) ? Double.NaN : Photon.wavelengthM(s.firstExcitonJ()) * 1e9;
        };
    }

    /** The axis named {@code key}, or an {@link ArchiveException} listing the names. */
    public static TrendAxis of(String key) {
        return Arrays.stream(values()).filter(a -> a.key.equals(key.trim().toLowerCase(Locale.ROOT))).findFirst()
                .orElseThrow(() -> new ArchiveException(ArchiveException.Kind.INVALID, "unknown --x quantity '" + key
                        + "' (volume, diameter, gap, first-peak)"));
    }
}
