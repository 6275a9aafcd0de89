package org.ladderkin.fit.counting;

import java.util.SplittableRandom;
import org.hipparchus.special.Erf;

/**
 * Histograms written independently of the production model: sums of exponentials convolved with a Gaussian IRF in
 * closed form (the exponentially modified Gaussian's distribution function, integrated exactly over each bin), the
 * tails of earlier pulses added by summing shifted copies, then Poisson noise.
 */
final class SimulatedHistograms {

    private SimulatedHistograms() {
    }

    /**
     * ∫ over [a, b] of (Gaussian(centre, σ) ⊗ e^{−t/τ}·step(t)) dt = τ·[F(b) − F(a)], F the exGaussian distribution
     * function F(x) = Φ(z) − exp(−x'/τ + σ²/(2τ²))·Φ(z − σ/τ), x' = x − centre, z = x'/σ.
     */
    static double binIntegral(double a, double b, double centre, double sigma, double tau) {
        return tau * (cdf(b, centre, sigma, tau) - cdf(a, centre, sigma, tau));
    }

    private static double cdf(double x, double centre, double sigma, double tau) {
        double xp = x - centre;
        double z = xp / sigma;
        double lambdaSigma = sigma / tau;
        return phi(z) - Math.exp(-xp / tau + lambdaSigma * lambdaSigma / 2) * phi(z - lambdaSigma);
    }

    private static double phi(double z) {
        return 0.5 * Erf.erfc(-z / Math.sqrt(2));
    }

    /**
     * Mean counts per bin of a multi-exponential decay (weights w_k, lifetimes τ_k, so the rate at t = 0⁺ is Σ w_k)
     * under a Gaussian IRF at {@code centreS}, scaled so the highest bin holds {@code peak} above {@code background},
     * summed over {@code earlierPulses} earlier pulses {@code periodS} apart.
     */
    static double[] mean(int bins, double startS, double binS, double centreS, double fwhmS, double[] weights, double[] tausS,
                         double periodS, int earlierPulses, double peak, double background) {
        double sigma = fwhmS / (2 * Math.sqrt(2 * Math.log(2)));
        double[] m = new double[bins];
        double max = 0;
        for (int i = 0; i < bins; i++) {
            double a = startS + i * binS;
            double b = a + binS;
            double s = 0;
            for (int k = 0; k <= earlierPulses; k++) {
                for (int c = 0; c < tausS.length; c++) {
                    s += weights[c] * binIntegral(a + k * periodS, b + k * periodS, centreS, sigma, tausS[c]);
                }
            }
            m[i] = s;
            max = Math.max(max, s);
        }
        for (int i = 0; i < bins; i++) {
            m[i] = peak * m[i] / max + background;
        }
        return m;
    }

    /** Poisson deviates of each mean (multiplication method; means here stay far below 700). */
    static double[] poisson(double[] mean, SplittableRandom random) {
        double[] n = new double[mean.length];
        for (int i = 0; i < n.length; i++) {
            double limit = Math.exp(-mean[i]);
            double product = random.nextDouble();
            int k = 0;
            while (product > limit) {
                product *= random.nextDouble();
                k++;
            }
            n[i] = k;
        }
        return n;
    }
}
