package org.ladderkin.io;

import java.nio.file.Path;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * Reads integrated PL against excitation: a delimited table with a header and two columns, the photon fluence with
 * its unit in the header ({@code fluence (photons/cm2)}) and the integrated PL in any unit. Fluences must be &gt; 0
 * and increase strictly; PL values must be present and finite. Problems are {@link InputException}s at
 * {@code FILE:LINE:COLUMN}.
 */
public final class IntegratedPlReader {

    /**
     * The table.
     *
     * @param fluencesPerM2 photon fluences (photons/m²)
     * @param pl            integrated PL, the file's unit
     */
    public record Table(double[] fluencesPerM2, double[] pl) {
    }

    private IntegratedPlReader() {
    }

    /** Reads {@code path}. */
    public static Table read(Path path, String displayName) {
        try (DelimitedLineReader in = DelimitedLineReader.open(path, displayName)) {
            return read(in);
        }
    }

    private static Table read(DelimitedLineReader in) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected a header such as 'fluence (photons/cm2),pl' and one row per fluence)");
        }
        in.detectDelimiter(header);
        String[] names = new String[2];
        int[] starts = new int[2];
        int cells = in.split(header, names, starts);
        if (cells != 2) {
            throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "an integrated-PL table has two columns, "
                    + "fluence and PL; the header has " + cells);
        }
        String xName = TraceTableReader.unquote(names[0]);
        String yName = TraceTableReader.unquote(names[1]);
        Unit unit = HeaderUnit.of(xName, Dimension.PHOTON_FLUENCE, null, in.here(starts[0]), "");
        double factor = unit.toSi(1) - unit.toSi(0);
        GrowableDoubles xs = new GrowableDoubles();
        GrowableDoubles ys = new GrowableDoubles();
        int[] from = new int[2];
        int[] to = new int[2];
        String line;
        while ((line = in.nextContentLine()) != null) {
            int n = in.bounds(line, from, to);
            if (n != 2) {
                throw new InputException(in.here(0), null, InputProblem.BAD_SYNTAX, "row has " + n + " cells but the table has two");
            }
            double x = in.number(line, from[0], to[0], xName);
            double y = in.number(line, from[1], to[1], yName);
            if (Double.isNaN(x) || Double.isNaN(y)) {
                int c = Double.isNaN(x) ? from[0] : from[1];
                throw new InputException(in.here(c + 1), Double.isNaN(x) ? xName : yName, InputProblem.MISSING_VALUE,
                        "missing value (every row needs a fluence and a PL value)");
            }
            if (!(x > 0)) {
                throw new InputException(in.here(from[0] + 1), xName, InputProblem.OUT_OF_RANGE, "fluence must be > 0");
            }
            if (xs.size() > 0 && !(x * factor > xs.get(xs.size() - 1))) {
                throw new InputException(in.here(from[0] + 1), xName, InputProblem.BAD_ORDER, "fluences must increase down the file");
            }
            xs.add(x * factor);
            ys.add(y);
        }
        if (xs.size() < 3) {
            throw new InputException(new SourceLocation(in.file(), Math.max(1, in.lineNumber()), 0), null, InputProblem.EMPTY,
                    "only " + xs.size() + " rows (a saturation fit needs at least 3 fluences)");
        }
        return new Table(xs.toArray(), ys.toArray());
    }
}
