package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.excite.beam.BeamException;
import org.ladderkin.excite.beam.BeamImage;
import org.ladderkin.excite.beam.BeamRadius;
import org.ladderkin.excite.beam.KnifeEdgeFit;
import org.ladderkin.excite.beam.SecondMoments;

/**
 * Beam measurements from files: a knife-edge table ({@link KnifeEdgeReader}) or a camera frame ({@link BeamImageReader}:
 * a PNG, or a text matrix, told from a table by having no header). Problems the maths finds (no edge, no spot,
 * saturated pixels) come back as located {@link InputException}s at the scan's header cell or the file.
 */
public final class BeamFiles {

    /**
     * @param pixelPitchM     camera pixel pitch, NaN when not given (then images are refused)
     * @param saturationLevel saturation level of text matrices, NaN when not checked
     */
    public record Options(double pixelPitchM, double saturationLevel) {

        public Options {
            if (!(pixelPitchM > 0) && !Double.isNaN(pixelPitchM)) {
                throw new IllegalArgumentException("pixel pitch must be > 0, was " + pixelPitchM + " m");
            }
            if (!(saturationLevel > 0) && !Double.isNaN(saturationLevel)) {
                throw new IllegalArgumentException("saturation level must be > 0, was " + saturationLevel);
            }
        }

        /** No pixel pitch, no saturation level. */
        public static Options none() {
            return new Options(Double.NaN, Double.NaN);
        }
    }

    /** One measured beam cross-section. */
    public sealed interface Measurement permits KnifeEdge, Image {

        /** The file as the user named it. */
        String file();

        /** Position along the beam, NaN when unknown. */
        double zM();

        /** The 1/e² radius with its standard error (the equivalent radius √(wx·wy) for an image). */
        BeamRadius radius();
    }

    /** One knife-edge scan of a table. */
    public record KnifeEdge(String file, String label, String axis, double zM, KnifeEdgeFit fit) implements Measurement {
        @Override
        public BeamRadius radius() {
            return fit.radius();
        }
    }

    /** One camera frame. */
    public record Image(String file, double zM, SecondMoments moments) implements Measurement {
        @Override
        public BeamRadius radius() {
            return moments.radius();
        }
    }

    private BeamFiles() {
    }

    /**
     * The 1/e² radius of the beam in {@code path}: a knife-edge table with one scan (or one x and one y scan, combined
     * to √(wx·wy)), or a PNG or text matrix with the given pixel pitch.
     */
    public static BeamRadius radius(Path path, double pixelPitchM) {
        List<Measurement> m = measure(path, path.toString(), new Options(pixelPitchM, Double.NaN), Double.NaN);
        if (m.size() == 1) {
            return m.get(0).radius();
        }
        if (m.size() == 2 && m.get(0) instanceof KnifeEdge a && m.get(1) instanceof KnifeEdge b && !a.axis().equals(b.axis())) {
            return BeamRadius.equivalent(a.radius(), b.radius());
        }
        throw new InputException(SourceLocation.of(path.toString()), null, InputProblem.MISMATCH, m.size() + " scans in one file "
                + "(a single radius comes from one scan, or one x and one y scan)");
    }

    /** {@link #radius(Path, double)} for a knife-edge table (an image needs a pixel pitch). */
    public static BeamRadius radius(Path path) {
        return radius(path, Double.NaN);
    }

    /** Whether {@code path} holds a camera frame rather than a knife-edge table. */
    public static boolean isImage(Path path, String displayName) {
        if (BeamImageReader.isPng(path)) {
            return true;
        }
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            String first = in.nextContentLine();
            if (first == null) {
                return false;
            }
            in.detectDelimiter(first);
            String[] cells = new String[in.count(first)];
            in.split(first, cells, new int[cells.length]);
            for (String c : cells) {
                String t = c.strip().replace(',', '.');
                if (t.isEmpty() || !t.matches("[-+]?[0-9]*\\.?[0-9]+([eE][-+]?[0-9]+)?")) {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * Every measurement in {@code path}.
     *
     * @param zM position along the beam for the whole file, or NaN to take it from the table's headers
     */
    public static List<Measurement> measure(Path path, String displayName, Options options, double zM) {
        if (isImage(path, displayName)) {
            if (Double.isNaN(options.pixelPitchM())) {
                throw new InputException(SourceLocation.of(displayName), null, InputProblem.MISSING_FIELD,
                        "a camera image needs its pixel pitch (give --pixel-pitch, e.g. 5.5um)");
            }
            BeamImage image = BeamImageReader.read(path, displayName, options.saturationLevel());
            try {
                return List.of(new Image(displayName, zM, SecondMoments.of(image, options.pixelPitchM())));
            } catch (BeamException e) {
                throw located(SourceLocation.of(displayName), null, e);
            }
        }
        List<Measurement> out = new ArrayList<>();
        for (KnifeEdgeReader.Scan s : KnifeEdgeReader.read(path, displayName)) {
            if (!Double.isNaN(zM) && !Double.isNaN(s.zM())) {
                throw new InputException(s.header(), s.label(), InputProblem.CONFLICT, String.format(Locale.ROOT,
                        "the header gives z, and so does the command line (give z in one place)"));
            }
            try {
                out.add(new KnifeEdge(displayName, s.label(), s.axis(), Double.isNaN(zM) ? s.zM() : zM, KnifeEdgeFit.of(s.scan())));
            } catch (BeamException e) {
                throw located(s.header(), s.label(), e);
            } catch (org.hipparchus.exception.MathRuntimeException e) {
                // the fit's covariance is singular on a scan with too few distinct points across the edge
                throw new InputException(s.header(), s.label(), InputProblem.INVALID_VALUE, "the scan cannot be fitted ("
                        + e.getMessage() + "): scan across the whole beam with several points on the edge", e);
            }
        }
        return out;
    }

    private static InputException located(SourceLocation where, String field, BeamException e) {
        InputProblem key = switch (e.reason()) {
            case TOO_FEW -> InputProblem.EMPTY;
            case NOT_MONOTONIC -> InputProblem.BAD_ORDER;
            case SATURATED -> InputProblem.OUT_OF_RANGE;
            case NO_EDGE, NO_SPOT, NO_CONVERGENCE -> InputProblem.INVALID_VALUE;
        };
        return new InputException(where, field, key, e.getMessage(), e);
    }
}
