package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Tolerance sweep in the manner of Hipparchus' EmbeddedRungeKuttaIntegratorAbstractTest.doTestIncreasingTolerance:
 * from 1e-12 to 1e-3 the global error stays below a small factor times the tolerance, and the work falls as the
 * tolerance loosens.
 */
class ImplicitStiffIntegratorToleranceTest {

    /** Global error allowed, in units of the tolerance (local control does not bound the global error exactly). */
    private static final double FACTOR = 2.0;

    @Test
    @CheckedAgainst(source = "derived: stiff chain 1->2->0 with k1 = 1/s, k2 = 1e3/s, y2 = k1/(k2-k1)(exp(-k1 t) - "
            + "exp(-k2 t)); error <= 2 x tolerance for tolerances 1e-12..1e-3", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void stiffChainErrorStaysBelowToleranceAndWorkFalls() {
        sweep(StiffFixtures.chain(1.0, 1e3), new double[] {1.0, 0.0}, 3.0,
                StiffFixtures.chainExact(1.0, 1e3, 3.0), "stiff chain");
    }

    @Test
    @CheckedAgainst(source = "derived: y' = 1 + y^2, y(0) = 0 has y = tan t; error at t = 1.2 <= 2 x tolerance "
            + "(relative to |y|) for tolerances 1e-12..1e-3", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void nonlinearRiccatiErrorStaysBelowToleranceAndWorkFalls() {
        sweep(StiffFixtures.riccati(), new double[] {0.0}, 1.2, new double[] {Math.tan(1.2)}, "Riccati");
    }

    private static void sweep(StiffSystem system, double[] y0, double tEnd, double[] exact, String name) {
        int previousWork = Integer.MAX_VALUE;
        int firstWork = 0;
        int lastWork = 0;
        for (int e = -12; e <= -3; e++) {
            double tol = Math.pow(10, e);
            IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(tol, tol))
                    .integrate(system, 0.0, y0, new double[] {tEnd});
            double worst = 0;
            for (int i = 0; i < exact.length; i++) {
                worst = Math.max(worst, Math.abs(r.states()[0][i] - exact[i]) / (tol * (1 + Math.abs(exact[i]))));
            }
            Reference.check(name + ": global error / (tol·(1+|y|)) at tol 1e" + e, worst, 0.0, FACTOR);
            int work = r.acceptedSteps() + r.rejectedSteps();
            assertThat(work).as("steps at tol 1e%d (previous %d)", e, previousWork).isLessThanOrEqualTo(previousWork);
            previousWork = work;
            if (e == -12) {
                firstWork = work;
            }
            lastWork = work;
        }
        assertThat(lastWork * 5).as("work at 1e-3 versus 1e-12").isLessThan(firstWork);
    }
}
