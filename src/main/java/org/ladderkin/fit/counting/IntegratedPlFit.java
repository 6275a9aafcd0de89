package org.ladderkin.fit.counting;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.Photoluminescence;

/**
 * Integrated PL against photon fluence: Y(j) = C·(photons a dot emits per pulse at ⟨N⟩ = σ·j), the ladder's emission
 * integrated exactly ({@link Photoluminescence#emittedPerPulse}). Its saturation gives σ; its growth past saturation,
 * the multiexcitons' emission against their Auger decay, gives τ₂ and with it the biexciton emission yield. The
 * noise is taken as Gaussian with one unknown σ_y, estimated from the fit's own residuals (the errors are scaled by
 * √(χ²/ν)).
 */
public final class IntegratedPlFit {

    /** Photon window counted per pulse when no repetition period is given, in single-exciton radiative lifetimes. */
    private static final double WINDOW_LIFETIMES = 60;

    /**
     * The outcome.
     *
     * @param result          the fit (errors scaled by the residuals)
     * @param biexcitonYield  the biexciton's emission quantum yield at the best fit, k_rad(XX)/(k_rad(XX) + k_other(XX))
     */
    public record Outcome(LikelihoodResult result, double biexcitonYield) {
    }

    private IntegratedPlFit() {
    }

    /**
     * Fits {@code plPerPulse} at photon fluences {@code fluencesPerM2} (strictly increasing).
     *
     * @param freeLifetimes fit names of the lifetimes fitted (usually "tau-auger2")
     */
    public static Outcome fit(double[] fluencesPerM2, double[] plPerPulse, LadderModel base, double sigmaStartM2,
                              Set<String> freeLifetimes) {
        List<ParameterSpec> shared = LadderEmission.ladderParameters(base, CountingFit.SCALE, sigmaStartM2, true, freeLifetimes);
        Model model = new Model(base, fluencesPerM2);
        LikelihoodResult first = LikelihoodFitter.fit(shared, List.of(part(fluencesPerM2, plPerPulse, 1, model)), List.of());
        if (!first.ok()) {
            return new Outcome(first, Double.NaN);
        }
        double scale = Math.sqrt(first.chiSquare() / first.degreesOfFreedom());
        List<ParameterSpec> restart = new ArrayList<>();
        for (ParameterSpec s : shared) {
            restart.add(s.fixed() ? s : s.startingAt(first.estimate(s.key()).value()));
        }
        LikelihoodResult r = LikelihoodFitter.fit(restart, List.of(part(fluencesPerM2, plPerPulse, scale, model)), List.of());
        if (!r.ok()) {
            return new Outcome(r, Double.NaN);
        }
        return new Outcome(r, model.biexcitonYield(values(r, restart)));
    }

    /** Photons one dot emits per pulse at each photon fluence, for the ladder {@code model} and σ. */
    public static double[] photonsPerPulse(LadderModel model, double sigmaM2, double[] fluencesPerM2) {
        List<ParameterSpec> specs = LadderEmission.ladderParameters(model, CountingFit.SCALE, sigmaM2, false, Set.of());
        ParameterValues p = ParameterValues.shared(specs.stream().map(ParameterSpec::key).toList(),
                specs.stream().mapToDouble(ParameterSpec::start).toArray());
        return new Model(model, fluencesPerM2).predict(0, fluencesPerM2, p);
    }

    private static ParameterValues values(LikelihoodResult r, List<ParameterSpec> specs) {
        return ParameterValues.shared(specs.stream().map(ParameterSpec::key).toList(),
                specs.stream().mapToDouble(s -> r.estimate(s.key()).value()).toArray());
    }

    private static GaussianTracePart part(double[] x, double[] y, double sigma, Model model) {
        double[] s = new double[x.length];
        java.util.Arrays.fill(s, sigma);
        return new GaussianTracePart(new Trace(x, y, s, org.ladderkin.fit.TraceMetadata.labelled("integrated PL"), 0), 0, model, false);
    }

    /** Photons per dot per pulse at each fluence (the trace's "delays" are the fluences). */
    private static final class Model implements TraceModel {
        private final LadderModel base;
        private final double top;

        Model(LadderModel base, double[] fluences) {
            this.base = base;
            double t = 0;
            for (double f : fluences) {
                t = Math.max(t, f);
            }
            this.top = t;
        }

        @Override
        public int traceCount() {
            return 1;
        }

        private LadderKinetics kinetics(ParameterValues p) {
            LadderModel m = base;
            for (var pp : org.ladderkin.kinetics.process.ProcessRegistry.fittable()) {
                int i = p.indexOf(org.ladderkin.fit.LadderBleachModel.kineticKey(pp));
                if (i >= 0) {
                    m = m.withSeconds(pp, p.value(i, 0));
                }
            }
            return LadderKinetics.forPulses(m.toModel(), new PulseExcitation.Poisson(1.5 * top * p.get(CountingFit.SCALE)));
        }

        @Override
        public double[] predict(int trace, double[] fluencesPerM2, ParameterValues p) {
            LadderKinetics k = kinetics(p);
            double window = WINDOW_LIFETIMES * longest(k);
            double[] out = new double[fluencesPerM2.length];
            for (int i = 0; i < out.length; i++) {
                Populations after = k.applyPulse(Populations.ground(k.space()),
                        new PulseExcitation.Poisson(p.get(CountingFit.SCALE) * fluencesPerM2[i]));
                out[i] = Photoluminescence.emittedPerPulse(k, after, window);
            }
            return out;
        }

        /** The slowest decay of any excited state (s). */
        private static double longest(LadderKinetics k) {
            double[][] q = k.generator();
            double slowest = Double.POSITIVE_INFINITY;
            for (int i = 0; i < q.length; i++) {
                if (q[i][i] < 0) {
                    slowest = Math.min(slowest, -q[i][i]);
                }
            }
            return 1 / slowest;
        }

        double biexcitonYield(ParameterValues p) {
            LadderKinetics k = kinetics(p);
            int xx = k.space().index(Charge.NEUTRAL, 2, 0);
            return k.photoluminescenceObservable()[xx] / -k.generator()[xx][xx];
        }
    }
}
