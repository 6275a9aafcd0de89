package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The model-light estimate of the multiplication yield: the bleach ratio A/B of each trace, A at an early delay (after
 * cooling, before Auger decay) and B at a late one (after Auger decay), extrapolated to zero excitation, where it is
 * the number of excitons per absorbed photon, 1 + η (the forward relation is {@code observe.EarlyLate}). Only the
 * weakest traces enter, where A/B is a straight line in the excitation; the line is a weighted least squares with
 * each ratio's error from the trace's point-to-point noise.
 */
public final class EarlyLateYield {

    /** Traces up to this ⟨N⟩ enter the straight line (A/B bends beyond it). */
    public static final double MAX_MEAN_OCCUPANCY = 0.5;
    /** Points within this factor of a target delay are averaged. */
    private static final double WINDOW = 1.1;

    private EarlyLateYield() {
    }

    /**
     * The estimate.
     *
     * @param limit          the intercept, 1 + η
     * @param limitStdError  its standard error
     * @param slope          d(A/B)/dx in the traces' excitation unit
     * @param x              excitation of each trace used (as recorded)
     * @param ratio          A/B of each trace used
     * @param ratioStdError  their errors
     * @param earlyS         early delay (s)
     * @param lateS          late delay (s)
     */
    public record Estimate(double limit, double limitStdError, double slope, double[] x, double[] ratio,
                           double[] ratioStdError, double earlyS, double lateS) {
        public Estimate {
            x = x.clone();
            ratio = ratio.clone();
            ratioStdError = ratioStdError.clone();
        }

        /** η = A/B at zero excitation − 1. */
        public double eta() {
            return limit - 1;
        }
    }

    /**
     * Estimates the limit from the traces whose ⟨N⟩ ({@code meanN}, e.g. a full fit's) is at most
     * {@link #MAX_MEAN_OCCUPANCY}, or from the weaker half of the series (at least two traces) when none or one is.
     *
     * @param meanN ⟨N⟩ per trace, or null to take the weaker half
     * @throws IllegalArgumentException without two traces holding both delays
     */
    public static Estimate of(Dataset data, double[] meanN, double earlyS, double lateS) {
        if (!(earlyS >= 0) || !(lateS > earlyS)) {
            throw new IllegalArgumentException("the late delay must come after the early one (" + earlyS + " s, " + lateS + " s)");
        }
        int n = data.size();
        double[] x = new double[n];
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            Trace t = data.traces().get(i);
            x[i] = t.metadata().excitation().orElseThrow(() -> new IllegalArgumentException("trace '" + t.label()
                    + "' has no excitation")).value();
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(x[a], x[b]));
        List<Integer> used = new ArrayList<>();
        for (Integer i : order) {
            if (meanN != null && meanN.length == n && meanN[i] <= MAX_MEAN_OCCUPANCY) {
                used.add(i);
            }
        }
        if (used.size() < 2) {
            used.clear();
            for (int k = 0; k < Math.max(2, (n + 1) / 2) && k < n; k++) {
                used.add(order[k]);
            }
        }
        if (used.size() < 2) {
            throw new IllegalArgumentException("the early/late limit needs at least two traces, got " + used.size());
        }
        int m = used.size();
        double[] ux = new double[m];
        double[] r = new double[m];
        double[] se = new double[m];
        for (int k = 0; k < m; k++) {
            Trace t = data.traces().get(used.get(k));
            double noise = pointToPointNoise(t.signal());
            double[] a = windowMean(t, earlyS);
            double[] b = windowMean(t, lateS);
            ux[k] = x[used.get(k)];
            r[k] = a[0] / b[0];
            double sa = noise / Math.sqrt(a[1]);
            double sb = noise / Math.sqrt(b[1]);
            se[k] = Math.abs(r[k]) * Math.hypot(sa / a[0], sb / b[0]);
            if (!Double.isFinite(r[k]) || !(se[k] > 0)) {
                throw new IllegalArgumentException("trace '" + t.label() + "' gives no usable A/B at " + earlyS + " s and "
                        + lateS + " s (no signal at the late delay?)");
            }
        }
        double s = 0;
        double sx = 0;
        double sxx = 0;
        double sy = 0;
        double sxy = 0;
        for (int k = 0; k < m; k++) {
            double w = 1 / (se[k] * se[k]);
            s += w;
            sx += w * ux[k];
            sxx += w * ux[k] * ux[k];
            sy += w * r[k];
            sxy += w * ux[k] * r[k];
        }
        double det = s * sxx - sx * sx;
        double slope = (s * sxy - sx * sy) / det;
        double intercept = (sxx * sy - sx * sxy) / det;
        return new Estimate(intercept, Math.sqrt(sxx / det), slope, ux, r, se, earlyS, lateS);
    }

    /** Mean of the points within {@link #WINDOW} of {@code atS} (the nearest point when none is), and their count. */
    private static double[] windowMean(Trace t, double atS) {
        double[] d = t.delaysS();
        double[] y = t.signal();
        double sum = 0;
        int count = 0;
        int nearest = 0;
        for (int i = 0; i < d.length; i++) {
            if (d[i] > 0 && d[i] >= atS / WINDOW && d[i] <= atS * WINDOW) {
                sum += y[i];
                count++;
            }
            if (Math.abs(d[i] - atS) < Math.abs(d[nearest] - atS)) {
                nearest = i;
            }
        }
        return count > 0 ? new double[] {sum / count, count} : new double[] {y[nearest], 1};
    }

    /** σ from successive differences, √(Σ(Δy)²/(2(n−1))): a smooth signal hardly adds to it. */
    private static double pointToPointNoise(double[] y) {
        double s = 0;
        for (int i = 1; i < y.length; i++) {
            s += (y[i] - y[i - 1]) * (y[i] - y[i - 1]);
        }
        return Math.sqrt(s / (2 * (y.length - 1)));
    }
}
