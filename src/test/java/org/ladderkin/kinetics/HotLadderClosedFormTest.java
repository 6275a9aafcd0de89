package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.cli.BenchCases;
import org.ladderkin.kinetics.propagate.SettlingPropagator;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Hot-resolved ladders where the answer is known without a matrix exponential, including Nmax = 20, where the modal
 * basis of the full generator is conditioned like binomial coefficients.
 */
class HotLadderClosedFormTest {

    static final double K_COOL_PER_S = 1 / 0.5e-12;

    @Test
    @CheckedAgainst(source = "derived: with cooling only, each of h0 hot excitons cools independently at k_cool, so "
            + "P(h | h0, t) = C(h0, h)·e^{−h·k·t}·(1 − e^{−k·t})^{h0−h} (binomial thinning)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void pureCoolingIsBinomialThinningAtNmax20() {
        KineticModel model = new KineticModel(List.of(new Cooling(K_COOL_PER_S)), EnumSet.of(Charge.NEUTRAL), true, 2, 20);
        LadderKinetics k = LadderKinetics.on(model, model.space(20));
        assertThat(k.propagator()).isInstanceOf(SettlingPropagator.class);
        LadderSpace space = k.space();
        double worst = 0;
        for (double t : new double[] {0, 1e-14, 1e-13, 5e-13, 2e-12, 1e-11, 3e-11, 1e-9, 1e-3}) {
            double[][] m = k.propagator().matrix(t);
            double survive = Math.exp(-K_COOL_PER_S * t);
            for (int h0 = 0; h0 <= 20; h0++) {
                int from = space.index(Charge.NEUTRAL, 20, h0);
                for (int h = 0; h <= h0; h++) {
                    double exact = binomial(h0, h) * Math.pow(survive, h) * Math.pow(-Math.expm1(-K_COOL_PER_S * t), h0 - h);
                    worst = Math.max(worst, Math.abs(m[space.index(Charge.NEUTRAL, 20, h)][from] - exact));
                }
            }
        }
        Reference.check("max |P(h | h0, t) − binomial thinning|, N = 20, h0 = 0..20, 0..1 ms", worst, 0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "derived: one exciton, hot at t = 0, cooling at k and recombining at k_r whether hot or "
            + "cold: P(hot) = e^{−(k+k_r)t}, P(cold) = e^{−k_r·t}(1 − e^{−k·t}), P(ground) = 1 − e^{−k_r·t}",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void oneHotExcitonCoolsAndRecombines() {
        double kRad = 1 / 20e-9;
        KineticModel model = new KineticModel(List.of(new Cooling(K_COOL_PER_S),
                new RadiativeDecay(kRad, RadiativeScaling.LINEAR, 2)), EnumSet.of(Charge.NEUTRAL), true, 2, 1);
        LadderKinetics k = LadderKinetics.on(model, model.space(1));
        LadderSpace space = k.space();
        double[] p0 = new double[space.size()];
        p0[space.index(Charge.NEUTRAL, 1, 1)] = 1;
        double worst = 0;
        for (double t : new double[] {1e-14, 1e-12, 1e-11, 3e-11, 1e-9, 2e-8, 1e-6, 1e-3}) {
            double[] p = k.propagator().propagate(p0, t);
            worst = Math.max(worst, Math.abs(p[space.index(Charge.NEUTRAL, 1, 1)] - Math.exp(-(K_COOL_PER_S + kRad) * t)));
            worst = Math.max(worst, Math.abs(p[space.index(Charge.NEUTRAL, 1, 0)]
                    - Math.exp(-kRad * t) * -Math.expm1(-K_COOL_PER_S * t)));
            worst = Math.max(worst, Math.abs(p[0] + Math.expm1(-kRad * t)));
        }
        Reference.check("max |P − closed form| for one hot exciton, 10 fs..1 ms", worst, 0, 1e-13);
    }

    /**
     * Every decay rate depends on (charge, N) only and cooling keeps N, so summed over h the populations obey the
     * plain ladder, which the modal propagator handles well: an independent check of the split propagator at Nmax = 20.
     */
    @Test
    void excitonNumberDistributionIsThatOfThePlainLadderOnTheBenchGrid() {
        List<org.ladderkin.kinetics.rate.RateLaw> decay = List.of(
                new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE));
        KineticModel hotModel = new KineticModel(
                java.util.stream.Stream.concat(decay.stream(), java.util.stream.Stream.of(new Cooling(K_COOL_PER_S))).toList(),
                EnumSet.of(Charge.NEUTRAL), true, 2, 20);
        KineticModel plainModel = new KineticModel(decay, EnumSet.of(Charge.NEUTRAL), false, 2, 20);
        LadderKinetics hot = LadderKinetics.on(hotModel, hotModel.space(20));
        LadderKinetics plain = LadderKinetics.on(plainModel, plainModel.space(20));
        LadderSpace hs = hot.space();
        double[] p0Hot = new double[hs.size()];
        double[] p0Plain = new double[21];
        // a Poisson(3) pulse on ground-state dots, all new excitons hot
        double pn = Math.exp(-3);
        for (int n = 0; n <= 20; n++) {
            p0Hot[hs.index(Charge.NEUTRAL, n, n)] = pn;
            p0Plain[n] = pn;
            pn *= 3.0 / (n + 1);
        }
        double[][] hotObs = new double[21][hs.size()];
        double[][] plainObs = new double[21][21];
        for (int s = 0; s < hs.size(); s++) {
            hotObs[hs.excitons(s)][s] = 1;
        }
        for (int n = 0; n <= 20; n++) {
            plainObs[n][n] = 1;
        }
        double[][] a = hot.propagator().onGrid(BenchCases.DELAYS_S).observe(hotObs, p0Hot);
        double[][] b = plain.propagator().onGrid(BenchCases.DELAYS_S).observe(plainObs, p0Plain);
        double worst = 0;
        for (int n = 0; n <= 20; n++) {
            for (int j = 0; j < BenchCases.DELAYS_S.length; j++) {
                worst = Math.max(worst, Math.abs(a[n][j] - b[n][j]));
            }
        }
        assertThat(worst).isLessThan(1e-12);
    }

    private static double binomial(int n, int k) {
        double c = 1;
        for (int i = 1; i <= k; i++) {
            c = c * (n - k + i) / i;
        }
        return c;
    }
}
