package org.ladderkin.observe;

import java.util.Objects;

/**
 * One optical transition of the dot, drawn as a Gaussian line in photon energy.
 *
 * @param name         label ("1S", "1P")
 * @param energyJ      centre photon energy (J)
 * @param fwhmJ        full width at half maximum (J), inhomogeneous width included
 * @param amplitudeOd  peak absorbance this line contributes in the unexcited sample (OD)
 * @param role         what occupation bleaches it
 */
public record Transition(String name, double energyJ, double fwhmJ, double amplitudeOd, Role role) {

    /** Which carriers bleach the line. */
    public enum Role {
        /** The band-edge transition: bleached by band-edge (cold) filling. */
        BAND_EDGE,
        /** A higher transition whose levels hold the hot carriers: bleached by hot occupation. */
        HOT,
        /** A higher transition that is only shifted. */
        SPECTATOR
    }

    public Transition {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(role, "role");
        if (!(energyJ > 0) || !(fwhmJ > 0) || !(amplitudeOd >= 0) || !Double.isFinite(energyJ + fwhmJ + amplitudeOd)) {
            throw new IllegalArgumentException("transition " + name + " needs energy > 0, FWHM > 0 and amplitude >= 0");
        }
    }

    /** Line shape at photon energy {@code eJ} when shifted down by {@code shiftJ}, peak 1. */
    double shape(double eJ, double shiftJ) {
        double sigma = fwhmJ / (2 * Math.sqrt(2 * Math.log(2)));
        double x = eJ - (energyJ - shiftJ);
        return Math.exp(-x * x / (2 * sigma * sigma));
    }
}
