package org.ladderkin.kinetics.propagate;

/**
 * Local error tolerances of the implicit integrator: the error estimate of each component must satisfy
 * |err_i| ≤ absolute + relative·|y_i|. As with any local control, these bound each step's error, not the global one.
 * {@link ImplicitStiffIntegrator} applies them to its embedded (order-3) estimate, so its actual error is usually
 * much smaller than asked.
 *
 * @param absolute absolute tolerance, in the units of y (a population: probability per dot)
 * @param relative relative tolerance
 */
public record Tolerances(double absolute, double relative) {

    public Tolerances {
        if (!(absolute > 0) || !(relative >= 0) || !Double.isFinite(absolute) || !Double.isFinite(relative)) {
            throw new IllegalArgumentException("tolerances must be finite with absolute > 0 and relative >= 0, were "
                    + absolute + " and " + relative);
        }
    }

    /**
     * Tolerances for populations (probabilities per dot) that aim at an error of about {@code populationError}
     * in each occupation probability.
     */
    public static Tolerances forPopulationError(double populationError) {
        return new Tolerances(populationError, populationError);
    }
}
