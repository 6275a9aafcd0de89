package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.ladderkin.units.Rounded;
import org.ladderkin.archive.ArchiveException;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.archive.FitQuery;
import org.ladderkin.archive.PowerLawFit;
import org.ladderkin.archive.Trend;
import org.ladderkin.archive.TrendAxis;
import org.ladderkin.archive.TrendPoint;
import org.ladderkin.archive.TrendQuantity;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.material.Material;
import org.ladderkin.material.Shape;
import org.ladderkin.report.TrendReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code ladderkin trend --x volume --y tauAuger2 --out DIR}: a size trend across the archive's samples. */
@Command(name = "trend", mixinStandardHelpOptions = true,
        header = "Fit a size or energy trend across the archived samples.",
        description = {"Takes each sample's newest current fit from the archive and fits y = C·x^p in log-log, weighting each "
            + "point by its fit's standard error plus an intrinsic scatter found by restricted maximum likelihood. Prints "
            + "the exponent, prefactor and scatter with their errors (and τ₂/V for τ₂ against volume), flags points beyond "
            + "3σ, and writes DIR/trend-report.html (log-log chart with the library's scaling, samples, links to each "
            + "fit's report) and DIR/trend.json."})
final class TrendCommand implements Callable<Integer> {

    @Mixin
    QuietOption quiet;

    @Mixin
    ArchiveCommand.Where where;

    @Option(names = "--x", required = true, paramLabel = "AXIS", description = "volume, diameter, gap or first-peak")
    String x;

    @Option(names = "--y", required = true, paramLabel = "QUANTITY",
            description = "tauAuger2, tauAuger3, crossSection, tauRad or multiplicationYield")
    String y;

    @Option(names = "--material", paramLabel = "KEY", description = "only this material (repeatable; default all)")
    List<String> materials;

    @Option(names = "--all", description = "also superseded fits")
    boolean all;

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
        ArchiveLocation loc = where.location();
        Trend trend;
        try {
            TrendAxis axis = TrendAxis.of(x);
            TrendQuantity quantity = TrendQuantity.of(y);
            try (ArchiveStore store = loc.open()) {
                MaterialLibrary library = MaterialLibrary.fromHome();
                trend = Trend.of(store.fits(new FitQuery(materials, null, all)), axis, quantity,
                        m -> reference(library, m, axis, quantity));
            }
        } catch (ArchiveException e) {
            if (e.kind() == ArchiveException.Kind.INVALID && e.getMessage().startsWith("unknown --")) {
                throw new IllegalArgumentException(e.getMessage());
            }
            throw loc.located(e);
        }
        if (trend.materials().isEmpty()) {
            throw new IllegalArgumentException("no archived fit gives " + trend.y().parameterKey() + " with the sample's "
                    + trend.x().key() + (trend.skipped().isEmpty() ? "" : " (" + trend.skipped().size() + " left out: "
                    + trend.skipped().get(0).reason() + ")"));
        }
        ObjectNode json = json(trend);
        if (outDir != null) {
            Files.createDirectories(outDir);
            ResolvedJson.write(outDir.resolve("trend.json"), json);
            AtomicFiles.writeString(outDir.resolve("trend-report.html"), TrendReport.html(trend));
        }
        if (format.equals("json")) {
            quiet.data().print(ResolvedJson.toText(json));
            quiet.data().flush();
        } else {
            PrintWriter out = quiet.summary();
            summary(out, trend);
            if (outDir != null) {
                out.println("wrote " + outDir.resolve("trend-report.html") + " and trend.json");
            }
            out.flush();
        }
        return ExitCodes.OK;
    }

    /** The library's published τ₂ scaling in the trend's units: τ₂ = C·V, so on a diameter axis C·(π/6)·d³. */
    static Optional<Trend.ReferenceLine> reference(MaterialLibrary library, String material, TrendAxis x, TrendQuantity y) {
        if (y != TrendQuantity.TAU_AUGER2 || (x != TrendAxis.VOLUME && x != TrendAxis.DIAMETER)) {
            return Optional.empty();
        }
        Material m;
        try {
            m = library.material(material);
        } catch (IllegalArgumentException e) {
            return Optional.empty();
        }
        double perM3 = m.augerVolumeConstantSPerM3().value();
        if (!(perM3 > 0)) {
            return Optional.empty();
        }
        double psPerNm3 = perM3 * 1e12 * 1e-27;
        String source = m.augerVolumeConstantSPerM3().source();
        return Optional.of(x == TrendAxis.VOLUME ? new Trend.ReferenceLine(psPerNm3, 1, source)
                : new Trend.ReferenceLine(psPerNm3 * (m.shape() == Shape.SPHERE ? Math.PI / 6 : 1), 3, source));
    }

    static ObjectNode json(Trend t) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.trend/1");
        root.put("x", t.x().key());
        root.put("xUnit", t.x().unit());
        root.put("y", t.y().key());
        root.put("yKey", t.y().parameterKey());
        // the top-level line is the first material's (the usual case is one); every material is under byMaterial
        material(root, t.materials().get(0));
        ArrayNode by = root.putArray("byMaterial");
        t.materials().forEach(m -> material(by.addObject(), m));
        ArrayNode skipped = root.putArray("skipped");
        t.skipped().forEach(s -> skipped.addObject().put("sample", s.sample()).put("fitId", s.fitId()).put("reason", s.reason()));
        return root;
    }

    private static void material(ObjectNode o, Trend.MaterialTrend m) {
        o.put("material", m.material());
        PowerLawFit.Result f = m.fit();
        estimate(o, "exponent", f == null ? Double.NaN : f.exponent(), f == null ? Double.NaN : f.exponentStdError());
        estimate(o, "prefactor", f == null ? Double.NaN : f.prefactor(), f == null ? Double.NaN : f.prefactorStdError());
        estimate(o, "intrinsicScatterRel", f == null ? Double.NaN : f.scatterLn(), f == null ? Double.NaN : f.scatterLnStdError());
        PowerLawFit.Result a = m.augerVolumeConstant();
        if (a == null) {
            o.putNull("augerVolumeConstantPsPerNm3");
        } else {
            estimate(o, "augerVolumeConstantPsPerNm3", a.prefactor(), a.prefactorStdError());
        }
        m.reference().ifPresentOrElse(r -> o.putObject("reference").put("prefactor", r.prefactor()).put("exponent", r.exponent())
                .put("source", r.source()), () -> o.putNull("reference"));
        ArrayNode pts = o.putArray("points");
        for (int i = 0; i < m.points().size(); i++) {
            TrendPoint p = m.points().get(i);
            ObjectNode po = pts.addObject();
            po.put("sample", p.sample());
            po.put("x", p.x());
            po.put("y", p.y());
            po.put("yStdError", p.yStdError());
            po.put("fitId", p.fitId());
            po.put("outlier", f != null && f.outlier(i));
        }
    }

    private static void estimate(ObjectNode o, String key, double value, double se) {
        ObjectNode e = o.putObject(key);
        put(e, "value", value);
        put(e, "stdError", se);
    }

    private static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    private static void summary(PrintWriter out, Trend t) {
        out.println("Trend of " + t.y().label() + " against " + t.x().label());
        for (Trend.MaterialTrend m : t.materials()) {
            PowerLawFit.Result f = m.fit();
            if (f == null) {
                out.println(String.format(Locale.ROOT, "  %s: %d samples, too few for a line", m.material(), m.points().size()));
                continue;
            }
            out.println(String.format(Locale.ROOT, "  %s: %d samples, exponent %s, prefactor %s, intrinsic scatter %.1f %%",
                    m.material(), m.points().size(), Rounded.pm(f.exponent(), f.exponentStdError()),
                    Rounded.pm(f.prefactor(), f.prefactorStdError()), 100 * f.scatterLn()));
            if (m.augerVolumeConstant() != null) {
                out.println("    τ₂/V = " + Rounded.pm(m.augerVolumeConstant().prefactor(),
                        m.augerVolumeConstant().prefactorStdError()) + " ps/nm³ (exponent held at 1)");
            }
            m.reference().ifPresent(r -> out.println(String.format(Locale.ROOT, "    library scaling: %.4g·x^%.3g (%s)",
                    r.prefactor(), r.exponent(), r.source())));
            for (int i = 0; i < m.points().size(); i++) {
                if (f.outlier(i)) {
                    out.println(String.format(Locale.ROOT, "    outlier: %s (fit F%d) at %.1fσ", m.points().get(i).sample(),
                            m.points().get(i).fitId(), f.residualSigmas()[i]));
                }
            }
        }
        for (Trend.Skipped s : t.skipped()) {
            out.println("  left out: " + s.sample() + " (fit F" + s.fitId() + "): " + s.reason());
        }
    }
}
