package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.TimeWindows;

/**
 * Optimal design of a transient-absorption fluence series. The expected standard error of each goal parameter comes
 * from the Fisher information F = JᵀJ/σ² of the predicted band-edge ΔA traces (pulse-train steady state) under the
 * instrument's noise: white noise per delay point that falls as 1/√(averaging time), with the beam time shared evenly
 * among all points. Candidate designs (how many fluences, the lowest and highest ⟨N⟩, points per decade) are scored
 * by the sum of squared relative standard errors of the goal parameters, and compared with a naive log-spaced series.
 *
 * <p>Parameters are taken in logarithms, so standard errors are relative: the band-edge amplitude A (free, as in a
 * fit), σ (through ⟨N⟩ = σ·j), τ₂ and τ₁. Sensitivities are central differences of the engine's traces.
 */
public final class DesignSearch {

    /** Parameters of the TA model. */
    public enum Parameter {
        AMPLITUDE("band-edge amplitude"), CROSS_SECTION("cross-section σ"), TAU_BIEXCITON("biexciton lifetime τ₂"),
        TAU_SINGLE("single-exciton lifetime τ₁");

        private final String label;

        Parameter(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }

    /**
     * One design with its expected relative standard errors (NaN where a parameter cannot be determined).
     *
     * @param nValues          probe-averaged ⟨N⟩ of the series
     * @param pointsPerDecade  delay points per decade
     * @param delaysS          the delay grid
     * @param timePerPointS    averaging time per delay point (s)
     * @param relativeErrors   relative standard error per {@link Parameter} ordinal
     * @param objective        Σ over goal parameters of the squared relative errors
     */
    public record Design(double[] nValues, int pointsPerDecade, double[] delaysS, double timePerPointS,
                         double[] relativeErrors, double objective) {
        public double error(Parameter p) {
            return relativeErrors[p.ordinal()];
        }
    }

    /**
     * @param best      the design with the smallest objective
     * @param naive     the log-spaced reference (8 values from 0.05 to 3, 10 points per decade)
     * @param goals     parameters the objective counts
     * @param evaluated candidate designs scored
     */
    public record Result(Design best, Design naive, Set<Parameter> goals, int evaluated) {
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
     * @param firstDelayS          shortest useful delay (s)
     * @param lastDelayS           longest delay (s)
     * @param maxN                 highest probe-averaged ⟨N⟩ the laser reaches within the limits
     * @param goals                parameters that matter
     */
    public record Context(ModelAssumptions model, int degeneracy, double periodS, double bandEdgeAbsorbanceOd,
                          double noiseOdPerSqrtS, double budgetS, double firstDelayS, double lastDelayS, double maxN,
                          Set<Parameter> goals) {
    }

    private static final int FINEST_PER_DECADE = 10;
    private static final int[] POINTS_PER_DECADE = {5, 10};
    // at least 6 fluences and a lowest ⟨N⟩ ≤ 0.1: the low-fluence traces are also the photocharging check (common practice)
    private static final int[] COUNTS = {6, 8, 10, 12};
    private static final double[] LOWS = {0.02, 0.05, 0.1};
    private static final double[] HIGHS = {1, 2, 3, 5, 8};

    private final Context ctx;
    private final double[] candidateN;
    private final double[] delays;
    /** sens[i][m][p]: ∂ΔA/∂log θ_p at candidate fluence i and delay m (OD). */
    private final double[][][] sens;

    private DesignSearch(Context ctx) {
        this.ctx = ctx;
        double top = Math.min(10, ctx.maxN());
        int nc = 24;
        candidateN = TimeWindows.logSpaced(0.01, Math.max(top, 0.02), nc);
        delays = TimeWindows.logSpaced(ctx.firstDelayS(), ctx.lastDelayS(),
                (int) Math.round(Math.log10(ctx.lastDelayS() / ctx.firstDelayS()) * FINEST_PER_DECADE) + 1);
        sens = sensitivities();
    }

    /** Runs the search. */
    public static Result search(Context ctx) {
        DesignSearch s = new DesignSearch(ctx);
        Design naive = s.evaluate(TimeWindows.logSpaced(0.05, Math.min(3, Math.max(0.06, ctx.maxN())), 8), 10);
        Design best = naive;
        int evaluated = 1;
        for (int k : COUNTS) {
            for (double lo : LOWS) {
                for (double hi : HIGHS) {
                    if (hi > ctx.maxN() * 1.0001 || hi <= lo * 4) {
                        continue;
                    }
                    for (int ppd : POINTS_PER_DECADE) {
                        Design d = s.evaluate(TimeWindows.logSpaced(lo, hi, k), ppd);
                        evaluated++;
                        if (d.objective() < best.objective()) {
                            best = d;
                        }
                    }
                }
            }
        }
        return new Result(best, naive, ctx.goals(), evaluated);
    }

    private Design evaluate(double[] nValues, int pointsPerDecade) {
        int step = FINEST_PER_DECADE / pointsPerDecade;
        List<Integer> delayIdx = new ArrayList<>();
        for (int m = 0; m < delays.length; m += step) {
            delayIdx.add(m);
        }
        if (delayIdx.get(delayIdx.size() - 1) != delays.length - 1) {
            delayIdx.add(delays.length - 1);
        }
        double timePerPoint = ctx.budgetS() / (nValues.length * delayIdx.size());
        double sigma = ctx.noiseOdPerSqrtS() / Math.sqrt(timePerPoint);
        int np = Parameter.values().length;
        double[][] f = new double[np][np];
        for (double n : nValues) {
            int i = nearest(n);
            for (int m : delayIdx) {
                double[] s = sens[i][m];
                for (int a = 0; a < np; a++) {
                    for (int b = 0; b < np; b++) {
                        f[a][b] += s[a] * s[b] / (sigma * sigma);
                    }
                }
            }
        }
        double[] errors = new double[np];
        double objective;
        RealMatrix fm = MatrixUtils.createRealMatrix(f);
        LUDecomposition lu = new LUDecomposition(fm, 1e-300);
        if (!lu.getSolver().isNonSingular()) {
            java.util.Arrays.fill(errors, Double.NaN);
            objective = Double.POSITIVE_INFINITY;
        } else {
            RealMatrix cov = lu.getSolver().getInverse();
            objective = 0;
            for (Parameter p : Parameter.values()) {
                double v = cov.getEntry(p.ordinal(), p.ordinal());
                errors[p.ordinal()] = v > 0 ? Math.sqrt(v) : Double.NaN;
                if (ctx.goals().contains(p)) {
                    objective += v > 0 ? v : Double.POSITIVE_INFINITY;
                }
            }
        }
        double[] grid = delayIdx.stream().mapToDouble(m -> delays[m]).toArray();
        return new Design(nValues.clone(), pointsPerDecade, grid, timePerPoint, errors, objective);
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

    private double[][][] sensitivities() {
        int np = Parameter.values().length;
        double h = 1e-3;
        ModelAssumptions base = ctx.model();
        // seven independent model evaluations: base, ⟨N⟩ ± h, τ₂ ± h, τ₁ ± h (log steps), run in parallel
        ModelAssumptions[] models = {base, base, base,
            base.withTauBiexcitonS(base.tauBiexcitonS() * Math.exp(h)), base.withTauBiexcitonS(base.tauBiexcitonS() * Math.exp(-h)),
            base.withTauSingleExcitonS(base.tauSingleExcitonS() * Math.exp(h)),
            base.withTauSingleExcitonS(base.tauSingleExcitonS() * Math.exp(-h))};
        double[] nFactors = {1, 1 + h, 1 - h, 1, 1, 1, 1};
        double[][][] y = new double[models.length][][];
        IntStream.range(0, models.length).parallel().forEach(k -> y[k] = traces(models[k], nFactors[k]));
        double a = ctx.bandEdgeAbsorbanceOd();
        double[][][] s = new double[candidateN.length][delays.length][np];
        for (int i = 0; i < candidateN.length; i++) {
            for (int m = 0; m < delays.length; m++) {
                // ΔA = −A·b; d/dlogσ acts through n: n·∂b/∂n = ∂b/∂log n ≈ (b(n(1+h)) − b(n(1−h)))/(2h)
                s[i][m][Parameter.AMPLITUDE.ordinal()] = -a * y[0][i][m];
                s[i][m][Parameter.CROSS_SECTION.ordinal()] = -a * (y[1][i][m] - y[2][i][m]) / (2 * h);
                s[i][m][Parameter.TAU_BIEXCITON.ordinal()] = -a * (y[3][i][m] - y[4][i][m]) / (2 * h);
                s[i][m][Parameter.TAU_SINGLE.ordinal()] = -a * (y[5][i][m] - y[6][i][m]) / (2 * h);
            }
        }
        return s;
    }

    /**
     * Steady-state bleach traces for every candidate ⟨N⟩ (scaled by {@code nFactor}). One ladder for all of them, so
     * the generator is decomposed and the period map and delay grid are computed once.
     */
    private double[][] traces(ModelAssumptions model, double nFactor) {
        KineticModel km = model.kineticModel(ctx.degeneracy());
        PulseExcitation strongest = new PulseExcitation.Poisson(candidateN[candidateN.length - 1] * nFactor);
        LadderKinetics kin = LadderKinetics.forPulses(km, strongest);
        double[][] out = new double[candidateN.length][];
        for (int i = 0; i < candidateN.length; i++) {
            PulseExcitation pulse = new PulseExcitation.Poisson(candidateN[i] * nFactor);
            SteadyState ss = kin.steadyState(pulse, ctx.periodS(), false);
            out[i] = kin.trace(ss.afterPulse(), delays).bleach();
        }
        return out;
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
