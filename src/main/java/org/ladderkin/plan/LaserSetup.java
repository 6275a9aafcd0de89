package org.ladderkin.plan;

import java.util.List;
import java.util.Objects;
import org.ladderkin.excite.Calibration;

/**
 * The pump-probe laser available for a campaign. All values SI.
 *
 * @param pumpWavelengthsM      pump wavelengths the laser can deliver (m)
 * @param repetitionRateHz      the oscillator or amplifier repetition rate (Hz)
 * @param pulsePickerDivisions  divisions of the repetition rate the pulse picker offers (1 = no picking)
 * @param pulseFwhmS            pump pulse duration, intensity FWHM (s)
 * @param minPulseEnergyJ       lowest pump pulse energy that can be set (J)
 * @param maxPulseEnergyJ       highest pump pulse energy available (J)
 * @param pumpRadiusM           pump 1/e² intensity radius at the sample (m)
 * @param probeRadiusM          probe 1/e² intensity radius at the sample (m)
 * @param calibration           stated relative uncertainties of pulse energy, radii and σ (NaN: not stated)
 * @param pumpFluctuationRel    rms pump-energy fluctuation of one averaged delay point (NaN: not stated)
 * @param driftRelPerHour       slow pump-energy drift per hour (NaN: not stated)
 */
public record LaserSetup(List<Double> pumpWavelengthsM, double repetitionRateHz, List<Integer> pulsePickerDivisions,
                         double pulseFwhmS, double minPulseEnergyJ, double maxPulseEnergyJ,
                         double pumpRadiusM, double probeRadiusM, Calibration calibration, double pumpFluctuationRel,
                         double driftRelPerHour) {

    /**
     * Defaults when the plan states nothing (common practice, no source): after averaging a delay point over
     * thousands of shots, slow wander of an amplified laser leaves about 1 % rms between points; an amplifier's
     * output drifts by about 1 % per hour.
     */
    public static final double DEFAULT_PUMP_FLUCTUATION_REL = 0.01;
    public static final double DEFAULT_DRIFT_REL_PER_HOUR = 0.01;

    /** A laser whose calibration and stability are not stated. */
    public LaserSetup(List<Double> pumpWavelengthsM, double repetitionRateHz, List<Integer> pulsePickerDivisions,
                      double pulseFwhmS, double minPulseEnergyJ, double maxPulseEnergyJ, double pumpRadiusM, double probeRadiusM) {
        this(pumpWavelengthsM, repetitionRateHz, pulsePickerDivisions, pulseFwhmS, minPulseEnergyJ, maxPulseEnergyJ,
                pumpRadiusM, probeRadiusM, Calibration.UNSTATED, Double.NaN, Double.NaN);
    }

    public LaserSetup {
        Objects.requireNonNull(calibration, "calibration");
        for (double v : new double[] {pumpFluctuationRel, driftRelPerHour}) {
            if (!Double.isNaN(v) && !(v >= 0 && v < 1)) {
                throw new IllegalArgumentException("pump fluctuation and drift must be in [0, 1) (e.g. 0.01 for 1 %), was " + v);
            }
        }
        pumpWavelengthsM = List.copyOf(pumpWavelengthsM);
        pulsePickerDivisions = List.copyOf(pulsePickerDivisions);
        if (pumpWavelengthsM.isEmpty()) {
            throw new IllegalArgumentException("at least one pump wavelength is needed");
        }
        if (!(minPulseEnergyJ <= maxPulseEnergyJ)) {
            throw new IllegalArgumentException("pulse energy range is reversed: " + minPulseEnergyJ + " J > " + maxPulseEnergyJ + " J");
        }
    }

    /** The pump fluctuation per point, stated or the default. */
    public double pumpFluctuationOrDefault() {
        return Double.isNaN(pumpFluctuationRel) ? DEFAULT_PUMP_FLUCTUATION_REL : pumpFluctuationRel;
    }

    /** The drift per hour, stated or the default. */
    public double driftPerHourOrDefault() {
        return Double.isNaN(driftRelPerHour) ? DEFAULT_DRIFT_REL_PER_HOUR : driftRelPerHour;
    }

    /** This laser with another pump radius, everything else kept. */
    public LaserSetup withPumpRadiusM(double radiusM) {
        return new LaserSetup(pumpWavelengthsM, repetitionRateHz, pulsePickerDivisions, pulseFwhmS, minPulseEnergyJ,
                maxPulseEnergyJ, radiusM, probeRadiusM, calibration, pumpFluctuationRel, driftRelPerHour);
    }

    /** This laser with another calibration, everything else kept. */
    public LaserSetup withCalibration(Calibration c) {
        return new LaserSetup(pumpWavelengthsM, repetitionRateHz, pulsePickerDivisions, pulseFwhmS, minPulseEnergyJ,
                maxPulseEnergyJ, pumpRadiusM, probeRadiusM, c, pumpFluctuationRel, driftRelPerHour);
    }
}
