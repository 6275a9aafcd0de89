package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class PhotoluminescenceTest {

    private static final double KR = 1 / 25e-9;
    private static final double KT = 1 / 100e-9;

    /** Excitons decaying independently: radiative N·k_r and trapping N·k_t, no Auger. */
    static KineticModel independentExcitons() {
        return new KineticModel(List.of(new RadiativeDecay(KR, RadiativeScaling.LINEAR, 1), new Trapping(KT)),
                EnumSet.of(Charge.NEUTRAL), false, 2, 0);
    }

    @Test
    @CheckedAgainst(source = "derived: independent excitons (rates linear in N) each emit with probability k_r/k before "
            + "T with k = k_r + k_t, so photons per dot = ⟨N⟩·(k_r/k)·(1 − e^{−kT})", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void photonsPerPulseOfIndependentExcitons() {
        for (double n : new double[] {0.05, 1, 3}) {
            PulseExcitation pulse = new PulseExcitation.Poisson(n);
            LadderKinetics kin = LadderKinetics.forPulses(independentExcitons(), pulse);
            Populations after = kin.applyPulse(Populations.ground(kin.space()), pulse);
            for (double period : new double[] {10e-9, 1e-6}) {
                double k = KR + KT;
                double expected = n * KR / k * (1 - Math.exp(-k * period));
                Reference.checkRelative("PL photons per dot, ⟨N⟩ = " + n + ", T = " + period * 1e9 + " ns",
                        Photoluminescence.emittedPerPulse(kin, after, period), expected, 1e-8);
            }
        }
    }

    @Test
    @CheckedAgainst(source = "derived: independent excitons under a pulse train add up over past pulses, "
            + "PL(t) = ⟨N⟩·k_r·e^{−kt}/(1 − e^{−kT}) in the periodic steady state", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void tcspcHistogramOfAPulseTrainMatchesTheGeometricSum() {
        double n = 0.02;
        double period = 50e-9;
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        LadderKinetics kin = LadderKinetics.forPulses(independentExcitons().withFixedNMax(12), pulse);
        SteadyState ss = kin.steadyState(pulse, period, false);
        Photoluminescence.Histogram h = Photoluminescence.tcspc(kin, ss.afterPulse(), period, 0.1e-9, 45e-9, 0.2e-9);
        double k = KR + KT;
        for (double t : new double[] {0, 10e-9, 40e-9, -0.5e-9}) {
            int i = 0;
            while (Math.abs(h.timesS()[i] - t) > 1e-13) {
                i++;
            }
            double since = t < 0 ? t + period : t;
            double expected = n * KR * Math.exp(-k * since) / (1 - Math.exp(-k * period));
            Reference.checkRelative("TCSPC PL rate at t = " + t * 1e9 + " ns (1/s per dot)", h.rawRatePerDot()[i], expected, 1e-8);
        }
        double rawSum = 0;
        double convSum = 0;
        for (int i = 0; i < h.timesS().length; i++) {
            rawSum += h.rawRatePerDot()[i];
            convSum += h.ratePerDot()[i];
        }
        assertThat(convSum).isCloseTo(rawSum, org.assertj.core.data.Percentage.withPercentage(2));
    }
}
