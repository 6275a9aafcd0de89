package org.ladderkin.kinetics.train;

import org.ladderkin.excite.Occupancy;

/** An instantaneous pulse: how many excitons it adds to one dot, whatever the dot already holds. */
public sealed interface PulseExcitation {

    /** P(k added excitons) for k = 0..count−1. */
    double[] addedExcitons(int count);

    /** Smallest Nmax with P(more than Nmax added) below {@code tail}. */
    int cutoff(double tail);

    /** Mean number of excitons added. */
    double meanExcitons();

    /**
     * Poisson absorption with mean ⟨N⟩ = σ·j.
     *
     * @param meanExcitons ⟨N⟩
     */
    record Poisson(double meanExcitons) implements PulseExcitation {
        public Poisson {
            if (!(meanExcitons >= 0) || !Double.isFinite(meanExcitons)) {
                throw new IllegalArgumentException("⟨N⟩ must be finite and >= 0, was " + meanExcitons);
            }
        }

        @Override
        public double[] addedExcitons(int count) {
            return Occupancy.poisson(meanExcitons, count);
        }

        @Override
        public int cutoff(double tail) {
            return Occupancy.poissonCutoff(meanExcitons, tail);
        }
    }

    /**
     * Carrier multiplication: Poisson(⟨N_abs⟩) photons, each giving two excitons with probability η.
     *
     * @param meanPhotons ⟨N_abs⟩ = σ·j
     * @param eta multiplication probability per photon
     */
    record Multiplication(double meanPhotons, double eta) implements PulseExcitation {
        public Multiplication {
            if (!(meanPhotons >= 0) || !Double.isFinite(meanPhotons)) {
                throw new IllegalArgumentException("⟨N_abs⟩ must be finite and >= 0, was " + meanPhotons);
            }
            if (!(eta >= 0 && eta <= 1)) {
                throw new IllegalArgumentException("η must be between 0 and 1, was " + eta);
            }
        }

        @Override
        public double[] addedExcitons(int count) {
            return Occupancy.compoundPoisson(meanPhotons, eta, count);
        }

        @Override
        public int cutoff(double tail) {
            return Occupancy.compoundPoissonCutoff(meanPhotons, eta, tail);
        }

        @Override
        public double meanExcitons() {
            return meanPhotons * (1 + eta);
        }
    }
}
