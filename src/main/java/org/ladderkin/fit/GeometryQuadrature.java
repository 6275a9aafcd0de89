package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.ladderkin.excite.BeamProfile;
import org.ladderkin.excite.ExcitationGeometry;

/**
 * The probe's view of the pump as a short list of relative excitations: the probe sees ⟨N⟩(r, z) = N₀·s(r)·10^(−A·z/L)
 * with weight p(r)·2πr dr·dz, so any response averages as Σ_k w_k·f(N₀·c_k). The nodes follow
 * {@link org.ladderkin.excite.SpotAverage} and {@link org.ladderkin.excite.DepthAverage} (radius normalised to the probe's
 * weight limit, split where the pump jumps and at half-multiples of its radius; depth on [0, 1]) but with a fixed
 * Gauss–Legendre rule per piece instead of an adaptive one, so that a fit evaluates the ladder at the same few ⟨N⟩
 * every time (within 1e-4 of the adaptive average for Gaussian and flat-top pairs). Because the ladder is linear in populations, averaging the post-pulse populations over these nodes and
 * propagating once gives the averaged bleach at every delay.
 */
final class GeometryQuadrature {

    /** Gauss–Legendre points per radial piece and over the depth. */
    private static final int RADIAL_POINTS = 6;
    private static final int DEPTH_POINTS = 4;
    /** Nodes whose weight is below this share are dropped (they cannot change the average). */
    private static final double NEGLIGIBLE = 1e-13;

    private final double[] factors;
    private final double[] weights;

    private GeometryQuadrature(double[] factors, double[] weights) {
        this.factors = factors;
        this.weights = weights;
    }

    /** One node at c = 1: a pump uniform over the probe in an optically thin sample. */
    static GeometryQuadrature uniform() {
        return new GeometryQuadrature(new double[] {1}, new double[] {1});
    }

    static GeometryQuadrature of(ExcitationGeometry g) {
        BeamProfile pump = g.pump();
        BeamProfile probe = g.probe();
        double rMax = probe.weightLimitM();
        List<Double> cuts = new ArrayList<>();
        cuts.add(0.0);
        for (double e : pump.edgesM()) {
            cuts.add(e / rMax);
        }
        for (int i = 1; i <= 4; i++) {
            cuts.add(i * 0.5 * pump.radiusM() / rMax);
        }
        cuts.add(1.0);
        double[] c = cuts.stream().mapToDouble(Double::doubleValue).filter(x -> x >= 0 && x <= 1).sorted().distinct().toArray();
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        List<double[]> radial = new ArrayList<>();
        double total = 0;
        for (int piece = 0; piece + 1 < c.length; piece++) {
            GaussIntegrator rule = factory.legendre(RADIAL_POINTS, c[piece] * rMax, c[piece + 1] * rMax);
            for (int q = 0; q < rule.getNumberOfPoints(); q++) {
                double r = rule.getPoint(q);
                double w = rule.getWeight(q) * probe.weightDensity(r);
                radial.add(new double[] {pump.shape(r), w});
                total += w;
            }
        }
        List<double[]> depth = new ArrayList<>();
        if (g.depthAveraged() && g.absorbance() > 0) {
            GaussIntegrator rule = factory.legendre(DEPTH_POINTS, 0, 1);
            for (int q = 0; q < rule.getNumberOfPoints(); q++) {
                depth.add(new double[] {Math.pow(10, -g.absorbance() * rule.getPoint(q)), rule.getWeight(q)});
            }
        } else {
            depth.add(new double[] {1, 1});
        }
        List<double[]> nodes = new ArrayList<>();
        for (double[] rn : radial) {
            for (double[] dn : depth) {
                double w = rn[1] / total * dn[1];
                if (w > NEGLIGIBLE) {
                    nodes.add(new double[] {rn[0] * dn[0], w});
                }
            }
        }
        double[] f = new double[nodes.size()];
        double[] w = new double[nodes.size()];
        for (int k = 0; k < f.length; k++) {
            f[k] = nodes.get(k)[0];
            w[k] = nodes.get(k)[1];
        }
        return new GeometryQuadrature(f, w);
    }

    int size() {
        return factors.length;
    }

    /** Excitation at node k relative to the pump axis at the front face. */
    double factor(int k) {
        return factors[k];
    }

    /** Weight of node k; the weights sum to the probe's share of dots the nodes cover (1 up to the dropped tail). */
    double weight(int k) {
        return weights[k];
    }

    /** Probe-weighted ⟨N⟩ per unit on-axis ⟨N⟩: Σ w_k c_k. */
    double linearFactor() {
        double s = 0;
        for (int k = 0; k < factors.length; k++) {
            s += weights[k] * factors[k];
        }
        return s;
    }
}
