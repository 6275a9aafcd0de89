package org.ladderkin.plan;

import java.util.List;

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
 */
public record LaserSetup(List<Double> pumpWavelengthsM, double repetitionRateHz, List<Integer> pulsePickerDivisions,
                         double pulseFwhmS, double minPulseEnergyJ, double maxPulseEnergyJ,
                         double pumpRadiusM, double probeRadiusM) {

    public LaserSetup {
        pumpWavelengthsM = List.copyOf(pumpWavelengthsM);
        pulsePickerDivisions = List.copyOf(pulsePickerDivisions);
        if (pumpWavelengthsM.isEmpty()) {
            throw new IllegalArgumentException("at least one pump wavelength is needed");
        }
        if (!(minPulseEnergyJ <= maxPulseEnergyJ)) {
            throw new IllegalArgumentException("pulse energy range is reversed: " + minPulseEnergyJ + " J > " + maxPulseEnergyJ + " J");
        }
    }
}
