package org.ladderkin.kinetics.propagate;

/**
 * The Poisson weights e^{−m}·m^k/k! for k in [first, first + weights.length), all others together below
 * {@link #TAIL}. Computed outward from the mode by the ratios m/(k+1) and k/m (all positive, no overflow), then
 * normalised: the kept weights sum to 1 − (dropped mass), so normalising moves them by at most {@link #TAIL}.
 *
 * <p>Why the truncation is rigorous: above the mode the ratio of successive weights m/(k+1) falls with k, so the
 * upper tail past k is at most w_k·r/(1 − r) with r = m/(k+1); below the mode the ratio k/m falls as k falls, so the
 * lower tail below k is at most w_k·r/(1 − r) with r = k/m. Each side stops once its bound, relative to the mode
 * weight (which is at most the sum), is below TAIL/2.
 *
 * @param first smallest k kept
 * @param weights normalised weights for k = first, first + 1, ...
 */
record PoissonWindow(int first, double[] weights) {

    /** Largest total weight dropped. */
    static final double TAIL = 1e-18;

    /** The window for mean m = Λt ≥ 0. */
    static PoissonWindow of(double mean) {
        if (!(mean >= 0) || !Double.isFinite(mean)) {
            throw new IllegalArgumentException("Poisson mean must be finite and >= 0, was " + mean);
        }
        if (mean == 0) {
            return new PoissonWindow(0, new double[] {1});
        }
        if (mean > Integer.MAX_VALUE / 2.0) {
            throw new IllegalArgumentException("Poisson mean too large for uniformization: " + mean);
        }
        int mode = (int) Math.floor(mean);
        // upward from the mode: stop at k when w_{k+1}·1/(1 − m/(k+2)) bounds everything above k
        double[] up = new double[64];
        int nUp = 0;
        double w = 1;
        for (int k = mode; ; k++) {
            double next = w * mean / (k + 1);
            double r = mean / (k + 2);
            if (next == 0 || r < 1 && next / (1 - r) <= TAIL / 2) {
                break;
            }
            if (nUp == up.length) {
                up = java.util.Arrays.copyOf(up, 2 * nUp);
            }
            up[nUp++] = next;
            w = next;
        }
        // downward: stop at k when w_{k−1}·1/(1 − (k−1)/m) bounds everything below k
        double[] down = new double[64];
        int nDown = 0;
        w = 1;
        for (int k = mode; k > 0; k--) {
            double next = w * k / mean;
            double r = (k - 1) / mean;
            if (next == 0 || r < 1 && next / (1 - r) <= TAIL / 2) {
                break;
            }
            if (nDown == down.length) {
                down = java.util.Arrays.copyOf(down, 2 * nDown);
            }
            down[nDown++] = next;
            w = next;
        }
        double[] weights = new double[nDown + 1 + nUp];
        for (int i = 0; i < nDown; i++) {
            weights[nDown - 1 - i] = down[i];
        }
        weights[nDown] = 1;
        System.arraycopy(up, 0, weights, nDown + 1, nUp);
        double sum = 0;
        for (int i = weights.length - 1; i >= 0; i--) {
            sum += weights[i];
        }
        for (int i = 0; i < weights.length; i++) {
            weights[i] /= sum;
        }
        return new PoissonWindow(mode - nDown, weights);
    }

    /** Largest k kept. */
    int last() {
        return first + weights.length - 1;
    }

    /** Weight of k (0 outside the window). */
    double weight(int k) {
        int i = k - first;
        return i < 0 || i >= weights.length ? 0 : weights[i];
    }
}
