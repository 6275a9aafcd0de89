package org.ladderkin.fit;

import java.util.Locale;
import java.util.Objects;

/**
 * How strongly one trace was excited, in whichever measure the experimenter recorded. The fit turns it into ⟨N⟩
 * through a shared scale parameter, so only the ratio between traces of the same kind matters to the optimiser.
 *
 * @param kind  which measure {@code value} is
 * @param value the measure in SI (J, dimensionless, or photons/m²); finite and &gt; 0
 */
public record Excitation(Kind kind, double value) {

    /** The measures a trace's excitation may be given in. */
    public enum Kind {
        /** Pump pulse energy in J. */
        PULSE_ENERGY_J,
        /** Mean number of excitations per dot, ⟨N⟩. */
        MEAN_OCCUPANCY,
        /** Pump photon fluence in photons/m². */
        PHOTON_FLUENCE_PER_M2
    }

    public Excitation {
        Objects.requireNonNull(kind, "kind");
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(kind.name().toLowerCase(Locale.ROOT) + " must be finite and > 0, was " + value);
        }
    }
}
