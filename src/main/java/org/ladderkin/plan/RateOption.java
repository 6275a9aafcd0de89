package org.ladderkin.plan;

import java.util.Objects;
import org.ladderkin.observe.Verdict;

/**
 * One repetition rate the laser and its pulse picker offer, judged at one fluence: the series' highest.
 *
 * @param division          pulse-picker division (1 = no picking)
 * @param repetitionRateHz  resulting rate (Hz)
 * @param nAvgProbeWeighted probe-averaged ⟨N⟩ it was judged at
 * @param pulseEnergyJ      pump pulse energy that gives that ⟨N⟩ (J)
 * @param residual          fraction of dots excited or charged when the next pulse arrives
 * @param charged           steady-state charged fraction before a pulse
 * @param heat              heating at that ⟨N⟩ and this rate
 * @param verdict           worst verdict of the three against the plan's limits
 */
public record RateOption(int division, double repetitionRateHz, double nAvgProbeWeighted, double pulseEnergyJ,
                         double residual, double charged, HeatBudget heat, Verdict verdict) {

    public RateOption {
        Objects.requireNonNull(heat, "heat");
        Objects.requireNonNull(verdict, "verdict");
        if (division < 1 || !(repetitionRateHz > 0) || !(nAvgProbeWeighted >= 0) || !(pulseEnergyJ >= 0)) {
            throw new IllegalArgumentException("rate option needs division >= 1, rate > 0, ⟨N⟩ >= 0 and energy >= 0");
        }
    }

    /** Steady-state temperature rise of the excited volume (K). */
    public double steadyRiseK() {
        return heat.steadyRiseK();
    }
}
