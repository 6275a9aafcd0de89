package org.ladderkin.fit;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * What is known about how one trace was taken.
 *
 * @param label         the trace's name as the user knows it (column header, file name or sidecar label)
 * @param excitation    the pump strength, when known
 * @param photonEnergyJ the pump photon energy in J, when known
 */
public record TraceMetadata(String label, Optional<Excitation> excitation, OptionalDouble photonEnergyJ) {

    public TraceMetadata {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(excitation, "excitation");
        Objects.requireNonNull(photonEnergyJ, "photonEnergyJ");
        if (label.isBlank()) {
            throw new IllegalArgumentException("trace label must not be blank");
        }
        if (photonEnergyJ.isPresent() && !(photonEnergyJ.getAsDouble() > 0 && Double.isFinite(photonEnergyJ.getAsDouble()))) {
            throw new IllegalArgumentException("photon energy must be finite and > 0 J, was " + photonEnergyJ.getAsDouble() + " J");
        }
    }

    /** A trace known only by its label. */
    public static TraceMetadata labelled(String label) {
        return new TraceMetadata(label, Optional.empty(), OptionalDouble.empty());
    }

    /** A copy with another excitation and photon energy, keeping the label. */
    public TraceMetadata with(Optional<Excitation> newExcitation, OptionalDouble newPhotonEnergyJ) {
        return new TraceMetadata(label, newExcitation, newPhotonEnergyJ);
    }
}
