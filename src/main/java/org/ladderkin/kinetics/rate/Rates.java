package org.ladderkin.kinetics.rate;

/** Shared argument checks for rate records. */
final class Rates {

    private Rates() {
    }

    static void requireRate(String what, double ratePerS) {
        if (!(ratePerS >= 0) || !Double.isFinite(ratePerS)) {
            throw new IllegalArgumentException(what + " must be finite and >= 0, was " + ratePerS + " 1/s");
        }
    }

    static void requireProbability(String what, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException(what + " must be between 0 and 1, was " + p);
        }
    }
}
