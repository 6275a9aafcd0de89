package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.units.Photon;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class SimulateObservablesTest {

    static double[] column(String csv, String name) {
        String[] lines = csv.strip().split("\n");
        int idx = Arrays.asList(lines[0].split(",")).indexOf(name);
        assertThat(idx).as("column %s in %s", name, lines[0]).isPositive();
        return Arrays.stream(lines).skip(1).mapToDouble(l -> Double.parseDouble(l.split(",")[idx])).toArray();
    }

    @Test
    @CheckedAgainst(source = "derived: a dot's lattice heat after a 400 nm pulse is ⟨N⟩(ħω − E₁S) at once (cooling), plus "
            + "E₁S per Auger event; with Auger ≫ radiative decay every excited dot keeps one exciton, so after Auger "
            + "the added heat is E₁S·(⟨N⟩ − (1 − e^{−⟨N⟩})); ΔT = Q/(ρ·c·πd³/6)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void dotTemperatureFollowsCoolingThenAugerHeat() {
        double n = 2;
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "1us", "--tau-auger2", "30ps", "--radiative-scaling", "linear",
                "--n-avg", "2", "--delays", "0ps,2ns", "--observable", "temperature,bleach", "--pump", "400nm",
                "--first-exciton", "2.1eV", "--material", "CdSe", "--diameter", "4nm");
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        double[] dT = column(r.out(), "dot_temperature_rise_k@N=2");
        var cdse = MaterialLibrary.fromHome().material("CdSe");
        double heatCapacity = cdse.densityKgPerM3().value() * cdse.specificHeatJPerKgK().value() * Math.PI / 6 * 64e-27;
        double e1 = 2.1 * PhysicalConstants.ELECTRONVOLT_J;
        double prompt = n * (Photon.energyJ(400e-9) - e1);
        Reference.checkRelative("dot temperature rise at zero delay (K)", dT[0], prompt / heatCapacity, 1e-9);
        double afterAuger = prompt + e1 * (n - (1 - Math.exp(-n)));
        // radiative decay of multiexcitons (k_rad·N vs Auger) takes a small share of the energy: 1 % tolerance
        Reference.checkRelative("dot temperature rise after Auger decay, 2 ns (K)", dT[1], afterAuger / heatCapacity, 1e-2);
    }

    @Test
    void everyObservableHasItsColumns() {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--n-avg", "1",
                "--delays", "1ps..1ns:4log", "--charges", "negative", "--tau-trion-negative", "200ps",
                "--ionisation-probability", "0.01", "--tau-neutralisation", "1us", "--rep-rate", "1MHz",
                "--observable", "bleach,pl,charged,spectrum", "--first-exciton", "580nm", "--spectrum", "2.0eV..2.2eV:3");
        assertThat(r.err()).isEmpty();
        String header = r.out().lines().findFirst().orElseThrow();
        assertThat(header).startsWith("delay_ps,bleach@N=1,pl@N=1,charged@N=1,\"dA_rel@N=1,E=2.0000eV\"");
        double[] charged = column(r.out(), "charged@N=1");
        assertThat(Arrays.stream(charged).allMatch(c -> c > 0 && c < 1)).as("charged fractions in (0, 1)").isTrue();
    }

    @Test
    void missingInputsAndUnknownObservablesAreOneLineErrors() {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--observable", "temperature");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("ladderkin: --observable temperature needs --pump");
        MainTest.Run u = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--observable", "colour");
        assertThat(u.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(u.err()).contains("unknown --observable 'colour'");
    }
}
