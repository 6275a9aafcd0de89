package org.ladderkin.fit;

import java.util.Objects;

/**
 * A 68% profile-likelihood interval for one parameter: where the best χ² with the parameter held rises by one
 * reduced χ² above the minimum. A side that reached a bound before the rise is open and reported at the bound.
 *
 * @param key        parameter key
 * @param lower      lower end (SI)
 * @param upper      upper end (SI)
 * @param lowerOpen  the rise was not reached before the lower bound
 * @param upperOpen  the rise was not reached before the upper bound
 * @param refits     how many refits the profile took
 */
public record ProfileInterval(String key, double lower, double upper, boolean lowerOpen, boolean upperOpen, int refits) {

    public ProfileInterval {
        Objects.requireNonNull(key, "key");
        if (!(lower <= upper)) {
            throw new IllegalArgumentException(key + ": profile interval must have lower <= upper, was " + lower + " to " + upper);
        }
    }
}
