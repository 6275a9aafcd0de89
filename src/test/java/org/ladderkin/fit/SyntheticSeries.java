package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

/** Seeded synthetic fluence series for fit tests and benchmarks. */
public final class SyntheticSeries {

    private SyntheticSeries() {
    }

    /** Log-spaced delays from {@code firstS} to {@code lastS}, {@code n} points. */
    public static double[] logDelays(double firstS, double lastS, int n) {
        double[] t = new double[n];
        for (int j = 0; j < n; j++) {
            t[j] = firstS * Math.pow(lastS / firstS, j / (double) (n - 1));
        }
        return t;
    }

    /**
     * Traces amplitude_i · shape_i + baseline with Gaussian noise of standard deviation {@code noise}.
     *
     * @param withSigma attach the true noise level as per-point uncertainty
     */
    public static Dataset make(TraceModel model, Map<String, Double> truth, double[] delays, double[] amplitudes,
                               double baseline, double noise, long seed, boolean withSigma) {
        Map<String, Integer> index = new HashMap<>();
        double[][] values = new double[truth.size()][];
        int k = 0;
        for (Map.Entry<String, Double> e : truth.entrySet()) {
            index.put(e.getKey(), k);
            values[k++] = new double[] {e.getValue()};
        }
        ParameterValues p = new ParameterValues(index, values);
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < model.traceCount(); i++) {
            double[] f = model.predict(i, delays, p);
            double[] y = new double[f.length];
            double[] s = new double[f.length];
            for (int j = 0; j < f.length; j++) {
                y[j] = amplitudes[i] * f[j] + baseline + noise * gaussian(rng);
                s[j] = noise;
            }
            traces.add(new Trace(delays, y, withSigma ? s : null, TraceMetadata.labelled("trace" + i), 0));
        }
        return new Dataset(traces, List.of());
    }

    /** Standard normal deviate (Box–Muller; SplittableRandom has no nextGaussian on Java 17). */
    public static double gaussian(SplittableRandom rng) {
        double u1 = rng.nextDouble();
        double u2 = rng.nextDouble();
        return Math.sqrt(-2 * Math.log1p(-u1)) * Math.cos(2 * Math.PI * u2);
    }
}
