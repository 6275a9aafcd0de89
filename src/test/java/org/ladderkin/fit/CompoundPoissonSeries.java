package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;

/**
 * Fluence series simulated without the engine, to test the multiplication-yield fit against something it did not
 * compute itself. A neutral ladder with a g = 2 band edge, radiative rate N²/τ_rad and Auger rate N²(N−1)/(4τ₂) (the
 * laws of {@link LadderSeries#BASE}) is a pure death chain N → N−1 with increasing rates γ_N; its populations after
 * a pulse are sums of exponentials, p_n(t) = Σ_{j≥n} c[n][j]·e^{−γ_j t}, with c[K][K] = p_K(0),
 * c[n][j] = γ_{n+1}·c[n+1][j]/(γ_n − γ_j) for j &gt; n and c[n][n] = p_n(0) − Σ_{j&gt;n} c[n][j] (substitute into
 * ṗ_n = −γ_n p_n + γ_{n+1} p_{n+1}). The pulse's exciton numbers follow the compound Poisson law with one or two
 * excitons per absorbed photon, taken from Panjer's recursion P(0) = e^{−n}, P(k) = (n/k)·Σ_{j=1,2} j·f(j)·P(k−j)
 * with f(1) = 1 − η, f(2) = η (not the engine's binomial sum). The bleach is Σ_n min(n, 2)/2·p_n(t).
 */
public final class CompoundPoissonSeries {

    static final double TAU_RAD_S = 20e-9;
    static final double TAU_AUGER2_S = 40e-12;
    private static final int MAX_EXCITONS = 40;

    private CompoundPoissonSeries() {
    }

    /** P(k) for k = 0..MAX_EXCITONS by Panjer's recursion. */
    static double[] excitons(double meanPhotons, double eta) {
        double[] p = new double[MAX_EXCITONS + 1];
        p[0] = Math.exp(-meanPhotons);
        for (int k = 1; k <= MAX_EXCITONS; k++) {
            double s = (1 - eta) * p[k - 1] + (k >= 2 ? 2 * eta * p[k - 2] : 0);
            p[k] = meanPhotons / k * s;
        }
        return p;
    }

    private static double rate(int n) {
        return (double) n * n / TAU_RAD_S + (double) n * n * (n - 1) / (4 * TAU_AUGER2_S);
    }

    /** Band-edge bleach (fraction of the filled level) at each delay after one pulse on fresh dots. */
    public static double[] bleach(double meanPhotons, double eta, double[] delaysS) {
        double[] p0 = excitons(meanPhotons, eta);
        int top = p0.length - 1;
        double[][] c = new double[top + 1][top + 1];
        c[top][top] = p0[top];
        for (int n = top - 1; n >= 0; n--) {
            double sum = 0;
            for (int j = n + 1; j <= top; j++) {
                c[n][j] = rate(n + 1) * c[n + 1][j] / (rate(n) - rate(j));
                sum += c[n][j];
            }
            c[n][n] = p0[n] - sum;
        }
        double[] out = new double[delaysS.length];
        for (int m = 0; m < delaysS.length; m++) {
            double b = 0;
            for (int n = 1; n <= top; n++) {
                double pn = 0;
                for (int j = n; j <= top; j++) {
                    pn += c[n][j] * Math.exp(-rate(j) * delaysS[m]);
                }
                b += Math.min(n, 2) / 2.0 * pn;
            }
            out[m] = b;
        }
        return out;
    }

    /**
     * ΔA traces −amplitude·bleach + noise at photon fluences {@code fluencesPerM2} with absorbed photons σ·j, each
     * trace labelled with its fluence.
     */
    public static Dataset series(double crossSectionM2, double eta, double[] fluencesPerM2, double[] delaysS, double amplitude,
                          double noise, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < fluencesPerM2.length; i++) {
            double[] y = bleach(crossSectionM2 * fluencesPerM2[i], eta, delaysS);
            for (int m = 0; m < y.length; m++) {
                y[m] = -amplitude * y[m] + noise * SyntheticSeries.gaussian(rng);
            }
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, fluencesPerM2[i]);
            traces.add(new Trace(delaysS, y, null, new TraceMetadata("trace" + i, Optional.of(e), OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }
}
