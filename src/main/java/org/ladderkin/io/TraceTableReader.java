package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * Reads kinetic traces from a delimited table: the first column holds delays (unit in its header, e.g.
 * {@code delay (ps)}, {@code delay [ns]}, {@code t_ps}), every further column one trace named by its header. A column
 * headed {@code <name> err}, {@code <name>_err}, {@code <name> sigma} or {@code <name> ±} holds the one-sigma
 * uncertainties of trace {@code <name>}. Delimiter (comma, semicolon, tab), comments, BOM, decimal commas and missing
 * values as described in {@link DelimitedLineReader}. The file is streamed: memory is one line plus the numbers.
 */
public final class TraceTableReader {

    private static final String[] ERROR_SUFFIXES = {" err", "_err", " sigma", "_sigma", " ±", "±", " error", "_error"};

    private TraceTableReader() {
    }

    /** Reads one table; {@code displayName} is how messages name the file. */
    public static Dataset read(Path path, String displayName, TableOptions options) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return new Dataset(readTraces(in, options), List.of(displayName));
        }
    }

    /** Reads one table per file (e.g. one file per fluence) into one dataset, in the order given. */
    public static Dataset readAll(List<Path> paths, TableOptions options) {
        if (paths.isEmpty()) {
            throw new IllegalArgumentException("no files to read");
        }
        List<Trace> all = new ArrayList<>();
        List<String> names = new ArrayList<>();
        Set<String> labels = new HashSet<>();
        for (Path p : paths) {
            String name = p.toString();
            List<Trace> traces;
            try (DelimitedLineReader in = DelimitedLineReader.open(p, name)) {
                traces = readTraces(in, options);
            }
            for (Trace t : traces) {
                // one-file-per-fluence tables often all call their column "signal": the file then names the trace
                String label = traces.size() == 1 && paths.size() > 1 ? stem(p)
                        : labels.contains(t.label()) ? stem(p) + ":" + t.label() : t.label();
                if (!labels.add(label)) {
                    throw new InputException(SourceLocation.of(name), null, InputProblem.DUPLICATE, "trace label '" + label
                            + "' is used by an earlier file (rename the file or the column)");
                }
                all.add(t.withMetadata(new TraceMetadata(label, t.metadata().excitation(), t.metadata().photonEnergyJ())));
            }
            names.add(name);
        }
        return new Dataset(all, names);
    }

    static String stem(Path p) {
        String f = p.getFileName().toString();
        int dot = f.lastIndexOf('.');
        return dot > 0 ? f.substring(0, dot) : f;
    }

    private static List<Trace> readTraces(DelimitedLineReader in, TableOptions options) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected a header line such as 'delay (ps),1 nJ,2 nJ' and rows of numbers)");
        }
        in.detectDelimiter(header);
        int cellsPerRow = in.count(header);
        String[] names = new String[cellsPerRow];
        int[] starts = new int[cellsPerRow];
        in.split(header, names, starts);
        int headerLine = in.lineNumber();
        for (int c = 0; c < cellsPerRow; c++) {
            names[c] = unquote(names[c]);
        }
        // some programs end every line with a delimiter: an empty last header then means "no column", not a nameless one
        boolean trailingDelimiter = cellsPerRow > 2 && names[cellsPerRow - 1].isEmpty();
        int width = trailingDelimiter ? cellsPerRow - 1 : cellsPerRow;
        if (allNumeric(java.util.Arrays.copyOf(names, width))) {
            throw new InputException(in.here(0), null, InputProblem.MISSING_FIELD, "missing header line: the first line holds numbers "
                    + "(add a line naming the columns, e.g. 'delay (ps)" + in.delimiter() + "1 nJ" + in.delimiter() + "2 nJ')");
        }
        if (width < 2) {
            throw new InputException(in.here(0), null, InputProblem.EMPTY, "needs a delay column and at least one signal column");
        }
        Unit delayUnit = HeaderUnit.of(names[0], Dimension.TIME, options.defaultDelayUnit(), in.here(starts[0]), "--delay-unit");

        // column roles: signal columns become traces; error columns attach to the signal column they name
        int[] sigmaOf = new int[width];
        java.util.Arrays.fill(sigmaOf, -1);
        Map<String, Integer> signalByName = new HashMap<>();
        List<Integer> signalColumns = new ArrayList<>();
        for (int c = 1; c < width; c++) {
            String h = names[c].strip();
            if (h.isEmpty()) {
                throw new InputException(in.here(starts[c]), null, InputProblem.MISSING_FIELD, "column " + (c + 1) + " has an empty header (name every column)");
            }
            if (errorBase(h) == null) {
                if (signalByName.put(h, c) != null) {
                    throw new InputException(in.here(starts[c]), h, InputProblem.DUPLICATE, "two columns have this header (headers must be unique)");
                }
                signalColumns.add(c);
            }
        }
        for (int c = 1; c < width; c++) {
            String base = errorBase(names[c].strip());
            if (base != null) {
                Integer target = signalByName.get(base);
                if (target == null) {
                    throw new InputException(in.here(starts[c]), names[c].strip(), InputProblem.MISMATCH,
                            "uncertainty column for '" + base + "', but no column has that header");
                }
                sigmaOf[target] = c;
            }
        }
        if (signalColumns.isEmpty()) {
            throw new InputException(in.here(0), null, InputProblem.EMPTY, "no signal column (only uncertainty columns follow the delays)");
        }

        GrowableDoubles delays = new GrowableDoubles();
        GrowableDoubles[] columns = new GrowableDoubles[width];
        for (int c = 1; c < width; c++) {
            columns[c] = new GrowableDoubles();
        }
        int[] cellFrom = new int[cellsPerRow];
        int[] cellTo = new int[cellsPerRow];
        double factor = delayUnit.toSi(1) - delayUnit.toSi(0);
        double offset = delayUnit.toSi(0);
        double previous = Double.NaN;
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.bounds(line, cellFrom, cellTo);
            if (n != cellsPerRow || trailingDelimiter && !line.substring(cellFrom[width], cellTo[width]).isBlank()) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cell" + (n == 1 ? "" : "s") + " but the header at line "
                        + headerLine + " has " + cellsPerRow + (trailingDelimiter ? " (the last one empty)" : "")
                        + " (ragged row: check for a missing or extra delimiter)");
            }
            double d = in.number(line, cellFrom[0], cellTo[0], names[0].strip());
            if (Double.isNaN(d)) {
                throw new InputException(in.here(cellFrom[0] + 1), names[0].strip(), InputProblem.MISSING_VALUE, "missing delay (every row needs one)");
            }
            double dS = d * factor + offset;
            if (delays.size() > 0 && !(dS > previous)) {
                String what = dS == previous ? "duplicate delay " + fmt(d) + " " + delayUnit.symbol() + " (also at line " + previousLine + ")"
                        : "delay " + fmt(d) + " " + delayUnit.symbol() + " is smaller than " + fmt((previous - offset) / factor) + " "
                        + delayUnit.symbol() + " at line " + previousLine;
                throw new InputException(in.here(cellFrom[0] + 1), names[0].strip(), InputProblem.BAD_ORDER, what + " (delays must increase strictly down the file)");
            }
            delays.add(dS);
            previous = dS;
            previousLine = in.lineNumber();
            for (int c = 1; c < width; c++) {
                double v = in.number(line, cellFrom[c], cellTo[c], names[c].strip());
                if (Double.isNaN(v) && options.missing() == MissingValuePolicy.REJECT) {
                    throw new InputException(in.here(cellFrom[c] + 1), names[c].strip(), InputProblem.MISSING_VALUE,
                            "missing value (missing values are refused here; allow them to drop the point)");
                }
                columns[c].add(v);
            }
        }
        if (delays.size() < TraceAssembler.MIN_POINTS) {
            throw new InputException(new SourceLocation(in.file(), in.lineNumber(), 0), null, InputProblem.EMPTY, "only " + delays.size()
                    + " data row" + (delays.size() == 1 ? "" : "s") + " (a trace needs at least " + TraceAssembler.MIN_POINTS + " delays)");
        }
        List<Trace> traces = new ArrayList<>();
        // a column whose header names mOD or µOD is read in OD (an uncertainty column shares its signal's unit)
        for (int c : signalColumns) {
            String h = names[c].strip();
            double toOd = HeaderUnit.signalToOd(h);
            GrowableDoubles signal = scaled(columns[c], toOd);
            GrowableDoubles sigma = sigmaOf[c] < 0 ? null : scaled(columns[sigmaOf[c]], toOd);
            traces.add(TraceAssembler.assemble(new SourceLocation(in.file(), headerLine, starts[c]), h, HeaderUnit.signalName(h),
                    delays, signal, sigma));
        }
        return traces;
    }

    private static GrowableDoubles scaled(GrowableDoubles values, double factor) {
        if (Double.isNaN(factor) || factor == 1) {
            return values;
        }
        GrowableDoubles out = new GrowableDoubles();
        for (int i = 0; i < values.size(); i++) {
            out.add(values.get(i) * factor);
        }
        return out;
    }

    /** The header text without surrounding spaces and double quotes (spreadsheets quote headers). */
    static String unquote(String cell) {
        String t = cell.strip();
        return t.length() >= 2 && t.charAt(0) == '"' && t.charAt(t.length() - 1) == '"' ? t.substring(1, t.length() - 1).strip() : t;
    }

    private static String errorBase(String header) {
        String lower = header.toLowerCase(Locale.ROOT);
        for (String s : ERROR_SUFFIXES) {
            if (lower.endsWith(s) && header.length() > s.length()) {
                return header.substring(0, header.length() - s.length()).strip();
            }
        }
        return null;
    }

    private static boolean allNumeric(String[] cells) {
        for (String c : cells) {
            String t = c.strip().replace(',', '.');
            if (t.isEmpty()) {
                return false;
            }
            try {
                Double.parseDouble(t);
            } catch (NumberFormatException e) {
                return false;
            }
        }
        return true;
    }

    private static String fmt(double v) {
        return String.valueOf(v).replaceAll("\\.0$", "");
    }
}
