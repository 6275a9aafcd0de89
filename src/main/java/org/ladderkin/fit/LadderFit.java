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

    /** Start of a freed multiplication yield η. */
    static final double YIELD_START = 0.3;

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
     * @param quality     reduced χ² against the data's own noise and the residuals' structure, or null when the fit failed
     * @param checks      what the diagnostics tested and found clean, or could not test and why
     * @param fluenceScaleUncertainty relative calibration uncertainty of the excitation carried into {@code totalStdErrors}
     * @param totalStdErrors shared parameter key → statistical and calibration error combined (SI); empty without a
     *                    calibration uncertainty
     */
    public record Outcome(FitResult result, Excitation.Kind kind, String scaleKey, double[] excitation, double[] meanN,
                          List<double[]> curves, List<String> diagnostics, MeasuredIrf measuredIrf, FitQuality quality,
                          List<String> checks, double fluenceScaleUncertainty, Map<String, Double> totalStdErrors) {

        public Outcome {
            diagnostics = List.copyOf(diagnostics);
            checks = List.copyOf(checks);
            totalStdErrors = Map.copyOf(totalStdErrors);
        }

        /** An outcome without quality, checks or calibration (tests, previews). */
        public Outcome(FitResult result, Excitation.Kind kind, String scaleKey, double[] excitation, double[] meanN,
                       List<double[]> curves, List<String> diagnostics, MeasuredIrf measuredIrf) {
            this(result, kind, scaleKey, excitation, meanN, curves, diagnostics, measuredIrf, null, List.of(), 0, Map.of());
        }

        /** The total (statistical and calibration) error of shared parameter {@code key}, when a calibration was given. */
        public java.util.OptionalDouble totalStdError(String key) {
            Double v = totalStdErrors.get(key);
            return v == null ? java.util.OptionalDouble.empty() : java.util.OptionalDouble.of(v);
        }

        /** An outcome without a measured IRF. */
        public Outcome(FitResult result, Excitation.Kind kind, String scaleKey, double[] excitation, double[] meanN,
                       List<double[]> curves, List<String> diagnostics) {
            this(result, kind, scaleKey, excitation, meanN, curves, diagnostics, null);
        }
    }

    /** A ladder fit set up: the excitations, the model, the problem and the options, before anything is fitted. */
    private record Prepared(Excitation.Kind kind, double[] x, String scaleKey, List<ParameterSpec> specs,
                            LadderBleachModel model, FitProblem problem, FitOptions options) {
    }

    /** Fits {@code data}; every trace must carry an excitation of the same kind. */
    public static Outcome fit(Dataset data, LadderFitSetup setup, FitProgress progress) {
        Prepared prepared = prepare(data, setup, progress);
        Excitation.Kind kind = prepared.kind();
        double[] x = prepared.x();
        String scaleKey = prepared.scaleKey();
        List<ParameterSpec> specs = prepared.specs();
        LadderBleachModel model = prepared.model();
        FitProblem problem = prepared.problem();
        FitOptions options = prepared.options();
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
        List<String> diagnostics = new ArrayList<>();
        FitQuality quality = FitQuality.of(data, r);
        FitDiagnostics.residualStructure(data, r, quality, best, model, setup.free()).ifPresent(diagnostics::add);
        diagnostics.addAll(FitDiagnostics.find(data, model, best, r, n,
                Double.isNaN(setup.scaleStart()) || !setup.free().contains(LadderParameter.SCALE) ? Double.NaN : setup.scaleStart(), scaleKey));
        List<String> checks = new ArrayList<>();
        String[] charging = FitDiagnostics.photochargingInData(data, r, quality, best, x, n, curves);
        if (charging[0] != null && diagnostics.stream().noneMatch(d -> d.startsWith("photocharging"))) {
            diagnostics.add(charging[0]);
        } else if (charging[1] != null) {
            checks.add(charging[1]);
        }
        Map<String, Double> total = calibrated(r, problem, options, specs, scaleKey, setup.fluenceScaleUncertainty());
        return new Outcome(r, kind, scaleKey, x, n, curves, diagnostics, setup.measuredIrf(), quality, checks,
                setup.fluenceScaleUncertainty(), total);
    }

    /**
     * Whether the parameters {@code setup} frees can be told apart by {@code data}, judged at the start point before
     * a fit (one Jacobian: two model evaluations of the series per freed parameter). Call it before {@link #fit} to
     * warn; the fit runs either way.
     *
     * @throws IllegalArgumentException as {@link #fit} does for traces without a usable excitation
     */
    public static FitIdentifiability identifiability(Dataset data, LadderFitSetup setup) {
        Prepared p = prepare(data, setup, FitProgress.NONE);
        return FitIdentifiability.of(p.problem(), p.options().analyticJacobian());
    }

    private static Prepared prepare(Dataset data, LadderFitSetup setup, FitProgress progress) {
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
        if (setup.sharedAmplitude() && setup.free().contains(LadderParameter.MULTIPLICATION_YIELD)) {
            specs = withAmplitudeFromData(data, model, specs);
        }
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
        return new Prepared(kind, x, scaleKey, specs, model, problem, options);
    }

    /**
     * Statistical and calibration errors combined. The excitation enters only as ⟨N⟩ = s·(c·x) with c the calibration
     * factor (prior 1 ± {@code relative}), so c and s are exactly degenerate. Treating c as a nuisance parameter with a
     * Gaussian prior: with s free the data fix only s·c, every other parameter is unchanged and s's variance gains
     * (relative·s)²; with s held, c is the only way the excitation can move, and each parameter θ gains
     * (relative·∂θ̂/∂ln c)², the derivative taken by refitting with the held scale moved by ±relative (the delta method
     * with a central difference).
     */
    private static Map<String, Double> calibrated(FitResult r, FitProblem problem, FitOptions options, List<ParameterSpec> specs,
                                                  String scaleKey, double relative) {
        if (!(relative > 0) || r.status() != FitResult.Status.CONVERGED) {
            return Map.of();
        }
        Map<String, Double> total = new LinkedHashMap<>();
        ParameterEstimate scale = r.estimate(scaleKey);
        if (!scale.fixed()) {
            for (ParameterEstimate e : r.estimates()) {
                if (e.shared() && !e.fixed()) {
                    double add = e.key().equals(scaleKey) ? relative * e.value() : 0;
                    total.put(e.key(), Math.hypot(e.stdError(), add));
                }
            }
            return total;
        }
        FitResult[] moved = new FitResult[2];
        for (int side = 0; side < 2; side++) {
            double factor = side == 0 ? 1 + relative : 1 - relative;
            FitProblem p = problem;
            for (ParameterSpec spec : specs) {
                ParameterEstimate e = r.estimate(spec.key());
                p = p.with(spec.key().equals(scaleKey) ? spec.fixedAt(e.value() * factor)
                        : spec.fixed() ? spec : spec.startingAt(e.value()));
            }
            moved[side] = GlobalFitter.fit(p, options.withStarts(List.of()).withProfile(List.of()));
            if (!moved[side].ok()) {
                return Map.of();
            }
        }
        for (ParameterEstimate e : r.estimates()) {
            if (e.shared() && !e.fixed()) {
                double slope = (moved[0].estimate(e.key()).value() - moved[1].estimate(e.key()).value()) / 2;
                total.put(e.key(), Math.hypot(e.stdError(), slope));
            }
        }
        return total;
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
        if (setup.free().contains(LadderParameter.MULTIPLICATION_YIELD)) {
            // bounded to [0, 1] as the compound-Poisson law is; started well inside so the logistic scale is not flat
            specs.add(ParameterSpec.shared("multiplicationYield", "", YIELD_START, 0, 1));
        }
        if (setup.timeZeroStartS() != 0 || setup.free().contains(LadderParameter.TIME_ZERO)) {
            specs.add(spec(setup, LadderParameter.TIME_ZERO, ParameterSpec.unbounded("timeZero", "S", setup.timeZeroStartS(), 1e-12)));
        }
        if (!Double.isNaN(setup.irfFwhmS())) {
            specs.add(spec(setup, LadderParameter.IRF, ParameterSpec.positive("irfFwhm", "S", setup.irfFwhmS())));
        }
        return specs;
    }

    /**
     * The shared amplitude started at its least-squares value for the other starts: a start a decade off lets η run
     * into its upper bound, where the logistic scale goes flat and the optimiser stays.
     */
    static List<ParameterSpec> withAmplitudeFromData(Dataset data, TraceModel model, List<ParameterSpec> specs) {
        List<String> keys = new ArrayList<>();
        double[] values = new double[specs.size()];
        for (int s = 0; s < specs.size(); s++) {
            keys.add(specs.get(s).key());
            values[s] = specs.get(s).key().equals(LadderBleachModel.AMPLITUDE) ? 1 : specs.get(s).start();
        }
        ParameterValues at = ParameterValues.shared(keys, values);
        double fy = 0;
        double ff = 0;
        for (int i = 0; i < data.size(); i++) {
            Trace t = data.traces().get(i);
            double[] f = model.predict(i, t.delaysS(), at);
            for (int m = 0; m < f.length; m++) {
                fy += f[m] * t.signal()[m];
                ff += f[m] * f[m];
            }
        }
        double a = fy / ff;
        if (!(a > 0) || !Double.isFinite(a)) {
            return specs;
        }
        List<ParameterSpec> out = new ArrayList<>();
        for (ParameterSpec spec : specs) {
            out.add(spec.key().equals(LadderBleachModel.AMPLITUDE) && !spec.fixed() ? spec.startingAt(a) : spec);
        }
        return out;
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
