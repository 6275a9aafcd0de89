package org.ladderkin.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Photon;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;

/**
 * Reads the per-trace metadata sidecar, schema {@code ladderkin.traces/1}:
 * <pre>
 * { "schema": "ladderkin.traces/1",
 *   "pump": "400 nm",                       // optional: photon energy or wavelength for every trace
 *   "traces": [ { "label": "1 nJ", "pulseEnergy": "1 nJ" },
 *               { "label": "3 nJ", "meanOccupancy": 0.9, "pump": "3.1 eV" },
 *               { "photonFluence": "1e14 photons/cm²" } ] }
 * </pre>
 * Each entry gives at most one of {@code pulseEnergy}, {@code meanOccupancy}, {@code photonFluence} or
 * {@code energyFluence} (converted to photons with the pump photon energy). Entries with a {@code label} are matched
 * to the trace of that label; otherwise entries are taken in order and their number must equal the number of traces.
 */
public final class TraceSidecarCodec {

    /** Schema name of trace sidecar files. */
    public static final String SCHEMA = "ladderkin.traces";
    /** Newest version this build reads. */
    public static final int VERSION = 1;

    private TraceSidecarCodec() {
    }

    /** Reads {@code sidecar} and returns {@code data} with the metadata applied. */
    public static Dataset apply(Path sidecar, Dataset data) {
        return apply(JsonTree.read(sidecar, sidecar.toString()), data);
    }

    /**
     * Reads {@code sidecar} for a fit: every trace must end up with an excitation, and one without is refused at its entry
     * (or at {@code traces} when no entry describes it). The desktop planner uses {@link #apply(Path, Dataset)}, where
     * excitations can still be typed after loading.
     */
    public static Dataset applyForFit(Path sidecar, Dataset data) {
        return apply(JsonTree.read(sidecar, sidecar.toString()), data, true);
    }

    /** Applies a parsed sidecar to {@code data}. */
    public static Dataset apply(Node root, Dataset data) {
        return apply(root, data, false);
    }

    private static Dataset apply(Node root, Dataset data, boolean everyTraceExcited) {
        root.schema(SCHEMA, VERSION);
        OptionalDouble pump = root.optional("pump").map(TraceSidecarCodec::photonEnergyJ).orElse(OptionalDouble.empty());
        Node tracesNode = root.field("traces");
        List<Node> entries = tracesNode.items(1);
        root.finish();
        List<String> labels = data.labels();
        boolean byLabel = entries.stream().allMatch(e -> e.has("label"));
        boolean someLabel = entries.stream().anyMatch(e -> e.has("label"));
        if (someLabel && !byLabel) {
            throw tracesNode.error(InputProblem.MISMATCH, "either every entry has a 'label' or none does (labels match traces; without labels entries go in order)");
        }
        if (!byLabel && entries.size() != labels.size()) {
            throw tracesNode.error(InputProblem.MISMATCH, entries.size() + " entries for " + labels.size() + " traces (" + String.join(", ", labels)
                    + "); give one entry per trace in order, or label the entries");
        }
        List<TraceMetadata> result = new ArrayList<>();
        for (int i = 0; i < labels.size(); i++) {
            result.add(data.traces().get(i).metadata().with(Optional.empty(), pump));
        }
        Map<String, Node> seen = new HashMap<>();
        for (int i = 0; i < entries.size(); i++) {
            Node e = entries.get(i);
            int index = i;
            if (byLabel) {
                Node labelNode = e.field("label");
                String label = labelNode.string();
                index = labels.indexOf(label);
                if (index < 0) {
                    throw labelNode.error(InputProblem.MISMATCH, "no trace is labelled '" + label + "' (traces: " + String.join(", ", labels) + ")");
                }
                if (seen.put(label, labelNode) != null) {
                    throw labelNode.error(InputProblem.DUPLICATE, "trace '" + label + "' is described twice");
                }
            }
            OptionalDouble ownPump = e.optional("pump").map(TraceSidecarCodec::photonEnergyJ).orElse(pump);
            Optional<Excitation> excitation = excitation(e, ownPump);
            if (everyTraceExcited && excitation.isEmpty() && data.traces().get(index).metadata().excitation().isEmpty()) {
                throw e.error(InputProblem.MISSING_FIELD, "trace '" + labels.get(index) + "' has no excitation (give one of "
                        + "pulseEnergy, meanOccupancy, photonFluence, energyFluence)");
            }
            e.finish();
            result.set(index, result.get(index).with(excitation, ownPump));
        }
        if (everyTraceExcited) {
            for (int i = 0; i < result.size(); i++) {
                if (result.get(i).excitation().isEmpty()) {
                    throw tracesNode.error(InputProblem.MISSING_FIELD, "no entry gives trace '" + labels.get(i) + "' its excitation");
                }
            }
        }
        return data.withMetadata(result);
    }

    private static Optional<Excitation> excitation(Node e, OptionalDouble pumpJ) {
        String[] kinds = {"pulseEnergy", "meanOccupancy", "photonFluence", "energyFluence"};
        String kind = null;
        for (String k : kinds) {
            if (e.has(k)) {
                if (kind != null) {
                    throw e.error(InputProblem.CONFLICT, "give only one of '" + kind + "' and '" + k + "' (they say the same thing)");
                }
                kind = k;
            }
        }
        for (String k : kinds) {
            e.optional(k);
        }
        if (kind == null) {
            return Optional.empty();
        }
        Node v = e.field(kind);
        try {
            return Optional.of(switch (kind) {
                case "pulseEnergy" -> new Excitation(Excitation.Kind.PULSE_ENERGY_J, v.positive(Dimension.ENERGY, null));
                case "meanOccupancy" -> new Excitation(Excitation.Kind.MEAN_OCCUPANCY, v.positive(Dimension.DIMENSIONLESS,
                        org.ladderkin.units.Units.of("")));
                case "photonFluence" -> new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, v.positive(Dimension.PHOTON_FLUENCE, null));
                default -> {
                    double jPerM2 = v.positive(Dimension.ENERGY_FLUENCE, null);
                    if (pumpJ.isEmpty()) {
                        throw v.error(InputProblem.MISSING_FIELD, "an energy fluence needs the pump photon energy to count photons (add \"pump\": \"400 nm\")");
                    }
                    yield new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, jPerM2 / pumpJ.getAsDouble());
                }
            });
        } catch (IllegalArgumentException ex) {
            throw v.error(InputProblem.INVALID_VALUE, ex.getMessage());
        }
    }

    /** A pump given as a wavelength ("400 nm") or a photon energy ("3.1 eV"), in J. */
    static OptionalDouble photonEnergyJ(Node n) {
        String text = n.kind() == Node.Kind.STRING ? n.string() : null;
        if (text == null) {
            throw n.error(InputProblem.WRONG_TYPE, "expected a pump wavelength or photon energy as a string such as \"400 nm\" or \"3.1 eV\"");
        }
        Quantity q;
        try {
            q = Quantity.parse(text);
        } catch (QuantityFormatException e) {
            throw n.error(InputProblem.of(e), e.getMessage());
        }
        if (!(q.si() > 0)) {
            throw n.error(InputProblem.OUT_OF_RANGE, "must be > 0, was " + q.format());
        }
        if (q.dimension() == Dimension.LENGTH || q.dimension() == Dimension.ENERGY) {
            double j = q.dimension() == Dimension.LENGTH ? Photon.energyJ(q.si()) : q.si();
            // a pump outside any optical range is a typo, and 1e308 nm would be a photon of 0 J
            if (!(j >= Photon.energyJ(100e-6) && j <= Photon.energyJ(10e-9))) {
                throw n.error(InputProblem.OUT_OF_RANGE, "a pump photon lies between 10 nm and 100 µm (0.0124 to 124 eV), was " + q.format());
            }
            return OptionalDouble.of(j);
        }
        throw n.error(InputProblem.WRONG_UNIT, "'" + text + "' is neither a wavelength nor a photon energy (write e.g. \"400 nm\" or \"3.1 eV\")");
    }
}
