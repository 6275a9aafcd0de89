package org.ladderkin.kinetics.rate;

/** Auger N-scaling g(N), all equal to 1 at N = 2 and 0 below. */
public enum AugerScaling implements ExcitonScaling {
    /** Number of carrier triplets, g(N) = N²(N−1)/4. */
    STATISTICAL("statistical") {
        @Override
        public double factor(int n) {
            return n < 2 ? 0 : (double) n * n * (n - 1) / 4.0;
        }
    },
    /** Number of exciton pairs, g(N) = N(N−1)/2. */
    PAIRS("pairs") {
        @Override
        public double factor(int n) {
            return n < 2 ? 0 : n * (n - 1) / 2.0;
        }
    },
    /** g(N) = N²/4 for N ≥ 2. */
    QUADRATIC("quadratic") {
        @Override
        public double factor(int n) {
            return n < 2 ? 0 : n * n / 4.0;
        }
    };

    private final String key;

    AugerScaling(String key) {
        this.key = key;
    }

    @Override
    public String key() {
        return key;
    }
}
