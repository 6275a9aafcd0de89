package org.ladderkin.gui.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.report.ChartSpec;

class ChartExportTest {

    static final ChartSpec SPEC = new ChartSpec("Peak fluence", "pulse energy (nJ)", "j (photons/cm²)", true, true, List.of(
            ChartSpec.Series.line("400 nm", new double[] {1, 10}, new double[] {5.7e12, 5.7e13}),
            new ChartSpec.Series("a \"quoted\", name", new double[] {2}, new double[] {0.1}, true)));

    @Test
    void csvHoldsExactlyThePlottedPoints() {
        assertThat(ChartCsv.of(SPEC)).isEqualTo("""
                series,"pulse energy (nJ)","j (photons/cm²)"
                400 nm,1.0,5.7e12
                400 nm,10.0,5.7e13
                "a ""quoted"", name",2.0,0.1
                """);
    }

    @Test
    void everyFormatIsWrittenAndReadable(@TempDir Path dir) throws Exception {
        Path png = ChartExport.Format.PNG.withExtension(dir.resolve("chart"));
        Path svg = ChartExport.Format.SVG.withExtension(dir.resolve("chart.svg"));
        Path csv = ChartExport.Format.CSV.withExtension(dir.resolve("chart"));
        assertThat(png.getFileName().toString()).isEqualTo("chart.png");
        assertThat(svg.getFileName().toString()).isEqualTo("chart.svg");
        ChartExport.write(SPEC, ChartExport.Format.PNG, png);
        ChartExport.write(SPEC, ChartExport.Format.SVG, svg);
        ChartExport.write(SPEC, ChartExport.Format.CSV, csv);
        var image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(ChartExport.WIDTH);
        assertThat(image.getHeight()).isEqualTo(ChartExport.HEIGHT);
        assertThat(Files.readString(svg)).startsWith("<svg").contains("Peak fluence");
        assertThat(Files.readString(csv)).isEqualTo(ChartCsv.of(SPEC));
        try (var files = Files.list(dir)) {
            assertThat(files).hasSize(3);
        }
    }

    @Test
    void aChosenSizeAndScaleAreWhatThePngAndSvgMeasure(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("big.png");
        Path svg = dir.resolve("big.svg");
        ChartExport.ImageSize size = new ChartExport.ImageSize(640, 400, 3);
        ChartExport.write(SPEC, ChartExport.Format.PNG, png, size);
        ChartExport.write(SPEC, ChartExport.Format.SVG, svg, size);
        var image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1920);
        assertThat(image.getHeight()).isEqualTo(1200);
        // the same layout, three times the pixels: the title's ink is three times as tall as at 1×
        Path small = dir.resolve("small.png");
        ChartExport.write(SPEC, ChartExport.Format.PNG, small, new ChartExport.ImageSize(640, 400, 1));
        assertThat(inkRows(image)).isBetween(3 * inkRows(ImageIO.read(small.toFile())) - 3, 3 * inkRows(ImageIO.read(small.toFile())) + 3);
        assertThat(Files.readString(svg)).contains("width='640.0' height='400.0'");
        assertThat(size.describe()).isEqualTo("640 × 400 px at 3× (1920 × 1200 px)");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> new ChartExport.ImageSize(640, 400, 5))
                .hasMessage("scale must be 1 to 4, was 5");
    }

    /** Rows of the top tenth of the image (the title) that hold any dark pixel. */
    private static int inkRows(java.awt.image.BufferedImage image) {
        int rows = 0;
        for (int y = 0; y < image.getHeight() / 10; y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                if ((image.getRGB(x, y) & 0xff) < 128) {
                    rows++;
                    break;
                }
            }
        }
        return rows;
    }
}
