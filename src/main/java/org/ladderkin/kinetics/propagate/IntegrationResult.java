package org.ladderkin.kinetics.propagate;

/**
 * What {@link ImplicitStiffIntegrator#integrate} returns.
 *
 * @param states              states[i] is the state at the i-th requested output time
 * @param acceptedSteps       accepted steps
 * @param rejectedSteps       steps rejected by the error test or by Newton failure
 * @param jacobianEvaluations calls of {@link StiffSystem#jacobian}
 * @param factorizations      LU factorizations (Newton matrices and error filters)
 */
public record IntegrationResult(double[][] states, int acceptedSteps, int rejectedSteps, int jacobianEvaluations,
                                int factorizations) {

    public IntegrationResult {
        if (states == null) {
            throw new IllegalArgumentException("states must not be null");
        }
        if (acceptedSteps < 0 || rejectedSteps < 0 || jacobianEvaluations < 0 || factorizations < 0) {
            throw new IllegalArgumentException("counts must be >= 0, were accepted " + acceptedSteps + ", rejected "
                    + rejectedSteps + ", Jacobians " + jacobianEvaluations + ", factorizations " + factorizations);
        }
    }
}
