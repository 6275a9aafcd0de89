package org.ladderkin.io;

import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Unit;

/**
 * What a map's corner cell and first row say about its layout: the spectral unit, the signal unit and which axis runs
 * down the first column.
 */
final class MapCorner {

    private MapCorner() {
    }

    /** The cells' unit: a factor to OD, or a relative transmission change. */
    record Signal(double toOd, boolean transmission) {
        double odOf(double v, DelimitedLineReader in, int column) {
            if (!transmission) {
                return v * toOd;
            }
            if (!(v > -1)) {
                throw new InputException(in.here(column), "ΔT/T", InputProblem.OUT_OF_RANGE, "ΔT/T = " + v
                        + " is at or below −1 (a transmission cannot drop below zero)");
            }
            return -Math.log10(1 + v);
        }
    }

    static Signal signal(String corner, MapOptions.Signal option) {
        return switch (option) {
            case OD -> new Signal(1, false);
            case MILLI_OD -> new Signal(1e-3, false);
            case DELTA_T_OVER_T -> new Signal(1, true);
            case FROM_HEADER -> signalFromHeader(corner);
        };
    }

    static Signal signalFromHeader(String corner) {
        String c = corner.replace('\u0394', 'd').replace('D', 'd');
        if (c.contains("dT/T")) {
            return new Signal(1, true);
        }
        if (corner.contains("mOD")) {
            return new Signal(1e-3, false);
        }
        if (corner.contains("\u00b5OD") || corner.contains("\u03bcOD") || corner.contains("uOD")) {
            return new Signal(1e-6, false);
        }
        return new Signal(1, false);
    }

    static Unit spectralUnit(String corner, MapOptions options) {
        int l = HeaderUnit.position(corner, Dimension.LENGTH);
        int e = HeaderUnit.position(corner, Dimension.ENERGY);
        if (l >= 0 && (e < 0 || l < e)) {
            return HeaderUnit.find(corner, Dimension.LENGTH);
        }
        if (e >= 0) {
            return HeaderUnit.find(corner, Dimension.ENERGY);
        }
        return options.defaultSpectralUnit();
    }

    static MatrixOptions.Orientation orientation(MapOptions options, String corner, double[] axis, Unit spectral,
                                                         DelimitedLineReader in) {
        if (options.orientation() != MatrixOptions.Orientation.DETECT) {
            return options.orientation();
        }
        int t = HeaderUnit.position(corner, Dimension.TIME);
        int s = Math.max(HeaderUnit.position(corner, Dimension.LENGTH), HeaderUnit.position(corner, Dimension.ENERGY));
        if (t >= 0 && s >= 0) {
            return t < s ? MatrixOptions.Orientation.DELAYS_DOWN : MatrixOptions.Orientation.DELAYS_ACROSS;
        }
        boolean spectrum = spectral.dimension() == Dimension.LENGTH ? TaMatrixReader.looksLikeWavelengthsNm(scaledToNm(axis, spectral))
                : looksLikePhotonEnergiesEv(axis, spectral);
        boolean delays = TaMatrixReader.looksLikeDelays(axis);
        if (spectrum && !delays) {
            return MatrixOptions.Orientation.DELAYS_DOWN;
        }
        if (delays && !spectrum) {
            return MatrixOptions.Orientation.DELAYS_ACROSS;
        }
        throw new InputException(in.here(0), null, InputProblem.WRONG_UNIT, "cannot tell whether the first row holds wavelengths or delays "
                + "(name both in the corner cell, e.g. 'delay (ps) \\ wavelength (nm)', or say transpose)");
    }

    static double[] scaledToNm(double[] axis, Unit lengthUnit) {
        double[] nm = new double[axis.length];
        for (int i = 0; i < axis.length; i++) {
            nm[i] = lengthUnit.toSi(axis[i]) / 1e-9;
        }
        return nm;
    }

    /** Probe photons of a broadband TA experiment lie between the mid-infrared and the near ultraviolet. */
    static boolean looksLikePhotonEnergiesEv(double[] axis, Unit energyUnit) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : axis) {
            double ev = energyUnit.toSi(v) / PhysicalConstants.ELECTRONVOLT_J;
            min = Math.min(min, ev);
            max = Math.max(max, ev);
        }
        return min >= 0.05 && max <= 8 && max / min < 10;
    }
}
