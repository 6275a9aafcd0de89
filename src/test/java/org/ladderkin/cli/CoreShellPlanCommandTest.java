package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A core/shell plan on the command line: bad shells end with one located line and exit code 3. */
class CoreShellPlanCommandTest {

    static Path plan(Path dir, String from, String to) throws Exception {
        String text = Files.readString(MainTest.HOME.resolve("experiments-plan/cdse-cdte-gain-type2.plan.json")).replace(from, to);
        assertThat(text).contains(to);
        Path file = dir.resolve("p.plan.json");
        Files.writeString(file, text);
        return file;
    }

    @Test
    void aThickShellIsBadInput(@TempDir Path dir) throws Exception {
        Path file = plan(dir, "\"thickness\": \"1.2 nm\"", "\"thickness\": \"30 nm\"");
        MainTest.Run r = MainTest.run("plan", file.toString(), "--out", dir.resolve("out").toString(), "--quiet");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).hasSize(1);
        assertThat(r.err()).containsPattern("p\\.plan\\.json:\\d+:\\d+: field 'sample\\.shell\\.thickness': a 30 nm shell is "
                + "thicker than physically sensible \\(at most 20 nm\\)");
    }

    @Test
    void anUnknownShellMaterialIsBadInput(@TempDir Path dir) throws Exception {
        Path file = plan(dir, "\"material\": \"CdTe\"", "\"material\": \"Unobtainium\"");
        MainTest.Run r = MainTest.run("plan", file.toString(), "--out", dir.resolve("out").toString(), "--quiet");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip().lines()).hasSize(1);
        assertThat(r.err()).contains("field 'sample.shell.material'").contains("Unobtainium");
    }

    @Test
    void theTypeTwoDemoSaysWhichShellEffectsItAppliedAndWhere(@TempDir Path dir) throws Exception {
        MainTest.Run r = MainTest.run("plan", MainTest.HOME.resolve("experiments-plan/cdse-cdte-gain-type2.plan.json").toString(),
                "--out", dir.toString());
        assertThat(r.exit()).as(r.err()).isZero();
        String gainDefaults = r.out().lines().filter(l -> l.contains("gain") && l.contains("Defaults used")).findFirst().orElseThrow();
        assertThat(gainDefaults).contains("shell: CdSe/CdTe, 1.20 nm thick; type-II alignment: bulk band edges")
                .contains("shell biexciton shift: Δ_XX = +30.0 meV (repulsive").contains("shell heat capacity:")
                .contains("shell σ:").contains("shell first exciton:")
                .contains("core/shell: τ₂ scales with the whole core/shell volume");
        assertThat(r.out()).contains("the core/shell's biexciton shift Δ_XX = 1.28 line widths): ⟨N⟩ = 0.763")
                .contains("Without the biexciton shift (a plain dot) the threshold would be ⟨N⟩ = 1.15");
        assertThat(Files.readString(dir.resolve("report.html"))).contains("shell biexciton shift: Δ_XX = +30.0 meV");
    }
}
