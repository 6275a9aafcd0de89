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

    /**
     * How large an image is: the chart is laid out at {@code widthPx × heightPx} (fonts and lines keep their size
     * relative to it) and a PNG is drawn {@code scale} times as many pixels each way, for print or high-density
     * screens. SVG is vector and takes only the layout size.
     *
     * @param widthPx  layout width, 200 to 4000
     * @param heightPx layout height, 150 to 4000
     * @param scale    1 to 4
     */
    public record ImageSize(int widthPx, int heightPx, int scale) {
        public static final ImageSize DEFAULT = new ImageSize(WIDTH, HEIGHT, 1);

        public ImageSize {
            if (widthPx < 200 || widthPx > 4000) {
                throw new IllegalArgumentException("width must be 200 to 4000 px, was " + widthPx);
            }
            if (heightPx < 150 || heightPx > 4000) {
                throw new IllegalArgumentException("height must be 150 to 4000 px, was " + heightPx);
            }
            if (scale < 1 || scale > 4) {
                throw new IllegalArgumentException("scale must be 1 to 4, was " + scale);
            }
        }

        /** "900 × 560 px at 2× (1800 × 1120 px)". */
        public String describe() {
            return widthPx + " × " + heightPx + " px" + (scale == 1 ? "" : " at " + scale + "× (" + widthPx * scale + " × "
                    + heightPx * scale + " px)");
        }
    }

    private ChartExport() {
    }

    /** Writes {@code spec} to {@code file} in {@code format} at the default size. */
    public static void write(ChartSpec spec, Format format, Path file) throws IOException {
        write(spec, format, file, ImageSize.DEFAULT);
    }

    /** Writes {@code spec} to {@code file} in {@code format}; images at {@code size}. */
    public static void write(ChartSpec spec, Format format, Path file, ImageSize size) throws IOException {
        int w = size.widthPx();
        int h = size.heightPx();
        switch (format) {
            case PNG -> AtomicFiles.write(file, out -> ChartUtils.writeScaledChartAsPNG(out, Charts.build(spec), w, h,
                    size.scale(), size.scale()));
            case SVG -> AtomicFiles.writeString(file, Charts.svg(spec, w, h) + "\n");
            case CSV -> AtomicFiles.writeString(file, ChartCsv.of(spec));
        }
    }
}
