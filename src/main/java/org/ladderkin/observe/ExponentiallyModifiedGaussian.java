package org.ladderkin.observe;

import org.hipparchus.special.Erf;

/**
 * A single-exponential decay e^{−k(t−t0)} (t ≥ t0) convolved with a unit-area Gaussian of standard deviation σ:
 * f(t) = ½·exp(k(t0 − t) + k²σ²/2)·erfc((t0 + kσ² − t)/(√2σ)). Written with the scaled complementary error function
 * so that it neither overflows before the peak nor underflows far in the tail.
 */
public final class ExponentiallyModifiedGaussian {

    private ExponentiallyModifiedGaussian() {
    }

    /**
     * Value at {@code tS} of the convolution of e^{−k(t − t0)}·H(t − t0) with a unit-area Gaussian.
     *
     * @param rateKPerS decay rate k (1/s), > 0
     * @param sigmaS    Gaussian standard deviation (s), > 0
     * @param t0S       start of the decay (s)
     */
    public static double value(double tS, double rateKPerS, double sigmaS, double t0S) {
        double z = (t0S + rateKPerS * sigmaS * sigmaS - tS) / (Math.sqrt(2) * sigmaS);
        double a = rateKPerS * (t0S - tS) + 0.5 * rateKPerS * rateKPerS * sigmaS * sigmaS;
        if (z < 0) {
            return 0.5 * Math.exp(a) * Erf.erfc(z);
        }
        // exp(a)·erfc(z) = exp(a − z²)·erfcx(z), and a − z² = −(t − t0)²/(2σ²) stays bounded
        return 0.5 * Math.exp(a - z * z) * erfcx(z);
    }

    /** Scaled complementary error function erfcx(z) = e^{z²}·erfc(z) for z ≥ 0. */
    static double erfcx(double z) {
        if (z < 4) {
            return Math.exp(z * z) * Erf.erfc(z);
        }
        // Continued fraction (Abramowitz & Stegun 7.1.14), evaluated bottom-up; converges quickly for z ≥ 4.
        double f = z;
        for (int n = 60; n >= 1; n--) {
            f = z + (n / 2.0) / f;
        }
        return 1.0 / (Math.sqrt(Math.PI) * f);
    }
}
