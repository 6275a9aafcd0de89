package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.ExcitonScaling;

/**
 * Where a process reads its parameters from: a section of a model file, the command line's flags, a plan's model
 * section. Implementations live at the edges (they parse units and locate errors); each method is only called for a
 * parameter of the matching {@link ParameterKind}, and for a missing one only when it has no default.
 */
public interface ParameterSource {

    /** Whether the parameter is given. */
    boolean has(ProcessParameter p);

    /** A {@link ParameterKind#LIFETIME} in seconds (&gt; 0, finite). */
    double seconds(ProcessParameter p);

    /** A {@link ParameterKind#FACTOR} (≥ 0) or {@link ParameterKind#PROBABILITY} (in [0, 1]). */
    double number(ProcessParameter p);

    /** A {@link ParameterKind#CHOICE}: one of the parameter's choices. */
    String choice(ProcessParameter p);

    /** A {@link ParameterKind#CHOICE_LIST}: one or more of the parameter's choices. */
    List<String> choices(ProcessParameter p);

    /** A {@link ParameterKind#SCALING_LAW}: a named law or a table starting at N = {@code firstN}. */
    ExcitonScaling scaling(ProcessParameter p, int firstN);

    /** Called once the process has read every parameter it knows (a file section then rejects unknown fields). */
    default void done() {
    }

    /** The error for a parameter that has no default and is not given. */
    RuntimeException missing(ProcessParameter p);

    /** An error about {@code p} (located where the source can locate it) or about the section when {@code p} is null. */
    RuntimeException error(ProcessParameter p, String problem);
}
