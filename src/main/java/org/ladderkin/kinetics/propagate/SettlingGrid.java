package org.ladderkin.kinetics.propagate;

import java.util.ArrayList;
import java.util.List;

/**
 * Traces on a fixed grid: one uniformization run from p0 serves every time up to t_s (each is a Poisson-weighted
 * sum over the same vectors P^k·p0) and yields p(t_s); later times come from the modal grid on S.
 *
 * <p>Why a second path: a sweep or a fit asks for the same observables again and again with new p0. From the
 * second such call on, the grid keeps the rows o_rᵀ·exp(Q·t_j) of every early time and the S rows of exp(Q·t_s)
 * (both by uniformization of Qᵀ, once), so each further trace costs only dot products plus the modal grid on S.
 */
final class SettlingGrid implements Propagator.TraceGrid {

    private final SettlingPropagator owner;

    private final double[] timesS;
    private final int[] earlyIndex;
    private final PoissonWindow[] earlyWindow;
    private final int[] lateIndex;
    private final PoissonWindow settleWindow;
    private final Propagator.TraceGrid lateGrid;
    private final int steps;
    private final int earlySteps;
    private double[][] lastObservables;
    private double[][][] earlyRows;

    SettlingGrid(SettlingPropagator owner, double[] timesS) {
        this.owner = owner;
        this.timesS = timesS;
        List<Integer> early = new ArrayList<>();
        List<Integer> later = new ArrayList<>();
        for (int j = 0; j < timesS.length; j++) {
            (timesS[j] <= owner.settleTimeS() ? early : later).add(j);
        }
        earlyIndex = early.stream().mapToInt(Integer::intValue).toArray();
        lateIndex = later.stream().mapToInt(Integer::intValue).toArray();
        earlyWindow = new PoissonWindow[earlyIndex.length];
        int last = 0;
        for (int e = 0; e < earlyIndex.length; e++) {
            earlyWindow[e] = owner.forward.window(timesS[earlyIndex[e]]);
            last = Math.max(last, earlyWindow[e].last());
        }
        double[] shifted = new double[lateIndex.length];
        for (int l = 0; l < lateIndex.length; l++) {
            shifted[l] = timesS[lateIndex[l]] - owner.settleTimeS();
        }
        settleWindow = lateIndex.length > 0 ? owner.forward.window(owner.settleTimeS()) : null;
        lateGrid = lateIndex.length > 0 ? owner.late.onGrid(shifted) : null;
        steps = settleWindow != null ? Math.max(last, settleWindow.last()) : last;
        earlySteps = last;
    }

    @Override
    public double[] timesS() {
        return timesS.clone();
    }

    /** Synchronized because of the row cache, so a grid may be shared between threads like the modal one. */
    @Override
    public synchronized double[][] observe(double[][] observables, double[] p0) {
        if (p0.length != owner.n) {
            throw new IllegalArgumentException("state vector has " + p0.length + " entries, generator " + owner.n);
        }
        int no = observables.length;
        for (double[] o : observables) {
            if (o.length != owner.n) {
                throw new IllegalArgumentException("observable has " + o.length + " entries, generator " + owner.n);
            }
        }
        if (lastObservables != null && java.util.Arrays.deepEquals(lastObservables, observables)) {
            if (earlyRows == null) {
                earlyRows = earlyRows(observables);
            }
            return fromRows(observables, p0);
        }
        lastObservables = new double[no][];
        for (int r = 0; r < no; r++) {
            lastObservables[r] = observables[r].clone();
        }
        earlyRows = null;
        return forward(observables, p0);
    }

    /** One uniformization run from p0 (no set-up beyond the Poisson windows). */
    private double[][] forward(double[][] observables, double[] p0) {
        int no = observables.length;
        double[][] seen = new double[no][steps + 1];
        double[] v = p0.clone();
        double[] next = new double[owner.n];
        double[] atSettle = new double[owner.n];
        for (int k = 0; k <= steps; k++) {
            for (int r = 0; r < no; r++) {
                double[] o = observables[r];
                double s = 0;
                for (int i = 0; i < owner.n; i++) {
                    s += o[i] * v[i];
                }
                seen[r][k] = s;
            }
            if (settleWindow != null) {
                double wk = settleWindow.weight(k);
                if (wk != 0) {
                    for (int i = 0; i < owner.n; i++) {
                        atSettle[i] += wk * v[i];
                    }
                }
            }
            if (k < steps) {
                owner.forward.step(v, next);
                double[] swap = v;
                v = next;
                next = swap;
            }
        }
        double[][] out = new double[no][timesS.length];
        for (int e = 0; e < earlyIndex.length; e++) {
            PoissonWindow win = earlyWindow[e];
            double[] w = win.weights();
            for (int r = 0; r < no; r++) {
                double s = 0;
                double[] sr = seen[r];
                for (int i = 0; i < w.length; i++) {
                    s += w[i] * sr[win.first() + i];
                }
                out[r][earlyIndex[e]] = s;
            }
        }
        if (lateGrid != null) {
            owner.complementGround(atSettle, p0);
            observeLate(observables, owner.restrict(atSettle, p0), out);
        }
        return out;
    }

    /** The late times from p_S(t_s) by the modal grid on S. */
    private void observeLate(double[][] observables, double[] pS, double[][] out) {
        int no = observables.length;
        double[][] oS = new double[no][owner.settled.length];
        for (int r = 0; r < no; r++) {
            for (int a = 0; a < owner.settled.length; a++) {
                oS[r][a] = observables[r][owner.settled[a]];
            }
        }
        double[][] lateTraces = lateGrid.observe(oS, pS);
        for (int r = 0; r < no; r++) {
            for (int l = 0; l < lateIndex.length; l++) {
                out[r][lateIndex[l]] = lateTraces[r][l];
            }
        }
    }

    /** earlyRows[r][e] = o_rᵀ·exp(Q·t_e) = Σ_k w_e(k)·((Pᵀ)^k·o_r)ᵀ. */
    private double[][][] earlyRows(double[][] observables) {
        int no = observables.length;
        Uniformization adj = owner.adjoint();
        double[][][] rows = new double[no][earlyIndex.length][owner.n];
        double[] next = new double[owner.n];
        for (int r = 0; r < no; r++) {
            double[] a = observables[r].clone();
            for (int k = 0; k <= earlySteps; k++) {
                for (int e = 0; e < earlyIndex.length; e++) {
                    double w = earlyWindow[e].weight(k);
                    if (w != 0) {
                        double[] row = rows[r][e];
                        for (int i = 0; i < owner.n; i++) {
                            row[i] += w * a[i];
                        }
                    }
                }
                if (k < earlySteps) {
                    adj.step(a, next);
                    double[] swap = a;
                    a = next;
                    next = swap;
                }
            }
        }
        return rows;
    }

    /** A trace from the cached rows: dot products for the early times, S rows of exp(Q·t_s) for the rest. */
    private double[][] fromRows(double[][] observables, double[] p0) {
        int no = observables.length;
        double[][] out = new double[no][timesS.length];
        for (int r = 0; r < no; r++) {
            for (int e = 0; e < earlyIndex.length; e++) {
                double[] row = earlyRows[r][e];
                double s = 0;
                for (int i = 0; i < owner.n; i++) {
                    s += row[i] * p0[i];
                }
                out[r][earlyIndex[e]] = s;
            }
        }
        if (lateGrid != null) {
            double[][] rows = owner.settleRows();
            double[] pS = new double[owner.settled.length];
            for (int a = 0; a < owner.settled.length; a++) {
                double s = 0;
                double[] row = rows[a];
                for (int i = 0; i < owner.n; i++) {
                    s += row[i] * p0[i];
                }
                pS[a] = s;
            }
            observeLate(observables, pS, out);
        }
        return out;
    }
}
