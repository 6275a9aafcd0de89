package org.ladderkin.fit.map;

import java.util.Arrays;

/**
 * One ΔA(λ, t) map in OD: wavelengths ascending, delays ascending, values row by row (one spectrum per delay) in one
 * flat array so a map of 1024 × 300 cells is one array of doubles, not 300 objects. A missing cell is NaN and stays
 * in place; {@link #missing(int, int)} is the mask, so a window or a fit sees the same grid the file had. The arrays
 * are shared, not copied (a series of broadband maps is large): treat them as read-only; windows make new ones.
 *
 * @param wavelengthsM probe wavelengths (m), strictly increasing
 * @param delaysS      pump–probe delays (s), strictly increasing
 * @param deltaAOd     ΔA in OD, {@code deltaAOd[t * wavelengths + w]}; NaN where the cell was missing
 */
public record DeltaAMap(double[] wavelengthsM, double[] delaysS, double[] deltaAOd) {

    public DeltaAMap {
        if (wavelengthsM.length == 0 || delaysS.length == 0) {
            throw new IllegalArgumentException("a map needs at least one wavelength and one delay, has "
                    + wavelengthsM.length + " × " + delaysS.length);
        }
        if ((long) wavelengthsM.length * delaysS.length != deltaAOd.length) {
            throw new IllegalArgumentException(deltaAOd.length + " values for " + wavelengthsM.length + " wavelengths × "
                    + delaysS.length + " delays");
        }
        for (int i = 0; i < wavelengthsM.length; i++) {
            if (!(wavelengthsM[i] > 0) || !Double.isFinite(wavelengthsM[i]) || i > 0 && !(wavelengthsM[i] > wavelengthsM[i - 1])) {
                throw new IllegalArgumentException("wavelengths must be positive and strictly increasing, index " + i + " is "
                        + wavelengthsM[i] + " m");
            }
        }
        for (int i = 0; i < delaysS.length; i++) {
            if (!Double.isFinite(delaysS[i]) || i > 0 && !(delaysS[i] > delaysS[i - 1])) {
                throw new IllegalArgumentException("delays must be finite and strictly increasing, index " + i + " is "
                        + delaysS[i] + " s");
            }
        }
        for (double v : deltaAOd) {
            if (Double.isInfinite(v)) {
                throw new IllegalArgumentException("ΔA must be finite or NaN (missing), found " + v);
            }
        }
    }

    public int wavelengthCount() {
        return wavelengthsM.length;
    }

    public int delayCount() {
        return delaysS.length;
    }

    /** ΔA (OD) at delay index {@code t} and wavelength index {@code w}; NaN when missing. */
    public double value(int t, int w) {
        return deltaAOd[t * wavelengthsM.length + w];
    }

    public boolean missing(int t, int w) {
        return Double.isNaN(value(t, w));
    }

    /** Number of missing cells. */
    public int missingCount() {
        int n = 0;
        for (double v : deltaAOd) {
            n += Double.isNaN(v) ? 1 : 0;
        }
        return n;
    }

    /** The wavelengths within [lowM, highM], all delays. */
    public DeltaAMap wavelengthWindow(double lowM, double highM) {
        requireRange(lowM, highM, "wavelength");
        int from = 0;
        while (from < wavelengthsM.length && wavelengthsM[from] < lowM) {
            from++;
        }
        int to = from;
        while (to < wavelengthsM.length && wavelengthsM[to] <= highM) {
            to++;
        }
        if (to == from) {
            throw new IllegalArgumentException("no wavelength lies in " + lowM + "–" + highM + " m (the map covers "
                    + wavelengthsM[0] + "–" + wavelengthsM[wavelengthsM.length - 1] + " m)");
        }
        int n = to - from;
        double[] values = new double[n * delaysS.length];
        for (int t = 0; t < delaysS.length; t++) {
            System.arraycopy(deltaAOd, t * wavelengthsM.length + from, values, t * n, n);
        }
        return new DeltaAMap(Arrays.copyOfRange(wavelengthsM, from, to), delaysS.clone(), values);
    }

    /** The delays within [fromS, toS], all wavelengths. */
    public DeltaAMap delayWindow(double fromS, double toS) {
        requireRange(fromS, toS, "delay");
        return keepDelays(fromS, toS, false, "no delay lies in " + fromS + "–" + toS + " s");
    }

    /**
     * Without the delays within ±halfWidthS of time zero, where the pump and probe overlap and the cross-phase
     * artefact, not the dots, makes the signal.
     */
    public DeltaAMap excludingAroundTimeZero(double halfWidthS) {
        if (!(halfWidthS >= 0) || !Double.isFinite(halfWidthS)) {
            throw new IllegalArgumentException("half width must be finite and ≥ 0, was " + halfWidthS + " s");
        }
        return keepDelays(-halfWidthS, halfWidthS, true, "every delay lies within ±" + halfWidthS + " s of time zero");
    }

    private DeltaAMap keepDelays(double lowS, double highS, boolean outside, String whenEmpty) {
        int n = wavelengthsM.length;
        int kept = 0;
        for (double d : delaysS) {
            kept += (d >= lowS && d <= highS) != outside ? 1 : 0;
        }
        if (kept == 0) {
            throw new IllegalArgumentException(whenEmpty);
        }
        double[] delays = new double[kept];
        double[] values = new double[kept * n];
        int k = 0;
        for (int t = 0; t < delaysS.length; t++) {
            if ((delaysS[t] >= lowS && delaysS[t] <= highS) != outside) {
                delays[k] = delaysS[t];
                System.arraycopy(deltaAOd, t * n, values, k * n, n);
                k++;
            }
        }
        return new DeltaAMap(wavelengthsM.clone(), delays, values);
    }

    private static void requireRange(double low, double high, String what) {
        if (!Double.isFinite(low) || !Double.isFinite(high) || !(high >= low)) {
            throw new IllegalArgumentException(what + " window must satisfy low ≤ high, both finite, was " + low + " to " + high);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DeltaAMap m && Arrays.equals(wavelengthsM, m.wavelengthsM) && Arrays.equals(delaysS, m.delaysS)
                && Arrays.equals(deltaAOd, m.deltaAOd);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * Arrays.hashCode(wavelengthsM) + Arrays.hashCode(delaysS)) + Arrays.hashCode(deltaAOd);
    }

    @Override
    public String toString() {
        return "DeltaAMap[" + wavelengthsM.length + " wavelengths × " + delaysS.length + " delays, " + missingCount() + " missing]";
    }
}
