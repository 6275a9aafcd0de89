package org.ladderkin.report;

import java.util.List;
import java.util.Objects;

/**
 * What a chart shows, independent of how it is drawn (SVG in reports, a live panel in the desktop planner) and of
 * CSV export, which writes exactly these series.
 *
 * @param title   chart title
 * @param xLabel  x-axis label with unit
 * @param yLabel  y-axis label with unit
 * @param logX    logarithmic x axis
 * @param logY    logarithmic y axis
 * @param series  the curves
 */
public record ChartSpec(String title, String xLabel, String yLabel, boolean logX, boolean logY, List<Series> series) {

    public ChartSpec {
        Objects.requireNonNull(title, "title");
        series = List.copyOf(series);
    }

    /**
     * One curve.
     *
     * @param name   legend text
     * @param x      abscissae
     * @param y      ordinates, same length
     * @param points draw markers only (measured data) instead of a line
     */
    public record Series(String name, double[] x, double[] y, boolean points) {
        public Series {
            Objects.requireNonNull(name, "name");
            if (x.length != y.length) {
                throw new IllegalArgumentException("series '" + name + "' has " + x.length + " x values but " + y.length + " y values");
            }
            x = x.clone();
            y = y.clone();
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }

        /** A line series. */
        public static Series line(String name, double[] x, double[] y) {
            return new Series(name, x, y, false);
        }
    }
}
