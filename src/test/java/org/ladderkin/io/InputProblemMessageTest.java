package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.units.Dimension;

/**
 * One real input per problem key, each checked for the exact one-line message the user sees
 * ({@code FILE:LINE:COLUMN: field 'x': what is wrong (what is allowed)}). Other tests match on the key; these keep the
 * wording of each kind honest. The last check makes sure no key goes without such a test.
 */
class InputProblemMessageTest {

    private static final Set<InputProblem> SEEN = EnumSet.noneOf(InputProblem.class);

    @TempDir
    static Path dir;

    private static void renders(InputProblem key, Executable bad, String line) {
        assertThatThrownBy(bad::execute).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(key);
            assertThat(e.getMessage()).isEqualTo(line);
        });
        SEEN.add(key);
    }

    private static Node json(String text) {
        return JsonTree.parse(text, "x.json");
    }

    @Test
    void missingField() {
        renders(InputProblem.MISSING_FIELD, () -> json("{\"a\": {}}").field("a").field("b"),
                "x.json:1:7: field 'a.b': missing required field in 'a' (add \"b\": ...)");
    }

    @Test
    void missingValue() throws IOException {
        Path f = Files.writeString(dir.resolve("gap.csv"), "time (ps),response\n0,0\n1,\n2,0\n");
        renders(InputProblem.MISSING_VALUE, () -> IrfFileReader.read(f, "gap.csv"),
                "gap.csv:3:3: field 'response': missing value (an IRF file has no gaps)");
    }

    @Test
    void unknownField() {
        renders(InputProblem.UNKNOWN_FIELD, () -> {
            Node n = json("{\"a\": 1,\n \"colour\": 2}");
            n.field("a");
            n.finish();
        }, "x.json:2:12: field 'colour': unknown field (allowed here: a)");
    }

    @Test
    void duplicate() {
        renders(InputProblem.DUPLICATE, () -> json("{\"a\": 1, \"a\": 2}"),
                "x.json:1:10: field 'a': given twice in the same object (each field may appear once)");
    }

    @Test
    void wrongType() {
        renders(InputProblem.WRONG_TYPE, () -> json("{\"a\": 42}").field("a").string(),
                "x.json:1:7: field 'a': expected a string, found the number 42");
    }

    @Test
    void outOfRange() {
        renders(InputProblem.OUT_OF_RANGE, () -> json("{\"n\": 9}").field("n").integer(1, 5),
                "x.json:1:7: field 'n': must be between 1 and 5, was 9");
    }

    @Test
    void badOrder() {
        renders(InputProblem.BAD_ORDER, () -> AbsorptionSpectrumCsv.parse(
                        List.of("wavelength_nm,absorbance", "400,0.5", "450,0.3", "420,0.4"), "a.csv"),
                "a.csv:4: wavelengths must keep rising without repeats, but 420 nm follows 450 nm");
    }

    @Test
    void unknownUnit() {
        renders(InputProblem.UNKNOWN_UNIT, () -> json("{\"t\": \"5 fz\"}").field("t").positive(Dimension.TIME, null),
                "x.json:1:7: field 't': unknown unit 'fz' in '5 fz': expected a time in fs, ps, ns, µs, ms, s, min, h");
    }

    @Test
    void wrongUnit() {
        renders(InputProblem.WRONG_UNIT, () -> json("{\"t\": \"5 nJ\"}").field("t").positive(Dimension.TIME, null),
                "x.json:1:7: field 't': '5 nJ' is an energy, expected a time such as 50 ps (units: fs, ps, ns, µs, ms, s, min, h)");
    }

    @Test
    void badNumber() {
        renders(InputProblem.BAD_NUMBER, () -> AbsorptionSpectrumCsv.parse(
                        List.of("wavelength_nm,absorbance", "400,0.5", "450,abc"), "a.csv"),
                "a.csv:3:5: field 'absorbance': 'abc' is not a number (write a number such as 1.5e-3, or leave the cell empty / NaN for a missing value)");
    }

    @Test
    void badChoice() {
        renders(InputProblem.BAD_CHOICE, () -> json("{\"m\": \"shaken\"}").field("m").choice("static", "stirred"),
                "x.json:1:7: field 'm': 'shaken' is not one of: static, stirred");
    }

    @Test
    void conflict() {
        renders(InputProblem.CONFLICT, () -> json("{\"s\": {\"a\": 1, \"b\": 2}}").field("s").oneOf("a", "b"),
                "x.json:1:7: field 's': give only one of 'a', 'b' (they say the same thing)");
    }

    @Test
    void mismatch() throws IOException {
        Path home = dir.resolve("home");
        Files.createDirectories(home.resolve("models/materials"));
        Files.createDirectories(home.resolve("models/matrices"));
        Path material = home.resolve("models/materials/Other.json");
        Files.copy(MaterialLibrary.home().resolve("models/materials/CdSe.json"), material);
        renders(InputProblem.MISMATCH, () -> MaterialLibrary.load(home),
                material + ": field 'key': key 'CdSe' differs from the file name 'Other' (they must match)");
    }

    @Test
    void wrongSchema() {
        renders(InputProblem.WRONG_SCHEMA, () -> json("{\"schema\": \"ladderkin.plan/7\"}").schema("ladderkin.plan", 1),
                "x.json:1:12: field 'schema': unsupported schema version 7 (this build reads ladderkin.plan/1 to /1)");
    }

    @Test
    void badSyntax() {
        renders(InputProblem.BAD_SYNTAX, () -> json("{\"a\": 1}\n{}"),
                "x.json:2:1: unexpected content after the end of the document (only one JSON value is allowed)");
    }

    @Test
    void empty() {
        renders(InputProblem.EMPTY, () -> json("  "), "x.json:1:1: empty file (expected a JSON object)");
    }

    @Test
    void notFound() {
        Path missing = dir.resolve("nope.json");
        renders(InputProblem.NOT_FOUND, () -> JsonTree.read(missing, "nope.json"), "nope.json: file not found");
    }

    @Test
    void unreadable() throws IOException {
        Path f = Files.write(dir.resolve("latin1.json"), new byte[] {'{', '"', (byte) 0xE9, '"', '}'});
        renders(InputProblem.UNREADABLE, () -> JsonTree.read(f, "latin1.json"),
                "latin1.json: not UTF-8 text (save the file as UTF-8)");
    }

    @Test
    void invalidValueIsTheKeyOfAnUntypedError() {
        renders(InputProblem.INVALID_VALUE, () -> {
            throw json("{\"a\": 1}").field("a").error("no reader would say this (it is a test)");
        }, "x.json:1:7: field 'a': no reader would say this (it is a test)");
    }

    @AfterAll
    static void everyKeyHasAMessageTest() {
        assertThat(SEEN).as("keys with a rendering test").containsExactlyInAnyOrder(InputProblem.values());
    }
}
