package org.ladderkin.fit;

/** Diagnostics of fit residuals. */
final class ResidualStatistics {

    private ResidualStatistics() {
    }

    /**
     * Sample autocorrelation of {@code r} at lags 1..maxLag (fewer when the trace is short): Σ (rᵢ − r̄)(rᵢ₊ₖ − r̄) /
     * Σ (rᵢ − r̄)². White residuals give values within about ±2/√n of zero; a slow structure the model misses gives
     * values near 1 at small lags.
     */
    static double[] autocorrelation(double[] r, int maxLag) {
        int n = r.length;
        int lags = Math.max(0, Math.min(maxLag, n - 1));
        double mean = 0;
        for (double v : r) {
            mean += v;
        }
        mean /= n;
        double denom = 0;
        for (double v : r) {
            denom += (v - mean) * (v - mean);
        }
        double[] out = new double[lags];
        if (!(denom > 0)) {
            return out;
        }
        for (int k = 1; k <= lags; k++) {
            double s = 0;
            for (int i = 0; i + k < n; i++) {
                s += (r[i] - mean) * (r[i + k] - mean);
            }
            out[k - 1] = s / denom;
        }
        return out;
    }
}
