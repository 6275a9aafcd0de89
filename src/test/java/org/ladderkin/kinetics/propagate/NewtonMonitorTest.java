package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class NewtonMonitorTest {

    @Test
    void fastContractionConverges() {
        NewtonMonitor m = new NewtonMonitor(7, 0.03);
        m.start();
        double norm = 1.0;
        int iteration = 1;
        while (true) {
            assertThat(m.proceed(iteration, norm)).isTrue();
            if (m.converged(norm)) {
                break;
            }
            norm *= 0.05;
            iteration++;
        }
        assertThat(iteration).isBetween(2, 4);
        assertThat(m.theta()).isCloseTo(0.05, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void growingIncrementsAreDivergence() {
        NewtonMonitor m = new NewtonMonitor(7, 0.03);
        m.start();
        assertThat(m.proceed(1, 1.0)).isTrue();
        assertThat(m.proceed(2, 1.5)).isFalse();
        assertThat(m.failure()).contains("diverges");
        assertThat(m.failureFactor()).isEqualTo(0.5);
    }

    @Test
    void slowContractionIsAbandonedEarlyWithAShrinkFactor() {
        NewtonMonitor m = new NewtonMonitor(7, 0.03);
        m.start();
        assertThat(m.proceed(1, 1.0)).isTrue();
        assertThat(m.proceed(2, 0.9)).isFalse();
        assertThat(m.failure()).contains("too slow");
        assertThat(m.failureFactor()).isStrictlyBetween(0.0, 1.0);
    }

    @Test
    void nonFiniteIncrementFails() {
        NewtonMonitor m = new NewtonMonitor(7, 0.03);
        m.start();
        assertThat(m.proceed(1, Double.NaN)).isFalse();
        assertThat(m.failure()).contains("non-finite");
    }
}
