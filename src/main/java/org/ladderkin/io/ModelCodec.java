package org.ladderkin.io;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.kinetics.ModelParameters;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.TableScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.units.Dimension;

/**
 * Reads kinetic model files, schema {@code ladderkin.model/1}. Lifetimes are written with units ("20 ns"); a process
 * is off when its section is absent. An optional {@code sources} object maps a field path to where its value comes
 * from (a paper, "from memory", ...). Example:
 * <pre>
 * { "schema": "ladderkin.model/1", "name": "CdSe 4 nm",
 *   "radiative": { "lifetime": "20 ns", "scaling": "statistical" },
 *   "auger": { "biexcitonLifetime": "50 ps", "scaling": "statistical" },
 *   "bandEdgeDegeneracy": 2 }
 * </pre>
 */
public final class ModelCodec {

    /** Schema name of model files. */
    public static final String SCHEMA = "ladderkin.model";
    /** Newest model schema version this build reads. */
    public static final int VERSION = 1;

    /** A model read from a file, with its name and the sources of its values. */
    public record ModelFile(String name, ModelParameters parameters, Map<String, String> sources) {
    }

    private ModelCodec() {
    }

    public static ModelFile read(Path file) {
        return read(JsonTree.read(file, file.toString()));
    }

    public static ModelFile read(Node root) {
        root.schema(SCHEMA, VERSION);
        String name = root.field("name").string();
        Node rad = root.field("radiative");
        double radRate = 1 / rad.field("lifetime").positive(Dimension.TIME, null);
        ExcitonScaling radScaling = scaling(rad.field("scaling"), true);
        double chargedFactor = rad.optional("chargedFactor").map(n -> nonNegativeNumber(n))
                .orElse(RadiativeDecay.DEFAULT_CHARGED_FACTOR);
        rad.finish();
        Node auger = root.field("auger");
        double augerRate = 1 / auger.field("biexcitonLifetime").positive(Dimension.TIME, null);
        ExcitonScaling augerScaling = scaling(auger.field("scaling"), false);
        double negTrion = auger.optional("negativeTrionLifetime").map(n -> 1 / n.positive(Dimension.TIME, null)).orElse(0.0);
        double posTrion = auger.optional("positiveTrionLifetime").map(n -> 1 / n.positive(Dimension.TIME, null)).orElse(0.0);
        auger.finish();
        double trap = root.optional("trapping").map(n -> {
            double k = 1 / n.field("lifetimePerExciton").positive(Dimension.TIME, null);
            n.finish();
            return k;
        }).orElse(0.0);
        double cool = root.optional("cooling").map(n -> {
            double k = 1 / n.field("lifetime").positive(Dimension.TIME, null);
            n.finish();
            return k;
        }).orElse(0.0);
        Set<Charge> charges = EnumSet.noneOf(Charge.class);
        AugerIonisation ionisation = AugerIonisation.NONE;
        double neut = 0;
        if (root.has("charging")) {
            Node ch = root.field("charging");
            for (Node c : ch.field("charges").items(1)) {
                charges.add(c.choice("negative", "positive").equals("negative") ? Charge.NEGATIVE : Charge.POSITIVE);
            }
            double p = ch.field("ionisationProbability").probability();
            Node leaves = ch.field("ionisationLeaves");
            Charge left = leaves.choice("negative", "positive").equals("negative") ? Charge.NEGATIVE : Charge.POSITIVE;
            if (!charges.contains(left)) {
                throw leaves.error("ionisation leaves " + leaves.string() + " dots but 'charges' does not list them");
            }
            ionisation = new AugerIonisation(p, left);
            neut = 1 / ch.field("neutralisationTime").positive(Dimension.TIME, null);
            if (charges.contains(Charge.NEGATIVE) && negTrion == 0) {
                throw auger.error("negative dots need 'negativeTrionLifetime' in 'auger'");
            }
            if (charges.contains(Charge.POSITIVE) && posTrion == 0) {
                throw auger.error("positive dots need 'positiveTrionLifetime' in 'auger'");
            }
            ch.finish();
        }
        double refresh = root.optional("refresh").map(n -> {
            double k = 1 / n.field("exchangeTime").positive(Dimension.TIME, null);
            n.finish();
            return k;
        }).orElse(0.0);
        int g = root.field("bandEdgeDegeneracy").integer(1, 1000);
        int nMax = root.optional("nMax").map(n -> n.integer(1, 400)).orElse(0);
        Map<String, String> sources = new LinkedHashMap<>();
        root.optional("sources").ifPresent(s -> {
            for (String f : s.fieldNames()) {
                sources.put(f, s.field(f).string());
            }
            s.finish();
        });
        root.finish();
        try {
            ModelParameters params = new ModelParameters(radRate, radScaling, chargedFactor, augerRate, augerScaling,
                    negTrion, posTrion, trap, cool, charges, ionisation, neut, refresh, g, nMax);
            return new ModelFile(name, params, Map.copyOf(sources));
        } catch (IllegalArgumentException e) {
            throw root.error(e.getMessage());
        }
    }

    private static double nonNegativeNumber(Node n) {
        double x = n.number();
        if (x < 0) {
            throw n.error("must be >= 0, was " + x);
        }
        return x;
    }

    /** "linear" | "statistical" | "pairs" | "quadratic", or {"table": [...]} (from N = 1 radiative, N = 2 Auger). */
    private static ExcitonScaling scaling(Node n, boolean radiative) {
        if (n.kind() == Node.Kind.OBJECT) {
            double[] f = n.field("table").items(1).stream().mapToDouble(Node::number).toArray();
            n.finish();
            try {
                return new TableScaling(radiative ? 1 : 2, f);
            } catch (IllegalArgumentException e) {
                throw n.error(e.getMessage());
            }
        }
        String key = radiative ? n.choice("linear", "statistical") : n.choice("statistical", "pairs", "quadratic");
        return radiative ? ModelParameters.radiativeScaling(key) : ModelParameters.augerScaling(key);
    }
}
