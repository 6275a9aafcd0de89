package org.ladderkin.kinetics.process;

/**
 * One process's parameters (an immutable record in SI) that can add its rate law to a ladder. The model-file codec,
 * the command-line flags, the planner's form and the fitter's parameter names all come from its {@link #type()}.
 */
public interface ProcessSpec {

    /** Its registry entry. */
    ProcessType<?> type();

    /** Adds its rate laws, charges or changes to laws added before it. */
    void addTo(LadderBuilder ladder);

    /** The value (SI) of one of its {@link ParameterKind#LIFETIME} parameters. */
    double seconds(ProcessParameter p);

    /** A copy with one of its lifetimes changed (seconds, &gt; 0), e.g. while a fit varies it. */
    ProcessSpec withSeconds(ProcessParameter p, double seconds);

    /** The error for a parameter the process does not have. */
    static IllegalArgumentException notMine(ProcessSpec s, ProcessParameter p) {
        return new IllegalArgumentException("process '" + s.type().section() + "' has no lifetime '" + p.key() + "'");
    }
}
