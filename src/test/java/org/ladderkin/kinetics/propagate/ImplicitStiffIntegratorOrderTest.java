package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Measured order of convergence: global error against step size (fixed steps) and against tolerance. */
class ImplicitStiffIntegratorOrderTest {

    /** Least-squares slope of log(err) against log(x). */
    private static double slope(double[] x, double[] err) {
        int n = x.length;
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += Math.log(x[i]) / n;
            my += Math.log(err[i]) / n;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < n; i++) {
            double dx = Math.log(x[i]) - mx;
            sxy += dx * (Math.log(err[i]) - my);
            sxx += dx * dx;
        }
        return sxy / sxx;
    }

    private static final ImplicitStiffIntegrator TIGHT_NEWTON = new ImplicitStiffIntegrator(new Tolerances(1e-15, 1e-15));

    @Test
    @CheckedAgainst(source = "derived: Radau IIA with 3 stages has classical order 2s - 1 = 5 (Hairer & Wanner II, "
            + "Sect. IV.5); global error ~ h^5 against y = tan t of the Riccati equation y' = 1 + y^2",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void fixedStepErrorFallsAsStepToTheFifthOnANonlinearProblem() {
        int[] steps = {8, 16, 32, 64};
        double[] h = new double[steps.length];
        double[] err = new double[steps.length];
        for (int i = 0; i < steps.length; i++) {
            h[i] = 1.2 / steps[i];
            double y = TIGHT_NEWTON.integrateFixedSteps(StiffFixtures.riccati(), 0, new double[] {0}, 1.2,
                    steps[i])[0];
            err[i] = Math.abs(y - Math.tan(1.2));
        }
        assertThat(err[steps.length - 1]).isGreaterThan(1e-13); // still above round-off
        Reference.check("measured order (slope of log err vs log h), y' = 1 + y^2", slope(h, err), 5.0, 0.3);
    }

    @Test
    @CheckedAgainst(source = "derived: classical order 5 on a time-dependent linear problem "
            + "y' = -(a + b cos wt) y, y = exp(-(a t + (b/w) sin wt))", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void fixedStepErrorFallsAsStepToTheFifthOnATimeDependentProblem() {
        int[] steps = {8, 16, 32, 64};
        double[] h = new double[steps.length];
        double[] errLinear = new double[steps.length];
        double[] errNewton = new double[steps.length];
        double exact = StiffFixtures.oscillatingDecayExact(0.5, 2.0, 3.0, 4.0);
        for (int i = 0; i < steps.length; i++) {
            h[i] = 4.0 / steps[i];
            errLinear[i] = Math.abs(TIGHT_NEWTON.integrateFixedSteps(StiffFixtures.oscillatingDecay(0.5, 2.0, 3.0, true),
                    0, new double[] {1}, 4.0, steps[i])[0] - exact);
            errNewton[i] = Math.abs(TIGHT_NEWTON.integrateFixedSteps(StiffFixtures.oscillatingDecay(0.5, 2.0, 3.0, false),
                    0, new double[] {1}, 4.0, steps[i])[0] - exact);
        }
        Reference.check("measured order, linear short-cut path", slope(h, errLinear), 5.0, 0.3);
        Reference.check("measured order, simplified Newton path", slope(h, errNewton), 5.0, 0.3);
    }

    @Test
    @CheckedAgainst(source = "derived: the embedded estimate is the difference to an order-3 method, so one step's "
            + "estimate scales as h^4 (Hairer & Wanner II, Sect. IV.8)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void localErrorEstimateScalesAsStepToTheFourth() {
        double[] h = {0.2, 0.1, 0.05, 0.025};
        double[] est = new double[h.length];
        ImplicitStiffIntegrator unitScale = new ImplicitStiffIntegrator(new Tolerances(1.0, 0.0));
        for (int i = 0; i < h.length; i++) {
            est[i] = unitScale.errorNormOfOneStep(StiffFixtures.inverseSquare(), 0, new double[] {1}, h[i]);
        }
        Reference.check("slope of log(error estimate) vs log h", slope(h, est), 4.0, 0.3);
    }

    @Test
    @CheckedAgainst(source = "derived: with the step set by an h^4 local estimate, h ~ tol^(1/4) and the order-5 global "
            + "error ~ N^-5 in the number N of steps", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void adaptiveErrorFallsAsStepCountToTheMinusFifth() {
        double[] tol = {1e-6, 1e-7, 1e-8, 1e-9, 1e-10, 1e-11};
        double[] stepsTaken = new double[tol.length];
        double[] err = new double[tol.length];
        for (int i = 0; i < tol.length; i++) {
            IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(tol[i], tol[i]))
                    .integrate(StiffFixtures.oscillatingDecay(0.5, 2.0, 3.0, false), 0, new double[] {1},
                            new double[] {20.0});
            stepsTaken[i] = r.acceptedSteps();
            err[i] = Math.abs(r.states()[0][0] - StiffFixtures.oscillatingDecayExact(0.5, 2.0, 3.0, 20.0));
        }
        Reference.check("slope of log(global error) vs log(accepted steps)", slope(stepsTaken, err), -5.0, 0.6);
    }
}
