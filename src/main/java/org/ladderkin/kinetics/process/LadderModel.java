package org.ladderkin.kinetics.process;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;

/**
 * A ladder model as a list of processes (at most one of each type, in registry order) plus the two settings that
 * belong to the ladder itself. Model files, command-line flags, plans and fits all describe a model this way;
 * {@link #toModel()} assembles the rate laws.
 *
 * @param processes  the processes switched on
 * @param degeneracy band-edge degeneracy g
 * @param nMax       fixed Nmax, or 0 for automatic
 */
public record LadderModel(List<ProcessSpec> processes, int degeneracy, int nMax) {

    public LadderModel {
        List<ProcessSpec> sorted = new ArrayList<>(processes);
        sorted.sort(Comparator.comparingInt(p -> ProcessRegistry.position(p.type())));
        for (int i = 1; i < sorted.size(); i++) {
            if (sorted.get(i).type() == sorted.get(i - 1).type()) {
                throw new IllegalArgumentException("process '" + sorted.get(i).type().section() + "' is given twice");
            }
        }
        for (ProcessType<?> t : ProcessRegistry.types()) {
            if (t.required() && sorted.stream().noneMatch(p -> p.type() == t)) {
                throw new IllegalArgumentException("every model needs the '" + t.section() + "' process");
            }
        }
        processes = List.copyOf(sorted);
        // Assembling once here rejects inconsistent combinations (a charge nobody allowed) at construction.
        toModel(processes, degeneracy, nMax);
    }

    /** A neutral dot with radiative and Auger decay only (charged radiative factor: the default). */
    public static LadderModel radiativeAndAuger(double tauRadS, ExcitonScaling radiativeScaling, double tauAuger2S,
                                                ExcitonScaling augerScaling, int degeneracy) {
        return new LadderModel(List.of(new RadiativeProcess(tauRadS, radiativeScaling, RadiativeDecay.DEFAULT_CHARGED_FACTOR),
                new AugerProcess(tauAuger2S, augerScaling, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY)),
                degeneracy, 0);
    }

    /** The kinetic model: each process's laws, in registry order. */
    public KineticModel toModel() {
        return toModel(processes, degeneracy, nMax);
    }

    private static KineticModel toModel(List<ProcessSpec> processes, int degeneracy, int nMax) {
        LadderBuilder b = new LadderBuilder();
        for (ProcessSpec p : processes) {
            p.addTo(b);
        }
        return b.build(degeneracy, nMax);
    }

    /** The process of {@code type}, when the model has it. */
    public <P extends ProcessSpec> Optional<P> find(ProcessType<P> type) {
        for (ProcessSpec p : processes) {
            if (p.type() == type) {
                @SuppressWarnings("unchecked")
                P typed = (P) p;
                return Optional.of(typed);
            }
        }
        return Optional.empty();
    }

    /** Whether the model has the process that owns {@code p}. */
    public boolean has(ProcessParameter p) {
        return processes.stream().anyMatch(s -> s.type().parameters().contains(p));
    }

    /** The value (s) of lifetime {@code p}, or NaN when its process is off. */
    public double seconds(ProcessParameter p) {
        for (ProcessSpec s : processes) {
            if (s.type().parameters().contains(p)) {
                return s.seconds(p);
            }
        }
        return Double.NaN;
    }

    /** A copy with lifetime {@code p} set to {@code seconds}; its process must be on. */
    public LadderModel withSeconds(ProcessParameter p, double seconds) {
        List<ProcessSpec> next = new ArrayList<>(processes.size());
        boolean found = false;
        for (ProcessSpec s : processes) {
            if (s.type().parameters().contains(p)) {
                next.add(s.withSeconds(p, seconds));
                found = true;
            } else {
                next.add(s);
            }
        }
        if (!found) {
            throw new IllegalArgumentException("the model has no process with '" + p.key() + "'");
        }
        return new LadderModel(next, degeneracy, nMax);
    }

    /** A copy with {@code process} added, or replacing the one of its type. */
    public LadderModel with(ProcessSpec process) {
        List<ProcessSpec> next = new ArrayList<>();
        for (ProcessSpec s : processes) {
            if (s.type() != process.type()) {
                next.add(s);
            }
        }
        next.add(process);
        return new LadderModel(next, degeneracy, nMax);
    }

    /** A copy with another fixed Nmax (0: automatic). */
    public LadderModel withNMax(int fixedNMax) {
        return new LadderModel(processes, degeneracy, fixedNMax);
    }
}
