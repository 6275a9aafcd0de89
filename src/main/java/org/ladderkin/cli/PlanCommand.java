package org.ladderkin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.OutputSet;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.PlanOutputs;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.Planner;
import org.ladderkin.report.Cautions;
import org.ladderkin.report.ModeSections;
import org.ladderkin.report.PlanReport;
import org.ladderkin.plan.Goal;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.plan.WhatIf;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code ladderkin plan PLAN.json --out DIR}: plans a campaign and writes the report. */
@Command(name = "plan", mixinStandardHelpOptions = true,
        header = "Plan a campaign: settings, predicted signals, risks and a report.",
        description = "Turn a campaign plan (schema ladderkin.plan/1) into settings, predicted signals and a risk"
            + " table. Writes DIR/report.html, DIR/plan-resolved.json (every input and derived number with its"
            + " unit) and DIR/traces.csv.")
final class PlanCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(index = "0", paramLabel = "PLAN.json", description = "campaign plan file")
    Path planFile;

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (created if missing)")
    Path outDir;

    @Option(names = "--what-if", paramLabel = "CHANGE", description = {"also plan with one input changed and compare "
            + "(repeatable): refresh=static|stirred|flowing:<flow>:<cell volume>[:<cross-section>], rate=<frequency>"})
    List<String> whatIfs = new ArrayList<>();

    @Option(names = "--archive", arity = "0..1", fallbackValue = "", paramLabel = "FILE|JDBC-URL",
            description = "add the plan to the sample-series archive (default archive without a value)")
    String archive;


    @Override
    public Integer call() throws Exception {
        ArchiveHook.check(archive, outDir, null, null);
        if (outDir != null) {
            AtomicFiles.checkWritableFolder(outDir);
            org.ladderkin.report.Charts.warmUpInBackground();
        }
        PlanInputs inputs = PlanCodec.read(planFile);
        PrintWriter out = quiet.summary();
        printSummary(inputs, out);
        CampaignPlan plan;
        try {
            plan = Planner.plan(inputs, quiet.on() ? Planner.Progress.NONE : new ProgressBar(spec.commandLine().getErr()));
        } catch (IllegalArgumentException e) {
            // a plan the engine refuses (an excitation out of reach, a work bound) is still the plan file's to change
            throw new IllegalArgumentException(planFile + ": " + e.getMessage(), e);
        }
        printSettings(plan, out);
        List<WhatIf> variants = whatIfs.stream().map(w -> WhatIf.of(inputs, w, WhatIfArgument.parse(w))).toList();
        for (var v : variants) {
            out.println(String.format(java.util.Locale.ROOT, "What if %s: rate %s, excited or charged %.3g, charged %.3g, worst risk %s",
                    v.label(), fmt(v.plan().chosenRate().repetitionRateHz(), Dimension.FREQUENCY), v.plan().chosenRate().residual(),
                    v.plan().chosenRate().charged(), v.plan().risks().stream().map(r -> r.verdict())
                            .reduce(org.ladderkin.observe.Verdict.PASS, org.ladderkin.observe.Verdict::worst)));
        }
        if (outDir != null) {
            // the report and the files it was made from replace the previous run's together, even if this run is killed
            try (OutputSet set = OutputSet.begin(outDir)) {
                AtomicFiles.writeString(set.resolve("report.html"), PlanReport.html(plan, variants));
                PlanOutputs.write(plan, Cautions.texts(plan.cautions()), set.folder());
                set.commit();
            }
            out.println("wrote " + outDir.resolve("report.html") + ", plan-resolved.json, traces.csv");
            ArchiveHook.afterPlan(archive, outDir, out, spec.commandLine().getErr());
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static void printSettings(CampaignPlan plan, PrintWriter out) {
        out.println();
        out.println("Settings to dial in");
        var w = plan.chosenWavelength();
        out.println("  pump        " + fmt(w.wavelengthM(), Dimension.LENGTH) + "  (" + String.join("; ", w.reasons()) + ")");
        var r = plan.chosenRate();
        out.println("  rate        " + fmt(r.repetitionRateHz(), Dimension.FREQUENCY) + "  (picker ÷" + r.division() + ")");
        out.println(String.format(java.util.Locale.ROOT, "  at the top  ⟨N⟩ = %.4g (%s): excited or charged %.3g, charged %.3g, "
                        + "steady rise %.3g K", r.nAvgProbeWeighted(), fmt(r.pulseEnergyJ(), Dimension.ENERGY), r.residual(),
                r.charged(), r.steadyRiseK()));
        var h = plan.heat();
        out.println(String.format(java.util.Locale.ROOT, "  heat        averaged (⟨N⟩ = %.3g): %.3g K per pulse, one dot jumps %.3g K; "
                        + "hottest dots (pump axis, front face, ⟨N⟩ = %.3g): %.3g K per pulse, one dot jumps %.3g K; highest "
                        + "rise %.3g K", r.nAvgProbeWeighted(), h.perPulseRiseK(), h.dotJumpK(), h.hottest().nAvg(),
                h.hottest().perPulseRiseK(), h.hottest().dotJumpK(), h.peakRiseK()));
        out.println("              " + plan.rateChoice());
        out.println("  series      ⟨N⟩ probe-averaged ± relative (largest source) → pulse energy (attenuation)");
        for (var f : plan.fluences()) {
            out.println(String.format(java.util.Locale.ROOT, "              %7.3g ± %-4s (%s) → %-10s (%.2f OD)%s", f.nProbeAveraged(),
                    String.format(java.util.Locale.ROOT, "%.0f %%", 100 * f.nAvgRel()), f.nAvgDominant(),
                    fmt(f.pulseEnergyJ(), Dimension.ENERGY), f.attenuatorOd(), f.reachable() ? "" : "  OUT OF RANGE"));
        }
        if (plan.design() != null) {
            var d = plan.design();
            for (var e : d.best().expected()) {
                out.println(String.format(java.util.Locale.ROOT, "  expected    %s ± %.2g %% (statistical %.2g %%, systematic %.2g %%; "
                                + "naive series ± %.2g %%); largest source: %s", e.parameter().label(), 100 * e.totalRel(),
                        100 * e.statisticalRel(), 100 * e.systematicRel(), 100 * d.naive().error(e.parameter()), e.dominant()));
                out.println("              " + e.advice());
            }
            var b = d.best();
            out.println(String.format(java.util.Locale.ROOT, "  delays      %d points (%s), %s to %s, %s per point; scored by the design",
                    b.delaysS().length, b.grid(), fmt(b.delaysS()[0], Dimension.TIME), fmt(b.delaysS()[b.delaysS().length - 1],
                            Dimension.TIME), fmt(b.timePerPointS(), Dimension.TIME)));
        }
        if (plan.delayPlans().stream().anyMatch(d -> d.instrument().kind() == org.ladderkin.plan.Instrument.Kind.TRANSIENT_ABSORPTION)) {
            out.println("  ta          " + ModeSections.defaultsLine(plan, ModeSections.Mode.TRANSIENT_ABSORPTION));
        }
        for (var d : plan.delayPlans()) {
            if (d.counting() != null) {
                out.println("  tcspc       " + ModeSections.countingLine(d));
                d.counting().notPlanned().forEach(n -> out.println("              not planned: " + n));
                out.println("              " + ModeSections.defaultsLine(plan, ModeSections.Mode.COUNTING));
            }
        }
        if (plan.multiplicationPlan() != null) {
            ModeSections.multiplicationLines(plan).forEach(l -> out.println("  multiply    " + l));
        }
        if (plan.gain() != null) {
            ModeSections.gainLines(plan).forEach(l -> out.println("  gain        " + l));
        }
        out.println("Risks");
        for (var risk : plan.risks()) {
            out.println(String.format(java.util.Locale.ROOT, "  %-5s %s: %s", risk.verdict(), risk.name(), risk.why()));
        }
    }

    private static void printSummary(PlanInputs plan, PrintWriter out) {
        out.println("Plan: " + plan.title());
        if (!plan.lab().isEmpty()) {
            out.println("Lab:  " + plan.lab());
        }
        out.println();
        SampleReport.print(plan.sample(), out);
        SampleReport.printAdvisories(plan.sample().advisories(), out);
        LaserSetup l = plan.laser();
        out.println("Laser    pump at " + String.join(", ", l.pumpWavelengthsM().stream()
                        .map(w -> fmt(w, Dimension.LENGTH) + " (" + fmt(Photon.energyJ(w), Dimension.ENERGY) + ")").toList())
                + "; " + fmt(l.repetitionRateHz(), Dimension.FREQUENCY) + ", picker ÷" + l.pulsePickerDivisions());
        out.println("         " + fmt(l.pulseFwhmS(), Dimension.TIME) + " pulses, " + fmt(l.minPulseEnergyJ(), Dimension.ENERGY)
                + " to " + fmt(l.maxPulseEnergyJ(), Dimension.ENERGY) + ", pump radius " + fmt(l.pumpRadiusM(), Dimension.LENGTH)
                + ", probe radius " + fmt(l.probeRadiusM(), Dimension.LENGTH) + " (1/e²)");
        var cal = l.calibration().orDefaults();
        out.println("         known to: pulse energy " + pct(cal.pulseEnergyRel()) + ", pump radius " + pct(cal.pumpRadiusRel())
                + ", probe radius " + pct(cal.probeRadiusRel()) + (Double.isNaN(cal.crossSectionRel()) ? "" : ", σ " + pct(cal.crossSectionRel()))
                + "; pump fluctuation " + pct(l.pumpFluctuationOrDefault()) + " per point, drift " + pct(l.driftPerHourOrDefault())
                + " per hour (unstated values: defaults, common practice)");
        for (Instrument i : plan.instruments()) {
            out.println("Detect   " + i.kind().key() + ": " + fmt(i.minDelayS(), Dimension.TIME) + " to " + fmt(i.maxDelayS(), Dimension.TIME)
                    + ", IRF " + fmt(i.irfFwhmS(), Dimension.TIME)
                    + (i.measuredIrf() == null ? "" : " (measured, " + i.measuredIrf().origin() + ")")
                    + (i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION
                    ? ", noise floor " + String.format(java.util.Locale.ROOT, "%.2g", i.noiseFloor()) + " OD"
                    : ", count rate ≤ " + pct(i.maxCountFraction()) + " of the repetition rate"));
        }
        out.println("Goals    " + String.join("; ", plan.goals().stream().sorted().map(Goal::description).toList()));
        out.println("Limits   temperature rise ≤ " + fmt(plan.limits().maxTemperatureRiseK(), Dimension.TEMPERATURE)
                + ", charged ≤ " + pct(plan.limits().maxChargedFraction())
                + ", residual excitation ≤ " + pct(plan.limits().maxResidualExcitation())
                + ", beam time " + fmt(plan.limits().beamTimeS(), Dimension.TIME));
        out.println();
        out.println("Safety   Class 4 pulsed lasers can blind and burn: follow your institution's laser safety officer and local rules.");
    }

    private static String fmt(double si, Dimension d) {
        return Quantity.formatBest(si, d, 4);
    }

    private static String pct(double fraction) {
        return String.format(java.util.Locale.ROOT, "%.3g %%", fraction * 100);
    }
}
