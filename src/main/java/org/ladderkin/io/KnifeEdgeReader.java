package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ladderkin.excite.beam.KnifeEdgeScan;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;
import org.ladderkin.units.Unit;

/**
 * Reads knife-edge scans: a delimited table (comma, semicolon or tab; {@code #} and {@code %} comments, BOM and
 * decimal commas as in {@link DelimitedLineReader}) whose first column is the blade position with its length unit in
 * the header ({@code position (µm)}, {@code x [mm]}, {@code blade_um}) and whose further columns are the transmitted
 * power of one scan each, in any unit (only the shape matters). A power column's header may say which axis it scans
 * (a word {@code x} or {@code y}, e.g. {@code power y (mW)}; x when it says neither) and where along the beam it was
 * taken ({@code z=1.5mm}). Positions must increase or decrease strictly; no cell may be empty.
 */
public final class KnifeEdgeReader {

    private static final Pattern Z = Pattern.compile("(?i)(?<![a-z0-9])z\\s*=\\s*([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?\\s*[a-zA-Zµμ]+)");
    private static final Pattern AXIS_WORD = Pattern.compile("(?i)(?<![a-z0-9])([xy])(?![a-z0-9])");

    /**
     * One scan of the table.
     *
     * @param label  the power column's header
     * @param axis   "x" or "y"
     * @param zM     position along the beam from the header, NaN when the header gives none
     * @param scan   positions and powers
     * @param header where the column's header cell is, for messages about the scan as a whole
     */
    public record Scan(String label, String axis, double zM, KnifeEdgeScan scan, SourceLocation header) {
    }

    private KnifeEdgeReader() {
    }

    /** Reads {@code path}, naming it {@code displayName} in messages. */
    public static List<Scan> read(Path path, String displayName) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in);
        }
    }

    private static List<Scan> read(DelimitedLineReader in) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected a header line such as 'position (µm),power (mW)' and rows of numbers)");
        }
        in.detectDelimiter(header);
        int columns = in.count(header);
        String[] names = new String[columns];
        int[] starts = new int[columns];
        in.split(header, names, starts);
        if (columns < 2) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "a knife-edge table needs a position column and at "
                    + "least one power column");
        }
        int headerLine = in.lineNumber();
        String positionName = TraceTableReader.unquote(names[0]);
        Unit unit = positionUnit(positionName, in.here(starts[0]));
        double factor = unit.toSi(1) - unit.toSi(0);
        String[] axes = new String[columns];
        double[] zs = new double[columns];
        for (int c = 1; c < columns; c++) {
            names[c] = TraceTableReader.unquote(names[c]);
            SourceLocation at = in.here(starts[c]);
            if (names[c].isEmpty()) {
                throw new InputException(at, null, InputProblem.MISSING_FIELD, "column " + (c + 1) + " has an empty header (name the "
                        + "power column, e.g. 'power x z=0mm (mW)')");
            }
            axes[c] = axis(names[c]);
            zs[c] = z(names[c], at);
        }
        GrowableDoubles positions = new GrowableDoubles();
        GrowableDoubles[] powers = new GrowableDoubles[columns];
        for (int c = 1; c < columns; c++) {
            powers[c] = new GrowableDoubles();
        }
        int[] from = new int[columns];
        int[] to = new int[columns];
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.bounds(line, from, to);
            if (n != columns) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cell" + (n == 1 ? "" : "s")
                        + " but the header has " + columns + " (check for a missing or extra delimiter)");
            }
            double x = in.number(line, from[0], to[0], positionName);
            if (Double.isNaN(x)) {
                throw new InputException(in.here(from[0] + 1), positionName, InputProblem.MISSING_VALUE,
                        "missing blade position (every row needs one)");
            }
            double xM = x * factor;
            int size = positions.size();
            if (size >= 1) {
                double last = positions.last();
                boolean wrong = xM == last || size >= 2 && Math.signum(xM - last) != Math.signum(last - positions.get(size - 2));
                if (wrong) {
                    throw new InputException(in.here(from[0] + 1), positionName, InputProblem.BAD_ORDER, String.format(Locale.ROOT,
                            "blade position %s %s %s %s %s at line %d (positions must increase or decrease strictly down the file)",
                            fmt(x), unit.symbol(), xM == last ? "repeats the position" : "turns back from", fmt(last / factor), unit.symbol(),
                            previousLine));
                }
            }
            positions.add(xM);
            for (int c = 1; c < columns; c++) {
                double p = in.number(line, from[c], to[c], names[c]);
                if (Double.isNaN(p)) {
                    throw new InputException(in.here(from[c] + 1), names[c], InputProblem.MISSING_VALUE,
                            "missing power (a knife-edge scan has no gaps)");
                }
                powers[c].add(p);
            }
            previousLine = in.lineNumber();
        }
        if (positions.size() < KnifeEdgeScan.MIN_POINTS) {
            throw new InputException(new SourceLocation(in.file(), Math.max(1, in.lineNumber()), 0), null, InputProblem.EMPTY,
                    "only " + positions.size() + " data row" + (positions.size() == 1 ? "" : "s") + " (a knife-edge fit needs at least "
                    + KnifeEdgeScan.MIN_POINTS + " positions across the beam)");
        }
        List<Scan> scans = new ArrayList<>();
        double[] x = positions.toArray();
        for (int c = 1; c < columns; c++) {
            scans.add(new Scan(names[c], axes[c], zs[c], new KnifeEdgeScan(x, powers[c].toArray()),
                    new SourceLocation(in.file(), headerLine, starts[c])));
        }
        return scans;
    }

    /** "x" or "y" when the header names one of them as a word, else "x". */
    static String axis(String name) {
        String found = null;
        Matcher m = AXIS_WORD.matcher(HeaderUnit.name(name));
        while (m.find()) {
            String a = m.group(1).toLowerCase(Locale.ROOT);
            if (found == null) {
                found = a;
            }
        }
        return found == null ? "x" : found;
    }

    /** The position along the beam a header gives as {@code z=1.5mm}, or NaN. */
    private static double z(String name, SourceLocation at) {
        Matcher m = Z.matcher(name);
        if (!m.find()) {
            return Double.NaN;
        }
        try {
            return Quantity.parseSi(m.group(1), Dimension.LENGTH);
        } catch (QuantityFormatException e) {
            throw new InputException(at, name, InputProblem.of(e), "z in the header: " + e.getMessage());
        }
    }

    private static Unit positionUnit(String header, SourceLocation where) {
        try {
            return HeaderUnit.of(header, Dimension.LENGTH, null, where, "");
        } catch (InputException e) {
            if (e.key() == InputProblem.WRONG_UNIT) {
                throw new InputException(where, header, InputProblem.WRONG_UNIT,
                        "no length unit in the header of the blade position (write it like 'position (µm)')");
            }
            throw e;
        }
    }

    static String fmt(double x) {
        return org.ladderkin.material.Numbers.sig(x, 6);
    }
}
