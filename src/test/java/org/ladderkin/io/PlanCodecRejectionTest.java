package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.plan.Goal;
import org.ladderkin.plan.PlanInputs;

/**
 * Every kind of bad plan input gets one line {@code FILE:LINE:COLUMN: field 'x': what is wrong (what is allowed)}.
 * Positions are where the offending value starts (1-based), as an editor shows them.
 */
class PlanCodecRejectionTest {

    private static final String DEMO = "experiments-plan/cdse-auger-1khz.plan.json";

    static String demoText() throws IOException {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        return Files.readString(home.resolve(DEMO), StandardCharsets.UTF_8);
    }

    /** "FILE:LINE:COLUMN" of the first occurrence of {@code needle} in {@code text}, plus {@code offset} characters. */
    static String at(String text, String needle, int offset) {
        int idx = text.indexOf(needle);
        assertThat(idx).as("test setup: '%s' not in document", needle).isGreaterThanOrEqualTo(0);
        idx += offset;
        int line = 1;
        int col = 1;
        for (int i = 0; i < idx; i++) {
            if (text.charAt(i) == '\n') {
                line++;
                col = 1;
            } else {
                col++;
            }
        }
        return "plan.json:" + line + ":" + col;
    }

    static PlanInputs read(String text) {
        return PlanCodec.read(JsonTree.parse(text, "plan.json"));
    }

    @Test
    void demoPlanReads() throws IOException {
        PlanInputs p = read(demoText());
        assertThat(p.goals()).contains(Goal.BIEXCITON_AUGER, Goal.CROSS_SECTION);
        assertThat(p.laser().repetitionRateHz()).isEqualTo(1000.0);
        assertThat(p.sample().firstExcitonWavelengthM()).isCloseTo(580e-9, org.assertj.core.data.Offset.offset(1e-18));
        assertThat(p.sample().material().key()).isEqualTo("CdSe");
        assertThat(p.instruments()).hasSize(2);
    }

    @Test
    void malformedJson() {
        assertThatThrownBy(() -> read("{\n  \"schema\": \"ladderkin.plan/1\"\n  \"title\": \"x\"\n}"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "plan.json:3:3", null));
    }

    @Test
    void wrongTypeNumberForString() throws IOException {
        String t = demoText().replace("\"title\": \"Auger", "\"title\": 42, \"x\": \"Auger");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_TYPE, "plan.json:3:12", "title"));
    }

    @Test
    void unknownFieldListsTheAllowedOnes() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\",", "\"pathLength\": \"1 mm\", \"colour\": \"red\",");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.UNKNOWN_FIELD, at(t, "\"red\"", 0), "sample.colour"));
    }

    @Test
    void missingRequiredField() throws IOException {
        String t = demoText().replace("\"matrix\": \"toluene\",", "");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.MISSING_FIELD, at(t, "\"sample\": {", 10), "sample.matrix"));
    }

    @Test
    void negativeLength() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\"", "\"pathLength\": \"-1 mm\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.OUT_OF_RANGE, at(t, "\"-1 mm\"", 0), "sample.pathLength"));
    }

    @Test
    void unknownUnit() throws IOException {
        String t = demoText().replace("\"150 fs\"", "\"150 fz\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.UNKNOWN_UNIT, at(t, "\"150 fz\"", 0), "laser.pulseWidth"));
    }

    @Test
    void missingUnit() throws IOException {
        String t = demoText().replace("\"1 mm\"", "\"1\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_UNIT, at(t, "\"pathLength\": \"1\"", 14), "sample.pathLength"));
    }

    @Test
    void bareNumberWhereAUnitIsNeeded() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\"", "\"pathLength\": 1");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_UNIT, at(t, "\"pathLength\": 1", 14), "sample.pathLength"));
    }

    @Test
    void wrongDimension() throws IOException {
        String t = demoText().replace("\"150 fs\"", "\"150 nJ\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_UNIT, at(t, "\"150 nJ\"", 0), "laser.pulseWidth"));
    }

    @Test
    void probabilityAboveOne() throws IOException {
        String t = demoText().replace("\"6 %\"", "\"150 %\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.OUT_OF_RANGE, at(t, "\"150 %\"", 0), "sample.sizeDispersion"));
    }

    @Test
    void wrongSchemaVersion() throws IOException {
        String t = demoText().replace("ladderkin.plan/1", "ladderkin.plan/7");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_SCHEMA, "plan.json:2:13", "schema"));
    }

    @Test
    void wrongSchemaName() throws IOException {
        String t = demoText().replace("ladderkin.plan/1", "ladderkin.sample/1");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_SCHEMA, "plan.json:2:13", "schema"));
    }

    @Test
    void duplicateKey() {
        assertThatThrownBy(() -> read("{\"schema\": \"ladderkin.plan/1\",\n \"title\": \"a\",\n \"title\": \"b\"}"))
                .satisfies(input(InputProblem.DUPLICATE, "plan.json:3:2", "title"));
    }

    @Test
    void trailingContent() {
        assertThatThrownBy(() -> read("{\"schema\": \"ladderkin.plan/1\"}\n{}"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "plan.json:2:1", null));
    }

    @Test
    void emptyFile() {
        assertThatThrownBy(() -> read("  "))
                .satisfies(input(InputProblem.EMPTY, "plan.json:1:1", null));
    }

    @Test
    void nanIsNotJson() {
        assertThatThrownBy(() -> read("{\"schema\": NaN}"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "plan.json:1:15", null));
    }

    @Test
    void reversedEnergyRange() throws IOException {
        String t = demoText().replace("[\"1 nJ\", \"2 µJ\"]", "[\"2 µJ\", \"1 nJ\"]");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.BAD_ORDER, at(t, "[\"2 µJ\"", 0), "laser.pulseEnergyRange"));
    }

    @Test
    void unknownGoal() throws IOException {
        String t = demoText().replace("\"higher-auger\"", "\"higher-augur\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.BAD_CHOICE, at(t, "\"higher-augur\"", 0), "goals.measure[1]"));
    }

    @Test
    void unknownChoice() throws IOException {
        String t = demoText().replace("\"mode\": \"stirred\"", "\"mode\": \"shaken\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.BAD_CHOICE, at(t, "\"shaken\"", 0), "sample.refresh.mode"));
    }

    @Test
    void bothSizeFieldsGivenAreBothUsed() throws IOException {
        // the peak sets E₁S and the size the volume (issue 14: materials without a sizing curve need both)
        String t = demoText().replace("\"firstExcitonPeak\": \"580 nm\",", "\"firstExcitonPeak\": \"580 nm\", \"diameter\": \"4 nm\",");
        PlanInputs p = read(t);
        assertThat(p.sample().sizeM()).isEqualTo(4e-9);
        assertThat(p.sample().firstExcitonWavelengthM()).isCloseTo(580e-9, org.assertj.core.data.Offset.offset(1e-18));
    }

    @Test
    void temperatureRiseInCelsiusIsRefused() throws IOException {
        String t = demoText().replace("\"5 K\"", "\"5 °C\"");
        assertThatThrownBy(() -> read(t))
                .satisfies(input(InputProblem.WRONG_UNIT, at(t, "\"5 °C\"", 0), "limits.maxTemperatureRise"));
    }

    @Test
    void fileNotFound(@TempDir Path dir) {
        Path missing = dir.resolve("nope.json");
        assertThatThrownBy(() -> PlanCodec.read(missing)).satisfies(input(InputProblem.NOT_FOUND, missing.toString(), null));
    }

    @Test
    void notUtf8(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("latin1.json");
        Files.write(f, new byte[] {'{', '"', (byte) 0xE9, '"', '}'});
        assertThatThrownBy(() -> PlanCodec.read(f)).satisfies(input(InputProblem.UNREADABLE, f.toString(), null));
    }

    @Test
    void byteOrderMarkIsAccepted() throws IOException {
        PlanInputs p = read("\uFEFF" + demoText());
        assertThat(p.title()).startsWith("Auger ladder");
    }
}
