package org.ladderkin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/** Builds JFreeChart charts from {@link ChartSpec}s and renders them as SVG text. */
public final class Charts {

    private static final Color[] PALETTE = {
        new Color(0x1f77b4), new Color(0xd62728), new Color(0x2ca02c), new Color(0x9467bd), new Color(0xff7f0e),
        new Color(0x17becf), new Color(0x8c564b), new Color(0xe377c2), new Color(0x7f7f7f), new Color(0xbcbd22)};

    private Charts() {
    }

    /** A chart for the spec. Non-positive values are left out of log axes, which cannot show them. */
    public static JFreeChart build(ChartSpec spec) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (ChartSpec.Series s : spec.series()) {
            XYSeries xy = new XYSeries(s.name(), false, true);
            double[] x = s.x();
            double[] y = s.y();
            for (int i = 0; i < x.length; i++) {
                boolean drop = !Double.isFinite(x[i]) || !Double.isFinite(y[i])
                        || (spec.logX() && x[i] <= 0) || (spec.logY() && y[i] <= 0);
                if (!drop) {
                    xy.add(x[i], y[i]);
                }
            }
            data.addSeries(xy);
        }
        ValueAxis xAxis = axis(spec.xLabel(), spec.logX());
        ValueAxis yAxis = axis(spec.yLabel(), spec.logY());
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        for (int i = 0; i < spec.series().size(); i++) {
            boolean points = spec.series().get(i).points();
            renderer.setSeriesPaint(i, PALETTE[i % PALETTE.length]);
            renderer.setSeriesLinesVisible(i, !points);
            renderer.setSeriesShapesVisible(i, points);
            renderer.setSeriesShape(i, new Ellipse2D.Double(-2, -2, 4, 4));
            renderer.setSeriesStroke(i, new BasicStroke(1.6f));
        }
        XYPlot plot = new XYPlot(data, xAxis, yAxis, renderer);
        if (spec.logX()) {
            decadeTicks((LogAxis) xAxis, data, true);
        }
        if (spec.logY()) {
            decadeTicks((LogAxis) yAxis, data, false);
        }
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdddddd));
        plot.setRangeGridlinePaint(new Color(0xdddddd));
        JFreeChart chart = new JFreeChart(spec.title(), new Font("SansSerif", Font.BOLD, 13), plot, spec.series().size() > 1);
        chart.setBackgroundPaint(Color.WHITE);
        return chart;
    }

    /**
     * Loads the chart and font machinery in the background (the first chart otherwise pays about half a second for
     * it), so a caller can overlap that with its own computation.
     */
    public static void warmUpInBackground() {
        Thread t = new Thread(() -> svg(new ChartSpec("", "", "", false, false,
                List.of(ChartSpec.Series.line("", new double[] {1, 2}, new double[] {1, 2}))), 64, 48), "chart-warm-up");
        t.setDaemon(true);
        t.start();
    }

    /** SVG markup (an {@code <svg>} element) of the chart at the given size in pixels. */
    public static String svg(ChartSpec spec, int width, int height) {
        SVGGraphics2D g2 = new SVGGraphics2D(width, height);
        build(spec).draw(g2, new Rectangle(0, 0, width, height));
        return g2.getSVGElement();
    }

    /** Ticks at whole decades when the data span two or more: fractional log steps ("3.16E1") read badly. */
    private static void decadeTicks(LogAxis axis, XYSeriesCollection data, boolean domain) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                double v = domain ? data.getXValue(s, i) : data.getYValue(s, i);
                if (v > 0) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (hi > 0 && Math.log10(hi / lo) >= 2) {
            axis.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        }
    }

    /** Plain numbers from 0.001 to 99 999, scientific outside ("2e6"). */
    static final class ReadableNumberFormat extends java.text.NumberFormat {
        private final java.text.DecimalFormat plain = new java.text.DecimalFormat("0.###",
                java.text.DecimalFormatSymbols.getInstance(java.util.Locale.ROOT));
        private final java.text.DecimalFormat sci = new java.text.DecimalFormat("0.##E0",
                java.text.DecimalFormatSymbols.getInstance(java.util.Locale.ROOT));

        @Override
        public StringBuffer format(double number, StringBuffer toAppendTo, java.text.FieldPosition pos) {
            double a = Math.abs(number);
            if (a == 0 || (a >= 1e-3 && a < 1e5)) {
                return plain.format(number, toAppendTo, pos);
            }
            return toAppendTo.append(sci.format(number).replace("E", "e"));
        }

        @Override
        public StringBuffer format(long number, StringBuffer toAppendTo, java.text.FieldPosition pos) {
            return format((double) number, toAppendTo, pos);
        }

        @Override
        public Number parse(String source, java.text.ParsePosition parsePosition) {
            return plain.parse(source, parsePosition);
        }
    }

    private static ValueAxis axis(String label, boolean log) {
        if (log) {
            LogAxis a = new LogAxis(label);
            a.setBase(10);
            a.setSmallestValue(1e-300);
            a.setNumberFormatOverride(new ReadableNumberFormat());
            return a;
        }
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        return a;
    }
}
