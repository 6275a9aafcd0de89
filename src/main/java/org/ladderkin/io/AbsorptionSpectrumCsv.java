package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ladderkin.sample.AbsorptionSpectrum;

/**
 * Reads a measured absorption spectrum: a table whose first content line is the header
 * {@code wavelength_nm,absorbance}, then one {@code wavelength,absorbance} pair per line. Delimiters, quotes, comments
 * and decimal commas as in {@link DelimitedLineReader}. Wavelengths may rise or fall (spectrometers export both) but
 * must not repeat. Problems are reported as {@code FILE:LINE:COLUMN: what is wrong}.
 */
public final class AbsorptionSpectrumCsv {

    /** The required header. */
    public static final String HEADER = "wavelength_nm,absorbance";

    private AbsorptionSpectrumCsv() {
    }

    /** Reads {@code file}; {@code displayName} names it in messages. */
    public static AbsorptionSpectrum read(Path file, String displayName) {
        try (DelimitedLineReader in = DelimitedLineReader.open(file, displayName)) {
            return read(in);
        }
    }

    /** Parses the lines of a spectrum file. */
    public static AbsorptionSpectrum parse(List<String> lines, String displayName) {
        try (DelimitedLineReader in = DelimitedLineReader.of(String.join("\n", lines), displayName)) {
            return read(in);
        }
    }

    private static AbsorptionSpectrum read(DelimitedLineReader in) {
        String displayName = in.file();
        String header = in.nextContentLine();
        if (header == null) {
            throw at(displayName, Math.max(1, in.lineNumber()), InputProblem.EMPTY, "no header '" + HEADER + "' found (empty file?)");
        }
        in.detectDelimiter(header);
        String[] names = new String[2];
        int headerCells = in.split(header, names, new int[2]);
        if (headerCells != 2 || !names[0].strip().equalsIgnoreCase("wavelength_nm") || !names[1].strip().equalsIgnoreCase("absorbance")) {
            throw at(displayName, in.lineNumber(), InputProblem.MISSING_FIELD, "expected the header '" + HEADER + "', found '"
                    + header.strip() + "'");
        }
        List<double[]> points = new ArrayList<>();
        List<Integer> lineOf = new ArrayList<>();
        int[] from = new int[2];
        int[] to = new int[2];
        String line;
        while ((line = in.nextContentLine()) != null) {
            int lineNo = in.lineNumber();
            int cells = in.bounds(line, from, to);
            if (cells != 2) {
                throw at(displayName, lineNo, InputProblem.BAD_SYNTAX, "expected two values 'wavelength_nm" + in.delimiter()
                        + "absorbance', found " + cells);
            }
            double w = finite(in, in.number(line, from[0], to[0], "wavelength"), from[0], "wavelength");
            double a = finite(in, in.number(line, from[1], to[1], "absorbance"), from[1], "absorbance");
            if (!(w > 0)) {
                throw new InputException(in.here(from[0] + 1), "wavelength", InputProblem.OUT_OF_RANGE, "must be > 0 nm, was "
                        + line.substring(from[0], to[0]).strip());
            }
            points.add(new double[] {w / 1e9, a});
            lineOf.add(lineNo);
        }
        if (points.size() < 2) {
            throw at(displayName, in.lineNumber(), InputProblem.EMPTY, "needs at least two data lines, found " + points.size());
        }
        boolean falling = points.get(1)[0] < points.get(0)[0];
        for (int i = 1; i < points.size(); i++) {
            boolean ok = falling ? points.get(i)[0] < points.get(i - 1)[0] : points.get(i)[0] > points.get(i - 1)[0];
            if (!ok) {
                throw at(displayName, lineOf.get(i), InputProblem.BAD_ORDER, "wavelengths must keep " + (falling ? "falling" : "rising")
                        + " without repeats, but " + fmt(points.get(i)[0]) + " nm follows " + fmt(points.get(i - 1)[0]) + " nm");
            }
        }
        int n = points.size();
        double[] w = new double[n];
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            double[] p = points.get(falling ? n - 1 - i : i);
            w[i] = p[0];
            a[i] = p[1];
        }
        return new AbsorptionSpectrum(w, a, displayName);
    }

    private static double finite(DelimitedLineReader in, double v, int from, String what) {
        if (Double.isNaN(v)) {
            throw new InputException(in.here(from + 1), what, InputProblem.MISSING_VALUE, "missing value (every line needs "
                    + "a wavelength and an absorbance)");
        }
        return v;
    }

    private static String fmt(double m) {
        return org.ladderkin.material.Numbers.sig(m * 1e9, 6);
    }

    private static InputException at(String file, int line, InputProblem key, String problem) {
        return new InputException(new SourceLocation(file, line, 0), null, key, problem);
    }
}
