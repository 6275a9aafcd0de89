package org.ladderkin.excite;

import java.util.function.DoubleUnaryOperator;

/**
 * Averages over the depth of a sample that attenuates the pump (Beer–Lambert): at fractional depth t = z/L the fluence
 * is F₀·10^(−A·t), A the decadic absorbance at the pump over the whole path. A transient-absorption probe crossing the
 * sample weights every depth equally (uniform concentration), so it sees ∫₀¹ f(N₀·10^(−A·t)) dt.
 */
public final class DepthAverage {

    private DepthAverage() {
    }

    /** ⟨N⟩_depth / N₀ for a linear response: (1 − 10^(−A))/(A·ln 10), which tends to 1 as A → 0. */
    public static double linearFactor(double absorbance) {
        requireAbsorbance(absorbance);
        double x = absorbance * Math.log(10);
        return x < 1e-8 ? 1 - x / 2 : -Math.expm1(-x) / x;
    }

    /** Depth average of f(N₀·10^(−A·t)) by quadrature. */
    public static double average(DoubleUnaryOperator f, double nFront, double absorbance) {
        requireAbsorbance(absorbance);
        return UnitQuadrature.integrate(t -> f.applyAsDouble(nFront * Math.pow(10, -absorbance * t)));
    }

    /** Fraction of the pump energy absorbed over the path: 1 − 10^(−A) (reflections neglected). */
    public static double absorbedFraction(double absorbance) {
        requireAbsorbance(absorbance);
        return -Math.expm1(-absorbance * Math.log(10));
    }

    private static void requireAbsorbance(double a) {
        if (!(a >= 0) || !Double.isFinite(a)) {
            throw new IllegalArgumentException("absorbance must be >= 0 and finite, was " + a + " OD");
        }
    }
}
