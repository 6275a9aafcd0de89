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
     * Cases 2 and 3: the 40-value ⟨N⟩ sweep, each in the periodic steady state at the given repetition rate, with the
     * bleach and PL traces of all ⟨N⟩ from one product with the shared delay grid (as {@code simulate} does it);
     * returns a checksum so the work cannot be optimised away.
     *
     * @param withConvergence also compute |λ₂| and pulses-to-1 % for every ⟨N⟩
     */
    public static double sweep(double repetitionRateHz, boolean withConvergence) {
        KineticModel model = ladder31();
        LadderKinetics k = LadderKinetics.on(model, model.space(30));
        double sum = 0;
        double[][] starts = new double[SWEEP_N.length][];
        for (int i = 0; i < SWEEP_N.length; i++) {
            SteadyState ss = k.steadyState(new PulseExcitation.Poisson(SWEEP_N[i]), 1 / repetitionRateHz, withConvergence);
            starts[i] = ss.afterPulse().probabilities();
            sum += ss.residualExcitedFraction();
        }
        double[][][] traces = k.propagator().onGrid(DELAYS_S)
                .observeAll(new double[][] {k.bleachObservable(), k.photoluminescenceObservable()}, starts);
        for (double[][] t : traces) {
            sum += t[0][0] + t[1][999];
        }
        return sum;
    }

    /** Name of the whole-command case. */
    public static final String SIMULATE_CASE = "simulate command, sweep 40 <N> at 80 MHz, 1000 delays, CSV";

    /**
     * The {@code simulate} arguments of that case: the 31-state model from flags, the 40 ⟨N⟩ of the sweep, 80 MHz,
     * 1000 log-spaced delays 0.1 ps..12.5 ns, CSV.
     */
    public static String[] simulateArguments() {
        StringBuilder ns = new StringBuilder();
        for (double n : SWEEP_N) {
            ns.append(ns.length() == 0 ? "" : ",").append(n);
        }
        return new String[] {"simulate", "--tau-rad", "20ns", "--radiative-scaling", "statistical", "--tau-auger2",
            "50ps", "--auger-scaling", "statistical", "--degeneracy", "2", "--n-avg", ns.toString(), "--rep-rate",
            "80MHz", "--delays", "0.1ps..12.5ns:1000log", "--format", "csv"};
    }

    /**
     * The whole {@code simulate} command path in process (argument parsing, model, steady states, grid, CSV text)
     * with the text counted instead of printed; returns the character count.
     */
    public static double simulateCommand() {
        java.io.StringWriter err = new java.io.StringWriter();
        CountingWriter text = new CountingWriter();
        int code = Main.commandLine(new java.io.PrintWriter(text), new java.io.PrintWriter(err))
                .execute(simulateArguments());
        if (code != 0) {
            throw new IllegalStateException("simulate failed in the benchmark: " + err);
        }
        return text.count;
    }

    /** A writer that only counts what it is given. */
    private static final class CountingWriter extends java.io.Writer {
        private long count;

        @Override
        public void write(char[] buf, int off, int len) {
            count += len;
        }

        @Override
        public void write(String str, int off, int len) {
            count += len;
        }

        @Override
        public void flush() {
        }

        @Override
        public void close() {
        }
    }

    private static double[] logSpaced(double from, double to, int count) {
        double[] d = new double[count];
        for (int i = 0; i < count; i++) {
            d[i] = from * Math.pow(to / from, i / (double) (count - 1));
        }
        return d;
    }
}
