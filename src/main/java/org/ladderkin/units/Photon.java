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

    private static void requirePositive(double v, String what, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be > 0 and finite, was " + v + " " + unit);
        }
    }
}
