package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.function.DoubleSupplier;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin bench}: times the engine's four speed cases (the same work as the JMH benchmark
 * {@code KineticsBenchmark}) and prints milliseconds per case and the peak heap used. A quick check, not a
 * substitute for JMH: it warms up, then reports the median of repeated runs.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        header = "Time the kinetics engine on its speed cases.",
        description = "Time the kinetics engine on its four speed cases (31-state ladder, Nmax = 30; 1000 log delays):"
            + " one trace after one pulse; 40-value ⟨N⟩ sweeps with pulse-train steady state at 1 kHz and 80"
            + " MHz; the whole simulate command for that 80 MHz sweep (parse, grid, CSV text); the cooling-resolved"
            + " model at Nmax = 20. With --planner PLAN.json also the desktop"
            + " planner's update after an edit (prediction, and prediction plus chart build). Prints ms per case"
            + " and peak heap used.")
final class BenchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Option(names = "--repeats", paramLabel = "N", defaultValue = "15", description = "timed runs per case (default ${DEFAULT-VALUE})")
    int repeats;

    @Option(names = "--skip-cooling", description = "skip the cooling-resolved case")
    boolean skipCooling;

    @Option(names = "--format", paramLabel = "text|json", defaultValue = "text",
            description = "text table or JSON {\"cases\": [{\"name\", \"medianMs\", \"minMs\", \"maxMs\"}], \"peakHeapMb\"}"
                + " (default ${DEFAULT-VALUE})")
    String format;

    @Option(names = "--planner", paramLabel = "PLAN.json",
            description = "also time the desktop planner's update after an edit on this plan (prediction and chart build)")
    java.nio.file.Path plannerPlan;

    /** One timed case: median, fastest and slowest of the timed runs (ms). */
    record Timing(String name, double medianMs, double minMs, double maxMs) {
    }

    @Override
    public Integer call() {
        if (repeats < 1 || repeats > 10_000) {
            throw new IllegalArgumentException("--repeats must be between 1 and 10000, was " + repeats);
        }
        if (!format.equals("text") && !format.equals("json")) {
            throw new IllegalArgumentException("--format must be text or json, was " + format);
        }
        boolean json = format.equals("json");
        // read the plan first: a bad file should fail before a minute of timing
        PlannerUpdateBench update = plannerPlan == null ? null
                : new PlannerUpdateBench(org.ladderkin.io.PlanCodec.read(plannerPlan));
        PrintWriter out = json ? new PrintWriter(java.io.Writer.nullWriter()) : quiet.summary();
        List<Timing> cases = new ArrayList<>();
        resetPeaks();
        KineticModel ladder = BenchCases.ladder31();
        LadderKinetics built = LadderKinetics.on(ladder, ladder.space(30));
        out.println("case                                              median ms");
        row(out, cases, "trace, 31 states, 1000 delays (engine built)", () -> BenchCases.traceOn(built, 3).bleach()[0]);
        row(out, cases, "trace, 31 states, 1000 delays (incl. set-up)", () -> BenchCases.singleTrace(ladder).bleach()[0]);
        row(out, cases, "sweep 40 <N>, steady state at 1 kHz", () -> BenchCases.sweep(1e3, false));
        row(out, cases, "sweep 40 <N>, steady state at 80 MHz", () -> BenchCases.sweep(80e6, false));
        row(out, cases, "sweep 40 <N> at 80 MHz, with pulses-to-1%", () -> BenchCases.sweep(80e6, true));
        row(out, cases, BenchCases.SIMULATE_CASE, BenchCases::simulateCommand);
        KineticModel cooling = BenchCases.cooling21();
        if (skipCooling) {
            out.println("cooling-resolved case skipped (--skip-cooling)");
        } else {
            LadderKinetics hot = LadderKinetics.on(cooling, cooling.space(cooling.fixedNMax()));
            row(out, cases, "cooling trace, 231 states (engine built)", () -> BenchCases.traceOn(hot, 3).bleach()[0]);
            row(out, cases, "cooling trace, 231 states (incl. set-up)", () -> BenchCases.singleTrace(cooling).bleach()[0]);
        }
        if (update != null) {
            row(out, cases, "planner update after an edit (prediction)", update::predict);
            row(out, cases, "planner update after an edit (incl. chart build)", update::predictAndBuildCharts);
        }
        double peak = peakHeapMb();
        out.printf(Locale.ROOT, "peak heap used: %.1f MB (max heap %.0f MB)%n", peak,
                Runtime.getRuntime().maxMemory() / 1048576.0);
        out.flush();
        if (json) {
            ObjectNode root = ResolvedJson.object();
            ArrayNode a = root.putArray("cases");
            for (Timing t : cases) {
                ObjectNode c = a.addObject();
                c.put("name", t.name());
                c.put("medianMs", t.medianMs());
                c.put("minMs", t.minMs());
                c.put("maxMs", t.maxMs());
            }
            root.put("peakHeapMb", peak);
            PrintWriter data = quiet.data();
            data.print(ResolvedJson.toText(root));
            data.flush();
        }
        return ExitCodes.OK;
    }

    private void row(PrintWriter out, List<Timing> cases, String name, DoubleSupplier work) {
        Timing t = time(name, work);
        cases.add(t);
        out.printf(Locale.ROOT, "%-50s %9.3f%n", name, t.medianMs());
        out.flush();
    }

    /** Wall times in ms after warm-up runs. */
    private Timing time(String name, DoubleSupplier work) {
        double sink = 0;
        long warmEnd = System.nanoTime() + 300_000_000L;
        int warm = 0;
        while (warm < 3 || System.nanoTime() < warmEnd && warm < 2000) {
            sink += work.getAsDouble();
            warm++;
        }
        double[] ms = new double[repeats];
        for (int i = 0; i < repeats; i++) {
            long t0 = System.nanoTime();
            sink += work.getAsDouble();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        if (Double.isNaN(sink)) {
            throw new IllegalStateException("benchmark produced NaN");
        }
        java.util.Arrays.sort(ms);
        return new Timing(name, ms[repeats / 2], ms[0], ms[repeats - 1]);
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    /** Sum of the heap pools' peak usage since the reset (an upper bound on the live heap at any instant). */
    private static double peakHeapMb() {
        long bytes = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                bytes += pool.getPeakUsage().getUsed();
            }
        }
        return bytes / 1048576.0;
    }
}
