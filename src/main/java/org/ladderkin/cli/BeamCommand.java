package org.ladderkin.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.ladderkin.units.Rounded;
import org.ladderkin.excite.beam.BeamPlane;
import org.ladderkin.excite.beam.BeamRadius;
import org.ladderkin.excite.beam.CausticFit;
import org.ladderkin.excite.beam.KnifeEdgeFit;
import org.ladderkin.excite.beam.SecondMoments;
import org.ladderkin.io.BeamFiles;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.material.Numbers;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code ladderkin beam}: 1/e² radii from knife-edge scans and camera frames, and the caustic through several planes. */
@Command(name = "beam", mixinStandardHelpOptions = true,
        header = "Beam radii from knife-edge scans or camera frames, and M².",
        description = "Beam radii for pump and probe spots: knife-edge scans (a table of blade position and power, one"
            + " power column per scan, 'x'/'y' and 'z=1mm' in its header) fitted with the Gaussian's erf profile"
            + " and checked by the 10-90 %% rule; camera frames (8/16-bit grayscale PNG, or a pixel matrix as"
            + " CSV/TSV) by the second-moment widths of ISO 11146-1 (D4σ). With radii at several z: the caustic"
            + " w(z) = w0·√(1+((z−z0)/zR)²), and M² = π·w0²/(λ·zR) with --wavelength.",
        footer = {"", "Example: ladderkin beam cam-z0.png cam-z1.png cam-z2.png cam-z3.png --pixel-pitch 5.5um \\",
            "           --z 0mm,5mm,10mm,15mm --wavelength 400nm"})
final class BeamCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "knife-edge tables, PNG frames or pixel matrices")
    List<Path> files;

    @Option(names = "--pixel-pitch", paramLabel = "PITCH", description = "camera pixel pitch, e.g. 5.5um (needed for images)")
    String pixelPitch;

    @Option(names = "--z", split = ",", paramLabel = "Z", description = "position along the beam of each file, e.g. 0mm,1mm,2mm")
    List<String> z;

    @Option(names = "--wavelength", paramLabel = "LAMBDA", description = "wavelength of the beam, e.g. 400nm (needed for M²)")
    String wavelength;

    @Option(names = "--saturation", paramLabel = "LEVEL", description = "saturation level of pixel matrices in counts (PNG: the largest code)")
    Double saturation;

    @Option(names = "--format", paramLabel = "FMT", defaultValue = "text", description = "text or json")
    String format;

    @Override
    public Integer call() {
        if (!format.equals("text") && !format.equals("json")) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--format must be text or json, was '" + format + "'");
        }
        if (z != null && z.size() != files.size()) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--z gives " + z.size() + " position" + (z.size() == 1 ? "" : "s")
                    + " for " + files.size() + " file" + (files.size() == 1 ? "" : "s") + " (one per file)");
        }
        if (saturation != null && !(saturation > 0)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--saturation must be > 0, was " + saturation);
        }
        double pitchM = pixelPitch == null ? Double.NaN : positive(pixelPitch, "--pixel-pitch");
        double lambdaM = wavelength == null ? Double.NaN : positive(wavelength, "--wavelength");
        BeamFiles.Options options = new BeamFiles.Options(pitchM, saturation == null ? Double.NaN : saturation);
        List<BeamFiles.Measurement> all = new ArrayList<>();
        for (int i = 0; i < files.size(); i++) {
            double zM = z == null ? Double.NaN : length(z.get(i), "--z");
            all.addAll(BeamFiles.measure(files.get(i), files.get(i).toString(), options, zM));
        }
        List<BeamPlane> planes = new ArrayList<>();
        for (BeamFiles.Measurement m : all) {
            if (Double.isNaN(m.zM())) {
                continue;
            }
            if (m instanceof BeamFiles.KnifeEdge k) {
                planes.add(new BeamPlane(k.zM(), k.axis(), k.radius().radiusM()));
            } else if (m instanceof BeamFiles.Image im) {
                planes.add(new BeamPlane(im.zM(), "x", im.moments().radiusXM()));
                planes.add(new BeamPlane(im.zM(), "y", im.moments().radiusYM()));
            }
        }
        Map<String, CausticFit> caustics = CausticFit.byAxis(planes, lambdaM);
        PrintWriter out = format.equals("json") ? quiet.data() : quiet.summary();
        if (format.equals("json")) {
            out.print(ResolvedJson.toText(json(all, caustics)));
        } else {
            text(all, caustics, planes.size(), out);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static double length(String text, String flag) {
        try {
            return Quantity.parseSi(text.strip(), Dimension.LENGTH);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(flag + ": " + e.getMessage(), e);
        }
    }

    private static double positive(String text, String flag) {
        double v = length(text, flag);
        if (!(v > 0)) {
            throw new IllegalArgumentException(flag + ": must be > 0, was " + text);
        }
        return v;
    }

    // ---- JSON

    private static ObjectNode json(List<BeamFiles.Measurement> all, Map<String, CausticFit> caustics) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.beam/1");
        ArrayNode list = root.putArray("measurements");
        for (BeamFiles.Measurement m : all) {
            ObjectNode o = list.addObject();
            o.put("file", m.file());
            if (Double.isNaN(m.zM())) {
                o.putNull("zMm");
            } else {
                o.put("zMm", m.zM() * 1e3);
            }
            if (m instanceof BeamFiles.KnifeEdge k) {
                KnifeEdgeFit f = k.fit();
                o.put("kind", "knife-edge");
                o.put("scan", k.label());
                o.put("axis", k.axis());
                estimate(o, "radius1e2Um", f.radius().radiusM() * 1e6, f.radius().stdErrorM() * 1e6);
                estimate(o, "centreUm", f.centreM() * 1e6, f.centreStdErrorM() * 1e6);
                number(o, "tenNinetyRadiusUm", f.tenNinetyRadiusM() * 1e6);
                o.put("rmsResidual", f.rmsResidual());
                o.put("points", f.points());
            } else if (m instanceof BeamFiles.Image im) {
                SecondMoments s = im.moments();
                o.put("kind", "image");
                estimate(o, "radius1e2Um", s.radius().radiusM() * 1e6, s.radius().stdErrorM() * 1e6);
                estimate(o, "d4SigmaXUm", s.d4SigmaXM() * 1e6, s.d4SigmaXStdErrorM() * 1e6);
                estimate(o, "d4SigmaYUm", s.d4SigmaYM() * 1e6, s.d4SigmaYStdErrorM() * 1e6);
                estimate(o, "centroidXUm", s.centroidXM() * 1e6, s.centroidXStdErrorM() * 1e6);
                estimate(o, "centroidYUm", s.centroidYM() * 1e6, s.centroidYStdErrorM() * 1e6);
                o.put("ellipticity", s.ellipticity());
                o.put("angleDeg", s.angleDeg());
                o.put("backgroundCounts", s.backgroundCounts());
                o.put("noiseCounts", s.noiseCounts());
                o.put("iterations", s.iterations());
                o.put("integrationAreaClipped", s.windowClipped());
            }
        }
        ArrayNode cs = root.putArray("caustics");
        for (var e : caustics.entrySet()) {
            CausticFit c = e.getValue();
            ObjectNode o = cs.addObject();
            o.put("axis", e.getKey());
            estimate(o, "waistRadiusUm", c.waistRadiusM() * 1e6, c.waistRadiusStdErrorM() * 1e6);
            estimate(o, "waistPositionMm", c.waistPositionM() * 1e3, c.waistPositionStdErrorM() * 1e3);
            estimate(o, "rayleighRangeMm", c.rayleighRangeM() * 1e3, c.rayleighRangeStdErrorM() * 1e3);
            estimate(o, "mSquared", c.mSquared(), c.mSquaredStdError());
            o.put("planes", c.points());
            o.put("planesWithinRayleighRange", c.planesNearWaist());
            o.put("planesBeyondTwoRayleighRanges", c.planesFarFromWaist());
            o.put("isoSampling", c.isoSampling());
        }
        return root;
    }

    private static void estimate(ObjectNode parent, String key, double value, double stdError) {
        ObjectNode o = parent.putObject(key);
        number(o, "value", value);
        number(o, "stdError", stdError);
    }

    private static void number(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    // ---- text

    private void text(List<BeamFiles.Measurement> all, Map<String, CausticFit> caustics, int planes, PrintWriter out) {
        for (BeamFiles.Measurement m : all) {
            String where = Double.isNaN(m.zM()) ? "" : ", z = " + num(m.zM() * 1e3) + " mm";
            if (m instanceof BeamFiles.KnifeEdge k) {
                KnifeEdgeFit f = k.fit();
                out.println(k.file() + ": knife edge '" + k.label() + "' (" + k.axis() + where + ")");
                out.println("  1/e² radius  " + pm(f.radius(), 1e6) + " µm (erf fit, " + f.points() + " points)");
                out.println("  10–90 % rule " + (Double.isNaN(f.tenNinetyRadiusM()) ? "not crossed by the data"
                        : num(f.tenNinetyRadiusM() * 1e6) + " µm" + agreement(f)));
                out.println("  centre       " + Rounded.pm(f.centreM() * 1e6, f.centreStdErrorM() * 1e6) + " µm");
            } else if (m instanceof BeamFiles.Image im) {
                SecondMoments s = im.moments();
                out.println(im.file() + ": camera frame (second moments, ISO 11146-1" + where + ")");
                out.println("  D4σx " + Rounded.pm(s.d4SigmaXM() * 1e6, s.d4SigmaXStdErrorM() * 1e6) + " µm, D4σy "
                        + Rounded.pm(s.d4SigmaYM() * 1e6, s.d4SigmaYStdErrorM() * 1e6) + " µm, ellipticity "
                        + Numbers.sig(s.ellipticity(), 3) + ", angle " + Numbers.sig(s.angleDeg(), 3) + "°"
                        + (s.ellipticity() > SecondMoments.CIRCULAR ? " (round within ISO's 0.87: the angle means little)" : ""));
                out.println("  1/e² radius  " + pm(s.radius(), 1e6) + " µm (√(wx·wy), wx = D4σx/2 for a Gaussian)");
                out.println("  centroid     (" + num(s.centroidXM() * 1e6) + ", " + num(s.centroidYM() * 1e6) + ") µm, background "
                        + num(s.backgroundCounts()) + " counts, noise " + num(s.noiseCounts()) + " counts rms");
                if (s.windowClipped()) {
                    out.println("  caution: the integration area (3 × the widths) reaches past the frame; the widths read short"
                            + " (centre the spot or use a larger frame)");
                }
            }
        }
        if (caustics.isEmpty()) {
            if (planes > 0) {
                out.println("No caustic: it needs radii at " + CausticFit.MIN_PLANES + " or more positions z per axis.");
            }
            return;
        }
        for (var e : caustics.entrySet()) {
            CausticFit c = e.getValue();
            out.println("Caustic (" + e.getKey() + ", " + c.points() + " planes): w0 = " + Rounded.pm(c.waistRadiusM() * 1e6,
                    c.waistRadiusStdErrorM() * 1e6) + " µm at z0 = " + Rounded.pm(c.waistPositionM() * 1e3,
                    c.waistPositionStdErrorM() * 1e3) + " mm, zR = " + Rounded.pm(c.rayleighRangeM() * 1e3,
                    c.rayleighRangeStdErrorM() * 1e3) + " mm, "
                    + (Double.isNaN(c.mSquared()) ? "M² needs --wavelength"
                            : "M² = " + Rounded.pm(c.mSquared(), c.mSquaredStdError())));
            out.println("  a sample within " + num(0.1 * c.rayleighRangeM() * 1e3) + " mm of z0 sees w within 0.5 % of w0");
            if (!c.isoSampling()) {
                out.println("  note: ISO 11146-1 asks for " + CausticFit.ISO_PLANES + " or more planes, about half within zR of the"
                        + " waist and half beyond 2·zR; here " + c.planesNearWaist() + " within and " + c.planesFarFromWaist()
                        + " beyond");
            }
        }
    }

    private static String agreement(KnifeEdgeFit f) {
        double d = f.tenNinetyRadiusM() / f.radius().radiusM() - 1;
        return Math.abs(d) <= 0.05 ? " (agrees with the fit)" : " (" + Numbers.sig(100 * d, 2) + " % from the fit: not a Gaussian "
                + "along this scan?)";
    }

    private static String pm(BeamRadius r, double scale) {
        return Rounded.pm(r.radiusM() * scale, r.stdErrorM() * scale);
    }

    private static String num(double v) {
        return Numbers.sig(v, 4);
    }
}
