package org.ladderkin.observe;

/** Outcome of a risk check. */
public enum Verdict {
    /** Within the limit with margin. */
    PASS,
    /** Close to the limit, or a condition that weakens the measurement. */
    WARN,
    /** Beyond the limit: change the plan. */
    FAIL;

    /** The worse of two verdicts. */
    public Verdict worst(Verdict other) {
        return compareTo(other) >= 0 ? this : other;
    }

    /** PASS below {@code warnFraction}·limit, WARN up to the limit, FAIL above it. */
    public static Verdict against(double value, double limit, double warnFraction) {
        if (value > limit) {
            return FAIL;
        }
        return value > warnFraction * limit ? WARN : PASS;
    }
}
