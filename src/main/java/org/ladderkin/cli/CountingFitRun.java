package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.fit.ProfileInterval;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.counting.CountHistogram;
import org.ladderkin.fit.counting.CountingFit;
import org.ladderkin.fit.counting.InstrumentResponse;
import org.ladderkin.fit.counting.IntegratedPlFit;
import org.ladderkin.fit.counting.LikelihoodResult;
import org.ladderkin.fit.counting.PileUp;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.HistogramReader;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.IntegratedPlReader;
import org.ladderkin.io.IrfFileReader;
import org.ladderkin.io.MissingValuePolicy;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceArguments;
import org.ladderkin.io.TraceTableReader;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.report.CountingFitReport;
import org.ladderkin.report.FitReport;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.Rounded;
import org.ladderkin.units.Units;

/** {@code fit --counts}: reads histograms (and TA tables for a joint fit), fits by likelihood, prints and writes. */
final class CountingFitRun {

    /** ⟨N⟩ of the strongest histogram that the automatic σ start aims at. */
    private static final double AUTO_TOP_N = 2;

    private CountingFitRun() {
    }

    static int run(FitCommand c, CountingOptions o) throws Exception {
        if (o.integrated) {
            if (o.on) {
                throw new IllegalArgumentException("give either --counts (histograms) or --pl-integrated (integrated PL), not both");
            }
            return integrated(c);
        }
        if (c.planFile != null || c.sidecar != null) {
            throw new IllegalArgumentException("--counts takes its excitations from --fluences (no --plan or --traces-json yet)");
        }
        double channelS = o.channelWidth == null ? Double.NaN : positive(o.channelWidth, "--channel-width");
        List<CountHistogram> histograms = new ArrayList<>();
        for (Path p : c.dataFiles) {
            histograms.addAll(HistogramReader.read(p, p.toString(), channelS, true));
        }
        if (c.fluences == null) {
            throw new IllegalArgumentException("give each histogram's photon fluence with --fluences (in column order: "
                    + String.join(", ", histograms.stream().map(CountHistogram::label).toList()) + ")");
        }
        double[] x = fluences(histograms.stream().map(CountHistogram::label).toList(), c.fluences, c.pump, "--fluences");
        for (int i = 0; i < x.length; i++) {
            histograms.set(i, histograms.get(i).withExcitation(x[i]));
        }
        if (c.irf != null && c.irfFile != null) {
            throw new IllegalArgumentException("give either --irf (a Gaussian width) or --irf-file (a measured IRF), not both");
        }
        InstrumentResponse response;
        if (c.irfFile != null) {
            MeasuredIrf irf = IrfFileReader.read(c.irfFile, c.irfFile.toString());
            response = InstrumentResponse.measured(irf);
            for (CountHistogram h : histograms) {
                if (response.spanS() >= h.windowS()) {
                    throw new InputException(SourceLocation.of(c.irfFile.toString()), null, InputProblem.OUT_OF_RANGE,
                            String.format(Locale.ROOT, "the IRF spans %.4g ns, longer than the window of histogram '%s' "
                                    + "(%.4g ns) (crop the IRF to its peak and tails, or record a longer window)",
                                    response.spanS() * 1e9, h.label(), h.windowS() * 1e9));
                }
            }
        } else if (c.irf != null) {
            response = InstrumentResponse.gaussian();
        } else {
            throw new IllegalArgumentException("--counts needs the instrument response: --irf FWHM (Gaussian) or --irf-file FILE");
        }
        Dataset ta = null;
        if (o.taFiles != null) {
            if (o.taFluences == null) {
                throw new IllegalArgumentException("give the --ta traces' photon fluences with --ta-fluences");
            }
            Dataset read = TraceTableReader.readAll(o.taFiles, new TableOptions(c.delayUnit == null ? null : Units.of(c.delayUnit.trim()),
                    MissingValuePolicy.DROP));
            ta = TraceArguments.apply(read, bare(o.taFluences, c.bare), c.pump, "--ta-fluences");
        }
        LadderModel base = c.modelOptions.ladder(c.modelFile);
        Set<String> lifetimes = new LinkedHashSet<>();
        boolean scaleFree = false;
        boolean irfFree = false;
        for (String f : c.free == null ? List.of("scale", "tau-auger2") : c.free) {
            switch (f.trim()) {
                case "scale" -> scaleFree = true;
                case "irf" -> irfFree = true;
                // the response's shift (time zero) is always fitted in a counting fit
                case "", "time-zero" -> { }
                default -> lifetimes.add(org.ladderkin.fit.LadderFitSetup.LadderParameter.of(f).key());
            }
        }
        double top = 0;
        for (double v : x) {
            top = Math.max(top, v);
        }
        double sigmaStart = c.crossSection == null ? AUTO_TOP_N / top : positive(c.crossSection, Dimension.AREA, "--cross-section");
        List<String> profile = new ArrayList<>();
        if (c.profile) {
            if (scaleFree) {
                profile.add(CountingFit.SCALE);
            }
            if (lifetimes.contains("tau-auger2")) {
                profile.add("tauAuger2S");
            }
        }
        CountingFit.Setup setup = new CountingFit.Setup(base, sigmaStart, scaleFree, lifetimes,
                c.repRate == null ? Double.NaN : 1 / positive(c.repRate, Dimension.FREQUENCY, "--rep-rate"), response,
                c.irf == null ? Double.NaN : positive(c.irf, Dimension.TIME, "--irf"), irfFree,
                o.pileUpCycles == null ? null : new PileUp(o.pileUpCycles), profile);
        LikelihoodResult r = CountingFit.fit(histograms, ta, setup);
        ObjectNode json = json(r, histograms, ta, response, o);
        PrintWriter out = c.format.equals("json") ? c.quiet.data() : c.quiet.summary();
        if (c.outDir != null) {
            Files.createDirectories(c.outDir);
            ResolvedJson.write(c.outDir.resolve("fit-result.json"), json);
            List<String> files = new ArrayList<>(c.dataFiles.stream().map(Path::toString).toList());
            if (o.taFiles != null) {
                o.taFiles.forEach(f -> files.add(f.toString()));
            }
            List<String> notes = new ArrayList<>();
            notes.add("Instrument response: " + (response.isMeasured() ? FitReport.measuredIrfNote(response.measuredIrf())
                    : "Gaussian") + "; its shift is fitted.");
            if (o.pileUpCycles != null) {
                notes.add("Pile-up: classical dead-time correction (Coates 1968) over " + o.pileUpCycles + " excitation cycles.");
            }
            AtomicFiles.writeString(c.outDir.resolve("fit-report.html"),
                    CountingFitReport.html(new CountingFitReport.Input(files, histograms, ta, r, notes)));
        }
        if (c.format.equals("json")) {
            out.print(ResolvedJson.toText(json));
        } else {
            summary(out, r, histograms);
            if (c.outDir != null) {
                out.println("wrote " + c.outDir.resolve("fit-report.html") + " and fit-result.json");
            }
        }
        out.flush();
        if (!r.ok()) {
            PrintWriter err = c.spec.commandLine().getErr();
            err.println("ladderkin fit: " + r.message());
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.OK;
    }

    /** {@code fit --pl-integrated}: σ, and τ₂ with the biexciton emission yield when freed, from integrated PL. */
    private static int integrated(FitCommand c) throws Exception {
        if (c.dataFiles.size() != 1) {
            throw new IllegalArgumentException("--pl-integrated takes one table, was given " + c.dataFiles.size());
        }
        IntegratedPlReader.Table t = IntegratedPlReader.read(c.dataFiles.get(0), c.dataFiles.get(0).toString());
        Set<String> lifetimes = new LinkedHashSet<>();
        for (String f : c.free == null ? List.of("scale", "tau-auger2") : c.free) {
            if (!f.isBlank() && !f.trim().equals("scale")) {
                lifetimes.add(org.ladderkin.fit.LadderFitSetup.LadderParameter.of(f).key());
            }
        }
        double top = t.fluencesPerM2()[t.fluencesPerM2().length - 1];
        double sigmaStart = c.crossSection == null ? AUTO_TOP_N / top : positive(c.crossSection, Dimension.AREA, "--cross-section");
        IntegratedPlFit.Outcome o = IntegratedPlFit.fit(t.fluencesPerM2(), t.pl(), c.modelOptions.ladder(c.modelFile), sigmaStart,
                lifetimes);
        LikelihoodResult r = o.result();
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.fit-pl-integrated/1");
        root.put("status", r.status().name().toLowerCase(Locale.ROOT));
        root.put("message", r.message());
        ObjectNode shared = root.putObject("parameters");
        for (ParameterEstimate e : r.estimates()) {
            ParameterNaming.TradeKey k = ParameterNaming.trade(e.key());
            shared.putObject(k.key()).put("value", e.value() * k.factor()).put("stdError", e.stdError() * k.factor())
                    .put("fixed", e.fixed());
        }
        root.put("biexcitonEmissionYield", o.biexcitonYield());
        root.put("chiSquare", r.chiSquare());
        root.put("degreesOfFreedom", r.degreesOfFreedom());
        PrintWriter out = c.format.equals("json") ? c.quiet.data() : c.quiet.summary();
        if (c.outDir != null) {
            Files.createDirectories(c.outDir);
            ResolvedJson.write(c.outDir.resolve("fit-result.json"), root);
        }
        if (c.format.equals("json")) {
            out.print(ResolvedJson.toText(root));
        } else {
            out.println("Integrated-PL fit: " + r.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                    + (r.message().isEmpty() ? "" : " — " + r.message()));
            for (ParameterEstimate e : r.estimates()) {
                ParameterNaming.TradeKey k = ParameterNaming.trade(e.key());
                out.println(String.format(Locale.ROOT, "  %-16s %-12s %s", k.key(),
                        e.fixed() ? num5(e.value() * k.factor()) : Rounded.value(e.value() * k.factor(), e.stdError() * k.factor()),
                        e.fixed() ? "(fixed)" : "± " + Rounded.error(e.stdError() * k.factor())));
            }
            out.println(String.format(Locale.ROOT, "  biexciton emission yield %.3g", o.biexcitonYield()));
        }
        out.flush();
        return r.ok() ? ExitCodes.OK : ExitCodes.BAD_INPUT;
    }

    /** Photon fluences (photons/m²) of the named data sets, read as {@code fit --fluences} reads them. */
    private static double[] fluences(List<String> labels, List<String> values, String pump, String option) {
        List<Trace> placeholders = new ArrayList<>();
        for (String l : labels) {
            placeholders.add(Trace.of(l, new double[] {0, 1}, new double[] {0, 0}));
        }
        Dataset d = TraceArguments.apply(new Dataset(placeholders, List.of()), bare(values, "photons-per-cm2"), pump, option);
        double[] x = new double[labels.size()];
        for (int i = 0; i < x.length; i++) {
            Excitation e = d.traces().get(i).metadata().excitation().orElseThrow();
            if (e.kind() != Excitation.Kind.PHOTON_FLUENCE_PER_M2) {
                throw new InputException(SourceLocation.of(option), "[" + (i + 1) + "]", InputProblem.WRONG_UNIT,
                        "a counting fit needs photon fluences (e.g. 1e13 or 1e13photons/cm2; an energy fluence with --pump)");
            }
            x[i] = e.value();
        }
        return x;
    }

    private static List<String> bare(List<String> values, String bare) {
        List<String> out = new ArrayList<>();
        for (String f : values) {
            String v = f.trim();
            boolean number = v.matches("[-+]?[0-9.]+([eE][-+]?[0-9]+)?");
            out.add(number && bare.equals("photons-per-cm2") ? v + " photons/cm²" : v);
        }
        return out;
    }

    private static ObjectNode json(LikelihoodResult r, List<CountHistogram> histograms, Dataset ta, InstrumentResponse response,
                                   CountingOptions o) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.fit-counts/1");
        root.put("status", r.status().name().toLowerCase(Locale.ROOT));
        root.put("message", r.message());
        root.put("statistics", ta == null ? "poisson" : "poisson+gaussian");
        ObjectNode shared = root.putObject("parameters");
        for (ParameterEstimate e : r.estimates()) {
            if (e.shared()) {
                ParameterNaming.TradeKey t = ParameterNaming.trade(e.key());
                ObjectNode p = shared.putObject(t.key());
                p.put("value", e.value() * t.factor());
                p.put("stdError", e.stdError() * t.factor());
                p.put("fixed", e.fixed());
                r.profile(e.key()).ifPresent((ProfileInterval pi) -> {
                    p.put("profileLower", pi.lower() * t.factor());
                    p.put("profileUpper", pi.upper() * t.factor());
                });
            }
        }
        ArrayNode hs = root.putArray("histograms");
        for (int i = 0; i < histograms.size(); i++) {
            CountHistogram h = histograms.get(i);
            ObjectNode n = hs.addObject();
            n.put("label", h.label());
            n.put("photonFluencePerCm2", h.excitation() * 1e-4);
            int part = i;
            r.find("amplitude", part).ifPresent(e -> n.put("amplitude", e.value()).put("amplitudeStdError", e.stdError()));
            r.find("background", part).ifPresent(e -> n.put("backgroundCountsPerBin", e.value()).put("backgroundStdError", e.stdError()));
            if (r.ok()) {
                n.put("meanOccupancy", r.estimate(CountingFit.SCALE).value() * h.excitation());
            }
        }
        root.put("poissonDeviance", r.poissonDeviance());
        root.put("degreesOfFreedom", r.degreesOfFreedom());
        root.put("countBins", r.countBins());
        root.put("goodnessOfFitP", r.goodnessOfFit());
        if (ta != null) {
            root.put("taChiSquare", r.chiSquare());
            root.put("taPoints", r.points() - r.countBins());
        }
        root.put("freeParameters", r.freeParameters());
        root.put("irf", response.isMeasured() ? "measured: " + response.measuredIrf().origin() : "gaussian");
        if (o.pileUpCycles != null) {
            root.put("pileUpCorrection", "classical dead-time correction (Coates 1968), " + o.pileUpCycles + " cycles");
        }
        return root;
    }

    private static void summary(PrintWriter out, LikelihoodResult r, List<CountHistogram> histograms) {
        out.println("Counting fit (Poisson likelihood): " + r.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                + (r.message().isEmpty() ? "" : " — " + r.message()));
        if (!r.ok()) {
            return;
        }
        for (ParameterEstimate e : r.estimates()) {
            if (e.shared()) {
                ParameterNaming.TradeKey t = ParameterNaming.trade(e.key());
                out.println(String.format(Locale.ROOT, "  %-16s %-12s %s", t.key(),
                        e.fixed() ? num5(e.value() * t.factor()) : Rounded.value(e.value() * t.factor(), e.stdError() * t.factor()),
                        e.fixed() ? "(fixed)" : "± " + Rounded.error(e.stdError() * t.factor())));
            }
        }
        out.println(String.format(Locale.ROOT, "  Poisson deviance %.2f over %d bins, %d degrees of freedom (P = %.3g)",
                r.poissonDeviance(), r.countBins(), r.degreesOfFreedom(), r.goodnessOfFit()));
        if (r.chiSquare() > 0) {
            out.println(String.format(Locale.ROOT, "  TA χ² %.2f over %d points", r.chiSquare(), r.points() - r.countBins()));
        }
        for (int i = 0; i < histograms.size(); i++) {
            out.println(String.format(Locale.ROOT, "  %s: ⟨N⟩ %.3g", histograms.get(i).label(),
                    r.estimate(CountingFit.SCALE).value() * histograms.get(i).excitation()));
        }
    }

    private static double positive(String text, String flag) {
        return positive(text, Dimension.TIME, flag);
    }

    private static double positive(String text, Dimension d, String flag) {
        double v = Quantity.parseSi(text, d);
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(flag + " must be > 0, was " + text);
        }
        return v;
    }

    private static String num5(double v) {
        return String.format(Locale.ROOT, "%.5g", v);
    }
}
