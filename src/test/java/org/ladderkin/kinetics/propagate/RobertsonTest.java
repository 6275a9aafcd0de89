package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Robertson's chemical kinetics, y1' = −0.04y1 + 1e4·y2y3, y2' = 0.04y1 − 1e4·y2y3 − 3e7·y2², y3' = 3e7·y2², y(0) =
 * (1, 0, 0): the classic stiff test (Hairer &amp; Wanner II, Sect. IV.1).
 */
class RobertsonTest {

    private static final double[] Y0 = {1, 0, 0};
    private static final ImplicitStiffIntegrator INTEGRATOR = new ImplicitStiffIntegrator(new Tolerances(1e-20, 1e-8));

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 DormandPrince853Integrator, absTol 1e-14, relTol 1e-13",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void agreesWithDormandPrince853UpToT40() {
        double[] times = {0.4, 4.0, 40.0};
        double[][] ref = HipparchusReference.dormandPrince853(StiffFixtures.robertson(), 0, Y0, times, 1e-14, 1e-13);
        IntegrationResult r = INTEGRATOR.integrate(StiffFixtures.robertson(), 0, Y0, times);
        for (int i = 0; i < times.length; i++) {
            for (int c = 0; c < 3; c++) {
                Reference.checkRelative("Robertson y" + (c + 1) + "(" + times[i] + ")", r.states()[i][c], ref[i][c], 1e-7);
            }
        }
        // the explicit reference is stability-bound; the implicit integrator is not
        assertThat(r.acceptedSteps()).isLessThan(2000);
    }

    @Test
    @CheckedAgainst(source = "Robertson at t = 40 as a public project's Rosenbrock-integrator test (ChemistryReactorTest, read "
            + "in a stored copy) quotes the reference solution of Hairer & Wanner, Solving ODEs II: y = (0.7158270687193, 0.9185534764529e-5, 0.2841637457462) "
            + "(the book is not stored here)", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void matchesTheQuotedReferenceAtT40() {
        double[] y = INTEGRATOR.integrate(StiffFixtures.robertson(), 0, Y0, new double[] {40.0}).states()[0];
        Reference.checkRelative("Robertson y1(40)", y[0], 0.7158270687193, 1e-7);
        Reference.checkRelative("Robertson y2(40)", y[1], 0.9185534764529e-5, 1e-6);
        Reference.checkRelative("Robertson y3(40)", y[2], 0.2841637457462, 1e-6);
    }

    @Test
    @CheckedAgainst(source = "Test Set for IVP Solvers (Mazzia & Magherini, Bari), problem file rober.f, subroutine solut "
            + "(reference computed with RADAU at rtol = atol = 1.1e-18), read in a stored copy: y(1e11) = "
            + "(0.2083340149701255e-7, 0.8333360770334713e-13, 0.9999999791665050)", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void reachesTenToTheElevenSecondsAndMatchesRememberedValues() {
        double[] times = {1e5, 1e11};
        IntegrationResult r = INTEGRATOR.integrate(StiffFixtures.robertson(), 0, Y0, times);
        double[] y = r.states()[1];
        Reference.checkRelative("Robertson y1(1e11)", y[0], 0.2083340149701255e-7, 1e-5);
        Reference.checkRelative("Robertson y2(1e11)", y[1], 0.8333360770334713e-13, 1e-5);
        Reference.checkRelative("Robertson y3(1e11)", y[2], 0.9999999791665050, 1e-12);
        // stiff integrators cross 11 decades in a few hundred steps
        assertThat(r.acceptedSteps()).isLessThan(3000);
    }

    @Test
    @CheckedAgainst(source = "derived: y1' + y2' + y3' = 0, so y1 + y2 + y3 = 1 (Runge-Kutta methods keep linear "
            + "invariants)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void conservesTotalMassOverElevenDecades() {
        double[] times = {1e-3, 1.0, 1e3, 1e5, 1e8, 1e11};
        IntegrationResult r = INTEGRATOR.integrate(StiffFixtures.robertson(), 0, Y0, times);
        double worst = 0;
        for (double[] y : r.states()) {
            worst = Math.max(worst, Math.abs(y[0] + y[1] + y[2] - 1));
            for (double v : y) {
                assertThat(v).isGreaterThan(-1e-12);
            }
        }
        Reference.check("max |y1 + y2 + y3 - 1| at 1e-3..1e11", worst, 0.0, 1e-12);
    }
}
