package org.ladderkin.gui.chart;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.jfree.chart.ChartUtils;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.Charts;

/**
 * Writes a chart as PNG, SVG or CSV from its {@link ChartSpec}, the same data the planner draws. Images use the
 * report look (light background) whatever the screen theme, so exported figures match across machines. Every file
 * is written atomically.
 */
public final class ChartExport {

    /** Export formats. */
    public enum Format {
        PNG("png", "PNG image"),
        SVG("svg", "SVG drawing"),
        CSV("csv", "CSV table of the plotted points");

        private final String extension;
        private final String description;

        Format(String extension, String description) {
            this.extension = extension;
            this.description = description;
        }

        public String extension() {
            return extension;
        }

        public String description() {
            return description;
        }

        /** {@code file} with this format's extension appended if it has none. */
        public Path withExtension(Path file) {
            String name = file.getFileName().toString();
            return name.toLowerCase(Locale.ROOT).endsWith("." + extension) ? file : file.resolveSibling(name + "." + extension);
        }
    }

    /** Default image size in pixels. */
    public static final int WIDTH = 900;
    public static final int HEIGHT = 560;

    private ChartExport() {
    }

    /** Writes {@code spec} to {@code file} in {@code format}. */
    public static void write(ChartSpec spec, Format format, Path file) throws IOException {
        switch (format) {
            case PNG -> AtomicFiles.write(file, out -> ChartUtils.writeChartAsPNG(out, Charts.build(spec), WIDTH, HEIGHT));
            case SVG -> AtomicFiles.writeString(file, Charts.svg(spec, WIDTH, HEIGHT) + "\n");
            case CSV -> AtomicFiles.writeString(file, ChartCsv.of(spec));
        }
    }
}
