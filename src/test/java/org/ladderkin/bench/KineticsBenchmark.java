package org.ladderkin.bench;

import java.util.concurrent.TimeUnit;
import org.ladderkin.cli.BenchCases;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.Trace;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The engine's speed cases (targets on a 2-core machine: ≤ 0.2 ms per trace, ≤ 20 ms per sweep, heap &lt; 64 MB).
 * Run: {@code mvn -B -q test-compile} then
 * {@code java -Xmx64m -cp target/test-classes:target/classes:$(cat cp.txt) org.openjdk.jmh.Main KineticsBenchmark}
 * with cp.txt from {@code mvn dependency:build-classpath -Dmdep.outputFile=cp.txt}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgs = "-Xmx64m")
public class KineticsBenchmark {

    private LadderKinetics built;
    private KineticModel ladder;
    private KineticModel cooling;
    private LadderKinetics coolingBuilt;
    private Populations coolingAfterPulse;

    @Setup
    public void setUp() {
        ladder = BenchCases.ladder31();
        built = LadderKinetics.on(ladder, ladder.space(30));
        cooling = BenchCases.cooling21();
        coolingBuilt = LadderKinetics.on(cooling, cooling.space(cooling.fixedNMax()));
        coolingAfterPulse = coolingBuilt.applyPulse(Populations.ground(coolingBuilt.space()), new PulseExcitation.Poisson(3));
    }

    /** One trace of 1000 log delays after one pulse, engine already built. */
    @Benchmark
    public Trace traceOnBuiltEngine() {
        return BenchCases.traceOn(built, 3);
    }

    /** The same including generator assembly, decomposition and the delay-grid factors. */
    @Benchmark
    public Trace traceWithSetUp() {
        return BenchCases.singleTrace(ladder);
    }

    @Benchmark
    public double sweepAt1kHz() {
        return BenchCases.sweep(1e3, false);
    }

    @Benchmark
    public double sweepAt80MHz() {
        return BenchCases.sweep(80e6, false);
    }

    @Benchmark
    public double sweepAt80MHzWithPulsesToOnePercent() {
        return BenchCases.sweep(80e6, true);
    }

    /** Cooling-resolved model, Nmax = 20 (231 states): one trace of 1000 log delays, engine already built. */
    @Benchmark
    public Trace coolingResolvedTraceOnBuiltEngine() {
        return BenchCases.traceOn(coolingBuilt, 3);
    }

    /** Only the trace (no pulse matrix): the propagator's share of the case above. */
    @Benchmark
    public Trace coolingResolvedTraceOnly() {
        return coolingBuilt.trace(coolingAfterPulse, BenchCases.DELAYS_S);
    }

    /** The same including generator assembly, the cold-ladder decomposition and the delay-grid set-up. */
    @Benchmark
    public Trace coolingResolvedTrace() {
        return BenchCases.singleTrace(cooling);
    }
}
