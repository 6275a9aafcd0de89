package org.ladderkin.bench;

import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitOptions;
import org.ladderkin.fit.FitProblem;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.GlobalFitter;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.LadderSeries;
import org.ladderkin.fit.LinearTerms;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.SyntheticSeries;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The fitting target (≤ 2 s): a global fit of an 8-trace × 400-point fluence series with 6 free shared
 * parameters on the ladder model — amplitude, σ, τ₂, trapping lifetime, time zero and Gaussian IRF width (τ_rad held,
 * as it is known from PL) — from starts 20–50 % off, central-difference Jacobian, IRF by quadrature on a log grid.
 * Run: {@code java -cp target/test-classes:target/classes:$CP org.openjdk.jmh.Main LadderFit}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 3, time = 5)
@Fork(1)
public class LadderFitBenchmark {

    FitProblem problem;

    @Setup(Level.Trial)
    public void makeProblem() {
        double sigma = 1e-19;
        double[] j = LadderSeries.fluencesPerM2(8, sigma);
        LadderBleachModel model = LadderBleachModel.forModel(LadderSeries.BASE, "crossSectionM2", j, Double.NaN);
        List<String> keys = List.of("amplitudeOd", "crossSectionM2", "tauAuger2S", "tauTrapS", "timeZeroS", "irfFwhmS");
        double[] delays = SyntheticSeries.logDelays(0.05e-12, 5e-9, 400);
        for (int m = 0; m < 20; m++) {
            delays[m] = -1e-12 + m * 0.06e-12;
        }
        Arrays.sort(delays);
        Dataset d = LadderSeries.make(model, keys, new double[] {0.01, sigma, 40e-12, 2e-9, 0.3e-12, 0.4e-12}, delays, 1, 0, 5e-5, 2026);
        problem = new FitProblem(d, model, List.of(
                ParameterSpec.positive("amplitude", "Od", 0.008),
                ParameterSpec.positive("crossSection", "M2", 0.7e-19),
                ParameterSpec.positive("tauAuger2", "S", 60e-12),
                ParameterSpec.positive("tauTrap", "S", 3e-9),
                ParameterSpec.unbounded("timeZero", "S", 0, 1e-12),
                ParameterSpec.positive("irfFwhm", "S", 0.6e-12)), LinearTerms.NONE);
        FitResult check = GlobalFitter.fit(problem, FitOptions.defaults());
        if (check.status() != FitResult.Status.CONVERGED) {
            throw new IllegalStateException("benchmark fit did not converge: " + check.message());
        }
    }

    @Benchmark
    public FitResult fit() {
        return GlobalFitter.fit(problem, FitOptions.defaults());
    }
}
