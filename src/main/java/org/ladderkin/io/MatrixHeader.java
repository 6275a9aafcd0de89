package org.ladderkin.io;

import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;

/**
 * The first row of a two-axis table (a TA matrix or a ΔA map): the corner cell, the axis values after it and where
 * each cell starts, read once for both readers so their refusals read the same.
 *
 * @param corner the corner cell, unquoted
 * @param axis   the first row's axis values
 * @param starts column of each cell in the line, for located errors
 * @param line   the row's line number
 */
record MatrixHeader(String corner, double[] axis, int[] starts, int line) {

    /** Reads the first content line of {@code in}; {@code expected} names the table in the empty-file message. */
    static MatrixHeader read(DelimitedLineReader in, String expected) {
        String header = in.nextContentLine();
        if (header == null) {
            throw new InputException(SourceLocation.of(in.file()), null, InputProblem.EMPTY,
                    "no data (expected " + expected + ": first row one axis, first column the other)");
        }
        in.detectDelimiter(header);
        int width = in.count(header);
        if (width < 2) {
            throw new InputException(in.here(0), null, InputProblem.EMPTY, "the first row needs a corner cell and at least one axis value");
        }
        String[] cells = new String[width];
        int[] starts = new int[width];
        in.split(header, cells, starts);
        double[] axis = new double[width - 1];
        for (int c = 1; c < width; c++) {
            axis[c - 1] = in.number(cells[c], starts[c], "first row");
            if (Double.isNaN(axis[c - 1])) {
                throw new InputException(in.here(starts[c]), "first row", InputProblem.MISSING_VALUE, "missing axis value (every column needs one)");
            }
        }
        return new MatrixHeader(TraceTableReader.unquote(cells[0]), axis, starts, in.lineNumber());
    }

    /** The delays' unit from the corner cell, else {@code fallback}; refused at the corner when neither gives one. */
    Unit delayUnit(DelimitedLineReader in, Unit fallback, String howToGive) {
        Unit u = HeaderUnit.find(corner, Dimension.TIME);
        if (u == null) {
            u = fallback;
        }
        if (u == null) {
            throw new InputException(in.here(starts[0]), "corner cell", InputProblem.WRONG_UNIT, "no time unit for the delays (write the corner as "
                    + "'delay (ps) \\ wavelength (nm)' or " + howToGive + ")");
        }
        return u;
    }
}
