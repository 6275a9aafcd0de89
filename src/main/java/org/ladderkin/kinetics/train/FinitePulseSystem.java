package org.ladderkin.kinetics.train;

import org.ladderkin.kinetics.propagate.StiffSystem;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * A Gaussian pump pulse of finite width as a time-dependent generator dp/dt = (Q + φ(t)·A)·p for the implicit
 * integrator. φ(t) is the photon flux (photons m⁻² s⁻¹), a Gaussian centred at t = 0 with the given FWHM and
 * integral equal to the photon fluence j; A moves a dot from (c, N, h) to (c, N+1, h+1 when hot excitons are
 * resolved) at cross-section σ_N. With band-edge pumping σ_N = σ·max(0, 1 − N/g) (absorption bleaches as the
 * g-fold level fills), otherwise σ_N = σ. A dot at Nmax absorbs no more (truncation, as for instantaneous pulses,
 * chosen so that this matters less than the Nmax tail).
 */
public final class FinitePulseSystem implements StiffSystem {

    private final double[][] q;
    private final int[] absorbTo;
    private final double[] absorbCrossSectionM2;
    private final double fluencePhotonsPerM2;
    private final double sigmaS;

    /**
     * @param space ladder
     * @param generator between-pulse generator Q (1/s), copied
     * @param crossSectionM2 σ (m²)
     * @param bandEdgeDegeneracy g, or 0 for non-resonant pumping (σ_N = σ)
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
        for (int s = 0; s < n; s++) {
            int nx = space.excitons(s);
            absorbTo[s] = space.index(space.charge(s), nx + 1, space.hot(s) + (space.hotResolved() ? 1 : 0));
            double factor = bandEdgeDegeneracy == 0 ? 1 : Math.max(0, 1 - nx / (double) bandEdgeDegeneracy);
            absorbCrossSectionM2[s] = absorbTo[s] < 0 ? 0 : crossSectionM2 * factor;
        }
        this.fluencePhotonsPerM2 = fluencePhotonsPerM2;
        this.sigmaS = fwhmS / (2 * Math.sqrt(2 * Math.log(2)));
    }

    /** Photon flux φ(t) (photons m⁻² s⁻¹). */
    public double photonFlux(double tS) {
        double x = tS / sigmaS;
        return fluencePhotonsPerM2 / (Math.sqrt(2 * Math.PI) * sigmaS) * Math.exp(-0.5 * x * x);
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
            for (int j = i; j < n; j++) {
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
        }
    }

    @Override
    public boolean isLinear() {
        return true;
    }
}
