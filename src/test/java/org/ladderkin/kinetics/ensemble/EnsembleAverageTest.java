package org.ladderkin.kinetics.ensemble;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.Trace;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class EnsembleAverageTest {

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 IterativeLegendreGaussIntegrator of the excited fraction (1 − e^{−σ(d)j}) over the"
            + " Gaussian diameter density, ±6 standard deviations", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void lateBleachOfAnEnsembleIsTheSizeAveragedExcitedFraction() {
        double d0 = 4e-9;
        double w = 0.1;
        VolumeScaling law = new VolumeScaling(d0, 2e-19, 1 / 50e-12);
        double j = 5e18;
        // g = 1: after all Auger decay (1 ns ≫ τ₂, ≪ τ_rad = 1 s) the bleach is the excited fraction
        KineticModel base = LadderModel.radiativeAndAuger(1.0, RadiativeScaling.LINEAR, 50e-12, AugerScaling.STATISTICAL, 1)
                .toModel();
        Trace t = EnsembleAverage.trace(base, law, new SizeDistribution(d0, w), 24, j, Double.NaN, new double[] {1e-9});
        double sd = w * d0;
        double ref = new IterativeLegendreGaussIntegrator(8, 1e-13, 1e-15).integrate(100000,
                d -> Math.exp(-0.5 * Math.pow((d - d0) / sd, 2)) / (Math.sqrt(2 * Math.PI) * sd)
                        * -Math.expm1(-law.crossSectionM2(d) * j), d0 - 6 * sd, d0 + 6 * sd);
        Reference.checkRelative("ensemble late bleach (excited fraction), w = 10 %", t.bleach()[0], ref, 1e-6);
    }
}
