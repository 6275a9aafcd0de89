package org.ladderkin.kinetics.train;

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
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Pulses to the periodic steady state count only states a dot can reach, and do not saturate at an int. */
class PulsesToSteadyStateTest {

    private static final double PERIOD_S = 1 / 80e6;
    private static final double TAU_NEUTRAL_S = 10;

    /** Both charges listed, ionisation leaving only positive dots: the negative ones are never populated. */
    private static KineticModel model(double ionisation, double tauNeutralS) {
        return new KineticModel(List.of(new RadiativeDecay(1 / 1.5e-6, RadiativeScaling.LINEAR, 2),
                new AugerRecombination(1 / 60e-12, AugerScaling.STATISTICAL, 1 / 240e-12, 1 / 240e-12,
                        new AugerIonisation(ionisation, Charge.POSITIVE)),
                new Neutralisation(1 / tauNeutralS)), EnumSet.of(Charge.NEGATIVE, Charge.POSITIVE), false, 8, 0);
    }

    @Test
    void unreachableChargeIsNotCounted() {
        PulseExcitation pulse = new PulseExcitation.Poisson(1);
        LadderKinetics k = LadderKinetics.forPulses(model(5e-4, 10e-6), pulse);
        PeriodicSteadyState train = k.pulseTrain(pulse, PERIOD_S);
        // pre-pulse states: multiexcitons do not survive a period (their entries of the map underflow to 0)
        assertThat(java.util.Arrays.stream(train.reachableStates()).mapToObj(s -> k.space().charge(s)).distinct())
                .containsExactlyInAnyOrder(Charge.NEUTRAL, Charge.POSITIVE);
    }

    @Test
    @CheckedAgainst(source = "derived: with charging per pulse c far below the neutralisation per period "
            + "a = 1 − e^{−T/τ_n}, the slow mode is the charged/neutral exchange, λ₂ = 1 − a − c, so the pulses to 1 % are "
            + "ln 100 / (a + c) ≈ ln 100 · τ_n · f_rep = 3.68e9 at 80 MHz and τ_n = 10 s",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void slowNeutralisationAt80MHzCountsBillionsOfPulsesAsALong() {
        PulseExcitation pulse = new PulseExcitation.Poisson(0.1);
        LadderKinetics k = LadderKinetics.forPulses(model(1e-12, TAU_NEUTRAL_S), pulse);
        SteadyState ss = k.steadyState(pulse, PERIOD_S, true);
        double a = -Math.expm1(-PERIOD_S / TAU_NEUTRAL_S);
        double expected = Math.log(100) / a;
        assertThat(ss.pulsesToOnePercent()).isGreaterThan(Integer.MAX_VALUE);
        Reference.checkRelative("pulses to 1 %, 80 MHz, τ_n = 10 s", ss.pulsesToOnePercent(), expected, 1e-3);
        Reference.checkRelative("time to 1 %, 80 MHz, τ_n = 10 s", ss.timeToOnePercentS(), expected * PERIOD_S, 1e-3);
    }

    @Test
    void pulseCountsAreLongAndSaturateOnlyAtOne() {
        assertThat(PeriodicSteadyState.pulsesToOnePercentLong(1 - 1.25e-9)).isBetween(3_680_000_000L, 3_690_000_000L);
        assertThat(PeriodicSteadyState.pulsesToOnePercent(1 - 1.25e-9)).isEqualTo(Integer.MAX_VALUE);
        assertThat(PeriodicSteadyState.pulsesToOnePercentLong(1.0)).isEqualTo(Long.MAX_VALUE);
        assertThat(PeriodicSteadyState.pulsesToOnePercentLong(0.0)).isEqualTo(1);
    }
}
