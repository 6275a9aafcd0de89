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
 * @param pulsesToOnePercent pulses after which the slowest transient has fallen to 1 % (−1 if not computed)
 */
public record SteadyState(Populations beforePulse, Populations afterPulse, double residualExcitedFraction,
                          double chargedFraction, double secondEigenvalueModulus, int pulsesToOnePercent) {
}
