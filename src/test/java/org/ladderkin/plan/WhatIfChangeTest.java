package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.sample.Refresh;

class WhatIfChangeTest {

    private static final PlanInputs DEMO = PlanCodec.read(Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json"));

    @Test
    void aRateChangeDropsThePulsePickerAndKeepsTheRest() {
        PlanInputs changed = new WhatIfChange.RepetitionRateChange(80e6).applyTo(DEMO);
        assertThat(changed.laser().repetitionRateHz()).isEqualTo(80e6);
        assertThat(changed.laser().pulsePickerDivisions()).containsExactly(1);
        assertThat(changed.laser().pumpWavelengthsM()).isEqualTo(DEMO.laser().pumpWavelengthsM());
        assertThat(changed.sample()).isEqualTo(DEMO.sample());
    }

    @Test
    void aRefreshChangeResolvesTheSampleAgain() {
        PlanInputs changed = new WhatIfChange.RefreshChange(Refresh.stationary()).applyTo(DEMO);
        assertThat(changed.sample().spec().refresh()).isEqualTo(Refresh.stationary());
        assertThat(changed.laser()).isEqualTo(DEMO.laser());
    }

    @Test
    void aRateMustBePositive() {
        assertThatThrownBy(() -> new WhatIfChange.RepetitionRateChange(0)).isInstanceOf(IllegalArgumentException.class);
    }
}
