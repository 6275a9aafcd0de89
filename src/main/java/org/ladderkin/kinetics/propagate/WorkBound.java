package org.ladderkin.kinetics.propagate;

import java.util.Locale;

/**
 * The engine's work bounds, checked before each expensive step so that no input can make it run for minutes. Work is
 * counted in floating-point operations (multiply-adds) estimated from the ladder size, the delays, the pulses and the
 * propagator's structure; this machine class (2 cores, client compiler) does about 1e9 of them per second.
 *
 * <p>Why a count of operations and not a timer: the estimate is known before the work starts, so a refusal costs
 * nothing and the same input is refused on every machine (a timer would make results depend on the load).
 */
public final class WorkBound {

    /** Most states a ladder may have: the generator and the propagator are dense n×n (n = 1500: 18 MB each). */
    public static final int MAX_STATES = 1500;
    /** Most operations one engine step may need (about ten seconds here); above it the step is refused. */
    public static final double MAX_OPERATIONS = 1.2e10;
    /** Operations above which a command warns that it will take a while (a second or two here). */
    public static final double WARN_OPERATIONS = 2e9;

    private WorkBound() {
    }

    /**
     * Refuses a step whose estimated operations exceed {@link #MAX_OPERATIONS}.
     *
     * @param operations estimated multiply-adds
     * @param what the step and the inputs that made it large, e.g. "the delay grid (1000 delays × a 250-state block)"
     * @param remedy what the caller may lower, e.g. "fewer delays or a lower ⟨N⟩"
     */
    public static void require(double operations, String what, String remedy) {
        if (!(operations <= MAX_OPERATIONS)) {
            throw new WorkLimitException(what + " needs about " + sci(operations) + " operations, more than the "
                    + sci(MAX_OPERATIONS) + " the engine allows per step; use " + remedy);
        }
    }

    /** Refuses a ladder of more than {@link #MAX_STATES} states; {@code why} says where its size comes from. */
    public static void requireStates(int states, String why) {
        if (states > MAX_STATES) {
            throw new WorkLimitException("the ladder needs " + states + " states (" + why + "), more than the "
                    + MAX_STATES + " the engine supports; lower ⟨N⟩ (the ladder's height follows the strongest pulse)"
                    + " or the model's Nmax");
        }
    }

    /**
     * Stops the step when its thread has been interrupted (a desktop prediction past its time limit, a cancelled fit):
     * the heavy loops of the engine call this once per column, time or batch of steps, which is cheap beside them.
     */
    public static void stopIfInterrupted() {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException("cancelled: the engine step's thread was interrupted");
        }
    }

    /** 3.1e10 style, three significant digits at most (so an estimate just above the bound never reads as equal). */
    public static String sci(double x) {
        String t = String.format(Locale.ROOT, "%.2e", x);
        int e = t.indexOf('e');
        String mantissa = t.substring(0, e).replaceAll("0+$", "").replaceAll("\\.$", ".0");
        return mantissa + t.substring(e).replace("e+0", "e").replace("e+", "e").replace("e-0", "e-");
    }
}
