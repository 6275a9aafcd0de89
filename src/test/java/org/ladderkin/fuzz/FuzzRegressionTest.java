package org.ladderkin.fuzz;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.cli.ExitCodes;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.MaterialCodec;
import org.ladderkin.io.MaterialLibrary;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.io.json.JsonTree;

/** The fuzz findings of issue 25, each kept as a named case: one located line, the documented exit code. */
class FuzzRegressionTest {

    @TempDir
    Path dir;

    private static final Path PLANS = InputKinds.PLANS;

    private Path copy(String demo, String edited) throws IOException {
        return Files.writeString(dir.resolve(demo), edited);
    }

    private static String demo(String name) throws IOException {
        return Files.readString(PLANS.resolve(name));
    }

    /** Exit 3, one line on stderr, beginning with {@code start}. */
    private static String oneBadInputLine(FuzzCase.Run r, String start) {
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.BAD_INPUT);
        String err = r.err().strip();
        assertThat(err).doesNotContain("\n", "\r", "\u0000", "Exception").startsWith(start);
        return err;
    }

    @Test
    void aNewlineInsideAStringFieldIsEscapedOnTheOneErrorLine() throws IOException {
        Path plan = copy("cdse-auger-1khz.plan.json", demo("cdse-auger-1khz.plan.json").replace("\"CdSe\"", "\"Cd\\nSe\""));
        String err = oneBadInputLine(FuzzCase.run(List.of("plan", plan.toString(), "--out", dir.resolve("out").toString(), "--quiet")),
                "ladderkin: " + plan + ":");
        assertThat(err).contains("field 'sample.material'", "'Cd\\nSe'");
    }

    @Test
    void aTruncatedJsonPlanIsOneLineWithItsLocation() throws IOException {
        String text = demo("cdse-auger-1khz.plan.json");
        Path plan = copy("cdse-auger-1khz.plan.json", text.substring(0, text.indexOf("\"laser\"") + 12));
        String err = oneBadInputLine(FuzzCase.run(List.of("plan", plan.toString(), "--quiet")), "ladderkin: " + plan + ":");
        // the line and column of the end, and none of the file's text beyond a short excerpt
        assertThat(err).matches("ladderkin: .*\\.plan\\.json:\\d+:\\d+: .*").doesNotContain("FH-CdSe").hasSizeLessThan(400);
    }

    @Test
    void aMaterialMissingSingleExcitonLifetimeValueIsLocatedAtThatField() throws IOException {
        String cdse = Files.readString(InputKinds.HOME.resolve("models/materials/CdSe.json"));
        Path f = Files.writeString(dir.resolve("CdSe.json"), cdse.replace("\"value\": \"20 ns\",", ""));
        assertThatThrownBy(() -> MaterialCodec.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(InputProblem.MISSING_FIELD);
            assertThat(e.field()).isEqualTo("singleExcitonLifetime.value");
            assertThat(e.getMessage()).startsWith(f + ":");
        });
    }

    /** A value marked unknown with a blank source used to end in an untyped error (fuzz seed 20261204, material case 729). */
    @Test
    void aMaterialValueWithABlankSourceIsLocatedAtItsSource() throws IOException {
        String text = Files.readString(InputKinds.HOME.resolve("models/materials/CsPbBr3.json"));
        int at = text.indexOf("\"source\"", text.indexOf("\"augerVolumeConstantPsPerNm3\""));
        int end = text.indexOf('\n', at);
        Path f = Files.writeString(dir.resolve("CsPbBr3.json"), text.substring(0, at) + "\"source\": \"\"" + text.substring(end));
        assertThatThrownBy(() -> MaterialCodec.read(f)).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(InputProblem.INVALID_VALUE);
            assertThat(e.field()).isEqualTo("augerVolumeConstantPsPerNm3.source");
            assertThat(e.getMessage()).startsWith(f + ":").contains("needs its source");
        });
    }

    /** A lifetime the library marks unknown (null) is the plan's to give: said at the plan's field, naming the material file. */
    @Test
    void aMaterialWithoutASingleExcitonLifetimeIsLocatedInThePlan() throws IOException {
        Path home = dir.resolve("home");
        Files.createDirectories(home.resolve("models/materials"));
        Files.createDirectories(home.resolve("models/matrices"));
        for (Path m : InputKinds.files(InputKinds.HOME.resolve("models/materials"), ".json")) {
            String text = Files.readString(m);
            Files.writeString(home.resolve("models/materials").resolve(m.getFileName()),
                    m.getFileName().toString().equals("CdSe.json") ? text.replace("\"value\": \"20 ns\"", "\"value\": null") : text);
        }
        for (Path m : InputKinds.files(InputKinds.HOME.resolve("models/matrices"), ".json")) {
            Files.copy(m, home.resolve("models/matrices").resolve(m.getFileName()));
        }
        MaterialLibrary library = MaterialLibrary.load(home);
        Path plan = PLANS.resolve("cdse-auger-1khz.plan.json");
        assertThatThrownBy(() -> PlanCodec.read(JsonTree.read(plan, plan.toString()), library))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.key()).isEqualTo(InputProblem.MISSING_FIELD);
                    assertThat(e.field()).isEqualTo("sample.material");
                    assertThat(e.getMessage()).startsWith(plan + ":").contains("models/materials/CdSe.json", "\"singleExcitonLifetime\"");
                });
    }

    @Test
    void aNulCharacterInAPathNamesTheArgumentOrField() throws IOException {
        FuzzCase.Run beam = FuzzCase.run(List.of("beam", dir + "/a\u0000b.csv", "--quiet"));
        assertThat(beam.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(beam.err().strip()).doesNotContain("\n", "\u0000", "java.").contains("FILE", "a\\u0000b.csv", "Nul character not allowed");

        Path plan = copy("cspbbr3-auger-1khz.plan.json",
                demo("cspbbr3-auger-1khz.plan.json").replace("\"fh-cpb-0207.absorption.csv\"", "\"fh-cpb\\u0000.csv\""));
        String err = oneBadInputLine(FuzzCase.run(List.of("plan", plan.toString(), "--quiet")), "ladderkin: " + plan + ":");
        assertThat(err).contains("field 'sample.absorptionSpectrum'", "fh-cpb\\u0000.csv", "not a usable path");
    }

    @Test
    void aPumpOnTheRedSideOfTheFirstExcitonIsLocated() throws IOException {
        Path plan = copy("pbse-multiplication-80mhz.plan.json",
                demo("pbse-multiplication-80mhz.plan.json").replace("\"1300 nm\"]", "\"1700 nm\"]"));
        assertThatThrownBy(() -> PlanCodec.read(plan)).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(InputProblem.OUT_OF_RANGE);
            assertThat(e.field()).isEqualTo("laser.pumpWavelengths[2]");
            assertThat(e.getMessage()).startsWith(plan + ":16:").contains("below the first exciton");
        });

        String err = oneBadInputLine(FuzzCase.run(List.of("excite", "--material", "PbSe", "--first-peak", "1450nm", "--concentration", "1uM",
                "--path", "1mm", "--energy", "50nJ", "--rep-rate", "1kHz", "--pump-radius", "100um", "--probe-radius", "50um",
                "--pump", "1700nm", "--quiet")), "ladderkin: option '--pump': ");
        assertThat(err).contains("red side of the first-exciton peak");
    }

    @Test
    void aSidecarPumpOf1e308NanometresIsLocated() throws IOException {
        Path sidecar = copy("fh-cdse-ta-series.traces.json",
                demo("fh-cdse-ta-series.traces.json").replace("\"515 nm\"", "\"1.7976931348623157E308 nm\""));
        Path traces = PLANS.resolve("fh-cdse-ta-series.csv");
        assertThatThrownBy(() -> org.ladderkin.io.TraceSidecarCodec.apply(sidecar,
                org.ladderkin.io.TraceTableReader.read(traces, traces.toString(), org.ladderkin.io.TableOptions.defaults())))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.key()).isEqualTo(InputProblem.OUT_OF_RANGE);
                    assertThat(e.field()).isEqualTo("pump");
                    assertThat(e.getMessage()).startsWith(sidecar + ":3:").contains("between 10 nm and 100 µm");
                });
    }

    /** A knife-edge scan cut short left the edge fit with a singular covariance, which escaped as an internal error. */
    @Test
    void aTruncatedKnifeEdgeScanIsAnInputErrorNotAnInternalOne() throws IOException {
        byte[] whole = Files.readAllBytes(PLANS.resolve("fh-pump-knife-edge.csv"));
        Path cut = Files.write(dir.resolve("fh-pump-knife-edge.csv"), java.util.Arrays.copyOf(whole, 532));
        oneBadInputLine(FuzzCase.run(List.of("beam", cut.toString(), "--quiet")), "ladderkin: " + cut + ":");
    }

    @Test
    void aBadFlagValueNamesItsOption() {
        String err = oneBadInputLine(FuzzCase.run(List.of("simulate", "--tau-rad", "20ns", "--tau-auger2", "\u001b[31m", "--n-avg", "1",
                "--quiet")), "ladderkin: option '--tau-auger2': ");
        assertThat(err).contains("cannot read a number");
    }
}
