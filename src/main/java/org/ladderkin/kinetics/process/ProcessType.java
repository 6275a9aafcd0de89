package org.ladderkin.kinetics.process;

import java.util.List;

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
}
