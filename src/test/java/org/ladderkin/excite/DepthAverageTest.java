package org.ladderkin.excite;

import java.util.function.DoubleUnaryOperator;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Depth averaging through an absorbing sample against a direct numerical integration written here in physical units
 * (composite Simpson over z with the fluence F(z) = F₀·exp(−αz), α = A·ln10/L), and against the optically thin limit.
 */
class DepthAverageTest {

    /** (1/L)∫₀ᴸ f(N₀·exp(−αz)) dz by composite Simpson with 20 000 panels, in metres. */
    private static double direct(DoubleUnaryOperator f, double n0, double absorbance, double pathM) {
        int panels = 20_000;
        double alphaPerM = absorbance * Math.log(10) / pathM;
        double h = pathM / panels;
        double sum = 0;
        for (int i = 0; i <= panels; i++) {
            double z = i * h;
            double w = i == 0 || i == panels ? 1 : i % 2 == 1 ? 4 : 2;
            sum += w * f.applyAsDouble(n0 * Math.exp(-alphaPerM * z));
        }
        return sum * h / 3 / pathM;
    }

    @Test
    @CheckedAgainst(source = "derived: direct Simpson integration over depth of Beer–Lambert attenuation, in the test",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void depthAverageAgainstDirectIntegration() {
        double path = 1e-3;
        for (double a : new double[] {0.05, 0.3, 1.0, 2.5}) {
            Reference.checkRelative("depth-averaged ⟨N⟩/N₀ at A = " + a + " (closed form vs direct)",
                    DepthAverage.linearFactor(a), direct(n -> n, 1.0, a, path), 1e-10);
            for (double n0 : new double[] {0.5, 4.0}) {
                DoubleUnaryOperator frac = n -> -Math.expm1(-n);
                Reference.checkRelative("depth-averaged excited fraction at A = " + a + ", N₀ = " + n0 + " (quadrature vs direct)",
                        DepthAverage.average(frac, n0, a), direct(frac, n0, a, path), 1e-10);
            }
        }
    }

    @Test
    @CheckedAgainst(source = "derived: optically thin limit, (1 − 10^(−A))/(A ln10) = 1 − A·ln10/2 + O(A²) → 1",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void thinLimit() {
        for (double a : new double[] {1e-3, 1e-6, 1e-10}) {
            Reference.check("depth factor at A = " + a, DepthAverage.linearFactor(a), 1 - a * Math.log(10) / 2, a * a * 10);
            Reference.checkRelative("depth-averaged excited fraction at A = " + a + ", N₀ = 2",
                    DepthAverage.average(n -> -Math.expm1(-n), 2.0, a), 1 - Math.exp(-2.0), 2 * a);
        }
        Reference.check("depth factor at A = 0", DepthAverage.linearFactor(0), 1, 0);
    }

    @Test
    @CheckedAgainst(source = "derived: spot and depth averages of a linear response factorise, so the joint quadrature must "
            + "equal the product of the two closed forms", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void jointSpotAndDepthAverage() {
        ExcitationGeometry g = new ExcitationGeometry(new GaussianBeam(100e-6), new GaussianBeam(40e-6), 1.2, true);
        Reference.checkRelative("joint quadrature of ⟨N⟩ vs closed-form product", g.average(n -> n, 3.0), 3.0 * g.linearFactor(), 1e-9);
    }
}
