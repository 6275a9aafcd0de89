package org.ladderkin.kinetics.propagate;

import java.util.Arrays;

/**
 * The implicit integrator could not continue: step size underflow, too many steps, or non-finite values. The
 * message and the accessors name the time and the last accepted state.
 */
public final class StiffIntegrationException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** How many state components the message shows before eliding the rest. */
    private static final int SHOWN_COMPONENTS = 12;

    private final double timeS;
    private final double[] state;

    StiffIntegrationException(String problem, double timeS, double[] state) {
        super(problem + " at t = " + timeS + " s; state " + describe(state));
        this.timeS = timeS;
        this.state = state.clone();
    }

    /** Time of the last accepted state (s). */
    public double timeS() {
        return timeS;
    }

    /** The last accepted state (a copy). */
    public double[] state() {
        return state.clone();
    }

    private static String describe(double[] y) {
        if (y.length <= SHOWN_COMPONENTS) {
            return Arrays.toString(y);
        }
        String head = Arrays.toString(Arrays.copyOf(y, SHOWN_COMPONENTS));
        return head.substring(0, head.length() - 1) + ", ... (" + y.length + " components)]";
    }
}
