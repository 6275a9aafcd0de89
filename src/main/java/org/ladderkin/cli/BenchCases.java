package org.ladderkin.cli;

import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.Trace;
import org.ladderkin.kinetics.process.CoolingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * The engine's speed cases, shared by the {@code bench} command and the JMH benchmark so both time the same work:
 * a 31-state ladder (Nmax = 30, τ_rad 20 ns statistical, τ₂ 50 ps statistical, g = 2), 1000 log-spaced delays from
 * 0.1 ps to 1 ms.
 */
public final class BenchCases {

    /** 1000 log-spaced delays 0.1 ps..1 ms. */
    public static final double[] DELAYS_S = logSpaced(1e-13, 1e-3, 1000);
    /** 40 log-spaced ⟨N⟩ from 0.01 to 10. */
    public static final double[] SWEEP_N = logSpaced(0.01, 10, 40);

    private BenchCases() {
    }

    /** The 31-state benchmark model. */
    public static KineticModel ladder31() {
        return LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 50e-12, AugerScaling.STATISTICAL, 2)
                .toModel().withFixedNMax(30);
    }

    /** The benchmark model with hot excitons cooling in 0.5 ps, Nmax = 20 (231 states). */
    public static KineticModel cooling21() {
        return LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 50e-12, AugerScaling.STATISTICAL, 2)
                .with(new CoolingProcess(0.5e-12)).withNMax(20).toModel();
    }

    /** Case 1 and 4: build the engine for a model and compute one trace after one pulse of ⟨N⟩ = 3. */
    public static Trace singleTrace(KineticModel model) {
        LadderKinetics k = LadderKinetics.on(model, model.space(model.fixedNMax()));
        return k.singlePulse(new PulseExcitation.Poisson(3), DELAYS_S);
    }

    /** One trace on an engine already built (the per-trace cost). */
    public static Trace traceOn(LadderKinetics k, double meanN) {
        return k.trace(k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(meanN)), DELAYS_S);
    }

    /**
     * Cases 2 and 3: the 40-value ⟨N⟩ sweep, each in the periodic steady state at the given repetition rate with its
     * bleach and PL trace; returns a checksum so the work cannot be optimised away.
     *
     * @param withConvergence also compute |λ₂| and pulses-to-1 % for every ⟨N⟩
     */
    public static double sweep(double repetitionRateHz, boolean withConvergence) {
        KineticModel model = ladder31();
        LadderKinetics k = LadderKinetics.on(model, model.space(30));
        double sum = 0;
        for (double n : SWEEP_N) {
            PulseExcitation pulse = new PulseExcitation.Poisson(n);
            SteadyState ss = k.steadyState(pulse, 1 / repetitionRateHz, withConvergence);
            Trace t = k.trace(ss.afterPulse(), DELAYS_S);
            sum += t.bleach()[0] + t.photoluminescencePerS()[999] + ss.residualExcitedFraction();
        }
        return sum;
    }

    private static double[] logSpaced(double from, double to, int count) {
        double[] d = new double[count];
        for (int i = 0; i < count; i++) {
            d[i] = from * Math.pow(to / from, i / (double) (count - 1));
        }
        return d;
    }
}
