package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.observe.MeasuredIrf;

/**
 * Global fit of a measured fluence series with the ladder model ({@link LadderBleachModel}): sets up the shared
 * parameters from a {@link LadderFitSetup}, runs {@link GlobalFitter}, and reads the diagnostics.
 */
public final class LadderFit {

    /** ⟨N⟩ of the strongest trace that the automatic scale starts aim at. */
    private static final double[] AUTO_TOP_N = {2, 0.5, 8};

    private LadderFit() {
    }

    /**
     * The fit and everything a report needs.
     *
     * @param result      the fit
     * @param kind        how the traces' excitation was given
     * @param scaleKey    key of the excitation scale ("crossSectionM2", "occupancyPerJ" or "occupancyScale")
     * @param excitation  each trace's recorded excitation (SI)
     * @param meanN       each trace's ⟨N⟩ at the best fit (empty when the fit failed)
     * @param curves      each trace's fitted curve at its delays (empty when the fit failed)
     * @param diagnostics findings about the sample and set-up, each with what to change
     * @param measuredIrf the measured instrument response the model was convolved with, or null
     */
    public record Outcome(FitResult result, Excitation.Kind kind, String scaleKey, double[] excitation, double[] meanN,
                          List<double[]> curves, List<String> diagnostics, MeasuredIrf measuredIrf) {

        /** An outcome without a measured IRF. */
        public Outcome(FitResult result, Excitation.Kind kind, String scaleKey, double[] excitation, double[] meanN,
                       List<double[]> curves, List<String> diagnostics) {
            this(result, kind, scaleKey, excitation, meanN, curves, diagnostics, null);
        }
    }

    /** Fits {@code data}; every trace must carry an excitation of the same kind. */
    public static Outcome fit(Dataset data, LadderFitSetup setup, FitProgress progress) {
        Excitation.Kind kind = null;
        double[] x = new double[data.size()];
        for (int i = 0; i < data.size(); i++) {
            Trace t = data.traces().get(i);
            Excitation e = t.metadata().excitation().orElseThrow(() -> new IllegalArgumentException("trace '" + t.label()
                    + "' has no excitation (give pulse energies, fluences or ⟨N⟩ for every trace)"));
            if (kind != null && e.kind() != kind) {
                throw new IllegalArgumentException("trace '" + t.label() + "' gives its excitation as " + label(e.kind())
                        + " but an earlier trace as " + label(kind) + " (use one kind for the whole series)");
            }
            kind = e.kind();
            x[i] = e.value();
        }
        String scaleKey = switch (kind) {
            case PHOTON_FLUENCE_PER_M2 -> "crossSectionM2";
            case PULSE_ENERGY_J -> "occupancyPerJ";
            case MEAN_OCCUPANCY -> "occupancyScale";
        };
        double top = 0;
        for (double v : x) {
            top = Math.max(top, v);
        }
        double scaleStart = Double.isNaN(setup.scaleStart())
                ? kind == Excitation.Kind.MEAN_OCCUPANCY ? 1 : AUTO_TOP_N[0] / top : setup.scaleStart();
        List<ParameterSpec> specs = specs(setup, scaleKey, scaleStart);
        LadderBleachModel model = LadderBleachModel.forModel(setup.base(), scaleKey, x, setup.periodS(), setup.measuredIrf(),
                setup.geometry());
        FitProblem problem = new FitProblem(data, counted(model, progress, FitOptions.defaults().maxEvaluations()), specs,
                setup.sharedAmplitude() ? LinearTerms.NONE : LinearTerms.AMPLITUDE_AND_BASELINE);
        FitOptions options = FitOptions.defaults().withProgress(progress);
        if (Double.isNaN(setup.scaleStart()) && kind != Excitation.Kind.MEAN_OCCUPANCY && setup.free().contains(LadderParameter.SCALE)) {
            List<Map<String, Double>> starts = new ArrayList<>();
            for (int s = 1; s < AUTO_TOP_N.length; s++) {
                starts.add(Map.of(scaleKey, AUTO_TOP_N[s] / top));
            }
            options = options.withStarts(starts);
        }
        if (setup.profile()) {
            List<String> keys = new ArrayList<>();
            for (String k : List.of(LadderBleachModel.TAU_AUGER2, scaleKey)) {
                if (!problem.parameter(k).fixed()) {
                    keys.add(k);
                }
            }
            options = options.withProfile(keys);
        }
        FitResult r = GlobalFitter.fit(problem, options);
        if (!r.ok()) {
            return new Outcome(r, kind, scaleKey, x, new double[0], List.of(), List.of(), setup.measuredIrf());
        }
        ParameterValues best = valuesAt(r, specs);
        double[] n = new double[x.length];
        List<double[]> curves = new ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            n[i] = model.meanOccupancy(i, best);
            Trace t = data.traces().get(i);
            double[] shape = model.predict(i, t.delaysS(), best);
            double a = r.find("amplitude", i).map(ParameterEstimate::value).orElse(1.0);
            double b = r.find("baseline", i).map(ParameterEstimate::value).orElse(0.0);
            for (int m = 0; m < shape.length; m++) {
                shape[m] = a * shape[m] + b;
            }
            curves.add(shape);
        }
        List<String> diagnostics = FitDiagnostics.find(data, model, best, r, n,
                Double.isNaN(setup.scaleStart()) || !setup.free().contains(LadderParameter.SCALE) ? Double.NaN : setup.scaleStart(), scaleKey);
        return new Outcome(r, kind, scaleKey, x, n, curves, diagnostics, setup.measuredIrf());
    }

    /**
     * The model, telling {@code progress} of each evaluation of the whole series (stage "evaluation"), so a progress
     * bar moves during one long start and not only between starts.
     */
    private static TraceModel counted(LadderBleachModel model, FitProgress progress, int expected) {
        if (progress == FitProgress.NONE) {
            return model;
        }
        return new TraceModel() {
            private int evaluations;

            @Override
            public int traceCount() {
                return model.traceCount();
            }

            @Override
            public double[] predict(int trace, double[] delaysS, ParameterValues p) {
                if (trace == 0) {
                    evaluations++;
                    progress.update("evaluation", evaluations, Math.max(expected, evaluations));
                }
                return model.predict(trace, delaysS, p);
            }
        };
    }

    static List<ParameterSpec> specs(LadderFitSetup setup, String scaleKey, double scaleStart) {
        List<ParameterSpec> specs = new ArrayList<>();
        specs.add(spec(setup, LadderParameter.SCALE, scaleKey.endsWith("M2")
                ? ParameterSpec.positive(scaleKey.substring(0, scaleKey.length() - 2), "M2", scaleStart)
                : ParameterSpec.positive(scaleKey, "", scaleStart)));
        if (setup.sharedAmplitude()) {
            specs.add(ParameterSpec.positive("amplitude", "Od", 1e-3));
        }
        LadderModel base = setup.base();
        for (ProcessParameter p : ProcessRegistry.fittable()) {
            LadderParameter which = LadderParameter.of(p);
            if (base.has(p)) {
                specs.add(spec(setup, which, ParameterSpec.positive(p.fitKey(), "S", base.seconds(p))));
            } else if (setup.free().contains(which)) {
                double start = ProcessRegistry.owner(p).startWhenFreed(base).seconds(p);
                specs.add(spec(setup, which, ParameterSpec.positive(p.fitKey(), "S", start)));
            }
        }
        if (setup.timeZeroStartS() != 0 || setup.free().contains(LadderParameter.TIME_ZERO)) {
            specs.add(spec(setup, LadderParameter.TIME_ZERO, ParameterSpec.unbounded("timeZero", "S", setup.timeZeroStartS(), 1e-12)));
        }
        if (!Double.isNaN(setup.irfFwhmS())) {
            specs.add(spec(setup, LadderParameter.IRF, ParameterSpec.positive("irfFwhm", "S", setup.irfFwhmS())));
        }
        return specs;
    }

    private static ParameterSpec spec(LadderFitSetup setup, LadderParameter which, ParameterSpec free) {
        return setup.free().contains(which) ? free : free.fixedAt(free.start());
    }

    static ParameterValues valuesAt(FitResult r, List<ParameterSpec> specs) {
        Map<String, Integer> index = new LinkedHashMap<>();
        double[][] v = new double[specs.size()][];
        for (int s = 0; s < specs.size(); s++) {
            index.put(specs.get(s).key(), s);
            v[s] = new double[] {r.estimate(specs.get(s).key()).value()};
        }
        return new ParameterValues(new HashMap<>(index), v);
    }

    private static String label(Excitation.Kind kind) {
        return switch (kind) {
            case PHOTON_FLUENCE_PER_M2 -> "a photon fluence";
            case PULSE_ENERGY_J -> "a pulse energy";
            case MEAN_OCCUPANCY -> "⟨N⟩";
        };
    }
}
