package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SimulateCommandTest {

    static final Path HOME = MainTest.HOME;

    @Test
    void flagModelPrintsCsvWithNamedColumns() {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "20ns", "--radiative-scaling", "statistical",
                "--tau-auger2", "50ps", "--auger-scaling", "statistical", "--degeneracy", "2",
                "--n-avg", "0.1,1,3", "--rep-rate", "1kHz", "--delays", "0.1ps..1ms:50log");
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        String[] lines = r.out().split("\\R");
        assertThat(lines[0]).isEqualTo("delay_ps,bleach@N=0.1,pl@N=0.1,bleach@N=1,pl@N=1,bleach@N=3,pl@N=3");
        assertThat(lines).hasSize(51);
        String[] first = lines[1].split(",");
        assertThat(Double.parseDouble(first[0])).isCloseTo(0.1, org.assertj.core.data.Offset.offset(1e-12));
        // at least 12 significant digits
        assertThat(first[1].replaceAll("[^0-9]", "").replaceFirst("^0+", "").length()).isGreaterThanOrEqualTo(12);
        // bleach at 0.1 ps for <N> = 3 exceeds that for <N> = 0.1; at 1 ms everything has relaxed
        assertThat(Double.parseDouble(first[5])).isGreaterThan(Double.parseDouble(first[1]));
        String[] last = lines[50].split(",");
        assertThat(Math.abs(Double.parseDouble(last[5]))).isLessThan(1e-12);
    }

    @Test
    void presetFilesSimulateAsJson() {
        for (String preset : new String[] {"cdse-4nm.model.json", "pbse-5nm.model.json"}) {
            MainTest.Run r = MainTest.run("simulate", HOME.resolve("models/presets/" + preset).toString(),
                    "--n-avg", "0.5", "--rep-rate", "80 MHz", "--delays", "1ps,1ns", "--format", "json", "--nmax", "8");
            assertThat(r.err()).isEmpty();
            assertThat(r.exit()).isZero();
            assertThat(r.out()).contains("\"schema\" : \"ladderkin.simulation/1\"").contains("pulsesToWithinOnePercent")
                    .contains("\"nAvg\" : \"0.5\"");
        }
    }

    /** Beside a model file, --tau-trap, --charges, --degeneracy ... used to change nothing and exit 0. */
    @Test
    void modelFlagsBesideAModelFileAreRefusedNotIgnored() {
        String preset = HOME.resolve("models/presets/cdse-4nm.model.json").toString();
        MainTest.Run r = MainTest.run("simulate", preset, "--tau-trap", "1ns", "--degeneracy", "8", "--n-avg", "0.5", "--delays", "1ps,1ns");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).hasSize(1);
        assertThat(r.err()).contains("--degeneracy, --tau-trap do not combine with a model file cdse-4nm.model.json");
        MainTest.Run plain = MainTest.run("simulate", preset, "--n-avg", "0.5", "--delays", "1ps,1ns", "--nmax", "8");
        assertThat(plain.exit()).isZero();
    }

    @Test
    void badInputGivesOneLineAndExitCode3(@TempDir Path dir) throws Exception {
        MainTest.Run r = MainTest.run("simulate", "--tau-rad", "20 kHz", "--tau-auger2", "50ps");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).hasSize(1);
        Path model = dir.resolve("m.json");
        Files.writeString(model, "{\"schema\": \"ladderkin.model/1\", \"name\": \"x\",\n \"radiative\": {\"lifetime\": \"20 ns\","
                + " \"scaling\": \"linear\", \"colour\": 1},\n \"auger\": {\"biexcitonLifetime\": \"50 ps\", \"scaling\": \"pairs\"},"
                + " \"bandEdgeDegeneracy\": 2}");
        MainTest.Run bad = MainTest.run("simulate", model.toString());
        assertThat(bad.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("m.json:2:").contains("radiative.colour").contains("unknown field");
        MainTest.Run grid = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--delays", "1ms..1ps:10log");
        assertThat(grid.exit()).isEqualTo(ExitCodes.BAD_INPUT);
    }

    @Test
    void benchIsListedInHelp() {
        assertThat(MainTest.run("--help").out()).contains("simulate").contains("bench");
    }
}
