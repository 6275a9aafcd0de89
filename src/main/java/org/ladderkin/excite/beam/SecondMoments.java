package org.ladderkin.excite.beam;

import java.util.Locale;

/**
 * Beam widths of a camera image by the second-moment definition of ISO 11146-1. The background is the mean of a border
 * frame of the image (5 % of the shorter side, at least one pixel) and its rms is the pixel noise. The first moments
 * give the centroid (x̄, ȳ), the centred second moments σ²x, σ²y and σ²xy; the widths along the principal axes are
 * dσx,y = 2√2·{(σ²x + σ²y) ± γ·[(σ²x − σ²y)² + 4(σ²xy)²]^½}^½ with γ = sgn(σ²x − σ²y), the angle between the lab x axis
 * and the principal axis of dσx is φ = ½·arctan(2σ²xy/(σ²x − σ²y)), and the ellipticity is the smaller width over
 * the larger. Sums run over an integration area that is itself set by the widths: a rectangle along the principal
 * axes, centred on the centroid, three times dσx by three times dσy, recomputed until the widths stop changing.
 * For a Gaussian beam dσ = D4σ = 2w; the radius reported is the equivalent 1/e² radius √(wx·wy) = ½√(dσx·dσy).
 * Standard errors propagate the border noise through the sums and the background to first order (the integration
 * area held fixed); they
 * do not include pixel-to-pixel gain differences or a background that varies across the frame.
 *
 * @param centroidXM           x̄ from the centre of pixel (0, 0), x along a row
 * @param centroidYM           ȳ, y down the columns
 * @param centroidXStdErrorM   standard error of x̄
 * @param centroidYStdErrorM   standard error of ȳ
 * @param d4SigmaXM            dσx, the principal-axis width nearer the x axis
 * @param d4SigmaYM            dσy
 * @param d4SigmaXStdErrorM    standard error of dσx
 * @param d4SigmaYStdErrorM    standard error of dσy
 * @param angleRad             φ, in (−π/4, π/4]
 * @param radius               equivalent 1/e² radius √(wx·wy), with its standard error
 * @param backgroundCounts     background subtracted per pixel
 * @param noiseCounts          rms of the border pixels
 * @param iterations           integration areas tried until the widths settled
 * @param windowClipped        whether the final integration area reaches past the image (widths then read short)
 */
public record SecondMoments(double centroidXM, double centroidYM, double centroidXStdErrorM, double centroidYStdErrorM,
        double d4SigmaXM, double d4SigmaYM, double d4SigmaXStdErrorM, double d4SigmaYStdErrorM, double angleRad,
        BeamRadius radius, double backgroundCounts, double noiseCounts, int iterations, boolean windowClipped) {

    /** The integration area spans this many widths along each principal axis (ISO 11146-1). */
    public static final double WINDOW_WIDTHS = 3;
    /** The brightest pixel must stand this many noise rms above the background to count as a spot. */
    public static final double MIN_PEAK_OVER_NOISE = 10;
    static final int MAX_ITERATIONS = 200;
    static final double TOLERANCE = 1e-9;
    static final double SETTLED = 1e-3;
    /** ISO 11146-1 regards a beam with ellipticity above this as circular. */
    public static final double CIRCULAR = 0.87;

    public SecondMoments {
        if (!(d4SigmaXM > 0) || !(d4SigmaYM > 0) || !Double.isFinite(centroidXM) || !Double.isFinite(centroidYM)) {
            throw new IllegalArgumentException("widths must be > 0 and the centroid finite");
        }
        java.util.Objects.requireNonNull(radius, "radius");
    }

    /** Ellipticity ε = min(dσx, dσy)/max(dσx, dσy); 1 for a round beam. */
    public double ellipticity() {
        return Math.min(d4SigmaXM, d4SigmaYM) / Math.max(d4SigmaXM, d4SigmaYM);
    }

    /** φ in degrees. */
    public double angleDeg() {
        return Math.toDegrees(angleRad);
    }

    /** The 1/e² radius along the principal axis of dσx, for a Gaussian: dσx/2. */
    public double radiusXM() {
        return d4SigmaXM / 2;
    }

    /** The 1/e² radius along the principal axis of dσy. */
    public double radiusYM() {
        return d4SigmaYM / 2;
    }

    /** Second moments of {@code image} with square pixels of side {@code pitchM}. */
    public static SecondMoments of(BeamImage image, double pitchM) {
        if (!(pitchM > 0) || Double.isInfinite(pitchM)) {
            throw new IllegalArgumentException("pixel pitch must be > 0 and finite, was " + pitchM + " m");
        }
        int w = image.width();
        int h = image.height();
        double[] v = image.values();
        saturation(image, v);
        int border = Math.max(1, (int) Math.round(0.05 * Math.min(w, h)));
        double sum = 0;
        double sum2 = 0;
        int count = 0;
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                if (r < border || r >= h - border || c < border || c >= w - border) {
                    sum += v[r * w + c];
                    count++;
                }
            }
        }
        double background = sum / count;
        for (int r = 0; r < h; r++) {
            for (int c = 0; c < w; c++) {
                if (r < border || r >= h - border || c < border || c >= w - border) {
                    double d = v[r * w + c] - background;
                    sum2 += d * d;
                }
            }
        }
        double noise = Math.sqrt(sum2 / Math.max(1, count - 1));
        double peak = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < v.length; i++) {
            v[i] -= background;
            peak = Math.max(peak, v[i]);
        }
        if (!(peak > 0) || peak < MIN_PEAK_OVER_NOISE * noise) {
            throw new BeamException(BeamException.Reason.NO_SPOT, String.format(Locale.ROOT, "no spot: the brightest pixel is %s "
                    + "above the border background (a spot needs at least %.0f × the border's rms noise)",
                    noise > 0 ? String.format(Locale.ROOT, "%.1f × the border's rms noise", Math.max(0, peak) / noise)
                            : String.format(Locale.ROOT, "%.3g counts", Math.max(0, peak)), MIN_PEAK_OVER_NOISE));
        }
        Window window = Window.whole(w, h);
        Moments m = null;
        int iterations = 0;
        double change = Double.POSITIVE_INFINITY;
        java.util.List<Moments> seen = new java.util.ArrayList<>();
        while (true) {
            iterations++;
            Moments next = Moments.over(v, w, h, window);
            if (next == null) {
                throw new BeamException(BeamException.Reason.NO_SPOT, "no spot: the signal inside the integration area "
                        + "does not sum to a positive power (is the background right?)");
            }
            change = m == null ? Double.POSITIVE_INFINITY
                    : Math.max(Math.abs(next.dx - m.dx) / next.dx, Math.abs(next.dy - m.dy) / next.dy);
            m = next;
            // Pixels on the area's edge can drop in and out in a cycle of a few passes; a repeat ends the iteration.
            if (change <= TOLERANCE || seen.contains(next) || iterations >= MAX_ITERATIONS) {
                change = seen.contains(next) ? 0 : change;
                break;
            }
            seen.add(next);
            // The principal axes of a round beam point anywhere noise puts them; its area is taken along x and y.
            double phi = Math.min(m.dx, m.dy) / Math.max(m.dx, m.dy) > CIRCULAR ? 0 : m.phi;
            window = new Window(m.xBar, m.yBar, phi, WINDOW_WIDTHS * m.dx / 2, WINDOW_WIDTHS * m.dy / 2);
        }
        if (change > SETTLED) {
            throw new BeamException(BeamException.Reason.NO_CONVERGENCE, "the integration area did not settle in "
                    + MAX_ITERATIONS + " iterations (is there more than one spot, or a strong background gradient?)");
        }
        Errors e = Errors.of(m, v, w, h, window, noise, count);
        double radiusPx = 0.5 * Math.sqrt(m.dx * m.dy);
        return new SecondMoments(m.xBar * pitchM, m.yBar * pitchM, e.xBar * pitchM, e.yBar * pitchM, m.dx * pitchM,
                m.dy * pitchM, e.dx * pitchM, e.dy * pitchM, m.phi,
                new BeamRadius(radiusPx * pitchM, e.radius * pitchM, BeamRadius.Method.SECOND_MOMENTS), background, noise,
                iterations, window.clipped(w, h));
    }

    private static void saturation(BeamImage image, double[] v) {
        double level = image.saturationLevel();
        if (Double.isNaN(level)) {
            return;
        }
        int n = 0;
        int first = -1;
        for (int i = 0; i < v.length; i++) {
            if (v[i] >= level) {
                n++;
                if (first < 0) {
                    first = i;
                }
            }
        }
        if (n > 0) {
            throw new BeamException(BeamException.Reason.SATURATED, String.format(Locale.ROOT, "%d saturated pixel%s (at or above %s, "
                    + "the first at column %d, row %d): second moments of a clipped spot read too wide and too flat (lower "
                    + "the exposure or add attenuation)", n, n == 1 ? "" : "s", fmt(level), first % image.width() + 1,
                    first / image.width() + 1), first, n);
        }
    }

    private static String fmt(double x) {
        return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
    }

    /** The integration area, in pixels: a rectangle along the principal axes, or the whole frame. */
    record Window(double xc, double yc, double phi, double halfX, double halfY, double cos, double sin) {

        Window(double xc, double yc, double phi, double halfX, double halfY) {
            this(xc, yc, phi, halfX, halfY, Math.cos(phi), Math.sin(phi));
        }

        static Window whole(int w, int h) {
            return new Window((w - 1) / 2.0, (h - 1) / 2.0, 0, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
        }

        boolean contains(double x, double y) {
            double dx = x - xc;
            double dy = y - yc;
            return Math.abs(dx * cos + dy * sin) <= halfX && Math.abs(-dx * sin + dy * cos) <= halfY;
        }

        boolean clipped(int w, int h) {
            double c = Math.abs(Math.cos(phi));
            double s = Math.abs(Math.sin(phi));
            double ex = halfX * c + halfY * s;
            double ey = halfX * s + halfY * c;
            return xc - ex < -0.5 || xc + ex > w - 0.5 || yc - ey < -0.5 || yc + ey > h - 0.5;
        }
    }

    /** Moments in pixel units over one integration area. */
    record Moments(double total, double xBar, double yBar, double sxx, double syy, double sxy, double dx, double dy,
            double phi) {

        /** The moments over {@code window}, or null when the signal there does not sum to a positive power. */
        static Moments over(double[] v, int w, int h, Window window) {
            double s0 = 0;
            double s1x = 0;
            double s1y = 0;
            for (int r = 0; r < h; r++) {
                for (int c = 0; c < w; c++) {
                    if (window.contains(c, r)) {
                        double p = v[r * w + c];
                        s0 += p;
                        s1x += p * c;
                        s1y += p * r;
                    }
                }
            }
            if (!(s0 > 0)) {
                return null;
            }
            double xBar = s1x / s0;
            double yBar = s1y / s0;
            double sxx = 0;
            double syy = 0;
            double sxy = 0;
            for (int r = 0; r < h; r++) {
                for (int c = 0; c < w; c++) {
                    if (window.contains(c, r)) {
                        double p = v[r * w + c];
                        sxx += p * (c - xBar) * (c - xBar);
                        syy += p * (r - yBar) * (r - yBar);
                        sxy += p * (c - xBar) * (r - yBar);
                    }
                }
            }
            sxx /= s0;
            syy /= s0;
            sxy /= s0;
            double sum = sxx + syy;
            double root = Math.sqrt((sxx - syy) * (sxx - syy) + 4 * sxy * sxy);
            double gamma = sxx == syy ? 1 : Math.signum(sxx - syy);
            double dx2 = 8 * (sum + gamma * root);
            double dy2 = 8 * (sum - gamma * root);
            if (!(dx2 > 0) || !(dy2 > 0)) {
                return null;
            }
            double phi = sxx == syy ? Math.signum(sxy) * Math.PI / 4 : 0.5 * Math.atan(2 * sxy / (sxx - syy));
            return new Moments(s0, xBar, yBar, sxx, syy, sxy, Math.sqrt(dx2), Math.sqrt(dy2), phi);
        }
    }

    /**
     * First-order propagation of independent pixel noise of rms {@code noise} through the sums, in pixel units. The
     * background is the mean of {@code borderPixels} pixels, so its error is shared by every pixel of the area: each
     * quantity's variance is σn²·(Σ g² + (Σ g)²/Nb), g its derivative with respect to one pixel.
     */
    record Errors(double xBar, double yBar, double dx, double dy, double radius) {

        static Errors of(Moments m, double[] v, int w, int h, Window window, double noise, int borderPixels) {
            double sum = m.sxx + m.syy;
            double root = Math.sqrt((m.sxx - m.syy) * (m.sxx - m.syy) + 4 * m.sxy * m.sxy);
            double gamma = m.sxx == m.syy ? 1 : Math.signum(m.sxx - m.syy);
            double det = m.sxx * m.syy - m.sxy * m.sxy;
            double radius = 0.5 * Math.sqrt(m.dx * m.dy);
            boolean round = root <= 1e-9 * sum;
            double[] sq = new double[5];
            double[] lin = new double[5];
            for (int r = 0; r < h; r++) {
                for (int c = 0; c < w; c++) {
                    if (!window.contains(c, r)) {
                        continue;
                    }
                    double ex = c - m.xBar;
                    double ey = r - m.yBar;
                    double gxx = (ex * ex - m.sxx) / m.total;
                    double gyy = (ey * ey - m.syy) / m.total;
                    double gxy = (ex * ey - m.sxy) / m.total;
                    double gSum = gxx + gyy;
                    double gRoot = round ? 0 : ((m.sxx - m.syy) * (gxx - gyy) + 4 * m.sxy * gxy) / root;
                    double gDet = m.syy * gxx + m.sxx * gyy - 2 * m.sxy * gxy;
                    double[] g = {ex / m.total, ey / m.total, 4 * (gSum + gamma * gRoot) / m.dx,
                        4 * (gSum - gamma * gRoot) / m.dy, radius / 4 * gDet / det};
                    for (int k = 0; k < g.length; k++) {
                        sq[k] += g[k] * g[k];
                        lin[k] += g[k];
                    }
                }
            }
            double[] e = new double[5];
            for (int k = 0; k < e.length; k++) {
                e[k] = noise * Math.sqrt(sq[k] + lin[k] * lin[k] / borderPixels);
            }
            return new Errors(e[0], e[1], e[2], e[3], e[4]);
        }
    }
}
