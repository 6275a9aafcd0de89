package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;

/**
 * Reads what a drawn chart shows: the labelled ticks JFreeChart computes for each axis at a given size, and the
 * legend, and checks them against the chart rules (1–2–5 × 10^k on log axes, one number format per axis, ⟨N⟩ written
 * as such).
 */
public final class ChartChecks {

    /** A labelled tick: its value and its text. */
    public record Tick(double value, String label) {
    }

    private static final Pattern PLAIN = Pattern.compile("−?\\d+(\\.\\d+)?");
    private static final Pattern POWER = Pattern.compile("(−?\\d+(?:\\.\\d+)?)×10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)|10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)");
    private static final String SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    private ChartChecks() {
    }

    /** The major ticks of the x ({@code domain}) or y axis when the chart is drawn at {@code w × h}. */
    public static List<Tick> ticks(JFreeChart chart, boolean domain, int w, int h) {
        BufferedImage image = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = image.createGraphics();
        try {
            ChartRenderingInfo info = new ChartRenderingInfo();
            chart.draw(g2, new Rectangle(0, 0, w, h), info);
            Rectangle2D area = info.getPlotInfo().getDataArea();
            XYPlot plot = chart.getXYPlot();
            ValueAxis axis = domain ? plot.getDomainAxis() : plot.getRangeAxis();
            List<Tick> out = new ArrayList<>();
            for (Object t : axis.refreshTicks(g2, new AxisState(), area, domain ? RectangleEdge.BOTTOM : RectangleEdge.LEFT)) {
                ValueTick v = (ValueTick) t;
                if (v.getTickType() == TickType.MAJOR) {
                    out.add(new Tick(v.getValue(), v.getText()));
                }
            }
            return out;
        } finally {
            g2.dispose();
        }
    }

    /** The number a tick label writes, or NaN when it is neither a plain decimal nor m×10ᵏ. */
    public static double parse(String label) {
        if (PLAIN.matcher(label).matches()) {
            return Double.parseDouble(label.replace('−', '-'));
        }
        Matcher m = POWER.matcher(label);
        if (m.matches()) {
            double mantissa = m.group(1) == null ? 1 : Double.parseDouble(m.group(1).replace('−', '-'));
            return mantissa * Math.pow(10, exponent(m.group(1) == null ? m.group(3) : m.group(2)));
        }
        return Double.NaN;
    }

    private static int exponent(String superscript) {
        int sign = superscript.startsWith("⁻") ? -1 : 1;
        int e = 0;
        for (char c : superscript.replace("⁻", "").toCharArray()) {
            e = 10 * e + SUPERSCRIPT.indexOf(c);
        }
        return sign * e;
    }

    /** "plain" or "power": the format a label is written in. */
    public static String format(String label) {
        return PLAIN.matcher(label).matches() ? "plain" : POWER.matcher(label).matches() ? "power" : "other: " + label;
    }

    /**
     * Asserts the chart rules on both axes of {@code spec} drawn at {@code w × h}: at least two labelled ticks, each
     * label the tick's own value in one format per axis, and on a log axis only 1, 2 or 5 × 10^k.
     */
    public static void assertReadableAxes(ChartSpec spec, int w, int h) {
        JFreeChart chart = Charts.build(spec);
        for (boolean domain : new boolean[] {true, false}) {
            boolean log = domain ? spec.logX() : spec.logY();
            String axis = spec.title() + " " + (domain ? "x" : "y") + " axis at " + w + "×" + h;
            List<Tick> ticks = ticks(chart, domain, w, h);
            assertThat(ticks).as(axis + " labelled ticks").hasSizeGreaterThanOrEqualTo(2);
            // zero is written "0" on any axis
            List<String> formats = ticks.stream().filter(t -> !t.label().equals("0")).map(t -> format(t.label())).distinct().toList();
            assertThat(formats).as(axis + " formats of " + ticks).hasSize(1);
            assertThat(formats.get(0)).as(axis + " " + ticks).isIn("plain", "power");
            for (Tick t : ticks) {
                double v = parse(t.label());
                assertThat(Math.abs(v - t.value())).as(axis + " label '" + t.label() + "' names its value " + t.value())
                        .isLessThanOrEqualTo(1e-6 * Math.max(Math.abs(t.value()), Math.abs(ticks.get(1).value() - ticks.get(0).value())));
                if (log) {
                    double mantissa = v / Math.pow(10, Math.floor(Math.log10(v) + 1e-9));
                    assertThat(List.of(1.0, 2.0, 5.0)).as(axis + " tick '" + t.label() + "' is 1, 2 or 5 × 10^k")
                            .anySatisfy(m -> assertThat(Math.abs(mantissa - m)).isLessThan(1e-6));
                }
            }
        }
    }

    /** The legend labels of the drawn chart. */
    public static List<String> legend(ChartSpec spec) {
        List<String> out = new ArrayList<>();
        var items = Charts.build(spec).getXYPlot().getLegendItems();
        for (int i = 0; i < items.getItemCount(); i++) {
            LegendItem item = items.get(i);
            out.add(item.getLabel());
        }
        return out;
    }
}
