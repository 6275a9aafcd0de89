package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class PulseTrainRisksTest {

    @Test
    @CheckedAgainst(source = "derived: a two-level dot (Nmax = 1) excited with probability a = 1 − e^{−⟨N⟩} per pulse and "
            + "decaying at k: x = a·e^{−kT}/(1 − (1 − a)·e^{−kT}) excited before each pulse; solved for T at a target",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void residualExcitationMatchesTheSingleExponentialClosedForm() {
        double k = 1 / 20e-9;
        KineticModel model = new KineticModel(List.of(new RadiativeDecay(k, RadiativeScaling.LINEAR, 1)),
                EnumSet.of(Charge.NEUTRAL), false, 2, 1);
        double n = 0.5;
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        LadderKinetics kin = LadderKinetics.forPulses(model, pulse);
        double a = 1 - Math.exp(-n);
        for (double period : new double[] {12.5e-9, 100e-9, 1e-6}) {
            double d = Math.exp(-k * period);
            Reference.checkRelative("residual excitation at T = " + period * 1e9 + " ns",
                    PulseTrainRisks.residualBeforePulse(kin, pulse, period), a * d / (1 - (1 - a) * d), 1e-9);
        }
        double target = 0.01;
        // a·d = x(1 − (1 − a)d) → d = x/(a + x(1 − a))
        double dTarget = target / (a + target * (1 - a));
        double expectedRate = k / -Math.log(dTarget);
        Reference.checkRelative("highest repetition rate for 1 % residual (Hz)",
                PulseTrainRisks.highestRepetitionRateHz(kin, pulse, target), expectedRate, 1e-7);
        assertThat(PulseTrainRisks.pickerDivision(kin, pulse, 80e6, List.of(1, 2, 4, 8, 16, 32), target)).isEqualTo(8);
    }

    @Test
    @CheckedAgainst(source = "derived: two-state neutral/charged chain; a neutral dot charges with probability "
            + "q = P(N=2)·k_A/(k_A + k_r,2) per pulse (Nmax = 2, every Auger event ionises), a charged one neutralises with "
            + "r = 1 − e^{−k_n T} per period: f = q(1 − r)/(1 − (1 − q)(1 − r))", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void chargedFractionSteadyStateMatchesTheTwoStateClosedForm() {
        double kr = 1 / 20e-9;
        double ka = 1 / 50e-12;
        double kn = 1 / 5e-6;
        KineticModel model = new KineticModel(List.of(
                new RadiativeDecay(kr, RadiativeScaling.LINEAR, 2),
                new AugerRecombination(ka, AugerScaling.STATISTICAL, 1e13, 1e13, new AugerIonisation(1, Charge.NEGATIVE)),
                new Neutralisation(kn)), EnumSet.of(Charge.NEUTRAL, Charge.NEGATIVE), false, 2, 2);
        double n = 0.8;
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        LadderKinetics kin = LadderKinetics.forPulses(model, pulse);
        double pTwoOrMore = 1 - Math.exp(-n) - n * Math.exp(-n);
        double q = pTwoOrMore * ka / (ka + 2 * kr);
        for (double period : new double[] {1e-6, 3e-6, 10e-6}) {
            double r = 1 - Math.exp(-kn * period);
            double expected = q * (1 - r) / (1 - (1 - q) * (1 - r));
            Reference.checkRelative("charged fraction before a pulse, T = " + period * 1e6 + " µs",
                    kin.steadyState(pulse, period, false).chargedFraction(), expected, 1e-4);
        }
        double[] buildUp = PulseTrainRisks.buildUp(kin, pulse, 1e-6, 40).charged();
        assertThat(buildUp[0]).isZero();
        for (int i = 1; i < buildUp.length; i++) {
            assertThat(buildUp[i]).isGreaterThanOrEqualTo(buildUp[i - 1] - 1e-15);
        }
    }

    @Test
    void refreshRateFoundKeepsChargingAtTheTarget() {
        KineticModel model = new KineticModel(List.of(
                new RadiativeDecay(1 / 20e-9, RadiativeScaling.LINEAR, 2),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 1e11, 1e11, new AugerIonisation(0.01, Charge.POSITIVE)),
                new Neutralisation(1 / 1e-3)), EnumSet.of(Charge.NEUTRAL, Charge.POSITIVE), false, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(2);
        double period = 1e-3;
        double before = LadderKinetics.forPulses(model, pulse).steadyState(pulse, period, false).chargedFraction();
        double target = before / 4;
        double k = PulseTrainRisks.refreshRateForCharging(model, pulse, period, target);
        assertThat(k).isFinite().isPositive();
        KineticModel refreshed = PulseTrainRisks.withRefresh(model, k);
        double after = LadderKinetics.forPulses(refreshed, pulse).steadyState(pulse, period, false).chargedFraction();
        assertThat(after).isCloseTo(target, org.assertj.core.data.Percentage.withPercentage(0.1));
        assertThat(PulseTrainRisks.refreshRateForCharging(model, pulse, period, before * 2)).isZero();
    }
}
