package org.ladderkin.io;

import java.nio.file.Path;
import java.util.Locale;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * Reads a measured instrument response: a delimited table (comma, semicolon or tab; {@code #} and {@code %} comment
 * lines, BOM and decimal commas as in {@link DelimitedLineReader}) with a header line and exactly two columns, the
 * time with its unit in the header ({@code time (ps)}, {@code t [fs]}, {@code delay_ps}) and the response in any
 * unit (counts, ΔA, mV: only the shape matters). Times must increase strictly; no cell may be empty.
 * <p>
 * The response should be background-subtracted. Noise that dips slightly below zero is clipped to zero; a value below
 * {@value #NEGATIVE_LIMIT_PERCENT} % of the peak, negated, is refused, because it means a baseline was
 * subtracted wrongly or the column is not a response. Clipping lifts a noisy zero baseline by about 0.4 of its rms
 * noise, so long empty stretches before and after the peak add a little spurious area (and move the centroid):
 * save the window the response needs and no more. Every problem is an {@link InputException} at
 * {@code FILE:LINE:COLUMN} naming the column.
 */
public final class IrfFileReader {

    /** Most negative value accepted, as a percentage of the peak; anything between it and zero is clipped. */
    public static final double NEGATIVE_LIMIT_PERCENT = 5;

    private IrfFileReader() {
    }

    /** Reads {@code path}, naming it {@code displayName} in messages and in the returned curve. */
    public static MeasuredIrf read(Path path, String displayName) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in);
        }
    }

    private static MeasuredIrf read(DelimitedLineReader in) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected a header line such as 'time (ps),response' and rows of numbers)");
        }
        in.detectDelimiter(header);
        String[] names = new String[2];
        int[] starts = new int[2];
        int cells = in.split(header, names, starts);
        if (cells != 2) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "an IRF file has exactly two columns, time and response; the header "
                    + "has " + cells + " (write e.g. 'time (ps)" + in.delimiter() + "response')");
        }
        String timeName = TraceTableReader.unquote(names[0]);
        String valueName = TraceTableReader.unquote(names[1]);
        if (valueName.isEmpty()) {
            throw new InputException(in.here(starts[1]), null, InputProblem.MISSING_FIELD, "column 2 has an empty header (name the response column)");
        }
        SourceLocation valueHeader = in.here(starts[1]);
        Unit unit = timeUnit(timeName, in.here(starts[0]));
        double factor = unit.toSi(1) - unit.toSi(0);
        GrowableDoubles times = new GrowableDoubles();
        GrowableDoubles values = new GrowableDoubles();
        // where each value sits, to point at a strongly negative one after the peak is known
        GrowableDoubles lines = new GrowableDoubles();
        GrowableDoubles columns = new GrowableDoubles();
        int[] from = new int[2];
        int[] to = new int[2];
        int previousLine = 0;
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.bounds(line, from, to);
            if (n != 2) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cell" + (n == 1 ? "" : "s")
                        + " but an IRF file has two, time and response (check for a missing or extra delimiter)");
            }
            double t = in.number(line, from[0], to[0], timeName);
            if (Double.isNaN(t)) {
                throw new InputException(in.here(from[0] + 1), timeName, InputProblem.MISSING_VALUE, "missing time (every row needs one)");
            }
            double v = in.number(line, from[1], to[1], valueName);
            if (Double.isNaN(v)) {
                throw new InputException(in.here(from[1] + 1), valueName, InputProblem.MISSING_VALUE, "missing value (an IRF file has no gaps)");
            }
            double tS = t * factor;
            if (times.size() > 0 && !(tS > times.get(times.size() - 1))) {
                double before = times.get(times.size() - 1) / factor;
                throw new InputException(in.here(from[0] + 1), timeName, InputProblem.BAD_ORDER, (tS == times.get(times.size() - 1) ? "duplicate time "
                        : "time ") + fmt(t) + " " + unit.symbol() + (tS == times.get(times.size() - 1) ? " (also at line "
                        + previousLine + ")" : " is smaller than " + fmt(before) + " " + unit.symbol() + " at line "
                        + previousLine) + " (times must increase strictly down the file)");
            }
            times.add(tS);
            values.add(v);
            lines.add(in.lineNumber());
            columns.add(from[1] + 1);
            previousLine = in.lineNumber();
        }
        if (times.size() < MeasuredIrf.MIN_POINTS) {
            throw new InputException(new SourceLocation(in.file(), Math.max(1, in.lineNumber()), 0), null, InputProblem.EMPTY, "only "
                    + times.size() + " data row" + (times.size() == 1 ? "" : "s") + " (an IRF needs at least "
                    + MeasuredIrf.MIN_POINTS + " samples)");
        }
        double[] t = times.toArray();
        double[] v = values.toArray();
        double peak = 0;
        for (double x : v) {
            peak = Math.max(peak, x);
        }
        if (!(peak > 0)) {
            throw new InputException(valueHeader, valueName, InputProblem.OUT_OF_RANGE, "no positive value (an IRF is a peak above zero)");
        }
        for (int i = 0; i < v.length; i++) {
            if (v[i] < -NEGATIVE_LIMIT_PERCENT / 100 * peak) {
                throw new InputException(new SourceLocation(in.file(), (int) lines.get(i), (int) columns.get(i)), valueName, InputProblem.OUT_OF_RANGE,
                        String.format(Locale.ROOT, "%s is %.1f %% of the peak %s below zero (noise down to -%.0f %% of the peak "
                                + "is clipped to zero; subtract the background before saving the IRF)", fmt(v[i]),
                                -100 * v[i] / peak, fmt(peak), NEGATIVE_LIMIT_PERCENT));
            }
            v[i] = Math.max(0, v[i]);
        }
        try {
            return new MeasuredIrf(t, v, in.file());
        } catch (IllegalArgumentException e) {
            String m = e.getMessage();
            String prefix = in.file() + ": ";
            throw new InputException(valueHeader, valueName, InputProblem.INVALID_VALUE, m.startsWith(prefix) ? m.substring(prefix.length()) : m, e);
        }
    }

    /** The time column's unit; an IRF file has no command-line default, so the header must name it. */
    private static Unit timeUnit(String header, SourceLocation where) {
        try {
            return HeaderUnit.of(header, Dimension.TIME, null, where, "");
        } catch (InputException e) {
            if (e.key() == InputProblem.WRONG_UNIT) {
                throw new InputException(where, header, InputProblem.WRONG_UNIT, "no time unit in the header (write it like 'time (ps)')");
            }
            throw e;
        }
    }

    private static String fmt(double x) {
        return org.ladderkin.material.Numbers.sig(x, 6);
    }
}
