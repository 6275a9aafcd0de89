package org.ladderkin.plan;

import org.ladderkin.observe.Verdict;

/**
 * One repetition rate the laser and its pulse picker offer, judged at the highest fluence of the series.
 *
 * @param division         pulse-picker division (1 = no picking)
 * @param repetitionRateHz resulting rate (Hz)
 * @param residual         fraction of dots excited or charged when the next pulse arrives
 * @param charged          steady-state charged fraction before a pulse
 * @param steadyRiseK      steady-state temperature rise of the excited volume (K)
 * @param verdict          worst verdict of the three against the plan's limits
 */
public record RateOption(int division, double repetitionRateHz, double residual, double charged, double steadyRiseK,
                         Verdict verdict) {
}
