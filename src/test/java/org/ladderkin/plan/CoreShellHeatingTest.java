package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.sample.CoreShell;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A core/shell dot's lattice jump divides its heat by the heat capacity of core and shell together. */
class CoreShellHeatingTest {

    private static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-cdte-gain-type2.plan.json");

    @Test
    @CheckedAgainst(source = "derived: a dot absorbing ⟨N⟩ photons of energy ħω keeps ⟨N⟩·ħω·f as heat (f the heat share) "
            + "and its lattice jumps by that over its heat capacity, here ρc·V of the core plus ρc·V of the shell",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void theShellTakesUpTheHeatWithItsCore() {
        PlanInputs in = PlanCodec.read(DEMO);
        CoreShell cs = CoreShell.of(in.sample()).orElseThrow();
        assertThat(cs.heatCapacityJPerK()).as("the shell adds heat capacity").isGreaterThan(cs.coreHeatCapacityJPerK());
        Excitation ex = Excitation.of(in.sample(), new Pulse(in.laser().maxPulseEnergyJ(), in.laser().pumpWavelengthsM().get(0), 1e3),
                new GaussianBeam(in.laser().pumpRadiusM()), new GaussianBeam(in.laser().probeRadiusM()), true);
        HeatBudget h = HeatBudget.of(ex, 0.3, 2, 0.2);
        double photonJ = ex.pulse().photonEnergyJ();
        Reference.checkRelative("averaged dot jump of the core/shell (K)", h.dotJumpK(),
                2 * photonJ * h.heatFraction() / cs.heatCapacityJPerK(), 1e-12);
        Reference.checkRelative("hottest dot jump of the core/shell (K)", h.hottest().dotJumpK(),
                ex.nAvgPeak() * photonJ * h.hottest().heatFraction() / cs.heatCapacityJPerK(), 1e-12);
    }
}
