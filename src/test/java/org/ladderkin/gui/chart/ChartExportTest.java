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
}
