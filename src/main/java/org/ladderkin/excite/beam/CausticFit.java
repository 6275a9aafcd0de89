package org.ladderkin.excite.beam;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The caustic of a beam: 1/e² radii at several positions z fitted with w(z) = w0·√(1 + ((z − z0)/zR)²), the
 * hyperbola of ISO 11146-1, and the beam propagation ratio M² = π·w0²/(λ·zR). The start comes from the standard's own
 * route, a linear least-squares fit of the squared widths w² = a + b·z + c·z² (w0² = a − b²/4c, z0 = −b/2c,
 * zR = w0/√c); the hyperbola is then fitted to the radii themselves (Hipparchus Levenberg–Marquardt, unweighted), so
 * the standard errors belong to the quantities reported. ISO 11146-1 asks for at least ten planes, about half within
 * one Rayleigh range of the waist and half beyond two; {@link #planesNearWaist()} and {@link #planesFarFromWaist()}
 * say how far a measurement is from that.
 *
 * @param waistRadiusM           w0
 * @param waistRadiusStdErrorM   its standard error
 * @param waistPositionM         z0
 * @param waistPositionStdErrorM its standard error
 * @param rayleighRangeM         zR
 * @param rayleighRangeStdErrorM its standard error
 * @param wavelengthM            λ, NaN when not given (then M² is NaN)
 * @param mSquared               M²
 * @param mSquaredStdError       its standard error
 * @param points                 planes fitted
 * @param planesNearWaist        planes within one Rayleigh range of z0
 * @param planesFarFromWaist     planes beyond two Rayleigh ranges
 * @param rmsResidualM           rms of the radius residuals
 */
public record CausticFit(double waistRadiusM, double waistRadiusStdErrorM, double waistPositionM,
        double waistPositionStdErrorM, double rayleighRangeM, double rayleighRangeStdErrorM, double wavelengthM,
        double mSquared, double mSquaredStdError, int points, int planesNearWaist, int planesFarFromWaist,
        double rmsResidualM) {

    /** Three parameters and one degree of freedom for the noise estimate. */
    public static final int MIN_PLANES = 4;
    /** What ISO 11146-1 asks for. */
    public static final int ISO_PLANES = 10;

    public CausticFit {
        if (!(waistRadiusM > 0) || !(rayleighRangeM > 0) || !Double.isFinite(waistPositionM)) {
            throw new IllegalArgumentException("waist radius and Rayleigh range must be > 0, the waist position finite");
        }
        if (points < MIN_PLANES) {
            throw new IllegalArgumentException("points must be >= " + MIN_PLANES + ", was " + points);
        }
    }

    /** Whether the fit follows ISO 11146-1's sampling: enough planes, half near the waist and half far from it. */
    public boolean isoSampling() {
        return points >= ISO_PLANES && 2 * planesNearWaist >= points - 1 && 2 * planesFarFromWaist >= points - 1;
    }

    /** Fits one caustic; {@code wavelengthM} may be NaN when M² is not wanted. */
    public static CausticFit fit(double[] zM, double[] radiiM, double wavelengthM) {
        int n = zM.length;
        if (radiiM.length != n) {
            throw new IllegalArgumentException(n + " positions but " + radiiM.length + " radii");
        }
        if (!(wavelengthM > 0) && !Double.isNaN(wavelengthM)) {
            throw new IllegalArgumentException("wavelength must be > 0 or NaN, was " + wavelengthM);
        }
        double zMin = Double.POSITIVE_INFINITY;
        double zMax = Double.NEGATIVE_INFINITY;
        double wMax = 0;
        for (int i = 0; i < n; i++) {
            zMin = Math.min(zMin, zM[i]);
            zMax = Math.max(zMax, zM[i]);
            wMax = Math.max(wMax, radiiM[i]);
        }
        long distinct = java.util.Arrays.stream(zM).distinct().count();
        if (n < MIN_PLANES || distinct < 3) {
            throw new BeamException(BeamException.Reason.TOO_FEW, "a caustic needs radii at " + MIN_PLANES
                    + " or more positions, 3 or more of them different (ISO 11146-1 asks for " + ISO_PLANES + "); have " + n
                    + " at " + distinct + " positions");
        }
        double zc = 0.5 * (zMin + zMax);
        double zs = 0.5 * (zMax - zMin);
        double[] u = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = (zM[i] - zc) / zs;
            y[i] = radiiM[i] / wMax;
        }
        double[] start = start(u, y);
        CurveFit.Result r = CurveFit.fit(q -> evaluate(q, u), start, y);
        double[] q = r.point();
        double w0 = Math.exp(q[0]) * wMax;
        double z0 = zc + q[1] * zs;
        double zR = Math.exp(q[2]) * zs;
        double[] e = r.stdErrors();
        double[][] c = r.covariance();
        double m2 = Math.PI * w0 * w0 / (wavelengthM * zR);
        double lnM2Var = 4 * c[0][0] + c[2][2] - 4 * c[0][2];
        double m2Err = m2 * Math.sqrt(Math.max(0, lnM2Var));
        int near = 0;
        int far = 0;
        for (double z : zM) {
            double d = Math.abs(z - z0) / zR;
            near += d <= 1 ? 1 : 0;
            far += d >= 2 ? 1 : 0;
        }
        return new CausticFit(w0, w0 * e[0], z0, zs * e[1], zR, zR * e[2], wavelengthM, m2, m2Err, n, near, far,
                r.rms() * wMax);
    }

    /** One caustic per axis, in the order the axes first appear; axes with too few planes are left out. */
    public static Map<String, CausticFit> byAxis(List<BeamPlane> planes, double wavelengthM) {
        Map<String, List<BeamPlane>> groups = new LinkedHashMap<>();
        for (BeamPlane p : planes) {
            groups.computeIfAbsent(p.axis(), k -> new ArrayList<>()).add(p);
        }
        Map<String, CausticFit> out = new LinkedHashMap<>();
        for (var g : groups.entrySet()) {
            List<BeamPlane> list = g.getValue();
            if (list.stream().mapToDouble(BeamPlane::zM).distinct().count() < 3 || list.size() < MIN_PLANES) {
                continue;
            }
            out.put(g.getKey(), fit(list.stream().mapToDouble(BeamPlane::zM).toArray(),
                    list.stream().mapToDouble(BeamPlane::radiusM).toArray(), wavelengthM));
        }
        return out;
    }

    /** Start values (ln w0, z0, ln zR) in scaled units from ISO 11146-1's fit of w² as a quadratic in z. */
    private static double[] start(double[] u, double[] y) {
        double[][] ata = new double[3][3];
        double[] aty = new double[3];
        for (int i = 0; i < u.length; i++) {
            double[] row = {1, u[i], u[i] * u[i]};
            for (int j = 0; j < 3; j++) {
                aty[j] += row[j] * y[i] * y[i];
                for (int k = 0; k < 3; k++) {
                    ata[j][k] += row[j] * row[k];
                }
            }
        }
        double[] abc;
        try {
            abc = new org.hipparchus.linear.LUDecomposition(new org.hipparchus.linear.Array2DRowRealMatrix(ata))
                    .getSolver().solve(new org.hipparchus.linear.ArrayRealVector(aty)).toArray();
        } catch (org.hipparchus.exception.MathIllegalArgumentException e) {
            abc = new double[] {0, 0, 0};
        }
        double a = abc[0];
        double b = abc[1];
        double cc = abc[2];
        double w02 = cc > 0 ? a - b * b / (4 * cc) : Double.NaN;
        if (cc > 0 && w02 > 0) {
            double w0 = Math.sqrt(w02);
            return new double[] {Math.log(w0), -b / (2 * cc), Math.log(w0 / Math.sqrt(cc))};
        }
        int min = 0;
        for (int i = 1; i < y.length; i++) {
            min = y[i] < y[min] ? i : min;
        }
        return new double[] {Math.log(y[min]), u[min], 0};
    }

    private static CurveFit.Evaluation evaluate(double[] q, double[] u) {
        double w0 = Math.exp(q[0]);
        double z0 = q[1];
        double zR = Math.exp(q[2]);
        double[] v = new double[u.length];
        double[][] jac = new double[u.length][3];
        for (int i = 0; i < u.length; i++) {
            double t = (u[i] - z0) / zR;
            double s = Math.sqrt(1 + t * t);
            v[i] = w0 * s;
            jac[i][0] = w0 * s;
            jac[i][1] = -w0 * t / (s * zR);
            jac[i][2] = -w0 * t * t / s;
        }
        return new CurveFit.Evaluation(v, jac);
    }
}
