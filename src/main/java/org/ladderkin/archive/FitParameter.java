package org.ladderkin.archive;

import java.util.Objects;

/**
 * One shared parameter of an archived fit, in the trade unit its key names ({@code tauAuger2Ps}, {@code crossSectionCm2}),
 * as the fit result wrote it.
 *
 * @param key            trade key with unit suffix
 * @param value          fitted or held value
 * @param stdError       statistical standard error, NaN when unavailable (held parameters)
 * @param totalStdError  with the calibration prior, NaN when none was given
 * @param fixed          held at its start value
 */
public record FitParameter(String key, double value, double stdError, double totalStdError, boolean fixed) {

    public FitParameter {
        Objects.requireNonNull(key, "key");
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("parameter '" + key + "' has no finite value");
        }
        if (!Double.isNaN(stdError) && !(stdError >= 0)) {
            throw new IllegalArgumentException("parameter '" + key + "': standard error must be >= 0, was " + stdError);
        }
        if (!Double.isNaN(totalStdError) && !(totalStdError >= 0)) {
            throw new IllegalArgumentException("parameter '" + key + "': total error must be >= 0, was " + totalStdError);
        }
    }

    /** The error a trend should weigh this value with: the total error when there is one, else the statistical one. */
    public double bestStdError() {
        return Double.isNaN(totalStdError) ? stdError : totalStdError;
    }
}
