package org.ladderkin.kinetics;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.ladderkin.kinetics.propagate.ExactPropagator;
import org.ladderkin.kinetics.propagate.Propagator;
import org.ladderkin.kinetics.propagate.SettlingPropagator;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Picks the exact propagator for a ladder. Plain ladders use the modal {@link ExactPropagator}. Ladders that resolve
 * hot excitons use {@link SettlingPropagator}: their modal basis is hopelessly ill-conditioned (rates h·k_cool equally
 * spaced), but the cold states (h = 0) are invariant between pulses and hot excitons are gone after a settle time
 * t_s. The bound behind t_s: no process raises h and each hot exciton cools at ≥ k_min, so h is dominated by a pure
 * death process and P(h ≥ 1 at t) ≤ Nmax·e^{−k_min·t}; t_s makes that ≤ {@link #HOT_TAIL}.
 */
final class PropagatorChoice {

    /** Largest hot population left at the settle time. */
    static final double HOT_TAIL = 1e-18;
    /** Most uniformization steps per trace before the dense path is preferred (cooling too slow for the window). */
    static final int STEP_LIMIT = 200_000;

    private PropagatorChoice() {
    }

    static Propagator forLadder(LadderSpace space, double[][] q) {
        if (space.hotResolved()) {
            OptionalDouble settle = settleTimeS(space, q);
            if (settle.isPresent()) {
                int[] cold = coldStates(space);
                SettlingPropagator p = SettlingPropagator.of(q, cold, settle.getAsDouble());
                // Λ·t_s, not the window: a slow cooling beside fast Auger puts it beyond an int (3e9 for a 10 ns
                // cooling with 5 ps Auger), where only the modal path can go
                if (p.settleStepsEstimate() <= STEP_LIMIT) {
                    return p;
                }
            }
        }
        return ExactPropagator.of(q);
    }

    /** t_s, or empty when some transition raises h or some hot state does not cool. */
    static OptionalDouble settleTimeS(LadderSpace space, double[][] q) {
        int n = space.size();
        double kMin = Double.POSITIVE_INFINITY;
        for (int from = 0; from < n; from++) {
            for (int to = 0; to < n; to++) {
                if (to != from && q[to][from] != 0 && space.hot(to) > space.hot(from)) {
                    return OptionalDouble.empty();
                }
            }
            int h = space.hot(from);
            if (h > 0) {
                int cooled = space.index(space.charge(from), space.excitons(from), h - 1);
                kMin = Math.min(kMin, q[cooled][from] / h);
            }
        }
        if (!(kMin > 0) || kMin == Double.POSITIVE_INFINITY) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Math.log(space.nMax() / HOT_TAIL) / kMin);
    }

    private static int[] coldStates(LadderSpace space) {
        int[] cold = new int[space.size()];
        int m = 0;
        for (int s = 0; s < space.size(); s++) {
            if (space.hot(s) == 0) {
                cold[m++] = s;
            }
        }
        return Arrays.copyOf(cold, m);
    }
}
