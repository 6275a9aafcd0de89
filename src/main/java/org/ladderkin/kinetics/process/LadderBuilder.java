package org.ladderkin.kinetics.process;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.state.Charge;

/**
 * Collects what the processes of a {@link LadderModel} contribute, in registry order: rate laws, the excess charges
 * that exist, whether hot excitons are resolved. A process that refines another (a triexciton override of the Auger
 * law, ionisation by Auger events) changes the law already added instead of the law knowing about it.
 */
public final class LadderBuilder {

    private final List<RateLaw> laws = new ArrayList<>();
    private final Set<Charge> charges = EnumSet.noneOf(Charge.class);
    private boolean hotResolved;

    /** Adds a rate law. */
    public void add(RateLaw law) {
        laws.add(law);
    }

    /** Makes {@code charge} a state the ladder holds. */
    public void allowCharge(Charge charge) {
        if (charge == Charge.NEUTRAL) {
            throw new IllegalArgumentException("list only excess charges (negative, positive); neutral always exists");
        }
        charges.add(charge);
    }

    /** Whether the ladder holds {@code charge}. */
    public boolean allows(Charge charge) {
        return charge == Charge.NEUTRAL || charges.contains(charge);
    }

    /** Resolves hot excitons (new excitons start hot and cool). */
    public void resolveHotExcitons() {
        hotResolved = true;
    }

    /**
     * Replaces the law of class {@code type} added earlier by {@code change} applied to it.
     *
     * @throws IllegalArgumentException when no such law was added ({@code who} names the process that asked)
     */
    public <L extends RateLaw> void change(Class<L> type, UnaryOperator<L> change, String who) {
        for (int i = 0; i < laws.size(); i++) {
            if (type.isInstance(laws.get(i))) {
                laws.set(i, change.apply(type.cast(laws.get(i))));
                return;
            }
        }
        throw new IllegalArgumentException(who + " changes the " + type.getSimpleName() + " law, which the model lacks");
    }

    /** The kinetic model of everything added. */
    public KineticModel build(int degeneracy, int fixedNMax) {
        return new KineticModel(laws, charges, hotResolved, degeneracy, fixedNMax);
    }
}
