package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The commands that print heat (simulate's temperature column, plan's heat budget) never turn a photon into negative heat. */
class EnergyConservationCommandsTest {

    private static final String[] MODEL = {"simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--n-avg", "1",
        "--delays", "0ps,1ns", "--observable", "temperature", "--first-exciton", "2.0eV", "--material", "CdSe",
        "--diameter", "4nm"};

    private static MainTest.Run simulate(String... more) {
        String[] args = java.util.Arrays.copyOf(MODEL, MODEL.length + more.length);
        System.arraycopy(more, 0, args, MODEL.length, more.length);
        return MainTest.run(args);
    }

    @Test
    void multiplicationBelowTwiceTheGapIsRefusedNotCooled() {
        // ħω = 1.8·E₁S with η = 1 printed a rise of −0.25 K: two excitons of 2.0 eV from a 3.6 eV photon
        MainTest.Run r = simulate("--pump", "3.6eV", "--multiplication-eta", "1");
        assertThat(r.exit()).as("exit code of a multiplication that breaks energy conservation").isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.out()).as("no table is printed").isEmpty();
        assertThat(r.err().strip()).as("one line naming the flag, the rule and the ratio")
                .startsWith("ladderkin: --pump: energy conservation: 2 excitons per photon need ħω ≥ 2·E₁S = 4 eV")
                .contains("ħω = 1.8·E₁S").doesNotContain("\n");
    }

    @Test
    void aPumpBelowTheFirstExcitonIsRefused() {
        MainTest.Run r = simulate("--pump", "1.9eV");
        assertThat(r.exit()).as("exit code of a sub-gap pump").isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).as("one line naming the flag and the rule")
                .startsWith("ladderkin: --pump: energy conservation: the pump photon (1.9 eV) is below the first exciton "
                        + "(2 eV)").contains("allowed: ħω ≥ E₁S").doesNotContain("\n");
    }

    @Test
    @CheckedAgainst(source = "derived: with multiplication of yield η each absorbed photon leaves ħω − E₁S (one exciton) "
            + "or ħω − 2E₁S (two) at once, so the prompt heat is ⟨N_abs⟩[(1 − η)(ħω − E₁S) + η(ħω − 2E₁S)]; "
            + "ΔT = Q/(ρ·c·πd³/6)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void multiplicationAtAllowedEnergiesHeatsByTheExcessOverEachExcitonsGap() {
        MainTest.Run r = simulate("--pump", "4.4eV", "--multiplication-eta", "0.5");
        assertThat(r.err()).isEmpty();
        double[] dT = SimulateObservablesTest.column(r.out(), "dot_temperature_rise_k@N=1");
        var cdse = MaterialLibrary.fromHome().material("CdSe");
        double heatCapacity = cdse.densityKgPerM3().value() * cdse.specificHeatJPerKgK().value() * Math.PI / 6 * 64e-27;
        double ev = PhysicalConstants.ELECTRONVOLT_J;
        double prompt = 0.5 * (4.4 - 2.0) * ev + 0.5 * (4.4 - 4.0) * ev;
        Reference.checkRelative("dot temperature rise at zero delay after a multiplying pulse (K)", dT[0],
                prompt / heatCapacity, 1e-9);
        assertThat(dT[1]).as("Auger heat after 1 ns only adds").isGreaterThan(dT[0]);
    }

    @Test
    void exactlyTwiceTheGapLeavesNoPromptHeatAndNeverNegative() {
        MainTest.Run r = simulate("--pump", "4.0eV", "--multiplication-eta", "1");
        assertThat(r.err()).isEmpty();
        double[] dT = SimulateObservablesTest.column(r.out(), "dot_temperature_rise_k@N=1");
        assertThat(dT[0]).as("prompt rise at ħω = 2·E₁S with η = 1 (K)").isBetween(0.0, 1e-9);
        assertThat(dT[1]).as("rise after 1 ns, from Auger heat only (K)").isPositive();
    }

    @Test
    void aPlanWithAPumpBelowTheFirstExcitonIsRefusedAtThatWavelength(@TempDir Path dir) throws Exception {
        String demo = Files.readString(MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        String bad = demo.replace("\"pumpWavelengths\": [\"400 nm\", \"515 nm\", \"565 nm\"]",
                "\"pumpWavelengths\": [\"400 nm\", \"650 nm\"]");
        assertThat(bad).as("the demo's pump list was replaced").isNotEqualTo(demo);
        Path plan = dir.resolve("subgap.plan.json");
        Files.writeString(plan, bad);
        MainTest.Run r = MainTest.run("plan", plan.toString(), "--out", dir.resolve("out").toString());
        assertThat(r.exit()).as("exit code of a plan pumping below the gap").isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).as("located at the 650 nm entry")
                .matches("(?s).*subgap\\.plan\\.json:\\d+:\\d+: field 'laser\\.pumpWavelengths\\[1\\]': energy "
                        + "conservation: the pump photon \\(1\\.9\\d* eV\\) is below the first exciton.*")
                .doesNotContain("\n");
    }
}
