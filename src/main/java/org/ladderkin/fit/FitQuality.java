package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * How well a fit matches the data measured against the data's own noise. Without given uncertainties the noise of
 * each trace is estimated from the point-to-point scatter of its residuals: for white noise of standard deviation s the
 * second difference r_{m−1} − 2r_m + r_{m+1} has standard deviation √6·s, while a slow structure the model misses
 * hardly enters it; the median absolute second difference (×1.4826/√6) makes the estimate robust to a few outliers.
 * The reduced χ² is then Σ (r/s)² / (points − free parameters), near 1 for a model that explains the data.
 * <p>
 * Structure in the normalised residuals is read two ways: the Wald–Wolfowitz runs test on their signs (pooled over
 * traces: too few runs give a large negative z) and their pooled lag-1 autocorrelation (±2/√n for white noise).
 *
 * @param reducedChiSquare χ² per degree of freedom with the noise below (NaN when it could not be formed)
 * @param noiseBasis       where the noise came from, for the reader
 * @param noisePerTrace    each trace's noise standard deviation in signal units (the given uncertainties' rms when given)
 * @param runsZ            z-score of the runs test (negative: fewer sign changes than noise gives)
 * @param lag1             pooled lag-1 autocorrelation of the normalised residuals
 * @param points           residuals the statistics used
 */
public record FitQuality(double reducedChiSquare, String noiseBasis, double[] noisePerTrace, double runsZ, double lag1,
                         int points) {

    /** Runs-test z below which the residuals are called structured. */
    public static final double RUNS_Z_LIMIT = -4;
    /** Lag-1 autocorrelation above which the residuals are called structured. */
    public static final double LAG1_LIMIT = 0.3;
    /** Scale between the median absolute deviation and the standard deviation of a normal distribution. */
    private static final double MAD_TO_SD = 1.4826;

    public FitQuality {
        Objects.requireNonNull(noiseBasis, "noiseBasis");
        noisePerTrace = noisePerTrace.clone();
    }

    @Override
    public double[] noisePerTrace() {
        return noisePerTrace.clone();
    }

    /** Whether the residuals show structure the model lacks. */
    public boolean structured() {
        return runsZ < RUNS_Z_LIMIT || lag1 > LAG1_LIMIT;
    }

    /** One line: "reduced χ² 1.04 (noise from …)". */
    public String describe() {
        return String.format(Locale.ROOT, "reduced χ² %.3g (noise from %s); residual runs z = %.1f, lag-1 autocorrelation %.2f",
                reducedChiSquare, noiseBasis, runsZ, lag1);
    }

    /**
     * The reduced χ² of residuals {@code r} (per trace) the way {@link #of} forms it: already weighted residuals are
     * summed as they are, unweighted ones against each trace's point-to-point scatter. NaN without degrees of freedom.
     */
    static double reducedChiSquare(double[][] r, boolean weighted, int dof) {
        if (dof <= 0) {
            return Double.NaN;
        }
        double chi2 = 0;
        for (double[] ri : r) {
            double s = weighted ? 1 : scatter(ri);
            if (!(s > 0)) {
                continue;
            }
            for (double v : ri) {
                chi2 += (v / s) * (v / s);
            }
        }
        return chi2 / dof;
    }

    /** The quality of fit {@code r} to {@code data} (a failed fit has no residuals and gives NaN). */
    public static FitQuality of(Dataset data, FitResult r) {
        List<double[]> res = r.residuals();
        boolean given = data.traces().stream().allMatch(Trace::hasUncertainty);
        double[] noise = new double[res.size()];
        List<double[]> z = new ArrayList<>();
        double chi2 = 0;
        int points = 0;
        for (int i = 0; i < res.size(); i++) {
            double[] ri = res.get(i);
            double[] zi = new double[ri.length];
            if (given) {
                double[] sig = present(data.traces().get(i));
                double s2 = 0;
                for (int m = 0; m < ri.length; m++) {
                    zi[m] = ri[m] / sig[m];
                    s2 += sig[m] * sig[m];
                }
                noise[i] = Math.sqrt(s2 / Math.max(1, ri.length));
            } else {
                noise[i] = scatter(ri);
                for (int m = 0; m < ri.length; m++) {
                    zi[m] = noise[i] > 0 ? ri[m] / noise[i] : 0;
                }
            }
            for (double v : zi) {
                chi2 += v * v;
            }
            points += ri.length;
            z.add(zi);
        }
        int dof = r.points() - r.freeParameters();
        double reduced = dof > 0 ? chi2 / dof : Double.NaN;
        return new FitQuality(reduced, given ? "the given uncertainties" : "the point-to-point scatter of the residuals",
                noise, runsZ(z), lag1(z), points);
    }

    /** The uncertainties of the points whose signal is present (the fitter's residuals skip missing ones). */
    private static double[] present(Trace t) {
        double[] y = t.signal();
        double[] s = t.sigma();
        double[] out = new double[t.presentCount()];
        int k = 0;
        for (int m = 0; m < y.length; m++) {
            if (!Double.isNaN(y[m])) {
                out[k++] = s[m];
            }
        }
        return out;
    }

    /** Noise standard deviation from the median absolute second difference (NaN for fewer than 3 points). */
    static double scatter(double[] r) {
        if (r.length < 3) {
            return Double.NaN;
        }
        double[] d = new double[r.length - 2];
        for (int m = 1; m + 1 < r.length; m++) {
            d[m - 1] = Math.abs(r[m - 1] - 2 * r[m] + r[m + 1]);
        }
        java.util.Arrays.sort(d);
        double median = d.length % 2 == 1 ? d[d.length / 2] : (d[d.length / 2 - 1] + d[d.length / 2]) / 2;
        return MAD_TO_SD * median / Math.sqrt(6);
    }

    private static double runsZ(List<double[]> z) {
        double runs = 0;
        double mean = 0;
        double var = 0;
        for (double[] zi : z) {
            int pos = 0;
            int neg = 0;
            int r = 0;
            int last = 0;
            for (double v : zi) {
                int sgn = v > 0 ? 1 : v < 0 ? -1 : 0;
                if (sgn == 0) {
                    continue;
                }
                if (sgn != last) {
                    r++;
                    last = sgn;
                }
                if (sgn > 0) {
                    pos++;
                } else {
                    neg++;
                }
            }
            int n = pos + neg;
            if (n < 3 || pos == 0 || neg == 0) {
                continue;
            }
            double mu = 2.0 * pos * neg / n + 1;
            runs += r;
            mean += mu;
            var += (mu - 1) * (mu - 2) / (n - 1);
        }
        return var > 0 ? (runs - mean) / Math.sqrt(var) : 0;
    }

    private static double lag1(List<double[]> z) {
        double num = 0;
        double den = 0;
        for (double[] zi : z) {
            for (int m = 0; m < zi.length; m++) {
                den += zi[m] * zi[m];
                if (m + 1 < zi.length) {
                    num += zi[m] * zi[m + 1];
                }
            }
        }
        return den > 0 ? num / den : 0;
    }
}
