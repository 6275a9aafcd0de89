package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

class ImplicitStiffIntegratorInputTest {

    private final ImplicitStiffIntegrator integrator = new ImplicitStiffIntegrator(new Tolerances(1e-10, 1e-8));

    @Test
    void rejectsNonAscendingOutputTimes() {
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.decay(1), 0, new double[] {1}, new double[] {2, 1}))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("output times must be ascending: outputTimesS[1] = 1.0 s < outputTimesS[0] = 2.0 s");
    }

    @Test
    void rejectsOutputTimeBeforeStart() {
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.decay(1), 1, new double[] {1}, new double[] {0.5}))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("outputTimesS[0] = 0.5 s is before t0 = 1.0 s");
    }

    @Test
    void rejectsDimensionMismatch() {
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.chain(1, 2), 0, new double[] {1}, new double[] {1}))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("dimension mismatch: system has 2 unknowns but y0 has 1 components");
    }

    @Test
    void rejectsNaNInInitialState() {
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.chain(1, 2), 0, new double[] {1, Double.NaN},
                new double[] {1}))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("y0[1] must be finite, was NaN");
    }

    @Test
    void rejectsNonFiniteTimes() {
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.decay(1), Double.NaN, new double[] {1},
                new double[] {1})).hasMessageContaining("t0 must be finite, was NaN s");
        assertThatThrownBy(() -> integrator.integrate(StiffFixtures.decay(1), 0, new double[] {1},
                new double[] {Double.POSITIVE_INFINITY})).hasMessageContaining("outputTimesS[0] must be finite");
    }

    @Test
    void rejectsNullTolerances() {
        assertThatThrownBy(() -> new ImplicitStiffIntegrator(null)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void nonFiniteDerivativeNamesTimeAndState() {
        StiffSystem blowsUp = new StiffSystem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void derivatives(double t, double[] y, double[] dydt) {
                dydt[0] = t > 0.5 ? Double.NaN : -y[0];
            }

            @Override
            public void jacobian(double t, double[] y, double[][] dfdy) {
                dfdy[0][0] = -1;
            }
        };
        assertThatThrownBy(() -> integrator.integrate(blowsUp, 0, new double[] {1}, new double[] {1}))
                .isInstanceOf(StiffIntegrationException.class)
                .hasMessageContaining(" at t = ")
                .hasMessageContaining("state [");
    }

    @Test
    void finiteTimeBlowUpEndsInStepSizeUnderflowWithTimeAndState() {
        // y' = y^2, y(0) = 1 blows up at t = 1
        StiffSystem blowUp = new StiffSystem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void derivatives(double t, double[] y, double[] dydt) {
                dydt[0] = y[0] * y[0];
            }

            @Override
            public void jacobian(double t, double[] y, double[][] dfdy) {
                dfdy[0][0] = 2 * y[0];
            }
        };
        assertThatThrownBy(() -> integrator.integrate(blowUp, 0, new double[] {1}, new double[] {2}))
                .isInstanceOfSatisfying(StiffIntegrationException.class, e -> {
                    assertThat(e.timeS()).isBetween(0.9, 1.01);
                    assertThat(e.state()[0]).isGreaterThan(10);
                    assertThat(e.getMessage()).contains("step size underflow", "at t = ", "state [");
                });
    }

    @Test
    void resultRejectsNegativeCounts() {
        assertThatThrownBy(() -> new IntegrationResult(new double[0][], -1, 0, 0, 0))
                .hasMessageContaining("counts must be >= 0");
    }
}
