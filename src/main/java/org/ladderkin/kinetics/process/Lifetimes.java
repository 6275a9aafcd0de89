package org.ladderkin.kinetics.process;

/** Rates from lifetimes: a lifetime of +∞ (not given) is a rate of 0, a process switched off. */
final class Lifetimes {

    private Lifetimes() {
    }

    static double rate(double lifetimeS) {
        return Double.isInfinite(lifetimeS) ? 0 : 1 / lifetimeS;
    }

    static double require(String what, double lifetimeS, boolean mayBeInfinite) {
        if (!(lifetimeS > 0) || Double.isNaN(lifetimeS) || (!mayBeInfinite && Double.isInfinite(lifetimeS))) {
            throw new IllegalArgumentException(what + " must be > 0" + (mayBeInfinite ? "" : " and finite") + ", was "
                    + lifetimeS + " s");
        }
        return lifetimeS;
    }
}
