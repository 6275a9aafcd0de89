package org.ladderkin.fit.map;

import java.util.List;
import java.util.Objects;

/**
 * The best free state spectra for fixed populations.
 *
 * @param stateNames             the states, in the order of the rows of the spectra
 * @param spectraOd              ΔA per unit population, {@code [state][wavelength]} in OD; NaN for a state the data cannot
 *                               separate (and at a wavelength whose remaining rows cannot)
 * @param standardErrorsOd       one-sigma errors of the spectra, from (AᵀA)⁻¹ times each wavelength's residual variance
 * @param residualSumsOfSquares  per wavelength (OD²), over the cells present
 * @param residualSumOfSquares   the variable-projection objective: the sum over all cells present (OD²)
 * @param unseparable            states whose populations are linear combinations of the others' on this series
 * @param message                why the states in {@code unseparable} have no spectra, or empty when all have
 */
public record SpectraSolution(List<String> stateNames, double[][] spectraOd, double[][] standardErrorsOd,
                              double[] residualSumsOfSquares, double residualSumOfSquares, List<String> unseparable,
                              String message) {

    public SpectraSolution {
        stateNames = List.copyOf(stateNames);
        unseparable = List.copyOf(unseparable);
        Objects.requireNonNull(message, "message");
        int k = stateNames.size();
        if (spectraOd.length != k || standardErrorsOd.length != k) {
            throw new IllegalArgumentException("need one spectrum and one error row per state (" + k + "), got "
                    + spectraOd.length + " and " + standardErrorsOd.length);
        }
        for (int s = 0; s < k; s++) {
            if (spectraOd[s].length != residualSumsOfSquares.length || standardErrorsOd[s].length != residualSumsOfSquares.length) {
                throw new IllegalArgumentException("state " + stateNames.get(s) + " has a spectrum of another length than the "
                        + residualSumsOfSquares.length + " wavelengths");
            }
        }
        if (!stateNames.containsAll(unseparable)) {
            throw new IllegalArgumentException("unseparable states " + unseparable + " are not among " + stateNames);
        }
        if (unseparable.isEmpty() != message.isEmpty()) {
            throw new IllegalArgumentException("a message belongs with unseparable states and only with them");
        }
        if (!(residualSumOfSquares >= 0)) {
            throw new IllegalArgumentException("residual sum of squares must be ≥ 0, was " + residualSumOfSquares);
        }
    }

    /** Whether every state has a spectrum. */
    public boolean separable() {
        return unseparable.isEmpty();
    }

    /** The spectrum of the named state. */
    public double[] spectrumOd(String state) {
        int s = stateNames.indexOf(state);
        if (s < 0) {
            throw new IllegalArgumentException("no state named '" + state + "' (states: " + stateNames + ")");
        }
        return spectraOd[s].clone();
    }
}
