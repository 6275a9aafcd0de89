package org.ladderkin.gui.model;

import java.util.Locale;
import java.util.OptionalDouble;
import org.ladderkin.fit.Excitation;
import org.ladderkin.io.TraceArguments;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;

/**
 * One trace's excitation as the user types it in the fit view: a pulse energy ("2 nJ"), a photon fluence
 * ("1e13 photons/cm²"), an energy fluence ("0.3 mJ/cm²", converted with the trace's pump photon energy) or a bare
 * number read as ⟨N⟩ — the same words the {@code fit} command's {@code --fluences} takes.
 */
final class ExcitationText {

    private ExcitationText() {
    }

    /** Outcome of reading one text: the excitation, or the one-line reason it cannot be used. */
    record Reading(Excitation excitation, String problem) {
        boolean ok() {
            return excitation != null;
        }
    }

    /**
     * @param text          what the user typed
     * @param photonEnergyJ the trace's pump photon energy, when its file or sidecar gave one
     */
    static Reading read(String text, OptionalDouble photonEnergyJ) {
        String t = text.strip();
        if (t.isEmpty()) {
            return new Reading(null, "required: a pulse energy (2 nJ), a photon fluence (1e13 photons/cm²) or ⟨N⟩ (0.5)");
        }
        Quantity q;
        try {
            q = Quantity.parse(t);
        } catch (QuantityFormatException e) {
            return new Reading(null, e.getMessage());
        }
        try {
            return TraceArguments.excitation(q, photonEnergyJ).map(e -> new Reading(e, null)).orElseGet(() -> new Reading(null,
                    "an energy fluence needs the pump photon energy, which this trace's file does not give (write the "
                            + "photon fluence, e.g. 1e13 photons/cm², or add \"pump\" to a .traces.json sidecar)"));
        } catch (IllegalArgumentException e) {
            return new Reading(null, e.getMessage());
        }
    }

    /** The text that shows {@code e} in trade units, reading back to the same kind. */
    static String format(Excitation e) {
        return switch (e.kind()) {
            case PULSE_ENERGY_J -> Quantity.formatBest(e.value(), Dimension.ENERGY, 4);
            case PHOTON_FLUENCE_PER_M2 -> String.format(Locale.ROOT, "%.4g photons/cm²", e.value() * 1e-4);
            case MEAN_OCCUPANCY -> String.format(Locale.ROOT, "%.4g", e.value());
        };
    }

    /** How a kind is named in messages. */
    static String kindLabel(Excitation.Kind kind) {
        return switch (kind) {
            case PHOTON_FLUENCE_PER_M2 -> "a photon fluence";
            case PULSE_ENERGY_J -> "a pulse energy";
            case MEAN_OCCUPANCY -> "⟨N⟩";
        };
    }
}
