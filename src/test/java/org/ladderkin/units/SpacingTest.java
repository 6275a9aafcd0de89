package org.ladderkin.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class SpacingTest {

    @Test
    void logGridsHaveEqualRatiosAndExactEnds() {
        double[] d = Spacing.log(1e-13, 1e-3, 11);
        assertThat(d[0]).isEqualTo(1e-13);
        assertThat(d[10]).isEqualTo(1e-3);
        for (int i = 1; i < d.length; i++) {
            assertThat(d[i] / d[i - 1]).isCloseTo(10, within(1e-9));
        }
    }

    @Test
    void linearGridsHaveEqualSteps() {
        assertThat(Spacing.linear(0, 500e-12, 6)).containsExactly(new double[] {0, 100e-12, 200e-12, 300e-12, 400e-12, 500e-12},
                within(1e-24));
    }

    @Test
    void impossibleGridsAreRejected() {
        assertThatThrownBy(() -> Spacing.log(0, 1, 5)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> Spacing.linear(0, 1, 1)).isInstanceOf(IllegalArgumentException.class);
    }
}
