package org.ladderkin.observe;

import java.util.List;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Transient absorption spectra ΔA(E, t) from the ladder populations. Each state s has an absorption spectrum
 * A_s(E) = Σ_k a_k·(1 − b_k(s))·G_k(E + δ_k(s)): line k bleached by the occupation b_k(s) of the levels it couples
 * and shifted to lower energy by δ(s). A dot holding a cold exciton shifts every line by the biexciton binding energy
 * Δ_XX (positive binding: red shift), which leaves a derivative-like induced absorption below the band edge at early
 * times; hot carriers add their own Coulomb shift Δ_hot until they cool. ΔA(E, t) = Σ_s P_s(t)·(A_s(E) − A_0(E)),
 * linear in the populations, so whole maps come from the exact propagator's mode expansion at once.
 *
 * @param transitions    lines of the unexcited dot, one with role BAND_EDGE
 * @param filling        band-edge filling model
 * @param hotDegeneracy  degeneracy of the level holding hot carriers (6 for 1P electrons in CdSe)
 * @param biexcitonShiftJ Δ_XX, red shift of the lines in a dot that already holds a cold exciton (J)
 * @param hotShiftJ      Δ_hot, extra red shift while hot carriers are present (J)
 */
public record SpectralModel(List<Transition> transitions, BandEdgeFilling filling, int hotDegeneracy,
                            double biexcitonShiftJ, double hotShiftJ) {

    public SpectralModel {
        transitions = List.copyOf(transitions);
        if (transitions.stream().filter(t -> t.role() == Transition.Role.BAND_EDGE).count() != 1) {
            throw new IllegalArgumentException("a spectral model needs exactly one band-edge transition");
        }
        if (hotDegeneracy < 1) {
            throw new IllegalArgumentException("hot-level degeneracy must be >= 1, was " + hotDegeneracy);
        }
        if (!Double.isFinite(biexcitonShiftJ) || !Double.isFinite(hotShiftJ)) {
            throw new IllegalArgumentException("spectral shifts must be finite");
        }
    }

    /**
     * A copy whose cold-exciton shift comes from a biexciton interaction Δ_XX = E_XX − 2E_X, positive for repulsion (a
     * type-II core/shell): the lines of a dot holding an exciton move up by Δ_XX, which is a red shift of −Δ_XX in
     * this record's convention, so a repulsive biexciton leaves its induced absorption on the blue side of the bleach.
     */
    public SpectralModel withBiexcitonInteraction(double interactionJ) {
        return new SpectralModel(transitions, filling, hotDegeneracy, -interactionJ, hotShiftJ);
    }

    /** ΔA of each state at each photon energy: rows are energies, columns states (OD). */
    public double[][] stateDifferenceSpectra(LadderSpace space, double[] photonEnergiesJ) {
        double[] bandEdge = filling.observable(space);
        double[][] out = new double[photonEnergiesJ.length][space.size()];
        for (int s = 0; s < space.size(); s++) {
            int cold = space.cold(s);
            int hot = space.hot(s);
            double shift = (cold >= 1 ? biexcitonShiftJ : 0) + (hot >= 1 ? hotShiftJ : 0);
            for (Transition t : transitions) {
                double bleach = switch (t.role()) {
                    case BAND_EDGE -> bandEdge[s];
                    case HOT -> Math.min(hot, hotDegeneracy) / (double) hotDegeneracy;
                    case SPECTATOR -> 0;
                };
                for (int e = 0; e < photonEnergiesJ.length; e++) {
                    double excited = t.amplitudeOd() * (1 - bleach) * t.shape(photonEnergiesJ[e], shift);
                    double ground = t.amplitudeOd() * t.shape(photonEnergiesJ[e], 0);
                    out[e][s] += excited - ground;
                }
            }
        }
        return out;
    }

    /** Linear absorbance of the unexcited sample (OD) at each photon energy. */
    public double[] groundAbsorbance(double[] photonEnergiesJ) {
        double[] a = new double[photonEnergiesJ.length];
        for (Transition t : transitions) {
            for (int e = 0; e < a.length; e++) {
                a[e] += t.amplitudeOd() * t.shape(photonEnergiesJ[e], 0);
            }
        }
        return a;
    }

    /** ΔA map (OD): rows photon energies, columns delays after the pulse that produced {@code afterPulse}. */
    public double[][] map(LadderKinetics kinetics, Populations afterPulse, double[] photonEnergiesJ, double[] delaysS) {
        double[][] perState = stateDifferenceSpectra(kinetics.space(), photonEnergiesJ);
        return kinetics.propagator().onGrid(delaysS).observe(perState, afterPulse.probabilities());
    }

    /** ΔA spectrum (OD) of a population at one instant. */
    public double[] spectrum(Populations populations, double[] photonEnergiesJ) {
        double[][] perState = stateDifferenceSpectra(populations.space(), photonEnergiesJ);
        double[] out = new double[photonEnergiesJ.length];
        for (int e = 0; e < out.length; e++) {
            out[e] = populations.expectation(perState[e]);
        }
        return out;
    }
}
