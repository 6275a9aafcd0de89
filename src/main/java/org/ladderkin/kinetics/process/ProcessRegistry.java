package org.ladderkin.kinetics.process;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Every process a ladder model can hold, in the order their laws are assembled (a process that refines another law
 * comes after it). Adding a process is adding its class and one line here; the model-file codec, the command-line
 * flags, the planner's forms and the fitter's free parameters are derived from this list.
 */
public final class ProcessRegistry {

    private static final List<ProcessType<?>> TYPES = List.of(
            RadiativeProcess.TYPE,
            AugerProcess.TYPE,
            TriexcitonAugerProcess.TYPE,
            TrappingProcess.TYPE,
            CoolingProcess.TYPE,
            ChargingProcess.TYPE,
            RefreshProcess.TYPE);

    private ProcessRegistry() {
    }

    /** All process types, in assembly order. */
    public static List<ProcessType<?>> types() {
        return TYPES;
    }

    /** Assembly position of {@code type}. */
    static int position(ProcessType<?> type) {
        int i = TYPES.indexOf(type);
        if (i < 0) {
            throw new IllegalArgumentException("process type '" + type.section() + "' is not in the registry");
        }
        return i;
    }

    /** Every parameter of every process, in registry order. */
    public static List<ProcessParameter> parameters() {
        return TYPES.stream().flatMap(t -> t.parameters().stream()).toList();
    }

    /** The parameters {@code fit --free} can name, in the order fit results list them. */
    public static List<ProcessParameter> fittable() {
        return parameters().stream().filter(ProcessParameter::fittable)
                .sorted(Comparator.comparingInt(ProcessParameter::fitRank)).toList();
    }

    /** The parameters a plan's model section may set through the registry. */
    public static List<ProcessParameter> planParameters() {
        return parameters().stream().filter(p -> p.planKey() != null).toList();
    }

    /** The type that declares {@code p}. */
    public static ProcessType<?> owner(ProcessParameter p) {
        for (ProcessType<?> t : TYPES) {
            if (t.parameters().contains(p)) {
                return t;
            }
        }
        throw new IllegalArgumentException("parameter '" + p.key() + "' belongs to no registered process");
    }

    /** The fittable parameter called {@code fitName} ("tau-auger2"), if any. */
    public static Optional<ProcessParameter> byFitName(String fitName) {
        return fittable().stream().filter(p -> p.fitName().equals(fitName)).findFirst();
    }

    /** Reads a whole model: a process is on when {@code sectionOf} gives it a source (a required one must get one). */
    public static LadderModel read(java.util.function.Function<ProcessType<?>, Optional<ParameterSource>> sectionOf,
                                   int degeneracy, int nMax) {
        List<ProcessSpec> specs = new java.util.ArrayList<>();
        for (ProcessType<?> t : TYPES) {
            Optional<ParameterSource> src = sectionOf.apply(t);
            if (src.isPresent()) {
                specs.add(t.read(new ParameterReader(src.get())));
                src.get().done();
            }
        }
        return new LadderModel(specs, degeneracy, nMax);
    }
}
