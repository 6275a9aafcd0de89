package org.ladderkin.report;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;

/**
 * A base-10 log axis whose ticks sit at 1, 2 and 5 times a power of ten, or at powers of ten when those crowd, and
 * whose auto range ends on such values: fractional steps of the exponent ("0.032, 0.316, 1.259") name no value a
 * reader would type. The densest set whose labels do not collide is used.
 */
final class ReadableLogAxis extends LogAxis {

    private static final long serialVersionUID = 1L;

    /** Candidate tick sets, densest first: mantissas per decade and the decade stride. */
    private static final int[][] MANTISSAS = {{1, 2, 5}, {1}, {1}, {1}, {1}, {1}, {1}, {1}};
    private static final int[] STRIDES = {1, 1, 2, 3, 5, 10, 20, 50};

    ReadableLogAxis(String label) {
        super(label);
        setBase(10);
        setSmallestValue(1e-300);
        setMinorTickMarksVisible(true);
    }

    @Override
    protected void autoAdjustRange() {
        super.autoAdjustRange();
        Range r = getRange();
        if (r.getLowerBound() > 0 && Double.isFinite(r.getUpperBound()) && r.getUpperBound() > r.getLowerBound()) {
            setRange(new Range(below(r.getLowerBound()), above(r.getUpperBound())), false, false);
        }
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        boolean horizontal = RectangleEdge.isTopOrBottom(edge);
        double lo = getLowerBound();
        double hi = getUpperBound();
        List ticks = new ArrayList();
        if (!(lo > 0) || !(hi > lo)) {
            return ticks;
        }
        double lengthPx = horizontal ? dataArea.getWidth() : dataArea.getHeight();
        double pxPerDecade = lengthPx / Math.log10(hi / lo);
        FontMetrics fm = g2.getFontMetrics(getTickLabelFont());
        int chosen = -1;
        int fallback = 0;
        for (int c = 0; c < STRIDES.length; c++) {
            List<Double> values = values(lo, hi, MANTISSAS[c], STRIDES[c]);
            if (values.size() < 2) {
                continue;
            }
            fallback = c;
            double needPx = horizontal ? widest(fm, AxisLabels.log(values)) + 10 : fm.getHeight() * 1.2;
            double gapDecades = MANTISSAS[c].length > 1 ? Math.log10(2) : STRIDES[c];
            if (gapDecades * pxPerDecade >= needPx) {
                chosen = c;
                break;
            }
        }
        int c = chosen >= 0 ? chosen : fallback;
        List<Double> values = values(lo, hi, MANTISSAS[c], STRIDES[c]);
        List<String> labels = AxisLabels.log(values);
        TextAnchor anchor = horizontal ? (edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER : TextAnchor.TOP_CENTER)
                : (edge == RectangleEdge.LEFT ? TextAnchor.CENTER_RIGHT : TextAnchor.CENTER_LEFT);
        for (int i = 0; i < values.size(); i++) {
            ticks.add(new NumberTick(TickType.MAJOR, values.get(i), labels.get(i), anchor, anchor, 0));
        }
        if (MANTISSAS[c].length == 1 && STRIDES[c] == 1) {
            for (double v : values(lo, hi, new int[] {2, 3, 4, 5, 6, 7, 8, 9}, 1)) {
                ticks.add(new NumberTick(TickType.MINOR, v, "", anchor, anchor, 0));
            }
        }
        return ticks;
    }

    /** m·10^k for m in {@code mantissas} and k a multiple of {@code stride}, within [lo, hi] (ends included). */
    static List<Double> values(double lo, double hi, int[] mantissas, int stride) {
        List<Double> out = new ArrayList<>();
        int first = Math.floorDiv((int) Math.floor(Math.log10(lo)) - 1, stride) * stride;
        int last = (int) Math.ceil(Math.log10(hi)) + 1;
        for (int k = first; k <= last; k += stride) {
            for (int m : mantissas) {
                double v = m * Math.pow(10, k);
                if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) {
                    out.add(v);
                }
            }
        }
        return out;
    }

    /** The largest 1, 2 or 5 × 10^k at or below {@code v}. */
    static double below(double v) {
        int k = (int) Math.floor(Math.log10(v));
        double p = Math.pow(10, k);
        for (int m : new int[] {10, 5, 2, 1}) {
            if (m * p <= v * (1 + 1e-9)) {
                return m * p;
            }
        }
        return p / 2;
    }

    /** The smallest 1, 2 or 5 × 10^k at or above {@code v}. */
    static double above(double v) {
        int k = (int) Math.floor(Math.log10(v));
        double p = Math.pow(10, k);
        for (int m : new int[] {1, 2, 5, 10}) {
            if (m * p >= v * (1 - 1e-9)) {
                return m * p;
            }
        }
        return 10 * p;
    }

    private static double widest(FontMetrics fm, List<String> labels) {
        return labels.stream().mapToDouble(fm::stringWidth).max().orElse(0);
    }
}
