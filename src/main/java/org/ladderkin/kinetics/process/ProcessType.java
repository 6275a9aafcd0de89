package org.ladderkin.kinetics.process;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * A kind of process in the registry: the section of a model file that switches it on, its parameters (declared once),
 * and how it reads itself from any {@link ParameterSource}.
 *
 * @param <P> the process's parameter record
 */
public interface ProcessType<P extends ProcessSpec> {

    /** Section of a model file (and name in messages), e.g. "auger". */
    String section();

    /** Whether every model has this process (a model file must then hold its section). */
    boolean required();

    /** The parameters, in the order they are shown. */
    List<ProcessParameter> parameters();

    /** Reads the process's parameters; absent optional ones take their defaults. */
    P read(ParameterReader in);

    /**
     * The process to add when one of its fittable parameters is freed but the model lacks it, or null when it cannot
     * be added that way (its start then comes from {@code model}).
     */
    default P startWhenFreed(LadderModel model) {
        return null;
    }

    /** A process type declared by its parts (what every process in the registry is). */
    static <P extends ProcessSpec> ProcessType<P> of(String section, boolean required, List<ProcessParameter> parameters,
                                                     Function<ParameterReader, P> reader) {
        return new Declared<>(section, required, List.copyOf(parameters), reader, model -> null);
    }

    /** As {@link #of}, with the process to add when a lifetime of it is freed in a model that lacks it. */
    static <P extends ProcessSpec> ProcessType<P> of(String section, boolean required, List<ProcessParameter> parameters,
                                                     Function<ParameterReader, P> reader,
                                                     Function<LadderModel, P> startWhenFreed) {
        return new Declared<>(section, required, List.copyOf(parameters), reader, startWhenFreed);
    }

    /** The one implementation: identity matters (the registry and the models compare types by reference). */
    final class Declared<P extends ProcessSpec> implements ProcessType<P> {
        private final String section;
        private final boolean required;
        private final List<ProcessParameter> parameters;
        private final Function<ParameterReader, P> reader;
        private final Function<LadderModel, P> start;

        private Declared(String section, boolean required, List<ProcessParameter> parameters,
                         Function<ParameterReader, P> reader, Function<LadderModel, P> start) {
            this.section = Objects.requireNonNull(section, "section");
            this.required = required;
            this.parameters = parameters;
            this.reader = reader;
            this.start = start;
        }

        @Override
        public String section() {
            return section;
        }

        @Override
        public boolean required() {
            return required;
        }

        @Override
        public List<ProcessParameter> parameters() {
            return parameters;
        }

        @Override
        public P read(ParameterReader in) {
            return reader.apply(in);
        }

        @Override
        public P startWhenFreed(LadderModel model) {
            return start.apply(model);
        }

        @Override
        public String toString() {
            return "process type " + section;
        }
    }
}
