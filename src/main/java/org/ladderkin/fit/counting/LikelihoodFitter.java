package org.ladderkin.fit.counting;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.ProfileInterval;

/**
 * Maximum-likelihood fit of one or more {@link LikelihoodPart}s sharing parameters. Every part gives residuals whose
 * squares sum to its −2 ln L (signed deviance residuals for counts, σ-scaled residuals for Gaussian data), so
 * Levenberg–Marquardt on the stacked residuals minimises the joint −2 ln L itself. Bounds are removed by
 * transformation (log for positive values, logistic for two bounds). Standard errors come from the observed
 * information: the Hessian H of −2 ln L in the internal coordinates by central differences at the optimum,
 * covariance 2·H⁻¹, carried to physical values by the delta method. A profile interval is where −2 ln L, minimised
 * over the other parameters, rises by 1.
 */
public final class LikelihoodFitter {

    private static final double SINGULAR_RATIO = 1e-14;
    /** Step of the Jacobian's central differences in internal coordinates. */
    private static final double JACOBIAN_STEP = 1e-6;
    /** Step of the Hessian's central differences in internal coordinates. */
    private static final double HESSIAN_STEP = 1e-3;

    private final List<ParameterSpec> shared;
    private final List<LikelihoodPart> parts;
    private final List<Slot> slots = new ArrayList<>();
    private final int points;
    private int evaluations;

    /** A fitted or held value: spec, and the part it belongs to (−1 for shared). */
    private record Slot(ParameterSpec spec, int part) {
    }

    private LikelihoodFitter(List<ParameterSpec> shared, List<LikelihoodPart> parts) {
        this.shared = List.copyOf(shared);
        this.parts = List.copyOf(parts);
        for (ParameterSpec s : shared) {
            slots.add(new Slot(s, -1));
        }
        int n = 0;
        for (int i = 0; i < parts.size(); i++) {
            for (ParameterSpec s : parts.get(i).localParameters()) {
                slots.add(new Slot(s, i));
            }
            n += parts.get(i).points();
        }
        points = n;
    }

    /** Fits {@code parts} with {@code shared} parameters; {@code profile} lists shared keys to profile. */
    public static LikelihoodResult fit(List<ParameterSpec> shared, List<LikelihoodPart> parts, List<String> profile) {
        if (parts.isEmpty()) {
            return LikelihoodResult.failed("no data to fit");
        }
        LikelihoodFitter f = new LikelihoodFitter(shared, parts);
        try {
            return f.run(profile);
        } catch (IllegalArgumentException | MathRuntimeException e) {
            return LikelihoodResult.failed("fit failed: " + e.getMessage());
        }
    }

    private LikelihoodResult run(List<String> profile) {
        double[] start = new double[slots.size()];
        for (int s = 0; s < start.length; s++) {
            start[s] = slots.get(s).spec().start();
        }
        int free = freeIndices(-1).length;
        if (points - free <= 0) {
            return LikelihoodResult.failed(points + " data points for " + free + " free parameters");
        }
        double[] best = minimise(start, -1);
        double m2 = objective(best);
        double[][] cov = covariance(best);
        String message = "";
        if (cov == null) {
            message = "the information matrix is singular at the optimum: some parameter is not determined by these data";
        }
        List<ParameterEstimate> estimates = new ArrayList<>();
        int[] freeIdx = freeIndices(-1);
        for (int s = 0; s < slots.size(); s++) {
            Slot slot = slots.get(s);
            double se = 0;
            if (!slot.spec().fixed()) {
                int c = indexOf(freeIdx, s);
                se = cov == null ? Double.NaN : Math.sqrt(cov[c][c]);
            }
            estimates.add(new ParameterEstimate(slot.spec().key(), slot.part(), best[s], se, slot.spec().fixed()));
        }
        double deviance = 0;
        double chi2 = 0;
        int bins = 0;
        List<double[]> fitted = new ArrayList<>();
        for (int i = 0; i < parts.size(); i++) {
            LikelihoodPart part = parts.get(i);
            double[] r = new double[part.points()];
            ParameterValues v = values(best, i);
            part.residuals(v, r, 0);
            double sum = 0;
            for (double x : r) {
                sum += x * x;
            }
            if (part.counts()) {
                deviance += sum;
                bins += part.points();
            } else {
                chi2 += sum;
            }
            fitted.add(part.fitted(v));
        }
        List<ProfileInterval> profiles = new ArrayList<>();
        for (String key : profile) {
            profiles.add(profile(best, m2, key, estimates));
        }
        return new LikelihoodResult(cov == null ? LikelihoodResult.Status.UNCERTAINTY_UNAVAILABLE : LikelihoodResult.Status.CONVERGED,
                message, estimates, m2, deviance, bins, chi2, points, free, points - free, fitted, profiles, evaluations);
    }

    /** The slots fitted, leaving out {@code held} (−1: none). */
    private int[] freeIndices(int held) {
        List<Integer> idx = new ArrayList<>();
        for (int s = 0; s < slots.size(); s++) {
            if (!slots.get(s).spec().fixed() && s != held) {
                idx.add(s);
            }
        }
        return idx.stream().mapToInt(Integer::intValue).toArray();
    }

    private static int indexOf(int[] a, int v) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] == v) {
                return i;
            }
        }
        return -1;
    }

    /** Levenberg–Marquardt from {@code start} (physical values), with slot {@code held} kept at its start value. */
    private double[] minimise(double[] start, int held) {
        int[] free = freeIndices(held);
        double[] u0 = new double[free.length];
        for (int c = 0; c < free.length; c++) {
            u0[c] = InternalScale.toInternal(slots.get(free[c]).spec(), start[free[c]]);
        }
        if (free.length == 0) {
            return start.clone();
        }
        java.util.function.Function<double[], double[]> physical = u -> {
            double[] p = start.clone();
            for (int c = 0; c < free.length; c++) {
                p[free[c]] = InternalScale.toExternal(slots.get(free[c]).spec(), u[c]);
            }
            return p;
        };
        double[][] cacheU = new double[1][];
        double[][] cacheR = new double[1][];
        java.util.function.Function<double[], double[]> res = u -> {
            if (cacheU[0] == null || !java.util.Arrays.equals(cacheU[0], u)) {
                cacheR[0] = residuals(physical.apply(u));
                cacheU[0] = u.clone();
            }
            return cacheR[0];
        };
        LeastSquaresBuilder b = new LeastSquaresBuilder()
                .start(u0)
                .target(new double[points])
                .model(u -> res.apply(u).clone(), u -> jacobian(u, res))
                .lazyEvaluation(false)
                .maxIterations(1000)
                .maxEvaluations(5000);
        // the stacked residuals are the model and the target is 0, so the optimiser's cost is √(−2 ln L + const)
        LeastSquaresOptimizer.Optimum o = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-13).withOrthoTolerance(1e-15)
                .optimize(b.build());
        return physical.apply(o.getPoint().toArray());
    }

    private double[][] jacobian(double[] u, java.util.function.Function<double[], double[]> res) {
        double[][] j = new double[points][u.length];
        for (int c = 0; c < u.length; c++) {
            double h = JACOBIAN_STEP * Math.max(1, Math.abs(u[c]));
            double[] up = u.clone();
            double[] dn = u.clone();
            up[c] += h;
            dn[c] -= h;
            double[] rp = res.apply(up).clone();
            double[] rm = res.apply(dn);
            for (int i = 0; i < points; i++) {
                j[i][c] = (rp[i] - rm[i]) / (2 * h);
            }
        }
        return j;
    }

    private double[] residuals(double[] physical) {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException("fit cancelled");
        }
        evaluations++;
        double[] r = new double[points];
        int offset = 0;
        for (int i = 0; i < parts.size(); i++) {
            parts.get(i).residuals(values(physical, i), r, offset);
            offset += parts.get(i).points();
        }
        return r;
    }

    /** −2 ln L up to a constant. */
    double objective(double[] physical) {
        double s = 0;
        for (double x : residuals(physical)) {
            s += x * x;
        }
        return s;
    }

    private ParameterValues values(double[] physical, int part) {
        List<String> keys = new ArrayList<>();
        List<Double> vals = new ArrayList<>();
        for (int s = 0; s < slots.size(); s++) {
            if (slots.get(s).part() == -1 || slots.get(s).part() == part) {
                keys.add(slots.get(s).spec().key());
                vals.add(physical[s]);
            }
        }
        return ParameterValues.shared(keys, vals.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /** Covariance of the free parameters (physical), or null when the information is singular. */
    private double[][] covariance(double[] best) {
        int[] free = freeIndices(-1);
        int k = free.length;
        double[] u = new double[k];
        for (int c = 0; c < k; c++) {
            u[c] = InternalScale.toInternal(slots.get(free[c]).spec(), best[free[c]]);
        }
        java.util.function.ToDoubleFunction<double[]> f = uu -> {
            double[] p = best.clone();
            for (int c = 0; c < k; c++) {
                p[free[c]] = InternalScale.toExternal(slots.get(free[c]).spec(), uu[c]);
            }
            return objective(p);
        };
        double f0 = f.applyAsDouble(u);
        double[][] h = new double[k][k];
        double step = HESSIAN_STEP;
        for (int a = 0; a < k; a++) {
            double[] up = u.clone();
            double[] dn = u.clone();
            up[a] += step;
            dn[a] -= step;
            h[a][a] = (f.applyAsDouble(up) - 2 * f0 + f.applyAsDouble(dn)) / (step * step);
            for (int b = 0; b < a; b++) {
                double[] pp = u.clone();
                double[] pm = u.clone();
                double[] mp = u.clone();
                double[] mm = u.clone();
                pp[a] += step;
                pp[b] += step;
                pm[a] += step;
                pm[b] -= step;
                mp[a] -= step;
                mp[b] += step;
                mm[a] -= step;
                mm[b] -= step;
                h[a][b] = (f.applyAsDouble(pp) - f.applyAsDouble(pm) - f.applyAsDouble(mp) + f.applyAsDouble(mm)) / (4 * step * step);
                h[b][a] = h[a][b];
            }
        }
        // scale to unit diagonal so parameters of very different curvature do not look singular
        double[] d = new double[k];
        for (int a = 0; a < k; a++) {
            if (!(h[a][a] > 0)) {
                return null;
            }
            d[a] = Math.sqrt(h[a][a]);
        }
        double[][] s = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                s[a][b] = h[a][b] / (d[a] * d[b]);
            }
        }
        EigenDecompositionSymmetric eig = new EigenDecompositionSymmetric(new Array2DRowRealMatrix(s, false));
        double[] ev = eig.getEigenvalues();
        double max = 0;
        double min = Double.POSITIVE_INFINITY;
        for (double e : ev) {
            max = Math.max(max, e);
            min = Math.min(min, e);
        }
        if (!(min > SINGULAR_RATIO * max)) {
            return null;
        }
        RealMatrix v = eig.getV();
        double[][] cov = new double[k][k];
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < k; b++) {
                double sum = 0;
                for (int e = 0; e < k; e++) {
                    sum += v.getEntry(a, e) * v.getEntry(b, e) / ev[e];
                }
                cov[a][b] = 2 * sum / (d[a] * d[b]) * InternalScale.slope(slots.get(free[a]).spec(), u[a]) 
                        * InternalScale.slope(slots.get(free[b]).spec(), u[b]);
            }
        }
        return cov;
    }

    private ProfileInterval profile(double[] best, double m2, String key, List<ParameterEstimate> estimates) {
        int index = -1;
        for (int s = 0; s < slots.size(); s++) {
            if (slots.get(s).part() == -1 && slots.get(s).spec().key().equals(key)) {
                index = s;
            }
        }
        if (index < 0 || slots.get(index).spec().fixed()) {
            throw new IllegalArgumentException("a profile needs a free shared parameter; '" + key + "' is not one");
        }
        ParameterSpec spec = slots.get(index).spec();
        double theta = best[index];
        double se = estimates.get(index).stdError();
        double step = Double.isFinite(se) && se > 0 ? se : 0.1 * Math.abs(theta);
        int[] refits = {0};
        int held = index;
        java.util.function.DoubleUnaryOperator rise = value -> {
            refits[0]++;
            double[] s = best.clone();
            s[held] = value;
            return objective(minimise(s, held)) - m2 - 1;
        };
        double[] lo = side(-1, theta, step, spec, rise);
        double[] hi = side(+1, theta, step, spec, rise);
        return new ProfileInterval(key, lo[0], hi[0], lo[1] != 0, hi[1] != 0, refits[0]);
    }

    private static double[] side(int direction, double theta, double step, ParameterSpec spec,
                                 java.util.function.DoubleUnaryOperator rise) {
        double bound = direction < 0 ? spec.lower() : spec.upper();
        double inside = theta;
        double tryAt = theta + direction * step;
        for (int m = 0; m < 12; m++) {
            if (direction < 0 ? tryAt <= bound : tryAt >= bound) {
                tryAt = (inside + bound) / 2;
            }
            if (rise.applyAsDouble(tryAt) >= 0) {
                double root = new BrentSolver(1e-7 * step).solve(60, rise::applyAsDouble, Math.min(inside, tryAt), Math.max(inside, tryAt));
                return new double[] {root, 0};
            }
            inside = tryAt;
            tryAt = theta + direction * step * Math.pow(2, m + 1);
        }
        return new double[] {inside, 1};
    }
}
