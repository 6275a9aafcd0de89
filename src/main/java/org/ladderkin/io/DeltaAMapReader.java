package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.map.DeltaAMap;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Unit;

/**
 * Reads a whole ΔA(λ, t) map: the first row one axis, the first column the other, the corner cell naming units
 * ("delay (ps) \ wavelength (nm)", "delay (ps) \ energy (eV) ΔT/T"). The spectral axis may be wavelengths or photon
 * energies, in either direction; the map keeps wavelengths ascending. Orientation as in {@link TaMatrixReader}.
 * Missing cells stay as NaN. The file is streamed line by line into one growing array of doubles (a transposed file
 * costs one more copy at the end).
 */
public final class DeltaAMapReader {

    private DeltaAMapReader() {
    }

    /** Reads one map; {@code displayName} is how messages name the file. */
    public static DeltaAMap read(Path path, String displayName, MapOptions options) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in, options, new int[1]);
        }
    }

    /**
     * Reads one map per fluence, in the order given. Spectra are shared across a series, so every map must have the
     * first one's wavelengths; a map that differs is refused at its axis line (resample the maps to one grid first).
     */
    public static List<DeltaAMap> readAll(List<Path> paths, MapOptions options) {
        if (paths.isEmpty()) {
            throw new IllegalArgumentException("no files to read");
        }
        List<DeltaAMap> maps = new ArrayList<>();
        String firstName = paths.get(0).toString();
        for (Path p : paths) {
            String name = p.toString();
            int[] headerLine = new int[1];
            DeltaAMap m;
            try (DelimitedLineReader in = DelimitedLineReader.open(p, name)) {
                m = read(in, options, headerLine);
            }
            if (!maps.isEmpty()) {
                String difference = axisDifference(maps.get(0).wavelengthsM(), m.wavelengthsM());
                if (difference != null) {
                    throw new InputException(new SourceLocation(name, headerLine[0], 0), "wavelengths", InputProblem.MISMATCH,
                            difference + " in " + firstName + " (the maps of a series share their spectra: resample them "
                            + "to one wavelength grid or cut them to one window)");
                }
            }
            maps.add(m);
        }
        return maps;
    }

    /** Null when the axes are the same to a part in 10⁹ (photon energies converted twice may differ in the last bits). */
    private static String axisDifference(double[] first, double[] other) {
        if (first.length != other.length) {
            return other.length + " wavelengths here but " + first.length;
        }
        for (int i = 0; i < first.length; i++) {
            if (Math.abs(first[i] - other[i]) > 1e-9 * first[i]) {
                return "wavelength " + (i + 1) + " is " + fmt(other[i] / 1e-9) + " nm here but " + fmt(first[i] / 1e-9) + " nm";
            }
        }
        return null;
    }

    /** Reads a map from text in memory (small maps, tests). */
    static DeltaAMap read(String text, String displayName, MapOptions options) {
        try (DelimitedLineReader in = DelimitedLineReader.of(text, displayName)) {
            return read(in, options, new int[1]);
        }
    }

    private static DeltaAMap read(DelimitedLineReader in, MapOptions options, int[] headerLine) {
        MatrixHeader h = MatrixHeader.read(in, "a ΔA map");
        headerLine[0] = h.line();
        String corner = h.corner();
        double[] axis = h.axis();
        int[] starts = h.starts();
        Unit spectral = MapCorner.spectralUnit(corner, options);
        MatrixOptions.Orientation o = MapCorner.orientation(options, corner, axis, spectral, in);
        Unit delayUnit = h.delayUnit(in, options.defaultDelayUnit(), "give the delay unit");
        MapCorner.Signal signal = MapCorner.signal(corner, options.signal());
        Axis first = new Axis(in, in.lineNumber(), spectral, delayUnit);
        return o == MatrixOptions.Orientation.DELAYS_DOWN
                ? delaysDown(in, axis, starts, first, signal)
                : delaysAcross(in, axis, starts, first, signal);
    }

    /** Where the header row was and the axis units. */
    private record Axis(DelimitedLineReader in, int headerLine, Unit spectral, Unit delay) {
        double wavelengthM(double value) {
            double si = spectral.toSi(value);
            if (!(si > 0)) {
                return Double.NaN;
            }
            return spectral.dimension() == Dimension.LENGTH ? si : Photon.wavelengthM(si);
        }
    }

    private static DeltaAMap delaysDown(DelimitedLineReader in, double[] axis, int[] headerStarts, Axis a, MapCorner.Signal signal) {
        int n = axis.length;
        double[] lambdaM = spectralAxis(axis, a, headerStarts);
        boolean reversed = n > 1 && lambdaM[1] < lambdaM[0];
        int width = n + 1;
        int[] from = new int[width];
        int[] to = new int[width];
        double[] row = new double[n];
        int[] present = new int[n];
        GrowableDoubles delays = new GrowableDoubles();
        GrowableDoubles values = new GrowableDoubles(16 * n);
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int cellsFound = in.bounds(line, from, to);
            checkWidth(in, cellsFound, width, a.headerLine());
            double d = in.number(line, from[0], to[0], "delay");
            if (Double.isNaN(d)) {
                throw new InputException(in.here(from[0] + 1), "delay", InputProblem.MISSING_VALUE, "missing delay (every row needs one)");
            }
            double dS = a.delay().toSi(d);
            checkNextDelay(in, delays, dS, from[0] + 1, "down the file", previousLine);
            delays.add(dS);
            previousLine = in.lineNumber();
            for (int c = 1; c < width; c++) {
                double v = in.number(line, from[c], to[c], "column " + (c + 1));
                if (!Double.isNaN(v)) {
                    v = signal.odOf(v, in, from[c] + 1);
                    present[c - 1]++;
                }
                row[reversed ? n - c : c - 1] = v;
            }
            for (double v : row) {
                values.add(v);
            }
        }
        checkRows(in, delays.size());
        for (int c = 0; c < n; c++) {
            if (present[c] == 0) {
                throw new InputException(new SourceLocation(in.file(), a.headerLine(), headerStarts[c + 1]), "column " + (c + 2),
                        InputProblem.EMPTY, "every cell of the column at " + fmt(axis[c]) + " " + a.spectral().symbol()
                        + " is missing (remove the column or cut it off with a wavelength window)");
            }
        }
        return new DeltaAMap(ascending(lambdaM, reversed), delays.toArray(), values.toArray());
    }

    private static DeltaAMap delaysAcross(DelimitedLineReader in, double[] axis, int[] headerStarts, Axis a, MapCorner.Signal signal) {
        int nt = axis.length;
        double[] delaysS = new double[nt];
        GrowableDoubles check = new GrowableDoubles(nt);
        for (int c = 0; c < nt; c++) {
            delaysS[c] = a.delay().toSi(axis[c]);
            checkNextDelay(in, check, delaysS[c], headerStarts[c + 1], "along the first row", a.headerLine());
            check.add(delaysS[c]);
        }
        checkRows(in, nt);
        int width = nt + 1;
        int[] from = new int[width];
        int[] to = new int[width];
        GrowableDoubles lambdas = new GrowableDoubles(256);
        GrowableDoubles values = new GrowableDoubles(16 * nt);
        double previousAxis = Double.NaN;
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int cellsFound = in.bounds(line, from, to);
            checkWidth(in, cellsFound, width, a.headerLine());
            double s = in.number(line, from[0], to[0], "first column");
            if (Double.isNaN(s)) {
                throw new InputException(in.here(from[0] + 1), "first column", InputProblem.MISSING_VALUE,
                        "missing wavelength (every row needs one)");
            }
            double lambdaM = a.wavelengthM(s);
            if (Double.isNaN(lambdaM)) {
                throw new InputException(in.here(from[0] + 1), "first column", InputProblem.OUT_OF_RANGE,
                        fmt(s) + " " + a.spectral().symbol() + " is not a positive wavelength or photon energy");
            }
            if (lambdas.size() > 0) {
                checkMonotonic(in, lambdas, lambdaM, s, previousAxis, previousLine, from[0] + 1, a, "down the first column");
            }
            lambdas.add(lambdaM);
            previousAxis = s;
            previousLine = in.lineNumber();
            int present = 0;
            for (int c = 1; c < width; c++) {
                double v = in.number(line, from[c], to[c], "column " + (c + 1));
                if (!Double.isNaN(v)) {
                    v = signal.odOf(v, in, from[c] + 1);
                    present++;
                }
                values.add(v);
            }
            if (present == 0) {
                throw new InputException(in.here(from[0] + 1), "first column", InputProblem.EMPTY, "every cell of the row at "
                        + fmt(s) + " " + a.spectral().symbol() + " is missing (remove the row or cut it off with a wavelength window)");
            }
        }
        int nw = lambdas.size();
        if (nw == 0) {
            throw new InputException(new SourceLocation(in.file(), Math.max(in.lineNumber(), 1), 0), null, InputProblem.EMPTY,
                    "no wavelength rows below the delays");
        }
        boolean reversed = nw > 1 && lambdas.get(1) < lambdas.get(0);
        double[] out = new double[nw * nt];
        for (int w = 0; w < nw; w++) {
            int target = reversed ? nw - 1 - w : w;
            for (int t = 0; t < nt; t++) {
                out[t * nw + target] = values.get(w * nt + t);
            }
        }
        return new DeltaAMap(ascending(lambdas.toArray(), reversed), delaysS, out);
    }

    private static double[] spectralAxis(double[] axis, Axis a, int[] headerStarts) {
        DelimitedLineReader in = a.in();
        double[] lambdaM = new double[axis.length];
        GrowableDoubles seen = new GrowableDoubles(axis.length);
        for (int c = 0; c < axis.length; c++) {
            lambdaM[c] = a.wavelengthM(axis[c]);
            SourceLocation at = new SourceLocation(in.file(), a.headerLine(), headerStarts[c + 1]);
            if (Double.isNaN(lambdaM[c])) {
                throw new InputException(at, "first row", InputProblem.OUT_OF_RANGE, fmt(axis[c]) + " " + a.spectral().symbol()
                        + " is not a positive wavelength or photon energy");
            }
            if (c > 0) {
                String problem = monotonicProblem(seen, lambdaM[c], axis[c], axis[c - 1], a);
                if (problem != null) {
                    throw new InputException(at, "first row", problem.startsWith("duplicate") ? InputProblem.DUPLICATE : InputProblem.BAD_ORDER,
                            problem + " (the spectral axis must run one way along the first row)");
                }
            }
            seen.add(lambdaM[c]);
        }
        return lambdaM;
    }

    private static void checkMonotonic(DelimitedLineReader in, GrowableDoubles seen, double lambdaM, double value, double previous,
                                       int previousLine, int column, Axis a, String where) {
        String problem = monotonicProblem(seen, lambdaM, value, previous, a);
        if (problem != null) {
            throw new InputException(in.here(column), "first column", problem.startsWith("duplicate") ? InputProblem.DUPLICATE
                    : InputProblem.BAD_ORDER, problem + " after " + fmt(previous) + " at line " + previousLine
                    + " (the spectral axis must run one way " + where + ")");
        }
    }

    /** Null when {@code lambdaM} continues the direction the first two values set, else what is wrong. */
    private static String monotonicProblem(GrowableDoubles seen, double lambdaM, double value, double previous, Axis a) {
        double last = seen.last();
        String u = " " + a.spectral().symbol();
        if (lambdaM == last) {
            return "duplicate " + fmt(value) + u;
        }
        if (seen.size() >= 2) {
            boolean up = seen.get(1) > seen.get(0);
            if (lambdaM > last != up) {
                return fmt(value) + u + " turns back (the axis was " + (value > previous ? "decreasing" : "increasing") + ")";
            }
        }
        return null;
    }

    private static void checkNextDelay(DelimitedLineReader in, GrowableDoubles delays, double dS, int column, String where, int previousLine) {
        if (delays.size() == 0 || dS > delays.last()) {
            return;
        }
        if (dS == delays.last()) {
            throw new InputException(in.here(column), "delay", InputProblem.DUPLICATE, "duplicate delay"
                    + (previousLine > 0 && previousLine != in.lineNumber() ? " (also at line " + previousLine + ")" : "")
                    + " (delays must increase strictly " + where + ")");
        }
        throw new InputException(in.here(column), "delay", InputProblem.BAD_ORDER, "delay smaller than the one before it"
                + " (delays must increase strictly " + where + ")");
    }

    private static double[] ascending(double[] lambdaM, boolean reversed) {
        if (!reversed) {
            return lambdaM;
        }
        double[] out = new double[lambdaM.length];
        for (int i = 0; i < lambdaM.length; i++) {
            out[i] = lambdaM[lambdaM.length - 1 - i];
        }
        return out;
    }

    private static void checkWidth(DelimitedLineReader in, int n, int width, int headerLine) {
        if (n != width) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cell" + (n == 1 ? "" : "s") + " but the first row (line "
                    + headerLine + ") has " + width + " (ragged row: check for a missing or extra delimiter)");
        }
    }

    private static void checkRows(DelimitedLineReader in, int delays) {
        if (delays < 2) {
            throw new InputException(new SourceLocation(in.file(), Math.max(in.lineNumber(), 1), 0), null, InputProblem.EMPTY, "only " + delays
                    + " delay" + (delays == 1 ? "" : "s") + " (a map needs at least 2)");
        }
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
