package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * The threshold-linear law across photon energies: quantum yield QY(x) = 1 + (x − a)/b above the threshold a and 1
 * below it, with x = ħω/E_g, a = E_th/E_g and b = ε_eh/E_g (ε_eh the energy each further electron–hole pair costs).
 * Energy conservation bounds it by a = 2, b = 1; the multiplication efficiency is η_CM = E_g/ε_eh = 1/b.
 * <p>
 * Weighted least squares with the yields' own standard errors as known (they come from fits that already scaled them
 * by their residuals). Above the threshold the law is the straight line QY = c₀ + c₁x with c₁ = 1/b, c₀ = 1 − a/b,
 * so for a given split of the points into "below" and "above" the minimum is a closed-form straight-line fit; every
 * split whose fitted threshold falls between its last point below and its first point above is tried, and the one of
 * least χ² wins. Points below the threshold do not move a or b, so the errors are those of the straight line carried
 * to a = (1 − c₀)/c₁ and b = 1/c₁ by the delta method.
 */
public final class ThresholdLawFit {

    /** Energy-conservation threshold over the gap: the second pair needs at least another E_g. */
    public static final double CONSERVATION_THRESHOLD_OVER_GAP = 2;
    /** Energy-conservation pair-creation energy over the gap. */
    public static final double CONSERVATION_PAIR_ENERGY_OVER_GAP = 1;

    private ThresholdLawFit() {
    }

    /**
     * One measured yield.
     *
     * @param photonEnergyOverGap ħω/E_g, finite and &gt; 0
     * @param quantumYield        QY = 1 + η, finite
     * @param stdError            its standard error, finite and &gt; 0
     * @param label               where it came from (a file name)
     */
    public record Point(double photonEnergyOverGap, double quantumYield, double stdError, String label) {
        public Point {
            Objects.requireNonNull(label, "label");
            if (!(photonEnergyOverGap > 0) || !Double.isFinite(photonEnergyOverGap)) {
                throw new IllegalArgumentException(label + ": photon energy over gap must be finite and > 0, was " + photonEnergyOverGap);
            }
            if (!Double.isFinite(quantumYield)) {
                throw new IllegalArgumentException(label + ": quantum yield must be finite, was " + quantumYield);
            }
            if (!(stdError > 0) || !Double.isFinite(stdError)) {
                throw new IllegalArgumentException(label + ": the yield's standard error must be finite and > 0, was " + stdError
                        + " (a fit whose yield has no error cannot be weighted)");
            }
        }
    }

    /**
     * The fitted law.
     *
     * @param thresholdOverGap          a = E_th/E_g
     * @param thresholdStdError         its standard error
     * @param pairEnergyOverGap         b = ε_eh/E_g
     * @param pairEnergyStdError        its standard error
     * @param covariance                cov(a, b)
     * @param chiSquare                 Σ ((QY − law)/σ)² over every point
     * @param pointsAbove               points in the linear part (at or above the threshold)
     * @param points                    the points, sorted by photon energy
     */
    public record Result(double thresholdOverGap, double thresholdStdError, double pairEnergyOverGap,
                         double pairEnergyStdError, double covariance, double chiSquare, int pointsAbove,
                         List<Point> points) {
        public Result {
            points = List.copyOf(points);
        }

        /** η_CM = E_g/ε_eh. */
        public double efficiency() {
            return 1 / pairEnergyOverGap;
        }

        /** Standard error of η_CM (delta method). */
        public double efficiencyStdError() {
            return pairEnergyStdError / (pairEnergyOverGap * pairEnergyOverGap);
        }

        /** Degrees of freedom: points less the two parameters. */
        public int degreesOfFreedom() {
            return points.size() - 2;
        }

        /** The law at x = ħω/E_g. */
        public double quantumYield(double photonEnergyOverGap) {
            return law(thresholdOverGap, pairEnergyOverGap, photonEnergyOverGap);
        }
    }

    /** QY = 1 + max(0, (x − a)/b). */
    public static double law(double thresholdOverGap, double pairEnergyOverGap, double photonEnergyOverGap) {
        return 1 + Math.max(0, (photonEnergyOverGap - thresholdOverGap) / pairEnergyOverGap);
    }

    /**
     * Fits the law.
     *
     * @throws IllegalArgumentException with fewer than three points, fewer than two distinct energies, or when no
     *                                  split gives a rising line with its threshold between the points it separates
     */
    public static Result fit(List<Point> points) {
        List<Point> sorted = new ArrayList<>(points);
        sorted.sort(Comparator.comparingDouble(Point::photonEnergyOverGap));
        int n = sorted.size();
        if (n < 3) {
            throw new IllegalArgumentException("the threshold law needs yields at three or more photon energies, got " + n);
        }
        Result best = null;
        for (int k = 0; k <= n - 2; k++) {
            Result r = split(sorted, k);
            if (r != null && (best == null || r.chiSquare() < best.chiSquare())) {
                best = r;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("the yields do not rise with photon energy above any threshold between the "
                    + "measured energies (no straight line above a split has a positive slope and its threshold inside the split)");
        }
        return best;
    }

    /** Points k.. on the line, points before k at QY = 1; null unless the line rises and its threshold fits the split. */
    private static Result split(List<Point> p, int k) {
        double s = 0;
        double sx = 0;
        double sxx = 0;
        double sy = 0;
        double sxy = 0;
        for (int i = k; i < p.size(); i++) {
            Point q = p.get(i);
            double w = 1 / (q.stdError() * q.stdError());
            double x = q.photonEnergyOverGap();
            s += w;
            sx += w * x;
            sxx += w * x * x;
            sy += w * q.quantumYield();
            sxy += w * x * q.quantumYield();
        }
        double det = s * sxx - sx * sx;
        if (!(det > 0)) {
            return null;
        }
        double c1 = (s * sxy - sx * sy) / det;
        double c0 = (sxx * sy - sx * sxy) / det;
        if (!(c1 > 0)) {
            return null;
        }
        double a = (1 - c0) / c1;
        double b = 1 / c1;
        if (a > p.get(k).photonEnergyOverGap() || k > 0 && a < p.get(k - 1).photonEnergyOverGap()) {
            return null;
        }
        double varC0 = sxx / det;
        double varC1 = s / det;
        double covC = -sx / det;
        double varA = (varC0 + 2 * a * covC + a * a * varC1) / (c1 * c1);
        double varB = varC1 / (c1 * c1 * c1 * c1);
        double covAb = (covC + a * varC1) / (c1 * c1 * c1);
        double chi2 = 0;
        for (Point q : p) {
            double r = (q.quantumYield() - law(a, b, q.photonEnergyOverGap())) / q.stdError();
            chi2 += r * r;
        }
        return new Result(a, Math.sqrt(varA), b, Math.sqrt(varB), covAb, chi2, p.size() - k, p);
    }
}
