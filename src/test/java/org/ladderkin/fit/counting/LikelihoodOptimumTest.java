package org.ladderkin.fit.counting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.SplittableRandom;
import org.hipparchus.optim.InitialGuess;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.SimpleBounds;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.nonlinear.scalar.ObjectiveFunction;
import org.hipparchus.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The likelihood optimum against a brute-force grid and a general-purpose optimiser on the same deviance. */
class LikelihoodOptimumTest {

    private static final double BIN_S = 100e-12;
    private static final double FWHM_S = 150e-12;

    /** The deviance written out here, not taken from {@link PoissonDeviance}. */
    private static double deviance(double[] n, double[] mu) {
        double d = 0;
        for (int i = 0; i < n.length; i++) {
            d += 2 * (mu[i] - n[i] + (n[i] > 0 ? n[i] * Math.log(n[i] / mu[i]) : 0));
        }
        return d;
    }

    private static CountHistogram histogram(int bins, double tauS, double background, long seed) {
        double[] mean = SimulatedHistograms.mean(bins, -0.5e-9, BIN_S, 0.03e-9, FWHM_S, new double[] {1},
                new double[] {tauS}, 1, 0, 100, background);
        return CountHistogram.of("small", -0.5e-9, BIN_S, SimulatedHistograms.poisson(mean, new SplittableRandom(seed)));
    }

    private static CountModel model(CountHistogram h) {
        return new CountModel(0, h, 4, ExponentialDecay.single(1e-9), InstrumentResponse.gaussian(), Double.NaN, null);
    }

    private static ParameterValues at(double tauS, double amplitude, double background, double shiftS) {
        return ParameterValues.shared(List.of("tau1S", InstrumentResponse.FWHM, "shiftS", "amplitude", "background"),
                new double[] {tauS, FWHM_S, shiftS, amplitude, background});
    }

    @Test
    @CheckedAgainst(source = "derived: brute-force grid over τ, zoomed ten times around its lowest point, with the "
            + "amplitude at its closed-form likelihood optimum A = Σn/Σs(τ) for a histogram without background",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void lifetimeMatchesABruteForceGrid() {
        CountHistogram h = histogram(64, 1.5e-9, 0, 7);
        CountModel model = model(h);
        double[] n = h.counts();
        double total = h.total();
        java.util.function.DoubleUnaryOperator profile = tau -> {
            double[] s = model.shape(at(tau, 1, 0, 0));
            double sum = 0;
            for (double x : s) {
                sum += x;
            }
            double a = total / sum;
            double[] mu = s.clone();
            for (int i = 0; i < mu.length; i++) {
                mu[i] *= a;
            }
            return deviance(n, mu);
        };
        double lo = 0.5e-9;
        double hi = 4e-9;
        double best = Double.NaN;
        for (int zoom = 0; zoom < 10; zoom++) {
            double step = (hi - lo) / 200;
            double bestD = Double.POSITIVE_INFINITY;
            for (int i = 0; i <= 200; i++) {
                double tau = lo + i * step;
                double d = profile.applyAsDouble(tau);
                if (d < bestD) {
                    bestD = d;
                    best = tau;
                }
            }
            lo = best - 2 * step;
            hi = best + 2 * step;
        }
        List<ParameterSpec> shared = List.of(ParameterSpec.positive("tau1", "S", 1e-9),
                ParameterSpec.positive("countIrfFwhm", "S", FWHM_S).fixedAt(FWHM_S), ParameterSpec.unbounded("shift", "S", 0, BIN_S).fixedAt(0));
        LikelihoodResult r = LikelihoodFitter.fit(shared, List.of(new HistogramPart(h, model, 0, HistogramPart.amplitudeFor(h, 1))),
                List.of());
        assertThat(r.status()).isEqualTo(LikelihoodResult.Status.CONVERGED);
        Reference.checkRelative("τ at the deviance minimum, likelihood fit vs grid", r.estimate("tau1S").value(), best, 1e-6);
        Reference.checkRelative("amplitude at the minimum vs Σn/Σs", r.find("amplitude", 0).orElseThrow().value(),
                total / sum(model.shape(at(best, 1, 0, 0))), 1e-6);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus BOBYQAOptimizer minimising the same Poisson deviance over τ, amplitude, "
            + "background and shift", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void optimumMatchesAGeneralPurposeOptimiser() {
        CountHistogram h = histogram(128, 2e-9, 2, 11);
        CountModel model = model(h);
        double[] n = h.counts();
        List<ParameterSpec> shared = List.of(ParameterSpec.positive("tau1", "S", 1e-9),
                ParameterSpec.positive("countIrfFwhm", "S", FWHM_S).fixedAt(FWHM_S), ParameterSpec.unbounded("shift", "S", 0.01e-9, BIN_S));
        LikelihoodResult r = LikelihoodFitter.fit(shared, List.of(new HistogramPart(h, model, Double.NaN,
                HistogramPart.amplitudeFor(h, 1))), List.of());
        assertThat(r.status()).isEqualTo(LikelihoodResult.Status.CONVERGED);
        // x = (ln τ/ns, ln A, ln b, shift/bin): all of order one for the optimiser's trust region
        ObjectiveFunction f = new ObjectiveFunction(x -> deviance(n, model.expected(at(Math.exp(x[0]) * 1e-9, Math.exp(x[1]),
                Math.exp(x[2]), x[3] * BIN_S))));
        double[] x = new BOBYQAOptimizer(9, 0.3, 1e-12).optimize(new MaxEval(20000), f, GoalType.MINIMIZE,
                new InitialGuess(new double[] {0, Math.log(90), 0, 0.1}),
                new SimpleBounds(new double[] {-3, 0, -5, -5}, new double[] {3, 10, 5, 5})).getPoint();
        Reference.checkRelative("τ, likelihood fit vs BOBYQA", r.estimate("tau1S").value(), Math.exp(x[0]) * 1e-9, 1e-6);
        Reference.checkRelative("amplitude, likelihood fit vs BOBYQA", r.find("amplitude", 0).orElseThrow().value(),
                Math.exp(x[1]), 1e-6);
        Reference.checkRelative("background, likelihood fit vs BOBYQA", r.find("background", 0).orElseThrow().value(),
                Math.exp(x[2]), 1e-6);
        Reference.check("shift (bins), likelihood fit vs BOBYQA", r.estimate("shiftS").value() / BIN_S, x[3], 1e-6);
        Reference.checkRelative("deviance at the optimum", r.poissonDeviance(), deviance(n, model.expected(at(Math.exp(x[0]) * 1e-9,
                Math.exp(x[1]), Math.exp(x[2]), x[3] * BIN_S))), 1e-9);
    }

    @Test
    void profileIntervalRisesByOneInMinusTwoLnLAndMatchesTheErrorOnAWellDeterminedLifetime() {
        CountHistogram h = histogram(128, 2e-9, 2, 13);
        CountModel model = model(h);
        List<ParameterSpec> shared = List.of(ParameterSpec.positive("tau1", "S", 1e-9),
                ParameterSpec.positive("countIrfFwhm", "S", FWHM_S).fixedAt(FWHM_S), ParameterSpec.unbounded("shift", "S", 0.01e-9, BIN_S));
        LikelihoodResult r = LikelihoodFitter.fit(shared, List.of(new HistogramPart(h, model, Double.NaN,
                HistogramPart.amplitudeFor(h, 1))), List.of("tau1S"));
        var tau = r.estimate("tau1S");
        var interval = r.profile("tau1S").orElseThrow();
        assertThat(interval.lowerOpen() || interval.upperOpen()).isFalse();
        // near-quadratic in τ at these counts: each side within 15 % of the standard error
        assertThat(tau.value() - interval.lower()).isCloseTo(tau.stdError(), org.assertj.core.data.Percentage.withPercentage(15));
        assertThat(interval.upper() - tau.value()).isCloseTo(tau.stdError(), org.assertj.core.data.Percentage.withPercentage(15));
        // at the ends −2 ln L, minimised over the rest, is one above the optimum
        List<ParameterSpec> held = List.of(ParameterSpec.positive("tau1", "S", 1e-9).fixedAt(interval.upper()),
                shared.get(1), shared.get(2));
        LikelihoodResult atEnd = LikelihoodFitter.fit(held, List.of(new HistogramPart(h, model, Double.NaN,
                HistogramPart.amplitudeFor(h, 1))), List.of());
        assertThat(atEnd.minus2LnL() - r.minus2LnL()).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-4));
    }

    private static double sum(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s;
    }
}
