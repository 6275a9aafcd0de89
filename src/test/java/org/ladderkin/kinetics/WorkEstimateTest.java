package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.propagate.WorkBound;
import org.ladderkin.kinetics.propagate.WorkLimitException;
import org.ladderkin.kinetics.train.PulseExcitation;

/** The up-front estimate that simulate and plan ask before building anything. */
class WorkEstimateTest {

    @Test
    void theBenchSweepIsWellWithinTheBound() {
        PulseExcitation[] sweep = new PulseExcitation[40];
        for (int i = 0; i < sweep.length; i++) {
            sweep[i] = new PulseExcitation.Poisson(0.01 * Math.pow(1000, i / 39.0));
        }
        double ops = LadderKinetics.checkWork(TestModels.benchLadder(), 1000, true, false, sweep);
        // 31 states: 31³ + 1000·31·40 + the 40 steady states
        assertThat(ops).isEqualTo(31.0 * 31 * 31 * 2 + 1000.0 * 31 * 40 + 40 * 31.0 * 31 * 31 * 4 / 3);
        assertThat(ops).isLessThan(WorkBound.WARN_OPERATIONS);
    }

    @Test
    void aHotLadderAboveTheStateLimitIsRefusedNamingItsShape() {
        KineticModel hot = CoolingPropagationTest.hotModel(0, 0.5e-12, true);
        assertThatThrownBy(() -> LadderKinetics.checkWork(hot, 10, false, false, new PulseExcitation.Poisson(30)))
                .isInstanceOf(WorkLimitException.class)
                .hasMessageStartingWith("the ladder needs ")
                .hasMessageContaining("(⟨N⟩ up to 30: Nmax = ")
                .hasMessageContaining("hot excitons resolved, 3 charge states), more than the 1500 the engine supports");
    }

    @Test
    void manyPulsesOnAMidSizedLadderAreRefusedByTheirSteadyStates() {
        KineticModel hot = CoolingPropagationTest.hotModel(0, 0.5e-12, false);
        PulseExcitation[] many = new PulseExcitation[200];
        java.util.Arrays.fill(many, new PulseExcitation.Poisson(12));
        assertThatThrownBy(() -> LadderKinetics.checkWork(hot, 1000, true, false, many))
                .isInstanceOf(WorkLimitException.class)
                .hasMessageContaining("200 pulses with their pulse-train steady states needs about")
                .hasMessageContaining("use fewer ⟨N⟩ values, fewer delays or a lower ⟨N⟩");
        assertThat(LadderKinetics.checkWork(hot, 1000, false, false, many)).isLessThan(WorkBound.MAX_OPERATIONS);
    }
}
