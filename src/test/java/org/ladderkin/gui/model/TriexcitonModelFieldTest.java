package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.process.TriexcitonAugerProcess;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.plan.ModelAssumptions;
import org.ladderkin.plan.PlanFitBasis;
import org.ladderkin.plan.PlanInputs;

/** The planner's model form gets the triexciton lifetime from the process registry, and the plan then predicts with it. */
class TriexcitonModelFieldTest {

    private static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");

    @Test
    void theModelFormOffersTheRegistryField() {
        FieldSpec f = PlanForms.MODEL.stream().filter(s -> s.path().toString().equals("model.triexcitonLifetime"))
                .findFirst().orElseThrow();
        assertThat(f.label()).isEqualTo(TriexcitonAugerProcess.LIFETIME.label());
        assertThat(f.optional()).isTrue();
        assertThat(f.check("5 ps")).isEmpty();
        assertThat(f.check("5 nJ")).isNotEmpty();
    }

    @Test
    void aPlanWithATriexcitonLifetimePredictsAndFitsWithIt() throws Exception {
        String text = Files.readString(DEMO).replaceFirst("\"limits\"", "\"model\": { \"triexcitonLifetime\": \"5 ps\" },\n  \"limits\"");
        PlanInputs in = PlanCodec.read(JsonTree.parse(text, "plan.json"));
        ModelAssumptions m = ModelAssumptions.forSample(in.sample(), in.modelOverrides());
        assertThat(m.processes()).containsExactly(new TriexcitonAugerProcess(5e-12));
        KineticModel km = m.kineticModel(2);
        AugerRecombination a = km.processes().stream().filter(AugerRecombination.class::isInstance)
                .map(AugerRecombination.class::cast).findFirst().orElseThrow();
        var space = km.space(5);
        assertThat(a.ratePerS(space, space.index(Charge.NEUTRAL, 3, 0))).isEqualTo(1 / 5e-12);
        assertThat(PlanFitBasis.of(in).base().seconds(TriexcitonAugerProcess.LIFETIME)).isEqualTo(5e-12);
    }
}
