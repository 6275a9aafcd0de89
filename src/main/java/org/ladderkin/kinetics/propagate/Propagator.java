package org.ladderkin.kinetics.propagate;

/**
 * Exact propagation p(t) = exp(Q·t)·p(0) for one constant generator Q (rates in 1/s). Implemented by the modal
 * {@link ExactPropagator} and by {@link SettlingPropagator} for ladders with a fast transient (hot excitons).
 */
public interface Propagator {

    /** Number of states. */
    int dimension();

    /** p(t) = exp(Qt)·p0, t ≥ 0 in seconds. */
    double[] propagate(double[] p0, double tS);

    /** The full propagator matrix exp(Qt). */
    double[][] matrix(double tS);

    /** Prepares traces on a fixed time grid (s, each ≥ 0). */
    TraceGrid onGrid(double[] timesS);

    /** Observable traces on a fixed time grid. */
    interface TraceGrid {

        /** The grid times (s), a copy. */
        double[] timesS();

        /** The traces o_r·p(t_j) for each observable row o_r, starting from p0 at t = 0. */
        double[][] observe(double[][] observables, double[] p0);

        /** The traces for several starts at once, [start][observable][time]. */
        default double[][][] observeAll(double[][] observables, double[][] starts) {
            double[][][] out = new double[starts.length][][];
            for (int s = 0; s < starts.length; s++) {
                out[s] = observe(observables, starts[s]);
            }
            return out;
        }
    }

    /** Rejects negative, infinite and NaN times with the value in the message. */
    static void requireTime(double tS) {
        if (!(tS >= 0) || !Double.isFinite(tS)) {
            throw new IllegalArgumentException("propagation time must be finite and >= 0, was " + tS + " s");
        }
    }
}
