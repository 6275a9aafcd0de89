package org.ladderkin.fit;

/**
 * What the global fitter fits: one predicted signal shape per trace from a set of named nonlinear parameters.
 * Per-trace amplitude and baseline are not part of the model; the fitter adds them (see {@link LinearTerms}).
 * Implementations must be safe to call repeatedly with any values inside the parameter bounds; a non-finite
 * prediction stops the fit with a message rather than being passed on.
 */
public interface TraceModel {

    /** Number of traces this model describes (equal to the dataset's). */
    int traceCount();

    /** The predicted shape of trace {@code trace} at {@code delaysS} (s). */
    double[] predict(int trace, double[] delaysS, ParameterValues p);

    /** Whether {@link #jacobian} is implemented. */
    default boolean hasJacobian() {
        return false;
    }

    /**
     * Derivatives of {@link #predict} with respect to every parameter: row {@code p.indexOf(key)} holds
     * ∂prediction/∂parameter at each delay (rows of parameters the shape does not depend on may be zero or null).
     * For a per-trace parameter the row is the derivative with respect to this trace's value.
     */
    default double[][] jacobian(int trace, double[] delaysS, ParameterValues p) {
        throw new UnsupportedOperationException("this model has no analytic Jacobian");
    }
}
