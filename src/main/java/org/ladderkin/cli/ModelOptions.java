package org.ladderkin.cli;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.ladderkin.io.ModelCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ParameterKind;
import org.ladderkin.kinetics.process.ParameterSource;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.process.ProcessType;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import picocli.CommandLine.Command;
import picocli.CommandLine.IModelTransformer;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The flags that describe a ladder model without a model file; shared by every command that takes a model. One flag
 * per process parameter, derived from {@link ProcessRegistry} (so a new process brings its flags with it); a process
 * that is not required is on when any of its flags is given.
 */
@Command(modelTransformer = ModelOptions.RegistryFlags.class)
final class ModelOptions {

    /** The command this mixin is part of: picocli stores the parsed values on its copies of the options. */
    @Spec(Spec.Target.MIXEE)
    CommandSpec spec;

    @Option(names = "--degeneracy", paramLabel = "G", defaultValue = "2", description = "band-edge degeneracy g (default ${DEFAULT-VALUE})")
    int degeneracy;

    @Option(names = "--nmax", paramLabel = "N", description = "highest exciton number kept (default: automatic, tail < 1e-9)")
    Integer nMax;

    /** Adds one option per registry parameter to the mixin when picocli builds it. */
    static final class RegistryFlags implements IModelTransformer {
        @Override
        public CommandSpec transform(CommandSpec mixin) {
            for (ProcessParameter p : ProcessRegistry.parameters()) {
                String dflt = p.defaultText() == null || p.defaultText().isEmpty() ? "" : " (default " + p.defaultText() + ")";
                String choices = p.choices().isEmpty() ? "" : ": " + String.join(" | ", p.choices());
                mixin.addOption(OptionSpec.builder(p.flag()).type(String.class).paramLabel(label(p))
                        .description(p.help() + choices + dflt).build());
            }
            return mixin;
        }

        private static String label(ProcessParameter p) {
            return switch (p.kind()) {
                case LIFETIME -> "TIME";
                case FACTOR -> "X";
                case PROBABILITY -> "P";
                case CHOICE -> "WORD";
                case SCALING_LAW -> "LAW";
                case CHOICE_LIST -> "WORD,...";
            };
        }
    }

    /** The kinetic model from {@code modelFile} or, when it is null, from the flags. */
    KineticModel model(Path modelFile) {
        LadderModel m = ladder(modelFile);
        return modelFile != null && nMax != null ? m.toModel().withFixedNMax(nMax) : m.toModel();
    }

    /** Whether the flags describe a model (a model file or the flags are then the model, not a plan's). */
    boolean given() {
        return text(RadiativeProcess.LIFETIME) != null || text(AugerProcess.BIEXCITON_LIFETIME) != null;
    }

    /** The model from {@code modelFile} or, when it is null, from the flags. */
    LadderModel ladder(Path modelFile) {
        if (modelFile != null) {
            if (given()) {
                throw new IllegalArgumentException("give either a model file or " + RadiativeProcess.LIFETIME.flag() + "/"
                        + AugerProcess.BIEXCITON_LIFETIME.flag() + ", not both");
            }
            List<String> ignored = flagsGiven();
            if (!ignored.isEmpty()) {
                // a flag beside a model file used to change nothing, silently: the file is the whole model
                throw new IllegalArgumentException(String.join(", ", ignored) + (ignored.size() == 1 ? " does" : " do")
                        + " not combine with a model file " + modelFile.getFileName() + ": put the value in the file's section instead");
            }
            return ModelCodec.read(modelFile).model();
        }
        return ProcessRegistry.read(this::section, degeneracy, nMax == null ? 0 : nMax);
    }

    /**
     * The plan's model, when no model flag is given beside it. A lone flag (say --tau-trap) would otherwise be dropped
     * silently; the whole model is given by --tau-rad and --tau-auger2 with the flags, or by a model file.
     */
    LadderModel planModel(LadderModel fromPlan) {
        List<String> ignored = flagsGiven();
        if (!ignored.isEmpty()) {
            throw new IllegalArgumentException(String.join(", ", ignored) + (ignored.size() == 1 ? " does" : " do")
                    + " not combine with the plan's model: give the whole model with " + RadiativeProcess.LIFETIME.flag() + " and "
                    + AugerProcess.BIEXCITON_LIFETIME.flag() + " (and the other flags), or a model file with --model");
        }
        return fromPlan;
    }

    /** The model flags on the command line (registry flags and --degeneracy), in registry order. */
    private List<String> flagsGiven() {
        List<String> given = new java.util.ArrayList<>();
        var parsed = spec.commandLine() == null ? null : spec.commandLine().getParseResult();
        if (parsed != null && parsed.hasMatchedOption("--degeneracy")) {
            given.add("--degeneracy");
        }
        for (ProcessParameter p : ProcessRegistry.parameters()) {
            if (text(p) != null) {
                given.add(p.flag());
            }
        }
        return given;
    }

    private Optional<ParameterSource> section(ProcessType<?> type) {
        boolean on = type.required() || type.parameters().stream().anyMatch(p -> text(p) != null);
        return on ? Optional.of(new Flags()) : Optional.empty();
    }

    private String text(ProcessParameter p) {
        OptionSpec o = spec.findOption(p.flag());
        return o == null ? null : o.getValue();
    }

    /** The flags as a parameter source; errors name the flag. */
    private final class Flags implements ParameterSource {

        @Override
        public boolean has(ProcessParameter p) {
            return text(p) != null;
        }

        @Override
        public double seconds(ProcessParameter p) {
            String t = text(p);
            double x = Quantity.parseSi(t, Dimension.TIME);
            if (!(x > 0) || !Double.isFinite(x)) {
                throw error(p, "must be > 0, was " + t);
            }
            String problem = p.problemWith(x);
            if (problem != null) {
                throw error(p, problem);
            }
            return x;
        }

        @Override
        public double number(ProcessParameter p) {
            String t = text(p).trim();
            double x;
            try {
                x = Double.parseDouble(t);
            } catch (NumberFormatException e) {
                throw error(p, "must be a number, was " + t);
            }
            if (!(x >= 0) || !Double.isFinite(x) || (p.kind() == ParameterKind.PROBABILITY && x > 1)) {
                throw error(p, (p.kind() == ParameterKind.PROBABILITY ? "must be between 0 and 1" : "must be >= 0")
                        + ", was " + t);
            }
            String problem = p.problemWith(x);
            if (problem != null) {
                throw error(p, problem);
            }
            return x;
        }

        @Override
        public String choice(ProcessParameter p) {
            return word(p, text(p));
        }

        @Override
        public List<String> choices(ProcessParameter p) {
            return Arrays.stream(text(p).split(",")).map(w -> word(p, w)).toList();
        }

        @Override
        public ExcitonScaling scaling(ProcessParameter p, int firstN) {
            String w = word(p, text(p));
            return p == RadiativeProcess.SCALING ? RadiativeProcess.law(w) : AugerProcess.law(w);
        }

        @Override
        public RuntimeException missing(ProcessParameter p) {
            if (ProcessRegistry.owner(p).required()) {
                return new IllegalArgumentException("without a model file (or a plan for fit), "
                        + RadiativeProcess.LIFETIME.flag() + " and " + AugerProcess.BIEXCITON_LIFETIME.flag() + " are required");
            }
            return new IllegalArgumentException(p.flag() + " is needed with the other "
                    + ProcessRegistry.owner(p).section() + " flags");
        }

        @Override
        public RuntimeException error(ProcessParameter p, String problem) {
            return new IllegalArgumentException((p == null ? "" : p.flag() + " ") + problem);
        }

        private String word(ProcessParameter p, String text) {
            String w = text.trim();
            if (!p.choices().contains(w)) {
                throw error(p, "must be " + String.join(" or ", p.choices()) + ", was " + text);
            }
            return w;
        }
    }
}
