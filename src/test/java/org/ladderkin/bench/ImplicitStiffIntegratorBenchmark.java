package org.ladderkin.bench;

import java.util.concurrent.TimeUnit;
import org.ladderkin.kinetics.propagate.ImplicitStiffIntegrator;
import org.ladderkin.kinetics.propagate.IntegrationResult;
import org.ladderkin.kinetics.propagate.StiffSystem;
import org.ladderkin.kinetics.propagate.Tolerances;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Cost of the Radau IIA integrator on a 30-state decay ladder (rates 1/(1 µs)..1/(1 ps), outputs 1 ps..1 ms, 10 per
 * decade) and on Robertson's problem to t = 1e11. Run (not part of surefire):
 * {@code java -cp target/test-classes:target/classes:$(cat target/cp.txt) org.openjdk.jmh.Main ImplicitStiffIntegratorBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ImplicitStiffIntegratorBenchmark {

    /** Relative tolerance; the absolute one is 1e-3 of it for the ladder (populations) and 1e-20 for Robertson. */
    @Param({"1e-6", "1e-8"})
    public double relativeTolerance;

    private StiffSystem ladder;
    private double[] ladderP0;
    private double[] ladderTimesS;
    private StiffSystem robertson;
    private ImplicitStiffIntegrator ladderIntegrator;
    private ImplicitStiffIntegrator robertsonIntegrator;

    @Setup
    public void setUp() {
        int n = 30;
        double[] k = new double[n];
        for (int i = 1; i < n; i++) {
            k[i] = 1e6 * Math.pow(1e6, (i - 1) / (double) (n - 2));
        }
        ladder = new Ladder(k);
        ladderP0 = new double[n];
        ladderP0[n - 1] = 1.0;
        ladderTimesS = new double[91];
        for (int i = 0; i < ladderTimesS.length; i++) {
            ladderTimesS[i] = 1e-12 * Math.pow(10, i / 10.0);
        }
        robertson = new Robertson();
        ladderIntegrator = new ImplicitStiffIntegrator(new Tolerances(1e-3 * relativeTolerance, relativeTolerance));
        robertsonIntegrator = new ImplicitStiffIntegrator(new Tolerances(1e-20, relativeTolerance));
    }

    @Benchmark
    public IntegrationResult ladder30States91Outputs() {
        return ladderIntegrator.integrate(ladder, 0.0, ladderP0, ladderTimesS);
    }

    @Benchmark
    public IntegrationResult robertsonTo1e11() {
        return robertsonIntegrator.integrate(robertson, 0.0, new double[] {1, 0, 0}, new double[] {40, 1e5, 1e11});
    }

    /** dP_N/dt = −k_N P_N + k_{N+1} P_{N+1}. */
    private static final class Ladder implements StiffSystem {
        private final double[] k;

        Ladder(double[] k) {
            this.k = k;
        }

        @Override
        public int dimension() {
            return k.length;
        }

        @Override
        public void derivatives(double t, double[] y, double[] d) {
            for (int i = 0; i < k.length; i++) {
                d[i] = -k[i] * y[i] + (i + 1 < k.length ? k[i + 1] * y[i + 1] : 0);
            }
        }

        @Override
        public void jacobian(double t, double[] y, double[][] j) {
            for (int i = 0; i < k.length; i++) {
                java.util.Arrays.fill(j[i], 0.0);
                j[i][i] = -k[i];
                if (i + 1 < k.length) {
                    j[i][i + 1] = k[i + 1];
                }
            }
        }

        @Override
        public boolean isLinear() {
            return true;
        }
    }

    /** Robertson's chemical kinetics. */
    private static final class Robertson implements StiffSystem {
        @Override
        public int dimension() {
            return 3;
        }

        @Override
        public void derivatives(double t, double[] y, double[] d) {
            d[0] = -0.04 * y[0] + 1e4 * y[1] * y[2];
            d[2] = 3e7 * y[1] * y[1];
            d[1] = -d[0] - d[2];
        }

        @Override
        public void jacobian(double t, double[] y, double[][] j) {
            j[0][0] = -0.04;
            j[0][1] = 1e4 * y[2];
            j[0][2] = 1e4 * y[1];
            j[1][0] = 0.04;
            j[1][1] = -1e4 * y[2] - 6e7 * y[1];
            j[1][2] = -1e4 * y[1];
            j[2][0] = 0;
            j[2][1] = 6e7 * y[1];
            j[2][2] = 0;
        }
    }
}
