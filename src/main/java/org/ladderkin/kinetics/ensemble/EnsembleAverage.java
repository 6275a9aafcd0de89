package org.ladderkin.kinetics.ensemble;

import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.Trace;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.train.PulseExcitation;

/**
 * Bleach and PL of a size ensemble: each quadrature diameter gets its own ⟨N⟩ = σ(d)·j and Auger rate from the
 * {@link SizeScaling}, the per-dot signals are computed by the engine, and the weighted sum is per dot of the
 * ensemble. (Bleach is normalised per dot; weighting by each size's transition strength is the observer's job.)
 */
public final class EnsembleAverage {

    private EnsembleAverage() {
    }

    /**
     * @param base model of the mean size; per size its Auger law is scaled so that its biexciton rate is the size
     *             law's (trion and overridden rates scale by the same factor)
     * @param photonFluencePerM2 pump photon fluence j (photons/m²)
     * @param periodS pulse period (s), or NaN for one pulse on fresh dots
     */
    public static Trace trace(KineticModel base, SizeScaling law, SizeDistribution sizes, int nodes,
                              double photonFluencePerM2, double periodS, double[] delaysS) {
        SizeDistribution.Nodes q = sizes.nodes(nodes);
        double[] bleach = new double[delaysS.length];
        double[] pl = new double[delaysS.length];
        for (int i = 0; i < q.diametersM().length; i++) {
            double d = q.diametersM()[i];
            double kA = law.biexcitonAugerRatePerS(d);
            KineticModel sized = base.withLaws(AugerRecombination.class,
                    a -> a.biexcitonRatePerS() > 0 ? a.scaled(kA / a.biexcitonRatePerS()) : a);
            PulseExcitation pulse = new PulseExcitation.Poisson(law.crossSectionM2(d) * photonFluencePerM2);
            LadderKinetics k = LadderKinetics.forPulses(sized, pulse);
            Populations after = Double.isNaN(periodS)
                    ? k.applyPulse(Populations.ground(k.space()), pulse)
                    : k.steadyState(pulse, periodS, false).afterPulse();
            Trace t = k.trace(after, delaysS);
            double w = q.weights()[i];
            double[] b = t.bleach();
            double[] l = t.photoluminescencePerS();
            for (int j = 0; j < delaysS.length; j++) {
                bleach[j] += w * b[j];
                pl[j] += w * l[j];
            }
        }
        return new Trace(delaysS, bleach, pl);
    }
}
