package org.ladderkin.cli;

import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.ensemble.DotRun;
import org.ladderkin.kinetics.ensemble.PumpPulse;
import org.ladderkin.kinetics.ensemble.SizeEnsemble;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * {@code simulate} over a size ensemble and with the pump's width: the given ⟨N⟩ are the mean size's, each member of
 * the {@link SizeEnsemble} sees v·⟨N⟩ with its own Auger rates, and {@link DotRun} decides per pulse whether it is
 * instantaneous. The columns are the members' weighted sums; the steady-state numbers are weighted sums too, except
 * |λ₂| and the pulses to 1 %, the slowest member holding at least 1 % of the dots.
 */
final class EnsembleSimulation {

    private static final double TRANSIENT_SHARE = 0.01;

    /** What simulate prints: columns per ⟨N⟩, steady states per ⟨N⟩ (null without a train), and what was used. */
    record Result(List<List<SimulatedObservables.Column>> columns, List<SteadyState> states, int nodes, String pulseNote) {
    }

    private EnsembleSimulation() {
    }

    static Result run(KineticModel model, List<PulseExcitation> pulses, List<String> labels, double periodS,
                      double[] delaysS, List<String> observables, SimulatedObservables.Inputs in, double dispersion,
                      PumpPulse pump, boolean convergence) {
        Map<SizeEnsemble, Result> done = new IdentityHashMap<>();
        SizeEnsemble chosen = SizeEnsemble.converged(dispersion, e -> {
            Result r = once(e, model, pulses, labels, periodS, delaysS, observables, in, pump, false);
            done.put(e, r);
            List<double[]> blocks = new ArrayList<>();
            r.columns().forEach(perN -> perN.forEach(c -> blocks.add(c.values())));
            return blocks.toArray(double[][]::new);
        });
        Result r = done.get(chosen);
        if (r == null || convergence) {
            r = once(chosen, model, pulses, labels, periodS, delaysS, observables, in, pump, convergence);
        }
        return r;
    }

    private static Result once(SizeEnsemble e, KineticModel model, List<PulseExcitation> pulses, List<String> labels,
                               double periodS, double[] delaysS, List<String> observables, SimulatedObservables.Inputs in,
                               PumpPulse pump, boolean convergence) {
        int count = pulses.size();
        List<List<double[]>> sums = new ArrayList<>();
        List<List<String>> names = new ArrayList<>();
        double[] residual = new double[count];
        double[] charged = new double[count];
        double[] lambda2 = new double[count];
        long[] toOnePercent = new long[count];
        SteadyState[] heaviest = new SteadyState[count];
        double heaviestWeight = -1;
        String note = "";
        for (int m = 0; m < e.size(); m++) {
            double v = e.volumeRatio(m);
            double w = e.weight(m);
            List<PulseExcitation> sized = pulses.stream().map(p -> scaled(p, v)).toList();
            PulseExcitation strongest = sized.stream().max((a, b) -> Double.compare(a.meanExcitons(), b.meanExcitons())).get();
            DotRun run = new DotRun(e.modelAt(model, m), strongest, pump);
            SimulatedObservables.Inputs memberIn = new SimulatedObservables.Inputs(in.photonEnergyJ(), in.firstExcitonJ(),
                    in.dotHeatCapacityJPerK() * v, in.spectrumEnergiesJ(), in.lineFwhmJ(), in.biexcitonShiftJ());
            for (int i = 0; i < count; i++) {
                DotRun.After a = run.after(sized.get(i), periodS);
                if (note.isEmpty() && !a.why().isEmpty()) {
                    note = "finite-pulse propagation from ⟨N⟩ = " + labels.get(i) + ": " + a.why();
                }
                List<SimulatedObservables.Column> cols = columns(observables, labels.get(i), run, a, sized.get(i), delaysS,
                        memberIn);
                if (sums.size() <= i) {
                    sums.add(new ArrayList<>());
                    names.add(new ArrayList<>());
                    for (SimulatedObservables.Column c : cols) {
                        sums.get(i).add(new double[c.values().length]);
                        names.get(i).add(c.name());
                    }
                }
                for (int c = 0; c < cols.size(); c++) {
                    double[] s = sums.get(i).get(c);
                    double[] x = cols.get(c).values();
                    for (int j = 0; j < s.length; j++) {
                        s[j] += w * x[j];
                    }
                }
                if (!Double.isNaN(periodS)) {
                    residual[i] += w * a.residualExcitedFraction();
                    charged[i] += w * a.chargedFraction();
                    if (convergence && (w >= TRANSIENT_SHARE || e.size() == 1)) {
                        SteadyState ss = run.kinetics().steadyState(sized.get(i), periodS, true);
                        lambda2[i] = Math.max(lambda2[i], ss.secondEigenvalueModulus());
                        toOnePercent[i] = Math.max(toOnePercent[i], ss.pulsesToOnePercent());
                    }
                    if (w > heaviestWeight || heaviest[i] == null) {
                        heaviest[i] = new SteadyState(new Populations(run.kinetics().space(), a.before()),
                                new Populations(run.kinetics().space(), a.after()), 0, 0, 0, 0, 0);
                    }
                }
            }
            heaviestWeight = Math.max(heaviestWeight, w);
        }
        List<List<SimulatedObservables.Column>> columns = new ArrayList<>();
        List<SteadyState> states = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            List<SimulatedObservables.Column> perN = new ArrayList<>();
            for (int c = 0; c < sums.get(i).size(); c++) {
                perN.add(new SimulatedObservables.Column(names.get(i).get(c), sums.get(i).get(c)));
            }
            columns.add(perN);
            states.add(Double.isNaN(periodS) ? null : new SteadyState(heaviest[i].beforePulse(), heaviest[i].afterPulse(),
                    residual[i], charged[i], convergence ? lambda2[i] : Double.NaN, convergence ? toOnePercent[i] : -1,
                    convergence ? toOnePercent[i] * periodS : Double.NaN));
        }
        String pulseNote = pump.fwhmS() == 0 ? "instantaneous pulses (no --pulse-width)"
                : note.isEmpty() ? String.format(Locale.ROOT, "instantaneous pulses: the %.3g fs pulse is short against"
                        + " every populated process and off resonance", pump.fwhmS() * 1e15) : note;
        return new Result(columns, states, e.nodes(), pulseNote);
    }

    private static PulseExcitation scaled(PulseExcitation p, double v) {
        if (p instanceof PulseExcitation.Multiplication m) {
            return new PulseExcitation.Multiplication(v * m.meanPhotons(), m.eta());
        }
        return new PulseExcitation.Poisson(v * p.meanExcitons());
    }

    /**
     * The member's columns: bleach, PL and charged fraction from the pulse centre (through the pulse when it is
     * finite); temperature and spectrum from the state at the end of the pulse window.
     */
    private static List<SimulatedObservables.Column> columns(List<String> observables, String label, DotRun run,
                                                             DotRun.After a, PulseExcitation pulse, double[] delaysS,
                                                             SimulatedObservables.Inputs in) {
        List<SimulatedObservables.Column> out = new ArrayList<>();
        for (String o : observables) {
            double[] row = switch (o) {
                case "bleach" -> run.kinetics().bleachObservable();
                case "pl" -> run.kinetics().photoluminescenceObservable();
                case "charged" -> Observables.charged(run.kinetics().space());
                default -> null;
            };
            if (row != null) {
                out.add(new SimulatedObservables.Column(o + "@N=" + label, run.observe(a, new double[][] {row}, delaysS)[0]));
                continue;
            }
            double[] shifted = new double[delaysS.length];
            for (int j = 0; j < shifted.length; j++) {
                shifted[j] = Math.max(0, delaysS[j] - a.afterTimeS());
            }
            out.addAll(SimulatedObservables.columns(List.of(o), label, run.kinetics(), pulse,
                    new Populations(run.kinetics().space(), a.after()), shifted, in));
        }
        return out;
    }
}
