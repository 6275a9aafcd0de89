package org.ladderkin.kinetics.ensemble;

import java.util.Locale;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.PopulationGuard;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.propagate.Propagator;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.kinetics.train.FinitePulse;
import org.ladderkin.kinetics.train.FinitePulseSystem;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * One dot size under one pump: its ladder (sized for its strongest pulse), and for each pulse the state right after
 * it, in one shot on fresh dots or in the periodic steady state, with the pulse taken as instantaneous when it is short
 * and off resonance, else propagated through its finite width ({@link FinitePulse}). Signals at delays from the pulse
 * centre: after a finite pulse the state is known at +H (half the window), so delays ≥ H propagate exactly from there
 * and delays inside the window are integrated from −H. Factorised delay grids are cached per delay set.
 */
public final class DotRun {

    /** σ standing for the pulse when only ⟨N⟩ = σ·j matters (m²). */
    private static final double NOMINAL_CROSS_SECTION_M2 = 1e-18;
    /** Negative populations down to this (the finite pulse's convergence level) are rounding and set to 0. */
    private static final double ROUNDING = 1e-8;

    private final LadderKinetics kin;
    private final PumpPulse pump;
    private final java.util.Map<java.util.List<Double>, Propagator.TraceGrid> grids = new java.util.HashMap<>();

    public DotRun(KineticModel model, PulseExcitation strongest, PumpPulse pump) {
        this.kin = LadderKinetics.forPulses(model, strongest);
        this.pump = pump;
    }

    public LadderKinetics kinetics() {
        return kin;
    }

    /** The state right after a pulse: before it, after it, and where "after" is (0, or +H for a finite pulse). */
    public record After(double[] before, double[] after, double afterTimeS, FinitePulse finite, String why,
                        double residualExcitedFraction, double chargedFraction) {
    }

    /**
     * Why {@code pulse} is propagated through its width, or "" when it is taken as instantaneous: a resonant pump, or a
     * pulse not short against the fastest rate of a state it populates (Poisson probability ≥ {@link PumpPulse#POPULATED}).
     * Carrier multiplication is modelled for instantaneous pulses only.
     */
    public String finiteReason(PulseExcitation pulse) {
        if (pump.fwhmS() == 0 || !(pulse instanceof PulseExcitation.Poisson)) {
            return "";
        }
        if (pump.resonant()) {
            return "resonant pump: within a line width of the band edge the 1S transition saturates and stimulated"
                    + " emission holds the filling near transparency";
        }
        double fastest = fastestPopulatedRatePerS(pulse);
        double product = fastest * pump.fwhmS();
        if (product > PumpPulse.SHORT) {
            return String.format(Locale.ROOT, "pulse FWHM %.3g fs × fastest populated rate %.3g /ps = %.3g > %.2g:"
                    + " the populations change during the pulse", pump.fwhmS() * 1e15, fastest * 1e-12, product,
                    PumpPulse.SHORT);
        }
        return "";
    }

    private double fastestPopulatedRatePerS(PulseExcitation pulse) {
        LadderSpace space = kin.space();
        double[] added = pulse.addedExcitons(space.nMax() + 1);
        double[][] q = kin.generator();
        double fastest = 0;
        for (int s = 0; s < space.size(); s++) {
            if (added[space.excitons(s)] >= PumpPulse.POPULATED) {
                fastest = Math.max(fastest, -q[s][s]);
            }
        }
        return fastest;
    }

    /** The state after {@code pulse}: in the steady state of pulses every {@code periodS}, or on fresh dots when NaN. */
    public After after(PulseExcitation pulse, double periodS) {
        String why = finiteReason(pulse);
        LadderSpace space = kin.space();
        if (why.isEmpty()) {
            if (Double.isNaN(periodS)) {
                Populations ground = Populations.ground(space);
                return new After(ground.probabilities(), kin.applyPulse(ground, pulse).probabilities(), 0, null, "", 0, 0);
            }
            SteadyState ss = kin.steadyState(pulse, periodS, false);
            return new After(ss.beforePulse().probabilities(), ss.afterPulse().probabilities(), 0, null, "",
                    ss.residualExcitedFraction(), ss.chargedFraction());
        }
        FinitePulse finite = FinitePulse.of(new FinitePulseSystem(space, kin.generator(), NOMINAL_CROSS_SECTION_M2,
                pump.resonant() ? kin.model().degeneracy() : 0, pulse.meanExcitons() / NOMINAL_CROSS_SECTION_M2,
                pump.fwhmS()), pump.fwhmS());
        double h = finite.halfWindowS();
        double[] before;
        if (Double.isNaN(periodS)) {
            before = Populations.ground(space).probabilities();
        } else {
            if (!(periodS > 2 * h)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "the pulse period %.3g s is shorter than"
                        + " the pulse's window (%.3g s)", periodS, 2 * h));
            }
            before = new PeriodicSteadyState(space, kin.propagator().matrix(periodS - 2 * h), finite.matrix()).fixedPoint();
            before = clean(before, "before a finite pulse in the steady state");
        }
        double[] after = clean(finite.apply(before), "after a finite pulse");
        Populations b = new Populations(space, before);
        return new After(before, after, h, finite, why, b.excitedFraction(), b.chargedFraction());
    }

    /**
     * Σ_s o_s·p_s(t) for each observable row at each delay (from the pulse centre; delays ≥ 0).
     */
    public double[][] observe(After a, double[][] rows, double[] delaysS) {
        int inside = 0;
        while (inside < delaysS.length && delaysS[inside] < a.afterTimeS()) {
            inside++;
        }
        double[] later = new double[delaysS.length - inside];
        for (int j = 0; j < later.length; j++) {
            later[j] = delaysS[inside + j] - a.afterTimeS();
        }
        double[][] out = new double[rows.length][delaysS.length];
        if (later.length > 0) {
            double[][] l = grid(later).observe(rows, a.after());
            for (int r = 0; r < rows.length; r++) {
                System.arraycopy(l[r], 0, out[r], inside, later.length);
            }
        }
        for (int j = 0; j < inside; j++) {
            double[] p = clean(a.finite().at(a.before(), delaysS[j]), "during a finite pulse");
            for (int r = 0; r < rows.length; r++) {
                double s = 0;
                for (int i = 0; i < p.length; i++) {
                    s += rows[r][i] * p[i];
                }
                out[r][j] = s;
            }
        }
        return out;
    }

    private Propagator.TraceGrid grid(double[] times) {
        java.util.List<Double> key = java.util.Arrays.stream(times).boxed().toList();
        return grids.computeIfAbsent(key, k -> kin.propagator().onGrid(times));
    }

    private double[] clean(double[] p, String where) {
        double[] c = p.clone();
        double sum = 0;
        for (int i = 0; i < c.length; i++) {
            if (c[i] < 0 && c[i] >= -ROUNDING) {
                c[i] = 0;
            }
            sum += c[i];
        }
        for (int i = 0; i < c.length; i++) {
            c[i] /= sum;
        }
        PopulationGuard.check(kin.space(), c, 0, where);
        return c;
    }
}
