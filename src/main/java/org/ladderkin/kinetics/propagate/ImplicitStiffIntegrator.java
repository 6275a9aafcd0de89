package org.ladderkin.kinetics.propagate;

import java.util.Arrays;

/**
 * Adaptive implicit integrator for stiff systems: the 3-stage Radau IIA method of order 5 (L-stable, stiffly
 * accurate) with simplified Newton iterations, embedded error estimate and step size control after Hairer &amp;
 * Wanner, Solving Ordinary Differential Equations II, Sect. IV.8. Hipparchus ships only explicit integrators; this
 * one is written on Hipparchus linear algebra.
 * <p>
 * The integrator steps exactly onto every requested output time (no interpolation), so each reported state carries
 * the full order-5 accuracy. Linear systems ({@link StiffSystem#isLinear()}) are solved with one exact Newton
 * iteration per step. Instances are immutable and may be shared between threads; each call works on its own state.
 * <p>
 * The {@link Tolerances} bound the embedded error estimate of each step literally, in the max-norm over components.
 * That estimate belongs to an order-3 companion of the order-5 method, so the error actually made is usually well
 * below the tolerance (in the tests, 1e-5 to 1e-2 of it at tight tolerances). Hairer's radau5 code instead rescales
 * the tolerances internally; we keep them literal so that what the caller asks for is what the estimate obeys.
 */
public final class ImplicitStiffIntegrator {

    /** Steps (accepted plus rejected) after which the integration gives up. */
    static final int MAX_STEPS = 5_000_000;

    /** Newton iterations allowed in fixed-step mode, where the step cannot be shortened when Newton is slow. */
    private static final int FIXED_STEP_NEWTON = 100;

    /** A step that would end within this fraction of the step beyond an output time is stretched onto it. */
    private static final double STRETCH = 0.1;

    private final Tolerances tolerances;

    /** @param tolerances local error tolerances, applied to each component */
    public ImplicitStiffIntegrator(Tolerances tolerances) {
        if (tolerances == null) {
            throw new IllegalArgumentException("tolerances must not be null");
        }
        this.tolerances = tolerances;
    }

    /** The tolerances this integrator was built with. */
    public Tolerances tolerances() {
        return tolerances;
    }

    /**
     * Integrates from t0 (state y0) and returns the states at each of outputTimesS (ascending, all &ge; t0).
     *
     * @param system       the system; its dimension must equal y0.length
     * @param t0           initial time (s)
     * @param y0           initial state (finite; not modified)
     * @param outputTimesS output times (s), non-decreasing, each &ge; t0; an output time equal to t0 returns y0
     * @throws IllegalArgumentException  for inconsistent or non-finite input
     * @throws StiffIntegrationException when the step size underflows, the step budget runs out or the system
     *                                   produces non-finite values
     */
    public IntegrationResult integrate(StiffSystem system, double t0, double[] y0, double[] outputTimesS) {
        InputChecks.check(system, t0, y0, outputTimesS);
        int n = y0.length;
        double[][] states = new double[outputTimesS.length][];
        int next = 0;
        while (next < outputTimesS.length && outputTimesS[next] == t0) {
            states[next++] = y0.clone();
        }
        RadauStepper stepper = new RadauStepper(system, tolerances);
        StepSizeController controller = new StepSizeController(RadauStepper.MAX_NEWTON);
        double t = t0;
        double[] y = y0.clone();
        stepper.setBasePoint(t, y);
        if (next == outputTimesS.length) {
            return new IntegrationResult(states, 0, 0, 0, 0);
        }
        double h = StepSizeController.initialStep(system, t0, y0, stepper.baseDerivative(), new ErrorScale(tolerances),
                outputTimesS[outputTimesS.length - 1] - t0);
        int accepted = 0;
        int rejected = 0;
        boolean first = true;
        boolean lastRejected = false;
        while (next < outputTimesS.length) {
            double tOut = outputTimesS[next];
            double hTry = h;
            boolean landing = t + (1 + STRETCH) * h >= tOut;
            if (landing) {
                hTry = tOut - t;
            } else if (h <= minimumStep(t)) {
                throw new StiffIntegrationException("step size underflow (h = " + h + " s, last failure: "
                        + stepper.lastFailure() + ")", t, y);
            }
            if (accepted + rejected >= MAX_STEPS) {
                throw new StiffIntegrationException("no progress after " + MAX_STEPS + " steps (h = " + h + " s)", t, y);
            }
            RadauStepper.Attempt attempt = stepper.attempt(hTry, first || lastRejected);
            if (!attempt.converged()) {
                rejected++;
                lastRejected = true;
                stepper.reject();
                h = hTry * attempt.hFactor();
                continue;
            }
            double factor = controller.factor(attempt.errorNorm(), attempt.newtonIterations());
            if (attempt.errorNorm() <= 1) {
                stepper.accept(hTry);
                t = landing ? tOut : t + hTry;
                System.arraycopy(stepper.endState(), 0, y, 0, n);
                if (!RadauStepper.allFinite(y)) {
                    throw new StiffIntegrationException("non-finite state after a step", t, y);
                }
                stepper.setBasePoint(t, y);
                accepted++;
                while (next < outputTimesS.length && outputTimesS[next] <= t) {
                    states[next++] = y.clone();
                }
                h = nextStep(h, hTry, factor, landing, lastRejected);
                first = false;
                lastRejected = false;
            } else {
                rejected++;
                stepper.reject();
                // a first step that fails the error test was a poor guess: cut harder (as radau5 does)
                h = hTry * (first ? 0.1 : factor);
                lastRejected = true;
            }
        }
        return new IntegrationResult(states, accepted, rejected, stepper.jacobianEvaluations(),
                stepper.factorizations());
    }

    /**
     * Integrates with a fixed number of equal steps, without error control; used to measure the order of the
     * method. Throws when Newton fails.
     */
    double[] integrateFixedSteps(StiffSystem system, double t0, double[] y0, double t1, int steps) {
        InputChecks.check(system, t0, y0, new double[] {t1});
        RadauStepper stepper = new RadauStepper(system, tolerances, FIXED_STEP_NEWTON);
        double h = (t1 - t0) / steps;
        double[] y = y0.clone();
        stepper.setBasePoint(t0, y);
        for (int i = 0; i < steps; i++) {
            RadauStepper.Attempt attempt = stepper.attempt(h, false);
            if (!attempt.converged()) {
                throw new StiffIntegrationException("fixed step " + h + " s: " + stepper.lastFailure(), t0 + i * h, y);
            }
            stepper.accept(h);
            System.arraycopy(stepper.endState(), 0, y, 0, y.length);
            stepper.setBasePoint(t0 + (i + 1) * h, y);
        }
        return y;
    }

    /** Local error estimate of one step of size h from (t0, y0), as a scaled max-norm (used by tests). */
    double errorNormOfOneStep(StiffSystem system, double t0, double[] y0, double h) {
        RadauStepper stepper = new RadauStepper(system, tolerances);
        stepper.setBasePoint(t0, y0);
        return stepper.attempt(h, false).errorNorm();
    }

    private static double nextStep(double hProposed, double hUsed, double factor, boolean landing,
                                   boolean afterRejection) {
        double hNew = hUsed * factor;
        if (afterRejection) {
            hNew = Math.min(hNew, hUsed);
        }
        if (landing && factor >= 1) {
            // a step cut short to meet an output time says nothing against the longer step proposed before
            hNew = Math.max(hNew, hProposed);
        }
        double ratio = hNew / hUsed;
        if (!landing && ratio >= 1 && ratio <= StepSizeController.HOLD_UPPER) {
            hNew = hUsed; // keep h so the factored Newton matrix can be reused
        }
        return hNew;
    }

    private static double minimumStep(double t) {
        return 16 * Math.ulp(Math.max(Math.abs(t), Double.MIN_NORMAL));
    }

    /** Argument checks with messages that name the offending value. */
    private static final class InputChecks {

        static void check(StiffSystem system, double t0, double[] y0, double[] outputTimesS) {
            if (system == null || y0 == null || outputTimesS == null) {
                throw new IllegalArgumentException("system, y0 and outputTimesS must not be null");
            }
            if (!Double.isFinite(t0)) {
                throw new IllegalArgumentException("t0 must be finite, was " + t0 + " s");
            }
            if (system.dimension() != y0.length) {
                throw new IllegalArgumentException("dimension mismatch: system has " + system.dimension()
                        + " unknowns but y0 has " + y0.length + " components");
            }
            if (y0.length == 0) {
                throw new IllegalArgumentException("the system must have at least one unknown");
            }
            for (int i = 0; i < y0.length; i++) {
                if (!Double.isFinite(y0[i])) {
                    throw new IllegalArgumentException("y0[" + i + "] must be finite, was " + y0[i]
                            + " (y0 = " + Arrays.toString(y0) + ")");
                }
            }
            double previous = t0;
            for (int i = 0; i < outputTimesS.length; i++) {
                double ti = outputTimesS[i];
                if (!Double.isFinite(ti)) {
                    throw new IllegalArgumentException("outputTimesS[" + i + "] must be finite, was " + ti + " s");
                }
                if (ti < t0) {
                    throw new IllegalArgumentException("outputTimesS[" + i + "] = " + ti + " s is before t0 = " + t0
                            + " s");
                }
                if (ti < previous) {
                    throw new IllegalArgumentException("output times must be ascending: outputTimesS[" + i + "] = " + ti
                            + " s < outputTimesS[" + (i - 1) + "] = " + previous + " s");
                }
                previous = ti;
            }
        }
    }
}
