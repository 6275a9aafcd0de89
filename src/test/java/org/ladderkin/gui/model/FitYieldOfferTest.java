package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.PlanFitBasis;
import org.ladderkin.plan.PlanInputs;

/** The fit tab offers the multiplication yield only when the plan's pump is above twice the gap. */
class FitYieldOfferTest {

    private static boolean offered(String plan) {
        PlanInputs inputs = PlanCodec.read(Path.of("experiments-plan", plan));
        return FitJobs.pumpAboveTwiceGap(inputs, PlanFitBasis.of(inputs));
    }

    @Test
    void theYieldIsOfferedForAPumpAboveTwiceTheGapAndNotBelow() {
        assertThat(offered("pbse-multiplication-80mhz.plan.json")).isTrue();
        assertThat(offered("cdse-auger-1khz.plan.json")).isFalse();
        assertThat(FitRun.offered()).extracting(FitOptions.FreeParameter::key).doesNotContain("multiplication-yield");
        assertThat(FitRun.multiplicationYield().key()).isEqualTo("multiplication-yield");
    }
}
