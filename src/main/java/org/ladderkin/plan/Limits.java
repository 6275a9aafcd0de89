package org.ladderkin.plan;

/**
 * Limits the plan must respect. All values SI or fractions.
 *
 * @param maxTemperatureRiseK      highest tolerated steady-state temperature rise of the excited volume (K)
 * @param maxChargedFraction       highest tolerated fraction of photocharged dots (0..1)
 * @param maxResidualExcitation    highest tolerated fraction of dots excited or charged when the next pulse arrives (0..1)
 * @param beamTimeS                measurement time available (s)
 */
public record Limits(double maxTemperatureRiseK, double maxChargedFraction, double maxResidualExcitation, double beamTimeS) {
}
