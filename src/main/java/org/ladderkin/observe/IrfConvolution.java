package org.ladderkin.observe;

/**
 * Convolution of a decay sampled on a uniform time grid with an instrument response function (IRF). The IRF is a
 * Gaussian given by its FWHM or a sampled curve (e.g. measured scatter); either is normalised to unit area so the
 * convolution keeps the integrated signal.
 */
public final class IrfConvolution {

    private static final double FWHM_PER_SIGMA = 2 * Math.sqrt(2 * Math.log(2));

    private IrfConvolution() {
    }

    /** Standard deviation of a Gaussian of the given FWHM. */
    public static double sigmaOfFwhm(double fwhm) {
        return fwhm / FWHM_PER_SIGMA;
    }

    /**
     * Convolves {@code signal} (zero before the first sample, sampled every {@code stepS}) with a Gaussian IRF centred
     * on zero delay. Output on the same grid.
     */
    public static double[] gaussian(double[] signal, double stepS, double irfFwhmS) {
        requireGrid(signal, stepS);
        if (!(irfFwhmS > 0)) {
            throw new IllegalArgumentException("IRF FWHM must be > 0, was " + irfFwhmS + " s");
        }
        double sigma = sigmaOfFwhm(irfFwhmS);
        int half = (int) Math.ceil(6 * sigma / stepS);
        double[] kernel = new double[2 * half + 1];
        // Integrate the Gaussian over each bin instead of sampling it: exact area even when σ is below the step.
        for (int i = -half; i <= half; i++) {
            double lo = (i - 0.5) * stepS / (Math.sqrt(2) * sigma);
            double hi = (i + 0.5) * stepS / (Math.sqrt(2) * sigma);
            kernel[i + half] = 0.5 * org.hipparchus.special.Erf.erf(lo, hi);
        }
        normalise(kernel);
        return convolveKernel(signal, kernel, half);
    }

    /**
     * Convolves with a sampled IRF (times in s, any spacing, ascending), resampled onto the signal's grid by linear
     * interpolation and normalised to unit area. The IRF's time zero is where its time axis is zero.
     */
    public static double[] sampled(double[] signal, double stepS, double[] irfTimesS, double[] irfValues) {
        requireGrid(signal, stepS);
        if (irfTimesS.length != irfValues.length || irfTimesS.length < 2) {
            throw new IllegalArgumentException("IRF needs at least two (time, value) points of equal count");
        }
        for (int i = 1; i < irfTimesS.length; i++) {
            if (!(irfTimesS[i] > irfTimesS[i - 1])) {
                throw new IllegalArgumentException("IRF times must increase strictly (at point " + i + ")");
            }
        }
        int lo = (int) Math.floor(irfTimesS[0] / stepS);
        int hi = (int) Math.ceil(irfTimesS[irfTimesS.length - 1] / stepS);
        int half = Math.max(Math.abs(lo), Math.abs(hi));
        double[] kernel = new double[2 * half + 1];
        double sum = 0;
        for (int i = -half; i <= half; i++) {
            double v = Math.max(0, interpolate(irfTimesS, irfValues, i * stepS));
            kernel[i + half] = v;
            sum += v;
        }
        if (!(sum > 0)) {
            throw new IllegalArgumentException("IRF has no positive area on a " + stepS + " s grid");
        }
        normalise(kernel);
        return convolveKernel(signal, kernel, half);
    }

    /** Unit sum, so the convolution keeps the integrated signal even where the kernel's tails were cut. */
    private static void normalise(double[] kernel) {
        double sum = 0;
        for (double v : kernel) {
            sum += v;
        }
        for (int i = 0; i < kernel.length; i++) {
            kernel[i] /= sum;
        }
    }

    private static double[] convolveKernel(double[] signal, double[] kernel, int half) {
        double[] out = new double[signal.length];
        for (int n = 0; n < signal.length; n++) {
            double acc = 0;
            int jMin = Math.max(-half, n - signal.length + 1);
            int jMax = Math.min(half, n);
            for (int j = jMin; j <= jMax; j++) {
                acc += kernel[j + half] * signal[n - j];
            }
            out[n] = acc;
        }
        return out;
    }

    private static double interpolate(double[] x, double[] y, double at) {
        if (at < x[0] || at > x[x.length - 1]) {
            return 0;
        }
        int i = java.util.Arrays.binarySearch(x, at);
        if (i >= 0) {
            return y[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double f = (at - x[lo]) / (x[hi] - x[lo]);
        return y[lo] + f * (y[hi] - y[lo]);
    }

    private static void requireGrid(double[] signal, double stepS) {
        if (signal.length == 0) {
            throw new IllegalArgumentException("signal is empty");
        }
        if (!(stepS > 0) || Double.isInfinite(stepS)) {
            throw new IllegalArgumentException("time step must be > 0 and finite, was " + stepS + " s");
        }
    }
}
