package org.ladderkin.fit.counting;

import java.util.List;
import java.util.Objects;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;

/**
 * A counting histogram under Poisson statistics: its amplitude and background are its own parameters, started from
 * the data (background from the quietest tenth of the bins, amplitude from the peak above it).
 */
public final class HistogramPart implements LikelihoodPart {

    private final CountHistogram histogram;
    private final CountModel model;
    private final double[] counts;
    private final double amplitudeStart;
    private final double backgroundStart;
    private final double heldBackground;

    /**
     * @param heldBackground the background held at a known value (counts per bin, e.g. measured before the pulse),
     *                       or NaN to fit it
     */
    public HistogramPart(CountHistogram histogram, CountModel model, double heldBackground, double amplitudeStart) {
        this.histogram = Objects.requireNonNull(histogram, "histogram");
        this.model = Objects.requireNonNull(model, "model");
        this.counts = histogram.counts();
        if (!Double.isNaN(heldBackground) && !(heldBackground >= 0 && Double.isFinite(heldBackground))) {
            throw new IllegalArgumentException("a held background must be finite and >= 0, was " + heldBackground);
        }
        this.heldBackground = heldBackground;
        this.backgroundStart = Math.max(quietLevel(counts), 0.1);
        this.amplitudeStart = amplitudeStart;
        if (!(histogram.total() > 0)) {
            throw new IllegalArgumentException("histogram '" + histogram.label() + "' holds no counts");
        }
    }

    /** Start of the amplitude that puts the model's peak at the data's, for a law whose peak rate is about {@code peakRate}. */
    public static double amplitudeFor(CountHistogram h, double peakRate) {
        double max = 0;
        for (double c : h.counts()) {
            max = Math.max(max, c);
        }
        return Math.max(max - quietLevel(h.counts()), 1) / peakRate;
    }

    /**
     * Where the counts first rise halfway from the quiet level to the peak (s): a start for the shift that puts a
     * Gaussian response's centre near the pulse.
     */
    public static double risingEdgeS(CountHistogram h) {
        double[] c = h.counts();
        double quiet = quietLevel(c);
        int peak = 0;
        for (int i = 1; i < c.length; i++) {
            if (c[i] > c[peak]) {
                peak = i;
            }
        }
        double half = quiet + (c[peak] - quiet) / 2;
        for (int i = 0; i <= peak; i++) {
            if (c[i] >= half) {
                return h.centreS(i);
            }
        }
        return h.centreS(peak);
    }

    /** Mean of the lowest tenth of the bins (at least one). */
    static double quietLevel(double[] counts) {
        double[] sorted = counts.clone();
        java.util.Arrays.sort(sorted);
        int n = Math.max(1, sorted.length / 10);
        double s = 0;
        for (int i = 0; i < n; i++) {
            s += sorted[i];
        }
        return s / n;
    }

    /** The histogram. */
    public CountHistogram histogram() {
        return histogram;
    }

    /** The model. */
    public CountModel model() {
        return model;
    }

    @Override
    public String label() {
        return histogram.label();
    }

    @Override
    public boolean counts() {
        return true;
    }

    @Override
    public int points() {
        return counts.length;
    }

    @Override
    public List<ParameterSpec> localParameters() {
        ParameterSpec a = ParameterSpec.positive(CountModel.AMPLITUDE, "", amplitudeStart);
        ParameterSpec b = Double.isNaN(heldBackground) ? ParameterSpec.positive(CountModel.BACKGROUND, "", backgroundStart)
                : ParameterSpec.positive(CountModel.BACKGROUND, "", 1).fixedAt(heldBackground);
        return List.of(a, b);
    }

    @Override
    public void residuals(ParameterValues p, double[] out, int offset) {
        double[] mu = model.expected(p);
        for (int i = 0; i < mu.length; i++) {
            if (!(mu[i] > 0) && counts[i] > 0 || !Double.isFinite(mu[i])) {
                throw new IllegalArgumentException("the model expects " + mu[i] + " counts in bin " + i + " of '"
                        + histogram.label() + "', which holds " + counts[i]);
            }
            out[offset + i] = PoissonDeviance.residual(counts[i], mu[i]);
        }
    }

    @Override
    public double[] fitted(ParameterValues p) {
        return model.expected(p);
    }

    @Override
    public double[] data() {
        return counts.clone();
    }
}
