package org.ladderkin.fit.counting;

/**
 * The classical dead-time (pile-up) correction of a start–stop counter that records only the first photon after each
 * excitation (P. B. Coates, J. Phys. E 1, 878 (1968), cited from memory; the relation itself, bin i seeing only
 * E − Σ_{j&lt;i} n_j effective excitation cycles, was checked against a stored description of TCSPC pile-up): a photon
 * due in bin i is recorded only when no earlier bin of the same cycle fired, so the recorded counts are
 * n_i = N_i·(1 − Σ_{j&lt;i} n_j / N_E) for N_E excitation cycles. The
 * model applies it forwards to its expected counts; with it, count rates of a few per cent of the excitation rate
 * are fitted without the early-photon bias.
 *
 * @param cycles the number of excitation cycles in the acquisition, N_E (&gt; 0)
 */
public record PileUp(double cycles) {

    public PileUp {
        if (!(cycles > 0) || !Double.isFinite(cycles)) {
            throw new IllegalArgumentException("pile-up correction needs the number of excitation cycles (> 0), was " + cycles);
        }
    }

    /** Expected recorded counts from the counts that would arrive without dead time, in place. */
    public void apply(double[] expected) {
        double recorded = 0;
        for (int i = 0; i < expected.length; i++) {
            expected[i] *= Math.max(0, 1 - recorded / cycles);
            recorded += expected[i];
        }
    }

    /** The correction itself: the counts that would have arrived, from recorded counts. */
    public double[] correct(double[] recordedCounts) {
        double[] n = new double[recordedCounts.length];
        double before = 0;
        for (int i = 0; i < n.length; i++) {
            n[i] = recordedCounts[i] / (1 - before / cycles);
            before += recordedCounts[i];
        }
        return n;
    }
}
