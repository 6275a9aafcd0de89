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
 * Cells are split on the delimiter detected from the header line (tab, then semicolon, then comma, else runs of
 * spaces); with any delimiter but the comma a decimal comma ("1,5") is read as a decimal point. A cell in double
 * quotes may hold the delimiter ({@code "F1, 2 nJ"}) and a doubled quote stands for one; a quoted cell ends on its
 * own line. This is the one tokenizer for every table ladderkin reads. Nothing holds more than one line.
 */
final class DelimitedLineReader implements AutoCloseable {

    private final BufferedReader in;
    private final String file;
    private int lineNumber;
    private char delimiter;
    /** Cells are separated by runs of spaces (and tabs), leading and trailing ones ignored. */
    private boolean whitespace;
    private boolean first = true;

    private DelimitedLineReader(BufferedReader in, String file) {
        this.in = in;
        this.file = file;
    }

    /** Reads text already in memory (a test, or a caller that holds the lines), naming it {@code displayName}. */
    static DelimitedLineReader of(String text, String displayName) {
        return new DelimitedLineReader(new BufferedReader(new java.io.StringReader(text)), displayName);
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

    /**
     * Chooses the delimiter from the header line, outside quoted cells: tab, then semicolon, then comma, else runs of
     * spaces between words.
     */
    void detectDelimiter(String headerLine) {
        boolean tab = false;
        boolean semicolon = false;
        boolean comma = false;
        boolean gap = false;
        boolean quoted = false;
        String t = headerLine.strip();
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                tab |= c == '\t';
                semicolon |= c == ';';
                comma |= c == ',';
                gap |= c == ' ';
            }
        }
        whitespace = false;
        if (tab) {
            delimiter = '\t';
        } else if (semicolon) {
            delimiter = ';';
        } else if (comma) {
            delimiter = ',';
        } else if (gap) {
            delimiter = ' ';
            whitespace = true;
        } else {
            throw new InputException(here(0), null, InputProblem.BAD_SYNTAX, "cannot find the column delimiter in the header "
                    + "line (separate columns with comma, semicolon, tab or spaces)");
        }
    }

    /**
     * Splits {@code line} into at most {@code cells.length} cells, quotes removed and doubled quotes made single;
     * writes each cell's 1-based start column into {@code starts}. Returns the number of cells found (which may
     * exceed the array length: the caller reports it).
     */
    int split(String line, String[] cells, int[] starts) {
        int[] from = new int[cells.length];
        int[] to = new int[cells.length];
        boolean[] quoted = new boolean[cells.length];
        int n = scan(line, from, to, starts, quoted);
        for (int c = 0; c < Math.min(n, cells.length); c++) {
            String text = line.substring(from[c], to[c]);
            cells[c] = quoted[c] ? text.replace("\"\"", "\"") : text;
            starts[c]++;
        }
        return n;
    }

    /**
     * Finds the cell boundaries of {@code line} without copying: cell c is {@code line[from[c], to[c])}, inside the
     * quotes for a quoted cell. Returns the number of cells found (which may exceed the array length: the caller
     * reports it).
     */
    int bounds(String line, int[] from, int[] to) {
        if (whitespace || line.indexOf('"') >= 0) {
            return scan(line, from, to, null, null);
        }
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

    /** Number of cells in {@code line}. */
    int count(String line) {
        return scan(line, new int[0], new int[0], null, null);
    }

    /**
     * The tokenizer: cell c's text is {@code line[from[c], to[c])} (inside the quotes when {@code quoted[c]}), its
     * first character at 0-based {@code starts[c]}; {@code starts} and {@code quoted} may be null.
     */
    private int scan(String line, int[] from, int[] to, int[] starts, boolean[] quoted) {
        int len = line.length();
        int i = 0;
        int n = 0;
        if (whitespace) {
            i = skipBlanks(line, 0);
            if (i == len) {
                return 0;
            }
        }
        while (true) {
            int cellStart = i;
            int j = whitespace ? i : skipSpaces(line, i);
            int cellFrom;
            int cellTo;
            boolean isQuoted = j < len && line.charAt(j) == '"';
            if (isQuoted) {
                int close = closingQuote(line, j);
                cellFrom = j + 1;
                cellTo = close;
                i = close + 1;
                int after = whitespace ? i : skipSpaces(line, i);
                if (after < len && !(whitespace ? isBlank(line.charAt(after)) : line.charAt(after) == delimiter)) {
                    throw new InputException(here(after + 1), null, InputProblem.BAD_SYNTAX, "text after the closing quote "
                            + "of the cell that starts at column " + (j + 1) + " (a quoted cell ends at its quote; "
                            + "write a quote inside it as \"\")");
                }
                i = after;
            } else {
                int end = i;
                if (whitespace) {
                    while (end < len && !isBlank(line.charAt(end))) {
                        end++;
                    }
                } else {
                    int at = line.indexOf(delimiter, i);
                    end = at < 0 ? len : at;
                }
                cellFrom = cellStart;
                cellTo = end;
                i = end;
            }
            if (n < from.length) {
                from[n] = cellFrom;
                to[n] = cellTo;
                if (starts != null) {
                    starts[n] = cellStart;
                }
                if (quoted != null) {
                    quoted[n] = isQuoted;
                }
            }
            n++;
            if (whitespace) {
                i = skipBlanks(line, i);
                if (i == len) {
                    return n;
                }
            } else {
                if (i >= len) {
                    return n;
                }
                i++;
            }
        }
    }

    /** The index of the quote that closes the cell opened at {@code open}, skipping doubled quotes. */
    private int closingQuote(String line, int open) {
        int k = open + 1;
        while (true) {
            int q = line.indexOf('"', k);
            if (q < 0) {
                throw new InputException(here(open + 1), null, InputProblem.BAD_SYNTAX, "the quoted cell that starts here "
                        + "is not closed on this line (close it with \"; a quoted cell cannot span lines)");
            }
            if (q + 1 < line.length() && line.charAt(q + 1) == '"') {
                k = q + 2;
            } else {
                return q;
            }
        }
    }

    private static int skipSpaces(String line, int i) {
        while (i < line.length() && line.charAt(i) == ' ') {
            i++;
        }
        return i;
    }

    private static int skipBlanks(String line, int i) {
        while (i < line.length() && isBlank(line.charAt(i))) {
            i++;
        }
        return i;
    }

    private static boolean isBlank(char c) {
        return c == ' ' || c == '\t';
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
                    + (delimiter == ',' && t.indexOf(',') >= 0 && looksNumeric(t.replace(',', '.'))
                    ? ": a decimal comma needs ';', tab or spaces as the column delimiter (or write a decimal point)"
                    : " (write a number such as 1.5e-3, or leave the cell empty / NaN for a missing value)"));
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
