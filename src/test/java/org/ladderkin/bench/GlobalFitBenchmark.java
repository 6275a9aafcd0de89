package org.ladderkin.bench;

import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitOptions;
import org.ladderkin.fit.FitProblem;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.GlobalFitter;
import org.ladderkin.fit.LinearTerms;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.SharedExponentialsModel;
import org.ladderkin.fit.SyntheticSeries;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * A global fit of an 8-trace × 400-point fluence series with 6 free shared parameters (three lifetimes, two weights,
 * a saturation excitation) plus per-trace amplitude and baseline, on the analytic {@link SharedExponentialsModel}.
 * The target (2 s) is meant for the ladder model; this measures the fitter's own overhead.
 * Run: {@code java -cp target/test-classes:target/classes:$CP org.openjdk.jmh.Main GlobalFit}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class GlobalFitBenchmark {

    @Param({"true", "false"})
    boolean analyticJacobian;

    FitProblem problem;
    FitOptions options;

    @Setup(Level.Trial)
    public void makeProblem() {
        double[] excitation = {0.05, 0.1, 0.2, 0.4, 0.8, 1.6, 3.2, 6.4};
        double[] amplitudes = {1e-3, 1.5e-3, 2e-3, 2.5e-3, 3e-3, 3.5e-3, 4e-3, 4.5e-3};
        SharedExponentialsModel model = new SharedExponentialsModel(excitation);
        Map<String, Double> truth = Map.of("tau1S", 20e-9, "tau2S", 60e-12, "tau3S", 8e-12, "weight2", 0.9,
                "weight3", 0.4, "saturation", 4.0);
        Dataset d = SyntheticSeries.make(model, truth, SyntheticSeries.logDelays(0.2e-12, 100e-9, 400), amplitudes, 1e-5,
                2e-5, 2026, false);
        problem = new FitProblem(d, model, List.of(
                ParameterSpec.positive("tau1", "S", 10e-9), ParameterSpec.positive("tau2", "S", 100e-12),
                ParameterSpec.positive("tau3", "S", 5e-12), ParameterSpec.positive("weight", "2", 0.5),
                ParameterSpec.positive("weight", "3", 0.2), ParameterSpec.positive("saturation", "", 2.0)),
                LinearTerms.AMPLITUDE_AND_BASELINE);
        options = FitOptions.defaults().withAnalyticJacobian(analyticJacobian);
        FitResult check = GlobalFitter.fit(problem, options);
        if (check.status() != FitResult.Status.CONVERGED) {
            throw new IllegalStateException("benchmark fit did not converge: " + check.message());
        }
    }

    @Benchmark
    public FitResult fit() {
        return GlobalFitter.fit(problem, options);
    }
}
