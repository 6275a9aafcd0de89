package org.ladderkin.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;

/**
 * Per-trace metadata from command-line arguments: excitations in column order ("1e13 photons/cm²", "2 nJ",
 * "0.3 mJ/cm²", or a bare number for ⟨N⟩) and one pump ("400 nm" or "3.1 eV"). Messages name the option, e.g.
 * {@code --fluences: field '[2]': ...}.
 */
public final class TraceArguments {

    private TraceArguments() {
    }

    /**
     * @param excitations one per trace, in the dataset's order
     * @param pump        pump wavelength or photon energy, or null
     * @param option      how messages name the excitation option (e.g. "--fluences")
     */
    public static Dataset apply(Dataset data, List<String> excitations, String pump, String option) {
        OptionalDouble pumpJ = OptionalDouble.empty();
        if (pump != null) {
            Quantity q = parse(pump, "--pump", null);
            if (!(q.si() > 0) || q.dimension() != Dimension.LENGTH && q.dimension() != Dimension.ENERGY) {
                throw new InputException(SourceLocation.of("--pump"), null, InputProblem.OUT_OF_RANGE, "'" + pump
                        + "' is not a positive wavelength or photon energy (write e.g. 400nm or 3.1eV)");
            }
            pumpJ = OptionalDouble.of(q.dimension() == Dimension.LENGTH ? Photon.energyJ(q.si()) : q.si());
        }
        if (excitations.size() != data.size()) {
            throw new InputException(SourceLocation.of(option), null, InputProblem.MISMATCH, excitations.size() + " values for " + data.size()
                    + " traces (" + String.join(", ", data.labels()) + ")");
        }
        List<TraceMetadata> out = new ArrayList<>();
        for (int i = 0; i < excitations.size(); i++) {
            String field = "[" + (i + 1) + "]";
            Quantity q = parse(excitations.get(i), option, field);
            Excitation e;
            try {
                e = excitation(q, pumpJ).orElseThrow(() -> new InputException(SourceLocation.of(option), field, InputProblem.MISSING_FIELD,
                        "an energy fluence needs the pump photon energy to count photons (add --pump 400nm)"));
            } catch (IllegalArgumentException bad) {
                throw new InputException(SourceLocation.of(option), field, InputProblem.INVALID_VALUE, bad.getMessage());
            }
            out.add(data.traces().get(i).metadata().with(Optional.of(e), pumpJ));
        }
        return data.withMetadata(out);
    }

    /**
     * The excitation a quantity states: a pulse energy, a photon fluence, an energy fluence (counted in photons with
     * {@code pumpJ}) or a bare number for ⟨N⟩. Empty for an energy fluence when no pump photon energy is known, so the
     * caller can say where to give one.
     *
     * @throws IllegalArgumentException for a value that is not > 0 or a quantity of another kind
     */
    public static Optional<Excitation> excitation(Quantity q, OptionalDouble pumpJ) {
        if (!(q.si() > 0) || !Double.isFinite(q.si())) {
            throw new IllegalArgumentException("must be > 0, was " + q.format());
        }
        return switch (q.dimension()) {
            case ENERGY -> Optional.of(new Excitation(Excitation.Kind.PULSE_ENERGY_J, q.si()));
            case PHOTON_FLUENCE -> Optional.of(new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, q.si()));
            case DIMENSIONLESS -> Optional.of(new Excitation(Excitation.Kind.MEAN_OCCUPANCY, q.si()));
            case ENERGY_FLUENCE -> pumpJ.isEmpty() ? Optional.empty()
                    : Optional.of(new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, q.si() / pumpJ.getAsDouble()));
            default -> throw new IllegalArgumentException("'" + q.format() + "' is " + q.dimension().label()
                    + " (give a pulse energy, a photon or energy fluence, or ⟨N⟩ as a bare number)");
        };
    }

    private static Quantity parse(String text, String option, String field) {
        try {
            return Quantity.parse(text);
        } catch (QuantityFormatException e) {
            throw new InputException(SourceLocation.of(option), field, InputProblem.of(e), e.getMessage());
        }
    }
}
