package org.ladderkin.kinetics.rate;

/** Radiative N-scaling f(N) with f(1) = 1. */
public enum RadiativeScaling implements ExcitonScaling {
    /** f(N) = N: each exciton emits independently. */
    LINEAR("linear") {
        @Override
        public double factor(int n) {
            return n;
        }
    },
    /**
     * f(N) = N²: every electron may recombine with every hole (k_XX ≈ 4·k_X, Rajadell et al., J. Phys. Chem. C 113,
     * 11268 (2009)).
     */
    STATISTICAL("statistical") {
        @Override
        public double factor(int n) {
            return (double) n * n;
        }
    };

    private final String key;

    RadiativeScaling(String key) {
        this.key = key;
    }

    @Override
    public String key() {
        return key;
    }
}
