package org.ladderkin.kinetics.rate;

/** How a rate grows with the exciton number N: rate(N) = rate(reference)·factor(N). */
public interface ExcitonScaling {

    /** The factor for N excitons (N ≥ 1). */
    double factor(int n);

    /** The name used in model files and on the command line. */
    String key();
}
