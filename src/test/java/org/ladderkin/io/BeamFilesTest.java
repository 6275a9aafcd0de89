package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.awt.image.BufferedImage;
import java.awt.image.WritableRaster;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.excite.beam.BeamImage;
import org.ladderkin.excite.beam.BeamRadius;
import org.ladderkin.excite.beam.SyntheticBeams;

class BeamFilesTest {

    @TempDir
    Path dir;

    /** A knife-edge table: position in µm, one column per scan. */
    static String knifeEdgeTable(String header, double wXUm, double wYUm) {
        double[] x = SyntheticBeams.grid(-300e-6, 300e-6, 41);
        double[] px = SyntheticBeams.knifeEdge(x, 10e-6, wXUm * 1e-6, 0.01, 2.0, 0.004, 1);
        double[] py = SyntheticBeams.knifeEdge(x, -5e-6, wYUm * 1e-6, 0.01, 2.0, 0.004, 2);
        StringBuilder b = new StringBuilder("# invented test scan\n" + header + "\n");
        for (int i = 0; i < x.length; i++) {
            b.append(String.format(Locale.ROOT, "%.1f,%.5f,%.5f%n", x[i] * 1e6, px[i], py[i]));
        }
        return b.toString();
    }

    /** Writes a grayscale PNG of the given bit depth from row-major values (rounded, clipped to the code range). */
    static Path png(Path file, int width, int height, double[] v, int bits) throws IOException {
        BufferedImage img = new BufferedImage(width, height, bits == 8 ? BufferedImage.TYPE_BYTE_GRAY : BufferedImage.TYPE_USHORT_GRAY);
        WritableRaster r = img.getRaster();
        int max = (1 << bits) - 1;
        for (int y = 0; y < height; y++) {
            for (int x = 0; x < width; x++) {
                r.setSample(x, y, 0, (int) Math.max(0, Math.min(max, Math.round(v[y * width + x]))));
            }
        }
        ImageIO.write(img, "png", file.toFile());
        return file;
    }

    @Test
    void knifeEdgeTableWithTwoScansAndHeaderZ() throws IOException {
        Path f = Files.writeString(dir.resolve("ke.csv"), knifeEdgeTable("position (µm),power x z=1.5mm (mW),power y z=1.5mm (mW)", 80, 60));
        List<BeamFiles.Measurement> m = BeamFiles.measure(f, "ke.csv", BeamFiles.Options.none(), Double.NaN);
        assertThat(m).hasSize(2);
        BeamFiles.KnifeEdge x = (BeamFiles.KnifeEdge) m.get(0);
        BeamFiles.KnifeEdge y = (BeamFiles.KnifeEdge) m.get(1);
        assertThat(x.axis()).isEqualTo("x");
        assertThat(y.axis()).isEqualTo("y");
        assertThat(x.zM()).isEqualTo(1.5e-3);
        assertThat(x.radius().radiusM()).isCloseTo(80e-6, org.assertj.core.data.Offset.offset(1e-6));
        assertThat(y.radius().radiusM()).isCloseTo(60e-6, org.assertj.core.data.Offset.offset(1e-6));
        BeamRadius r = BeamFiles.radius(f);
        assertThat(r.radiusM()).isCloseTo(Math.sqrt(80e-6 * 60e-6), org.assertj.core.data.Offset.offset(1e-6));
        assertThat(r.stdErrorM()).isPositive();
    }

    @Test
    void knifeEdgeProblemsAreLocated() throws IOException {
        Path order = Files.writeString(dir.resolve("order.csv"), "x (um),P\n0,0\n10,0.1\n20,0.5\n15,0.6\n40,0.9\n50,1\n60,1\n");
        assertThatThrownBy(() -> KnifeEdgeReader.read(order, "order.csv")).satisfies(input(InputProblem.BAD_ORDER, "order.csv:5:1", "x (um)"));
        Path flat = Files.writeString(dir.resolve("flat.csv"), "x (um),P (mW)\n0,1\n10,1.01\n20,0.99\n30,1\n40,1.02\n50,0.98\n60,1\n");
        assertThatThrownBy(() -> BeamFiles.radius(flat)).satisfies(input(InputProblem.INVALID_VALUE, flat + ":1:8", "P (mW)"));
        Path noUnit = Files.writeString(dir.resolve("nounit.csv"), "position,P\n0,0\n");
        assertThatThrownBy(() -> BeamFiles.radius(noUnit)).satisfies(input(InputProblem.WRONG_UNIT, noUnit + ":1:1", "position"));
        Path gap = Files.writeString(dir.resolve("gap.csv"), "x (mm),P\n0,0\n1,\n");
        assertThatThrownBy(() -> BeamFiles.radius(gap)).satisfies(input(InputProblem.MISSING_VALUE, gap + ":3:3", "P"));
        Path z = Files.writeString(dir.resolve("z.csv"), knifeEdgeTable("x (um),a z=1mm,b", 50, 50));
        assertThatThrownBy(() -> BeamFiles.measure(z, "z.csv", BeamFiles.Options.none(), 2e-3))
                .satisfies(input(InputProblem.CONFLICT, "z.csv:2:8", "a z=1mm"));
    }

    @Test
    void eightAndSixteenBitPngsAreReadWithTheirSaturationLevels() throws IOException {
        double[] v8 = SyntheticBeams.gaussian(80, 80, 40, 38, 12, 9, 0, 200, 10, 0, 3);
        BeamImage i8 = BeamImageReader.read(png(dir.resolve("a.png"), 80, 80, v8, 8), "a.png", Double.NaN);
        assertThat(i8.saturationLevel()).isEqualTo(255);
        assertThat(i8.values()[38 * 80 + 40]).isEqualTo(210);
        double[] v16 = SyntheticBeams.gaussian(80, 80, 40, 38, 12, 9, 0, 40000, 500, 0, 3);
        BeamImage i16 = BeamImageReader.read(png(dir.resolve("b.png"), 80, 80, v16, 16), "b.png", Double.NaN);
        assertThat(i16.saturationLevel()).isEqualTo(65535);
        assertThat(i16.values()[38 * 80 + 40]).isEqualTo(40500);
        BeamRadius r = BeamFiles.radius(dir.resolve("b.png"), 5e-6);
        assertThat(r.method()).isEqualTo(BeamRadius.Method.SECOND_MOMENTS);
        assertThat(r.radiusM()).isCloseTo(5e-6 * Math.sqrt(12 * 9), org.assertj.core.data.Offset.offset(0.5e-6));
    }

    @Test
    void imageProblemsAreLocated() throws IOException {
        double[] hot = SyntheticBeams.gaussian(64, 64, 32, 32, 8, 8, 0, 400, 10, 0, 4);
        long clipped = java.util.Arrays.stream(hot).filter(x -> Math.round(x) >= 255).count();
        Path sat = png(dir.resolve("sat.png"), 64, 64, hot, 8);
        assertThatThrownBy(() -> BeamFiles.radius(sat, 5e-6)).satisfies(input(InputProblem.OUT_OF_RANGE, sat.toString(), null))
                .hasMessageContaining(clipped + " saturated pixels");
        Path dark = png(dir.resolve("dark.png"), 64, 64, new double[64 * 64], 16);
        assertThatThrownBy(() -> BeamFiles.radius(dark, 5e-6)).satisfies(input(InputProblem.INVALID_VALUE, dark.toString(), null));
        assertThatThrownBy(() -> BeamFiles.radius(dark)).satisfies(input(InputProblem.MISSING_FIELD, dark.toString(), null));
        BufferedImage rgb = new BufferedImage(16, 16, BufferedImage.TYPE_INT_RGB);
        ImageIO.write(rgb, "png", dir.resolve("rgb.png").toFile());
        assertThatThrownBy(() -> BeamFiles.radius(dir.resolve("rgb.png"), 5e-6)).satisfies(input(InputProblem.INVALID_VALUE, dir.resolve("rgb.png").toString(), null));
    }

    @Test
    void textMatrixWithSaturationLevel() throws IOException {
        double[] v = SyntheticBeams.gaussian(40, 30, 20, 15, 6, 6, 0, 1000, 20, 0, 5);
        StringBuilder b = new StringBuilder("# frame\n");
        for (int r = 0; r < 30; r++) {
            for (int c = 0; c < 40; c++) {
                b.append(c == 0 ? "" : "\t").append(Math.round(v[r * 40 + c]));
            }
            b.append('\n');
        }
        Path f = Files.writeString(dir.resolve("frame.tsv"), b.toString());
        assertThat(BeamFiles.isImage(f, "frame.tsv")).isTrue();
        assertThat(BeamFiles.radius(f, 1e-6).radiusM()).isCloseTo(6e-6, org.assertj.core.data.Offset.offset(0.1e-6));
        // the peak (1020) at row 16 (line 17), column 21: the cell starts after 20 tabs and 20 numbers
        assertThatThrownBy(() -> BeamImageReader.read(f, "frame.tsv", 1000)).satisfies(t -> {
            InputException e = (InputException) t;
            assertThat(e.key()).isEqualTo(InputProblem.OUT_OF_RANGE);
            assertThat(e.location().line()).isEqualTo(17);
            assertThat(e.getMessage()).contains("1 saturated pixel (").doesNotContain("\n");
        });
        Path ragged = Files.writeString(dir.resolve("ragged.csv"), "1,2,3\n1,2\n");
        assertThatThrownBy(() -> BeamImageReader.read(ragged, "ragged.csv", Double.NaN))
                .satisfies(input(InputProblem.BAD_SYNTAX, "ragged.csv:2", null));
    }
}
