package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The fitter and its uncertainties against certified reference results and closed-form statistics. */
class FitValidationTest {

    private static final String MISRA = "NIST Statistical Reference Datasets, nonlinear regression, Misra1a "
            + "(Misra, NIST 1978; itl.nist.gov/div898/strd/nls/data/misra1a.shtml), table of certified values";

    /** y = b1 (1 − exp(−b2 x)), with x carried as the "delay" axis. */
    static final class Misra1aModel implements TraceModel {
        @Override
        public int traceCount() {
            return 1;
        }

        @Override
        public double[] predict(int trace, double[] x, ParameterValues p) {
            double b1 = p.get("b1");
            double b2 = p.get("b2");
            double[] y = new double[x.length];
            for (int j = 0; j < x.length; j++) {
                y[j] = b1 * -Math.expm1(-b2 * x[j]);
            }
            return y;
        }
    }

    static Dataset misra1a() throws IOException {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        try (InputStream in = FitValidationTest.class.getResourceAsStream("misra1a.txt")) {
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                ys.add(Double.parseDouble(f[0]));
                xs.add(Double.parseDouble(f[1]));
            }
        }
        double[] x = xs.stream().mapToDouble(Double::doubleValue).toArray();
        double[] y = ys.stream().mapToDouble(Double::doubleValue).toArray();
        return new Dataset(List.of(Trace.of("Misra1a", x, y)), List.of("misra1a.txt"));
    }

    @ParameterizedTest(name = "start {0}")
    @ValueSource(ints = {1, 2})
    @CheckedAgainst(source = MISRA, kind = CheckedAgainst.Kind.PUBLISHED)
    void misra1aUnboundedMatchesCertifiedValuesAndStandardErrors(int start) throws IOException {
        double b1 = start == 1 ? 500 : 250;
        double b2 = start == 1 ? 1e-4 : 5e-4;
        FitProblem p = new FitProblem(misra1a(), new Misra1aModel(), List.of(ParameterSpec.unbounded("b", "1", b1, 100),
                ParameterSpec.unbounded("b", "2", b2, 1e-4)), LinearTerms.NONE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.CONVERGED);
        Reference.checkRelative("Misra1a b1", r.estimate("b1").value(), 2.3894212918E+02, 1e-7);
        Reference.checkRelative("Misra1a b2", r.estimate("b2").value(), 5.5015643181E-04, 1e-7);
        Reference.checkRelative("Misra1a standard error of b1", r.estimate("b1").stdError(), 2.7070075241E+00, 1e-5);
        Reference.checkRelative("Misra1a standard error of b2", r.estimate("b2").stdError(), 7.2668688436E-06, 1e-5);
        Reference.checkRelative("Misra1a residual sum of squares", r.chiSquare(), 1.2455138894E-01, 1e-8);
        Reference.checkRelative("Misra1a residual standard deviation", Math.sqrt(r.reducedChiSquare()), 1.0187876330E-01, 1e-8);
    }

    @Test
    @CheckedAgainst(source = MISRA + "; fitted with both parameters on a log scale, errors carried back by the delta method",
            kind = CheckedAgainst.Kind.PUBLISHED)
    void misra1aOnLogScaleGivesTheSameStandardErrorsByTheDeltaMethod() throws IOException {
        FitProblem p = new FitProblem(misra1a(), new Misra1aModel(), List.of(ParameterSpec.positive("b", "1", 500),
                ParameterSpec.positive("b", "2", 1e-4)), LinearTerms.NONE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults().withAnalyticJacobian(false));
        Reference.checkRelative("Misra1a b1 (log scale)", r.estimate("b1").value(), 2.3894212918E+02, 1e-7);
        Reference.checkRelative("Misra1a b2 (log scale)", r.estimate("b2").value(), 5.5015643181E-04, 1e-7);
        Reference.checkRelative("Misra1a standard error of b1 (log scale)", r.estimate("b1").stdError(), 2.7070075241E+00, 1e-5);
        Reference.checkRelative("Misra1a standard error of b2 (log scale)", r.estimate("b2").stdError(), 7.2668688436E-06, 1e-5);
    }

    @Test
    @CheckedAgainst(source = "derived: for Gaussian noise the interval estimate ± standard error covers the truth with "
            + "probability erf(1/√2) = 0.6827; the acceptance band 0.60–0.76 (about ±2.4 binomial σ for 200 draws) is the "
            + "one the fitting issue asks for", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void sixtyEightPercentIntervalsOfSharedLifetimesCoverTheTruth() {
        int realisations = 200;
        int covered1 = 0;
        int covered2 = 0;
        int failures = 0;
        for (int seed = 0; seed < realisations; seed++) {
            FitResult r = GlobalFitter.fit(GlobalFitterTest.biexponential(1000 + seed, false), FitOptions.defaults());
            if (r.status() != FitResult.Status.CONVERGED) {
                failures++;
                continue;
            }
            ParameterEstimate t1 = r.estimate("tau1S");
            ParameterEstimate t2 = r.estimate("tau2S");
            assertThat(t1.stdError()).isFinite().isPositive();
            assertThat(t2.stdError()).isFinite().isPositive();
            covered1 += Math.abs(t1.value() - 20e-9) <= t1.stdError() ? 1 : 0;
            covered2 += Math.abs(t2.value() - 50e-12) <= t2.stdError() ? 1 : 0;
        }
        assertThat(failures).as("fits that did not converge").isZero();
        Reference.check("coverage of the 68% interval of shared tau1 over 200 seeded realisations",
                covered1 / (double) realisations, 0.68, 0.08);
        Reference.check("coverage of the 68% interval of shared tau2 over 200 seeded realisations",
                covered2 / (double) realisations, 0.68, 0.08);
    }

    /** y = c0 + c1 t: linear in both parameters. */
    static final class LineModel implements TraceModel {
        @Override
        public int traceCount() {
            return 1;
        }

        @Override
        public double[] predict(int trace, double[] t, ParameterValues p) {
            double c0 = p.get("c0");
            double c1 = p.get("c1");
            double[] y = new double[t.length];
            for (int j = 0; j < t.length; j++) {
                y[j] = c0 + c1 * t[j];
            }
            return y;
        }
    }

    @Test
    @CheckedAgainst(source = "derived: for a model linear in its parameters χ² is exactly quadratic, so the profile where "
            + "(χ²(θ) − χ²min)/s² = 1 ends at θ̂ ± σ̂ from the covariance", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void profileIntervalEqualsCovarianceIntervalForALinearModel() {
        double[] t = SyntheticSeries.logDelays(1, 100, 40);
        double[] y = new double[t.length];
        java.util.SplittableRandom rng = new java.util.SplittableRandom(17);
        for (int j = 0; j < t.length; j++) {
            y[j] = 2 + 0.3 * t[j] + 0.5 * SyntheticSeries.gaussian(rng);
        }
        FitProblem p = new FitProblem(new Dataset(List.of(Trace.of("line", t, y)), List.of()), new LineModel(),
                List.of(ParameterSpec.unbounded("c", "0", 1, 1), ParameterSpec.unbounded("c", "1", 0.1, 0.1)), LinearTerms.NONE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults().withProfile(List.of("c1")));
        ParameterEstimate c1 = r.estimate("c1");
        ProfileInterval pi = r.profile("c1").orElseThrow();
        Reference.checkRelative("profile lower end of c1 vs covariance θ̂−σ̂", pi.lower(), c1.value() - c1.stdError(), 1e-6);
        Reference.checkRelative("profile upper end of c1 vs covariance θ̂+σ̂", pi.upper(), c1.value() + c1.stdError(), 1e-6);
        assertThat(pi.lowerOpen()).isFalse();
        assertThat(pi.upperOpen()).isFalse();
    }

    @Test
    void profileIntervalIsCloseToCovarianceIntervalOnANearlyLinearProblem() {
        // a well-sampled single exponential with 1% noise: χ² is nearly parabolic in tau
        SharedExponentialsModel model = new SharedExponentialsModel(1.0);
        Dataset d = SyntheticSeries.make(model, Map.of("tau1S", 100e-12), SyntheticSeries.logDelays(1e-12, 1e-9, 200),
                new double[] {1.0}, 0.0, 0.01, 23, false);
        FitProblem p = new FitProblem(d, model, List.of(ParameterSpec.positive("tau1", "S", 50e-12)), LinearTerms.AMPLITUDE_AND_BASELINE);
        List<String> stages = new ArrayList<>();
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults().withProfile(List.of("tau1S"))
                .withProgress((stage, done, total) -> stages.add(stage)));
        ParameterEstimate tau = r.estimate("tau1S");
        ProfileInterval pi = r.profile("tau1S").orElseThrow();
        double se = tau.stdError();
        assertThat(pi.lower()).isCloseTo(tau.value() - se, org.assertj.core.data.Offset.offset(0.05 * se));
        assertThat(pi.upper()).isCloseTo(tau.value() + se, org.assertj.core.data.Offset.offset(0.05 * se));
        assertThat(pi.refits()).isPositive();
        assertThat(stages).startsWith("start").contains("profile tau1S").hasSize(1 + pi.refits());
    }

    @Test
    void profileOfABoundedParameterThatHitsTheBoundIsOpen() {
        // the weight of a component with nearly no signal: its interval runs into the lower bound 0
        SharedExponentialsModel model = new SharedExponentialsModel(1.0);
        Dataset d = SyntheticSeries.make(model, Map.of("tau1S", 1e-9, "tau2S", 20e-12, "weight2", 1e-4),
                SyntheticSeries.logDelays(1e-12, 5e-9, 100), new double[] {1.0}, 0.0, 0.01, 31, false);
        FitProblem p = new FitProblem(d, model, List.of(ParameterSpec.positive("tau1", "S", 1e-9),
                ParameterSpec.positive("tau2", "S", 20e-12).fixedAt(20e-12), ParameterSpec.shared("weight", "2", 0.05, 0, 1)),
                LinearTerms.AMPLITUDE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults().withProfile(List.of("weight2")));
        ProfileInterval pi = r.profile("weight2").orElseThrow();
        assertThat(pi.lowerOpen()).isTrue();
        assertThat(pi.lower()).isBetween(0.0, r.estimate("weight2").value());
        assertThat(pi.upperOpen()).isFalse();
    }
}
