package org.ladderkin.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.axis.TickUnits;
import org.jfree.chart.axis.ValueTick;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A linear axis with steps of 1, 2 or 5 times a power of ten and its labels in one format ({@link AxisLabels#linear}),
 * so "0.0005" never stands beside "1E-3" and zero is written "0".
 */
final class ReadableNumberAxis extends NumberAxis {

    private static final long serialVersionUID = 1L;

    /** @param integers steps of whole numbers only (an axis of exciton numbers) */
    ReadableNumberAxis(String label, boolean integers) {
        super(label);
        setAutoRangeIncludesZero(false);
        TickUnits units = new TickUnits();
        for (int k = integers ? 0 : -12; k <= 15; k++) {
            for (int m : new int[] {1, 2, 5}) {
                double step = m * Math.pow(10, k);
                DecimalFormat f = new DecimalFormat(k >= 0 ? "0" : "0." + "0".repeat(-k), DecimalFormatSymbols.getInstance(Locale.ROOT));
                units.add(new NumberTickUnit(step, f));
            }
        }
        setStandardTickUnits(units);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        List<?> ticks = super.refreshTicks(g2, state, dataArea, edge);
        List<Double> values = new ArrayList<>();
        for (Object t : ticks) {
            if (t instanceof ValueTick v && v.getTickType() == TickType.MAJOR) {
                values.add(v.getValue());
            }
        }
        List<String> labels = AxisLabels.linear(values, getTickUnit().getSize());
        List out = new ArrayList();
        int i = 0;
        for (Object t : ticks) {
            if (t instanceof ValueTick v && v.getTickType() == TickType.MAJOR) {
                out.add(new NumberTick(TickType.MAJOR, v.getValue(), labels.get(i++), v.getTextAnchor(), v.getRotationAnchor(), v.getAngle()));
            } else {
                out.add(t);
            }
        }
        return out;
    }
}
