package org.ladderkin.excite;

import org.ladderkin.units.Photon;

/**
 * One pump pulse of a train.
 *
 * @param energyJ          pulse energy at the sample (J)
 * @param wavelengthM      vacuum wavelength (m)
 * @param repetitionRateHz pulses per second reaching the sample (Hz)
 */
public record Pulse(double energyJ, double wavelengthM, double repetitionRateHz) {

    public Pulse {
        requirePositive(energyJ, "pulse energy", "J");
        requirePositive(wavelengthM, "pump wavelength", "m");
        requirePositive(repetitionRateHz, "repetition rate", "Hz");
    }

    /** The pulse of a train of average power {@code averagePowerW} (W) at {@code repetitionRateHz}. */
    public static Pulse fromAveragePower(double averagePowerW, double wavelengthM, double repetitionRateHz) {
        requirePositive(averagePowerW, "average power", "W");
        requirePositive(repetitionRateHz, "repetition rate", "Hz");
        return new Pulse(averagePowerW / repetitionRateHz, wavelengthM, repetitionRateHz);
    }

    private static void requirePositive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be > 0 and finite, was " + v + " " + unit);
        }
    }

    /** Photon energy (J). */
    public double photonEnergyJ() {
        return Photon.energyJ(wavelengthM);
    }

    /** Photons in one pulse. */
    public double photonsPerPulse() {
        return energyJ / photonEnergyJ();
    }

    /** Average power of the train (W). */
    public double averagePowerW() {
        return energyJ * repetitionRateHz;
    }

    /** The same pulse with another energy (the instance is not changed). */
    public Pulse withEnergyJ(double newEnergyJ) {
        return new Pulse(newEnergyJ, wavelengthM, repetitionRateHz);
    }
}
