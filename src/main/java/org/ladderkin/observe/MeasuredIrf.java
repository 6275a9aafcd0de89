package org.ladderkin.observe;

import java.util.Arrays;
import java.util.Locale;
import java.util.Objects;

/**
 * A measured instrument response (IRF), such as a pump–probe cross-correlation or the TCSPC response to scattered
 * laser light. The curve is read as piecewise linear between its samples and zero outside them, and is kept normalised
 * to unit area over time; for a piecewise-linear curve the trapezoid rule is that area exactly, so the normalisation
 * has no quadrature error.
 * <p>
 * Time zero: a model convolved with this response puts the IRF's <em>centroid</em> (its first moment) at the
 * model's time zero. A Gaussian IRF is centred on time zero the same way, so a fitted time zero means the same with
 * either response; and because the response then has zero mean, the convolution changes a slowly varying signal only
 * in second order (by ½·Var·b″), which is what lets a model skip the convolution long after the response has ended.
 * The times as given are kept; only {@link #centroidS()} says where zero falls.
 *
 * @param timesS      sample times (s), strictly increasing, at least {@link #MIN_POINTS}
 * @param densityPerS response at each time (1/s), non-negative, normalised here to unit trapezoid area
 * @param origin      where the curve came from (e.g. the file name as written), for messages and reports
 */
public record MeasuredIrf(double[] timesS, double[] densityPerS, String origin) {

    /** Fewest samples accepted: fewer cannot resolve a peak and both its half-maximum crossings. */
    public static final int MIN_POINTS = 5;

    public MeasuredIrf {
        Objects.requireNonNull(origin, "origin");
        timesS = timesS.clone();
        densityPerS = densityPerS.clone();
        int n = timesS.length;
        if (densityPerS.length != n) {
            throw new IllegalArgumentException(origin + ": IRF needs one response value per time, has " + n + " times and "
                    + densityPerS.length + " values");
        }
        if (n < MIN_POINTS) {
            throw new IllegalArgumentException(origin + ": IRF needs at least " + MIN_POINTS + " samples, has " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(timesS[i]) || !Double.isFinite(densityPerS[i])) {
                throw new IllegalArgumentException(origin + ": IRF sample " + (i + 1) + " is not finite (time "
                        + timesS[i] + " s, value " + densityPerS[i] + ")");
            }
            if (densityPerS[i] < 0) {
                throw new IllegalArgumentException(origin + ": IRF value at " + seconds(timesS[i]) + " is negative ("
                        + densityPerS[i] + "; subtract the background and clip the noise first)");
            }
            if (i > 0 && !(timesS[i] > timesS[i - 1])) {
                throw new IllegalArgumentException(origin + ": IRF times must increase strictly, but " + seconds(timesS[i])
                        + " follows " + seconds(timesS[i - 1]));
            }
        }
        double area = 0;
        for (int i = 1; i < n; i++) {
            area += (timesS[i] - timesS[i - 1]) * (densityPerS[i] + densityPerS[i - 1]) / 2;
        }
        if (!(area > 0)) {
            throw new IllegalArgumentException(origin + ": IRF has no positive area (all values are zero)");
        }
        for (int i = 0; i < n; i++) {
            densityPerS[i] /= area;
        }
        requireSinglePeak(timesS, densityPerS, origin);
    }

    /**
     * One peak: the samples at or above half maximum form one run, and the curve is below half maximum at both ends.
     * Smaller bumps (an etalon echo, afterpulsing) below half maximum are accepted: they are part of the response.
     */
    private static void requireSinglePeak(double[] t, double[] g, String origin) {
        int peak = argMax(g);
        double half = g[peak] / 2;
        if (g[0] >= half) {
            throw new IllegalArgumentException(origin + ": IRF does not fall below half maximum before its first sample at "
                    + seconds(t[0]) + " (record a wider time window)");
        }
        if (g[g.length - 1] >= half) {
            throw new IllegalArgumentException(origin + ": IRF does not fall below half maximum after its last sample at "
                    + seconds(t[t.length - 1]) + " (record a wider time window)");
        }
        int first = 0;
        while (g[first] < half) {
            first++;
        }
        int last = g.length - 1;
        while (g[last] < half) {
            last--;
        }
        for (int i = first; i <= last; i++) {
            if (g[i] < half) {
                int again = i;
                while (g[again] < half) {
                    again++;
                }
                throw new IllegalArgumentException(String.format(Locale.ROOT, "%s: IRF has more than one peak above half "
                        + "maximum: it drops to %.0f %% of the peak at %s and rises to %.0f %% again at %s (one pulse "
                        + "expected: cut the curve to the main peak)", origin, 100 * g[i] / g[peak], seconds(t[i]),
                        100 * g[again] / g[peak], seconds(t[again])));
            }
        }
    }

    @Override
    public double[] timesS() {
        return timesS.clone();
    }

    @Override
    public double[] densityPerS() {
        return densityPerS.clone();
    }

    /** Number of samples. */
    public int size() {
        return timesS.length;
    }

    /** Full width at half maximum (s): the half-maximum crossings on both sides of the peak, linearly interpolated. */
    public double fwhmS() {
        int peak = argMax(densityPerS);
        double half = densityPerS[peak] / 2;
        int i = peak;
        while (densityPerS[i] >= half) {
            i--;
        }
        double left = crossing(i, half);
        int j = peak;
        while (densityPerS[j] >= half) {
            j++;
        }
        double right = crossing(j - 1, half);
        return right - left;
    }

    /** Where the straight line between samples {@code i} and {@code i + 1} passes {@code level}. */
    private double crossing(int i, double level) {
        double f = (level - densityPerS[i]) / (densityPerS[i + 1] - densityPerS[i]);
        return timesS[i] + f * (timesS[i + 1] - timesS[i]);
    }

    /** First moment of the piecewise-linear curve (s), exact; this time is the model's time zero. */
    public double centroidS() {
        double m = 0;
        for (int i = 1; i < timesS.length; i++) {
            double a = timesS[i - 1];
            double b = timesS[i];
            // ∫ t·g dt over a segment with g linear: Simpson's rule is exact for the quadratic integrand
            m += (b - a) / 6 * (densityPerS[i - 1] * (2 * a + b) + densityPerS[i] * (a + 2 * b));
        }
        return m;
    }

    /** Root-mean-square width about the centroid (s), exact for the piecewise-linear curve. */
    public double rmsWidthS() {
        double c = centroidS();
        double v = 0;
        for (int i = 1; i < timesS.length; i++) {
            double a = timesS[i - 1] - c;
            double b = timesS[i] - c;
            double mid = (a + b) / 2;
            double gMid = (densityPerS[i - 1] + densityPerS[i]) / 2;
            // t²·g is cubic on the segment: Simpson's rule is exact
            v += (b - a) / 6 * (a * a * densityPerS[i - 1] + 4 * mid * mid * gMid + b * b * densityPerS[i]);
        }
        return Math.sqrt(Math.max(0, v));
    }

    /** Area of the response after time {@code tS} (on the curve's own time axis), exact; 1 before it starts. */
    public double areaAfter(double tS) {
        int n = timesS.length;
        if (tS <= timesS[0]) {
            return 1;
        }
        if (tS >= timesS[n - 1]) {
            return 0;
        }
        int hi = Arrays.binarySearch(timesS, tS);
        if (hi >= 0) {
            return tailFrom(hi);
        }
        hi = -hi - 1;
        int lo = hi - 1;
        double gAt = densityPerS[lo] + (densityPerS[hi] - densityPerS[lo]) * (tS - timesS[lo]) / (timesS[hi] - timesS[lo]);
        return (timesS[hi] - tS) * (gAt + densityPerS[hi]) / 2 + tailFrom(hi);
    }

    private double tailFrom(int i) {
        double s = 0;
        for (int k = i + 1; k < timesS.length; k++) {
            s += (timesS[k] - timesS[k - 1]) * (densityPerS[k] + densityPerS[k - 1]) / 2;
        }
        return s;
    }

    private static int argMax(double[] g) {
        int p = 0;
        for (int i = 1; i < g.length; i++) {
            if (g[i] > g[p]) {
                p = i;
            }
        }
        return p;
    }

    private static String seconds(double s) {
        return String.format(Locale.ROOT, "%.6g s", s);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MeasuredIrf m && Arrays.equals(timesS, m.timesS) && Arrays.equals(densityPerS, m.densityPerS)
                && origin.equals(m.origin);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(timesS) + Arrays.hashCode(densityPerS)) + origin.hashCode();
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "MeasuredIrf[%s, %d samples, FWHM %.4g s, centroid %.4g s]", origin,
                timesS.length, fwhmS(), centroidS());
    }
}
