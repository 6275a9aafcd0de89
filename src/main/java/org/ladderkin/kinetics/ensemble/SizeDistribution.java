package org.ladderkin.kinetics.ensemble;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * A Gaussian distribution of dot diameters with mean d̄ and standard deviation w·d̄, sampled by Gauss–Hermite
 * quadrature: ∫ f(d) N(d; d̄, w·d̄) dd ≈ Σ_i (ω_i/√π)·f(d̄ + √2·w·d̄·x_i). Nodes at d ≤ 0 (possible only for w ≳ 0.2)
 * are dropped and the remaining weights renormalised.
 *
 * @param meanDiameterM d̄ (m)
 * @param relativeWidth w = σ_d/d̄ (0 for monodisperse)
 */
public record SizeDistribution(double meanDiameterM, double relativeWidth) {

    public SizeDistribution {
        if (!(meanDiameterM > 0) || !Double.isFinite(meanDiameterM)) {
            throw new IllegalArgumentException("mean diameter must be > 0 m, was " + meanDiameterM);
        }
        if (!(relativeWidth >= 0 && relativeWidth < 0.5)) {
            throw new IllegalArgumentException("relative size width must be in [0, 0.5), was " + relativeWidth);
        }
    }

    /** Quadrature nodes: diameters (m) and weights summing to 1. */
    public record Nodes(double[] diametersM, double[] weights) {
    }

    /** {@code count}-point Gauss–Hermite nodes (one node when monodisperse). */
    public Nodes nodes(int count) {
        if (relativeWidth == 0 || count == 1) {
            return new Nodes(new double[] {meanDiameterM}, new double[] {1});
        }
        GaussIntegrator rule = new GaussIntegratorFactory().hermite(count);
        int n = rule.getNumberOfPoints();
        double[] d = new double[n];
        double[] w = new double[n];
        int kept = 0;
        double total = 0;
        for (int i = 0; i < n; i++) {
            double di = meanDiameterM * (1 + Math.sqrt(2) * relativeWidth * rule.getPoint(i));
            if (di > 0) {
                d[kept] = di;
                w[kept] = rule.getWeight(i);
                total += w[kept];
                kept++;
            }
        }
        double[] dk = java.util.Arrays.copyOf(d, kept);
        double[] wk = java.util.Arrays.copyOf(w, kept);
        for (int i = 0; i < kept; i++) {
            wk[i] /= total;
        }
        return new Nodes(dk, wk);
    }
}
