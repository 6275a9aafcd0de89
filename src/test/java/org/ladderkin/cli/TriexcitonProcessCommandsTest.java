package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The triexciton Auger process reaches the command line and model files through the registry alone. */
class TriexcitonProcessCommandsTest {

    private static final String[] GRID = {"--n-avg", "0.5,4", "--delays", "0.1ps..1ns:40log", "--observable", "bleach"};

    private static MainTest.Run simulate(String... model) {
        String[] args = new String[1 + model.length + GRID.length];
        args[0] = "simulate";
        System.arraycopy(model, 0, args, 1, model.length);
        System.arraycopy(GRID, 0, args, 1 + model.length, GRID.length);
        MainTest.Run r = MainTest.run(args);
        assertThat(r.exit()).as(r.err()).isZero();
        return r;
    }

    @Test
    void theFlagAndTheModelFileSectionGiveTheSameTracesAndChangeThemAtHighOccupancy(@TempDir Path dir) throws Exception {
        MainTest.Run flags = simulate("--tau-rad", "20ns", "--tau-auger2", "50ps", "--tau-auger3", "6ps");
        Path model = dir.resolve("m.model.json");
        Files.writeString(model, """
                { "schema": "ladderkin.model/1", "name": "with a measured triexciton lifetime",
                  "radiative": { "lifetime": "20 ns", "scaling": "statistical" },
                  "auger": { "biexcitonLifetime": "50 ps", "scaling": "statistical" },
                  "triexcitonAuger": { "lifetime": "6 ps" },
                  "bandEdgeDegeneracy": 2 }
                """);
        MainTest.Run file = simulate(model.toString());
        assertThat(file.out()).isEqualTo(flags.out());
        MainTest.Run plain = simulate("--tau-rad", "20ns", "--tau-auger2", "50ps");
        assertThat(plain.out()).isNotEqualTo(flags.out());
        // τ₃ = 6 ps against the scaling law's 50 ps / 4.5: at ⟨N⟩ = 4 the bleach differs within the first tens of ps
        String[] withRows = flags.out().split("\\R");
        String[] plainRows = plain.out().split("\\R");
        double largest = 0;
        for (int i = 1; i < withRows.length; i++) {
            largest = Math.max(largest, Math.abs(Double.parseDouble(withRows[i].split(",")[2])
                    - Double.parseDouble(plainRows[i].split(",")[2])));
        }
        assertThat(largest).isGreaterThan(1e-2);
    }

    @Test
    void aMisspeltFieldInTheSectionIsLocated(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("bad.model.json");
        Files.writeString(model, """
                { "schema": "ladderkin.model/1", "name": "typo",
                  "radiative": { "lifetime": "20 ns", "scaling": "statistical" },
                  "auger": { "biexcitonLifetime": "50 ps", "scaling": "statistical" },
                  "triexcitonAuger": { "lifetme": "6 ps" },
                  "bandEdgeDegeneracy": 2 }
                """);
        MainTest.Run r = MainTest.run("simulate", model.toString(), "--n-avg", "1", "--delays", "1ps");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        // the misspelt key leaves the section without its required lifetime, reported at the section
        assertThat(r.err()).startsWith("ladderkin: " + model + ":4:").contains("triexcitonAuger.lifetime");
    }

    @Test
    void theHelpListsTheFlagAndTheFitName() {
        assertThat(MainTest.run("simulate", "--help").out()).contains("--tau-auger3");
        assertThat(MainTest.run("fit", "--help").out()).contains("tau-auger3");
    }

    @Test
    void fitFreesTheTriexcitonLifetimeByItsRegistryName(@TempDir Path dir) throws Exception {
        Path csv = FitCommandTest.simulatedSeries(dir, 5);
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "40ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--free", "scale,tau-auger3", "--out", dir.resolve("out").toString(),
                "--format", "json", "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        com.fasterxml.jackson.databind.JsonNode tau3 = new com.fasterxml.jackson.databind.ObjectMapper().readTree(fit.out())
                .at("/parameters/tauAuger3Ps");
        assertThat(tau3.get("fixed").asBoolean()).isFalse();
        // the series was simulated with the scaling law's τ₃ = τ₂/g(3) = 40 ps / 4.5
        assertThat(Math.abs(tau3.get("value").asDouble() - 40 / 4.5)).isLessThan(4 * tau3.get("stdError").asDouble() + 0.5);
    }
}
