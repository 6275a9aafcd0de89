package org.ladderkin.fit.counting;

import java.util.Objects;
import org.ladderkin.observe.IrfConvolution;
import org.ladderkin.observe.MeasuredIrf;

/**
 * The instrument response a count model is convolved with: a Gaussian of fitted or held width centred on the shift,
 * or a measured response (a scatterer's histogram) on the instrument's own time axis, moved by the shift. Either is
 * sampled on the model's fine grid and renormalised to unit sum there, so a response cut by the grid loses no counts
 * and a sub-bin shift moves the model smoothly.
 */
public final class InstrumentResponse {

    /** The key of the Gaussian width parameter (its own name, so a joint fit can give TA traces another response). */
    public static final String FWHM = "countIrfFwhmS";
    /** Half-width of the sampled Gaussian in standard deviations. */
    private static final double GAUSS_REACH = 5;

    private final MeasuredIrf measured;

    private InstrumentResponse(MeasuredIrf measured) {
        this.measured = measured;
    }

    /** A Gaussian whose FWHM the model reads from {@link #FWHM}. */
    public static InstrumentResponse gaussian() {
        return new InstrumentResponse(null);
    }

    /** A measured response, placed where it was recorded on the instrument's time axis. */
    public static InstrumentResponse measured(MeasuredIrf irf) {
        return new InstrumentResponse(Objects.requireNonNull(irf, "irf"));
    }

    /** Whether this is a measured response. */
    public boolean isMeasured() {
        return measured != null;
    }

    /** The measured response, or null for the Gaussian. */
    public MeasuredIrf measuredIrf() {
        return measured;
    }

    /** Time span the response covers (s): 0 for the Gaussian, whose width is a parameter. */
    public double spanS() {
        if (measured == null) {
            return 0;
        }
        double[] t = measured.timesS();
        return t[t.length - 1] - t[0];
    }

    /**
     * Weights g_j of offsets (first + j)·step, summing to one.
     *
     * @param first  receives the index of the first offset
     * @param shiftS where the response is moved to (the Gaussian's centre; the measured response's displacement)
     * @param fwhmS  the Gaussian's width (ignored for a measured response)
     */
    double[] kernel(double stepS, double shiftS, double fwhmS, int[] first) {
        double lo;
        double hi;
        if (measured == null) {
            if (!(fwhmS > 0) || !Double.isFinite(fwhmS)) {
                throw new IllegalArgumentException("IRF FWHM must be finite and > 0, was " + fwhmS + " s");
            }
            double sigma = IrfConvolution.sigmaOfFwhm(fwhmS);
            lo = shiftS - GAUSS_REACH * sigma;
            hi = shiftS + GAUSS_REACH * sigma;
        } else {
            double[] t = measured.timesS();
            lo = t[0] + shiftS;
            hi = t[t.length - 1] + shiftS;
        }
        int a = (int) Math.floor(lo / stepS);
        int b = (int) Math.ceil(hi / stepS);
        double[] g = new double[b - a + 1];
        double sum = 0;
        double sigma = measured == null ? IrfConvolution.sigmaOfFwhm(fwhmS) : 0;
        for (int j = 0; j < g.length; j++) {
            double x = (a + j) * stepS - shiftS;
            g[j] = measured == null ? Math.exp(-0.5 * (x / sigma) * (x / sigma)) : interpolate(x);
            sum += g[j];
        }
        if (!(sum > 0)) {
            // a response narrower than the grid: all its weight on the nearest point
            g = new double[] {1};
            a = (int) Math.round(shiftS / stepS);
            sum = 1;
        }
        for (int j = 0; j < g.length; j++) {
            g[j] /= sum;
        }
        first[0] = a;
        return g;
    }

    private double interpolate(double x) {
        double[] t = measured.timesS();
        double[] v = measured.densityPerS();
        if (x <= t[0] || x >= t[t.length - 1]) {
            return 0;
        }
        int lo = 0;
        int hi = t.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (t[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double f = (x - t[lo]) / (t[hi] - t[lo]);
        return v[lo] + f * (v[hi] - v[lo]);
    }
}
