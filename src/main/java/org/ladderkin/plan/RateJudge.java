package org.ladderkin.plan;

import java.util.List;
import java.util.stream.IntStream;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.Pulse;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.Photoluminescence;
import org.ladderkin.observe.Verdict;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * Judges the repetition rates the pulse picker offers at one fluence (residual excitation, charging, heating against
 * the plan's limits) and picks one. The planner calls it at the series' highest ⟨N⟩ so that the rate table, the
 * chosen rate's numbers, the heating and the risks describe the same setting.
 */
final class RateJudge {

    private RateJudge() {
    }

    /** Every offered rate judged at probe-averaged ⟨N⟩ {@code n}: residual, charging and heating against the limits. */
    static List<RateOption> rates(PlanInputs in, KineticModel km, Excitation atMax, double n) {
        LaserSetup laser = in.laser();
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        // the same conversion as the fluence series, so the energy printed beside a rate is the series' own
        double energy = n / (atMax.nAvgProbeWeighted() / laser.maxPulseEnergyJ());
        List<Integer> divisions = laser.pulsePickerDivisions().stream().sorted().toList();
        RateOption[] out = new RateOption[divisions.size()];
        IntStream.range(0, divisions.size()).parallel().forEach(i -> {
            int d = divisions.get(i);
            double rate = laser.repetitionRateHz() / d;
            LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
            SteadyState ss = kin.steadyState(pulse, 1 / rate, false);
            // the same steady state gives the residual: no second solve
            double residual = ss.beforePulse().expectation(org.ladderkin.kinetics.Observables.excitedOrCharged(kin.space()));
            Excitation ex = Excitation.of(atMax.sample(), new Pulse(laser.maxPulseEnergyJ(), atMax.pulse().wavelengthM(), rate),
                    atMax.geometry().pump(), atMax.geometry().probe(), true).withEnergyJ(energy);
            HeatBudget heat = heatAt(km, ex, n, 1 / rate);
            Limits lim = in.limits();
            Verdict v = Verdict.against(residual, lim.maxResidualExcitation(), 1)
                    .worst(Verdict.against(ss.chargedFraction(), lim.maxChargedFraction(), 1))
                    .worst(Double.isNaN(heat.steadyRiseK()) ? Verdict.WARN
                            : Verdict.against(heat.peakRiseK(), lim.maxTemperatureRiseK(), 1));
            out[i] = new RateOption(d, rate, n, energy, residual, ss.chargedFraction(), heat, v);
        });
        return List.of(out);
    }

    static HeatBudget heatAt(KineticModel km, Excitation ex, double n, double period) {
        // the hottest dots sit on the pump axis at the front face: their own ⟨N⟩, and their own (lower) PL share
        double nHot = ex.nAvgPeak();
        return HeatBudget.of(ex, emittedPerAbsorbed(km, n, period), n, emittedPerAbsorbed(km, nHot, period));
    }

    private static double emittedPerAbsorbed(KineticModel km, double n, double period) {
        if (!(n > 0)) {
            return 0;
        }
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
        SteadyState ss = kin.steadyState(pulse, period, false);
        return Photoluminescence.emittedPerPulse(kin, ss.afterPulse(), period) / n;
    }

    static String hz(RateOption r) {
        return Quantity.formatBest(r.repetitionRateHz(), Dimension.FREQUENCY, 3) + " (÷" + r.division() + ")";
    }

    /** The fastest rate that does not fail, or the slowest offered when every rate fails. */
    static RateOption fastestPassing(List<RateOption> rates) {
        return rates.stream().filter(r -> r.verdict() != Verdict.FAIL)
                .max(java.util.Comparator.comparingDouble(RateOption::repetitionRateHz))
                .orElse(rates.stream().min(java.util.Comparator.comparingDouble(RateOption::repetitionRateHz)).orElseThrow());
    }
}
