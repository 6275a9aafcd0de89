package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicInteger;
import org.ladderkin.excite.ExcitationGeometry;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitIdentifiability;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.YieldSummary;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.OutputSet;
import org.ladderkin.io.FitResultJson;
import org.ladderkin.io.IrfFileReader;
import org.ladderkin.io.MissingValuePolicy;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceArguments;
import org.ladderkin.io.TraceSidecarCodec;
import org.ladderkin.io.TraceTableReader;
import org.ladderkin.kinetics.process.CoolingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.plan.PlanFitBasis;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.report.FitReport;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.Units;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin fit DATA... --model MODEL.json --fluences 1e13,3e13,... --out DIR}: a global fit of a measured
 * fluence series with the exciton ladder, shared parameters free or held, per-trace amplitude and baseline.
 */
@Command(name = "fit", mixinStandardHelpOptions = true,
        header = "Global fit of a transient-absorption fluence series.",
        description = "Global fit of a transient-absorption fluence series with the exciton ladder. DATA: delimited"
            + " tables, a delay column (unit in the header, e.g. 'delay (ps)') and one column per trace, or one"
            + " file per trace. Each trace's excitation comes from --fluences (in column order) or"
            + " --traces-json. Writes DIR/fit-report.html and DIR/fit-result.json with --out; --format json"
            + " prints the result.")
final class FitCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(arity = "1..*", paramLabel = "DATA", description = "trace tables (CSV/TSV)")
    List<Path> dataFiles;

    @Option(names = "--model", paramLabel = "MODEL.json", description = "model file (omit to build the model from the model flags, or from --plan's model)")
    Path modelFile;

    @Mixin
    ModelOptions modelOptions;

    @Mixin
    CountingOptions counting;

    @Option(names = "--fluences", split = ",", paramLabel = "X",
            description = "excitation per trace in column order: photon fluence (1e13 photons/cm²; bare numbers are read as "
                    + "set by --bare), pulse energy (2nJ) or energy fluence (0.3mJ/cm², needs --pump)")
    List<String> fluences;

    @Option(names = "--bare", paramLabel = "photons-per-cm2|n-avg", defaultValue = "photons-per-cm2",
            description = "how bare numbers in --fluences are read (default ${DEFAULT-VALUE})")
    String bare;

    @Option(names = "--pump", paramLabel = "PHOTON", description = "pump wavelength or photon energy (energy fluences, yields)")
    String pump;

    @Option(names = "--traces-json", paramLabel = "FILE", description = "per-trace metadata file (schema ladderkin.traces/1) instead of --fluences")
    Path sidecar;

    @Option(names = "--cross-section", paramLabel = "AREA", description = "start for σ (e.g. 5e-15cm2); default: a few starts")
    String crossSection;

    @Option(names = "--rep-rate", paramLabel = "FREQ", description = "pulse repetition rate (fit in the pulse-train steady state)")
    String repRate;

    @Option(names = "--free", split = ",", paramLabel = "NAME", completionCandidates = FitNames.class,
            description = "shared parameters to fit: ${COMPLETION-CANDIDATES} (default scale,tau-auger2, and time-zero "
                    + "with a Gaussian irf when the data hold delays before zero); the others are held at the model's values")
    List<String> free;

    @Option(names = "--pump-radius", paramLabel = "LENGTH",
            description = "pump 1/e² radius at the sample (Gaussian, e.g. 150um); with --probe-radius the fit averages over "
                    + "the spots and reads each trace's excitation as its on-axis (peak) value; default: the plan's")
    String pumpRadius;

    @Option(names = "--probe-radius", paramLabel = "LENGTH", description = "probe 1/e² radius at the sample (Gaussian)")
    String probeRadius;

    @Option(names = "--pump-od", paramLabel = "OD",
            description = "sample absorbance at the pump over the path (average over the depth, as the planner does)")
    String pumpOd;

    @Option(names = "--uniform-pump",
            description = "take the pump as uniform over the probe in a thin sample (ignore the plan's spots): for "
                    + "excitations that are already probe-averaged")
    boolean uniformPump;

    @Option(names = "--fluence-uncertainty", paramLabel = "FRACTION",
            description = "relative calibration uncertainty of the excitation (e.g. 8%% or 0.08), added to the errors as a prior "
                    + "(default: the --plan's calibration of pulse energy and radii, else none)")
    String fluenceUncertainty;

    @Option(names = "--time-zero", paramLabel = "TIME", defaultValue = "0ps", description = "time zero (start when freed)")
    String timeZero;

    @Option(names = "--irf", paramLabel = "TIME", description = "Gaussian IRF FWHM (start when freed); no IRF when omitted")
    String irf;

    @Option(names = "--irf-file", paramLabel = "FILE",
            description = "measured IRF: a table 'time (ps),response' (its centroid is time zero, its width fixed); not with --irf")
    Path irfFile;

    @Option(names = "--shared-amplitude", description = "one amplitude for all traces and no baselines (keeps the saturation curve in the fit)")
    boolean sharedAmplitude;

    @Option(names = "--profile", description = "profile-likelihood 68%% intervals for τ₂ and the scale")
    boolean profile;

    @Option(names = "--delay-unit", paramLabel = "UNIT", description = "delay unit when the header names none (e.g. ps)")
    String delayUnit;

    @Option(names = "--plan", paramLabel = "PLAN.json",
            description = "campaign plan to compare the fit with; without --model or model flags its model is the fit's start")
    Path planFile;

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (created if missing)")
    Path outDir;

    @Option(names = "--format", paramLabel = "text|json", defaultValue = "text", description = "standard output (default ${DEFAULT-VALUE})")
    String format;

    @Option(names = "--archive", arity = "0..1", fallbackValue = "", paramLabel = "FILE|JDBC-URL",
            description = "add the fit to the sample-series archive on success (default archive without a value)")
    String archive;

    @Mixin
    SampleOptions sample;

    @Mixin RefreshedRunOptions refreshed;

    @Override
    public Integer call() throws Exception {
        if (!format.equals("text") && !format.equals("json")) {
            throw new IllegalArgumentException("--format must be text or json, was " + format);
        }
        if (counting.requested()) {
            if (archive != null) {
                throw new IllegalArgumentException("--archive does not take counting fits yet (it keeps least-squares fits and plans)");
            }
            if (outDir != null) {
                AtomicFiles.checkWritableFolder(outDir);
            }
            return CountingFitRun.run(this, counting);
        }
        ArchiveHook.check(archive, outDir, sample, planFile);
        if (outDir != null) {
            AtomicFiles.checkWritableFolder(outDir);
            org.ladderkin.report.Charts.warmUpInBackground();
        }
        if (irf != null && irfFile != null) {
            throw new IllegalArgumentException("give either --irf (a Gaussian width) or --irf-file (a measured IRF), not both");
        }
        MeasuredIrf measured = irfFile == null ? null : IrfFileReader.read(irfFile, irfFile.toString());
        TableOptions table = new TableOptions(delayUnit == null ? null : Units.of(delayUnit.trim()), MissingValuePolicy.DROP);
        Dataset data = metadata(TraceTableReader.readAll(dataFiles, table));
        PlanFitBasis basis = planFile == null ? null : PlanFitBasis.of(PlanCodec.read(planFile));
        // with only a plan, the fit starts from the plan's own ladder (the one its predictions use)
        LadderModel base = modelFile == null && !modelOptions.given() && basis != null ? modelOptions.planModel(basis.base())
                : modelOptions.ladder(modelFile);
        Set<LadderParameter> freed = new LinkedHashSet<>();
        for (String f : free == null ? List.of("scale", "tau-auger2") : free) {
            if (!f.isBlank()) {
                freed.add(LadderParameter.of(f));
            }
        }
        refreshed.load(freed, table, bare, pump);
        LadderFitSetup setup = new LadderFitSetup(base, repRate == null ? Double.NaN : 1 / positive(repRate, Dimension.FREQUENCY, "--rep-rate"),
                freed, crossSection == null ? Double.NaN : positive(crossSection, Dimension.AREA, "--cross-section"),
                Quantity.parseSi(timeZero, Dimension.TIME), irf == null ? Double.NaN : positive(irf, Dimension.TIME, "--irf"),
                sharedAmplitude, profile, measured, geometry(basis), fluenceUncertainty == null && basis != null
                        ? basis.fluenceScaleRel() : fraction(fluenceUncertainty));
        if (free == null && !spec.commandLine().getParseResult().hasMatchedOption("--time-zero")) {
            setup = setup.withTimeZeroFreedFor(data);
        }
        PrintWriter err = spec.commandLine().getErr();
        if (base.has(CoolingProcess.LIFETIME) && !quiet.on()) {
            // a hot-resolved ladder has hundreds of states at ⟨N⟩ ≈ 5 and every trial of τ₂ rebuilds it
            err.println("note: the model resolves hot excitons (cooling), which makes every fit step slow (minutes); "
                    + "for delays beyond a few ps fit without the cooling process");
            err.flush();
        }
        // said before the work, as the fit tab does: a pair the data cannot tell apart makes a long fit end nowhere
        FitIdentifiability check = LadderFit.identifiability(data, setup);
        if (check.warns()) {
            err.println("warning: " + check.warning());
            err.flush();
        }
        LadderFit.Outcome outcome = LadderFit.fit(data, setup, quiet.on() ? FitProgress.NONE : progress(err));
        FitResult r = outcome.result();
        PlanComparison comparison = planFile == null || !r.ok() ? null : PlanComparison.of(planFile, outcome);
        ObjectNode json = FitResultJson.of(data, outcome, comparison == null ? null : comparison.json());
        YieldSummary yields = refreshed.analyse(data, setup, outcome, freed.contains(LadderParameter.MULTIPLICATION_YIELD) && r.ok()
                ? YieldSummary.of(data, setup, outcome, pump == null ? OptionalDouble.empty() : OptionalDouble.of(Photon.parseEnergyJ(pump)))
                : null, quiet.on() ? FitProgress.NONE : progress(err));
        FitYieldsCommand.addTo(json, yields);
        PrintWriter out = format.equals("json") ? quiet.data() : quiet.summary();
        if (outDir != null) {
            // result, report and provenance replace the previous fit's together, even if this run is killed
            try (OutputSet set = OutputSet.begin(outDir)) {
                ResolvedJson.write(set.resolve("fit-result.json"), json);
                AtomicFiles.writeString(set.resolve("fit-report.html"),
                        FitReport.html(data, outcome, comparison == null ? List.of() : comparison.rows(), yields));
                ArchiveHook.writeProvenance(set.folder(), dataFiles, sample, planFile,
                        "ladder; free: " + freed.stream().map(LadderParameter::key).toList());
                set.commit();
            }
        }
        ArchiveHook.afterFit(archive, outDir, r.ok(), out, err);
        if (format.equals("json")) {
            out.print(ResolvedJson.toText(json));
        } else {
            FitTextSummary.print(out, outcome);
            (yields == null ? List.<String>of() : yields.lines()).forEach(out::println);
            if (outDir != null) {
                out.println("wrote " + outDir.resolve("fit-report.html") + " and fit-result.json");
            }
        }
        out.flush();
        if (!r.ok()) {
            err.println("ladderkin fit: " + r.message());
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.OK;
    }

    /** The spots and depth from the flags, else from the plan, else none (a pump uniform over the probe, thin sample). */
    private ExcitationGeometry geometry(PlanFitBasis basis) {
        if (uniformPump) {
            if (pumpRadius != null || probeRadius != null || pumpOd != null) {
                throw new IllegalArgumentException("--uniform-pump ignores the spots: give it or --pump-radius/--probe-radius/--pump-od, not both");
            }
            return null;
        }
        if ((pumpRadius == null) != (probeRadius == null)) {
            throw new IllegalArgumentException("give both --pump-radius and --probe-radius (the fit averages over the probe's "
                    + "view of the pump), or neither");
        }
        double od = pumpOd == null ? Double.NaN : Quantity.parseSi(pumpOd.trim().matches("[-+]?[0-9.]+([eE][-+]?[0-9]+)?")
                ? pumpOd.trim() + " OD" : pumpOd, Dimension.ABSORBANCE);
        if (pumpOd != null && !(od >= 0 && Double.isFinite(od))) {
            throw new IllegalArgumentException("--pump-od must be >= 0, was " + pumpOd);
        }
        if (pumpRadius != null) {
            return new ExcitationGeometry(new GaussianBeam(positive(pumpRadius, Dimension.LENGTH, "--pump-radius")),
                    new GaussianBeam(positive(probeRadius, Dimension.LENGTH, "--probe-radius")), Double.isNaN(od) ? 0 : od,
                    !Double.isNaN(od));
        }
        if (basis != null) {
            ExcitationGeometry g = basis.geometry();
            return Double.isNaN(od) ? g : new ExcitationGeometry(g.pump(), g.probe(), od, true);
        }
        if (pumpOd != null) {
            throw new IllegalArgumentException("--pump-od needs the spots: give --pump-radius and --probe-radius (or --plan)");
        }
        return null;
    }

    /** "8%", "0.08" or nothing (0). */
    private static double fraction(String text) {
        if (text == null) {
            return 0;
        }
        String t = text.trim();
        double v;
        try {
            v = t.endsWith("%") ? Double.parseDouble(t.substring(0, t.length() - 1).trim()) / 100 : Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--fluence-uncertainty must be a fraction such as 8% or 0.08, was " + text);
        }
        if (!(v >= 0 && v < 1)) {
            throw new IllegalArgumentException("--fluence-uncertainty must be at least 0 and below 100%, was " + text);
        }
        return v;
    }

    private Dataset metadata(Dataset data) {
        if (sidecar != null) {
            if (fluences != null) {
                throw new IllegalArgumentException("give either --traces-json or --fluences, not both");
            }
            return TraceSidecarCodec.applyForFit(sidecar, data);
        }
        if (fluences == null) {
            if (data.traces().stream().allMatch(t -> t.metadata().excitation().isPresent())) {
                return data;
            }
            throw new IllegalArgumentException("give each trace's excitation with --fluences (in column order: "
                    + String.join(", ", data.labels()) + ") or --traces-json");
        }
        List<String> values = new ArrayList<>();
        for (String f : fluences) {
            String v = f.trim();
            boolean number = v.matches("[-+]?[0-9.]+([eE][-+]?[0-9]+)?");
            values.add(!number ? v : switch (bare) {
                case "photons-per-cm2" -> v + " photons/cm²";
                case "n-avg" -> v;
                default -> throw new IllegalArgumentException("--bare must be photons-per-cm2 or n-avg, was " + bare);
            });
        }
        return TraceArguments.apply(data, values, pump, "--fluences");
    }

    /**
     * Model evaluations with the elapsed time and the best reduced χ² met so far (a fit's length is not known in
     * advance, so the bar's fill only says how much of the fitter's limit is used); a start or profile step shows its
     * stage.
     */
    private static FitProgress progress(PrintWriter err) {
        ProgressBar bar = new ProgressBar(err);
        AtomicInteger starts = new AtomicInteger();
        long startNs = System.nanoTime();
        java.util.concurrent.atomic.AtomicReference<String> best = new java.util.concurrent.atomic.AtomicReference<>("");
        return new FitProgress() {
            @Override
            public void update(String stage, int step, int total) {
                if (stage.equals("evaluation")) {
                    long s = (System.nanoTime() - startNs) / 1_000_000_000L;
                    bar.step(Math.min(step, total - 1), total, String.format(Locale.ROOT, "fitting: %d:%02d elapsed, %d model "
                            + "evaluations%s", s / 60, s % 60, step, best.get()));
                } else {
                    bar.step(step, total, stage + " " + step + "/" + total + (stage.equals("start") ? "" : " ("
                            + starts.incrementAndGet() + ")"));
                }
            }

            @Override
            public void improved(Best b) {
                best.set(String.format(Locale.ROOT, ", best χ²/ν %.3g", b.reducedChiSquare()));
            }
        };
    }

    private static double positive(String text, Dimension d, String flag) {
        double x = Quantity.parseSi(text, d);
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException(flag + " must be > 0, was " + text);
        }
        return x;
    }

    /** The names {@code --free} accepts, from the fit's own list (the process registry's fittable lifetimes included). */
    static final class FitNames implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return LadderParameter.values().stream().map(LadderParameter::key).iterator();
        }
    }
}
