package org.ladderkin.io;

import java.awt.image.BufferedImage;
import java.awt.image.Raster;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.ladderkin.excite.beam.BeamImage;

/**
 * Reads a camera frame: a grayscale PNG of 8 or 16 bits (saturated at its largest code, 255 or 65535), or a pixel
 * matrix as delimited text (comma, semicolon or tab; one image row per line, no header, {@code #} and {@code %}
 * comment lines). A text matrix has no bit depth, so its saturation level is given by the caller (NaN: not checked);
 * saturated cells are refused at the first one's line and column with the count of all of them.
 */
public final class BeamImageReader {

    private BeamImageReader() {
    }

    /** Whether {@code path} names a PNG file (by its extension). */
    public static boolean isPng(Path path) {
        return path.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png");
    }

    /**
     * Reads {@code path}, naming it {@code displayName} in messages.
     *
     * @param saturationLevel for a text matrix: the value at and above which a pixel is saturated, or NaN
     */
    public static BeamImage read(Path path, String displayName, double saturationLevel) {
        if (isPng(path)) {
            return png(path, displayName);
        }
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return matrix(in, saturationLevel);
        }
    }

    private static BeamImage png(Path path, String displayName) {
        SourceLocation where = SourceLocation.of(displayName);
        if (!Files.exists(path)) {
            throw new InputException(where, null, InputProblem.NOT_FOUND, "file not found");
        }
        BufferedImage image;
        try {
            image = ImageIO.read(path.toFile());
        } catch (IOException e) {
            throw new InputException(where, null, InputProblem.UNREADABLE, "cannot read the PNG: " + e.getMessage());
        }
        if (image == null) {
            throw new InputException(where, null, InputProblem.UNREADABLE, "not an image this reader knows (save the frame as "
                    + "an 8- or 16-bit grayscale PNG, or as a text matrix)");
        }
        Raster raster = image.getRaster();
        int bits = raster.getSampleModel().getSampleSize(0);
        if (raster.getNumBands() != 1 || image.getColorModel().getNumComponents() != 1 || (bits != 8 && bits != 16)) {
            throw new InputException(where, null, InputProblem.INVALID_VALUE, "a " + raster.getNumBands() + "-channel, " + bits
                    + "-bit image (a beam frame must be an 8- or 16-bit grayscale PNG; colour channels are weighted by the "
                    + "camera's filters and do not measure intensity)");
        }
        int w = raster.getWidth();
        int h = raster.getHeight();
        double[] v = new double[w * h];
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                v[r * w + c] = raster.getSample(c, r, 0);
            }
        }
        return new BeamImage(w, h, v, (1 << bits) - 1);
    }

    private static BeamImage matrix(DelimitedLineReader in, double saturationLevel) {
        String first = in.nextContentLine();
        if (first == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY, "no pixels (expected one image row per line)");
        }
        in.detectDelimiter(first);
        int width = in.count(first);
        int[] from = new int[width];
        int[] to = new int[width];
        GrowableDoubles values = new GrowableDoubles(1 << 16);
        int saturated = 0;
        SourceLocation firstSaturated = null;
        int rows = 0;
        String line = first;
        while (line != null) {
            int n = in.bounds(line, from, to);
            if (n != width) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " pixel" + (n == 1 ? "" : "s")
                        + " but the first row has " + width + " (every image row has the same number of pixels)");
            }
            for (int c = 0; c < width; c++) {
                double v = in.number(line, from[c], to[c], null);
                if (Double.isNaN(v)) {
                    throw new InputException(in.here(from[c] + 1), null, InputProblem.MISSING_VALUE, "missing pixel value "
                            + "(row " + (rows + 1) + ", column " + (c + 1) + "; an image has no gaps)");
                }
                if (v >= saturationLevel) {
                    saturated++;
                    if (firstSaturated == null) {
                        firstSaturated = in.here(from[c] + 1);
                    }
                }
                values.add(v);
            }
            rows++;
            line = in.nextContentLine();
        }
        if (saturated > 0) {
            throw new InputException(firstSaturated, null, InputProblem.OUT_OF_RANGE, String.format(Locale.ROOT,
                    "%d saturated pixel%s (at or above the saturation level %s, this the first): second moments of a clipped "
                    + "spot read too wide (lower the exposure or add attenuation)", saturated, saturated == 1 ? "" : "s",
                    KnifeEdgeReader.fmt(saturationLevel)));
        }
        if (width < BeamImage.MIN_SIDE || rows < BeamImage.MIN_SIDE) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY, "a " + width + " × " + rows + " image "
                    + "is too small (at least " + BeamImage.MIN_SIDE + " × " + BeamImage.MIN_SIDE + " pixels, with unlit pixels "
                    + "around the spot)");
        }
        return new BeamImage(width, rows, values.toArray(), saturationLevel);
    }
}
