package org.ladderkin.plan;

import java.util.Objects;
import org.ladderkin.excite.RelativeBudget;

/**
 * The expected error of one goal parameter of a design, split by where it comes from. The split is exact: the
 * covariance of a Gauss–Markov estimate with Gaussian priors, C = (F + P)⁻¹, is C·F·C (the data's noise) plus
 * C·P·C (the priors), and both split further by noise term and by prior, so the squares of {@code sources} add up to
 * the square of {@code totalRel}.
 *
 * @param parameter      the goal parameter
 * @param statisticalRel relative standard error from the data's noise (white noise and pump fluctuation)
 * @param systematicRel  relative standard error from the calibration, drift, time zero and IRF width
 * @param totalRel       both in quadrature
 * @param sources        every source's contribution (relative standard error)
 * @param advice         one sentence on what to measure better, with the computed gain
 */
public record ExpectedError(DesignSearch.Parameter parameter, double statisticalRel, double systematicRel, double totalRel,
                            RelativeBudget sources, String advice) {

    public ExpectedError {
        Objects.requireNonNull(parameter, "parameter");
        Objects.requireNonNull(sources, "sources");
        Objects.requireNonNull(advice, "advice");
        if (!(statisticalRel >= 0) || !(systematicRel >= 0) || !(totalRel >= 0)) {
            throw new IllegalArgumentException("expected errors must be >= 0, were " + statisticalRel + ", " + systematicRel
                    + ", " + totalRel);
        }
    }

    /** The largest source, e.g. "pump radius". */
    public String dominant() {
        return sources.dominant().map(RelativeBudget.Item::source).orElse("none");
    }
}
