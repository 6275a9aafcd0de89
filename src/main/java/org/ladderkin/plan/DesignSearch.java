// Over 400 lines: the design's model (fit-default traces on the printed delays), its error budget and the search over candidate series and grids belong together
package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.IntStream;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.ladderkin.excite.RelativeBudget;
import org.hipparchus.special.Erf;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.IrfConvolution;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.observe.TimeWindows;

/**
 * Optimal design of a transient-absorption fluence series, scored with the model a fit will use and on the delays the
 * user will record. Each trace is ΔAᵢ(t) = aᵢ·f(t; ⟨N⟩ᵢ, τ₂, τ_rad, t₀, IRF) + bᵢ with a free amplitude and baseline
 * per trace ({@link LadderBleachModel}, the fit's default), ⟨N⟩ᵢ = σ·s·xᵢ·(1 + εᵢ). The expected errors come from the
 * Fisher information of those traces with Gaussian priors on the nuisances:
 * <ul>
 * <li>white noise per delay point that falls as 1/√(averaging time), the beam time shared evenly among the points;</li>
 * <li>pump-energy fluctuation per delay point, a multiplicative error of ⟨N⟩ that averaging does not remove;</li>
 * <li>slow drift: each trace's ⟨N⟩ off by εᵢ, the drift over half a trace's recording (power read before each trace);</li>
 * <li>the fluence scale s (pulse energy, pump and probe radii) with the calibration's budget as prior. σ and s enter
 * only as the product σ·s, so σ's error can never fall below the calibration's share; when σ is not a goal its own
 * stated uncertainty is a prior too;</li>
 * <li>time zero (free when the grid has points before zero) and the Gaussian IRF width, each with a prior.</li>
 * </ul>
 * Candidate designs (how many fluences, the lowest and highest ⟨N⟩, and a few delay grids) are scored by the sum of the
 * squared total relative errors of the goal parameters. Sensitivities are central differences of the fit's model.
 */
public final class DesignSearch {

    /** Goal parameters of the TA model, with the key {@code plan-resolved.json} gives them. */
    public enum Parameter {
        CROSS_SECTION("cross-section σ", "σ", "crossSection"),
        TAU_BIEXCITON("biexciton lifetime τ₂", "τ₂", "tauAuger2"),
        TAU_SINGLE("radiative lifetime τ_rad", "τ_rad", "tauRad");

        private final String label;
        private final String symbol;
        private final String key;

        Parameter(String label, String symbol, String key) {
            this.label = label;
            this.symbol = symbol;
            this.key = key;
        }

        public String label() {
            return label;
        }

        public String symbol() {
            return symbol;
        }

        public String key() {
            return key;
        }
    }

    /** Source names, as the budget lists them (the calibration's items keep their own names). */
    public static final String WHITE_NOISE = "white noise";
    public static final String PUMP_FLUCTUATION = "pump fluctuation";
    public static final String DRIFT = "drift between traces";
    public static final String CROSS_SECTION_LAW = "cross-section law";
    public static final String TIME_ZERO = "time zero";
    public static final String IRF_WIDTH = "IRF width";

    /**
     * What besides white noise spoils the data, as relative standard uncertainties (0 leaves a term out).
     *
     * @param pumpFluctuationRel rms pump-energy fluctuation of one averaged delay point
     * @param driftRelPerHour    pump-energy drift per hour of recording
     * @param fluenceScale       the fluence scale's budget (pulse energy, pump and probe radius; σ not included)
     * @param fluenceScaleStated the stated uncertainties behind each of its items, same names (for the advice)
     * @param crossSectionRel    σ's own stated uncertainty: a prior when σ is not a goal
     * @param timeZeroPriorS     prior width of time zero (s)
     * @param irfFwhmS           Gaussian IRF FWHM (s), ignored with a measured response
     * @param irfWidthRel        prior width of the IRF FWHM (relative)
     * @param measuredIrf        the measured response, or null
     */
    public record Errors(double pumpFluctuationRel, double driftRelPerHour, RelativeBudget fluenceScale,
                         RelativeBudget fluenceScaleStated, double crossSectionRel, double timeZeroPriorS, double irfFwhmS, double irfWidthRel,
                         MeasuredIrf measuredIrf) {
        public Errors {
            for (double v : new double[] {pumpFluctuationRel, driftRelPerHour, crossSectionRel, timeZeroPriorS, irfWidthRel}) {
                if (!(v >= 0) || !Double.isFinite(v)) {
                    throw new IllegalArgumentException("error terms must be finite and >= 0, was " + v);
                }
            }
            java.util.Objects.requireNonNull(fluenceScale, "fluenceScale");
            java.util.Objects.requireNonNull(fluenceScaleStated, "fluenceScaleStated");
        }

        /** This set with one source scaled by {@code f}. */
        Errors scaled(String source, double f) {
            List<RelativeBudget.Item> items = new ArrayList<>();
            for (RelativeBudget.Item i : fluenceScale.items()) {
                items.add(i.source().equals(source) ? new RelativeBudget.Item(i.source(), i.rel() * f) : i);
            }
            return new Errors(source.equals(PUMP_FLUCTUATION) ? pumpFluctuationRel * f : pumpFluctuationRel,
                    source.equals(DRIFT) ? driftRelPerHour * f : driftRelPerHour, new RelativeBudget(items), fluenceScaleStated,
                    source.equals(CROSS_SECTION_LAW) ? crossSectionRel * f : crossSectionRel,
                    source.equals(TIME_ZERO) ? timeZeroPriorS * f : timeZeroPriorS, irfFwhmS,
                    source.equals(IRF_WIDTH) ? irfWidthRel * f : irfWidthRel, measuredIrf);
        }
    }

    /**
     * One design with its expected total relative errors (NaN where a parameter cannot be determined).
     *
     * @param nValues          probe-averaged ⟨N⟩ of the series
     * @param pointsPerDecade  delay points per decade of the grid's logarithmic part
     * @param delaysS          the delay grid to record, the same for every fluence
     * @param timePerPointS    averaging time per delay point (s)
     * @param relativeErrors   total relative standard error per {@link Parameter} ordinal (NaN: not fitted)
     * @param objective        Σ over goal parameters of the squared total relative errors
     * @param expected         the goal parameters' budgets (empty for designs that were only scored)
     * @param grid             which candidate grid it uses
     */
    public record Design(double[] nValues, int pointsPerDecade, double[] delaysS, double timePerPointS,
                         double[] relativeErrors, double objective, List<ExpectedError> expected, String grid) {
        public Design {
            nValues = nValues.clone();
            delaysS = delaysS.clone();
            relativeErrors = relativeErrors.clone();
            expected = List.copyOf(expected);
        }

        @Override
        public double[] nValues() {
            return nValues.clone();
        }

        @Override
        public double[] delaysS() {
            return delaysS.clone();
        }

        public double error(Parameter p) {
            return relativeErrors[p.ordinal()];
        }

        /** The budget of goal parameter {@code p}, if it is a goal. */
        public java.util.Optional<ExpectedError> expected(Parameter p) {
            return expected.stream().filter(e -> e.parameter() == p).findFirst();
        }
    }

    /**
     * @param best      the design with the smallest objective
     * @param naive     the log-spaced reference (8 values from 0.05 to 3 on the default grid)
     * @param goals     parameters the objective counts
     * @param evaluated candidate designs scored
     * @param context   what the search was given
     */
    public record Result(Design best, Design naive, Set<Parameter> goals, int evaluated, Context context) {
    }

    /**
     * What the search needs.
     *
     * @param model                the ladder model
     * @param degeneracy           band-edge degeneracy
     * @param periodS              pulse period at the chosen repetition rate (s)
     * @param bandEdgeAbsorbanceOd A₀ at the probe (OD)
     * @param noiseOdPerSqrtS      rms ΔA of one delay point averaged for 1 s (OD)
     * @param budgetS              measurement time for the whole series (s)
     * @param firstDelayS          shortest useful positive delay (s)
     * @param lastDelayS           longest delay (s)
     * @param maxN                 highest probe-averaged ⟨N⟩ the laser reaches within the limits
     * @param goals                parameters that matter
     * @param errors               the other error terms
     */
    public record Context(ModelAssumptions model, int degeneracy, double periodS, double bandEdgeAbsorbanceOd,
                          double noiseOdPerSqrtS, double budgetS, double firstDelayS, double lastDelayS, double maxN,
                          Set<Parameter> goals, Errors errors) {
    }

    /** A candidate delay grid: points per decade of its log part, and whether τ₂'s decay gets twice as many. */
    private record GridSpec(String name, int pointsPerDecade, boolean denseDecay) {
    }

    private static final GridSpec DEFAULT_GRID = new GridSpec("10 per decade", 10, false);
    private static final GridSpec[] GRIDS = {new GridSpec("6 per decade", 6, false), DEFAULT_GRID,
        new GridSpec("15 per decade", 15, false), new GridSpec("6 per decade, dense over τ₂", 6, true),
        new GridSpec("10 per decade, dense over τ₂", 10, true)};
    // at least 6 fluences and a lowest ⟨N⟩ ≤ 0.1: the low-fluence traces are also the photocharging check (common practice)
    private static final int[] COUNTS = {6, 8, 10, 12};
    private static final double[] LOWS = {0.02, 0.05, 0.1};
    private static final double[] HIGHS = {1, 2, 3, 5, 8};
    private static final double H = 1e-3;
    /** ⟨N⟩ values the traces are computed at; every series is drawn from them, so it is scored at its own values. */
    private static final int CANDIDATES = 49;
    private static final double[] GL_NODES = org.ladderkin.observe.GaussLegendre.nodes24();
    private static final double[] GL_WEIGHTS = org.ladderkin.observe.GaussLegendre.weights24();
    private static final String SCALE = "occupancyScale";
    private static final String TAU2 = LadderBleachModel.kineticKey(AugerProcess.BIEXCITON_LIFETIME);
    private static final String TAU_RAD = LadderBleachModel.kineticKey(RadiativeProcess.LIFETIME);

    private final Context ctx;
    private final double[] candidateN;
    private final double[] union;
    private final int[][] gridIndex;
    /** y[i][m]: ΔA (OD) at candidate ⟨N⟩ i and union delay m; d*[i][m]: its derivatives. */
    private double[][] y;
    private double[][] dLogN;
    private double[][] dTau2;
    private double[][] dTauRad;
    private double[][] dTimeZero;
    private double[][] dLogIrf;

    private DesignSearch(Context ctx) {
        this.ctx = ctx;
        double top = Math.min(10, ctx.maxN());
        candidateN = TimeWindows.logSpaced(0.01, Math.max(top, 0.02), CANDIDATES);
        TreeSet<Double> all = new TreeSet<>();
        double[][] grids = new double[GRIDS.length][];
        for (int g = 0; g < GRIDS.length; g++) {
            grids[g] = grid(GRIDS[g]);
            for (double t : grids[g]) {
                all.add(t);
            }
        }
        union = all.stream().mapToDouble(Double::doubleValue).toArray();
        gridIndex = new int[GRIDS.length][];
        for (int g = 0; g < GRIDS.length; g++) {
            gridIndex[g] = Arrays.stream(grids[g]).mapToInt(t -> Arrays.binarySearch(union, t)).toArray();
        }
        sensitivities();
    }

    /** Runs the search. */
    public static Result search(Context ctx) {
        DesignSearch s = new DesignSearch(ctx);
        double[] naiveN = s.series(0.05, Math.min(3, Math.max(0.06, ctx.maxN())), 8);
        int defaultGrid = Arrays.asList(GRIDS).indexOf(DEFAULT_GRID);
        double bestObjective = s.objective(naiveN, defaultGrid, ctx.errors());
        double[] bestN = naiveN;
        int bestGrid = defaultGrid;
        int evaluated = 1;
        for (int k : COUNTS) {
            for (double lo : LOWS) {
                for (double hi : HIGHS) {
                    if (hi > ctx.maxN() * 1.0001 || hi <= lo * 4) {
                        continue;
                    }
                    if (Thread.currentThread().isInterrupted()) {
                        // a desktop planner whose plan changed (or whose window closed) no longer wants this design
                        throw new java.util.concurrent.CancellationException("design search interrupted");
                    }
                    double[] n = s.series(lo, hi, k);
                    for (int g = 0; g < GRIDS.length; g++) {
                        double o = s.objective(n, g, ctx.errors());
                        evaluated++;
                        if (o < bestObjective) {
                            bestObjective = o;
                            bestN = n;
                            bestGrid = g;
                        }
                    }
                }
            }
        }
        return new Result(s.detailed(bestN, bestGrid), s.detailed(naiveN, defaultGrid), ctx.goals(), evaluated, ctx);
    }

    /**
     * Scores one series on one of the candidate grids (by its name): a reduced design for checks, or a user's own.
     * The values are moved to the nearest computed ⟨N⟩ (within 10 % of each other); the result holds those.
     */
    public static Design score(Context ctx, double[] nValues, String gridName) {
        DesignSearch s = new DesignSearch(ctx);
        for (int g = 0; g < GRIDS.length; g++) {
            if (GRIDS[g].name().equals(gridName)) {
                return s.detailed(Arrays.stream(nValues).map(n -> s.candidateN[s.nearest(n)]).toArray(), g);
            }
        }
        throw new IllegalArgumentException("no candidate grid '" + gridName + "'");
    }

    /** k values from the computed ⟨N⟩ nearest to an even log spacing from lo to hi. */
    private double[] series(double lo, double hi, int k) {
        int a = nearest(lo);
        int b = nearest(hi);
        return IntStream.range(0, k).map(j -> (int) Math.round(a + (double) j * (b - a) / (k - 1))).distinct()
                .mapToDouble(i -> candidateN[i]).toArray();
    }

    /**
     * A candidate grid: a pre-pulse baseline (four points from −5 to −1 ps, or 5 IRF widths if longer), the rise at
     * half-IRF steps, then log-spaced points to the last delay, optionally twice as dense from τ₂/3 to 4·τ₂.
     */
    private double[] grid(GridSpec spec) {
        double irf = ctx.errors().measuredIrf() != null ? ctx.errors().measuredIrf().fwhmS() : ctx.errors().irfFwhmS();
        irf = irf > 0 ? irf : 0.1e-12;
        TreeSet<Double> t = new TreeSet<>();
        double pre = Math.max(1e-12, 5 * irf);
        for (double f : new double[] {-5, -3, -2, -1}) {
            t.add(round(f * pre));
        }
        for (double x = -irf; x <= 2 * irf * (1 + 1e-9); x += irf / 2) {
            t.add(round(x));
        }
        double start = Math.max(ctx.firstDelayS(), 2.5 * irf);
        int n = (int) Math.round(Math.log10(ctx.lastDelayS() / start) * spec.pointsPerDecade()) + 1;
        for (double x : TimeWindows.logSpaced(start, ctx.lastDelayS(), Math.max(n, 2))) {
            t.add(round(x));
        }
        if (spec.denseDecay()) {
            double tau2 = ctx.model().tauBiexcitonS();
            double lo = Math.max(start, tau2 / 3);
            double hi = Math.min(ctx.lastDelayS(), 4 * tau2);
            if (hi > lo) {
                int m = (int) Math.round(Math.log10(hi / lo) * 2 * spec.pointsPerDecade()) + 1;
                for (double x : TimeWindows.logSpaced(lo, hi, Math.max(m, 2))) {
                    t.add(round(x));
                }
            }
        }
        return t.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Delays rounded to 1 fs, so grids print as the stage is set. */
    private static double round(double t) {
        return Math.round(t * 1e15) / 1e15;
    }

    private void sensitivities() {
        LadderModel base = PlanFitBasis.parameters(ctx.model(), ctx.degeneracy());
        double tau2 = base.seconds(AugerProcess.BIEXCITON_LIFETIME);
        double tauRad = base.seconds(RadiativeProcess.LIFETIME);
        boolean gaussian = ctx.errors().measuredIrf() == null && ctx.errors().irfFwhmS() > 0;
        double irf = gaussian ? ctx.errors().irfFwhmS() : 0;
        double dt = Math.max(irf, 50e-15) / 20;
        List<String> keys = new ArrayList<>(List.of(SCALE, TAU2, TAU_RAD, LadderBleachModel.TIME_ZERO));
        if (gaussian) {
            keys.add(LadderBleachModel.IRF_FWHM);
        }
        double e = Math.exp(H);
        double[][] sets = {
            {1, tau2, tauRad, 0, irf},
            {e, tau2, tauRad, 0, irf}, {1 / e, tau2, tauRad, 0, irf},
            {1, tau2 * e, tauRad, 0, irf}, {1, tau2 / e, tauRad, 0, irf},
            {1, tau2, tauRad * e, 0, irf}, {1, tau2, tauRad / e, 0, irf},
            {1, tau2, tauRad, dt, irf}, {1, tau2, tauRad, -dt, irf},
            {1, tau2, tauRad, 0, irf * e}, {1, tau2, tauRad, 0, irf / e}};
        int used = gaussian ? sets.length : sets.length - 2;
        double[][][] out = new double[sets.length][][];
        double a = ctx.bandEdgeAbsorbanceOd();
        IntStream.range(0, used).parallel().forEach(k -> {
            double[] v = sets[k];
            out[k] = ctx.errors().measuredIrf() != null ? fitModelTraces(base, keys, v)
                    : traces(base.withSeconds(AugerProcess.BIEXCITON_LIFETIME, v[1]).withSeconds(RadiativeProcess.LIFETIME, v[2]),
                    v[0], v[3], v[4]);
            for (double[] row : out[k]) {
                for (int m = 0; m < row.length; m++) {
                    row[m] *= a;
                }
            }
        });
        y = out[0];
        dLogN = diff(out[1], out[2], 2 * H);
        dTau2 = diff(out[3], out[4], 2 * H);
        dTauRad = diff(out[5], out[6], 2 * H);
        dTimeZero = diff(out[7], out[8], 2 * dt);
        dLogIrf = gaussian ? diff(out[9], out[10], 2 * H) : null;
    }

    /** Through the fit's own model, trace by trace: used for a measured response. */
    private double[][] fitModelTraces(LadderModel base, List<String> keys, double[] values) {
        LadderBleachModel model = LadderBleachModel.forModel(base, SCALE, candidateN, ctx.periodS(), ctx.errors().measuredIrf());
        ParameterValues p = ParameterValues.shared(keys.subList(0, 4), Arrays.copyOf(values, 4));
        double[][] out = new double[candidateN.length][];
        for (int i = 0; i < candidateN.length; i++) {
            out[i] = model.predict(i, union, p);
        }
        return out;
    }

    /**
     * The same traces as {@link LadderBleachModel#predict} (steady state, band-edge bleach, Gaussian IRF convolution
     * with the step part in closed form and the decay part by 24-point Gauss–Legendre over ±8σ), with one factorised
     * propagation grid shared by every candidate ⟨N⟩ instead of one per trace. The fit convolves out to 50σ; here the
     * quadrature stops at 8σ after time zero, where a Gaussian of σ changes a decay of time constant τ by σ²/2τ²
     * (below 10⁻³ for the ps decays the design weighs), and each quadrature node is one more matrix exponential.
     */
    private double[][] traces(LadderModel m, double scale, double t0, double fwhm) {
        double top = candidateN[candidateN.length - 1] * scale;
        LadderKinetics kin = LadderKinetics.forPulses(m.toModel(), new PulseExcitation.Poisson(top * 1.5));
        double sigma = fwhm > 0 ? IrfConvolution.sigmaOfFwhm(fwhm) : 0;
        int n = union.length;
        double[] tau = new double[n];
        boolean[] quad = new boolean[n];
        TreeSet<Double> times = new TreeSet<>();
        for (int j = 0; j < n; j++) {
            tau[j] = union[j] - t0;
            quad[j] = sigma > 0 && tau[j] < 8 * sigma && tau[j] + 8 * sigma > 0;
            if (quad[j]) {
                double lo = Math.max(0, tau[j] - 8 * sigma);
                double hi = tau[j] + 8 * sigma;
                for (double x : GL_NODES) {
                    times.add(lo + (hi - lo) * (x + 1) / 2);
                }
            } else if (tau[j] >= 0) {
                times.add(tau[j]);
            }
        }
        double[] uniq = times.stream().mapToDouble(Double::doubleValue).toArray();
        var grid = kin.propagator().onGrid(uniq);
        double[][] bleachRow = {kin.bleachObservable()};
        double[][] out = new double[candidateN.length][n];
        for (int i = 0; i < candidateN.length; i++) {
            SteadyState ss = kin.steadyState(new PulseExcitation.Poisson(candidateN[i] * scale), ctx.periodS(), false);
            double bBefore = 0;
            double[] before = ss.beforePulse().probabilities();
            for (int q = 0; q < before.length; q++) {
                bBefore += bleachRow[0][q] * before[q];
            }
            double[] bu = grid.observe(bleachRow, ss.afterPulse().probabilities())[0];
            for (int j = 0; j < n; j++) {
                double v;
                if (quad[j]) {
                    double lo = Math.max(0, tau[j] - 8 * sigma);
                    double hi = tau[j] + 8 * sigma;
                    double sum = 0;
                    for (int q = 0; q < GL_NODES.length; q++) {
                        double u = lo + (hi - lo) * (GL_NODES[q] + 1) / 2;
                        double z = (tau[j] - u) / sigma;
                        sum += GL_WEIGHTS[q] * Math.exp(-0.5 * z * z) * bu[Arrays.binarySearch(uniq, u)];
                    }
                    v = bBefore * 0.5 * Erf.erfc(tau[j] / (Math.sqrt(2) * sigma)) + sum * (hi - lo) / 2 / (sigma * Math.sqrt(2 * Math.PI));
                } else if (tau[j] >= 0) {
                    v = bu[Arrays.binarySearch(uniq, tau[j])];
                } else {
                    v = bBefore;
                }
                out[i][j] = -v;
            }
        }
        return out;
    }

    private static double[][] diff(double[][] up, double[][] down, double step) {
        double[][] d = new double[up.length][];
        for (int i = 0; i < up.length; i++) {
            d[i] = new double[up[i].length];
            for (int m = 0; m < up[i].length; m++) {
                d[i][m] = (up[i][m] - down[i][m]) / step;
            }
        }
        return d;
    }

    /** The Fisher system of one design: its columns, priors and the noise split. */
    private final class Fisher {
        final List<String> names = new ArrayList<>();
        final List<Double> priors = new ArrayList<>();
        final int[] trace;
        final double[] timePerPoint = new double[1];
        /** Σ JᵀJ/σ²_white: what the fit's unweighted least squares inverts, and the white noise's own share. */
        double[][] info;
        /** Σ JᵀJ·(pump·∂ΔA/∂ln N)²/σ⁴_white: the pump fluctuation seen through the fit's weights. */
        double[][] infoPump;

        Fisher(double[] nValues, int g, Errors err, double noiseFactor) {
            trace = Arrays.stream(nValues).mapToInt(DesignSearch.this::nearest).toArray();
            int[] idx = gridIndex[g];
            int k = trace.length;
            boolean sigmaGoal = ctx.goals().contains(Parameter.CROSS_SECTION);
            add("σ", sigmaGoal ? Double.POSITIVE_INFINITY : err.crossSectionRel());
            add("s", err.fluenceScale().totalRel());
            add("τ₂", Double.POSITIVE_INFINITY);
            add("τ_rad", ctx.goals().contains(Parameter.TAU_SINGLE) ? Double.POSITIVE_INFINITY : 0);
            add("t₀", union[idx[0]] < 0 ? err.timeZeroPriorS() : 0);
            add("irf", dLogIrf == null ? 0 : err.irfWidthRel());
            timePerPoint[0] = ctx.budgetS() / (k * idx.length);
            double driftPrior = err.driftRelPerHour() * timePerPoint[0] * idx.length / 3600 / 2;
            for (int i = 0; i < k; i++) {
                add("a" + i, Double.POSITIVE_INFINITY);
                add("b" + i, Double.POSITIVE_INFINITY);
                add("ε" + i, driftPrior);
            }
            int np = names.size();
            info = new double[np][np];
            infoPump = new double[np][np];
            double white = Math.pow(ctx.noiseOdPerSqrtS() * noiseFactor, 2) / timePerPoint[0];
            double[] row = new double[np];
            for (int i = 0; i < k; i++) {
                int c = trace[i];
                for (int m : idx) {
                    Arrays.fill(row, 0);
                    row[0] = dLogN[c][m];
                    row[1] = dLogN[c][m];
                    row[2] = dTau2[c][m];
                    row[3] = dTauRad[c][m];
                    row[4] = dTimeZero[c][m];
                    row[5] = dLogIrf == null ? 0 : dLogIrf[c][m];
                    row[6 + 3 * i] = y[c][m];
                    row[7 + 3 * i] = 1;
                    row[8 + 3 * i] = dLogN[c][m];
                    double pump = err.pumpFluctuationRel() * dLogN[c][m];
                    // the fit weighs every point alike (white noise only); pump fluctuation is noise it does not weigh
                    accumulate(info, row, 1 / white);
                    accumulate(infoPump, row, pump * pump / (white * white));
                }
            }
        }

        private void add(String name, double prior) {
            names.add(name);
            priors.add(prior);
        }

        private void accumulate(double[][] f, double[] row, double w) {
            for (int a = 0; a < row.length; a++) {
                if (row[a] == 0) {
                    continue;
                }
                double ra = row[a] * w;
                for (int b = 0; b < row.length; b++) {
                    f[a][b] += ra * row[b];
                }
            }
        }

        /**
         * The variance of column k's estimate: the sandwich A·(F_white + F_pump + P)·A with A = (F_white + P)⁻¹, since
         * the fit weighs by white noise alone and the priors stand for what is known beside the data.
         */
        double variance(double[][] a, int k) {
            double v = quadratic(a, info, k) + quadratic(a, infoPump, k);
            for (int j = 0; j < names.size(); j++) {
                double prior = priors.get(j);
                if (prior > 0 && Double.isFinite(prior)) {
                    v += a[k][j] * a[k][j] / (prior * prior);
                }
            }
            return v;
        }

        /** (F + P)⁻¹ over the columns that are not held (prior 0), or null when singular. */
        double[][] covariance() {
            int np = names.size();
            List<Integer> kept = new ArrayList<>();
            for (int a = 0; a < np; a++) {
                if (priors.get(a) > 0) {
                    kept.add(a);
                }
            }
            RealMatrix m = MatrixUtils.createRealMatrix(kept.size(), kept.size());
            for (int a = 0; a < kept.size(); a++) {
                for (int b = 0; b < kept.size(); b++) {
                    double v = info[kept.get(a)][kept.get(b)];
                    if (a == b && Double.isFinite(priors.get(kept.get(a)))) {
                        v += 1 / (priors.get(kept.get(a)) * priors.get(kept.get(a)));
                    }
                    m.setEntry(a, b, v);
                }
            }
            // rescale to unit diagonal: amplitudes, baselines and time zero differ by many orders of magnitude
            double[] d = new double[kept.size()];
            for (int a = 0; a < d.length; a++) {
                d[a] = m.getEntry(a, a) > 0 ? 1 / Math.sqrt(m.getEntry(a, a)) : 1;
            }
            for (int a = 0; a < d.length; a++) {
                for (int b = 0; b < d.length; b++) {
                    m.multiplyEntry(a, b, d[a] * d[b]);
                }
            }
            LUDecomposition lu = new LUDecomposition(m, 1e-13);
            if (!lu.getSolver().isNonSingular()) {
                return null;
            }
            RealMatrix inv = lu.getSolver().getInverse();
            double[][] c = new double[np][np];
            for (int a = 0; a < d.length; a++) {
                for (int b = 0; b < d.length; b++) {
                    c[kept.get(a)][kept.get(b)] = inv.getEntry(a, b) * d[a] * d[b];
                }
            }
            return c;
        }
    }

    private static int column(Parameter p) {
        return switch (p) {
            case CROSS_SECTION -> 0;
            case TAU_BIEXCITON -> 2;
            case TAU_SINGLE -> 3;
        };
    }

    private double objective(double[] nValues, int g, Errors err) {
        Fisher f = new Fisher(nValues, g, err, 1);
        double[][] c = f.covariance();
        if (c == null) {
            return Double.POSITIVE_INFINITY;
        }
        double o = 0;
        for (Parameter p : ctx.goals()) {
            double v = f.variance(c, column(p));
            o += v > 0 ? v : Double.POSITIVE_INFINITY;
        }
        return o;
    }

    private Design detailed(double[] nValues, int g) {
        Fisher f = new Fisher(nValues, g, ctx.errors(), 1);
        double[][] c = f.covariance();
        double[] errors = new double[Parameter.values().length];
        Arrays.fill(errors, Double.NaN);
        List<ExpectedError> expected = new ArrayList<>();
        double objective = 0;
        double[] grid = Arrays.stream(gridIndex[g]).mapToDouble(m -> union[m]).toArray();
        if (c == null) {
            return new Design(nValues, GRIDS[g].pointsPerDecade(), grid, f.timePerPoint[0], errors, Double.POSITIVE_INFINITY,
                    List.of(), GRIDS[g].name());
        }
        for (Parameter p : Parameter.values()) {
            int col = column(p);
            double variance = f.variance(c, col);
            if (!(c[col][col] > 0) || !(variance > 0)) {
                continue;
            }
            errors[p.ordinal()] = Math.sqrt(variance);
            if (!ctx.goals().contains(p)) {
                continue;
            }
            objective += variance;
            double white = quadratic(c, f.info, col);
            double pump = quadratic(c, f.infoPump, col);
            RelativeBudget sources = RelativeBudget.NONE.plus(WHITE_NOISE, Math.sqrt(Math.max(white, 0)))
                    .plus(PUMP_FLUCTUATION, Math.sqrt(Math.max(pump, 0)));
            double drift = 0;
            double sys = 0;
            for (int a = 0; a < f.names.size(); a++) {
                double prior = f.priors.get(a);
                if (!(prior > 0) || !Double.isFinite(prior)) {
                    continue;
                }
                double share = c[col][a] * c[col][a] / (prior * prior);
                sys += share;
                String name = f.names.get(a);
                if (name.startsWith("ε")) {
                    drift += share;
                } else if (name.equals("s")) {
                    double total = ctx.errors().fluenceScale().totalRel();
                    for (RelativeBudget.Item i : ctx.errors().fluenceScale().items()) {
                        sources = sources.plus(i.source(), Math.sqrt(share) * i.rel() / total);
                    }
                } else {
                    sources = sources.plus(switch (name) {
                        case "σ" -> CROSS_SECTION_LAW;
                        case "t₀" -> TIME_ZERO;
                        default -> IRF_WIDTH;
                    }, Math.sqrt(share));
                }
            }
            if (drift > 0) {
                sources = sources.plus(DRIFT, Math.sqrt(drift));
            }
            double total = Math.sqrt(variance);
            double stat = Math.sqrt(Math.max(white + pump, 0));
            expected.add(new ExpectedError(p, stat, Math.sqrt(Math.max(sys, 0)), total, sources,
                    advice(p, sources, total, nValues, g)));
        }
        return new Design(nValues, GRIDS[g].pointsPerDecade(), grid, f.timePerPoint[0], errors, objective, expected,
                GRIDS[g].name());
    }

    /** (C·F·C)ₖₖ. */
    private static double quadratic(double[][] c, double[][] f, int k) {
        double s = 0;
        for (int a = 0; a < c.length; a++) {
            if (c[k][a] == 0) {
                continue;
            }
            for (int b = 0; b < c.length; b++) {
                s += c[k][a] * f[a][b] * c[k][b];
            }
        }
        return s;
    }

    private double totalWith(Parameter p, double[] nValues, int g, Errors err, double noiseFactor) {
        double[][] c = new Fisher(nValues, g, err, noiseFactor).covariance();
        return c == null ? Double.POSITIVE_INFINITY : Math.sqrt(new Fisher(nValues, g, err, noiseFactor).variance(c, column(p)));
    }

    /**
     * One sentence on the dominant source: how far it has to improve for the total to halve, found by bisection on the
     * whole design (the priors and the weights change with it), or what is left when removing it is not enough.
     */
    private String advice(Parameter p, RelativeBudget sources, double total, double[] nValues, int g) {
        String source = sources.dominant().map(RelativeBudget.Item::source).orElse(WHITE_NOISE);
        Errors err = ctx.errors();
        double target = total / 2;
        boolean white = source.equals(WHITE_NOISE);
        double floor = white ? totalWith(p, nValues, g, err, 1 / 30.0) : totalWith(p, nValues, g, err.scaled(source, 0), 1);
        if (floor > target) {
            String next = sources.items().stream().filter(i -> !i.source().equals(source))
                    .max(java.util.Comparator.comparingDouble(RelativeBudget.Item::rel)).map(RelativeBudget.Item::source).orElse("none");
            return String.format(Locale.ROOT, "%s dominates %s, but even %s leaves ± %.2g %% (next largest: %s)",
                    the(source), p.symbol(), white ? "30× lower noise" : "removing it", 100 * floor, next);
        }
        double lo = white ? 1 / 30.0 : 0;
        double hi = 1;
        for (int it = 0; it < 40; it++) {
            double mid = (lo + hi) / 2;
            double t = white ? totalWith(p, nValues, g, err, mid) : totalWith(p, nValues, g, err.scaled(source, mid), 1);
            if (t > target) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        double f = lo;
        String how = switch (source) {
            case WHITE_NOISE -> String.format(Locale.ROOT, "%.2g× the beam time (or a %.2g× lower noise floor)", 1 / (f * f), 1 / f);
            case PUMP_FLUCTUATION -> String.format(Locale.ROOT, "a pump steadied to %.2g %% rms per point", 100 * err.pumpFluctuationRel() * f);
            case DRIFT -> String.format(Locale.ROOT, "a drift below %.2g %% per hour (or more frequent power readings)",
                    100 * err.driftRelPerHour() * f);
            case CROSS_SECTION_LAW -> String.format(Locale.ROOT, "a measured σ to %.2g %%", 100 * err.crossSectionRel() * f);
            case TIME_ZERO -> String.format(Locale.ROOT, "time zero located to %.2g fs (a cross-correlation)", 1e15 * err.timeZeroPriorS() * f);
            case IRF_WIDTH -> String.format(Locale.ROOT, "the IRF width measured to %.2g %%", 100 * err.irfWidthRel() * f);
            default -> calibrationAdvice(source, f);
        };
        return String.format(Locale.ROOT, "%s dominates %s: %s halves it (± %.2g %% → ± %.2g %%)", the(source), p.symbol(), how,
                100 * total, 100 * target);
    }

    private String calibrationAdvice(String source, double f) {
        double stated = statedRel(source);
        String what = switch (source) {
            case "pulse energy" -> "a power-meter calibration";
            case "pump radius" -> "a knife-edge scan of the pump";
            case "probe radius" -> "a knife-edge scan of the probe";
            default -> "a measurement of the " + source;
        };
        return String.format(Locale.ROOT, "%s to %.2g %%", what, 100 * stated * f);
    }

    /** The stated relative uncertainty behind a calibration item. */
    private double statedRel(String source) {
        return ctx.errors().fluenceScaleStated().items().stream().filter(i -> i.source().equals(source)).findFirst()
                .map(RelativeBudget.Item::rel).orElse(Double.NaN);
    }

    private static String the(String s) {
        return s.isEmpty() ? s : "the " + s;
    }

    private int nearest(double n) {
        int best = 0;
        for (int i = 1; i < candidateN.length; i++) {
            if (Math.abs(Math.log(candidateN[i] / n)) < Math.abs(Math.log(candidateN[best] / n))) {
                best = i;
            }
        }
        return best;
    }

    /** The parameters a set of goals asks for. */
    public static Set<Parameter> parametersFor(Set<Goal> goals) {
        Set<Parameter> p = EnumSet.noneOf(Parameter.class);
        for (Goal g : goals) {
            switch (g) {
                case BIEXCITON_AUGER, HIGHER_AUGER -> p.add(Parameter.TAU_BIEXCITON);
                case CROSS_SECTION, GAIN_THRESHOLD -> p.add(Parameter.CROSS_SECTION);
                case SINGLE_EXCITON_LIFETIME -> p.add(Parameter.TAU_SINGLE);
                default -> { }
            }
        }
        return p;
    }
}
