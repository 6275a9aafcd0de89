package org.ladderkin.kinetics.train;

import org.ladderkin.kinetics.Populations;

/**
 * The periodic steady state of a pulse train.
 *
 * @param beforePulse distribution just before a pulse arrives
 * @param afterPulse distribution just after it
 * @param residualExcitedFraction fraction of dots still holding an exciton when the next pulse arrives
 * @param chargedFraction fraction of dots charged when the next pulse arrives
 * @param secondEigenvalueModulus |λ₂| of the one-period map (NaN if not computed)
 * @param pulsesToOnePercent pulses after which the slowest transient of the states reachable from the ground state
 *                           has fallen to 1 % (−1 if not computed)
 * @param timeToOnePercentS those pulses times the period (s; NaN if not computed)
 */
public record SteadyState(Populations beforePulse, Populations afterPulse, double residualExcitedFraction,
                          double chargedFraction, double secondEigenvalueModulus, long pulsesToOnePercent,
                          double timeToOnePercentS) {
}
