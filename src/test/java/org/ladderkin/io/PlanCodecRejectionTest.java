package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

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
                .hasMessage("plan.json:3:3: malformed JSON: Unexpected character ('\"' (code 34)): was expecting comma to separate Object entries");
    }

    @Test
    void wrongTypeNumberForString() throws IOException {
        String t = demoText().replace("\"title\": \"Auger", "\"title\": 42, \"x\": \"Auger");
        assertThatThrownBy(() -> read(t))
                .hasMessage("plan.json:3:12: field 'title': expected a string, found the number 42");
    }

    @Test
    void unknownFieldListsTheAllowedOnes() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\",", "\"pathLength\": \"1 mm\", \"colour\": \"red\",");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"red\"", 0) + ": field 'sample.colour': unknown field (allowed here: name, material, "
                        + "diameter, firstExcitonPeak, sizeDispersion, concentration, absorbance, pathLength, matrix, refresh, "
                        + "absorptionSpectrum, crossSection)");
    }

    @Test
    void missingRequiredField() throws IOException {
        String t = demoText().replace("\"matrix\": \"toluene\",", "");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"sample\": {", 10) + ": field 'sample.matrix': missing required field in 'sample' (add \"matrix\": ...)");
    }

    @Test
    void negativeLength() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\"", "\"pathLength\": \"-1 mm\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"-1 mm\"", 0) + ": field 'sample.pathLength': must be > 0, was -1 mm");
    }

    @Test
    void unknownUnit() throws IOException {
        String t = demoText().replace("\"150 fs\"", "\"150 fz\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"150 fz\"", 0) + ": field 'laser.pulseWidth': unknown unit 'fz' in '150 fz': expected a time in fs, ps, ns, µs, ms, s, min, h");
    }

    @Test
    void missingUnit() throws IOException {
        String t = demoText().replace("\"1 mm\"", "\"1\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"pathLength\": \"1\"", 14) + ": field 'sample.pathLength': missing unit in '1': expected a length such as 400 nm (units: pm, Å, nm, µm, mm, cm, m)");
    }

    @Test
    void bareNumberWhereAUnitIsNeeded() throws IOException {
        String t = demoText().replace("\"pathLength\": \"1 mm\"", "\"pathLength\": 1");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"pathLength\": 1", 14) + ": field 'sample.pathLength': a bare number needs a unit here: write it as a string such as \"400 nm\"");
    }

    @Test
    void wrongDimension() throws IOException {
        String t = demoText().replace("\"150 fs\"", "\"150 nJ\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"150 nJ\"", 0) + ": field 'laser.pulseWidth': '150 nJ' is an energy, expected a time such as 50 ps (units: fs, ps, ns, µs, ms, s, min, h)");
    }

    @Test
    void probabilityAboveOne() throws IOException {
        String t = demoText().replace("\"6 %\"", "\"150 %\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"150 %\"", 0) + ": field 'sample.sizeDispersion': must be a probability between 0 and 1, was 150 %");
    }

    @Test
    void wrongSchemaVersion() throws IOException {
        String t = demoText().replace("ladderkin.plan/1", "ladderkin.plan/7");
        assertThatThrownBy(() -> read(t))
                .hasMessage("plan.json:2:13: field 'schema': unsupported schema version 7 (this build reads ladderkin.plan/1 to /1)");
    }

    @Test
    void wrongSchemaName() throws IOException {
        String t = demoText().replace("ladderkin.plan/1", "ladderkin.sample/1");
        assertThatThrownBy(() -> read(t))
                .hasMessage("plan.json:2:13: field 'schema': expected schema 'ladderkin.plan/1', found 'ladderkin.sample/1'");
    }

    @Test
    void duplicateKey() {
        assertThatThrownBy(() -> read("{\"schema\": \"ladderkin.plan/1\",\n \"title\": \"a\",\n \"title\": \"b\"}"))
                .hasMessage("plan.json:3:2: field 'title': given twice in the same object (each field may appear once)");
    }

    @Test
    void trailingContent() {
        assertThatThrownBy(() -> read("{\"schema\": \"ladderkin.plan/1\"}\n{}"))
                .hasMessage("plan.json:2:1: unexpected content after the end of the document (only one JSON value is allowed)");
    }

    @Test
    void emptyFile() {
        assertThatThrownBy(() -> read("  "))
                .hasMessage("plan.json:1:1: empty file (expected a JSON object)");
    }

    @Test
    void nanIsNotJson() {
        assertThatThrownBy(() -> read("{\"schema\": NaN}"))
                .hasMessageStartingWith("plan.json:1:15: malformed JSON: Non-standard token 'NaN'");
    }

    @Test
    void reversedEnergyRange() throws IOException {
        String t = demoText().replace("[\"1 nJ\", \"2 µJ\"]", "[\"2 µJ\", \"1 nJ\"]");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "[\"2 µJ\"", 0) + ": field 'laser.pulseEnergyRange': lowest energy is above the highest (write [lowest, highest])");
    }

    @Test
    void unknownGoal() throws IOException {
        String t = demoText().replace("\"higher-auger\"", "\"higher-augur\"");
        assertThatThrownBy(() -> read(t))
                .hasMessageStartingWith(at(t, "\"higher-augur\"", 0) + ": field 'goals.measure[1]': unknown goal 'higher-augur' (allowed: biexciton-auger, ");
    }

    @Test
    void unknownChoice() throws IOException {
        String t = demoText().replace("\"mode\": \"stirred\"", "\"mode\": \"shaken\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"shaken\"", 0) + ": field 'sample.refresh.mode': 'shaken' is not one of: static, stirred, flowing");
    }

    @Test
    void bothSizeFieldsGiven() throws IOException {
        String t = demoText().replace("\"firstExcitonPeak\": \"580 nm\",", "\"firstExcitonPeak\": \"580 nm\", \"diameter\": \"4 nm\",");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"sample\": {", 10) + ": field 'sample': give only one of 'diameter', 'firstExcitonPeak' (they say the same thing)");
    }

    @Test
    void temperatureRiseInCelsiusIsRefused() throws IOException {
        String t = demoText().replace("\"5 K\"", "\"5 °C\"");
        assertThatThrownBy(() -> read(t))
                .hasMessage(at(t, "\"5 °C\"", 0) + ": field 'limits.maxTemperatureRise': a temperature rise must be > 0 and given in K (e.g. \"5 K\"), was 5 °C");
    }

    @Test
    void fileNotFound(@TempDir Path dir) {
        Path missing = dir.resolve("nope.json");
        assertThatThrownBy(() -> PlanCodec.read(missing)).hasMessage(missing + ": file not found");
    }

    @Test
    void notUtf8(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("latin1.json");
        Files.write(f, new byte[] {'{', '"', (byte) 0xE9, '"', '}'});
        assertThatThrownBy(() -> PlanCodec.read(f)).hasMessage(f + ": not UTF-8 text (save the file as UTF-8)");
    }

    @Test
    void byteOrderMarkIsAccepted() throws IOException {
        PlanInputs p = read("\uFEFF" + demoText());
        assertThat(p.title()).startsWith("Auger ladder");
    }
}
