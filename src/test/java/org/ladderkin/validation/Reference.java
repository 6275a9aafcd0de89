package org.ladderkin.validation;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * The one way a validation test compares a computed value with its reference. It asserts and records the comparison
 * for the dossier; call it only inside a test annotated with {@link CheckedAgainst}.
 */
public final class Reference {

    private Reference() {
    }

    /**
     * Asserts |value − reference| ≤ absoluteTolerance and records the comparison.
     *
     * @param quantity what is compared, with its unit (e.g. "photon energy of 400 nm (eV)")
     */
    public static void check(String quantity, double value, double reference, double absoluteTolerance) {
        boolean ok = Double.isFinite(value) && Math.abs(value - reference) <= absoluteTolerance;
        ValidationRecorder.record(new ValidationRecorder.Comparison(quantity, value, reference, absoluteTolerance, false, ok));
        if (!ok) {
            fail(quantity + ": computed " + value + ", reference " + reference + ", |difference| "
                    + Math.abs(value - reference) + " > tolerance " + absoluteTolerance);
        }
    }

    /** Asserts |value − reference| ≤ relativeTolerance·|reference| and records the comparison. */
    public static void checkRelative(String quantity, double value, double reference, double relativeTolerance) {
        double diff = Math.abs(value - reference);
        boolean ok = Double.isFinite(value) && diff <= relativeTolerance * Math.abs(reference);
        ValidationRecorder.record(new ValidationRecorder.Comparison(quantity, value, reference, relativeTolerance, true, ok));
        if (!ok) {
            fail(quantity + ": computed " + value + ", reference " + reference + ", relative difference "
                    + diff / Math.abs(reference) + " > tolerance " + relativeTolerance);
        }
    }
}
