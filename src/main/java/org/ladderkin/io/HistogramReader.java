package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.counting.CountHistogram;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * Reads photon-counting histograms: a delimited table (as {@link DelimitedLineReader} reads it) whose first column is
 * the time of each bin's centre with its unit in the header ({@code time (ns)}) or the channel number ({@code channel},
 * with the channel width given separately), and one column of counts per histogram, named in the header. Bins must be
 * equally spaced. With {@code counts} every value must be a whole number ≥ 0, because a Poisson likelihood is only
 * defined for counts; without it (data already corrected or scaled) values need only be finite and ≥ 0 and are
 * rounded. Each problem is an {@link InputException} at {@code FILE:LINE:COLUMN}.
 */
public final class HistogramReader {

    /** Largest relative departure of a bin spacing from the first one before the bins count as unequal. */
    private static final double SPACING_TOLERANCE = 1e-3;

    private HistogramReader() {
    }

    /**
     * Reads {@code path}.
     *
     * @param channelWidthS width of a channel (s) for a channel column, or NaN (then the header must give a time unit)
     * @param counts        require whole, non-negative counts
     */
    public static List<CountHistogram> read(Path path, String displayName, double channelWidthS, boolean counts) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in, channelWidthS, counts);
        }
    }

    /** Reads a table given as text (tests). */
    static List<CountHistogram> read(String text, String displayName, double channelWidthS, boolean counts) {
        try (DelimitedLineReader in = DelimitedLineReader.of(text, displayName)) {
            return read(in, channelWidthS, counts);
        }
    }

    private static List<CountHistogram> read(DelimitedLineReader in, double channelWidthS, boolean counts) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected a header such as 'time (ns),counts' and one row per bin)");
        }
        in.detectDelimiter(header);
        int columns = in.count(header);
        String[] names = new String[columns];
        int[] starts = new int[columns];
        in.split(header, names, starts);
        if (columns < 2) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "a histogram table needs a time or channel "
                    + "column and at least one column of counts; the header has " + columns);
        }
        String timeName = TraceTableReader.unquote(names[0]);
        double factor;
        boolean channels = timeName.trim().toLowerCase(Locale.ROOT).startsWith("channel");
        if (channels) {
            if (Double.isNaN(channelWidthS)) {
                throw new InputException(in.here(starts[0]), timeName, InputProblem.MISSING_FIELD,
                        "channel numbers need a channel width (give --channel-width, e.g. 16ps)");
            }
            factor = channelWidthS;
        } else {
            Unit unit;
            try {
                unit = HeaderUnit.of(timeName, Dimension.TIME, null, in.here(starts[0]), "");
            } catch (InputException e) {
                if (e.key() == InputProblem.WRONG_UNIT) {
                    throw new InputException(in.here(starts[0]), timeName, InputProblem.WRONG_UNIT,
                            "no time unit in the header (write 'time (ns)', or 'channel' with --channel-width)");
                }
                throw e;
            }
            factor = unit.toSi(1) - unit.toSi(0);
        }
        String[] labels = new String[columns - 1];
        for (int c = 1; c < columns; c++) {
            labels[c - 1] = TraceTableReader.unquote(names[c]).trim();
            if (labels[c - 1].isEmpty()) {
                throw new InputException(in.here(starts[c]), null, InputProblem.MISSING_FIELD, "column " + (c + 1)
                        + " has an empty header (name each histogram)");
            }
        }
        GrowableDoubles times = new GrowableDoubles();
        List<GrowableDoubles> values = new ArrayList<>();
        for (int c = 1; c < columns; c++) {
            values.add(new GrowableDoubles());
        }
        int[] from = new int[columns];
        int[] to = new int[columns];
        String line;
        int firstLine = 0;
        while ((line = in.nextContentLine()) != null) {
            int n = in.bounds(line, from, to);
            if (n != columns) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cells but the header has "
                        + columns + " (check for a missing or extra delimiter)");
            }
            double t = in.number(line, from[0], to[0], timeName);
            if (Double.isNaN(t)) {
                throw new InputException(in.here(from[0] + 1), timeName, InputProblem.MISSING_VALUE, "missing time (every bin needs one)");
            }
            double tS = t * factor;
            int k = times.size();
            if (k > 0 && !(tS > times.get(k - 1))) {
                throw new InputException(in.here(from[0] + 1), timeName, InputProblem.BAD_ORDER,
                        "times must increase down the file (bins in order)");
            }
            if (k >= 2) {
                double first = times.get(1) - times.get(0);
                if (Math.abs((tS - times.get(k - 1)) - first) > SPACING_TOLERANCE * first) {
                    throw new InputException(in.here(from[0] + 1), timeName, InputProblem.INVALID_VALUE, String.format(Locale.ROOT,
                            "bins are not equally spaced: this step is %.6g %s, the first %.6g (a histogram has equal bins)",
                            (tS - times.get(k - 1)) / factor, channels ? "channels" : "of the header's unit", first / factor));
                }
            }
            if (k == 0) {
                firstLine = in.lineNumber();
            }
            times.add(tS);
            for (int c = 1; c < columns; c++) {
                double v = in.number(line, from[c], to[c], labels[c - 1]);
                if (Double.isNaN(v)) {
                    throw new InputException(in.here(from[c] + 1), labels[c - 1], InputProblem.MISSING_VALUE,
                            "missing count (a histogram has a value in every bin)");
                }
                if (v < 0 || Double.isInfinite(v)) {
                    throw new InputException(in.here(from[c] + 1), labels[c - 1], InputProblem.OUT_OF_RANGE, "count "
                            + org.ladderkin.material.Numbers.sig(v, 6) + " is negative (counts are whole numbers >= 0)");
                }
                if (counts && v != Math.rint(v)) {
                    throw new InputException(in.here(from[c] + 1), labels[c - 1], InputProblem.OUT_OF_RANGE, "count "
                            + org.ladderkin.material.Numbers.sig(v, 6) + " is not a whole number (a likelihood fit with "
                            + "--counts needs raw counts, not corrected or scaled values)");
                }
                values.get(c - 1).add(Math.rint(v));
            }
        }
        if (times.size() < 2) {
            throw new InputException(new SourceLocation(in.file(), Math.max(1, in.lineNumber()), 0), null, InputProblem.EMPTY,
                    times.size() == 0 ? "no bins (the table has a header but no rows)" : "one bin only (a histogram needs at least two)");
        }
        double width = times.get(1) - times.get(0);
        double start = times.get(0) - width / 2;
        List<CountHistogram> out = new ArrayList<>();
        for (int c = 1; c < columns; c++) {
            double[] v = values.get(c - 1).toArray();
            double total = 0;
            for (double x : v) {
                total += x;
            }
            if (total == 0) {
                throw new InputException(new SourceLocation(in.file(), firstLine, starts[c] + 1), labels[c - 1], InputProblem.EMPTY,
                        "the histogram holds no counts (every bin is 0)");
            }
            out.add(CountHistogram.of(labels[c - 1], start, width, v));
        }
        return out;
    }
}
