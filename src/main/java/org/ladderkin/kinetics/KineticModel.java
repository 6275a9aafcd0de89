package org.ladderkin.kinetics;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.ladderkin.kinetics.rate.Emitting;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * A kinetic model of one dot: its between-pulse processes, which charges exist, whether hot excitons are resolved,
 * and the band-edge degeneracy g used for the bleach and for band-edge absorption saturation.
 *
 * @param processes between-pulse rate laws
 * @param charges charges that exist (neutral always does)
 * @param hotResolved whether new excitons start hot and cool (needs a {@link org.ladderkin.kinetics.rate.Cooling} law)
 * @param degeneracy band-edge degeneracy g (2 for the 1S electron level of CdSe, 8 for PbSe)
 * @param fixedNMax highest exciton number, or 0 to choose it from the highest ⟨N⟩ (tail below {@link #TAIL})
 */
public record KineticModel(List<RateLaw> processes, Set<Charge> charges, boolean hotResolved, int degeneracy,
                           int fixedNMax) {

    /** Largest probability the automatic Nmax may cut off. */
    public static final double TAIL = 1e-9;

    public KineticModel {
        processes = List.copyOf(processes);
        EnumSet<Charge> cs = EnumSet.of(Charge.NEUTRAL);
        cs.addAll(charges);
        charges = Set.copyOf(cs);
        if (degeneracy < 1 || degeneracy > 1000) {
            throw new IllegalArgumentException("band-edge degeneracy must be between 1 and 1000, was " + degeneracy);
        }
        if (fixedNMax < 0 || fixedNMax > 400) {
            throw new IllegalArgumentException("Nmax must be between 1 and 400 (0 = automatic), was " + fixedNMax);
        }
    }

    /** The ladder for a given automatic cutoff (ignored when Nmax is fixed). */
    public LadderSpace space(int automaticNMax) {
        return new LadderSpace(charges, fixedNMax > 0 ? fixedNMax : Math.max(1, automaticNMax), hotResolved);
    }

    /** The processes that emit photons (for photoluminescence). */
    public List<Emitting> emitters() {
        return processes.stream().filter(Emitting.class::isInstance).map(Emitting.class::cast).toList();
    }

    /**
     * A copy in which every law of class {@code type} is replaced by {@code change} applied to it (e.g. the Auger law
     * of a smaller dot of a size ensemble: {@code a -> a.scaled(f)}).
     */
    public <L extends RateLaw> KineticModel withLaws(Class<L> type, java.util.function.UnaryOperator<L> change) {
        List<RateLaw> next = processes.stream()
                .map(l -> type.isInstance(l) ? (RateLaw) change.apply(type.cast(l)) : l).toList();
        return new KineticModel(next, charges, hotResolved, degeneracy, fixedNMax);
    }

    /** A copy with a different Nmax setting. */
    public KineticModel withFixedNMax(int nMax) {
        return new KineticModel(processes, charges, hotResolved, degeneracy, nMax);
    }
}
