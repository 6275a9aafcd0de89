package org.ladderkin.io;

import java.util.Objects;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * How to take one kinetic trace out of a transient-absorption matrix.
 *
 * @param orientation          which axis runs down the first column, or {@link Orientation#DETECT}
 * @param windowLowM           shortest wavelength averaged, in m
 * @param windowHighM          longest wavelength averaged, in m (≥ windowLowM)
 * @param defaultDelayUnit     unit of delays when the file names none; null makes that an error
 * @param defaultWavelengthUnit unit of wavelengths when the file names none (usually nm)
 * @param missing              what to do with missing cells
 */
public record MatrixOptions(Orientation orientation, double windowLowM, double windowHighM, Unit defaultDelayUnit,
                            Unit defaultWavelengthUnit, MissingValuePolicy missing) {

    /** Layout of a matrix file. */
    public enum Orientation {
        /** Decide from the corner cell's units, else from what the first row's numbers look like. */
        DETECT,
        /** First row: wavelengths; first column: delays (one spectrum per row). */
        DELAYS_DOWN,
        /** First row: delays; first column: wavelengths (one kinetic trace per row). */
        DELAYS_ACROSS
    }

    public MatrixOptions {
        Objects.requireNonNull(orientation, "orientation");
        Objects.requireNonNull(defaultWavelengthUnit, "defaultWavelengthUnit");
        Objects.requireNonNull(missing, "missing");
        if (!(windowLowM > 0) || !(windowHighM >= windowLowM) || !Double.isFinite(windowHighM)) {
            throw new IllegalArgumentException("wavelength window must satisfy 0 < low <= high, was "
                    + windowLowM + " m to " + windowHighM + " m");
        }
        if (defaultDelayUnit != null && defaultDelayUnit.dimension() != Dimension.TIME) {
            throw new IllegalArgumentException("default delay unit must be a time unit, was '" + defaultDelayUnit.symbol() + "'");
        }
        if (defaultWavelengthUnit.dimension() != Dimension.LENGTH) {
            throw new IllegalArgumentException("default wavelength unit must be a length unit, was '" + defaultWavelengthUnit.symbol() + "'");
        }
    }

    /** Detected orientation, wavelengths in nm unless the file says otherwise, missing cells dropped. */
    public static MatrixOptions window(double lowM, double highM, Unit defaultDelayUnit) {
        return new MatrixOptions(Orientation.DETECT, lowM, highM, defaultDelayUnit, Units.of("nm"), MissingValuePolicy.DROP);
    }

    /** A copy with another orientation. */
    public MatrixOptions withOrientation(Orientation o) {
        return new MatrixOptions(o, windowLowM, windowHighM, defaultDelayUnit, defaultWavelengthUnit, missing);
    }
}
