package org.ladderkin.report;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.stream.IntStream;

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
 * @param palette how colour indices become colours
 */
public record ChartSpec(String title, String xLabel, String yLabel, boolean logX, boolean logY, List<Series> series,
                        Palette palette) {

    /** The sign and unit every ΔA chart uses, the report's and the fit tab's alike: the bleach is positive. */
    public static final String BLEACH_AXIS = "−ΔA (bleach, mOD)";
    /** ΔA in OD times this gives the {@link #BLEACH_AXIS} value. */
    public static final double BLEACH_AXIS_PER_OD = -1e3;

    public ChartSpec {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(palette, "palette");
        series = List.copyOf(series);
    }

    /** A chart whose series take distinct colours in order. */
    public ChartSpec(String title, String xLabel, String yLabel, boolean logX, boolean logY, List<Series> series) {
        this(title, xLabel, yLabel, logX, logY, series, Palette.CATEGORICAL);
    }

    /** How colour indices become colours. */
    public enum Palette {
        /** Unrelated quantities: hues as far apart as possible. */
        CATEGORICAL,
        /** An ordered family (a fluence series): a ramp from cool to warm, index 0 at the cool end. */
        SEQUENTIAL
    }

    /** How a series is drawn. */
    public enum Style {
        LINE,
        /** Markers only (measured data). */
        POINTS,
        /** Bars centred on each x (a distribution over integers); several bar series stand side by side. */
        BARS
    }

    /**
     * One curve.
     *
     * @param name     legend text
     * @param x        abscissae
     * @param y        ordinates, same length
     * @param style    how it is drawn
     * @param colour   colour index shared by series that belong together (a trace, its fit and its residuals), or
     *                 −1 for the next free index in series order
     * @param inLegend whether the legend lists it (a fit line is named by its trace's entry, which shows both)
     */
    public record Series(String name, double[] x, double[] y, Style style, int colour, boolean inLegend) {
        public Series {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(style, "style");
            if (x.length != y.length) {
                throw new IllegalArgumentException("series '" + name + "' has " + x.length + " x values but " + y.length + " y values");
            }
            if (colour < -1) {
                throw new IllegalArgumentException("series '" + name + "': colour index must be ≥ 0 or −1 (automatic), was " + colour);
            }
            x = x.clone();
            y = y.clone();
        }

        /** A line or marker series with an automatic colour, listed in the legend. */
        public Series(String name, double[] x, double[] y, boolean points) {
            this(name, x, y, points ? Style.POINTS : Style.LINE, -1, true);
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
            return new Series(name, x, y, Style.LINE, -1, true);
        }

        /** A marker series. */
        public static Series points(String name, double[] x, double[] y) {
            return new Series(name, x, y, Style.POINTS, -1, true);
        }

        /** A bar series. */
        public static Series bars(String name, double[] x, double[] y) {
            return new Series(name, x, y, Style.BARS, -1, true);
        }

        /** This series with colour index {@code index}. */
        public Series colour(int index) {
            return new Series(name, x, y, style, index, inLegend);
        }

        /** This series left out of the legend. */
        public Series unlisted() {
            return new Series(name, x, y, style, colour, false);
        }
    }

    /**
     * The colour index of each series: its own when set, else the next index no series has claimed yet, in series
     * order.
     */
    public int[] colourIndices() {
        int next = series.stream().mapToInt(Series::colour).max().orElse(-1) + 1;
        int[] out = new int[series.size()];
        for (int i = 0; i < out.length; i++) {
            int c = series.get(i).colour();
            out[i] = c >= 0 ? c : next++;
        }
        return out;
    }

    /** How many colours the chart uses: one past the largest index. */
    public int colourCount() {
        return Arrays.stream(colourIndices()).max().orElse(-1) + 1;
    }

    /** Legend text for a fluence: "⟨N⟩ = 0.13" (three significant digits, no trailing zeros). */
    public static String meanN(double n) {
        if (!Double.isFinite(n)) {
            return "⟨N⟩ unknown";
        }
        return "⟨N⟩ = " + new java.math.BigDecimal(n).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    /**
     * Rank of each value in ascending order (ties keep their given order): the colour indices that order a sequential
     * palette by a value such as ⟨N⟩.
     */
    public static int[] ranks(double[] values) {
        Integer[] order = IntStream.range(0, values.length).boxed().toArray(Integer[]::new);
        Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
        int[] rank = new int[values.length];
        for (int r = 0; r < order.length; r++) {
            rank[order[r]] = r;
        }
        return rank;
    }
}
