package org.ladderkin.sample;

import java.util.Objects;

/**
 * How the excited volume is renewed between pulses.
 *
 * @param mode            static, stirred, flowing, or translated (a film moved under the beam)
 * @param flowRateM3PerS  volumetric flow of a flowing cell (m³/s); 0 otherwise
 * @param cellVolumeM3    volume of the flow cell (m³); 0 otherwise
 * @param speedMPerS      speed at which a translated sample moves under the beam (m/s); 0 otherwise
 * @param crossSectionM2  cross-section of a flowing cell's channel where the beam crosses it (m²): path length × width;
 *                        NaN when not given (then path length × {@link #DEFAULT_FLOW_CELL_WIDTH_M}) or not flowing
 */
public record Refresh(Mode mode, double flowRateM3PerS, double cellVolumeM3, double speedMPerS, double crossSectionM2) {

    /** Refresh modes. */
    public enum Mode { STATIC, STIRRED, FLOWING, TRANSLATED }

    /** Width of a flow cell's channel across the flow when its cross-section is not given (common practice, no source). */
    public static final double DEFAULT_FLOW_CELL_WIDTH_M = 10e-3;

    /** A refresh without a flow-cell cross-section (the default one applies to a flowing cell). */
    public Refresh(Mode mode, double flowRateM3PerS, double cellVolumeM3, double speedMPerS) {
        this(mode, flowRateM3PerS, cellVolumeM3, speedMPerS, Double.NaN);
    }

    public Refresh {
        if (!Double.isNaN(crossSectionM2) && (mode != Mode.FLOWING || !(crossSectionM2 > 0) || Double.isInfinite(crossSectionM2))) {
            throw new IllegalArgumentException(mode != Mode.FLOWING ? "a cell cross-section applies only to a flowing cell"
                    : "cell cross-section must be > 0, was " + crossSectionM2 * 1e6 + " mm²");
        }
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

    /** A flowing cell whose channel has cross-section {@code crossSectionM2} where the beam crosses it. */
    public static Refresh flowing(double flowRateM3PerS, double cellVolumeM3, double crossSectionM2) {
        return new Refresh(Mode.FLOWING, flowRateM3PerS, cellVolumeM3, 0, crossSectionM2);
    }

    /** A sample (a film) moved under the beam at {@code speedMPerS}. */
    public static Refresh translated(double speedMPerS) {
        return new Refresh(Mode.TRANSLATED, 0, 0, speedMPerS);
    }

    /**
     * Time to exchange the whole cell volume once (s); infinite unless flowing. Not the refresh of the excited volume,
     * which the flow through the beam renews much faster ({@link #flowRenewalS}).
     */
    public double exchangeTimeS() {
        return mode == Mode.FLOWING ? cellVolumeM3 / flowRateM3PerS : Double.POSITIVE_INFINITY;
    }

    /**
     * Cross-section the flow passes through where the beam crosses the cell (m²): the given one, or the path length
     * times {@link #DEFAULT_FLOW_CELL_WIDTH_M}.
     */
    public double flowCrossSectionM2(double pathLengthM) {
        return Double.isNaN(crossSectionM2) ? pathLengthM * DEFAULT_FLOW_CELL_WIDTH_M : crossSectionM2;
    }

    /** Mean flow speed through the beam (m/s): flow rate / cross-section; 0 unless flowing. */
    public double flowSpeedMPerS(double pathLengthM) {
        return mode == Mode.FLOWING ? flowRateM3PerS / flowCrossSectionM2(pathLengthM) : 0;
    }

    /**
     * Time in which the flow replaces the excited volume of a pump of 1/e² diameter {@code pumpDiameterM}: the liquid
     * moves one diameter in D/v (s), v the mean flow speed through the beam; infinite unless flowing. What renews
     * the dots the pump sees is the flow through the beam, not the exchange of the whole cell.
     */
    public double flowRenewalS(double pumpDiameterM, double pathLengthM) {
        if (mode != Mode.FLOWING) {
            return Double.POSITIVE_INFINITY;
        }
        if (!(pumpDiameterM > 0) || !Double.isFinite(pumpDiameterM)) {
            throw new IllegalArgumentException("a flowing sample needs the pump diameter (> 0), was " + pumpDiameterM + " m");
        }
        return pumpDiameterM / flowSpeedMPerS(pathLengthM);
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
