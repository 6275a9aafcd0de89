package org.ladderkin.kinetics;

import org.ladderkin.kinetics.rate.Emitting;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/** Signals as row vectors over the ladder: a signal is Σ_s o_s·P_s. */
public final class Observables {

    private Observables() {
    }

    /**
     * Band-edge bleach normalised to one fully filled level: min(n_e, g)/g per dot, with n_e the band-edge electrons:
     * the cold excitons, plus one for a negative dot (its extra electron sits in the band-edge level). Hot excitons do
     * not bleach; a positive dot's extra hole is taken not to bleach (hole levels are dense, the band-edge bleach of
     * II–VI dots is dominated by electrons: common practice, no source).
     */
    public static double[] bleach(LadderSpace space, int degeneracy) {
        double[] o = new double[space.size()];
        for (int s = 0; s < o.length; s++) {
            int electrons = space.cold(s) + (space.charge(s) == Charge.NEGATIVE ? 1 : 0);
            o[s] = Math.min(electrons, degeneracy) / (double) degeneracy;
        }
        return o;
    }

    /** Photoluminescence rate (photons per second per dot) of each state: the sum over emitting processes. */
    public static double[] photoluminescence(LadderSpace space, KineticModel model) {
        double[] o = new double[space.size()];
        for (Emitting e : model.emitters()) {
            for (int s = 0; s < o.length; s++) {
                o[s] += e.emissionRatePerS(space, s);
            }
        }
        return o;
    }

    /** 1 for every state with at least one exciton. */
    public static double[] excited(LadderSpace space) {
        double[] o = new double[space.size()];
        for (int s = 0; s < o.length; s++) {
            o[s] = space.excitons(s) > 0 ? 1 : 0;
        }
        return o;
    }

    /** 1 for every charged state. */
    public static double[] charged(LadderSpace space) {
        double[] o = new double[space.size()];
        for (int s = 0; s < o.length; s++) {
            o[s] = space.charge(s).charged() ? 1 : 0;
        }
        return o;
    }

    /** 1 for every state that is excited or charged: what a pulse train leaves for the next pulse. */
    public static double[] excitedOrCharged(LadderSpace space) {
        double[] o = new double[space.size()];
        for (int s = 0; s < o.length; s++) {
            o[s] = space.excitons(s) > 0 || space.charge(s).charged() ? 1 : 0;
        }
        return o;
    }
}
