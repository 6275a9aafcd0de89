package org.ladderkin.sample;

import java.util.Objects;

/**
 * How the excited volume is renewed between pulses.
 *
 * @param mode            static, stirred, flowing, or translated (a film moved under the beam)
 * @param flowRateM3PerS  volumetric flow of a flowing cell (m³/s); 0 otherwise
 * @param cellVolumeM3    volume of the flow cell (m³); 0 otherwise
 * @param speedMPerS      speed at which a translated sample moves under the beam (m/s); 0 otherwise
 */
public record Refresh(Mode mode, double flowRateM3PerS, double cellVolumeM3, double speedMPerS) {

    /** Refresh modes. */
    public enum Mode { STATIC, STIRRED, FLOWING, TRANSLATED }

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
        if (mode == Mode.TRANSLATED) {
            if (!(speedMPerS > 0) || !Double.isFinite(speedMPerS)) {
                throw new IllegalArgumentException("translation speed must be > 0, was " + speedMPerS * 1e3 + " mm/s");
            }
        } else if (speedMPerS != 0) {
            throw new IllegalArgumentException("a translation speed applies only to a translated sample");
        }
    }

    public static Refresh stationary() {
        return new Refresh(Mode.STATIC, 0, 0, 0);
    }

    public static Refresh stirred() {
        return new Refresh(Mode.STIRRED, 0, 0, 0);
    }

    public static Refresh flowing(double flowRateM3PerS, double cellVolumeM3) {
        return new Refresh(Mode.FLOWING, flowRateM3PerS, cellVolumeM3, 0);
    }

    /** A sample (a film) moved under the beam at {@code speedMPerS}. */
    public static Refresh translated(double speedMPerS) {
        return new Refresh(Mode.TRANSLATED, 0, 0, speedMPerS);
    }

    /** Time to exchange the cell volume once (s); infinite unless flowing. */
    public double exchangeTimeS() {
        return mode == Mode.FLOWING ? cellVolumeM3 / flowRateM3PerS : Double.POSITIVE_INFINITY;
    }

    /**
     * Time in which a translated sample brings a fresh spot under a pump of 1/e² diameter {@code pumpDiameterM}: the
     * spot moves one diameter in D/v (s); infinite unless translated.
     */
    public double translationRefreshS(double pumpDiameterM) {
        if (mode != Mode.TRANSLATED) {
            return Double.POSITIVE_INFINITY;
        }
        if (!(pumpDiameterM > 0) || !Double.isFinite(pumpDiameterM)) {
            throw new IllegalArgumentException("a translated sample needs the pump diameter (> 0), was " + pumpDiameterM + " m");
        }
        return pumpDiameterM / speedMPerS;
    }

    /** Lower-case key as written in files ("static", "stirred", "flowing", "translated"). */
    public String key() {
        return mode.name().toLowerCase(java.util.Locale.ROOT);
    }
}
