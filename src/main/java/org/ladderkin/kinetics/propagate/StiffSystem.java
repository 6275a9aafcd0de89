package org.ladderkin.kinetics.propagate;

/**
 * A first-order system dy/dt = f(t, y) with its Jacobian ∂f/∂y, as the implicit integrator needs it.
 * Model parameters are outside this contract; implementations are immutable or used by one thread.
 */
public interface StiffSystem {

    /** Number of unknowns. */
    int dimension();

    /** Writes f(t, y) into {@code dydt}. */
    void derivatives(double t, double[] y, double[] dydt);

    /** Writes the dense Jacobian ∂f_i/∂y_j into {@code dfdy[i][j]}. */
    void jacobian(double t, double[] y, double[][] dfdy);

    /**
     * Whether ∂f/∂y does not depend on y (a linear system, possibly time-dependent). Lets the integrator skip
     * Newton iterations beyond the first.
     */
    default boolean isLinear() {
        return false;
    }
}
