package org.ladderkin.kinetics;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Occupation probabilities of every ladder state at one instant.
 *
 * @param space the ladder
 * @param probabilities P_s, summing to 1
 */
public record Populations(LadderSpace space, double[] probabilities) {

    public Populations {
        if (probabilities.length != space.size()) {
            throw new IllegalArgumentException("populations have " + probabilities.length + " entries, ladder " + space.size());
        }
        probabilities = probabilities.clone();
    }

    /** All dots neutral and unexcited. */
    public static Populations ground(LadderSpace space) {
        double[] p = new double[space.size()];
        p[space.ground()] = 1;
        return new Populations(space, p);
    }

    @Override
    public double[] probabilities() {
        return probabilities.clone();
    }

    public double probability(int state) {
        return probabilities[state];
    }

    /** Σ_s o_s·P_s. */
    public double expectation(double[] observable) {
        double s = 0;
        for (int i = 0; i < probabilities.length; i++) {
            s += observable[i] * probabilities[i];
        }
        return s;
    }

    /** Fraction of dots holding at least one exciton. */
    public double excitedFraction() {
        return expectation(Observables.excited(space));
    }

    /** Fraction of dots carrying an excess charge. */
    public double chargedFraction() {
        return expectation(Observables.charged(space));
    }

    /** Probability of N excitons summed over charge and hot count. */
    public double[] excitonDistribution() {
        double[] d = new double[space.nMax() + 1];
        for (int s = 0; s < probabilities.length; s++) {
            d[space.excitons(s)] += probabilities[s];
        }
        return d;
    }
}
