package org.ladderkin.kinetics.ensemble;

import java.util.Arrays;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * A Gaussian distribution of dot diameters with mean d̄ and standard deviation w·d̄, cut at d = 0 (no dot has a
 * negative size) and renormalised. While the cut lies beyond {@link #CUT_SIGMAS} standard deviations (w below about
 * 12 %) it removes less than 1e-15 of the weight and the nodes are Gauss–Hermite:
 * ∫ f(d) N(d; d̄, w·d̄) dd ≈ Σ_i (ω_i/√π)·f(d̄ + √2·w·d̄·x_i). Wider distributions would put Hermite nodes at or below
 * d = 0 and integrate the cut as a step, which converges slowly; there the nodes are Gauss–Legendre on the standard
 * score z ∈ [max(−1/w, −{@link #CUT_SIGMAS}), {@link #CUT_SIGMAS}] with weights ω_i·φ(z_i), where the integrand is smooth.
 *
 * @param meanDiameterM d̄ (m)
 * @param relativeWidth w = σ_d/d̄ (0 for monodisperse)
 */
public record SizeDistribution(double meanDiameterM, double relativeWidth) {

    /** Standard deviations beyond which the Gaussian weight (below 1e-15) is left out. */
    public static final double CUT_SIGMAS = 8;

    public SizeDistribution {
        if (!(meanDiameterM > 0) || !Double.isFinite(meanDiameterM)) {
            throw new IllegalArgumentException("mean diameter must be > 0 m, was " + meanDiameterM);
        }
        if (!(relativeWidth >= 0 && relativeWidth < 0.5)) {
            throw new IllegalArgumentException("relative size width must be in [0, 0.5) (a wider Gaussian puts a"
                    + " visible share of the dots at sizes ≤ 0), was " + relativeWidth);
        }
    }

    /** Quadrature nodes: diameters (m) and weights summing to 1. */
    public record Nodes(double[] diametersM, double[] weights) {
        public Nodes {
            diametersM = diametersM.clone();
            weights = weights.clone();
        }

        @Override
        public double[] diametersM() {
            return diametersM.clone();
        }

        @Override
        public double[] weights() {
            return weights.clone();
        }

        public int size() {
            return diametersM.length;
        }
    }

    /** Whether the Gaussian reaches d = 0 within {@link #CUT_SIGMAS} standard deviations. */
    public boolean cut() {
        return relativeWidth * CUT_SIGMAS >= 1;
    }

    /** {@code count}-point nodes (one node when monodisperse); Gauss–Hermite or, for a cut distribution, Gauss–Legendre. */
    public Nodes nodes(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("quadrature needs at least one node, was " + count);
        }
        if (relativeWidth == 0 || count == 1) {
            return new Nodes(new double[] {meanDiameterM}, new double[] {1});
        }
        double[] d = new double[count];
        double[] w = new double[count];
        int kept = 0;
        double total = 0;
        if (!cut()) {
            GaussIntegrator rule = new GaussIntegratorFactory().hermite(count);
            for (int i = 0; i < rule.getNumberOfPoints(); i++) {
                double di = meanDiameterM * (1 + Math.sqrt(2) * relativeWidth * rule.getPoint(i));
                // a node beyond the cut carries a Hermite weight far below 1e-15
                if (di > 0) {
                    d[kept] = di;
                    w[kept] = rule.getWeight(i);
                    total += w[kept];
                    kept++;
                }
            }
        } else {
            GaussIntegrator rule = new GaussIntegratorFactory().legendre(count, Math.max(-1 / relativeWidth, -CUT_SIGMAS),
                    CUT_SIGMAS);
            for (int i = 0; i < rule.getNumberOfPoints(); i++) {
                double z = rule.getPoint(i);
                d[kept] = meanDiameterM * (1 + relativeWidth * z);
                w[kept] = rule.getWeight(i) * Math.exp(-0.5 * z * z);
                total += w[kept];
                kept++;
            }
        }
        double[] dk = Arrays.copyOf(d, kept);
        double[] wk = Arrays.copyOf(w, kept);
        for (int i = 0; i < kept; i++) {
            wk[i] /= total;
        }
        return new Nodes(dk, wk);
    }
}
