package org.ladderkin.kinetics;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.ladderkin.kinetics.propagate.Propagator;
import org.ladderkin.kinetics.propagate.WorkBound;
import org.ladderkin.kinetics.rate.GeneratorBuilder;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.PulseMatrix;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * The engine facade for one model on one ladder: assembles the between-pulse generator once, prepares its exact
 * propagator once (modal, or split at the settle time of hot excitons; see {@link PropagatorChoice}), and answers
 * traces, single pulses and pulse-train steady states from that. Caches the
 * one-period propagator per period and the mode factors per delay grid, so a sweep over ⟨N⟩ pays for them once.
 * Not thread-safe (the caches); use one instance per thread.
 */
public final class LadderKinetics {

    private final KineticModel model;
    private final LadderSpace space;
    private final double[][] generator;
    private final Propagator propagator;
    private final double[] bleach;
    private final double[] photoluminescence;
    private final Map<Double, double[][]> periodMaps = new HashMap<>();
    private double[] gridTimes;
    private Propagator.TraceGrid grid;

    private LadderKinetics(KineticModel model, LadderSpace space) {
        this.model = model;
        this.space = space;
        WorkBound.requireStates(space.size(), shape(space));
        this.generator = GeneratorBuilder.build(space, model.processes());
        this.propagator = PropagatorChoice.forLadder(space, generator);
        this.bleach = Observables.bleach(space, model.degeneracy());
        this.photoluminescence = Observables.photoluminescence(space, model);
    }

    /** The model on a given ladder. */
    public static LadderKinetics on(KineticModel model, LadderSpace space) {
        return new LadderKinetics(model, space);
    }

    /** The model with Nmax chosen so that the strongest of the given pulses leaves a tail below 1e-9. */
    public static LadderKinetics forPulses(KineticModel model, PulseExcitation... pulses) {
        LadderSpace space = spaceFor(model, pulses);
        WorkBound.requireStates(space.size(), "⟨N⟩ up to " + strongest(pulses) + ": " + shape(space));
        return new LadderKinetics(model, space);
    }

    private static LadderSpace spaceFor(KineticModel model, PulseExcitation... pulses) {
        int nMax = 1;
        for (PulseExcitation p : pulses) {
            nMax = Math.max(nMax, p.cutoff(KineticModel.TAIL));
        }
        if (model.fixedNMax() == 0 && nMax > 400) {
            throw new org.ladderkin.kinetics.propagate.WorkLimitException("⟨N⟩ up to " + strongest(pulses)
                    + " needs Nmax = " + nMax + ", more than the 400 the engine supports; lower ⟨N⟩");
        }
        return model.space(nMax);
    }

    private static String strongest(PulseExcitation... pulses) {
        double top = 0;
        for (PulseExcitation p : pulses) {
            top = Math.max(top, p.meanExcitons());
        }
        return new java.math.BigDecimal(String.format(java.util.Locale.ROOT, "%.4g", top)).stripTrailingZeros()
                .toPlainString();
    }

    private static String shape(LadderSpace space) {
        return "Nmax = " + space.nMax() + (space.hotResolved() ? ", hot excitons resolved" : "") + ", "
                + space.charges().size() + (space.charges().size() == 1 ? " charge state" : " charge states");
    }

    /**
     * The up-front estimate of a run's multiply-adds, before anything is built: the ladder (states), its
     * decomposition, the traces of every pulse on every delay, and the one-period map, fixed point (and with
     * {@code convergence} the eigenvalues) per pulse of a train. Refuses a ladder above {@link WorkBound#MAX_STATES}
     * or an estimate above {@link WorkBound#MAX_OPERATIONS}; what depends on the rates (crowded clusters, the settle
     * time of hot excitons) is checked again where it is known.
     *
     * @param delays number of delays traced
     * @param train whether a pulse-train steady state is solved for each pulse
     * @return the estimate, for a caller that warns above {@link WorkBound#WARN_OPERATIONS}
     */
    public static double checkWork(KineticModel model, int delays, boolean train, boolean convergence,
                                   PulseExcitation... pulses) {
        LadderSpace space = spaceFor(model, pulses);
        String top = "⟨N⟩ up to " + strongest(pulses);
        WorkBound.requireStates(space.size(), top + ": " + shape(space));
        double n = space.size();
        double ops = n * n * n + (double) delays * n * pulses.length;
        if (train) {
            ops += n * n * n + pulses.length * n * n * n * (4.0 / 3 + (convergence ? 10 : 0));
        }
        WorkBound.require(ops, top + " on " + (int) n + " states, " + delays + " delays and " + pulses.length
                + (pulses.length == 1 ? " pulse" : " pulses") + (train ? " with their pulse-train steady states" : ""),
                "fewer ⟨N⟩ values, fewer delays or a lower ⟨N⟩");
        return ops;
    }

    public KineticModel model() {
        return model;
    }

    public LadderSpace space() {
        return space;
    }

    /** The generator Q (a copy). */
    public double[][] generator() {
        double[][] c = new double[generator.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = generator[i].clone();
        }
        return c;
    }

    /** The exact propagator chosen for this ladder (see {@link PropagatorChoice}). */
    public Propagator propagator() {
        return propagator;
    }

    /** Bleach observable (see {@link Observables#bleach}). */
    public double[] bleachObservable() {
        return bleach.clone();
    }

    /** PL observable in photons/s per dot. */
    public double[] photoluminescenceObservable() {
        return photoluminescence.clone();
    }

    /** Populations at time tS after {@code start}, checked against the invariants. */
    public Populations propagate(Populations start, double tS) {
        double[] p = propagator.propagate(start.probabilities(), tS);
        PopulationGuard.check(space, p, tS, "after the last pulse");
        for (int i = 0; i < p.length; i++) {
            // the guard allowed it, so it is rounding of a true zero (−3e-47 seen at 1 fs): a population is ≥ 0
            p[i] = Math.max(0, p[i]);
        }
        return new Populations(space, p);
    }

    /** The distribution right after one pulse hits {@code before}. */
    public Populations applyPulse(Populations before, PulseExcitation pulse) {
        return new Populations(space, apply(PulseMatrix.of(space, pulse), before.probabilities(), "just after the pulse"));
    }

    private double[] apply(double[][] e, double[] b, String where) {
        double[] a = new double[b.length];
        for (int i = 0; i < a.length; i++) {
            double s = 0;
            double[] ei = e[i];
            for (int j = 0; j < a.length; j++) {
                s += ei[j] * b[j];
            }
            a[i] = s;
        }
        PopulationGuard.check(space, a, 0, where);
        return a;
    }

    /** Bleach and PL at the given delays after the pulse that produced {@code afterPulse}. */
    public Trace trace(Populations afterPulse, double[] delaysS) {
        if (grid == null || !Arrays.equals(gridTimes, delaysS)) {
            gridTimes = delaysS.clone();
            grid = propagator.onGrid(delaysS);
        }
        double[][] signals = grid.observe(new double[][] {bleach, photoluminescence}, afterPulse.probabilities());
        return new Trace(delaysS, signals[0], signals[1]);
    }

    /** One pulse on dots in the ground state, then the trace. */
    public Trace singlePulse(PulseExcitation pulse, double[] delaysS) {
        return trace(applyPulse(Populations.ground(space), pulse), delaysS);
    }

    /** The one-period solver for pulses every {@code periodS}. */
    public PeriodicSteadyState pulseTrain(PulseExcitation pulse, double periodS) {
        if (!(periodS > 0) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("pulse period must be finite and > 0, was " + periodS + " s");
        }
        double[][] phi = periodMaps.computeIfAbsent(periodS, propagator::matrix);
        return new PeriodicSteadyState(space, phi, PulseMatrix.of(space, pulse));
    }

    /**
     * The periodic steady state for pulses every {@code periodS}.
     *
     * @param withConvergence also compute |λ₂| and the pulses to reach 1 % (one dense eigen-decomposition)
     */
    public SteadyState steadyState(PulseExcitation pulse, double periodS, boolean withConvergence) {
        if (!(periodS > 0) || !Double.isFinite(periodS)) {
            throw new IllegalArgumentException("pulse period must be finite and > 0, was " + periodS + " s");
        }
        double n = space.size();
        WorkBound.require(n * n * n * (4.0 / 3 + (withConvergence ? 10 : 0)), "the pulse-train steady state of "
                + (int) n + " states (" + shape(space) + ")", "a lower ⟨N⟩ or a smaller model");
        double[][] e = PulseMatrix.of(space, pulse);
        PeriodicSteadyState train = new PeriodicSteadyState(space, periodMaps.computeIfAbsent(periodS, propagator::matrix), e);
        Populations before = new Populations(space, train.fixedPoint());
        Populations after = new Populations(space, apply(e, before.probabilities(), "just after a pulse in the steady state"));
        double lambda2 = withConvergence ? train.secondEigenvalueModulus() : Double.NaN;
        long pulses = withConvergence ? PeriodicSteadyState.pulsesToOnePercentLong(lambda2) : -1;
        return new SteadyState(before, after, before.excitedFraction(), before.chargedFraction(), lambda2, pulses,
                withConvergence ? pulses * periodS : Double.NaN);
    }
}
