package org.ladderkin.kinetics.ensemble;

import java.util.function.Function;
import java.util.function.IntFunction;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.rate.AugerRecombination;

/**
 * A size ensemble relative to its mean size, as simulate and the planner average over it: quadrature members of a
 * {@link SizeDistribution} with weights and volume ratios v = (d/d̄)³. Per member the absorption cross-section, and so
 * ⟨N⟩ at a given fluence, scales by v (absorption far above the gap is proportional to the volume), and every Auger
 * rate of the model (biexciton, trions, stated higher rates) by 1/v (τ₂ ∝ V, the volume law the material library's
 * Auger constant states); the other rates do not depend on size in the model. The node count is not a setting: it is
 * raised until the averaged signal stops changing to {@link #CONVERGENCE}. Dots below {@link #DARK_VOLUME} of the
 * mean volume (only a distribution cut at d = 0 has them) are taken as never excited: they absorb 1e-4 of the mean
 * size's photons, so their share of any signal is below 1e-7, and their Auger rates (10⁴ times the mean size's and
 * more) would only stiffen the ladder; they keep their weight as dots in the ground state.
 */
public final class SizeEnsemble {

    /** Largest relative change of the averaged signal between two node counts that counts as converged. */
    public static final double CONVERGENCE = 1e-6;
    /** Volume ratio below which a member is taken as never excited. */
    public static final double DARK_VOLUME = 1e-4;
    /** Node counts tried in turn. */
    static final int[] NODE_COUNTS = {4, 6, 8, 12, 16, 24, 32, 48, 64};

    private final double relativeWidth;
    private final double[] volumeRatios;
    private final double[] weights;
    private final double darkWeight;

    private SizeEnsemble(double relativeWidth, double[] volumeRatios, double[] weights, double darkWeight) {
        this.relativeWidth = relativeWidth;
        this.volumeRatios = volumeRatios;
        this.weights = weights;
        this.darkWeight = darkWeight;
    }

    /** The ensemble of relative width w (σ_d/d̄) on {@code nodes} quadrature nodes (one when w = 0). */
    public static SizeEnsemble of(double relativeWidth, int nodes) {
        SizeDistribution.Nodes q = new SizeDistribution(1, relativeWidth).nodes(nodes);
        double[] d = q.diametersM();
        double[] w = q.weights();
        double[] v = new double[d.length];
        double[] kept = new double[d.length];
        int k = 0;
        double dark = 0;
        for (int i = 0; i < d.length; i++) {
            double vi = d[i] * d[i] * d[i];
            if (vi < DARK_VOLUME) {
                dark += w[i];
            } else {
                v[k] = vi;
                kept[k++] = w[i];
            }
        }
        return new SizeEnsemble(relativeWidth, java.util.Arrays.copyOf(v, k), java.util.Arrays.copyOf(kept, k), dark);
    }

    /**
     * The ensemble whose average of {@code averaged} is converged: node counts are raised through
     * {@link #NODE_COUNTS} until two successive averages differ by at most {@link #CONVERGENCE} times the largest
     * magnitude, in every block of the result (blocks are judged apart, so a PL rate in photons/s does not drown a
     * bleach). Monodisperse: one node, no search.
     *
     * @param averaged the ensemble average of the signals judged (blocks of values) for a given ensemble
     */
    public static SizeEnsemble converged(double relativeWidth, Function<SizeEnsemble, double[][]> averaged) {
        if (relativeWidth == 0) {
            return of(0, 1);
        }
        SizeEnsemble previous = of(relativeWidth, NODE_COUNTS[0]);
        double[][] last = averaged.apply(previous);
        double change = Double.NaN;
        for (int k = 1; k < NODE_COUNTS.length; k++) {
            SizeEnsemble next = of(relativeWidth, NODE_COUNTS[k]);
            double[][] now = averaged.apply(next);
            change = relativeChange(last, now);
            if (change <= CONVERGENCE) {
                return next;
            }
            last = now;
        }
        throw new IllegalStateException(String.format(java.util.Locale.ROOT, "the size average at %.3g %% dispersion did"
                + " not converge to %.0e with %d nodes (last change %.2e)", 100 * relativeWidth, CONVERGENCE,
                NODE_COUNTS[NODE_COUNTS.length - 1], change));
    }

    /** Largest change per block, relative to the block's largest magnitude (0 for an all-zero block). */
    static double relativeChange(double[][] a, double[][] b) {
        double worst = 0;
        for (int k = 0; k < b.length; k++) {
            double scale = 0;
            double diff = 0;
            for (int i = 0; i < b[k].length; i++) {
                scale = Math.max(scale, Math.abs(b[k][i]));
                diff = Math.max(diff, Math.abs(a[k][i] - b[k][i]));
            }
            if (scale > 0) {
                worst = Math.max(worst, diff / scale);
            }
        }
        return worst;
    }

    /** Relative width w = σ_d/d̄. */
    public double relativeWidth() {
        return relativeWidth;
    }

    /** Weight of the dots taken as never excited (below {@link #DARK_VOLUME}); with the members' it sums to 1. */
    public double darkWeight() {
        return darkWeight;
    }

    /** Quadrature nodes, dark ones included. */
    public int nodes() {
        return weights.length + (darkWeight > 0 ? 1 : 0);
    }

    /** Number of members (quadrature nodes that can be excited). */
    public int size() {
        return weights.length;
    }

    /** Weight of member {@code i} (the weights sum to 1). */
    public double weight(int i) {
        return weights[i];
    }

    /** Volume of member {@code i} over the mean size's, (d_i/d̄)³: the factor on σ and ⟨N⟩. */
    public double volumeRatio(int i) {
        return volumeRatios[i];
    }

    /** The model of member {@code i}: every Auger rate divided by its volume ratio. */
    public KineticModel modelAt(KineticModel base, int i) {
        double v = volumeRatios[i];
        if (v == 1) {
            return base;
        }
        return base.withLaws(AugerRecombination.class, a -> a.scaled(1 / v));
    }

    /** Σ_i w_i·f(i) over the members, element by element, in blocks of equal shape (dark dots add nothing). */
    public double[][] average(IntFunction<double[][]> perMember) {
        double[][] sum = null;
        for (int i = 0; i < weights.length; i++) {
            double[][] f = perMember.apply(i);
            if (sum == null) {
                sum = new double[f.length][];
                for (int k = 0; k < f.length; k++) {
                    sum[k] = new double[f[k].length];
                }
            }
            for (int k = 0; k < f.length; k++) {
                for (int j = 0; j < f[k].length; j++) {
                    sum[k][j] += weights[i] * f[k][j];
                }
            }
        }
        return sum;
    }
}
