package org.ladderkin.kinetics.train;

import org.ladderkin.kinetics.propagate.PadeExponential;

/**
 * The action of a finite Gaussian pulse ({@link FinitePulseSystem}) on a dot population, from {@link #halfWindowS()}
 * before its centre to as long after, where less than 2e-9 of its photons fall outside. The generator Q + φ(t)·A
 * changes with time only through the scalar flux, so the propagator is built from fourth-order Magnus steps,
 * exp(h·Q + h·(φ₁ + φ₂)/2·A + (√3/12)·h²·(φ₁ − φ₂)·[Q, A]) at the two Gauss points: each step is the exact
 * exponential of a generator with zero column sums, so probability is conserved however stiff Q is. The step count is
 * doubled until two propagators agree to {@link #CONVERGENCE} in every entry (probabilities, so an absolute measure).
 */
public final class FinitePulse {

    /** Half the integration window, in pulse FWHM (2.5 FWHM = 5.9 standard deviations of the Gaussian). */
    public static final double HALF_WINDOW_FWHM = 2.5;
    /** Largest entry change between two step counts that counts as converged. */
    public static final double CONVERGENCE = 1e-8;
    private static final int FIRST_STEPS = 16;
    private static final int MAX_STEPS = 8192;

    private final FinitePulseSystem system;
    private final double[][] q;
    private final double[][] a;
    private final double[][] commutator;
    private final double halfWindowS;
    private final int steps;
    private final double[][] matrix;
    /** The converged product's step propagators, reused for states inside the window. */
    private java.util.List<double[][]> stepMatrices;

    private FinitePulse(FinitePulseSystem system, double fwhmS) {
        this.system = system;
        this.q = system.generator();
        this.a = system.absorption();
        this.commutator = subtract(multiply(q, a), multiply(a, q));
        this.halfWindowS = HALF_WINDOW_FWHM * fwhmS;
        int m = FIRST_STEPS;
        double[][] u = product(m);
        java.util.List<double[][]> coarse = stepMatrices;
        while (true) {
            if (2 * m > MAX_STEPS) {
                throw new IllegalStateException("finite-pulse propagator did not converge with " + MAX_STEPS + " steps");
            }
            double[][] finer = product(2 * m);
            double change = 0;
            for (int i = 0; i < u.length; i++) {
                for (int j = 0; j < u.length; j++) {
                    change = Math.max(change, Math.abs(finer[i][j] - u[i][j]));
                }
            }
            m *= 2;
            u = finer;
            if (change <= CONVERGENCE) {
                break;
            }
            coarse = stepMatrices;
        }
        // the coarser product is converged as well: its steps serve states inside the window at half the cost
        this.stepMatrices = coarse;
        m /= 2;
        this.steps = m;
        this.matrix = u;
    }

    /** The pulse of {@code system} with intensity FWHM {@code fwhmS}. */
    public static FinitePulse of(FinitePulseSystem system, double fwhmS) {
        if (!(fwhmS > 0) || !Double.isFinite(fwhmS)) {
            throw new IllegalArgumentException("pulse FWHM must be finite and > 0 s, was " + fwhmS);
        }
        return new FinitePulse(system, fwhmS);
    }

    /** Half the window the pulse acts in (s): the state before is at −this, after at +this, from the pulse centre. */
    public double halfWindowS() {
        return halfWindowS;
    }

    /** Magnus steps over the window (of the coarser of the two products that agreed; the propagator is the finer). */
    public int steps() {
        return steps;
    }

    /** The propagator U over the whole window (a copy): p(+H) = U·p(−H). */
    public double[][] matrix() {
        double[][] c = new double[matrix.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = matrix[i].clone();
        }
        return c;
    }

    /** U·p. */
    public double[] apply(double[] before) {
        return times(matrix, before);
    }

    /** The population at {@code tS} (−H ≤ t ≤ H, from the pulse centre) of dots that held {@code before} at −H. */
    public double[] at(double[] before, double tS) {
        if (!(tS >= -halfWindowS && tS <= halfWindowS)) {
            throw new IllegalArgumentException("time " + tS + " s is outside the pulse window ±" + halfWindowS + " s");
        }
        double h = 2 * halfWindowS / steps;
        double[] p = before.clone();
        int full = (int) Math.floor((tS + halfWindowS) / h);
        for (int k = 0; k < Math.min(full, steps); k++) {
            p = times(stepMatrices.get(k), p);
        }
        double rest = tS - (-halfWindowS + full * h);
        if (full < steps && rest > 1e-12 * h) {
            p = times(PadeExponential.exp(omega(-halfWindowS + full * h, rest)), p);
        }
        return p;
    }

    private double[][] product(int m) {
        double h = 2 * halfWindowS / m;
        double[][] u = null;
        stepMatrices = new java.util.ArrayList<>();
        for (int k = 0; k < m; k++) {
            double[][] e = PadeExponential.exp(omega(-halfWindowS + k * h, h));
            stepMatrices.add(e);
            u = u == null ? e : multiply(e, u);
        }
        return u;
    }

    private double[][] omega(double t, double h) {
        double r = Math.sqrt(3) / 6;
        double phi1 = system.photonFlux(t + (0.5 - r) * h);
        double phi2 = system.photonFlux(t + (0.5 + r) * h);
        double ca = h * (phi1 + phi2) / 2;
        double cc = Math.sqrt(3) / 12 * h * h * (phi1 - phi2);
        int n = q.length;
        double[][] o = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                o[i][j] = h * q[i][j] + ca * a[i][j] + cc * commutator[i][j];
            }
        }
        return o;
    }

    private static double[][] multiply(double[][] x, double[][] y) {
        int n = x.length;
        double[][] out = new double[n][n];
        for (int i = 0; i < n; i++) {
            double[] oi = out[i];
            for (int k = 0; k < n; k++) {
                double xik = x[i][k];
                if (xik == 0) {
                    continue;
                }
                double[] yk = y[k];
                for (int j = 0; j < n; j++) {
                    oi[j] += xik * yk[j];
                }
            }
        }
        return out;
    }

    private static double[][] subtract(double[][] x, double[][] y) {
        int n = x.length;
        double[][] out = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                out[i][j] = x[i][j] - y[i][j];
            }
        }
        return out;
    }

    private static double[] times(double[][] m, double[] p) {
        double[] out = new double[p.length];
        for (int i = 0; i < p.length; i++) {
            double s = 0;
            for (int j = 0; j < p.length; j++) {
                s += m[i][j] * p[j];
            }
            out[i] = s;
        }
        return out;
    }
}
