package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Closed-form fixtures (as Hipparchus' TestProblem classes): decay, a stiff two-level chain, time-dependent decay. */
class ImplicitStiffIntegratorClosedFormTest {

    private static double[] logTimes(double fromS, double toS, int count) {
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = fromS * Math.pow(toS / fromS, i / (double) (count - 1));
        }
        return t;
    }

    @Test
    @CheckedAgainst(source = "derived: y' = -k y has y(t) = y0 exp(-k t)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void exponentialDecayMatchesClosedForm() {
        double k = 2.0e9;
        double[] times = logTimes(1e-12, 5e-9, 25);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-12, 1e-10))
                .integrate(StiffFixtures.decay(k), 0.0, new double[] {1.0}, times);
        double maxErr = 0;
        for (int i = 0; i < times.length; i++) {
            maxErr = Math.max(maxErr, Math.abs(r.states()[i][0] - Math.exp(-k * times[i])));
        }
        Reference.check("y(1 ns) for k = 2/ns", r.states()[18][0], Math.exp(-k * times[18]), 1e-9);
        Reference.check("max |y - exp(-kt)| over 25 log-spaced times 1 ps..5 ns", maxErr, 0.0, 1e-9);
        assertThat(r.acceptedSteps()).isPositive();
    }

    @Test
    @CheckedAgainst(source = "derived: chain 1->2->0, y2 = k1/(k2-k1)(exp(-k1 t) - exp(-k2 t))",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void stiffTwoLevelChainMatchesClosedForm() {
        double k1 = 1.0;
        double k2 = 1.0e4;
        double[] times = {1e-5, 1e-4, 1e-3, 1e-2, 0.1, 1.0, 5.0, 10.0};
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-12, 1e-10))
                .integrate(StiffFixtures.chain(k1, k2), 0.0, new double[] {1.0, 0.0}, times);
        for (int i : new int[] {1, 3, 5, 7}) {
            double[] exact = StiffFixtures.chainExact(k1, k2, times[i]);
            Reference.check("chain y1(" + times[i] + " s)", r.states()[i][0], exact[0], 1e-9);
            Reference.check("chain y2(" + times[i] + " s)", r.states()[i][1], exact[1], 1e-12);
        }
        // explicit methods are stability-bound to h < ~3/k2 here, i.e. > 3e4 steps over 10 s
        assertThat(r.acceptedSteps()).isLessThan(3000);
    }

    @Test
    @CheckedAgainst(source = "derived: y' = -(a + b cos wt) y has y = exp(-(a t + (b/w) sin wt))",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void timeDependentLinearDecayMatchesClosedFormOnBothPaths() {
        double a = 0.5;
        double b = 0.4;
        double w = 3.0;
        double[] times = {0.5, 1.0, 2.0, 4.0, 8.0};
        ImplicitStiffIntegrator integrator = new ImplicitStiffIntegrator(new Tolerances(1e-12, 1e-10));
        IntegrationResult linear = integrator.integrate(StiffFixtures.oscillatingDecay(a, b, w, true), 0.0,
                new double[] {1.0}, times);
        IntegrationResult newton = integrator.integrate(StiffFixtures.oscillatingDecay(a, b, w, false), 0.0,
                new double[] {1.0}, times);
        for (int i = 0; i < times.length; i += 2) {
            double exact = StiffFixtures.oscillatingDecayExact(a, b, w, times[i]);
            Reference.checkRelative("linear path y(" + times[i] + ")", linear.states()[i][0], exact, 1e-8);
            Reference.checkRelative("Newton path y(" + times[i] + ")", newton.states()[i][0], exact, 1e-8);
        }
    }

    @Test
    @CheckedAgainst(source = "derived: y' = -y^2, y(0) = 1 has y = 1/(1 + t)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void nonlinearInverseSquareMatchesClosedForm() {
        double[] times = {1.0, 10.0, 100.0};
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-12, 1e-10))
                .integrate(StiffFixtures.inverseSquare(), 0.0, new double[] {1.0}, times);
        for (int i = 0; i < times.length; i++) {
            Reference.checkRelative("y(" + times[i] + ") of y' = -y^2", r.states()[i][0], 1 / (1 + times[i]), 1e-8);
        }
    }

    @Test
    void outputAtInitialTimeReturnsInitialState() {
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-10, 1e-10))
                .integrate(StiffFixtures.decay(1.0), 2.0, new double[] {3.0}, new double[] {2.0, 2.0, 3.0});
        assertThat(r.states()[0]).containsExactly(3.0);
        assertThat(r.states()[1]).containsExactly(3.0);
        assertThat(r.states()[2][0]).isCloseTo(3 * Math.exp(-1), org.assertj.core.data.Offset.offset(1e-8));
    }

    @Test
    void factorizationsAndJacobiansAreReusedWhileTheStepIsHeld() {
        // constant generator, one distant output: the controller holds h within [1, 1.2]·h so factorizations repeat
        double[] y0 = {1.0, 0.0};
        double[] out = {30.0};
        Tolerances tol = new Tolerances(1e-10, 1e-8);
        IntegrationResult linear = new ImplicitStiffIntegrator(tol).integrate(StiffFixtures.chain(1.0, 1e3), 0.0, y0, out);
        IntegrationResult newton = new ImplicitStiffIntegrator(tol)
                .integrate(StiffFixtures.asNonlinear(StiffFixtures.chain(1.0, 1e3)), 0.0, y0, out);
        // the split form counts two factorizations (n×n and 2n×2n) per Newton matrix
        assertThat(linear.factorizations()).isLessThan(linear.acceptedSteps() / 2);
        assertThat(newton.factorizations()).isLessThan(newton.acceptedSteps() / 2);
        // simplified Newton contracts at once on a linear problem, so its Jacobian is kept from step to step
        assertThat(newton.jacobianEvaluations()).isLessThanOrEqualTo(3);
        assertThat(linear.states()[0][1]).isCloseTo(newton.states()[0][1], org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void emptyOutputListGivesEmptyResult() {
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-10, 1e-10))
                .integrate(StiffFixtures.decay(1.0), 0.0, new double[] {1.0}, new double[0]);
        assertThat(r.states()).isEmpty();
        assertThat(r.acceptedSteps()).isZero();
    }
}
