package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/** Which cautions apply; the thresholds are this project's choice, not a standard (no source). */
class CautionRulesTest {

    @Test
    void theLaserCautionAlwaysComesFirst() {
        assertThat(CautionRules.forCampaign("InP", "water", 0.1, 295, 373.15, 1)).containsExactly(new Caution.Laser());
        assertThat(CautionRules.forCampaign("CdSe", "toluene", 1.5, 295, 383.75, 1)).containsExactly(new Caution.Laser(),
                new Caution.FlammableSolvent("toluene", 1.5, 383.75), new Caution.HeavyMetals());
    }

    @Test
    void thresholdsDecideFluenceAndHeat() {
        assertThat(CautionRules.forCampaign("InP", "water", 0.1, 295, 373.15, CautionRules.HIGH_FLUENCE_J_PER_M2))
                .contains(new Caution.HighFluence(CautionRules.HIGH_FLUENCE_J_PER_M2));
        assertThat(CautionRules.forCampaign("InP", "water", 0.1, 295, 373.15, 9.99)).hasSize(1);
        // within 20 K of boiling counts even for a small rise; a film (no boiling point) counts the rise only
        assertThat(CautionRules.forCampaign("InP", "water", 9, 350, 373.15, 1)).contains(new Caution.HotSample(9, 350, 373.15));
        assertThat(CautionRules.forCampaign("InP", "film", 9, 295, Double.POSITIVE_INFINITY, 1)).hasSize(1);
        // an unknown rise raises no heat caution
        assertThat(CautionRules.forCampaign("InP", "water", Double.NaN, 295, 373.15, 1)).hasSize(1);
    }

    @Test
    void cautionsRejectImpossibleNumbers() {
        assertThatThrownBy(() -> new Caution.HighFluence(-1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new Caution.HotSample(5, 0, 373)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new Caution.FlammableSolvent(" ", 1, 373)).isInstanceOf(IllegalArgumentException.class);
    }
}
