package org.ladderkin.excite;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.special.Gamma;

/**
 * Averages over the probe spot of a response to the pump fluence. The probe measures
 * ⟨f⟩ = ∫ f(N(r))·p(r)·2πr dr / ∫ p(r)·2πr dr, with N(r) = N₀·s(r) the pump profile and p(r) the probe profile.
 * Any f and any pair of profiles is done by radial quadrature (normalised by the quadrature of the weight itself, so
 * truncating the Gaussian tail cancels); closed forms exist for the linear response and for a Gaussian pair.
 */
public final class SpotAverage {

    private SpotAverage() {
    }

    /**
     * Probe-weighted average of f(N₀·s(r)) by quadrature.
     *
     * @param nPeak ⟨N⟩ (or any quantity linear in fluence) on the pump axis
     */
    public static double average(BeamProfile pump, BeamProfile probe, DoubleUnaryOperator f, double nPeak) {
        // Integrate in x = r / rMax over [0, 1], split where the pump jumps and on the pump's own length scale, so the
        // rule never straddles a kink or a narrow Gaussian.
        double rMax = probe.weightLimitM();
        double pumpScale = pump.radiusM() / rMax;
        double[] cuts = new double[pump.edgesM().length + 4];
        int k = 0;
        for (double e : pump.edgesM()) {
            cuts[k++] = e / rMax;
        }
        for (int i = 1; i <= 4; i++) {
            cuts[k++] = i * 0.5 * pumpScale;
        }
        double total = UnitQuadrature.integrate(x -> probe.weightDensity(x * rMax) * rMax, cuts);
        double sum = UnitQuadrature.integrate(
                x -> f.applyAsDouble(nPeak * pump.shape(x * rMax)) * probe.weightDensity(x * rMax) * rMax, cuts);
        return sum / total;
    }

    /**
     * ⟨N⟩_probe / N₀ for a response linear in fluence, in closed form for every pair of profiles here:
     * Gaussian w / Gaussian b: w²/(w² + b²); flat R / Gaussian b: 1 − exp(−2R²/b²);
     * Gaussian w / flat R: (w²/(2R²))·(1 − exp(−2R²/w²)); flat R / flat P: min(1, R²/P²).
     */
    public static double linearFactor(BeamProfile pump, BeamProfile probe) {
        double a = pump.radiusM();
        double b = probe.radiusM();
        if (pump instanceof GaussianBeam && probe instanceof GaussianBeam) {
            return a * a / (a * a + b * b);
        }
        if (pump instanceof FlatTopBeam && probe instanceof GaussianBeam) {
            return -Math.expm1(-2 * a * a / (b * b));
        }
        if (pump instanceof GaussianBeam && probe instanceof FlatTopBeam) {
            double x = 2 * b * b / (a * a);
            return -Math.expm1(-x) / x;
        }
        return Math.min(1, a * a / (b * b));
    }

    /**
     * Probe-weighted excited fraction ⟨1 − e^(−N)⟩ for a Gaussian pump (1/e² radius w) and Gaussian probe (b), in closed
     * form: with q = w²/b², ⟨1 − e^(−N)⟩ = 1 − Γ(q+1)·P(q, N₀)/N₀^q, P the regularised lower incomplete gamma function.
     * Derivation: substitute u = exp(−2r²/w²); the probe weight becomes q·u^(q−1) du on [0, 1].
     */
    public static double gaussianExcitedFraction(double nPeak, double pumpRadiusM, double probeRadiusM) {
        if (!(nPeak >= 0)) {
            throw new IllegalArgumentException("⟨N⟩ must be >= 0, was " + nPeak);
        }
        if (nPeak == 0) {
            return 0;
        }
        double q = pumpRadiusM * pumpRadiusM / (probeRadiusM * probeRadiusM);
        double logTerm = Gamma.logGamma(q + 1) - q * Math.log(nPeak) + Math.log(Gamma.regularizedGammaP(q, nPeak, 1e-15, 100_000));
        return -Math.expm1(logTerm);
    }
}
