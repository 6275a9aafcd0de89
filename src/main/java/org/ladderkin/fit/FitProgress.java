package org.ladderkin.fit;

import java.util.Map;
import java.util.Objects;

/**
 * Told how far a fit has got, and the best point it has met so far. Called on the fitting thread; implementations
 * must be quick and must not throw.
 */
@FunctionalInterface
public interface FitProgress {

    /** Ignores all progress. */
    FitProgress NONE = (stage, done, total) -> { };

    /**
     * @param stage "start" while start vectors are tried, "evaluation" per model evaluation of the series (where the
     *              model counts them), "profile KEY" while a profile is traced
     * @param done  steps finished in this stage
     * @param total steps expected in this stage (for evaluations and profiles, an upper estimate)
     */
    void update(String stage, int done, int total);

    /** The optimiser met a point better than any before; by default ignored. */
    default void improved(Best best) {
    }

    /**
     * The best point a running fit has met so far.
     *
     * @param evaluations      the optimiser's evaluations of the series when it was met (all starts counted)
     * @param reducedChiSquare χ² per degree of freedom there, against the given uncertainties or, without them, the
     *                         point-to-point scatter of each trace's residuals (as {@link FitQuality} measures it)
     * @param values           shared nonlinear parameters there, internal key → SI value (held ones included)
     */
    record Best(int evaluations, double reducedChiSquare, Map<String, Double> values) {
        public Best {
            values = Map.copyOf(Objects.requireNonNull(values, "values"));
            if (evaluations < 1) {
                throw new IllegalArgumentException("a best point needs at least one evaluation, had " + evaluations);
            }
        }
    }
}
