package org.ladderkin.plan;

import java.util.Objects;
import org.ladderkin.excite.RelativeBudget;

/**
 * One pump setting of the fluence series.
 *
 * @param nProbeAveraged         ⟨N⟩ averaged over the probe spot and the depth (the target)
 * @param nPeak                  ⟨N⟩ on the pump axis at the front face
 * @param pulseEnergyJ           pump pulse energy that gives it (J)
 * @param attenuatorOd           neutral-density attenuation below the highest pulse energy (OD)
 * @param photonFluencePeakPerM2 photon fluence on the axis (1/m²)
 * @param reachable              whether the laser's pulse-energy range covers it
 * @param nAvgBudget             relative uncertainty of {@code nProbeAveraged} and its sources (calibration and σ)
 */
public record FluencePoint(double nProbeAveraged, double nPeak, double pulseEnergyJ, double attenuatorOd,
                           double photonFluencePeakPerM2, boolean reachable, RelativeBudget nAvgBudget) {

    public FluencePoint {
        Objects.requireNonNull(nAvgBudget, "nAvgBudget");
    }

    /** A point whose ⟨N⟩ uncertainty is not known. */
    public FluencePoint(double nProbeAveraged, double nPeak, double pulseEnergyJ, double attenuatorOd,
                        double photonFluencePeakPerM2, boolean reachable) {
        this(nProbeAveraged, nPeak, pulseEnergyJ, attenuatorOd, photonFluencePeakPerM2, reachable, RelativeBudget.NONE);
    }

    /** The relative standard uncertainty of ⟨N⟩. */
    public double nAvgRel() {
        return nAvgBudget.totalRel();
    }

    /** The largest source of ⟨N⟩'s uncertainty, or "none". */
    public String nAvgDominant() {
        return nAvgBudget.dominant().map(RelativeBudget.Item::source).orElse("none");
    }
}
