package org.ladderkin.plan;

/**
 * One pump setting of the fluence series.
 *
 * @param nProbeAveraged         ⟨N⟩ averaged over the probe spot and the depth (the target)
 * @param nPeak                  ⟨N⟩ on the pump axis at the front face
 * @param pulseEnergyJ           pump pulse energy that gives it (J)
 * @param attenuatorOd           neutral-density attenuation below the highest pulse energy (OD)
 * @param photonFluencePeakPerM2 photon fluence on the axis (1/m²)
 * @param reachable              whether the laser's pulse-energy range covers it
 */
public record FluencePoint(double nProbeAveraged, double nPeak, double pulseEnergyJ, double attenuatorOd,
                           double photonFluencePeakPerM2, boolean reachable) {
}
