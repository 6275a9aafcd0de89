package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.analysis.integration.TrapezoidIntegrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class TracePredictionTest {

    private static final double PERIOD_S = 1e-3;
    private static final double[] DELAYS_S = {1e-12, 30e-12, 300e-12};
    private static final double OD = 0.3;

    private static ModelAssumptions model() {
        return new ModelAssumptions(20e-9, 0.5, 30e-12, AugerScaling.STATISTICAL, RadiativeScaling.STATISTICAL, 120e-12,
                40e-12, 1e-4, 10, Double.POSITIVE_INFINITY, 0.5e-12, List.of());
    }

    /**
     * The size average by a dense trapezoid rule over the standard score z of the Gaussian (cut at d = 0), each
     * diameter evaluated by its own engine run: σ and ⟨N⟩ ∝ V, every Auger rate ∝ 1/V.
     */
    private static double[] trapezoidBleach(KineticModel km, double meanSizeN, double w) {
        Map<Double, double[]> cache = new HashMap<>();
        java.util.function.DoubleFunction<double[]> atZ = z -> cache.computeIfAbsent(z, x -> {
            double v = Math.pow(1 + w * x, 3);
            // below 1e-4 of the mean volume a dot is taken as never excited (the model's definition)
            if (!(v >= 1e-4)) {
                return new double[DELAYS_S.length];
            }
            KineticModel sized = km.withLaws(AugerRecombination.class, a -> a.scaled(1 / v));
            PulseExcitation p = new PulseExcitation.Poisson(v * meanSizeN);
            LadderKinetics k = LadderKinetics.forPulses(sized, p);
            return k.trace(k.steadyState(p, PERIOD_S, false).afterPulse(), DELAYS_S).bleach();
        });
        double lo = Math.max(-8, -1 / w);
        double mass = new TrapezoidIntegrator(1e-13, 1e-15, 3, 30).integrate(1_000_000, x -> Math.exp(-0.5 * x * x), lo, 8);
        double[] out = new double[DELAYS_S.length];
        for (int d = 0; d < out.length; d++) {
            int delay = d;
            out[d] = new TrapezoidIntegrator(1e-9, 1e-14, 3, 30).integrate(1_000_000,
                    z -> Math.exp(-0.5 * z * z) * atZ.apply(z)[delay], lo, 8) / mass;
        }
        return out;
    }

    private static void compare(double w) {
        KineticModel km = model().kineticModel(2);
        double[] n = {0.5, 3};
        Predictions p = TracePrediction.predict(km, n, PERIOD_S, DELAYS_S, OD, model(), w);
        assertThat(p.sizeDispersion()).isEqualTo(w);
        double[] refs = trapezoidBleach(km, n[1], w);
        for (int d = 0; d < DELAYS_S.length; d++) {
            double ref = refs[d];
            Reference.checkRelative(String.format(java.util.Locale.ROOT, "size-averaged bleach, ⟨N⟩ = 3 of the mean size,"
                    + " w = %.0f %%, %.0f ps, 1 kHz steady state", 100 * w, DELAYS_S[d] * 1e12),
                    -p.deltaAOd().get(1)[d] / OD, ref, 2e-6);
        }
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 TrapezoidIntegrator (iterated to 1e-10) over the Gaussian size distribution,"
            + " one engine run per diameter", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void sizeAverageOfTheBleachAgreesWithATrapezoidRuleOverTheDiameters() {
        compare(0.10);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 TrapezoidIntegrator (iterated to 1e-10) over the Gaussian size distribution"
            + " cut at d = 0, one engine run per diameter", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void distributionCutAtZeroSizeAgreesWithATrapezoidRule() {
        compare(0.20);
    }

    @Test
    void dispersionChangesTheBleachAndOneSizeNeedsOneNode() {
        KineticModel km = model().kineticModel(2);
        double[] n = {3};
        Predictions mono = TracePrediction.predict(km, n, PERIOD_S, DELAYS_S, OD, model(), 0);
        Predictions wide = TracePrediction.predict(km, n, PERIOD_S, DELAYS_S, OD, model(), 0.1);
        assertThat(mono.sizeNodes()).isEqualTo(1);
        assertThat(wide.sizeNodes()).isGreaterThan(4);
        assertThat(Math.abs(wide.deltaAOd().get(0)[1] / mono.deltaAOd().get(0)[1] - 1)).isGreaterThan(1e-2);
    }
}
