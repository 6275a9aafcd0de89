package org.ladderkin.io;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.Node;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ParameterKind;
import org.ladderkin.kinetics.process.ParameterSource;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.process.ProcessType;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.rate.TableScaling;
import org.ladderkin.units.Dimension;

/**
 * Reads kinetic model files, schema {@code ladderkin.model/1}. Each process of {@link ProcessRegistry} has its own
 * section, named and filled as the registry declares; a process is off when its section is absent. Lifetimes are
 * written with units ("20 ns"). An optional {@code sources} object maps a field path to where its value comes from
 * (a paper, "from memory", ...). Example:
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
    public record ModelFile(String name, LadderModel model, Map<String, String> sources) {
    }

    private ModelCodec() {
    }

    public static ModelFile read(Path file) {
        return read(JsonTree.read(file, file.toString()));
    }

    public static ModelFile read(Node root) {
        root.schema(SCHEMA, VERSION);
        String name = root.field("name").string();
        int g = root.field("bandEdgeDegeneracy").integer(1, 1000);
        int nMax = root.optional("nMax").map(n -> n.integer(1, 400)).orElse(0);
        Map<String, String> sources = new LinkedHashMap<>();
        root.optional("sources").ifPresent(s -> {
            for (String f : s.fieldNames()) {
                sources.put(f, s.field(f).string());
            }
            s.finish();
        });
        LadderModel model;
        try {
            model = ProcessRegistry.read(t -> section(root, t), g, nMax);
        } catch (IllegalArgumentException e) {
            throw root.error(InputProblem.CONFLICT, e.getMessage());
        }
        root.finish();
        return new ModelFile(name, model, Map.copyOf(sources));
    }

    private static Optional<ParameterSource> section(Node root, ProcessType<?> type) {
        if (!type.required() && !root.has(type.section())) {
            return Optional.empty();
        }
        Node section = root.field(type.section());
        return Optional.of(new SectionSource(section));
    }

    /** One process's section; once the process has read what it knows, unknown fields are rejected. */
    private static final class SectionSource implements ParameterSource {
        private final Node section;

        SectionSource(Node section) {
            this.section = section;
        }

        private Node at(ProcessParameter p) {
            return section.field(p.key());
        }

        @Override
        public void done() {
            section.finish();
        }

        @Override
        public boolean has(ProcessParameter p) {
            return section.has(p.key());
        }

        @Override
        public double seconds(ProcessParameter p) {
            Node n = at(p);
            return ParameterRange.check(p, n, n.positive(Dimension.TIME, null));
        }

        @Override
        public double number(ProcessParameter p) {
            Node n = at(p);
            if (p.kind() == ParameterKind.PROBABILITY) {
                return n.probability();
            }
            return ParameterRange.check(p, n, n.number());
        }

        @Override
        public String choice(ProcessParameter p) {
            return at(p).choice(p.choices().toArray(String[]::new));
        }

        @Override
        public List<String> choices(ProcessParameter p) {
            String[] allowed = p.choices().toArray(String[]::new);
            return at(p).items(1).stream().map(n -> n.choice(allowed)).toList();
        }

        /** A law by name, or {"table": [...]} starting at N = {@code firstN}. */
        @Override
        public ExcitonScaling scaling(ProcessParameter p, int firstN) {
            Node n = at(p);
            if (n.kind() == Node.Kind.OBJECT) {
                double[] f = n.field("table").items(1).stream().mapToDouble(Node::number).toArray();
                n.finish();
                try {
                    return new TableScaling(firstN, f);
                } catch (IllegalArgumentException e) {
                    throw n.error(InputProblem.OUT_OF_RANGE, e.getMessage());
                }
            }
            String key = n.choice(p.choices().toArray(String[]::new));
            return p == RadiativeProcess.SCALING ? RadiativeProcess.law(key) : AugerProcess.law(key);
        }

        @Override
        public RuntimeException missing(ProcessParameter p) {
            section.field(p.key()); // throws the reader's own located "missing field" error
            throw new IllegalStateException("'" + p.key() + "' was reported missing but is present");
        }

        @Override
        public RuntimeException error(ProcessParameter p, String problem) {
            return p == null || !section.has(p.key()) ? section.error(InputProblem.CONFLICT, problem)
                    : section.field(p.key()).error(InputProblem.CONFLICT, problem);
        }
    }
}
