package org.ladderkin.gui.chart;

import java.util.Locale;
import org.ladderkin.report.ChartSpec;

/**
 * CSV of exactly what a chart shows: one row per point, in long form (series, x, y), headed by the axis labels with
 * their units. Numbers are written with full double precision so the file reproduces the chart.
 */
public final class ChartCsv {

    private ChartCsv() {
    }

    /** The CSV text (RFC 4180 quoting, "\n" line ends). */
    public static String of(ChartSpec spec) {
        StringBuilder b = new StringBuilder();
        b.append(quote("series")).append(',').append(quote(spec.xLabel())).append(',').append(quote(spec.yLabel())).append('\n');
        for (ChartSpec.Series s : spec.series()) {
            double[] x = s.x();
            double[] y = s.y();
            String name = quote(s.name());
            for (int i = 0; i < x.length; i++) {
                b.append(name).append(',').append(number(x[i])).append(',').append(number(y[i])).append('\n');
            }
        }
        return b.toString();
    }

    private static String number(double v) {
        return Double.isFinite(v) ? Double.toString(v).toLowerCase(Locale.ROOT) : "";
    }

    static String quote(String s) {
        if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("(")) {
            return "\"" + s.replace("\"", "\"\"") + "\"";
        }
        return s;
    }
}
