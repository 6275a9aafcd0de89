package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class EarlyLateAndGainTest {

    static KineticModel pbseLike() {
        return new KineticModel(List.of(
                new RadiativeDecay(1 / 2e-6, RadiativeScaling.STATISTICAL, 2),
                new Cooling(1 / 0.08e-12),
                new AugerRecombination(1 / 300e-12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE)),
                EnumSet.of(Charge.NEUTRAL), true, 8, 0);
    }

    @Test
    @CheckedAgainst(source = "derived: at low fluence every excited dot absorbed one photon, so the early/late band-edge "
            + "ratio A/B is the excitons per photon 1 + η (the analysis of Schaller & Klimov, Phys. Rev. Lett. 92, 186601 (2004))",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void lowFluenceEarlyLateRatioIsTheMultiplicationQuantumYield() {
        for (double eta : new double[] {0, 0.2, 0.7}) {
            double ratio = EarlyLate.lowFluenceRatio(pbseLike(), 1e-4, eta, 0.8e-12, 3e-9);
            // tolerance: finite separation of cooling (0.08 ps), Auger (300 ps) and radiative decay (2 µs)
            Reference.check("A/B at ⟨N_abs⟩ = 1e-4, η = " + eta, ratio, 1 + eta, 5e-3);
        }
    }

    @Test
    void earlyLateCurveFollowsPoissonFillingForEightfoldLevel() {
        List<EarlyLate.Point> pts = EarlyLate.curve(pbseLike(),
                List.of(new PulseExcitation.Poisson(0.5), new PulseExcitation.Poisson(1.5)), 0.8e-12, 3e-9);
        for (EarlyLate.Point p : pts) {
            double n = p.meanExcitons();
            // eightfold level: min(N, 8) = N for almost every dot at these ⟨N⟩; after cooling (0.8 ps, 10 τ_cool) and
            // before Auger; late signal 1 − e^{−n} (divided by g)
            assertThat(p.late()).isCloseTo((1 - Math.exp(-n)) / 8, org.assertj.core.data.Offset.offset(2e-3 / 8));
            assertThat(p.ratio()).isCloseTo(n / (1 - Math.exp(-n)), org.assertj.core.data.Percentage.withPercentage(2.5));
        }
    }

    @Test
    @CheckedAgainst(source = "derived: transparency of a twofold level needs Σ min(N,2)P(N) = 1, i.e. "
            + "(2 + n)e^{−n} = 1, n = 1.14619322 (bisection by hand); optical gain needs ⟨N⟩ above ~1.15 in the "
            + "Poisson picture (Klimov et al., Science 290, 314 (2000), from memory)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void gainThresholdOfATwofoldLevel() {
        Reference.check("transparency ⟨N⟩ for g = 2", GainThreshold.poissonThreshold(2), 1.1461932206, 1e-9);
        assertThat(GainThreshold.meanFilling(GainThreshold.poissonThreshold(8), 8)).isCloseTo(0.5, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void gainLastsLongerAtHigherOccupancyAndNotAtAllBelowThreshold() {
        KineticModel model = TransientAbsorptionTest.cdseLike();
        double previous = -1;
        for (double n : new double[] {0.8, 2, 4}) {
            PulseExcitation pulse = new PulseExcitation.Poisson(n);
            LadderKinetics kin = LadderKinetics.forPulses(model, pulse);
            Populations after = kin.applyPulse(Populations.ground(kin.space()), pulse);
            double life = GainThreshold.gainLifetimeS(kin, after, 2);
            if (n < 1.146) {
                assertThat(life).isZero();
            } else {
                assertThat(life).isGreaterThan(previous).isLessThan(1e-9);
            }
            previous = life;
        }
    }
}
