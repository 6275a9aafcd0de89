package org.ladderkin.kinetics.train;

import org.ladderkin.kinetics.propagate.StiffSystem;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * A Gaussian pump pulse of finite width as a time-dependent generator dp/dt = (Q + φ(t)·A)·p. φ(t) is the photon flux
 * (photons m⁻² s⁻¹), a Gaussian centred at t = 0 with the given FWHM and integral equal to the photon fluence j; A is
 * the absorption generator per unit flux.
 * <p>
 * Pumped far above the gap (g = 0 here) a dot absorbs at σ whatever it holds and the new exciton starts hot (when hot
 * excitons are resolved). Pumped at the band edge (g ≥ 1) the light drives the 1S transition both ways: with band-edge
 * filling f = min(n_e, g)/g (n_e the cold excitons, plus one for a negative dot's extra electron, as the bleach counts
 * them) a dot absorbs at σ·(1 − f) into a cold exciton and is stimulated to emit at σ·f, losing a cold exciton. The
 * net absorption σ·(1 − 2f) vanishes at f = 1/2, the transparency of the gain criterion, so a resonant pump drives the
 * level towards half filling (a binomial(g, ½) balance) and never past it on average. A dot at Nmax absorbs no more
 * (truncation, as for instantaneous pulses).
 */
public final class FinitePulseSystem implements StiffSystem {

    private final double[][] q;
    private final int[] absorbTo;
    private final double[] absorbCrossSectionM2;
    private final int[] emitTo;
    private final double[] emitCrossSectionM2;
    private final double fluencePhotonsPerM2;
    private final double sigmaS;

    /**
     * @param space ladder
     * @param generator between-pulse generator Q (1/s), copied
     * @param crossSectionM2 σ (m²)
     * @param bandEdgeDegeneracy g for a resonant (band-edge) pump, or 0 for a pump far above the gap
     * @param fluencePhotonsPerM2 photon fluence j of the pulse (photons/m²)
     * @param fwhmS pulse FWHM (s)
     */
    public FinitePulseSystem(LadderSpace space, double[][] generator, double crossSectionM2, int bandEdgeDegeneracy,
                             double fluencePhotonsPerM2, double fwhmS) {
        if (!(crossSectionM2 > 0) || !(fluencePhotonsPerM2 >= 0) || !(fwhmS > 0) || bandEdgeDegeneracy < 0) {
            throw new IllegalArgumentException("finite pulse needs σ > 0 m², fluence >= 0 photons/m², FWHM > 0 s and g >= 0;"
                    + " were " + crossSectionM2 + ", " + fluencePhotonsPerM2 + ", " + fwhmS + ", " + bandEdgeDegeneracy);
        }
        int n = space.size();
        q = new double[n][];
        for (int i = 0; i < n; i++) {
            q[i] = generator[i].clone();
        }
        absorbTo = new int[n];
        absorbCrossSectionM2 = new double[n];
        emitTo = new int[n];
        emitCrossSectionM2 = new double[n];
        boolean resonant = bandEdgeDegeneracy > 0;
        for (int s = 0; s < n; s++) {
            int nx = space.excitons(s);
            int hot = space.hot(s);
            emitTo[s] = -1;
            if (!resonant) {
                absorbTo[s] = space.index(space.charge(s), nx + 1, hot + (space.hotResolved() ? 1 : 0));
                absorbCrossSectionM2[s] = absorbTo[s] < 0 ? 0 : crossSectionM2;
                continue;
            }
            int cold = space.cold(s);
            int electrons = cold + (space.charge(s) == Charge.NEGATIVE ? 1 : 0);
            double f = Math.min(electrons, bandEdgeDegeneracy) / (double) bandEdgeDegeneracy;
            absorbTo[s] = space.index(space.charge(s), nx + 1, hot);
            absorbCrossSectionM2[s] = absorbTo[s] < 0 ? 0 : crossSectionM2 * (1 - f);
            if (cold > 0) {
                emitTo[s] = space.index(space.charge(s), nx - 1, hot);
                emitCrossSectionM2[s] = crossSectionM2 * f;
            }
        }
        this.fluencePhotonsPerM2 = fluencePhotonsPerM2;
        this.sigmaS = fwhmS / (2 * Math.sqrt(2 * Math.log(2)));
    }

    /** Photon flux φ(t) (photons m⁻² s⁻¹). */
    public double photonFlux(double tS) {
        double x = tS / sigmaS;
        return fluencePhotonsPerM2 / (Math.sqrt(2 * Math.PI) * sigmaS) * Math.exp(-0.5 * x * x);
    }

    /** The between-pulse generator Q (a copy). */
    public double[][] generator() {
        double[][] c = new double[q.length][];
        for (int i = 0; i < q.length; i++) {
            c[i] = q[i].clone();
        }
        return c;
    }

    /** The absorption generator A per unit photon flux (m²): absorption and stimulated emission, columns sum to 0. */
    public double[][] absorption() {
        int n = q.length;
        double[][] a = new double[n][n];
        for (int s = 0; s < n; s++) {
            if (absorbCrossSectionM2[s] != 0) {
                a[s][s] -= absorbCrossSectionM2[s];
                a[absorbTo[s]][s] += absorbCrossSectionM2[s];
            }
            if (emitTo[s] >= 0 && emitCrossSectionM2[s] != 0) {
                a[s][s] -= emitCrossSectionM2[s];
                a[emitTo[s]][s] += emitCrossSectionM2[s];
            }
        }
        return a;
    }

    @Override
    public int dimension() {
        return q.length;
    }

    @Override
    public void derivatives(double t, double[] y, double[] dydt) {
        double phi = photonFlux(t);
        int n = q.length;
        for (int i = 0; i < n; i++) {
            double s = 0;
            double[] qi = q[i];
            for (int j = 0; j < n; j++) {
                s += qi[j] * y[j];
            }
            dydt[i] = s;
        }
        for (int s = 0; s < n; s++) {
            double r = phi * absorbCrossSectionM2[s] * y[s];
            if (r != 0) {
                dydt[s] -= r;
                dydt[absorbTo[s]] += r;
            }
            if (emitTo[s] >= 0) {
                double e = phi * emitCrossSectionM2[s] * y[s];
                dydt[s] -= e;
                dydt[emitTo[s]] += e;
            }
        }
    }

    @Override
    public void jacobian(double t, double[] y, double[][] dfdy) {
        double phi = photonFlux(t);
        for (int i = 0; i < q.length; i++) {
            System.arraycopy(q[i], 0, dfdy[i], 0, q.length);
        }
        for (int s = 0; s < q.length; s++) {
            double r = phi * absorbCrossSectionM2[s];
            if (r != 0) {
                dfdy[s][s] -= r;
                dfdy[absorbTo[s]][s] += r;
            }
            if (emitTo[s] >= 0) {
                double e = phi * emitCrossSectionM2[s];
                dfdy[s][s] -= e;
                dfdy[emitTo[s]][s] += e;
            }
        }
    }

    @Override
    public boolean isLinear() {
        return true;
    }
}
