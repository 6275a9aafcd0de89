package org.ladderkin.units;

/** Photon energy and vacuum wavelength, related by E = h·c/λ. */
public final class Photon {

    private Photon() {
    }

    /** Photon energy (J) of vacuum wavelength {@code wavelengthM} (m). */
    public static double energyJ(double wavelengthM) {
        requirePositive(wavelengthM, "wavelength", "m");
        return PhysicalConstants.HC_J_M / wavelengthM;
    }

    /** Vacuum wavelength (m) of a photon of energy {@code energyJ} (J). */
    public static double wavelengthM(double energyJ) {
        requirePositive(energyJ, "photon energy", "J");
        return PhysicalConstants.HC_J_M / energyJ;
    }

    /** Photon energy in eV of a wavelength in m; a convenience for tables and messages. */
    public static double energyEv(double wavelengthM) {
        return energyJ(wavelengthM) / PhysicalConstants.ELECTRONVOLT_J;
    }

    /**
     * Reads a photon written as an energy ("3.1 eV") or a vacuum wavelength ("400 nm") and returns its energy (J).
     *
     * @throws QuantityFormatException when the text is neither, naming it
     */
    public static double parseEnergyJ(String text) {
        Quantity q = Quantity.parse(text);
        if (q.si() > 0 && q.dimension() == Dimension.LENGTH) {
            return energyJ(q.si());
        }
        if (q.si() > 0 && q.dimension() == Dimension.ENERGY) {
            return q.si();
        }
        throw new QuantityFormatException(text, QuantityFormatException.Reason.WRONG_DIMENSION, "expected a photon energy or wavelength such as \"3.1 eV\" or \"400 nm\", was '"
                + text + "'");
    }

    private static void requirePositive(double v, String what, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be > 0 and finite, was " + v + " " + unit);
        }
    }
}
