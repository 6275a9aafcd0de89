package org.ladderkin.fit;

import org.hipparchus.analysis.solvers.BrentSolver;

/**
 * Profile-likelihood interval of one shared parameter: hold it at θ, refit everything else, and find the two θ where
 * (χ²(θ) − χ²min)/s² = 1, s² being the best fit's reduced χ². For a model linear in its parameters this is exactly
 * the covariance interval θ̂ ± σ; for curved problems it follows the actual shape of χ², which the covariance only
 * approximates by a parabola.
 */
final class ProfileLikelihood {

    /** Most doublings of the step when searching for the rise. */
    private static final int MAX_EXPANSIONS = 12;
    /** Refits allowed for the root search on each side. */
    private static final int MAX_ROOT_REFITS = 40;

    private ProfileLikelihood() {
    }

    static ProfileInterval interval(FitProblem problem, FitOptions options, GlobalFitter.Run best, FitResult result, String key) {
        ParameterSpec spec = problem.parameter(key);
        if (spec.fixed() || spec.scope() != ParameterSpec.Scope.SHARED) {
            throw new Projection.FitFailure("a profile needs a free shared parameter; " + key + " is "
                    + (spec.fixed() ? "fixed" : "per trace"));
        }
        int index = problem.parameters().indexOf(spec);
        double[][] bestValues = best.projection().physical(best.u());
        double theta = bestValues[index][0];
        double se = result.estimate(key).stdError();
        double step = Double.isFinite(se) && se > 0 ? se : 0.1 * (theta != 0 ? Math.abs(theta) : spec.scale());
        double chiMin = best.chiSquare();
        double s2 = result.reducedChiSquare();
        FitOptions plain = options.withProfile(java.util.List.of()).withStarts(java.util.List.of()).withProgress(FitProgress.NONE);
        int expected = 2 * (MAX_EXPANSIONS + MAX_ROOT_REFITS);
        int[] refits = {0};
        java.util.function.DoubleUnaryOperator rise = value -> {
            refits[0]++;
            options.progress().update("profile " + key, refits[0], Math.max(expected, refits[0]));
            double[][] start = new double[bestValues.length][];
            for (int s = 0; s < start.length; s++) {
                start[s] = bestValues[s].clone();
            }
            start[index] = new double[] {value};
            Projection p = new Projection(problem.with(spec.fixedAt(value)), start, plain.analyticJacobian());
            GlobalFitter.Run r = GlobalFitter.optimise(p, plain);
            return Math.max(0, (r.chiSquare() - chiMin) / s2) - 1;
        };
        double[] lower = side(-1, theta, step, spec, rise);
        double[] upper = side(+1, theta, step, spec, rise);
        return new ProfileInterval(key, lower[0], upper[0], lower[1] != 0, upper[1] != 0, refits[0]);
    }

    /** {end, open?} on one side. */
    private static double[] side(int direction, double theta, double step, ParameterSpec spec,
                                 java.util.function.DoubleUnaryOperator rise) {
        double bound = direction < 0 ? spec.lower() : spec.upper();
        double inside = theta;
        double tryAt = theta + direction * step;
        for (int m = 0; m < MAX_EXPANSIONS; m++) {
            if (direction < 0 ? tryAt <= bound : tryAt >= bound) {
                tryAt = (inside + bound) / 2;
            }
            double f = rise.applyAsDouble(tryAt);
            if (f >= 0) {
                double lo = Math.min(inside, tryAt);
                double hi = Math.max(inside, tryAt);
                double root = new BrentSolver(1e-6 * step).solve(MAX_ROOT_REFITS, rise::applyAsDouble, lo, hi);
                return new double[] {root, 0};
            }
            inside = tryAt;
            tryAt = theta + direction * step * Math.pow(2, m + 1);
        }
        return new double[] {inside, 1};
    }
}
