package org.ladderkin.observe;

/**
 * How many photons a mono-exponential decay needs for a given lifetime precision. The arrival times of the counted
 * photons follow an exponential truncated at the window T; the lifetime's maximum-likelihood estimate has, for N counts
 * and no background, the Cramér–Rao variance σ_τ² = 1/(N·I(τ)) with the Fisher information per count
 * I(τ) = Var(t)/τ⁴, Var(t) = τ² − T²·e^{−T/τ}/(1 − e^{−T/τ})² (the score of the truncated exponential is
 * t/τ² + const). Its relative error is F/√N with F = 1/(τ·√I) ≥ 1; F → 1 for a window of many lifetimes, where the
 * estimate is Poisson-limited (σ_τ/τ = 1/√N).
 */
public final class PhotonCountingStatistics {

    private PhotonCountingStatistics() {
    }

    /** F = (σ_τ/τ)·√N for a window of {@code windowS} after the pulse (≥ 1; grows as the window shortens). */
    public static double precisionFactor(double tauS, double windowS) {
        if (!(tauS > 0) || !(windowS > 0)) {
            throw new IllegalArgumentException("lifetime and window must be > 0, were " + tauS + " s and " + windowS + " s");
        }
        double x = windowS / tauS;
        // e^{-x}/(1-e^{-x})² written with expm1 so short and long windows both keep their digits
        double em = Math.expm1(-x);
        double varOverTau2 = 1 - x * x * Math.exp(-x) / (em * em);
        if (!(varOverTau2 > 0)) {
            throw new IllegalArgumentException("window " + windowS + " s is too short for a lifetime of " + tauS + " s");
        }
        return 1 / Math.sqrt(varOverTau2);
    }

    /** Counts in one decay for a relative lifetime error {@code relativeError}. */
    public static double countsFor(double tauS, double windowS, double relativeError) {
        if (!(relativeError > 0) || !(relativeError < 1)) {
            throw new IllegalArgumentException("relative error must be in (0, 1), was " + relativeError);
        }
        double f = precisionFactor(tauS, windowS);
        return f * f / (relativeError * relativeError);
    }

    /** Relative lifetime error of a decay with {@code counts} photons. */
    public static double relativeError(double tauS, double windowS, double counts) {
        if (!(counts > 0)) {
            throw new IllegalArgumentException("counts must be > 0, was " + counts);
        }
        return precisionFactor(tauS, windowS) / Math.sqrt(counts);
    }
}
