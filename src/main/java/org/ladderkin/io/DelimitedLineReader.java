package org.ladderkin.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.io.InputStreamReader;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/**
 * Streams the content lines of a delimited text table one at a time: a UTF-8 byte-order mark is removed, blank lines
 * and comment lines (starting with {@code #} or {@code %}) are skipped, and line numbers are kept for messages.
 * Cells are split on the delimiter detected from the header line (tab, then semicolon, then comma); with tab or
 * semicolon delimiters a decimal comma ("1,5") is read as a decimal point. Nothing holds more than one line.
 */
final class DelimitedLineReader implements AutoCloseable {

    private final BufferedReader in;
    private final String file;
    private int lineNumber;
    private char delimiter;
    private boolean first = true;

    private DelimitedLineReader(BufferedReader in, String file) {
        this.in = in;
        this.file = file;
    }

    /** Opens {@code path}, naming it {@code displayName} in messages. */
    static DelimitedLineReader open(Path path, String displayName) {
        try {
            var decoder = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
            BufferedReader r = new BufferedReader(new InputStreamReader(Files.newInputStream(path), decoder), 1 << 16);
            return new DelimitedLineReader(r, displayName);
        } catch (NoSuchFileException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.NOT_FOUND, "file not found");
        } catch (IOException e) {
            throw new InputException(SourceLocation.of(displayName), null, InputProblem.UNREADABLE, "cannot read file: " + e.getMessage());
        }
    }

    String file() {
        return file;
    }

    /** Line number (from 1) of the line last returned. */
    int lineNumber() {
        return lineNumber;
    }

    char delimiter() {
        return delimiter;
    }

    /** A location on the current line. */
    SourceLocation here(int column) {
        return new SourceLocation(file, lineNumber, column);
    }

    /** The next non-blank, non-comment line, or null at the end of the file. */
    String nextContentLine() {
        try {
            String line;
            while ((line = in.readLine()) != null) {
                lineNumber++;
                if (first) {
                    first = false;
                    if (!line.isEmpty() && line.charAt(0) == '\uFEFF') {
                        line = line.substring(1);
                    }
                }
                String t = line.strip();
                if (t.isEmpty() || t.charAt(0) == '#' || t.charAt(0) == '%') {
                    continue;
                }
                return line;
            }
            return null;
        } catch (CharacterCodingException e) {
            throw new InputException(new SourceLocation(file, lineNumber + 1, 0), null, InputProblem.UNREADABLE, "not UTF-8 text (save the file as UTF-8)");
        } catch (IOException e) {
            throw new InputException(new SourceLocation(file, lineNumber, 0), null, InputProblem.UNREADABLE, "cannot read file: " + e.getMessage());
        }
    }

    /** Chooses the delimiter from the header line: tab, then semicolon, then comma. */
    void detectDelimiter(String headerLine) {
        if (headerLine.indexOf('\t') >= 0) {
            delimiter = '\t';
        } else if (headerLine.indexOf(';') >= 0) {
            delimiter = ';';
        } else if (headerLine.indexOf(',') >= 0) {
            delimiter = ',';
        } else {
            throw new InputException(here(0), null, InputProblem.BAD_SYNTAX,
                    "cannot find the column delimiter in the header line (separate columns with comma, semicolon or tab)");
        }
    }

    /**
     * Splits {@code line} into at most {@code cells.length} cells; writes each cell's 1-based start column into
     * {@code starts}. Returns the number of cells found (which may exceed the array length: the caller reports it).
     */
    int split(String line, String[] cells, int[] starts) {
        int n = 0;
        int from = 0;
        int len = line.length();
        while (true) {
            int at = line.indexOf(delimiter, from);
            int end = at < 0 ? len : at;
            if (n < cells.length) {
                cells[n] = line.substring(from, end);
                starts[n] = from + 1;
            }
            n++;
            if (at < 0) {
                return n;
            }
            from = at + 1;
        }
    }

    /**
     * Finds the cell boundaries of {@code line} without copying: cell c is {@code line[from[c], to[c])}. Returns the
     * number of cells found (which may exceed the array length: the caller reports it).
     */
    int bounds(String line, int[] from, int[] to) {
        int n = 0;
        int start = 0;
        int len = line.length();
        while (true) {
            int at = line.indexOf(delimiter, start);
            int end = at < 0 ? len : at;
            if (n < from.length) {
                from[n] = start;
                to[n] = end;
            }
            n++;
            if (at < 0) {
                return n;
            }
            start = at + 1;
        }
    }

    /** The number in {@code line[from, to)}: the exact fast path for plain decimals, else {@link #number(String, int, String)}. */
    double number(String line, int from, int to, String field) {
        int a = from;
        int b = to;
        while (a < b && line.charAt(a) <= ' ') {
            a++;
        }
        while (b > a && line.charAt(b - 1) <= ' ') {
            b--;
        }
        if (a == b) {
            return Double.NaN;
        }
        double v = DecimalParser.tryParse(line, a, b, delimiter != ',');
        return Double.isNaN(v) ? number(line.substring(from, to), from + 1, field) : v;
    }

    /** Number of cells in {@code line}. */
    int count(String line) {
        int n = 1;
        for (int i = 0; i < line.length(); i++) {
            if (line.charAt(i) == delimiter) {
                n++;
            }
        }
        return n;
    }

    /** Whether {@code cell} spells a missing value: empty, NaN, nan, NA, N/A. */
    static boolean isMissing(String cell) {
        String t = cell.strip();
        return t.isEmpty() || t.equalsIgnoreCase("nan") || t.equals("NA") || t.equalsIgnoreCase("n/a");
    }

    /**
     * The number in {@code cell}, NaN for a missing value, or an {@link InputException} at the cell naming
     * {@code field}.
     */
    double number(String cell, int column, String field) {
        if (isMissing(cell)) {
            return Double.NaN;
        }
        String t = cell.strip();
        if (t.length() >= 2 && t.charAt(0) == '"' && t.charAt(t.length() - 1) == '"') {
            t = t.substring(1, t.length() - 1).strip();
        }
        if (delimiter != ',' && t.indexOf(',') >= 0) {
            t = t.replace(',', '.');
        }
        if (!looksNumeric(t)) {
            throw new InputException(here(column), field, InputProblem.BAD_NUMBER, "'" + cell.strip() + "' is not a number"
                    + (delimiter == ',' && t.indexOf(',') >= 0 ? " (a decimal comma needs ';' or tab as the delimiter)" : "")
                    + " (write a number such as 1.5e-3, or leave the cell empty / NaN for a missing value)");
        }
        try {
            double v = Double.parseDouble(t);
            if (Double.isInfinite(v)) {
                throw new InputException(here(column), field, InputProblem.OUT_OF_RANGE, "'" + cell.strip() + "' is out of range for a double");
            }
            return v;
        } catch (NumberFormatException e) {
            throw new InputException(here(column), field, InputProblem.BAD_NUMBER, "'" + cell.strip() + "' is not a number");
        }
    }

    /** Digits, one optional sign, point and exponent: rejects what parseDouble would also take (Infinity, 1d, 0x1p3). */
    private static boolean looksNumeric(String t) {
        if (t.isEmpty()) {
            return false;
        }
        boolean digit = false;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c >= '0' && c <= '9') {
                digit = true;
            } else if (c != '.' && c != '-' && c != '+' && c != 'e' && c != 'E') {
                return false;
            }
        }
        return digit;
    }

    @Override
    public void close() {
        try {
            in.close();
        } catch (IOException e) {
            // nothing was written; a failed close of an input file loses nothing
        }
    }
}
