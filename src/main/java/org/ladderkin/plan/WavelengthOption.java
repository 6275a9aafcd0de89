package org.ladderkin.plan;

import java.util.List;

/**
 * One pump wavelength the laser offers, judged for the campaign's goals.
 *
 * @param wavelengthM        vacuum wavelength (m)
 * @param photonEnergyJ      photon energy (J)
 * @param crossSectionM2     σ at this wavelength (m²)
 * @param crossSectionBasis  where σ comes from
 * @param absorbanceOd       sample absorbance at this wavelength (OD)
 * @param excessEnergyJ      photon energy above the first exciton, left as heat by cooling (J)
 * @param energyOverGap      ħω / E_1S
 * @param maxProbeAveragedN  probe-averaged ⟨N⟩ at the highest pulse energy
 * @param score              higher is better for the goals
 * @param reasons            what counted for and against it
 */
public record WavelengthOption(double wavelengthM, double photonEnergyJ, double crossSectionM2, String crossSectionBasis,
                               double absorbanceOd, double excessEnergyJ, double energyOverGap, double maxProbeAveragedN,
                               double score, List<String> reasons) {

    public WavelengthOption {
        reasons = List.copyOf(reasons);
    }
}
