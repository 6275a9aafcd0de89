package org.ladderkin.observe;

import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * State filling of the band-edge transition. A dot with n_e band-edge electrons and n_h band-edge holes fills the
 * levels to f_e = min(n_e, g_e)/g_e and f_h = min(n_h, g_h)/g_h, and the band-edge absorption falls by
 * w_e·f_e + w_h·f_h of its unexcited value (the two-level picture: absorption ∝ 1 − f_e − f_h when both carriers
 * block the transition). Cold excitons count; hot ones do not. A negative dot adds one electron, a positive one a hole.
 *
 * <p>CdSe-like dots, whose hole levels are dense: weights (1, 0) — the bleach is the electron filling, at most 1.
 * Lead-chalcogenide dots with equal eightfold levels: weights (1, 1) — full filling inverts the transition (bleach 2).
 *
 * @param electronDegeneracy g_e
 * @param holeDegeneracy     g_h
 * @param electronWeight     w_e, how much electron filling blocks the transition (0..1)
 * @param holeWeight         w_h, how much hole filling blocks it (0..1)
 */
public record BandEdgeFilling(int electronDegeneracy, int holeDegeneracy, double electronWeight, double holeWeight) {

    public BandEdgeFilling {
        if (electronDegeneracy < 1 || holeDegeneracy < 1) {
            throw new IllegalArgumentException("band-edge degeneracies must be >= 1, were " + electronDegeneracy + " and "
                    + holeDegeneracy);
        }
        if (!(electronWeight >= 0 && electronWeight <= 1) || !(holeWeight >= 0 && holeWeight <= 1)
                || electronWeight + holeWeight == 0) {
            throw new IllegalArgumentException("filling weights must lie in [0, 1] and not both be 0, were "
                    + electronWeight + " and " + holeWeight);
        }
    }

    /** Electron filling only, degeneracy g: the convention of {@code simulate}'s bleach column. */
    public static BandEdgeFilling electronsOnly(int degeneracy) {
        return new BandEdgeFilling(degeneracy, degeneracy, 1, 0);
    }

    /** Electrons and holes with the same degeneracy g, both blocking: the two-level picture used for optical gain. */
    public static BandEdgeFilling twoLevel(int degeneracy) {
        return new BandEdgeFilling(degeneracy, degeneracy, 1, 1);
    }

    /** Bleach of each ladder state as a fraction of the unexcited band-edge absorption. */
    public double[] observable(LadderSpace space) {
        double[] o = new double[space.size()];
        for (int s = 0; s < o.length; s++) {
            int electrons = space.cold(s) + (space.charge(s) == Charge.NEGATIVE ? 1 : 0);
            int holes = space.cold(s) + (space.charge(s) == Charge.POSITIVE ? 1 : 0);
            o[s] = electronWeight * Math.min(electrons, electronDegeneracy) / (double) electronDegeneracy
                    + holeWeight * Math.min(holes, holeDegeneracy) / (double) holeDegeneracy;
        }
        return o;
    }

    /** Highest possible bleach (every level filled), w_e + w_h. */
    public double saturation() {
        return electronWeight + holeWeight;
    }

    /** ΔA (OD) of a bleach fraction given the unexcited band-edge absorbance A₀ (OD) at the probe: ΔA = −A₀·bleach. */
    public static double deltaA(double bleach, double bandEdgeAbsorbanceOd) {
        return -bandEdgeAbsorbanceOd * bleach;
    }

    /** ΔT/T of a change in absorbance: T = 10^{−A}, so ΔT/T = 10^{−ΔA} − 1 (≈ −ln10·ΔA when small). */
    public static double deltaTOverT(double deltaAOd) {
        return Math.pow(10, -deltaAOd) - 1;
    }
}
