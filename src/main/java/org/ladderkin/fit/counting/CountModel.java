package org.ladderkin.fit.counting;

import java.util.Objects;
import org.ladderkin.fit.ParameterValues;

/**
 * Expected counts of one histogram: μ_i = A·⟨IRF ⊗ PL⟩_i + b, the convolution averaged over bin i, then the
 * optional pile-up. PL comes from a {@link DecayLaw} (pulse-train wrap-around included there); the instrument
 * response is moved by the shift {@link #SHIFT} (sub-bin, fitted); A ({@link #AMPLITUDE}) is the counts per bin of a
 * unit emission rate and b ({@link #BACKGROUND}) the counts per bin of dark counts and stray light. The convolution is
 * done on a grid {@code oversample} times finer than the bins and each bin is the mean of its fine points.
 */
public final class CountModel {

    /** Key of the amplitude (counts per bin per unit emission). */
    public static final String AMPLITUDE = "amplitude";
    /** Key of the background (counts per bin). */
    public static final String BACKGROUND = "background";
    /** Key of the response's shift (s). */
    public static final String SHIFT = "shiftS";

    private final int histogram;
    private final double startS;
    private final double binS;
    private final int bins;
    private final int oversample;
    private final DecayLaw law;
    private final InstrumentResponse response;
    private final double periodS;
    private final PileUp pileUp;

    /**
     * @param histogram  index of the histogram (passed to the law)
     * @param geometry   the histogram whose bins are modelled (its counts are not read)
     * @param oversample fine points per bin (≥ 1)
     * @param periodS    pulse period (s), or NaN for pulses far apart
     * @param pileUp     the dead-time correction, or null
     */
    public CountModel(int histogram, CountHistogram geometry, int oversample, DecayLaw law, InstrumentResponse response,
                      double periodS, PileUp pileUp) {
        this.histogram = histogram;
        this.startS = geometry.startS();
        this.binS = geometry.binWidthS();
        this.bins = geometry.bins();
        if (oversample < 1) {
            throw new IllegalArgumentException("oversampling must be >= 1, was " + oversample);
        }
        this.oversample = oversample;
        this.law = Objects.requireNonNull(law, "law");
        this.response = Objects.requireNonNull(response, "response");
        if (!Double.isNaN(periodS) && !(periodS > 0 && Double.isFinite(periodS))) {
            throw new IllegalArgumentException("pulse period must be finite and > 0 (or NaN), was " + periodS + " s");
        }
        this.periodS = periodS;
        this.pileUp = pileUp;
        if (response.spanS() >= geometry.windowS()) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT, "the IRF spans %.4g ns, longer than the "
                    + "histogram '%s' (%.4g ns): record a longer window or crop the IRF", response.spanS() * 1e9,
                    geometry.label(), geometry.windowS() * 1e9));
        }
    }

    /** Expected counts in each bin at {@code p}. */
    public double[] expected(ParameterValues p) {
        double[] shape = shape(p);
        double a = p.get(AMPLITUDE);
        double b = p.get(BACKGROUND);
        for (int i = 0; i < shape.length; i++) {
            shape[i] = a * shape[i] + b;
        }
        if (pileUp != null) {
            pileUp.apply(shape);
        }
        return shape;
    }

    /** The bin-averaged convolution ⟨IRF ⊗ PL⟩ (before amplitude, background and pile-up). */
    public double[] shape(ParameterValues p) {
        double h = binS / oversample;
        int fine = bins * oversample;
        int[] first = new int[1];
        double fwhm = response.isMeasured() ? Double.NaN : p.get(InstrumentResponse.FWHM);
        double[] g = response.kernel(h, p.get(SHIFT), fwhm, first);
        int len = g.length;
        // emission at start + (q - first - len + 1 + 0.5)·h, q = 0 .. fine + len - 2
        double[] since = new double[fine + len - 1];
        for (int q = 0; q < since.length; q++) {
            double t = startS + (q - first[0] - len + 1 + 0.5) * h;
            if (!Double.isNaN(periodS)) {
                t = t - Math.floor(t / periodS) * periodS;
            }
            since[q] = t;
        }
        double[] d = law.emission(histogram, since, periodS, p);
        double[] out = new double[bins];
        for (int m = 0; m < fine; m++) {
            double s = 0;
            // conv(c_m) = Σ_j g_j·D(c_m − (first + j)h): D's index is m − j + len − 1
            int base = m + len - 1;
            for (int j = 0; j < len; j++) {
                s += g[j] * d[base - j];
            }
            out[m / oversample] += s;
        }
        for (int i = 0; i < bins; i++) {
            out[i] /= oversample;
        }
        return out;
    }
}
