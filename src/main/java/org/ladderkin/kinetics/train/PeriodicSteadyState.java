package org.ladderkin.kinetics.train;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.PopulationGuard;
import org.ladderkin.kinetics.propagate.DenseLinear;
import org.ladderkin.kinetics.propagate.PadeExponential;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * The one-period map M = exp(Q·T)·E (pre-pulse distribution to the next pre-pulse distribution) and its fixed point,
 * found directly: (M − I)·p = 0 with one equation replaced by Σp = 1, one dense solve. The approach to it is governed
 * by the second-largest |eigenvalue| λ₂ of M: a transient shrinks by |λ₂| per pulse, so it takes
 * ⌈ln 0.01 / ln|λ₂|⌉ pulses to fall to 1 %.
 */
public final class PeriodicSteadyState {

    private final LadderSpace space;
    private final double[][] map;

    /**
     * @param space ladder
     * @param periodPropagator exp(Q·T) for the pulse period T
     * @param pulse jump matrix E
     */
    public PeriodicSteadyState(LadderSpace space, double[][] periodPropagator, double[][] pulse) {
        this.space = space;
        this.map = PadeExponential.multiply(periodPropagator, pulse);
    }

    /** The one-period map M (a copy). */
    public double[][] map() {
        double[][] c = new double[map.length][];
        for (int i = 0; i < map.length; i++) {
            c[i] = map[i].clone();
        }
        return c;
    }

    /** The pre-pulse fixed point of M. */
    public double[] fixedPoint() {
        int n = map.length;
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = map[i][j] - (i == j ? 1 : 0);
            }
        }
        // columns of M − I sum to zero, so one row is redundant: replace it by the normalisation
        Arrays.fill(a[0], 1.0);
        double[] b = new double[n];
        b[0] = 1;
        double[] p;
        try {
            p = DenseLinear.solve(a, b);
            // iterative refinement with the residual summed exactly (to twice the working precision): when the slow
            // mode of M is within 1e-9 of 1 the solve's rounding is amplified along it (a residual of 6e-13 became
            // 6e-7 in populations); each pass divides the error by about that amplification times 1e-16
            for (int pass = 0; pass < REFINEMENTS; pass++) {
                double[] r = new double[n];
                boolean zero = true;
                for (int i = 0; i < n; i++) {
                    r[i] = exactDotMinus(a[i], p, b[i]);
                    zero &= r[i] == 0;
                }
                if (zero) {
                    break;
                }
                double[] d = DenseLinear.solve(a, r);
                for (int i = 0; i < n; i++) {
                    p[i] -= d[i];
                }
            }
        } catch (ArithmeticException e) {
            throw new IllegalArgumentException("the pulse train has no unique steady state (some states never return to the"
                    + " ground state: add neutralisation or sample refresh)", e);
        }
        for (int i = 0; i < n; i++) {
            // a true probability is ≥ 0: clear negative rounding left by the solve
            if (p[i] < 0 && p[i] > -PopulationGuard.NEGATIVE_TOLERANCE * 1e3) {
                p[i] = 0;
            }
        }
        PopulationGuard.check(space, p, 0, "(periodic steady state, just before a pulse)");
        return p;
    }

    /** Passes of iterative refinement after the direct solve. */
    private static final int REFINEMENTS = 2;

    /**
     * Σ a_j·x_j − c with each product split exactly by a fused multiply-add and the sum kept as a value and its
     * rounding error (Ogita, Rump &amp; Oishi, "Accurate sum and dot product", SIAM J. Sci. Comput. 26, 1955 (2005),
     * Algorithm Dot2): as accurate as if computed in twice the working precision.
     */
    static double exactDotMinus(double[] a, double[] x, double c) {
        double s = -c;
        double err = 0;
        for (int j = 0; j < a.length; j++) {
            double prod = a[j] * x[j];
            double prodErr = Math.fma(a[j], x[j], -prod);
            double t = s + prod;
            double z = t - s;
            err += (s - (t - z)) + (prod - z) + prodErr;
            s = t;
        }
        return s + err;
    }

    /**
     * max_i |(M·p)_i − p_i| for a distribution p, with every sum as in {@link #exactDotMinus}: the fixed point's
     * residual, free of the rounding of its own evaluation.
     */
    public double residual(double[] p) {
        double worst = 0;
        for (int i = 0; i < map.length; i++) {
            worst = Math.max(worst, Math.abs(exactDotMinus(map[i], p, p[i])));
        }
        return worst;
    }

    /**
     * The states a dot can reach from the ground state under the train (closure of the nonzero pattern of M from
     * state 0), in increasing order. Why: a model may list states no pulse history populates (both charges where
     * ionisation leaves only one); their own slow decay is an eigenvalue of M that no experiment ever sees.
     */
    public int[] reachableStates() {
        int n = map.length;
        boolean[] seen = new boolean[n];
        int[] stack = new int[n];
        int top = 0;
        seen[0] = true;
        stack[top++] = 0;
        while (top > 0) {
            int j = stack[--top];
            for (int i = 0; i < n; i++) {
                if (!seen[i] && map[i][j] != 0) {
                    seen[i] = true;
                    stack[top++] = i;
                }
            }
        }
        int count = 0;
        int[] out = new int[n];
        for (int i = 0; i < n; i++) {
            if (seen[i]) {
                out[count++] = i;
            }
        }
        return Arrays.copyOf(out, count);
    }

    /** M restricted to the reachable states (a closed set: M never leads out of it). */
    private double[][] reachableMap() {
        int[] r = reachableStates();
        double[][] sub = new double[r.length][r.length];
        for (int a = 0; a < r.length; a++) {
            for (int b = 0; b < r.length; b++) {
                sub[a][b] = map[r[a]][r[b]];
            }
        }
        return sub;
    }

    /**
     * |λ₂| of M on the states reachable from the ground state ({@link #reachableStates}); 0 for a one-state set.
     * Costs one dense nonsymmetric eigen-decomposition (Hipparchus); when its QR iteration does not converge, falls
     * back to {@link #deflatedSpectralRadius()}.
     */
    public double secondEigenvalueModulus() {
        double[][] sub = reachableMap();
        if (sub.length < 2) {
            return 0;
        }
        Complex[] ev;
        try {
            ev = new EigenDecompositionNonSymmetric(MatrixUtils.createRealMatrix(sub)).getEigenvalues();
        } catch (MathIllegalStateException e) {
            return deflatedSpectralRadius();
        }
        double[] mod = new double[ev.length];
        for (int i = 0; i < ev.length; i++) {
            mod[i] = ev[i].norm();
        }
        Arrays.sort(mod);
        return mod[mod.length - 2];
    }

    /**
     * Spectral radius of M − p_ss·1ᵀ on the reachable states (M with its eigenvalue 1 deflated, the others unchanged
     * because 1ᵀM = 1ᵀ), by Gelfand's formula ρ = lim ‖A^k‖^{1/k} with k = 2³⁰ reached by 30 normalised squarings;
     * the non-normal constant enters only as its 2⁻³⁰-th power.
     */
    public double deflatedSpectralRadius() {
        double[] fixed = fixedPoint();
        int[] r = reachableStates();
        int n = r.length;
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = map[r[i]][r[j]] - fixed[r[i]];
            }
        }
        double logRho = 0;
        double weight = 1;
        for (int k = 0; k < 30; k++) {
            double s = 0;
            for (double[] row : a) {
                for (double x : row) {
                    s = Math.max(s, Math.abs(x));
                }
            }
            if (s == 0) {
                return 0;
            }
            logRho += Math.log(s) * weight;
            weight /= 2;
            for (double[] row : a) {
                for (int j = 0; j < n; j++) {
                    row[j] /= s;
                }
            }
            a = PadeExponential.multiply(a, a);
        }
        double s = 0;
        for (double[] row : a) {
            for (double x : row) {
                s = Math.max(s, Math.abs(x));
            }
        }
        return s == 0 ? 0 : Math.exp(logRho + Math.log(s) * weight);
    }

    /**
     * Pulses for a transient to shrink to 1 % given |λ₂| (at least 1), as a long: a slow neutralisation at a high
     * repetition rate needs billions (3.7e9 at 80 MHz with 10 s), beyond an int. {@link Long#MAX_VALUE} for |λ₂| ≥ 1.
     */
    public static long pulsesToOnePercentLong(double lambda2) {
        if (!(lambda2 > 0)) {
            return 1;
        }
        if (lambda2 >= 1) {
            return Long.MAX_VALUE;
        }
        // ln λ₂ from log1p(λ₂ − 1): near 1 the plain logarithm keeps only the digits of λ₂'s spacing
        double pulses = Math.ceil(Math.log(0.01) / Math.log1p(lambda2 - 1) - 1e-12);
        return pulses >= Long.MAX_VALUE ? Long.MAX_VALUE : Math.max(1, (long) pulses);
    }

    /** {@link #pulsesToOnePercentLong}, saturated at {@link Integer#MAX_VALUE} for callers that count in ints. */
    public static int pulsesToOnePercent(double lambda2) {
        return (int) Math.min(Integer.MAX_VALUE, pulsesToOnePercentLong(lambda2));
    }

    /** Pre-pulse distributions before pulses 1..k, starting from dots in the ground state. */
    public List<double[]> buildUp(int k) {
        List<double[]> out = new ArrayList<>();
        double[] p = Populations.ground(space).probabilities();
        for (int i = 0; i < k; i++) {
            out.add(p.clone());
            p = apply(p);
            PopulationGuard.check(space, p, 0, "(build-up, before pulse " + (i + 2) + ")");
            // each step is checked from a normalised start, so the guard sees one application of M; without this the
            // round-off of thousands of pulses (an 80 MHz train needs about 5000) adds up past the guard's 1e-12
            double total = 0;
            for (double v : p) {
                total += v;
            }
            for (int j = 0; j < p.length; j++) {
                p[j] /= total;
            }
        }
        return out;
    }

    /** M·p. */
    public double[] apply(double[] p) {
        int n = map.length;
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += map[i][j] * p[j];
            }
            out[i] = s;
        }
        return out;
    }
}
