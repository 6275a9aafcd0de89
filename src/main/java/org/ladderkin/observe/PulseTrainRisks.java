package org.ladderkin.observe;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * What a pulse train leaves behind: dots still excited or charged when the next pulse arrives, how fast the train may
 * run, which pulse-picker division gets there, and how much refresh (stirring, flow) keeps photocharging down.
 */
public final class PulseTrainRisks {

    private static final double SHORTEST_PERIOD_S = 1e-10;
    private static final double LONGEST_PERIOD_S = 10;

    private PulseTrainRisks() {
    }

    /** Fraction of dots excited or charged just before a pulse, in the periodic steady state. */
    public static double residualBeforePulse(LadderKinetics kinetics, PulseExcitation pulse, double periodS) {
        SteadyState ss = kinetics.steadyState(pulse, periodS, false);
        return ss.beforePulse().expectation(Observables.excitedOrCharged(kinetics.space()));
    }

    /**
     * The highest repetition rate (Hz) at which the residual stays at or below {@code target}; the residual falls as
     * the period grows. Returns +∞ when even 10 GHz is fine and 0 when even 0.1 Hz is not.
     */
    public static double highestRepetitionRateHz(LadderKinetics kinetics, PulseExcitation pulse, double target) {
        if (!(target > 0 && target < 1)) {
            throw new IllegalArgumentException("residual target must be between 0 and 1, was " + target);
        }
        if (residualBeforePulse(kinetics, pulse, SHORTEST_PERIOD_S) <= target) {
            return Double.POSITIVE_INFINITY;
        }
        if (residualBeforePulse(kinetics, pulse, LONGEST_PERIOD_S) > target) {
            return 0;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-10, 1e-12, 1e-15, 3);
        double logPeriod = solver.solve(300, lp -> residualBeforePulse(kinetics, pulse, Math.exp(lp)) - target,
                Math.log(SHORTEST_PERIOD_S), Math.log(LONGEST_PERIOD_S));
        return 1 / Math.exp(logPeriod);
    }

    /**
     * The smallest pulse-picker division d (from {@code divisions}, any order) whose rate f/d keeps the residual at or
     * below target, or −1 when none does.
     */
    public static int pickerDivision(LadderKinetics kinetics, PulseExcitation pulse, double baseRateHz,
                                     List<Integer> divisions, double target) {
        List<Integer> sorted = new ArrayList<>(divisions);
        sorted.sort(null);
        for (int d : sorted) {
            if (residualBeforePulse(kinetics, pulse, d / baseRateHz) <= target) {
                return d;
            }
        }
        return -1;
    }

    /**
     * Fractions before each of the first pulses, starting from unexcited neutral dots.
     *
     * @param excitedOrCharged dots still excited or charged
     * @param charged          dots charged
     */
    public record BuildUp(double[] excitedOrCharged, double[] charged) {
    }

    /** The approach to the steady state over the first {@code pulses} pulses, from one run of the one-period map. */
    public static BuildUp buildUp(LadderKinetics kinetics, PulseExcitation pulse, double periodS, int pulses) {
        PeriodicSteadyState train = kinetics.pulseTrain(pulse, periodS);
        double[] residualRow = Observables.excitedOrCharged(kinetics.space());
        double[] chargedRow = Observables.charged(kinetics.space());
        List<double[]> states = train.buildUp(pulses);
        double[] residual = new double[pulses];
        double[] charged = new double[pulses];
        for (int k = 0; k < pulses; k++) {
            double[] p = states.get(k);
            for (int i = 0; i < p.length; i++) {
                residual[k] += residualRow[i] * p[i];
                charged[k] += chargedRow[i] * p[i];
            }
        }
        return new BuildUp(residual, charged);
    }

    /** The model with its sample refresh replaced by {@code ratePerS} (none when 0). */
    public static KineticModel withRefresh(KineticModel model, double ratePerS) {
        List<RateLaw> processes = new ArrayList<>();
        for (RateLaw law : model.processes()) {
            if (!(law instanceof SampleRefresh)) {
                processes.add(law);
            }
        }
        if (ratePerS > 0) {
            processes.add(new SampleRefresh(ratePerS));
        }
        return new KineticModel(processes, model.charges(), model.hotResolved(), model.degeneracy(), model.fixedNMax());
    }

    /**
     * The smallest refresh rate (1/s) that keeps the steady-state charged fraction at or below {@code target}, searched
     * between 1e-3/s and 1e9/s; 0 when no refresh is needed, +∞ when 1e9/s is not enough.
     */
    public static double refreshRateForCharging(KineticModel model, PulseExcitation pulse, double periodS, double target) {
        if (!(target > 0 && target < 1)) {
            throw new IllegalArgumentException("charged-fraction target must be between 0 and 1, was " + target);
        }
        java.util.function.DoubleUnaryOperator charged = logK -> {
            KineticModel m = withRefresh(model, Math.exp(logK));
            return LadderKinetics.forPulses(m, pulse).steadyState(pulse, periodS, false).chargedFraction();
        };
        double lo = Math.log(1e-3);
        double hi = Math.log(1e9);
        if (charged.applyAsDouble(lo) <= target) {
            return 0;
        }
        if (charged.applyAsDouble(hi) > target) {
            return Double.POSITIVE_INFINITY;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-8, 1e-12, 1e-15, 3);
        return Math.exp(solver.solve(200, x -> charged.applyAsDouble(x) - target, lo, hi));
    }

    /** Risk row for the residual excitation against a limit. */
    public static Risk residualRisk(double residual, double limit) {
        return new Risk("residual excitation at the next pulse", Verdict.against(residual, limit, 0.5), residual, limit,
                "fraction", String.format(Locale.ROOT, "%.3g of the dots are still excited or charged when the next pulse "
                        + "arrives (limit %.3g); lower the repetition rate or use the pulse picker", residual, limit));
    }

    /** Risk row for the steady-state charged fraction against a limit. */
    public static Risk chargingRisk(double charged, double limit) {
        return new Risk("photocharging", Verdict.against(charged, limit, 0.5), charged, limit, "fraction",
                String.format(Locale.ROOT, "%.3g of the dots are charged in the steady state (limit %.3g); stir or flow the "
                        + "sample, or lower the fluence or repetition rate", charged, limit));
    }
}
