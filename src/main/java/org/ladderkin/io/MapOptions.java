package org.ladderkin.io;

import java.util.Objects;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Unit;
import org.ladderkin.units.Units;

/**
 * How to read a whole ΔA(λ, t) map.
 *
 * @param orientation         which axis runs down the first column, or {@link MatrixOptions.Orientation#DETECT}
 * @param defaultDelayUnit    unit of the delays when the corner cell names none; null makes that an error
 * @param defaultSpectralUnit unit of the spectral axis when the corner cell names none: a length (nm) or an energy (eV)
 * @param signal              what the cells hold
 */
public record MapOptions(MatrixOptions.Orientation orientation, Unit defaultDelayUnit, Unit defaultSpectralUnit, Signal signal) {

    /** What the cells of a map hold. */
    public enum Signal {
        /** Named in the corner cell (OD, mOD, µOD or ΔT/T); OD when it names none. */
        FROM_HEADER,
        OD,
        MILLI_OD,
        /** Relative transmission change; stored as ΔA = −log10(1 + ΔT/T). */
        DELTA_T_OVER_T
    }

    public MapOptions {
        Objects.requireNonNull(orientation, "orientation");
        Objects.requireNonNull(defaultSpectralUnit, "defaultSpectralUnit");
        Objects.requireNonNull(signal, "signal");
        if (defaultDelayUnit != null && defaultDelayUnit.dimension() != Dimension.TIME) {
            throw new IllegalArgumentException("default delay unit must be a time unit, was '" + defaultDelayUnit.symbol() + "'");
        }
        if (defaultSpectralUnit.dimension() != Dimension.LENGTH && defaultSpectralUnit.dimension() != Dimension.ENERGY) {
            throw new IllegalArgumentException("default spectral unit must be a wavelength or photon-energy unit, was '"
                    + defaultSpectralUnit.symbol() + "'");
        }
    }

    /** Detected orientation, wavelengths in nm and the signal unit from the corner cell unless it says otherwise. */
    public static MapOptions defaults(Unit defaultDelayUnit) {
        return new MapOptions(MatrixOptions.Orientation.DETECT, defaultDelayUnit, Units.of("nm"), Signal.FROM_HEADER);
    }

    /** The transposed layout: delays along the first row, one kinetic trace per line. */
    public MapOptions transposed() {
        return withOrientation(MatrixOptions.Orientation.DELAYS_ACROSS);
    }

    public MapOptions withOrientation(MatrixOptions.Orientation o) {
        return new MapOptions(o, defaultDelayUnit, defaultSpectralUnit, signal);
    }

    public MapOptions withSignal(Signal s) {
        return new MapOptions(orientation, defaultDelayUnit, defaultSpectralUnit, s);
    }
}
