package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.ladderkin.io.InputAssertions.input;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Trace;

/**
 * The one tokenizer every table reader shares ({@link DelimitedLineReader}): quoted cells may hold the delimiter,
 * delimiters are detected outside quotes, decimal commas follow the delimiter, and errors keep file, line and column.
 */
class QuotedTableTest {

    @TempDir
    Path dir;

    private Dataset traces(String text) throws IOException {
        Path p = dir.resolve("t.csv");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return TraceTableReader.read(p, "t.csv", TableOptions.defaults());
    }

    private static List<String> cells(String header, String line) {
        try (DelimitedLineReader in = DelimitedLineReader.of(header, "x.csv")) {
            in.detectDelimiter(in.nextContentLine());
            String[] cells = new String[in.count(line)];
            in.split(line, cells, new int[cells.length]);
            return List.of(cells);
        }
    }

    @Test
    void aQuotedHeaderCellKeepsItsComma() throws IOException {
        Dataset d = traces("delay (ps),\"F1, 2 nJ\",\"F2, 4 nJ\"\n0,1.0,2.0\n10,0.5,0.7\n100,0.2,0.25\n");
        assertThat(d.labels()).containsExactly("F1, 2 nJ", "F2, 4 nJ");
        assertThat(d.traces().get(1).signal()).containsExactly(2.0, 0.7, 0.25);
    }

    @Test
    void quotedValuesAndDoubledQuotesRead() throws IOException {
        Dataset d = traces("\"delay (ps)\",\"F1 \"\"thin\"\"\"\n\"0\",\"1.5\"\n \"10\" , \"0.5\"\n100,\"2e-1\"\n");
        assertThat(d.labels()).containsExactly("F1 \"thin\"");
        Trace t = d.traces().get(0);
        assertThat(t.delaysS()).containsExactly(0, 10e-12, 100e-12);
        assertThat(t.signal()).containsExactly(1.5, 0.5, 0.2);
    }

    @Test
    void semicolonTablesTakeDecimalCommas() throws IOException {
        Dataset d = traces("delay (ps);\"F1; 2 nJ\";F2\n0;1,5;2\n0,5;0,25;1e-1\n10;0,125;\"0,5\"\n");
        assertThat(d.labels()).containsExactly("F1; 2 nJ", "F2");
        assertThat(d.traces().get(0).delaysS()).containsExactly(0, 0.5e-12, 10e-12);
        assertThat(d.traces().get(0).signal()).containsExactly(1.5, 0.25, 0.125);
        assertThat(d.traces().get(1).signal()).containsExactly(2, 0.1, 0.5);
    }

    @Test
    void tabTablesKeepCommasAndSpacesInsideCells() throws IOException {
        Dataset d = traces("delay (ps)\tF1, 2 nJ\tF2 4 nJ\n0\t1,5\t2\n1\t0,5\t1\n2\t0,25\t0,5\n");
        assertThat(d.labels()).containsExactly("F1, 2 nJ", "F2 4 nJ");
        assertThat(d.traces().get(0).signal()).containsExactly(1.5, 0.5, 0.25);
    }

    @Test
    void runsOfSpacesSeparateWhenNothingElseDoes() throws IOException {
        Dataset d = traces("  \"delay (ps)\"   F1    F2\n 0  1,5   2\n1 0.5  1  \n2\t0.25 0.5\n");
        assertThat(d.labels()).containsExactly("F1", "F2");
        assertThat(d.traces().get(0).signal()).containsExactly(1.5, 0.5, 0.25);
        assertThat(d.traces().get(1).signal()).containsExactly(2, 1, 0.5);
    }

    @Test
    void delimitersInsideQuotesDoNotChooseTheDelimiter() {
        assertThat(cells("\"a;b\",c", "\"x;y\",1")).containsExactly("x;y", "1");
        assertThat(cells("a,b", "1,,\"\"")).containsExactly("1", "", "");
        assertThat(cells("a;b", "\"\"\"\";2")).containsExactly("\"", "2");
        // a quote inside an unquoted cell is an ordinary character
        assertThat(cells("a,b", "5\" disk,2")).containsExactly("5\" disk", "2");
    }

    @Test
    void errorsNameFileLineAndColumn() {
        assertThatThrownBy(() -> traces("delay (ps),\"F1, 2 nJ\n0,1\n1,2\n2,3\n"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "t.csv:1:12", null))
                .hasMessageContaining("not closed on this line");
        assertThatThrownBy(() -> traces("delay (ps),F1\n0,1\n1,\"2\"x\n2,3\n"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "t.csv:3:6", null))
                .hasMessageContaining("text after the closing quote");
        assertThatThrownBy(() -> traces("delay (ps),\"F1, 2 nJ\"\n0,1\n1,\"abc\"\n2,3\n"))
                .satisfies(input(InputProblem.BAD_NUMBER, "t.csv:3:4", "F1, 2 nJ"));
        assertThatThrownBy(() -> traces("delay (ps),\"F1, 2 nJ\"\n0,1\n1,\"2,5\"\n2,3\n"))
                .satisfies(input(InputProblem.BAD_NUMBER, "t.csv:3:4", "F1, 2 nJ"))
                .hasMessageEndingWith("'2,5' is not a number: a decimal comma needs ';', tab or spaces as the column delimiter (or write a decimal point)");
        assertThatThrownBy(() -> traces("delay (ps),\"F1, 2 nJ\"\n0,1\n1,2,3\n2,3\n"))
                .satisfies(input(InputProblem.BAD_SYNTAX, "t.csv:3", null))
                .hasMessageContaining("row has 3 cells but the header at line 1 has 2");
    }
}
