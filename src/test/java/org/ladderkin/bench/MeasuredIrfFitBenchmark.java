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
import org.ladderkin.observe.MeasuredIrf;
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
 * {@link LadderFitBenchmark}'s series fitted with a measured instrument response instead of a Gaussian: a 200-sample
 * asymmetric response (Gaussian σ = 0.15 ps with a 0.2 ps exponential tail, 10 fs steps), five free shared
 * parameters (the response's width is fixed), so the two benchmarks show what the measured convolution costs.
 * Run: {@code java -cp target/test-classes:target/classes:$CP org.openjdk.jmh.Main MeasuredIrfFit}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 5)
@Measurement(iterations = 3, time = 5)
@Fork(1)
public class MeasuredIrfFitBenchmark {

    FitProblem problem;

    /** Gaussian of standard deviation {@code sigmaS} convolved with a one-sided exponential of time {@code tailS}. */
    static MeasuredIrf tailed(double sigmaS, double tailS, double stepS, int samples) {
        double[] t = new double[samples];
        double[] g = new double[samples];
        double lam = 1 / tailS;
        for (int i = 0; i < samples; i++) {
            t[i] = -5 * sigmaS + i * stepS;
            g[i] = Math.exp(lam / 2 * (lam * sigmaS * sigmaS - 2 * t[i]))
                    * org.hipparchus.special.Erf.erfc((lam * sigmaS * sigmaS - t[i]) / (Math.sqrt(2) * sigmaS));
        }
        return new MeasuredIrf(t, g, "benchmark response");
    }

    @Setup(Level.Trial)
    public void makeProblem() {
        double sigma = 1e-19;
        double[] j = LadderSeries.fluencesPerM2(8, sigma);
        MeasuredIrf irf = tailed(0.15e-12, 0.2e-12, 10e-15, 200);
        LadderBleachModel model = LadderBleachModel.forModel(LadderSeries.BASE, "crossSectionM2", j, Double.NaN, irf);
        List<String> keys = List.of("amplitudeOd", "crossSectionM2", "tauAuger2S", "tauTrapS", "timeZeroS");
        double[] delays = SyntheticSeries.logDelays(0.05e-12, 5e-9, 400);
        for (int m = 0; m < 20; m++) {
            delays[m] = -1e-12 + m * 0.06e-12;
        }
        Arrays.sort(delays);
        Dataset d = LadderSeries.make(model, keys, new double[] {0.01, sigma, 40e-12, 2e-9, 0.3e-12}, delays, 1, 0, 5e-5, 2026);
        problem = new FitProblem(d, model, List.of(
                ParameterSpec.positive("amplitude", "Od", 0.008),
                ParameterSpec.positive("crossSection", "M2", 0.7e-19),
                ParameterSpec.positive("tauAuger2", "S", 60e-12),
                ParameterSpec.positive("tauTrap", "S", 3e-9),
                ParameterSpec.unbounded("timeZero", "S", 0, 1e-12)), LinearTerms.NONE);
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
