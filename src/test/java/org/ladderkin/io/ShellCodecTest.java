package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.material.BandAlignment;
import org.ladderkin.sample.Advisory;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.Shell;

/** The {@code shell} object of a sample: what it says, and where a bad one is wrong. */
class ShellCodecTest {

    static final String FILE = """
            {
              "schema": "ladderkin.sample/1",
              "name": "FH-CdSe/CdS-g16 (invented batch)",
              "material": "CdSe",
              "diameter": "3 nm",
              "concentration": "0.05 µM",
              "pathLength": "1 mm",
              "matrix": "hexane",
              "refresh": { "mode": "stirred" },
              "shell": { "material": "CdS", "monolayers": 16 }
            }
            """;

    static Sample read(String text) {
        Node root = JsonTree.parse(text, "s.json");
        root.schema(SampleCodec.SCHEMA, SampleCodec.VERSION);
        return SampleCodec.section(root, MaterialLibrary.fromHome(), Path.of("."));
    }

    static String withShell(String shell) {
        return FILE.replace("{ \"material\": \"CdS\", \"monolayers\": 16 }", shell);
    }

    @Test
    void readsTheShell() {
        Shell s = read(FILE).spec().shell().orElseThrow();
        assertThat(s.material().key()).isEqualTo("CdS");
        assertThat(s.monolayers()).isEqualTo(16);
        assertThat(s.alignment()).isEqualTo(BandAlignment.QUASI_TYPE_II);
        assertThat(s.alloyedInterface()).isFalse();
        Shell full = read(withShell("{ \"material\": \"CdTe\", \"thickness\": \"1.2 nm\", \"alignment\": \"type-II\", "
                + "\"alloyedInterface\": true, \"biexcitonShift\": \"40 meV\", \"lineWidth\": \"50 meV\", "
                + "\"firstExcitonPeak\": \"700 nm\" }")).spec().shell().orElseThrow();
        assertThat(full.thicknessM()).isEqualTo(1.2e-9);
        assertThat(full.alignment()).isEqualTo(BandAlignment.TYPE_II);
        assertThat(full.alloyedInterface()).isTrue();
        assertThat(full.biexcitonShiftJ()).isCloseTo(0.040 * 1.602176634e-19, org.assertj.core.data.Percentage.withPercentage(1e-9));
        assertThat(full.firstExcitonPeakM()).isCloseTo(700e-9, org.assertj.core.data.Offset.offset(1e-18));
    }

    @Test
    void aShellThickerThanTwentyNanometresIsOutOfRange() {
        assertThatThrownBy(() -> read(withShell("{ \"material\": \"CdS\", \"thickness\": \"25 nm\" }")))
                .satisfies(input(InputProblem.OUT_OF_RANGE, "s.json:10:46", "shell.thickness"))
                .hasMessageContaining("a 25 nm shell is thicker than physically sensible (at most 20 nm)");
        assertThatThrownBy(() -> read(withShell("{ \"material\": \"CdS\", \"monolayers\": 80 }")))
                .satisfies(input(InputProblem.OUT_OF_RANGE, "s.json:10:47", "shell.monolayers"));
    }

    @Test
    void anUnknownShellMaterialIsABadChoice() {
        assertThatThrownBy(() -> read(withShell("{ \"material\": \"ZnO\", \"thickness\": \"1 nm\" }")))
                .satisfies(input(InputProblem.BAD_CHOICE, "s.json:10:26", "shell.material"))
                .hasMessageContaining("ZnO");
    }

    @Test
    void anUnknownAlignmentIsABadChoice() {
        assertThatThrownBy(() -> read(withShell("{ \"material\": \"CdS\", \"thickness\": \"1 nm\", \"alignment\": \"type-III\" }")))
                .satisfies(input(InputProblem.BAD_CHOICE, "s.json:10:67", "shell.alignment"));
    }

    @Test
    void anAlignmentAgainstTheBandEdgesIsAnAdvisoryNotAnError() {
        Sample s = read(withShell("{ \"material\": \"ZnS\", \"thickness\": \"1 nm\", \"alignment\": \"type-II\" }"));
        assertThat(s.advisories()).anySatisfy(a -> {
            assertThat(a.kind()).isEqualTo(Advisory.Kind.SHELL_ALIGNMENT);
            assertThat(a.message()).contains("type-II, contradicts the type-I").contains("CdSe/ZnS");
        });
    }

    @Test
    void badShellInAPlanExitsWithCodeThreeAndOneLine(@TempDir Path dir) throws Exception {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        String plan = Files.readString(home.resolve("experiments-plan/cdse-cdte-gain-type2.plan.json"))
                .replace("\"thickness\": \"1.2 nm\"", "\"thickness\": \"30 nm\"");
        Path file = dir.resolve("bad.plan.json");
        Files.writeString(file, plan);
        assertThatThrownBy(() -> PlanCodec.read(file)).isInstanceOf(InputException.class)
                .hasMessageContaining("field 'sample.shell.thickness'")
                .hasMessageContaining("a 30 nm shell is thicker than physically sensible");
    }
}
