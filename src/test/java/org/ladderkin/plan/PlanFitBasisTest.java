package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RateLaw;

/** The fit starts from exactly the plan's ladder, period and excitation scales. */
class PlanFitBasisTest {

    static final PlanInputs DEMO = PlanCodec.read(java.nio.file.Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json"));

    @Test
    void theFitLadderHasThePlansRateLawsChargesAndDegeneracy() {
        CampaignPlan plan = Planner.plan(DEMO, Planner.Progress.NONE, false);
        PlanFitBasis basis = PlanFitBasis.of(DEMO);
        int g = (int) Math.round(DEMO.sample().material().electronDegeneracy().value());
        KineticModel planned = plan.model().kineticModel(g);
        KineticModel fitted = basis.base().toModel();
        Set<RateLaw> plannedLaws = new HashSet<>(planned.processes());
        if (planned.charges().size() == 1) {
            // a model without excess charges has nothing to neutralise; the plan lists the law anyway
            plannedLaws.removeIf(l -> l instanceof Neutralisation);
        }
        assertThat(new HashSet<>(fitted.processes())).isEqualTo(plannedLaws);
        assertThat(fitted.charges()).isEqualTo(planned.charges());
        assertThat(fitted.degeneracy()).isEqualTo(planned.degeneracy());
        assertThat(fitted.hotResolved()).isFalse();
    }

    @Test
    void periodWavelengthAndScalesAreThePlansChoices() {
        CampaignPlan plan = Planner.plan(DEMO, Planner.Progress.NONE, false);
        PlanFitBasis basis = PlanFitBasis.of(DEMO);
        assertThat(basis.periodS()).isEqualTo(1 / plan.chosenRate().repetitionRateHz());
        assertThat(basis.pumpWavelengthM()).isEqualTo(plan.chosenWavelength().wavelengthM());
        assertThat(basis.crossSectionM2()).isEqualTo(plan.chosenWavelength().crossSectionM2());
        for (var f : plan.fluences()) {
            assertThat(basis.occupancyPerJ() * f.pulseEnergyJ() / f.nProbeAveraged())
                    .isCloseTo(1, org.assertj.core.data.Offset.offset(1e-9));
        }
    }
}
