package org.ladderkin.plan;

/**
 * What the early/late analysis should show at one photon energy of a carrier-multiplication goal.
 *
 * @param photonEnergyJ          photon energy (J)
 * @param energyOverGap          ħω / E₁S
 * @param eta                    assumed multiplication probability per photon (quantum yield 1 + η)
 * @param idealRatio             low-fluence A/B after a single pulse on fresh dots
 * @param apparentRatioChosen    A/B (pre-pulse baseline subtracted) in the steady state at the chosen repetition rate
 * @param apparentRatioFullRate  the same at the laser's full repetition rate, with no pulse picking
 * @param chargedChosen          charged fraction at the chosen rate
 * @param chargedFullRate        charged fraction at the full rate
 * @param offered                whether the laser offers a pump wavelength at this photon energy (within 1 %)
 */
public record MultiplicationPrediction(double photonEnergyJ, double energyOverGap, double eta, double idealRatio,
                                       double apparentRatioChosen, double apparentRatioFullRate, double chargedChosen,
                                       double chargedFullRate, boolean offered) {
}
