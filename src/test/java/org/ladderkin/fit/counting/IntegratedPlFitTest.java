package org.ladderkin.fit.counting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class IntegratedPlFitTest {

    static final double SIGMA_M2 = 4e-19;

    static double[] fluences() {
        double[] j = new double[12];
        for (int i = 0; i < j.length; i++) {
            j[i] = 0.05 * Math.pow(8 / 0.05, i / 11.0) / SIGMA_M2;
        }
        return j;
    }

    private static double gaussian(SplittableRandom rng) {
        return Math.sqrt(-2 * Math.log(1 - rng.nextDouble())) * Math.cos(2 * Math.PI * rng.nextDouble());
    }

    @Test
    @CheckedAgainst(source = "derived: when Auger decay is far faster than emission, every excited dot ends as one "
            + "exciton that emits with unit yield, so the photons per dot per pulse are P(N ≥ 1) = 1 − e^{−σj} for "
            + "Poisson excitation", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void saturationOfIntegratedPlGivesTheCrossSection() {
        double[] j = fluences();
        double[] y = new double[j.length];
        SplittableRandom rng = new SplittableRandom(5);
        for (int i = 0; i < j.length; i++) {
            y[i] = 1000 * -Math.expm1(-SIGMA_M2 * j[i]) * (1 + 0.01 * gaussian(rng));
        }
        LadderModel fastAuger = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 1e-12,
                AugerScaling.STATISTICAL, 2);
        IntegratedPlFit.Outcome o = IntegratedPlFit.fit(j, y, fastAuger, 2e-19, Set.of());
        assertThat(o.result().status()).as(o.result().message()).isEqualTo(LikelihoodResult.Status.CONVERGED);
        var sigma = o.result().estimate(CountingFit.SCALE);
        assertThat(Math.abs(sigma.value() - SIGMA_M2)).isLessThan(3 * sigma.stdError());
        Reference.checkRelative("σ from the saturation of integrated PL", sigma.value(), SIGMA_M2, 0.03);
        assertThat(o.biexcitonYield()).isBetween(0.0, 1e-3);
    }

    @Test
    void growthPastSaturationGivesTauTwoAndTheBiexcitonYield() {
        LadderModel truth = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 300e-12,
                AugerScaling.STATISTICAL, 2);
        double[] j = fluences();
        double[] y = plFrom(truth, j, 0.003, 8);
        LadderModel start = truth.withSeconds(AugerProcess.BIEXCITON_LIFETIME, 150e-12);
        IntegratedPlFit.Outcome o = IntegratedPlFit.fit(j, y, start, 0.7 * SIGMA_M2, Set.of("tau-auger2"));
        assertThat(o.result().status()).as(o.result().message()).isEqualTo(LikelihoodResult.Status.CONVERGED);
        var tau = o.result().estimate("tauAuger2S");
        var sigma = o.result().estimate(CountingFit.SCALE);
        assertThat(Math.abs(tau.value() - 300e-12)).isLessThan(3 * tau.stdError());
        assertThat(Math.abs(sigma.value() - SIGMA_M2)).isLessThan(3 * sigma.stdError());
        IntegratedPlFit.Outcome shorter = IntegratedPlFit.fit(j, y, start.withSeconds(AugerProcess.BIEXCITON_LIFETIME, 30e-12),
                SIGMA_M2, Set.of());
        assertThat(o.biexcitonYield()).isGreaterThan(shorter.biexcitonYield()).isLessThan(1);
    }

    /** 1000 × the ladder's photons per pulse, with relative Gaussian noise. */
    private static double[] plFrom(LadderModel truth, double[] j, double noise, long seed) {
        double[] y = IntegratedPlFit.photonsPerPulse(truth, SIGMA_M2, j);
        SplittableRandom rng = new SplittableRandom(seed);
        for (int i = 0; i < j.length; i++) {
            y[i] = 1000 * y[i] * (1 + noise * gaussian(rng));
        }
        return y;
    }
}
