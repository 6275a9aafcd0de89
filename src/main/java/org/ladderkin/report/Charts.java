package org.ladderkin.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Rectangle;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.ClusteredXYBarRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.data.xy.XYBarDataset;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * Builds JFreeChart charts from {@link ChartSpec}s and renders them as SVG text. Series that share a colour index
 * share one paint, the palette is the spec's, log axes tick at 1–2–5 × 10^k and every axis writes its labels in one
 * number format.
 */
public final class Charts {

    private Charts() {
    }

    /** The colour a series with colour index {@code index} of {@code count} gets in {@code palette}. */
    public static Color colour(ChartSpec.Palette palette, int index, int count) {
        return ChartColours.of(palette, index, count);
    }

    /** The colour each series of {@code spec} is drawn in, in series order. */
    public static List<Color> colours(ChartSpec spec) {
        int[] idx = spec.colourIndices();
        int count = spec.colourCount();
        List<Color> out = new ArrayList<>();
        for (int i : idx) {
            out.add(ChartColours.of(spec.palette(), i, count));
        }
        return out;
    }

    /** A chart for the spec. Non-positive values are left out of log axes, which cannot show them. */
    public static JFreeChart build(ChartSpec spec) {
        List<Color> colours = colours(spec);
        List<ChartSpec.Series> all = spec.series();
        List<Integer> lineIdx = new ArrayList<>();
        List<Integer> barIdx = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            (all.get(i).style() == ChartSpec.Style.BARS ? barIdx : lineIdx).add(i);
        }
        ValueAxis xAxis = spec.logX() ? new ReadableLogAxis(spec.xLabel()) : new ReadableNumberAxis(spec.xLabel(), !barIdx.isEmpty());
        ValueAxis yAxis = spec.logY() ? new ReadableLogAxis(spec.yLabel()) : new ReadableNumberAxis(spec.yLabel(), false);
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(xAxis);
        plot.setRangeAxis(yAxis);
        int dataset = 0;
        if (!lineIdx.isEmpty()) {
            int[] specIndex = lineIdx.stream().mapToInt(Integer::intValue).toArray();
            boolean[] legendLine = new boolean[specIndex.length];
            for (int k = 0; k < specIndex.length; k++) {
                legendLine[k] = hasUnlistedLineOfItsColour(spec, specIndex[k]);
            }
            SeriesRenderer r = new SeriesRenderer(slug(spec.title()), specIndex, legendLine);
            for (int k = 0; k < specIndex.length; k++) {
                ChartSpec.Series s = all.get(specIndex[k]);
                boolean points = s.style() == ChartSpec.Style.POINTS;
                r.setSeriesPaint(k, colours.get(specIndex[k]));
                r.setSeriesLinesVisible(k, !points);
                r.setSeriesShapesVisible(k, points);
                r.setSeriesShape(k, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
                r.setSeriesStroke(k, new BasicStroke(1.6f));
                r.setSeriesVisibleInLegend(k, s.inLegend());
            }
            plot.setDataset(dataset, collection(spec, lineIdx));
            plot.setRenderer(dataset, r);
            dataset++;
        }
        if (!barIdx.isEmpty()) {
            ClusteredXYBarRenderer r = new ClusteredXYBarRenderer(0, false);
            r.setBarPainter(new StandardXYBarPainter());
            r.setShadowVisible(false);
            r.setDrawBarOutline(false);
            for (int k = 0; k < barIdx.size(); k++) {
                r.setSeriesPaint(k, colours.get(barIdx.get(k)));
                r.setSeriesVisibleInLegend(k, all.get(barIdx.get(k)).inLegend());
            }
            XYSeriesCollection bars = collection(spec, barIdx);
            plot.setDataset(dataset, new XYBarDataset(bars, 0.8));
            plot.setRenderer(dataset, r);
            if (!spec.logX() && bars.getItemCount(0) > 0) {
                // a bar is drawn on its own integer: no tick beyond the first and last bar ("−1")
                xAxis.setRange(bars.getDomainLowerBound(false) - 0.6, bars.getDomainUpperBound(false) + 0.6);
            }
        }
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xdddddd));
        plot.setRangeGridlinePaint(new Color(0xdddddd));
        long listed = all.stream().filter(ChartSpec.Series::inLegend).count();
        JFreeChart chart = new JFreeChart(spec.title(), new Font("SansSerif", Font.BOLD, 13), plot, listed > 1);
        chart.setBackgroundPaint(Color.WHITE);
        if (chart.getLegend() != null) {
            // at the default 10 pt the angle brackets of ⟨N⟩ read as parentheses
            chart.getLegend().setItemFont(new Font("SansSerif", Font.PLAIN, 12));
        }
        return chart;
    }

    private static boolean hasUnlistedLineOfItsColour(ChartSpec spec, int i) {
        ChartSpec.Series s = spec.series().get(i);
        if (s.style() != ChartSpec.Style.POINTS || !s.inLegend()) {
            return false;
        }
        int[] idx = spec.colourIndices();
        for (int j = 0; j < idx.length; j++) {
            ChartSpec.Series o = spec.series().get(j);
            if (j != i && idx[j] == idx[i] && o.style() == ChartSpec.Style.LINE && !o.inLegend()) {
                return true;
            }
        }
        return false;
    }

    private static XYSeriesCollection collection(ChartSpec spec, List<Integer> indices) {
        XYSeriesCollection data = new XYSeriesCollection();
        for (int i : indices) {
            ChartSpec.Series s = spec.series().get(i);
            XYSeries xy = new XYSeries(new SeriesKey(i, s.name()), false, true);
            double[] x = s.x();
            double[] y = s.y();
            for (int k = 0; k < x.length; k++) {
                boolean drop = !Double.isFinite(x[k]) || !Double.isFinite(y[k])
                        || (spec.logX() && x[k] <= 0) || (spec.logY() && y[k] <= 0);
                if (!drop) {
                    xy.add(x[k], y[k]);
                }
            }
            data.addSeries(xy);
        }
        return data;
    }

    /** A dataset key: unique by the spec's index (two series may share a name), shown by its name. */
    private record SeriesKey(int index, String name) implements Comparable<SeriesKey> {
        @Override
        public int compareTo(SeriesKey o) {
            return Integer.compare(index, o.index);
        }

        @Override
        public String toString() {
            return name;
        }
    }

    /** The prefix of a chart's SVG ids: its title in lower-case letters, digits and hyphens. */
    public static String slug(String title) {
        String s = title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        return "chart-" + (s.isEmpty() ? "untitled" : s);
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
}
