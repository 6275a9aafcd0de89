package org.ladderkin.excite;

import org.hipparchus.special.Gamma;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class SpotAverageTest {

    @Test
    @CheckedAgainst(source = "derived: ∫exp(−2r²/w²)·exp(−2r²/b²) r dr / ∫exp(−2r²/b²) r dr = w²/(w² + b²) "
            + "for Gaussian pump w and Gaussian probe b", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void probeWeightedLinearGaussianAgainstClosedForm() {
        double[][] spots = {{100e-6, 40e-6}, {100e-6, 100e-6}, {50e-6, 150e-6}, {300e-6, 20e-6}};
        for (double[] s : spots) {
            GaussianBeam pump = new GaussianBeam(s[0]);
            GaussianBeam probe = new GaussianBeam(s[1]);
            double closed = s[0] * s[0] / (s[0] * s[0] + s[1] * s[1]);
            Reference.checkRelative(String.format("⟨N⟩probe/N₀, w = %.0f µm, b = %.0f µm, quadrature", s[0] * 1e6, s[1] * 1e6),
                    SpotAverage.average(pump, probe, n -> n, 1.0), closed, 1e-9);
            Reference.checkRelative(String.format("⟨N⟩probe/N₀, w = %.0f µm, b = %.0f µm, library closed form", s[0] * 1e6, s[1] * 1e6),
                    SpotAverage.linearFactor(pump, probe), closed, 1e-14);
        }
    }

    @Test
    @CheckedAgainst(source = "derived: with u = exp(−2r²/w²), ⟨1 − e^(−N)⟩probe = 1 − Γ(q+1)·P(q, N₀)/N₀^q, q = w²/b² "
            + "(P: Hipparchus regularised gamma); for q = 1 it reduces to 1 − (1 − e^(−N₀))/N₀", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void probeWeightedExcitedFractionAgainstClosedForm() {
        double[][] cases = {{0.1, 100e-6, 40e-6}, {1.5, 100e-6, 40e-6}, {8, 100e-6, 100e-6}, {3, 60e-6, 150e-6}, {40, 200e-6, 30e-6}};
        for (double[] c : cases) {
            double n0 = c[0];
            GaussianBeam pump = new GaussianBeam(c[1]);
            GaussianBeam probe = new GaussianBeam(c[2]);
            double q = c[1] * c[1] / (c[2] * c[2]);
            double closed = 1 - Math.exp(Gamma.logGamma(q + 1) - q * Math.log(n0)) * Gamma.regularizedGammaP(q, n0);
            String label = String.format("⟨1−e^−N⟩probe, N₀ = %s, w = %.0f µm, b = %.0f µm", n0, c[1] * 1e6, c[2] * 1e6);
            Reference.checkRelative(label + ", quadrature", SpotAverage.average(pump, probe, n -> -Math.expm1(-n), n0), closed, 1e-9);
            Reference.checkRelative(label + ", library closed form", SpotAverage.gaussianExcitedFraction(n0, c[1], c[2]), closed, 1e-12);
        }
        double n0 = 2.0;
        Reference.checkRelative("⟨1−e^−N⟩probe, equal spots, N₀ = 2 (elementary form)",
                SpotAverage.gaussianExcitedFraction(n0, 80e-6, 80e-6), 1 - (1 - Math.exp(-n0)) / n0, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "derived: flat R / Gaussian b: 1 − exp(−2R²/b²); Gaussian w / flat R: (w²/2R²)(1 − exp(−2R²/w²)); "
            + "flat R / flat P: min(1, R²/P²)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void otherProfilePairsLinear() {
        BeamProfile[][] pairs = {
            {new FlatTopBeam(100e-6), new GaussianBeam(80e-6)},
            {new GaussianBeam(100e-6), new FlatTopBeam(60e-6)},
            {new FlatTopBeam(100e-6), new FlatTopBeam(150e-6)},
            {new FlatTopBeam(100e-6), new FlatTopBeam(50e-6)}};
        double[] closed = {1 - Math.exp(-2 * 100.0 * 100 / (80 * 80)), (100.0 * 100 / (2 * 60 * 60)) * (1 - Math.exp(-2 * 60.0 * 60 / (100 * 100))),
            100.0 * 100 / (150 * 150), 1};
        for (int i = 0; i < pairs.length; i++) {
            String label = pairs[i][0].describe() + " / " + pairs[i][1].describe();
            Reference.checkRelative(label + ", quadrature", SpotAverage.average(pairs[i][0], pairs[i][1], n -> n, 1.0), closed[i], 1e-9);
            Reference.checkRelative(label + ", library closed form", SpotAverage.linearFactor(pairs[i][0], pairs[i][1]), closed[i], 1e-14);
        }
    }
}
