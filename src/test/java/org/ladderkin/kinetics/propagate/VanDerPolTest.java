package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A strongly nonlinear stiff problem: Van der Pol with ε = 1e-6 over one relaxation cycle. */
class VanDerPolTest {

    @Test
    @CheckedAgainst(source = "from memory: 'vdpol' problem of the Bari/CWI test set for IVP solvers (Mazzia & "
            + "Magherini), eps = 1e-6, y(0) = (2, 0), reference y(2) = (1.706167732170483, -0.8928097010247975)",
            kind = CheckedAgainst.Kind.FROM_MEMORY)
    void stiffVanDerPolMatchesRememberedReferenceAtT2() {
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-8, 1e-8))
                .integrate(StiffFixtures.vanDerPol(1e-6), 0, new double[] {2, 0}, new double[] {2});
        Reference.checkRelative("Van der Pol y1(2), eps = 1e-6", r.states()[0][0], 1.706167732170483, 1e-8);
        Reference.checkRelative("Van der Pol y2(2), eps = 1e-6", r.states()[0][1], -0.8928097010247975, 1e-8);
        // the fast jumps are ~1e6 times quicker than the slow branches; an explicit method would need ~1e6 steps
        assertThat(r.acceptedSteps()).isLessThan(10_000);
    }
}
