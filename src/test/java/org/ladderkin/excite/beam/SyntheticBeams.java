package org.ladderkin.excite.beam;

import java.util.SplittableRandom;

/** Camera frames and knife-edge scans drawn from closed-form beams, for the beam tests (also used by io and cli tests). */
public final class SyntheticBeams {

    private SyntheticBeams() {
    }

    /**
     * An elliptical Gaussian I = peak·exp(−2u²/wu² − 2v²/wv²), u along the axis at {@code angleRad} from x, sampled at
     * pixel centres, plus a flat background and Gaussian noise of rms {@code noise} (seeded).
     */
    public static double[] gaussian(int width, int height, double xc, double yc, double wuPx, double wvPx, double angleRad,
            double peak, double background, double noise, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double c = Math.cos(angleRad);
        double s = Math.sin(angleRad);
        double[] v = new double[width * height];
        for (int r = 0; r < height; r++) {
            for (int col = 0; col < width; col++) {
                double dx = col - xc;
                double dy = r - yc;
                double u = dx * c + dy * s;
                double w = -dx * s + dy * c;
                v[r * width + col] = peak * Math.exp(-2 * u * u / (wuPx * wuPx) - 2 * w * w / (wvPx * wvPx)) + background
                        + noise * gauss(rnd);
            }
        }
        return v;
    }

    /** A uniform disc of radius {@code radiusPx}, each pixel weighted by the fraction of it inside (16 × 16 subsamples). */
    public static double[] flatTop(int width, int height, double xc, double yc, double radiusPx, double level,
            double background, double noise, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] v = new double[width * height];
        int sub = 16;
        for (int r = 0; r < height; r++) {
            for (int col = 0; col < width; col++) {
                int inside = 0;
                for (int i = 0; i < sub; i++) {
                    for (int j = 0; j < sub; j++) {
                        double dx = col - 0.5 + (i + 0.5) / sub - xc;
                        double dy = r - 0.5 + (j + 0.5) / sub - yc;
                        inside += dx * dx + dy * dy <= radiusPx * radiusPx ? 1 : 0;
                    }
                }
                v[r * width + col] = level * inside / (sub * sub) + background + noise * gauss(rnd);
            }
        }
        return v;
    }

    /** Power past a blade at each position for a Gaussian beam of 1/e² radius w centred at x0, blade moving out. */
    public static double[] knifeEdge(double[] xM, double x0M, double wM, double p0, double pMax, double noise, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        double[] p = new double[xM.length];
        for (int i = 0; i < xM.length; i++) {
            p[i] = p0 + (pMax - p0) / 2 * (1 + org.hipparchus.special.Erf.erf(Math.sqrt(2) * (xM[i] - x0M) / wM))
                    + noise * gauss(rnd);
        }
        return p;
    }

    /** Evenly spaced positions from a to b. */
    public static double[] grid(double a, double b, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = a + (b - a) * i / (n - 1);
        }
        return x;
    }

    static double gauss(SplittableRandom rnd) {
        double u1 = rnd.nextDouble();
        double u2 = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }
}
