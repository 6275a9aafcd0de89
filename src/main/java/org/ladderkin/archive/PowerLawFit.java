package org.ladderkin.archive;

/**
 * A weighted power law y = C·x^p fitted in log-log with an intrinsic scatter: each point's variance in ln y is its own
 * (σ_y/y)² plus τ², the spread real samples show beyond what each fit claims. τ is found by restricted maximum
 * likelihood (the likelihood of the residuals, which, unlike plain maximum likelihood, does not shrink τ by the two
 * fitted line parameters with a handful of samples); C and p are then the weighted least-squares line at that τ, with
 * their errors from its normal matrix. Without τ a few over-precise fits would pull the line through themselves.
 *
 * <p>With {@code scatter} off τ = 0 and this is plain weighted least squares in log space.
 */
public final class PowerLawFit {

    /** A points count below which no line with a scatter can be told apart from its noise. */
    public static final int MIN_POINTS = 3;

    /** Standardised residual beyond which a point is flagged an outlier. */
    public static final double OUTLIER_SIGMAS = 3;

    /**
     * The fitted line.
     *
     * @param exponent            p
     * @param exponentStdError    its standard error (NaN when held)
     * @param prefactor           C, y at x = 1 in the axes' units
     * @param prefactorStdError   its standard error (delta method on ln C)
     * @param scatterLn           τ, the intrinsic scatter of ln y (≈ relative scatter of y)
     * @param scatterLnStdError   its standard error from the curvature of the restricted likelihood (NaN at τ = 0)
     * @param residualSigmas      each point's residual over its total standard deviation
     * @param exponentHeld        p was given, not fitted
     */
    public record Result(double exponent, double exponentStdError, double prefactor, double prefactorStdError,
                         double scatterLn, double scatterLnStdError, double[] residualSigmas, boolean exponentHeld) {

        public Result {
            residualSigmas = residualSigmas.clone();
        }

        /** Whether point {@code i} lies beyond {@link #OUTLIER_SIGMAS}. */
        public boolean outlier(int i) {
            return Math.abs(residualSigmas[i]) > OUTLIER_SIGMAS;
        }

        /** The line at {@code x}. */
        public double at(double x) {
            return prefactor * Math.pow(x, exponent);
        }
    }

    private PowerLawFit() {
    }

    /** Fits C and p (and τ when {@code scatter}) to points x, y with standard errors {@code yStdError}. */
    public static Result fit(double[] x, double[] y, double[] yStdError, boolean scatter) {
        return fit(x, y, yStdError, scatter, Double.NaN);
    }

    /** Fits C (and τ when {@code scatter}) with the exponent held at {@code exponent}. */
    public static Result fitHeldExponent(double[] x, double[] y, double[] yStdError, boolean scatter, double exponent) {
        if (!Double.isFinite(exponent)) {
            throw new IllegalArgumentException("a held exponent must be finite");
        }
        return fit(x, y, yStdError, scatter, exponent);
    }

    private static Result fit(double[] x, double[] y, double[] yStdError, boolean scatter, double heldExponent) {
        int n = x.length;
        boolean held = !Double.isNaN(heldExponent);
        if (y.length != n || yStdError.length != n) {
            throw new IllegalArgumentException("x, y and errors differ in length");
        }
        int params = held ? 1 : 2;
        if (n < params + (scatter ? 1 : 0)) {
            throw new ArchiveException(ArchiveException.Kind.INVALID, "a trend needs at least " + (params + (scatter ? 1 : 0))
                    + " samples, has " + n);
        }
        double[] u = new double[n];
        double[] v = new double[n];
        double[] s2 = new double[n];
        for (int i = 0; i < n; i++) {
            if (!(x[i] > 0 && y[i] > 0 && yStdError[i] > 0)) {
                throw new IllegalArgumentException("point " + i + ": x, y and its error must be > 0");
            }
            u[i] = Math.log(x[i]);
            v[i] = Math.log(y[i]) - (held ? heldExponent * u[i] : 0);
            double rel = yStdError[i] / y[i];
            s2[i] = rel * rel;
        }
        double tau = 0;
        double tauSe = Double.NaN;
        if (scatter && n > params) {
            tau = maximiseRestricted(u, v, s2, held);
            tauSe = curvatureError(u, v, s2, held, tau);
        }
        Line line = line(u, v, s2, held, tau);
        double[] sigmas = new double[n];
        for (int i = 0; i < n; i++) {
            double r = v[i] - line.at(u[i]);
            sigmas[i] = r / Math.sqrt(s2[i] + tau * tau);
        }
        double exponent = held ? heldExponent : line.slope;
        // ln C = a − p·ū; a and p are uncorrelated about the weighted centre ū
        double lnC = line.mean - line.slope * line.centre;
        double varLnC = line.meanVar + line.centre * line.centre * line.slopeVar;
        double c = Math.exp(lnC);
        return new Result(exponent, held ? Double.NaN : Math.sqrt(line.slopeVar), c, c * Math.sqrt(varLnC), tau, tauSe,
                sigmas, held);
    }

    /** A weighted line about its weighted centre (slope 0 and no slope variance when the exponent is held). */
    private record Line(double centre, double mean, double slope, double meanVar, double slopeVar, double restrictedLogLik) {
        double at(double u) {
            return mean + slope * (u - centre);
        }
    }

    private static Line line(double[] u, double[] v, double[] s2, boolean held, double tau) {
        int n = u.length;
        double sw = 0;
        double swu = 0;
        double swv = 0;
        double logDet = 0;
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            double var = s2[i] + tau * tau;
            w[i] = 1 / var;
            sw += w[i];
            swu += w[i] * u[i];
            swv += w[i] * v[i];
            logDet += Math.log(var);
        }
        double centre = held ? 0 : swu / sw;
        double mean = swv / sw;
        double slope = 0;
        double sxx = 0;
        if (!held) {
            double sxy = 0;
            for (int i = 0; i < n; i++) {
                double du = u[i] - centre;
                sxx += w[i] * du * du;
                sxy += w[i] * du * (v[i] - mean);
            }
            if (!(sxx > 0)) {
                throw new ArchiveException(ArchiveException.Kind.INVALID, "all samples sit at one x: no exponent can be fitted");
            }
            slope = sxy / sxx;
        }
        double chi2 = 0;
        for (int i = 0; i < n; i++) {
            double r = v[i] - mean - slope * (u[i] - centre);
            chi2 += w[i] * r * r;
        }
        // restricted likelihood: −½[Σ ln var_i + ln det(XᵀWX) + χ²]; det(XᵀWX) = Σw·Sxx about the weighted centre
        double restricted = -0.5 * (logDet + Math.log(sw) + (held ? 0 : Math.log(sxx)) + chi2);
        return new Line(centre, mean, slope, 1 / sw, held ? 0 : 1 / sxx, restricted);
    }

    /** τ ≥ 0 with the largest restricted likelihood: a grid (the likelihood may have a bump at τ = 0), then golden section. */
    private static double maximiseRestricted(double[] u, double[] v, double[] s2, boolean held) {
        double spread = 0;
        double mean = 0;
        for (double vi : v) {
            mean += vi / v.length;
        }
        for (double vi : v) {
            spread = Math.max(spread, Math.abs(vi - mean));
        }
        double maxS = 0;
        for (double s : s2) {
            maxS = Math.max(maxS, Math.sqrt(s));
        }
        double top = 2 * (spread + maxS) + 1e-6;
        int grid = 80;
        double best = 0;
        double bestL = line(u, v, s2, held, 0).restrictedLogLik;
        int bestK = 0;
        for (int k = 1; k <= grid; k++) {
            double t = top * k * k / ((double) grid * grid);
            double l = line(u, v, s2, held, t).restrictedLogLik;
            if (l > bestL) {
                bestL = l;
                best = t;
                bestK = k;
            }
        }
        double lo = top * Math.max(0, bestK - 1) * Math.max(0, bestK - 1) / ((double) grid * grid);
        double hi = top * (bestK + 1) * (bestK + 1) / ((double) grid * grid);
        double g = (Math.sqrt(5) - 1) / 2;
        double a = lo;
        double b = hi;
        double c = b - g * (b - a);
        double d = a + g * (b - a);
        double lc = line(u, v, s2, held, c).restrictedLogLik;
        double ld = line(u, v, s2, held, d).restrictedLogLik;
        for (int it = 0; it < 100 && b - a > 1e-10 * (1 + b); it++) {
            if (lc > ld) {
                b = d;
                d = c;
                ld = lc;
                c = b - g * (b - a);
                lc = line(u, v, s2, held, c).restrictedLogLik;
            } else {
                a = c;
                c = d;
                lc = ld;
                d = a + g * (b - a);
                ld = line(u, v, s2, held, d).restrictedLogLik;
            }
        }
        double t = (a + b) / 2;
        return line(u, v, s2, held, t).restrictedLogLik >= bestL ? t : best;
    }

    /** 1/√(−d²L/dτ²) at τ, from a central difference; NaN at the boundary τ = 0 or where L is not curved down. */
    private static double curvatureError(double[] u, double[] v, double[] s2, boolean held, double tau) {
        if (!(tau > 0)) {
            return Double.NaN;
        }
        double h = Math.max(1e-6, 1e-3 * tau);
        if (tau - h <= 0) {
            return Double.NaN;
        }
        double l0 = line(u, v, s2, held, tau).restrictedLogLik;
        double lp = line(u, v, s2, held, tau + h).restrictedLogLik;
        double lm = line(u, v, s2, held, tau - h).restrictedLogLik;
        double second = (lp - 2 * l0 + lm) / (h * h);
        return second < 0 ? 1 / Math.sqrt(-second) : Double.NaN;
    }
}
