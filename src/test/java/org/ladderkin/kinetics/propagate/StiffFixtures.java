package org.ladderkin.kinetics.propagate;

import java.util.function.DoubleUnaryOperator;

/** Test systems for the implicit integrator, in the style of Hipparchus' TestProblem classes. */
final class StiffFixtures {

    private StiffFixtures() {
    }

    /** y' = −k y: exact solution y₀ e^{−k t}. */
    static StiffSystem decay(double rateHz) {
        return new LinearSystem(1, (t, m) -> m[0][0] = -rateHz);
    }

    /**
     * Two-level chain 1 → 2 → ∅: y₁' = −k₁y₁, y₂' = k₁y₁ − k₂y₂. With y(0) = (1, 0):
     * y₁ = e^{−k₁t}, y₂ = k₁/(k₂ − k₁)·(e^{−k₁t} − e^{−k₂t}).
     */
    static StiffSystem chain(double k1Hz, double k2Hz) {
        return new LinearSystem(2, (t, m) -> {
            m[0][0] = -k1Hz;
            m[1][0] = k1Hz;
            m[1][1] = -k2Hz;
        });
    }

    static double[] chainExact(double k1Hz, double k2Hz, double t) {
        double e1 = Math.exp(-k1Hz * t);
        double e2 = Math.exp(-k2Hz * t);
        return new double[] {e1, k1Hz / (k2Hz - k1Hz) * (e1 - e2)};
    }

    /**
     * Linear, time-dependent: y' = −(a + b·cos ωt)·y, exact y₀·exp(−(a t + (b/ω) sin ωt)). {@code flagLinear}
     * false makes the integrator treat it as nonlinear (full Newton path).
     */
    static StiffSystem oscillatingDecay(double a, double b, double omega, boolean flagLinear) {
        LinearSystem s = new LinearSystem(1, (t, m) -> m[0][0] = -(a + b * Math.cos(omega * t)));
        return flagLinear ? s : asNonlinear(s);
    }

    static double oscillatingDecayExact(double a, double b, double omega, double t) {
        return Math.exp(-(a * t + b / omega * Math.sin(omega * t)));
    }

    /** Nonlinear: y' = −y², y(0) = 1, exact 1/(1 + t). */
    static StiffSystem inverseSquare() {
        return new StiffSystem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void derivatives(double t, double[] y, double[] dydt) {
                dydt[0] = -y[0] * y[0];
            }

            @Override
            public void jacobian(double t, double[] y, double[][] dfdy) {
                dfdy[0][0] = -2 * y[0];
            }
        };
    }

    /** Riccati equation y' = 1 + y², y(0) = 0, exact tan t. */
    static StiffSystem riccati() {
        return new StiffSystem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void derivatives(double t, double[] y, double[] dydt) {
                dydt[0] = 1 + y[0] * y[0];
            }

            @Override
            public void jacobian(double t, double[] y, double[][] dfdy) {
                dfdy[0][0] = 2 * y[0];
            }
        };
    }

    /**
     * Van der Pol's equation in its stiff scaling: y1' = y2, y2' = ((1 − y1²)·y2 − y1)/ε (Hairer &amp; Wanner II,
     * Sect. IV.1); ε = 1e-6 makes the relaxation jumps about 1e6 times faster than the slow branches.
     */
    static StiffSystem vanDerPol(double epsilon) {
        return new StiffSystem() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void derivatives(double t, double[] y, double[] d) {
                d[0] = y[1];
                d[1] = ((1 - y[0] * y[0]) * y[1] - y[0]) / epsilon;
            }

            @Override
            public void jacobian(double t, double[] y, double[][] j) {
                j[0][0] = 0;
                j[0][1] = 1;
                j[1][0] = (-2 * y[0] * y[1] - 1) / epsilon;
                j[1][1] = (1 - y[0] * y[0]) / epsilon;
            }
        };
    }

    /** Robertson's chemical kinetics (Hairer &amp; Wanner II, Sect. IV.1). */
    static StiffSystem robertson() {
        return new StiffSystem() {
            @Override
            public int dimension() {
                return 3;
            }

            @Override
            public void derivatives(double t, double[] y, double[] d) {
                double r1 = 0.04 * y[0];
                double r2 = 1e4 * y[1] * y[2];
                double r3 = 3e7 * y[1] * y[1];
                d[0] = -r1 + r2;
                d[1] = r1 - r2 - r3;
                d[2] = r3;
            }

            @Override
            public void jacobian(double t, double[] y, double[][] j) {
                j[0][0] = -0.04;
                j[0][1] = 1e4 * y[2];
                j[0][2] = 1e4 * y[1];
                j[1][0] = 0.04;
                j[1][1] = -1e4 * y[2] - 6e7 * y[1];
                j[1][2] = -1e4 * y[1];
                j[2][0] = 0;
                j[2][1] = 6e7 * y[1];
                j[2][2] = 0;
            }
        };
    }

    /**
     * Bidiagonal decay ladder dP_N/dt = −k_N P_N + k_{N+1} P_{N+1}, N = 0..rates.length−1, with k₀ = rates[0]
     * (usually 0: the ground state does not decay).
     */
    static StiffSystem ladder(double[] ratesHz) {
        int n = ratesHz.length;
        return new LinearSystem(n, (t, m) -> fillLadder(ratesHz, m));
    }

    static double[][] ladderGenerator(double[] ratesHz) {
        double[][] m = new double[ratesHz.length][ratesHz.length];
        fillLadder(ratesHz, m);
        return m;
    }

    private static void fillLadder(double[] k, double[][] m) {
        for (int i = 0; i < k.length; i++) {
            m[i][i] = -k[i];
            if (i + 1 < k.length) {
                m[i][i + 1] = k[i + 1];
            }
        }
    }

    /** Rates k₀ = 0 and k₁..k_{n−1} spaced logarithmically from slowest to fastest. */
    static double[] logSpacedLadderRates(int n, double slowestHz, double fastestHz) {
        double[] k = new double[n];
        for (int i = 1; i < n; i++) {
            double f = (i - 1) / (double) (n - 2);
            k[i] = slowestHz * Math.pow(fastestHz / slowestHz, f);
        }
        return k;
    }

    /**
     * A ladder pumped by a finite Gaussian pulse: each level N &lt; top climbs to N + 1 at rate
     * g(t) = g₀·exp(−(t − t_c)²/(2σ²)) and decays to N − 1 at rate k_N.
     */
    static StiffSystem pumpedLadder(double[] decayRatesHz, double peakPumpRateHz, double centreS, double sigmaS) {
        int n = decayRatesHz.length;
        DoubleUnaryOperator g = t -> peakPumpRateHz * Math.exp(-0.5 * Math.pow((t - centreS) / sigmaS, 2));
        return new LinearSystem(n, (t, m) -> {
            fillLadder(decayRatesHz, m);
            double gt = g.applyAsDouble(t);
            for (int i = 0; i + 1 < n; i++) {
                m[i][i] -= gt;
                m[i + 1][i] += gt;
            }
        });
    }

    /** Hides {@link StiffSystem#isLinear()} so that the integrator takes its nonlinear path. */
    static StiffSystem asNonlinear(StiffSystem s) {
        return new StiffSystem() {
            @Override
            public int dimension() {
                return s.dimension();
            }

            @Override
            public void derivatives(double t, double[] y, double[] dydt) {
                s.derivatives(t, y, dydt);
            }

            @Override
            public void jacobian(double t, double[] y, double[][] dfdy) {
                s.jacobian(t, y, dfdy);
            }
        };
    }

    /** Fills the (time-dependent) matrix M(t) of y' = M(t)·y; the array arrives zeroed. */
    interface MatrixFunction {
        void fill(double t, double[][] m);
    }

    /** y' = M(t)·y. */
    static final class LinearSystem implements StiffSystem {
        private final int n;
        private final MatrixFunction matrix;

        LinearSystem(int n, MatrixFunction matrix) {
            this.n = n;
            this.matrix = matrix;
        }

        @Override
        public int dimension() {
            return n;
        }

        @Override
        public void derivatives(double t, double[] y, double[] dydt) {
            double[][] m = new double[n][n];
            matrix.fill(t, m);
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += m[i][j] * y[j];
                }
                dydt[i] = s;
            }
        }

        @Override
        public void jacobian(double t, double[] y, double[][] dfdy) {
            for (double[] row : dfdy) {
                java.util.Arrays.fill(row, 0.0);
            }
            matrix.fill(t, dfdy);
        }

        @Override
        public boolean isLinear() {
            return true;
        }
    }
}
