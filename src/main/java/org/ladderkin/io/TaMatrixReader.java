package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Trace;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * Takes band-edge kinetics out of a transient-absorption matrix by averaging the signal over a wavelength window.
 * The first row holds one axis and the first column the other; the corner cell may name both with units
 * ("delay (ps) \ wavelength (nm)", the first-mentioned runs down the first column). Without units in the corner the
 * orientation is guessed from the first row: wavelengths are all within 150–25000 nm and span less than a factor
 * of 10; delays increase strictly and usually start at or below zero or span decades. When neither reading is
 * clear the user must say. The file is streamed; only the window's running sums are kept.
 */
public final class TaMatrixReader {

    private TaMatrixReader() {
    }

    /** One trace per file, labelled by the file name without extension. */
    public static Dataset readAll(List<Path> paths, MatrixOptions options) {
        List<Trace> traces = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (Path p : paths) {
            traces.add(read(p, p.toString(), options));
            names.add(p.toString());
        }
        return new Dataset(traces, names);
    }

    /** Reads one matrix and returns the window-averaged trace. */
    public static Trace read(Path path, String displayName, MatrixOptions options) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in, TraceTableReader.stem(path), options);
        }
    }

    private static Trace read(DelimitedLineReader in, String label, MatrixOptions options) {
        MatrixHeader h = MatrixHeader.read(in, "a TA matrix");
        int headerLine = h.line();
        String corner = h.corner();
        double[] axis = h.axis();
        int[] starts = h.starts();
        MatrixOptions.Orientation o = orientation(options, corner, axis, in);
        Unit delayUnit = h.delayUnit(in, options.defaultDelayUnit(), "give --delay-unit");
        Unit lambdaUnit = HeaderUnit.find(corner, Dimension.LENGTH);
        if (lambdaUnit == null) {
            lambdaUnit = options.defaultWavelengthUnit();
        }
        Trace t = o == MatrixOptions.Orientation.DELAYS_DOWN
                ? delaysDown(in, label, options, axis, starts, headerLine, delayUnit, lambdaUnit)
                : delaysAcross(in, label, options, axis, starts, headerLine, delayUnit, lambdaUnit);
        return t;
    }

    private static MatrixOptions.Orientation orientation(MatrixOptions options, String corner, double[] axis, DelimitedLineReader in) {
        if (options.orientation() != MatrixOptions.Orientation.DETECT) {
            return options.orientation();
        }
        int t = HeaderUnit.position(corner, Dimension.TIME);
        int l = HeaderUnit.position(corner, Dimension.LENGTH);
        if (t >= 0 && l >= 0) {
            return t < l ? MatrixOptions.Orientation.DELAYS_DOWN : MatrixOptions.Orientation.DELAYS_ACROSS;
        }
        boolean wavelengths = looksLikeWavelengthsNm(axis);
        boolean delays = looksLikeDelays(axis);
        if (wavelengths && !delays) {
            return MatrixOptions.Orientation.DELAYS_DOWN;
        }
        if (delays && !wavelengths) {
            return MatrixOptions.Orientation.DELAYS_ACROSS;
        }
        throw new InputException(in.here(0), null, InputProblem.WRONG_UNIT, "cannot tell whether the first row holds wavelengths or delays "
                + "(name both in the corner cell, e.g. 'delay (ps) \\ wavelength (nm)', or give the orientation)");
    }

    static boolean looksLikeWavelengthsNm(double[] axis) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : axis) {
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        return min >= 150 && max <= 25000 && max / min < 10;
    }

    static boolean looksLikeDelays(double[] axis) {
        for (int i = 1; i < axis.length; i++) {
            if (!(axis[i] > axis[i - 1])) {
                return false;
            }
        }
        double first = axis[0];
        double last = axis[axis.length - 1];
        return first <= 0 || last / first >= 10;
    }

    private static Trace delaysDown(DelimitedLineReader in, String label, MatrixOptions options, double[] axis, int[] headerStarts,
                                    int headerLine, Unit delayUnit, Unit lambdaUnit) {
        int width = axis.length + 1;
        boolean[] inWindow = new boolean[width];
        int selected = 0;
        for (int c = 1; c < width; c++) {
            double lambdaM = lambdaUnit.toSi(axis[c - 1]);
            inWindow[c] = lambdaM >= options.windowLowM() && lambdaM <= options.windowHighM();
            selected += inWindow[c] ? 1 : 0;
        }
        if (selected == 0) {
            throw new InputException(new SourceLocation(in.file(), headerLine, 0), "first row", InputProblem.EMPTY, "no wavelength lies in the window "
                    + window(options, lambdaUnit) + " (the file covers " + range(axis) + " " + lambdaUnit.symbol() + ")");
        }
        String[] cells = new String[width];
        int[] starts = new int[width];
        GrowableDoubles delays = new GrowableDoubles();
        GrowableDoubles signal = new GrowableDoubles();
        double previous = Double.NaN;
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.split(line, cells, starts);
            checkWidth(in, n, width, headerLine);
            double dS = delayUnit.toSi(in.number(cells[0], starts[0], "delay"));
            if (Double.isNaN(dS)) {
                throw new InputException(in.here(starts[0]), "delay", InputProblem.MISSING_VALUE, "missing delay (every row needs one)");
            }
            if (delays.size() > 0 && !(dS > previous)) {
                throw new InputException(in.here(starts[0]), "delay", InputProblem.BAD_ORDER, (dS == previous ? "duplicate delay (also at line " + previousLine + ")"
                        : "delay is smaller than the one at line " + previousLine) + " (delays must increase strictly down the file)");
            }
            previous = dS;
            previousLine = in.lineNumber();
            double sum = 0;
            int count = 0;
            for (int c = 1; c < width; c++) {
                double v = in.number(cells[c], starts[c], "column " + (c + 1));
                if (inWindow[c]) {
                    if (Double.isNaN(v)) {
                        rejectMissing(in, options, starts[c], c);
                    } else {
                        sum += v;
                        count++;
                    }
                }
            }
            delays.add(dS);
            signal.add(count == 0 ? Double.NaN : sum / count);
        }
        checkRows(in, delays.size());
        return TraceAssembler.assemble(new SourceLocation(in.file(), headerLine, 0), "window " + window(options, lambdaUnit),
                label, delays, signal, null);
    }

    private static Trace delaysAcross(DelimitedLineReader in, String label, MatrixOptions options, double[] axis, int[] headerStarts,
                                      int headerLine, Unit delayUnit, Unit lambdaUnit) {
        int width = axis.length + 1;
        GrowableDoubles delays = new GrowableDoubles(axis.length);
        for (int c = 1; c < width; c++) {
            double dS = delayUnit.toSi(axis[c - 1]);
            if (c > 1 && !(dS > delays.last())) {
                throw new InputException(new SourceLocation(in.file(), headerLine, headerStarts[c]), "first row", InputProblem.BAD_ORDER,
                        (dS == delays.last() ? "duplicate delay" : "delay smaller than the one before it")
                                + " (delays must increase strictly along the first row)");
            }
            delays.add(dS);
        }
        checkRows(in, delays.size());
        double[] sum = new double[axis.length];
        int[] count = new int[axis.length];
        String[] cells = new String[width];
        int[] starts = new int[width];
        int rowsInWindow = 0;
        double lowSeen = Double.POSITIVE_INFINITY;
        double highSeen = Double.NEGATIVE_INFINITY;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.split(line, cells, starts);
            checkWidth(in, n, width, headerLine);
            double lambda = in.number(cells[0], starts[0], "wavelength");
            if (Double.isNaN(lambda)) {
                throw new InputException(in.here(starts[0]), "wavelength", InputProblem.MISSING_VALUE, "missing wavelength (every row needs one)");
            }
            lowSeen = Math.min(lowSeen, lambda);
            highSeen = Math.max(highSeen, lambda);
            double lambdaM = lambdaUnit.toSi(lambda);
            boolean use = lambdaM >= options.windowLowM() && lambdaM <= options.windowHighM();
            rowsInWindow += use ? 1 : 0;
            for (int c = 1; c < width; c++) {
                double v = in.number(cells[c], starts[c], "column " + (c + 1));
                if (use) {
                    if (Double.isNaN(v)) {
                        rejectMissing(in, options, starts[c], c);
                    } else {
                        sum[c - 1] += v;
                        count[c - 1]++;
                    }
                }
            }
        }
        if (rowsInWindow == 0) {
            throw new InputException(SourceLocation.of(in.file()), "first column", InputProblem.EMPTY, "no wavelength lies in the window "
                    + window(options, lambdaUnit) + (lowSeen <= highSeen ? " (the file covers " + fmt(lowSeen) + "–" + fmt(highSeen)
                    + " " + lambdaUnit.symbol() + ")" : " (the file has no wavelength rows)"));
        }
        GrowableDoubles signal = new GrowableDoubles(axis.length);
        for (int i = 0; i < axis.length; i++) {
            signal.add(count[i] == 0 ? Double.NaN : sum[i] / count[i]);
        }
        return TraceAssembler.assemble(new SourceLocation(in.file(), headerLine, 0), "window " + window(options, lambdaUnit),
                label, delays, signal, null);
    }

    private static void rejectMissing(DelimitedLineReader in, MatrixOptions options, int column, int c) {
        if (options.missing() == MissingValuePolicy.REJECT) {
            throw new InputException(in.here(column), "column " + (c + 1), InputProblem.MISSING_VALUE,
                    "missing value in the wavelength window (missing values are refused here; allow them to drop the point)");
        }
    }

    private static void checkWidth(DelimitedLineReader in, int n, int width, int headerLine) {
        if (n != width) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cell" + (n == 1 ? "" : "s") + " but the first row (line "
                    + headerLine + ") has " + width + " (ragged row: check for a missing or extra delimiter)");
        }
    }

    private static void checkRows(DelimitedLineReader in, int delays) {
        if (delays < TraceAssembler.MIN_POINTS) {
            throw new InputException(new SourceLocation(in.file(), Math.max(in.lineNumber(), 1), 0), null, InputProblem.EMPTY, "only " + delays
                    + " delay" + (delays == 1 ? "" : "s") + " (a trace needs at least " + TraceAssembler.MIN_POINTS + ")");
        }
    }

    private static String window(MatrixOptions o, Unit u) {
        return fmt(u.fromSi(o.windowLowM())) + "–" + fmt(u.fromSi(o.windowHighM())) + " " + u.symbol();
    }

    private static String range(double[] axis) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : axis) {
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        return fmt(min) + "–" + fmt(max);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v).replaceAll("\\.?0+$", "");
    }
}
