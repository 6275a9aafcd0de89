package org.ladderkin.sample;

import java.util.Objects;

/**
 * How the excited volume is renewed between pulses.
 *
 * @param mode            static, stirred or flowing
 * @param flowRateM3PerS  volumetric flow of a flowing cell (m³/s); 0 otherwise
 * @param cellVolumeM3    volume of the flow cell (m³); 0 otherwise
 */
public record Refresh(Mode mode, double flowRateM3PerS, double cellVolumeM3) {

    /** Refresh modes. */
    public enum Mode { STATIC, STIRRED, FLOWING }

    public Refresh {
        Objects.requireNonNull(mode, "mode");
        if (mode == Mode.FLOWING) {
            if (!(flowRateM3PerS > 0) || !Double.isFinite(flowRateM3PerS)) {
                throw new IllegalArgumentException("flow rate must be > 0, was " + flowRateM3PerS * 6e7 + " mL/min");
            }
            if (!(cellVolumeM3 > 0) || !Double.isFinite(cellVolumeM3)) {
                throw new IllegalArgumentException("cell volume must be > 0, was " + cellVolumeM3 * 1e6 + " mL");
            }
        } else if (flowRateM3PerS != 0 || cellVolumeM3 != 0) {
            throw new IllegalArgumentException("flow rate and cell volume apply only to a flowing cell");
        }
    }

    public static Refresh stationary() {
        return new Refresh(Mode.STATIC, 0, 0);
    }

    public static Refresh stirred() {
        return new Refresh(Mode.STIRRED, 0, 0);
    }

    public static Refresh flowing(double flowRateM3PerS, double cellVolumeM3) {
        return new Refresh(Mode.FLOWING, flowRateM3PerS, cellVolumeM3);
    }

    /** Time to exchange the cell volume once (s); infinite unless flowing. */
    public double exchangeTimeS() {
        return mode == Mode.FLOWING ? cellVolumeM3 / flowRateM3PerS : Double.POSITIVE_INFINITY;
    }

    /** Lower-case key as written in files ("static", "stirred", "flowing"). */
    public String key() {
        return mode.name().toLowerCase(java.util.Locale.ROOT);
    }
}
