package org.ladderkin.excite.beam;

import org.hipparchus.special.Erf;

/**
 * A knife-edge scan fitted with the integral of a Gaussian beam: the blade uncovers
 * P(x) = A + (B − A)/2 · (1 + erf(√2 (x − x0)/w)), where A and B are the powers far on either side of the edge (A &lt; B
 * when the blade moves out of the beam, A &gt; B when it moves in), x0 the beam centre and w the 1/e² intensity radius.
 * The fit is unweighted least squares (Hipparchus Levenberg–Marquardt) in coordinates scaled to the scan, with w
 * fitted through its logarithm so it cannot change sign; standard errors are scaled by the scatter about the fit.
 * The 10–90 % rule on the data, w = (x₉₀ − x₁₀)/(√2·erf⁻¹(0.8)) = (x₉₀ − x₁₀)/1.2816 for a Gaussian, is a
 * cross-check that needs no fit: when the two disagree the beam is not Gaussian along the scan.
 *
 * @param radius           1/e² radius from the fit, with its standard error
 * @param centreM          beam centre x0
 * @param centreStdErrorM  its standard error
 * @param lowSidePower     fitted power far on the side of small positions (A)
 * @param highSidePower    fitted power far on the side of large positions (B)
 * @param tenNinetyRadiusM radius from the 10–90 % rule, NaN when the data do not cross both levels
 * @param rmsResidual      root-mean-square residual, in the unit of the powers
 * @param points           number of points fitted
 */
public record KnifeEdgeFit(BeamRadius radius, double centreM, double centreStdErrorM, double lowSidePower,
        double highSidePower, double tenNinetyRadiusM, double rmsResidual, int points) {

    /** (x₉₀ − x₁₀)/w for a Gaussian beam: √2·erf⁻¹(0.8) ≈ 1.2816. */
    public static final double TEN_NINETY_PER_RADIUS = Math.sqrt(2) * Erf.erfInv(0.8);

    /** Below this ratio of the end-to-end change to the full power range, the scan shows no edge. */
    static final double MIN_CONTRAST = 0.5;

    public KnifeEdgeFit {
        java.util.Objects.requireNonNull(radius, "radius");
        if (radius.method() != BeamRadius.Method.KNIFE_EDGE) {
            throw new IllegalArgumentException("a knife-edge fit's radius must be measured by knife edge");
        }
        if (!Double.isFinite(centreM) || !(centreStdErrorM >= 0 || Double.isNaN(centreStdErrorM))) {
            throw new IllegalArgumentException("beam centre must be finite with an error >= 0");
        }
        if (points < KnifeEdgeScan.MIN_POINTS) {
            throw new IllegalArgumentException("points must be >= " + KnifeEdgeScan.MIN_POINTS + ", was " + points);
        }
    }

    /** The 1/e² radius of the beam along the scan, with its standard error. */
    public static BeamRadius fit(KnifeEdgeScan scan) {
        return of(scan).radius();
    }

    /** The 1/e² radius of the beam along a scan given as arrays (see {@link KnifeEdgeScan}). */
    public static BeamRadius fit(double[] positionsM, double[] powers) {
        return fit(new KnifeEdgeScan(positionsM, powers));
    }

    /** The full fit of one scan. */
    public static KnifeEdgeFit of(KnifeEdgeScan scan) {
        int n = scan.size();
        boolean increasing = scan.position(1) > scan.position(0);
        double[] x = new double[n];
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            int k = increasing ? i : n - 1 - i;
            x[i] = scan.position(k);
            p[i] = scan.power(k);
        }
        double lo = p[0];
        double hi = p[0];
        for (double v : p) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        double range = hi - lo;
        int k = Math.max(1, Math.min(5, n / 10));
        double a0 = 0;
        double b0 = 0;
        for (int i = 0; i < k; i++) {
            a0 += p[i] / k;
            b0 += p[n - 1 - i] / k;
        }
        if (!(range > 0) || Math.abs(b0 - a0) < MIN_CONTRAST * range) {
            throw new BeamException(BeamException.Reason.NO_EDGE, String.format(java.util.Locale.ROOT,
                    "no edge in the scan: the power changes by %.0f %% of its range from one end to the other (an edge "
                    + "takes it from one level to the other; scan across the whole beam)", range > 0 ? 100 * Math.abs(b0 - a0) / range : 0.0));
        }
        double centre = 0.5 * (x[0] + x[n - 1]);
        double half = 0.5 * (x[n - 1] - x[0]);
        double[] u = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = (x[i] - centre) / half;
            y[i] = (p[i] - lo) / range;
        }
        double aStart = (a0 - lo) / range;
        double bStart = (b0 - lo) / range;
        double u10 = crossing(u, y, aStart, bStart, 0.1, Double.NaN);
        double u90 = crossing(u, y, aStart, bStart, 0.9, Double.NaN);
        double u50 = crossing(u, y, aStart, bStart, 0.5, Double.NaN);
        double omega0 = Double.isFinite(u10) && Double.isFinite(u90) && u90 != u10
                ? Math.abs(u90 - u10) / TEN_NINETY_PER_RADIUS : 0.25;
        double[] start = {aStart, bStart, Double.isFinite(u50) ? u50 : 0, Math.log(Math.max(omega0, 1e-3))};
        CurveFit.Result r = CurveFit.fit(q -> evaluate(q, u), start, y);
        double[] q = r.point();
        double omega = Math.exp(q[3]);
        double wM = omega * half;
        double x0 = centre + q[2] * half;
        if (!(x0 >= x[0] && x0 <= x[n - 1]) || !(wM < 2 * (x[n - 1] - x[0]))) {
            throw new BeamException(BeamException.Reason.NO_EDGE, "no edge in the scan: the fitted beam centre lies outside the "
                    + "scanned positions (scan across the whole beam)");
        }
        double a = lo + q[0] * range;
        double b = lo + q[1] * range;
        double x10 = crossing(u, y, q[0], q[1], 0.1, q[2] - 0.5 * TEN_NINETY_PER_RADIUS * omega);
        double x90 = crossing(u, y, q[0], q[1], 0.9, q[2] + 0.5 * TEN_NINETY_PER_RADIUS * omega);
        double tenNinety = Double.isFinite(x10) && Double.isFinite(x90) ? Math.abs(x90 - x10) * half / TEN_NINETY_PER_RADIUS : Double.NaN;
        BeamRadius radius = new BeamRadius(wM, wM * r.stdErrors()[3], BeamRadius.Method.KNIFE_EDGE);
        return new KnifeEdgeFit(radius, x0, half * r.stdErrors()[2], a, b, tenNinety, r.rms() * range, n);
    }

    private static CurveFit.Evaluation evaluate(double[] q, double[] u) {
        double a = q[0];
        double b = q[1];
        double u0 = q[2];
        double omega = Math.exp(q[3]);
        double[] v = new double[u.length];
        double[][] jac = new double[u.length][4];
        for (int i = 0; i < u.length; i++) {
            double z = Math.sqrt(2) * (u[i] - u0) / omega;
            double h = 0.5 * (1 + Erf.erf(z));
            double g = 2 / Math.sqrt(Math.PI) * Math.exp(-z * z);
            v[i] = a + (b - a) * h;
            jac[i][0] = 1 - h;
            jac[i][1] = h;
            jac[i][2] = 0.5 * (b - a) * g * (-Math.sqrt(2) / omega);
            jac[i][3] = 0.5 * (b - a) * g * (-z);
        }
        return new CurveFit.Evaluation(v, jac);
    }

    /**
     * Where the data, normalised to run from a to b, cross {@code level} (linear interpolation between points); of
     * several crossings (noise), the one nearest {@code near}, or the first when {@code near} is NaN. NaN when none.
     */
    private static double crossing(double[] u, double[] y, double a, double b, double level, double near) {
        double best = Double.NaN;
        for (int i = 0; i + 1 < u.length; i++) {
            double f1 = (y[i] - a) / (b - a) - level;
            double f2 = (y[i + 1] - a) / (b - a) - level;
            if (f1 == f2 || f1 * f2 > 0) {
                continue;
            }
            double at = u[i] + (u[i + 1] - u[i]) * f1 / (f1 - f2);
            if (Double.isNaN(near)) {
                return at;
            }
            if (Double.isNaN(best) || Math.abs(at - near) < Math.abs(best - near)) {
                best = at;
            }
        }
        return best;
    }
}
