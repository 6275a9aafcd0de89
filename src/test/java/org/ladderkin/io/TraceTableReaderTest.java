package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;
import static org.assertj.core.api.Assertions.within;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Trace;
import org.ladderkin.units.Units;

class TraceTableReaderTest {

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    private Dataset read(String text) throws IOException {
        return TraceTableReader.read(write("data.csv", text), "data.csv", TableOptions.defaults());
    }

    @Test
    void readsCommaTableWithUnitInHeader() throws IOException {
        Dataset d = read("delay (ps),1 nJ,3 nJ\n-1,0.0,0.1\n0,1.0,2.0\n10,0.5,0.7\n100,0.2,0.25\n");
        assertThat(d.labels()).containsExactly("1 nJ", "3 nJ");
        Trace t = d.traces().get(1);
        assertThat(t.delaysS()).containsExactly(-1e-12, 0, 10e-12, 100e-12);
        assertThat(t.signal()).containsExactly(0.1, 2.0, 0.7, 0.25);
        assertThat(t.hasUncertainty()).isFalse();
        assertThat(d.sourceFiles()).containsExactly("data.csv");
    }

    @Test
    void signalHeadersInMilliAndMicroOdAreReadInOd() throws IOException {
        Dataset d = read("delay (ps),1 nJ [mOD],1 nJ [mOD] err,2 nJ (µOD),J3 mOD,J4\n0,149.6,2,300,1.5,0.2\n10,100,2,200,1,0.1\n"
                + "100,50,2,100,0.5,0.05\n");
        assertThat(d.labels()).containsExactly("1 nJ", "2 nJ", "J3", "J4");
        assertThat(d.traces().get(0).signal()[0]).isCloseTo(0.1496, within(1e-12));
        assertThat(d.traces().get(0).sigma()[0]).isCloseTo(0.002, within(1e-12));
        assertThat(d.traces().get(1).signal()[0]).isCloseTo(3e-4, within(1e-15));
        assertThat(d.traces().get(2).signal()[0]).isCloseTo(1.5e-3, within(1e-15));
        // no unit: the values stay as written
        assertThat(d.traces().get(3).signal()[0]).isEqualTo(0.2);
    }

    @Test
    void acceptsBomCommentsBlankLinesAndSemicolonWithDecimalComma() throws IOException {
        Dataset d = read("\uFEFF# exported 2026-11-30\n% second comment\n\ndelay [ns];a;b\n0;1,5;2\n\n1;1,0;1\n# mid comment\n2;0,5;0,1\n");
        assertThat(d.traces().get(0).delaysS()).containsExactly(0, 1e-9, 2e-9);
        assertThat(d.traces().get(0).signal()).containsExactly(1.5, 1.0, 0.5);
    }

    @Test
    void acceptsTabsAndUnderscoreUnits() throws IOException {
        Dataset d = read("t_fs\tx\n1\t3\n2\t2\n4\t1,5\n");
        assertThat(d.traces().get(0).delaysS()[2]).isCloseTo(4e-15, within(1e-30));
        assertThat(d.traces().get(0).signal()[2]).isEqualTo(1.5);
    }

    @Test
    void quotedHeadersAndTrailingDelimitersAreAccepted() throws IOException {
        Dataset d = read("\"delay (ps)\",\"1 nJ\",\"2 nJ\",\r\n0,1,2,\r\n1,0.5,1,\r\n2,0.25,0.5,\r\n");
        assertThat(d.labels()).containsExactly("1 nJ", "2 nJ");
        assertThat(d.traces().get(1).signal()).containsExactly(2, 1, 0.5);
        Path p = write("t.csv", "delay (ps),a,b,\n0,1,2,\n1,0.5,1,9\n2,0.25,0.5,\n");
        assertThatThrownBy(() -> TraceTableReader.read(p, "t.csv", TableOptions.defaults()))
                .satisfies(input(InputProblem.BAD_SYNTAX, "t.csv:3", null));
    }

    @Test
    void headerWithoutUnitTakesTheDefault() throws IOException {
        Path p = write("d.csv", "delay,x\n1,3\n2,2\n3,1\n");
        Dataset d = TraceTableReader.read(p, "d.csv", new TableOptions(Units.of("ns"), MissingValuePolicy.DROP));
        assertThat(d.traces().get(0).delaysS()[2]).isCloseTo(3e-9, within(1e-24));
        assertThatThrownBy(() -> TraceTableReader.read(p, "d.csv", TableOptions.defaults()))
                .satisfies(input(InputProblem.WRONG_UNIT, "d.csv:1:1", "delay"));
    }

    @Test
    void missingValuesAreDroppedPerTraceAndCounted() throws IOException {
        Dataset d = read("delay (ps),a,b\n0,1,\n1,NaN,2\n2,0.5,nan\n3,0.2,NA\n4,0.1,1\n5,0.05,0.5\n");
        assertThat(d.traces().get(0).size()).isEqualTo(5);
        assertThat(d.traces().get(0).droppedMissing()).isEqualTo(1);
        assertThat(d.traces().get(1).delaysS()).containsExactly(1e-12, 4e-12, 5e-12);
        assertThat(d.traces().get(1).droppedMissing()).isEqualTo(3);
        assertThat(d.droppedMissing()).isEqualTo(4);
        assertThat(d.missingSummary()).isEqualTo("dropped 4 missing values (a: 1, b: 3)");
    }

    @Test
    void missingValuesCanBeRefused() throws IOException {
        Path p = write("m.csv", "delay (ps),a\n0,1\n1,\n2,0.5\n");
        assertThatThrownBy(() -> TraceTableReader.read(p, "m.csv", new TableOptions(null, MissingValuePolicy.REJECT)))
                .satisfies(input(InputProblem.MISSING_VALUE, "m.csv:3:3", "a"));
    }

    @Test
    void uncertaintyColumnsAttachToTheirTrace() throws IOException {
        Dataset d = read("delay (ps),a,a err,b\n0,1,0.1,2\n1,0.5,0.05,1\n2,0.2,0.02,0.5\n");
        assertThat(d.labels()).containsExactly("a", "b");
        assertThat(d.traces().get(0).sigma()).containsExactly(0.1, 0.05, 0.02);
        assertThat(d.traces().get(1).hasUncertainty()).isFalse();
    }

    @Test
    void oneFilePerFluenceIsLabelledByFileName() throws IOException {
        Path a = write("low.csv", "delay (ps),signal\n0,1\n1,0.5\n2,0.2\n");
        Path b = write("high.tsv", "delay (ps)\tsignal\n0\t2\n1\t1\n2\t0.1\n");
        Dataset d = TraceTableReader.readAll(List.of(a, b), TableOptions.defaults());
        assertThat(d.labels()).containsExactly("low", "high");
        assertThat(d.sourceFiles()).hasSize(2);
    }

    static Stream<Arguments> badTables() {
        return Stream.of(
                Arguments.of("non-numeric cell", "delay (ps),a\n0,1\n1,abc\n2,0.5\n",
                        "data.csv:3:3: field 'a': 'abc' is not a number"),
                Arguments.of("decimal comma with comma delimiter", "delay (ps),a\n0,1\n1,\"0,5\"\n2,0.5\n",
                        "data.csv:3:4: field 'a': '0,5' is not a number: a decimal comma needs ';', tab or spaces as the column delimiter"),
                Arguments.of("unsorted delays", "delay (ps),a\n0,1\n2,0.5\n1,0.7\n",
                        "data.csv:4:1: field 'delay (ps)': delay 1 ps is smaller than 2 ps at line 3"),
                Arguments.of("duplicate delays", "delay (ps),a\n0,1\n1,0.5\n1,0.7\n",
                        "data.csv:4:1: field 'delay (ps)': duplicate delay 1 ps (also at line 3)"),
                Arguments.of("constant column", "delay (ps),a,b\n0,1,0.5\n1,0.5,0.5\n2,0.2,0.5\n",
                        "data.csv:1:14: field 'b': all 3 values equal 0.5 (a constant column carries no kinetics"),
                Arguments.of("all-NaN trace", "delay (ps),a,b\n0,1,NaN\n1,0.5,nan\n2,0.2,\n",
                        "data.csv:1:14: field 'b': no numeric values in this column (all 3 are missing)"),
                Arguments.of("two-row file", "delay (ps),a\n0,1\n1,0.5\n",
                        "data.csv:3: only 2 data rows (a trace needs at least 3 delays)"),
                Arguments.of("ragged row", "delay (ps),a,b\n0,1,2\n1,0.5\n2,0.2,0.1\n",
                        "data.csv:3: row has 2 cells but the header at line 1 has 3"),
                Arguments.of("missing header", "0,1,2\n1,0.5,1\n2,0.2,0.1\n",
                        "data.csv:1: missing header line: the first line holds numbers"),
                Arguments.of("missing header, trailing delimiters", "0,1,2,\n1,0.5,1,\n2,0.2,0.1,\n",
                        "data.csv:1: missing header line: the first line holds numbers"),
                Arguments.of("unknown unit", "delay (pz),a\n0,1\n1,0.5\n2,0.2\n",
                        "data.csv:1:1: field 'delay (pz)': unknown time unit 'pz' in header (units: fs, ps, ns"),
                Arguments.of("length unit in delay header", "delay (nm),a\n0,1\n1,0.5\n2,0.2\n",
                        "data.csv:1:1: field 'delay (nm)': unknown time unit 'nm' in header"),
                Arguments.of("missing delay", "delay (ps),a\n0,1\n,0.5\n2,0.2\n",
                        "data.csv:3:1: field 'delay (ps)': missing delay"),
                Arguments.of("infinity is not a number", "delay (ps),a\n0,1\n1,Infinity\n2,0.2\n",
                        "data.csv:3:3: field 'a': 'Infinity' is not a number"),
                Arguments.of("overflowing number", "delay (ps),a\n0,1\n1,1e400\n2,0.2\n",
                        "data.csv:3:3: field 'a': '1e400' is out of range for a double"),
                Arguments.of("empty file", "# only a comment\n\n",
                        "data.csv: no data (expected a header line"),
                Arguments.of("duplicate header", "delay (ps),a,a\n0,1,1\n1,0.5,2\n2,0.2,3\n",
                        "data.csv:1:14: field 'a': two columns have this header"),
                Arguments.of("orphan uncertainty", "delay (ps),a,b err\n0,1,1\n1,0.5,2\n2,0.2,3\n",
                        "data.csv:1:14: field 'b err': uncertainty column for 'b', but no column has that header"),
                Arguments.of("too few values after dropping", "delay (ps),a,b\n0,1,1\n1,0.5,\n2,0.2,\n3,0.1,2\n",
                        "data.csv:1:14: field 'b': only 2 numeric values in this column (a trace needs at least 3)"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badTables")
    void badTablesGiveOneLocatedMessage(String what, String text, String messageStart) throws IOException {
        Path p = write("data.csv", text);
        assertThatThrownBy(() -> TraceTableReader.read(p, "data.csv", TableOptions.defaults()))
                .isInstanceOf(InputException.class)
                .hasMessageStartingWith(messageStart)
                .hasMessageNotContaining("\n");
    }

    @Test
    void notUtf8IsRefused() throws IOException {
        Path p = dir.resolve("latin1.csv");
        Files.write(p, "delay (ps),\u00e9\n0,1\n1,2\n2,3\n".getBytes(StandardCharsets.ISO_8859_1));
        assertThatThrownBy(() -> TraceTableReader.read(p, "latin1.csv", TableOptions.defaults()))
                .satisfies(input(InputProblem.UNREADABLE, "latin1.csv:1", null));
    }

    @Test
    void missingFileIsOneMessage() {
        assertThatThrownBy(() -> TraceTableReader.read(dir.resolve("nope.csv"), "nope.csv", TableOptions.defaults()))
                .satisfies(input(InputProblem.NOT_FOUND, "nope.csv", null));
    }

    @Test
    void streamsAMillionRows() throws IOException {
        // short integer-valued cells keep writing the file cheap; reading still goes through the full cell path
        int rows = 1_000_000;
        Path p = dir.resolve("big.csv");
        try (BufferedWriter w = Files.newBufferedWriter(p, StandardCharsets.UTF_8)) {
            w.write("delay (fs),a,b\n");
            StringBuilder line = new StringBuilder(32);
            for (int i = 0; i < rows; i++) {
                line.setLength(0);
                line.append(i).append(',').append(i % 977).append(".5,");
                if (i % 1000 == 7) {
                    line.append("NaN");
                } else {
                    line.append(-(i % 613));
                }
                w.append(line).append('\n');
            }
        }
        Dataset d = TraceTableReader.read(p, "big.csv", TableOptions.defaults());
        assertThat(d.traces().get(0).size()).isEqualTo(rows);
        assertThat(d.traces().get(1).droppedMissing()).isEqualTo(rows / 1000);
        assertThat(d.traces().get(1).size()).isEqualTo(rows - rows / 1000);
        assertThat(d.traces().get(0).delaysS()[rows - 1]).isCloseTo((rows - 1) * 1e-15, within(1e-24));
        assertThat(d.traces().get(0).signal()[123456]).isEqualTo(123456 % 977 + 0.5);
        assertThat(d.traces().get(1).signal()[999]).isEqualTo(-(1000 % 613));
    }
}
