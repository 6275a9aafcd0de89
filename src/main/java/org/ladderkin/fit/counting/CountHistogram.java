package org.ladderkin.fit.counting;

import java.util.Arrays;
import java.util.Objects;

/**
 * One photon-counting histogram: whole counts in equal, contiguous time bins.
 *
 * @param label       name for messages and reports
 * @param startS      left edge of the first bin on the instrument's time axis (s)
 * @param binWidthS   bin width (s), &gt; 0
 * @param counts      counts per bin: whole numbers, ≥ 0, at least one bin
 * @param excitation  photon fluence (photons/m²) or other excitation measure of this histogram, or NaN when unknown
 */
public record CountHistogram(String label, double startS, double binWidthS, double[] counts, double excitation) {

    public CountHistogram {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(counts, "counts");
        counts = counts.clone();
        if (counts.length == 0) {
            throw new IllegalArgumentException("histogram '" + label + "' has no bins");
        }
        if (!Double.isFinite(startS)) {
            throw new IllegalArgumentException("histogram '" + label + "': start must be finite, was " + startS);
        }
        if (!(binWidthS > 0) || !Double.isFinite(binWidthS)) {
            throw new IllegalArgumentException("histogram '" + label + "': bin width must be finite and > 0, was " + binWidthS + " s");
        }
        for (int i = 0; i < counts.length; i++) {
            double c = counts[i];
            if (!(c >= 0) || !Double.isFinite(c) || c != Math.rint(c)) {
                throw new IllegalArgumentException("histogram '" + label + "': bin " + i + " holds " + c
                        + " (counts are whole numbers >= 0)");
            }
        }
        if (!Double.isNaN(excitation) && !(excitation > 0 && Double.isFinite(excitation))) {
            throw new IllegalArgumentException("histogram '" + label + "': excitation must be finite and > 0 (or NaN), was " + excitation);
        }
    }

    /** A histogram without an excitation. */
    public static CountHistogram of(String label, double startS, double binWidthS, double[] counts) {
        return new CountHistogram(label, startS, binWidthS, counts, Double.NaN);
    }

    /** A copy with an excitation. */
    public CountHistogram withExcitation(double value) {
        return new CountHistogram(label, startS, binWidthS, counts, value);
    }

    @Override
    public double[] counts() {
        return counts.clone();
    }

    /** Number of bins. */
    public int bins() {
        return counts.length;
    }

    /** Total counts. */
    public double total() {
        double s = 0;
        for (double c : counts) {
            s += c;
        }
        return s;
    }

    /** Centre of bin {@code i} (s). */
    public double centreS(int i) {
        return startS + (i + 0.5) * binWidthS;
    }

    /** The time window the histogram covers (s). */
    public double windowS() {
        return counts.length * binWidthS;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CountHistogram h && label.equals(h.label) && startS == h.startS && binWidthS == h.binWidthS
                && Arrays.equals(counts, h.counts) && Double.compare(excitation, h.excitation) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(label, startS, binWidthS, Arrays.hashCode(counts), excitation);
    }

    @Override
    public String toString() {
        return "CountHistogram[" + label + ", " + counts.length + " bins]";
    }
}
