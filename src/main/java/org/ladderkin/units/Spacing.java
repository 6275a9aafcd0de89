package org.ladderkin.units;

/** Evenly and logarithmically spaced grids whose first and last points are exactly the ends asked for. */
public final class Spacing {

    private Spacing() {
    }

    /** {@code count} points from {@code from} to {@code to}, equal steps. */
    public static double[] linear(double from, double to, int count) {
        return spaced(from, to, count, false);
    }

    /** {@code count} points from {@code from} to {@code to} (both > 0), equal ratios. */
    public static double[] log(double from, double to, int count) {
        if (!(from > 0) || !(to > 0)) {
            throw new IllegalArgumentException("a log-spaced grid needs ends above 0, was " + from + " to " + to);
        }
        return spaced(from, to, count, true);
    }

    private static double[] spaced(double from, double to, int count, boolean log) {
        if (count < 2) {
            throw new IllegalArgumentException("a grid needs at least 2 points, was " + count);
        }
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("grid ends must be finite, was " + from + " to " + to);
        }
        double[] d = new double[count];
        for (int i = 0; i < count; i++) {
            double f = i / (double) (count - 1);
            d[i] = log ? from * Math.pow(to / from, f) : from + (to - from) * f;
        }
        // the formulas round at the far end; pinning keeps the range exactly as written
        d[0] = from;
        d[count - 1] = to;
        return d;
    }
}
