package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.ladderkin.units.Rounded;
import org.ladderkin.fit.ThresholdLawFit;
import org.ladderkin.fit.YieldSummary;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.FitResultJson;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.report.FitYieldsReport;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code ladderkin fit-yields RESULT.json... --gap 1.9eV}: the threshold-linear law of the multiplication yield across
 * photon energies, from fits that freed {@code multiplication-yield}.
 */
@Command(name = "fit-yields", mixinStandardHelpOptions = true,
        header = "Threshold law of multiplication yields across photon energies.",
        description = "Fits QY(ħω) = 1 + (ħω − E_th)/ε_eh above the threshold E_th (and 1 below) to the multiplication"
            + " yields of several fit results (each from 'fit --free multiplication-yield' at one photon energy, which"
            + " the result records as photonEnergyEv). Reports E_th and the pair-creation energy ε_eh over the gap with"
            + " their errors, the efficiency η_CM = E_g/ε_eh, and the energy-conservation limit (E_th = 2E_g,"
            + " ε_eh = E_g). Writes DIR/fit-yields.html and DIR/fit-yields.json with --out; --format json prints the result.")
final class FitYieldsCommand implements Callable<Integer> {

    /** Schema of the output. */
    static final String SCHEMA = "ladderkin.fit-yields/1";

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(arity = "1..*", paramLabel = "RESULT.json", description = "fit results (schema ladderkin.fit-result/1)")
    List<Path> results;

    @Option(names = "--gap", required = true, paramLabel = "PHOTON",
            description = "the band gap E_g as a photon energy or wavelength (e.g. 1.95eV or 636nm)")
    String gap;

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (created if missing)")
    Path outDir;

    @Option(names = "--format", paramLabel = "text|json", defaultValue = "text", description = "standard output (default ${DEFAULT-VALUE})")
    String format;

    @Override
    public Integer call() throws Exception {
        if (!format.equals("text") && !format.equals("json")) {
            throw new IllegalArgumentException("--format must be text or json, was " + format);
        }
        if (outDir != null) {
            AtomicFiles.checkWritableFolder(outDir);
        }
        double gapJ = Photon.parseEnergyJ(gap);
        double gapEv = gapJ / PhysicalConstants.ELEMENTARY_CHARGE_C;
        List<ThresholdLawFit.Point> points = new ArrayList<>();
        for (Path file : results) {
            points.add(point(file, gapEv));
        }
        ThresholdLawFit.Result r = ThresholdLawFit.fit(points);
        ObjectNode json = json(r, gapEv);
        if (outDir != null) {
            Files.createDirectories(outDir);
            ResolvedJson.write(outDir.resolve("fit-yields.json"), json);
            AtomicFiles.writeString(outDir.resolve("fit-yields.html"), FitYieldsReport.html(r, gapEv));
        }
        if (format.equals("json")) {
            PrintWriter out = quiet.data();
            out.print(ResolvedJson.toText(json));
            out.flush();
        } else {
            PrintWriter out = quiet.summary();
            out.println(String.format(Locale.ROOT, "Threshold law over %d photon energies (E_g = %.4g eV):", points.size(), gapEv));
            out.println("  E_th / E_g   " + Rounded.pm(r.thresholdOverGap(), r.thresholdStdError())
                    + "   (energy conservation: 2)");
            out.println("  ε_eh / E_g   " + Rounded.pm(r.pairEnergyOverGap(), r.pairEnergyStdError())
                    + "   (energy conservation: 1)");
            out.println("  η_CM         " + Rounded.pm(r.efficiency(), r.efficiencyStdError()));
            out.println(String.format(Locale.ROOT, "  χ² %.3g over %d degrees of freedom", r.chiSquare(), r.degreesOfFreedom()));
            if (outDir != null) {
                out.println("wrote " + outDir.resolve("fit-yields.html") + " and fit-yields.json");
            }
            out.flush();
        }
        return ExitCodes.OK;
    }

    /** One fit result's yield as QY = 1 + η at ħω/E_g; every problem is located in its file. */
    private static ThresholdLawFit.Point point(Path file, double gapEv) {
        Node root = JsonTree.read(file, file.toString());
        String schema = root.field("schema").string();
        if (!schema.equals(FitResultJson.SCHEMA)) {
            throw root.field("schema").error(InputProblem.WRONG_SCHEMA, "expected a fit result '" + FitResultJson.SCHEMA
                    + "', found '" + schema + "'");
        }
        Node photon = root.field("photonEnergyEv");
        double ev = photon.number();
        if (!(ev > 0)) {
            throw photon.error(InputProblem.OUT_OF_RANGE, "must be > 0 eV, was " + ev);
        }
        Node params = root.field("parameters");
        if (!params.has("multiplicationYield")) {
            throw params.error(InputProblem.MISSING_FIELD, "no 'multiplicationYield': fit with --free multiplication-yield");
        }
        Node eta = params.field("multiplicationYield");
        if (eta.field("fixed").bool()) {
            throw eta.field("fixed").error(InputProblem.INVALID_VALUE, "the yield was held, not fitted");
        }
        // with a refreshed run beside it, 'parameters' are the static run's and the yield is the refreshed run's
        java.util.Optional<Node> reported = root.optional("multiplicationYield").flatMap(m -> m.optional("eta"));
        if (reported.isPresent()) {
            eta = reported.get();
        }
        double value = eta.field("value").number();
        java.util.Optional<Node> se = eta.optional("stdError").filter(n -> n.kind() == Node.Kind.NUMBER && n.number() > 0);
        if (se.isEmpty()) {
            throw eta.error(InputProblem.INVALID_VALUE, "the yield has no stdError (it ran to a bound or its fit did not "
                    + "converge), so it cannot be weighted; refit or leave this result out");
        }
        return new ThresholdLawFit.Point(ev / gapEv, 1 + value, se.get().number(), file.getFileName().toString());
    }

    static ObjectNode json(ThresholdLawFit.Result r, double gapEv) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", SCHEMA);
        root.put("gapEv", gapEv);
        estimate(root.putObject("thresholdOverGap"), r.thresholdOverGap(), r.thresholdStdError());
        estimate(root.putObject("pairCreationEnergyOverGap"), r.pairEnergyOverGap(), r.pairEnergyStdError());
        estimate(root.putObject("efficiency"), r.efficiency(), r.efficiencyStdError());
        root.put("thresholdPairCreationCovariance", r.covariance());
        ObjectNode limit = root.putObject("energyConservationLimit");
        limit.put("thresholdOverGap", ThresholdLawFit.CONSERVATION_THRESHOLD_OVER_GAP);
        limit.put("pairCreationEnergyOverGap", ThresholdLawFit.CONSERVATION_PAIR_ENERGY_OVER_GAP);
        root.put("chiSquare", r.chiSquare());
        root.put("degreesOfFreedom", r.degreesOfFreedom());
        root.put("pointsAboveThreshold", r.pointsAbove());
        ArrayNode pts = root.putArray("points");
        for (ThresholdLawFit.Point p : r.points()) {
            ObjectNode o = pts.addObject();
            o.put("result", p.label());
            o.put("photonEnergyOverGap", p.photonEnergyOverGap());
            o.put("quantumYield", p.quantumYield());
            o.put("stdError", p.stdError());
        }
        return root;
    }

    /**
     * The yield's companions in a fit result: the photon energy it belongs to (read back by this command), the
     * early/late estimate beside the full fit's, and the upper-bound flag with its reason (nothing without a yield).
     */
    static void addTo(ObjectNode json, YieldSummary y) {
        if (y == null) {
            return;
        }
        y.photonEnergyJ().ifPresent(e -> json.put("photonEnergyEv", e / PhysicalConstants.ELECTRONVOLT_J));
        ObjectNode m = json.putObject("multiplicationYield");
        // the reported η: this run's, or the refreshed run's when one was given (then 'parameters' are the static run's)
        ObjectNode eta = m.putObject("eta");
        eta.put("value", y.eta());
        if (Double.isFinite(y.etaStdError())) {
            eta.put("stdError", y.etaStdError());
        }
        m.put("from", y.staticRun().isPresent() ? "refreshed run" : "this run");
        m.put("upperBound", y.upperBound());
        if (y.upperBound()) {
            m.put("reason", y.reason());
        }
        y.staticRun().ifPresent(s -> {
            // the static run's own η shows what charging would have added
            ObjectNode o = m.putObject("staticRun");
            o.put("eta", s.eta());
            o.put("chargedFraction", s.chargedFraction());
            if (!Double.isNaN(s.periodS())) {
                o.put("repRateMhz", 1e-6 / s.periodS());
            }
        });
        y.earlyLate().ifPresentOrElse(e -> {
            ObjectNode o = m.putObject("earlyLate");
            estimate(o.putObject("lowFluenceLimit"), e.limit(), e.limitStdError());
            o.put("eta", e.eta());
            o.put("earlyPs", e.earlyS() * 1e12);
            o.put("latePs", e.lateS() * 1e12);
            o.put("traces", e.x().length);
        }, () -> m.put("earlyLateNote", y.earlyLateNote()));
    }

    private static void estimate(ObjectNode o, double value, double stdError) {
        o.put("value", value);
        o.put("stdError", stdError);
    }
}
