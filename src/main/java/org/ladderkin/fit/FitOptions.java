package org.ladderkin.fit;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How to run a fit.
 *
 * @param starts           extra start vectors (parameter key → SI value; unnamed parameters keep their spec start); the
 *                         spec starts are always tried first
 * @param maxIterations    Levenberg–Marquardt iterations per start
 * @param maxEvaluations   model evaluations per start
 * @param analyticJacobian use the model's Jacobian when it has one (else central differences)
 * @param autocorrelationLags residual autocorrelation is reported for lags 1..this
 * @param profile          keys of shared free parameters that get a profile-likelihood interval
 * @param progress         told after each start and each profile refit
 */
public record FitOptions(List<Map<String, Double>> starts, int maxIterations, int maxEvaluations, boolean analyticJacobian,
                         int autocorrelationLags, List<String> profile, FitProgress progress) {

    public FitOptions {
        starts = List.copyOf(Objects.requireNonNull(starts, "starts")).stream().map(Map::copyOf).toList();
        profile = List.copyOf(Objects.requireNonNull(profile, "profile"));
        Objects.requireNonNull(progress, "progress");
        if (maxIterations < 1 || maxEvaluations < 1) {
            throw new IllegalArgumentException("iteration and evaluation limits must be >= 1, were " + maxIterations + " and " + maxEvaluations);
        }
        if (autocorrelationLags < 0) {
            throw new IllegalArgumentException("autocorrelation lags must be >= 0, was " + autocorrelationLags);
        }
    }

    /** One start, 200 iterations, analytic Jacobian when available, lags 1..5, no profiles. */
    public static FitOptions defaults() {
        return new FitOptions(List.of(), 200, 2000, true, 5, List.of(), FitProgress.NONE);
    }

    /** A copy that also tries {@code moreStarts}. */
    public FitOptions withStarts(List<Map<String, Double>> moreStarts) {
        return new FitOptions(moreStarts, maxIterations, maxEvaluations, analyticJacobian, autocorrelationLags, profile, progress);
    }

    /** A copy that profiles {@code keys}. */
    public FitOptions withProfile(List<String> keys) {
        return new FitOptions(starts, maxIterations, maxEvaluations, analyticJacobian, autocorrelationLags, keys, progress);
    }

    /** A copy reporting progress to {@code listener}. */
    public FitOptions withProgress(FitProgress listener) {
        return new FitOptions(starts, maxIterations, maxEvaluations, analyticJacobian, autocorrelationLags, profile, listener);
    }

    /** A copy choosing analytic or finite-difference derivatives. */
    public FitOptions withAnalyticJacobian(boolean analytic) {
        return new FitOptions(starts, maxIterations, maxEvaluations, analytic, autocorrelationLags, profile, progress);
    }
}
