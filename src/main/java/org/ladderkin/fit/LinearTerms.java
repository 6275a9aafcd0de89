package org.ladderkin.fit;

/**
 * Per-trace linear parameters added to the model's shape: signal ≈ amplitude · shape + baseline. They are solved
 * exactly for every trial of the nonlinear parameters (variable projection), so the optimiser never searches for them
 * and a poor amplitude start cannot stall it.
 */
public enum LinearTerms {
    /** The model's prediction is compared with the data as it is. */
    NONE,
    /** signal ≈ amplitude · shape. */
    AMPLITUDE,
    /** signal ≈ amplitude · shape + baseline. */
    AMPLITUDE_AND_BASELINE
}
