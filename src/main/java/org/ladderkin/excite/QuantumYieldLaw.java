package org.ladderkin.excite;

import java.util.Arrays;

/**
 * The carrier-multiplication probability η(ħω): the chance that one absorbed photon yields two excitons rather than
 * one, so the quantum yield is 1 + η. The kinetics keep at most two excitons per photon, so every law is capped at
 * η = 1 (quantum yield 2); say so when using photon energies where a law predicts more.
 */
public sealed interface QuantumYieldLaw {

    /** η for a photon of energy {@code photonEnergyJ}, in [0, 1]. */
    double eta(double photonEnergyJ);

    /** No multiplication: η = 0. */
    record None() implements QuantumYieldLaw {
        @Override
        public double eta(double photonEnergyJ) {
            return 0;
        }
    }

    /**
     * Piecewise linear above a threshold: quantum yield 1 + (ħω − E_th)/ε_eh above E_th (Beard et al., Nano Lett. 10,
     * 3019 (2010), as recalled), i.e. η = clamp((ħω − E_th)/ε_eh, 0, 1).
     *
     * @param thresholdJ E_th
     * @param pairCreationEnergyJ ε_eh, the energy per additional pair
     */
    record ThresholdLinear(double thresholdJ, double pairCreationEnergyJ) implements QuantumYieldLaw {
        public ThresholdLinear {
            if (!(thresholdJ > 0) || !(pairCreationEnergyJ > 0)) {
                throw new IllegalArgumentException("threshold and pair-creation energy must be > 0 J, were " + thresholdJ
                        + " J and " + pairCreationEnergyJ + " J");
            }
        }

        @Override
        public double eta(double photonEnergyJ) {
            return Math.max(0, Math.min(1, (photonEnergyJ - thresholdJ) / pairCreationEnergyJ));
        }
    }

    /**
     * Energy-conservation staircase: a photon yields floor(ħω/E_g) pairs (Hanna, Beard, Nozik, J. Phys. Chem. Lett.
     * 2012), so η = 1 from ħω = 2·E_g and 0 below.
     *
     * @param gapJ E_g
     */
    record Staircase(double gapJ) implements QuantumYieldLaw {
        public Staircase {
            if (!(gapJ > 0)) {
                throw new IllegalArgumentException("band gap must be > 0 J, was " + gapJ + " J");
            }
        }

        @Override
        public double eta(double photonEnergyJ) {
            return Math.min(1, Math.max(0, Math.floor(photonEnergyJ / gapJ) - 1));
        }
    }

    /**
     * A measured table of η against photon energy, linearly interpolated and held constant beyond its ends.
     *
     * @param photonEnergiesJ strictly increasing photon energies
     * @param etas η at those energies, each in [0, 1]
     */
    record Table(double[] photonEnergiesJ, double[] etas) implements QuantumYieldLaw {
        public Table {
            if (photonEnergiesJ.length == 0 || photonEnergiesJ.length != etas.length) {
                throw new IllegalArgumentException("η table needs matching non-empty columns, had " + photonEnergiesJ.length
                        + " energies and " + etas.length + " values");
            }
            photonEnergiesJ = photonEnergiesJ.clone();
            etas = etas.clone();
            for (int i = 0; i < etas.length; i++) {
                if (!(etas[i] >= 0 && etas[i] <= 1)) {
                    throw new IllegalArgumentException("η must be between 0 and 1, was " + etas[i] + " in row " + (i + 1));
                }
                if (i > 0 && !(photonEnergiesJ[i] > photonEnergiesJ[i - 1])) {
                    throw new IllegalArgumentException("photon energies must increase, row " + (i + 1) + " does not");
                }
            }
        }

        @Override
        public double eta(double photonEnergyJ) {
            int i = Arrays.binarySearch(photonEnergiesJ, photonEnergyJ);
            if (i >= 0) {
                return etas[i];
            }
            int hi = -i - 1;
            if (hi == 0) {
                return etas[0];
            }
            if (hi == etas.length) {
                return etas[etas.length - 1];
            }
            double f = (photonEnergyJ - photonEnergiesJ[hi - 1]) / (photonEnergiesJ[hi] - photonEnergiesJ[hi - 1]);
            return etas[hi - 1] + f * (etas[hi] - etas[hi - 1]);
        }

        @Override
        public double[] photonEnergiesJ() {
            return photonEnergiesJ.clone();
        }

        @Override
        public double[] etas() {
            return etas.clone();
        }
    }
}
