package org.ladderkin.excite;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;

/**
 * Finds the pulse energy that gives a target value of a response rising with energy (⟨N⟩ on axis, probe-averaged ⟨N⟩,
 * probe-averaged excited fraction...), so a user can set the attenuator. Works on ln E with a bracket grown from a
 * guess, then Hipparchus' Brent solver: robust for any monotonic response, linear or not.
 */
public final class PulseEnergySolver {

    private static final double LN_E_LOW = Math.log(1e-21);
    private static final double LN_E_HIGH = Math.log(1e3);

    private PulseEnergySolver() {
    }

    /**
     * @param responseOfEnergy the response as a function of pulse energy (J), rising
     * @param target           value wanted
     * @param guessJ           a starting energy (J)
     * @param relativeAccuracy relative accuracy wanted on the energy
     * @return the pulse energy (J)
     * @throws IllegalArgumentException when no energy between 1e-21 J and 1 kJ reaches the target
     */
    public static double solve(DoubleUnaryOperator responseOfEnergy, double target, double guessJ, double relativeAccuracy) {
        if (!(target > 0) || !Double.isFinite(target)) {
            throw new IllegalArgumentException("target must be > 0 and finite, was " + target);
        }
        DoubleUnaryOperator g = lnE -> responseOfEnergy.applyAsDouble(Math.exp(lnE)) - target;
        double lo = Math.log(guessJ);
        double hi = lo;
        double step = 1;
        while (g.applyAsDouble(lo) > 0) {
            lo -= step;
            step *= 2;
            if (lo < LN_E_LOW) {
                throw new IllegalArgumentException("target " + target + " is reached below 1e-21 J: check the inputs");
            }
        }
        step = 1;
        while (g.applyAsDouble(hi) < 0) {
            hi += step;
            step *= 2;
            if (hi > LN_E_HIGH) {
                throw new IllegalArgumentException("target " + target + " cannot be reached with any pulse energy up to 1 kJ "
                        + "(a saturating response never exceeds its limit)");
            }
        }
        if (lo == hi) {
            return Math.exp(lo);
        }
        try {
            double lnE = new BrentSolver(relativeAccuracy, relativeAccuracy * 1e-3).solve(500, g::applyAsDouble, lo, hi);
            return Math.exp(lnE);
        } catch (MathIllegalArgumentException e) {
            throw new IllegalArgumentException("no pulse energy found for target " + target + ": " + e.getMessage(), e);
        }
    }
}
