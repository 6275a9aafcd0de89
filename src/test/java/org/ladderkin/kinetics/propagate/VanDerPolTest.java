package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A strongly nonlinear stiff problem: Van der Pol with ε = 1e-6 over one relaxation cycle. */
class VanDerPolTest {

    @Test
    @CheckedAgainst(source = "Test Set for IVP Solvers (Mazzia & Magherini, Bari), problem file vdpol.f (revision 2006), "
            + "read in a stored copy: y1' = y2, y2' = ((1 − y1²)y2 − y1)/1e-6, y(0) = (2, 0), subroutine solut y(2) = "
            + "(0.1706167732170483e1, -0.8928097010247975) (RADAU at rtol = atol = 1.1e-18)",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void stiffVanDerPolMatchesRememberedReferenceAtT2() {
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-8, 1e-8))
                .integrate(StiffFixtures.vanDerPol(1e-6), 0, new double[] {2, 0}, new double[] {2});
        Reference.checkRelative("Van der Pol y1(2), eps = 1e-6", r.states()[0][0], 1.706167732170483, 1e-8);
        Reference.checkRelative("Van der Pol y2(2), eps = 1e-6", r.states()[0][1], -0.8928097010247975, 1e-8);
        // the fast jumps are ~1e6 times quicker than the slow branches; an explicit method would need ~1e6 steps
        assertThat(r.acceptedSteps()).isLessThan(10_000);
    }
}
