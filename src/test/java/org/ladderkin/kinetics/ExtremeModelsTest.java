package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.propagate.ExactPropagator;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PulseExcitation;

/**
 * Valid models that used to fail: a slow cooling beside a fast Auger (the settle window's Poisson mean beyond an
 * int, 3.13e9, reported as bad input) and 300 random models over the whole rate range. Each must propagate with its
 * probability conserved and no negative population.
 */
class ExtremeModelsTest {

    private static final double[] DELAYS_S = {0, 1e-15, 1e-12, 1e-11, 1e-9, 1e-7, 1e-5, 1e-3};

    /** {@code simulate --tau-rad 20ns --tau-auger2 5ps --tau-cool 10ns --n-avg 20 --delays 1ps,1ns}. */
    @Test
    void slowCoolingBesideFastAugerTakesTheModalPath() {
        KineticModel model = new KineticModel(List.of(new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerRecombination(1 / 5e-12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE),
                new Cooling(1 / 10e-9)), EnumSet.of(Charge.NEUTRAL), true, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(20);
        LadderKinetics k = LadderKinetics.forPulses(model, pulse);
        assertThat(k.propagator()).isInstanceOf(ExactPropagator.class);
        Populations after = k.applyPulse(Populations.ground(k.space()), pulse);
        for (double t : new double[] {1e-12, 1e-9}) {
            assertConservedAndNonNegative(k.propagate(after, t).probabilities(), "slow cooling, t = " + t);
        }
        Trace trace = k.trace(after, new double[] {1e-12, 1e-9});
        for (double b : trace.bleach()) {
            assertThat(b).isFinite().isBetween(0.0, 1.0);
        }
    }

    @Test
    void threeHundredRandomModelsConserveAndStayNonNegative() {
        SplittableRandom rnd = new SplittableRandom(20261203);
        for (int m = 0; m < 300; m++) {
            KineticModel model = randomModel(rnd);
            PulseExcitation pulse = new PulseExcitation.Poisson(0.05 + 3 * rnd.nextDouble());
            LadderKinetics k = LadderKinetics.on(model, model.space(model.fixedNMax()));
            Populations after = k.applyPulse(Populations.ground(k.space()), pulse);
            for (double t : DELAYS_S) {
                assertConservedAndNonNegative(k.propagate(after, t).probabilities(), "model " + m + ", t = " + t);
            }
        }
    }

    private static void assertConservedAndNonNegative(double[] p, String what) {
        double sum = 0;
        for (double x : p) {
            assertThat(x).as(what).isFinite().isGreaterThanOrEqualTo(0.0);
            sum += x;
        }
        assertThat(Math.abs(sum - 1)).as(what + ": Σp − 1").isLessThanOrEqualTo(1e-10);
    }

    /** Rates 1e-3 to 1e3 per ps, log-uniform; about a third of the models share one rate among several processes. */
    static KineticModel randomModel(SplittableRandom rnd) {
        double shared = rate(rnd);
        boolean coincident = rnd.nextInt(3) == 0;
        List<RateLaw> laws = new ArrayList<>();
        laws.add(new RadiativeDecay(coincident ? shared : rate(rnd),
                rnd.nextBoolean() ? RadiativeScaling.LINEAR : RadiativeScaling.STATISTICAL, 1 + rnd.nextDouble()));
        Charge left = rnd.nextBoolean() ? Charge.NEGATIVE : Charge.POSITIVE;
        boolean charged = rnd.nextBoolean();
        AugerScaling[] scalings = AugerScaling.values();
        laws.add(new AugerRecombination(coincident ? shared : rate(rnd), scalings[rnd.nextInt(scalings.length)],
                coincident ? shared : rate(rnd), coincident ? shared : rate(rnd),
                charged ? new AugerIonisation(rnd.nextDouble() * 0.3, left) : AugerIonisation.NONE));
        if (rnd.nextBoolean()) {
            laws.add(new Trapping(coincident ? shared : rate(rnd)));
        }
        boolean hot = rnd.nextBoolean();
        if (hot) {
            laws.add(new Cooling(coincident && rnd.nextBoolean() ? shared : rate(rnd)));
        }
        EnumSet<Charge> charges = EnumSet.of(Charge.NEUTRAL);
        if (charged) {
            charges.add(left);
            laws.add(new Neutralisation(rate(rnd)));
            if (rnd.nextBoolean()) {
                charges.add(left == Charge.NEGATIVE ? Charge.POSITIVE : Charge.NEGATIVE);
            }
        }
        if (rnd.nextBoolean()) {
            laws.add(new SampleRefresh(rate(rnd)));
        }
        return new KineticModel(laws, charges, hot, rnd.nextBoolean() ? 2 : 8, 2 + rnd.nextInt(9));
    }

    /** 1e-3 to 1e3 per ps, in 1/s. */
    private static double rate(SplittableRandom rnd) {
        return 1e9 * Math.pow(10, 6 * rnd.nextDouble());
    }
}
