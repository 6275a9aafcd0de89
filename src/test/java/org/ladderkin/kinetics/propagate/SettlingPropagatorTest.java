package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/** The guards of the split propagator: it refuses a set that is not invariant and a settle time that is too short. */
class SettlingPropagatorTest {

    /** State 1 (hot) cools to state 0 at 1/ps. */
    static final double[][] TWO_STATE = {{0, 1e12}, {0, -1e12}};

    @Test
    void rejectsASettledSetThatLeaks() {
        assertThatThrownBy(() -> SettlingPropagator.of(TWO_STATE, new int[] {1}, 1e-10))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("not invariant");
    }

    @Test
    void refusesToDropPopulationWhenTheSettleTimeIsTooShort() {
        SettlingPropagator p = SettlingPropagator.of(TWO_STATE, new int[] {0}, 1e-12);
        assertThatThrownBy(() -> p.propagate(new double[] {0, 1}, 1e-9))
                .isInstanceOf(IllegalStateException.class).hasMessageContaining("too short");
        assertThatThrownBy(() -> p.matrix(1e-9)).isInstanceOf(IllegalStateException.class);
        assertThatThrownBy(() -> p.onGrid(new double[] {1e-9}).observe(new double[][] {{1, 1}}, new double[] {0, 1}))
                .isInstanceOf(IllegalStateException.class);
    }

    @Test
    void enoughSettleTimeGivesTheExactTwoStateAnswer() {
        SettlingPropagator p = SettlingPropagator.of(TWO_STATE, new int[] {0}, 45e-12);
        double[] early = p.propagate(new double[] {0, 1}, 1e-12);
        assertThat(Math.abs(early[1] - Math.exp(-1))).isLessThan(1e-15);
        double[] late = p.propagate(new double[] {0, 1}, 1e-9);
        assertThat(Math.abs(late[0] - 1)).isLessThan(1e-14);
        assertThat(late[1]).isZero();
    }
}
