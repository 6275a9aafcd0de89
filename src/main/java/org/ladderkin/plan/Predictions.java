package org.ladderkin.plan;

import java.util.List;
import org.ladderkin.observe.EarlyLate;

/**
 * What the campaign should see, per fluence of the series, in the periodic steady state at the chosen rate.
 *
 * @param delaysS            TA delay grid (s)
 * @param deltaAOd           band-edge ΔA per fluence (OD), rows follow the series
 * @param plDelaysS          PL delay grid (s)
 * @param plPerDot           PL rate per dot per fluence (photons/s)
 * @param earlyLate          early/late bleach for every fluence
 * @param occupancy          P(N) right after the pulse for every fluence (N = 0..)
 * @param buildUpResidual    fraction excited or charged before each of the first pulses, at the highest fluence
 * @param buildUpCharged     charged fraction before each of the first pulses, at the highest fluence
 * @param pulsesToSteadyState pulses for a transient to fall to 1 %, at the highest fluence (the slowest size holding
 *                           at least 1 % of the dots)
 * @param sizeDispersion     relative size dispersion σ_d/d̄ the signals are averaged over (0: one size)
 * @param sizeNodes          quadrature nodes of that average (1 for one size), chosen for a 1e-6 relative change
 * @param pulseTreatment     how the pump pulse was propagated (instantaneous or through its width) and why
 */
public record Predictions(double[] delaysS, List<double[]> deltaAOd, double[] plDelaysS, List<double[]> plPerDot,
                          List<EarlyLate.Point> earlyLate, List<double[]> occupancy, double[] buildUpResidual,
                          double[] buildUpCharged, int pulsesToSteadyState,
                          double sizeDispersion, int sizeNodes, String pulseTreatment) {

    public Predictions {
        delaysS = delaysS.clone();
        plDelaysS = plDelaysS.clone();
        deltaAOd = List.copyOf(deltaAOd);
        plPerDot = List.copyOf(plPerDot);
        earlyLate = List.copyOf(earlyLate);
        occupancy = List.copyOf(occupancy);
        buildUpResidual = buildUpResidual.clone();
        buildUpCharged = buildUpCharged.clone();
    }

    @Override
    public double[] delaysS() {
        return delaysS.clone();
    }

    @Override
    public double[] plDelaysS() {
        return plDelaysS.clone();
    }

    @Override
    public double[] buildUpResidual() {
        return buildUpResidual.clone();
    }

    @Override
    public double[] buildUpCharged() {
        return buildUpCharged.clone();
    }
}
