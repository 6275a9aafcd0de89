package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class GlobalFitterTest {

    static final double[] EXCITATION = {0.2, 0.5, 1.0, 2.0};
    static final double[] AMPLITUDES = {2e-3, 3e-3, 4e-3, 5e-3};
    static final Map<String, Double> TRUTH = Map.of("tau1S", 20e-9, "tau2S", 50e-12, "weight2", 0.8);
    static final double NOISE = 2e-5;

    static List<ParameterSpec> biexponentialSpecs() {
        return List.of(ParameterSpec.positive("tau1", "S", 10e-9), ParameterSpec.positive("tau2", "S", 100e-12),
                ParameterSpec.positive("weight", "2", 0.5));
    }

    static FitProblem biexponential(long seed, boolean withSigma) {
        SharedExponentialsModel model = new SharedExponentialsModel(EXCITATION);
        Dataset d = SyntheticSeries.make(model, TRUTH, SyntheticSeries.logDelays(1e-12, 100e-9, 150), AMPLITUDES, 1e-5,
                NOISE, seed, withSigma);
        return new FitProblem(d, model, biexponentialSpecs(), LinearTerms.AMPLITUDE_AND_BASELINE);
    }

    @ParameterizedTest(name = "analytic Jacobian = {0}")
    @ValueSource(booleans = {true, false})
    void recoversSharedLifetimesFromSeededNoisyData(boolean analytic) {
        FitResult r = GlobalFitter.fit(biexponential(42, false), FitOptions.defaults().withAnalyticJacobian(analytic));
        assertThat(r.status()).as(r.message()).isEqualTo(FitResult.Status.CONVERGED);
        for (String key : List.of("tau1S", "tau2S", "weight2")) {
            ParameterEstimate e = r.estimate(key);
            assertThat(e.stdError()).isPositive();
            assertThat(Math.abs(e.value() - TRUTH.get(key))).as(key).isLessThan(4 * e.stdError());
            assertThat(e.value()).as(key).isCloseTo(TRUTH.get(key), within(0.05 * TRUTH.get(key)));
        }
        assertThat(r.find("amplitude", 3).orElseThrow().value()).isCloseTo(5e-3, within(2e-4));
        assertThat(r.find("baseline", 0).orElseThrow().value()).isCloseTo(1e-5, within(1e-5));
        assertThat(r.points()).isEqualTo(600);
        assertThat(r.freeParameters()).isEqualTo(3 + 8);
        assertThat(Math.sqrt(r.reducedChiSquare())).isCloseTo(NOISE, within(0.15 * NOISE));
        assertThat(r.correlationKeys()).hasSize(11);
        assertThat(r.correlation()[0][0]).isCloseTo(1.0, within(1e-12));
        assertThat(r.residuals()).hasSize(4);
        assertThat(r.autocorrelation().get(0)).hasSize(5);
        assertThat(Math.abs(r.autocorrelation().get(0)[0])).isLessThan(0.3);
    }

    @Test
    void analyticAndFiniteDifferenceJacobiansAgree() {
        FitProblem p = biexponential(7, false);
        FitResult a = GlobalFitter.fit(p, FitOptions.defaults().withAnalyticJacobian(true));
        FitResult f = GlobalFitter.fit(p, FitOptions.defaults().withAnalyticJacobian(false));
        for (String key : List.of("tau1S", "tau2S", "weight2")) {
            assertThat(a.estimate(key).value()).isCloseTo(f.estimate(key).value(), within(1e-5 * f.estimate(key).value()));
            assertThat(a.estimate(key).stdError()).isCloseTo(f.estimate(key).stdError(), within(1e-4 * f.estimate(key).stdError()));
        }
    }

    @Test
    void knownUncertaintiesGiveReducedChiSquareNearOne() {
        FitResult r = GlobalFitter.fit(biexponential(3, true), FitOptions.defaults());
        assertThat(r.reducedChiSquare()).isBetween(0.85, 1.15);
    }

    @Test
    void aicAndBicPreferTheModelThatMadeTheData() {
        FitProblem bi = biexponential(11, false);
        FitProblem mono = new FitProblem(bi.data(), bi.model(), List.of(ParameterSpec.positive("tau1", "S", 10e-9)),
                LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult rb = GlobalFitter.fit(bi, FitOptions.defaults());
        FitResult rm = GlobalFitter.fit(mono, FitOptions.defaults());
        assertThat(rb.aic()).isLessThan(rm.aic() - 10);
        assertThat(rb.bic()).isLessThan(rm.bic() - 10);
        // the missing fast component leaves structured residuals, flagged per trace
        assertThat(rm.autocorrelation().get(3)[0]).isGreaterThan(0.5);
        assertThat(rm.warnings()).anyMatch(w -> w.contains("residuals of trace 'trace3' are strongly correlated"));
    }

    @Test
    void multiStartKeepsTheBestAndReportsFailedStarts() {
        FitProblem p = biexponential(5, false);
        // a model that refuses lifetimes above 1 µs: the default start must go through the start grid instead
        TraceModel picky = new TraceModel() {
            @Override
            public int traceCount() {
                return p.model().traceCount();
            }

            @Override
            public double[] predict(int trace, double[] t, ParameterValues v) {
                double[] f = p.model().predict(trace, t, v);
                if (v.get("tau1S") > 1e-6) {
                    f[0] = Double.NaN;
                }
                return f;
            }
        };
        List<ParameterSpec> specs = List.of(ParameterSpec.positive("tau1", "S", 5e-6), ParameterSpec.positive("tau2", "S", 100e-12),
                ParameterSpec.positive("weight", "2", 0.5));
        FitProblem q = new FitProblem(p.data(), picky, specs, LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult alone = GlobalFitter.fit(q, FitOptions.defaults());
        assertThat(alone.status()).isEqualTo(FitResult.Status.FAILED);
        assertThat(alone.message()).startsWith("model returned NaN for trace 'trace0' at delay 1.0E-12 s with tau1S=5e-06, tau2S=1e-10, weight2=0.5");
        List<String> progress = new java.util.ArrayList<>();
        FitResult grid = GlobalFitter.fit(q, FitOptions.defaults().withStarts(List.of(
                Map.of("tau1S", 30e-9), Map.of("tau1S", 3e-9, "tau2S", 20e-12)))
                .withProgress((stage, done, total) -> progress.add(stage + " " + done + "/" + total)));
        assertThat(progress).containsExactly("start 1/3", "start 2/3", "start 3/3");
        assertThat(grid.status()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(grid.startsTried()).isEqualTo(3);
        assertThat(grid.startsFailed()).isEqualTo(1);
        assertThat(grid.warnings()).anyMatch(w -> w.startsWith("1 of 3 starts failed"));
        assertThat(grid.estimate("tau2S").value()).isCloseTo(50e-12, within(5e-12));
    }

    @Test
    void twoPointTraceFailsWithAMessage() {
        Trace t = Trace.of("short", new double[] {0, 1e-12}, new double[] {1, 0.5});
        FitProblem p = new FitProblem(new Dataset(List.of(t), List.of()), new SharedExponentialsModel(1.0),
                List.of(ParameterSpec.positive("tau1", "S", 1e-12)), LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.FAILED);
        assertThat(r.message()).isEqualTo("2 data points for 3 free parameters (1 nonlinear, 2 amplitudes/baselines): "
                + "a fit needs more points than parameters");
        assertThat(r.estimates()).isEmpty();
        assertThat(r.ok()).isFalse();
    }

    @Test
    void allMissingTraceFailsWithAMessage() {
        Trace good = Trace.of("good", new double[] {0, 1e-12, 2e-12, 3e-12}, new double[] {1, 0.5, 0.25, 0.12});
        Trace empty = Trace.of("empty", new double[] {0, 1e-12, 2e-12}, new double[] {Double.NaN, Double.NaN, Double.NaN});
        FitProblem p = new FitProblem(new Dataset(List.of(good, empty), List.of()), new SharedExponentialsModel(1.0, 1.0),
                List.of(ParameterSpec.positive("tau1", "S", 1e-12)), LinearTerms.AMPLITUDE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.FAILED);
        assertThat(r.message()).isEqualTo("trace 'empty' has no values (all 3 are missing)");
        assertThat(r.chiSquare()).isNaN();
    }

    @Test
    void parameterTheDataIgnoreMakesUncertaintyUnavailableNotNaNSilently() {
        // one trace, two components with the same (fixed) lifetime: their weights trade off exactly
        SharedExponentialsModel model = new SharedExponentialsModel(1.0);
        Dataset d = SyntheticSeries.make(model, TRUTH, SyntheticSeries.logDelays(1e-12, 100e-9, 150), new double[] {3e-3},
                1e-5, NOISE, 9, false);
        List<ParameterSpec> specs = List.of(ParameterSpec.positive("tau1", "S", 10e-9),
                ParameterSpec.positive("tau2", "S", 50e-12).fixedAt(50e-12), ParameterSpec.positive("tau3", "S", 50e-12).fixedAt(50e-12),
                ParameterSpec.unbounded("weight", "2", 0.5, 1.0), ParameterSpec.unbounded("weight", "3", 0.3, 1.0));
        FitResult r = GlobalFitter.fit(new FitProblem(d, model, specs, LinearTerms.AMPLITUDE_AND_BASELINE), FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.UNCERTAINTY_UNAVAILABLE);
        assertThat(r.message()).isEqualTo("weight2 and weight3 are not separately determined by these data "
                + "(fix one of them or add data)");
        assertThat(r.estimate("tau1S").stdError()).isNaN();
        assertThat(r.estimate("tau2S").fixed()).isTrue();
        assertThat(r.estimate("tau2S").stdError()).isZero();
        assertThat(r.correlation()).isEmpty();
        Trace flat = Trace.of("t", new double[] {0, 1e-12, 2e-12, 3e-12, 4e-12}, new double[] {1, 0.6, 0.4, 0.3, 0.2});
        List<ParameterSpec> ignored = List.of(ParameterSpec.positive("tau1", "S", 2e-12), ParameterSpec.positive("unused", "S", 1e-9));
        FitResult q = GlobalFitter.fit(new FitProblem(new Dataset(List.of(flat), List.of()), new SharedExponentialsModel(1.0),
                ignored, LinearTerms.AMPLITUDE), FitOptions.defaults());
        assertThat(q.status()).isEqualTo(FitResult.Status.UNCERTAINTY_UNAVAILABLE);
        assertThat(q.message()).isEqualTo("the data do not depend on unusedS at the best fit (fix it, or widen the delay range)");
        assertThat(q.estimate("tau1S").value()).isFinite();
    }

    @Test
    void perTraceParametersGetOneValueAndErrorPerTrace() {
        FitProblem shared = biexponential(13, false);
        List<ParameterSpec> specs = List.of(ParameterSpec.positive("tau1", "S", 10e-9), ParameterSpec.positive("tau2", "S", 100e-12),
                ParameterSpec.positive("weight", "2", 0.5).withScope(ParameterSpec.Scope.PER_TRACE));
        FitProblem p = new FitProblem(shared.data(), shared.model(), specs, LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult a = GlobalFitter.fit(p, FitOptions.defaults());
        FitResult f = GlobalFitter.fit(p, FitOptions.defaults().withAnalyticJacobian(false));
        assertThat(a.status()).as(a.message()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(a.freeParameters()).isEqualTo(2 + 4 + 8);
        assertThat(a.correlationKeys()).contains("weight2[0]", "weight2[3]");
        for (int i = 0; i < 4; i++) {
            ParameterEstimate w = a.find("weight2", i).orElseThrow();
            assertThat(Math.abs(w.value() - 0.8)).as("weight2[%d]", i).isLessThan(4 * w.stdError());
            ParameterEstimate wf = f.find("weight2", i).orElseThrow();
            assertThat(wf.value()).isCloseTo(w.value(), within(1e-5 * w.value()));
            assertThat(wf.stdError()).isCloseTo(w.stdError(), within(1e-3 * w.stdError()));
        }
        assertThat(a.find("weight2", -1)).isEmpty();
    }

    @Test
    void parameterThatRunsToItsBoundIsReported() {
        SharedExponentialsModel model = new SharedExponentialsModel(EXCITATION);
        Dataset mono = SyntheticSeries.make(model, Map.of("tau1S", 20e-9), SyntheticSeries.logDelays(1e-12, 100e-9, 150),
                AMPLITUDES, 0, NOISE, 21, false);
        FitProblem p = new FitProblem(mono, model, List.of(ParameterSpec.positive("tau1", "S", 10e-9),
                ParameterSpec.positive("tau2", "S", 50e-12).fixedAt(50e-12), ParameterSpec.shared("weight", "2", 0.3, 0.0, 2.0)),
                LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults());
        assertThat(r.ok()).isTrue();
        assertThat(r.estimate("weight2").value()).isLessThan(1e-6);
        assertThat(r.warnings()).anyMatch(w -> w.startsWith("weight2 = ") && w.contains("ran to its bound 0 (the data do not hold it"));
    }

    @Test
    void throwingModelAndUnusableStartsBecomeFailureStates() {
        FitProblem p = biexponential(8, false);
        TraceModel broken = new TraceModel() {
            @Override
            public int traceCount() {
                return 4;
            }

            @Override
            public double[] predict(int trace, double[] t, ParameterValues v) {
                throw new IllegalStateException("generator not ready");
            }
        };
        FitResult r = GlobalFitter.fit(new FitProblem(p.data(), broken, p.parameters(), p.linear()), FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.FAILED);
        assertThat(r.message()).isEqualTo("model failed: IllegalStateException: generator not ready");
        FitResult s = GlobalFitter.fit(p, FitOptions.defaults().withStarts(List.of(Map.of("tau2S", -1.0), Map.of("nonsense", 1.0))));
        assertThat(s.status()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(s.startsFailed()).isEqualTo(2);
        assertThat(s.warnings()).anyMatch(w -> w.startsWith("2 of 3 starts failed; the first: start 2 is unusable: start value -1.0 for tau2S is outside its bounds"));
    }

    @Test
    void allNonlinearParametersFixedLeavesALinearFit() {
        FitProblem p = biexponential(4, false);
        List<ParameterSpec> fixed = p.parameters().stream().map(s -> s.fixedAt(TRUTH.get(s.key()))).toList();
        FitResult r = GlobalFitter.fit(new FitProblem(p.data(), p.model(), fixed, p.linear()), FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(r.freeParameters()).isEqualTo(8);
        assertThat(r.iterations()).isZero();
        ParameterEstimate a0 = r.find("amplitude", 0).orElseThrow();
        assertThat(Math.abs(a0.value() - 2e-3)).isLessThan(4 * a0.stdError());
        assertThat(r.estimate("tau1S").stdError()).isZero();
    }

    @Test
    void sharedLookupOfAPerTraceParameterIsAModelErrorWithAMessage() {
        FitProblem p = biexponential(6, false);
        TraceModel careless = new TraceModel() {
            @Override
            public int traceCount() {
                return 4;
            }

            @Override
            public double[] predict(int trace, double[] t, ParameterValues v) {
                v.get("weight2");
                return p.model().predict(trace, t, v);
            }
        };
        List<ParameterSpec> specs = List.of(p.parameters().get(0), p.parameters().get(1),
                p.parameters().get(2).withScope(ParameterSpec.Scope.PER_TRACE));
        FitResult r = GlobalFitter.fit(new FitProblem(p.data(), careless, specs, p.linear()), FitOptions.defaults());
        assertThat(r.status()).isEqualTo(FitResult.Status.FAILED);
        assertThat(r.message()).isEqualTo("model failed: IllegalArgumentException: parameter 'weight2' has one value per trace: "
                + "ask get(key, trace)");
    }

    @Test
    void benchmarkProblemWithSixSharedParametersIsRecovered() {
        // the 8-trace × 400-point problem of GlobalFitBenchmark: it must converge to the truth, not merely stop
        double[] excitation = {0.05, 0.1, 0.2, 0.4, 0.8, 1.6, 3.2, 6.4};
        double[] amplitudes = {1e-3, 1.5e-3, 2e-3, 2.5e-3, 3e-3, 3.5e-3, 4e-3, 4.5e-3};
        SharedExponentialsModel model = new SharedExponentialsModel(excitation);
        Map<String, Double> truth = Map.of("tau1S", 20e-9, "tau2S", 60e-12, "tau3S", 8e-12, "weight2", 0.9,
                "weight3", 0.4, "saturation", 4.0);
        Dataset d = SyntheticSeries.make(model, truth, SyntheticSeries.logDelays(0.2e-12, 100e-9, 400), amplitudes, 1e-5,
                2e-5, 2026, false);
        FitProblem p = new FitProblem(d, model, List.of(
                ParameterSpec.positive("tau1", "S", 10e-9), ParameterSpec.positive("tau2", "S", 100e-12),
                ParameterSpec.positive("tau3", "S", 5e-12), ParameterSpec.positive("weight", "2", 0.5),
                ParameterSpec.positive("weight", "3", 0.2), ParameterSpec.positive("saturation", "", 2.0)),
                LinearTerms.AMPLITUDE_AND_BASELINE);
        FitResult r = GlobalFitter.fit(p, FitOptions.defaults());
        assertThat(r.status()).as(r.message()).isEqualTo(FitResult.Status.CONVERGED);
        assertThat(r.points()).isEqualTo(3200);
        for (Map.Entry<String, Double> e : truth.entrySet()) {
            ParameterEstimate est = r.estimate(e.getKey());
            assertThat(Math.abs(est.value() - e.getValue())).as(e.getKey()).isLessThan(4 * est.stdError());
        }
    }
}
