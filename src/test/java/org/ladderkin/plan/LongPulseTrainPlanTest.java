package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/**
 * The CdSe demo edited to 80 MHz: its pulse train needs thousands of pulses to settle, and the build-up over them once
 * tripped the conservation guard on accumulated round-off, so the desktop planner showed no prediction at all.
 */
class LongPulseTrainPlanTest {

    @Test
    void anEightyMegahertzEditIsPredictedWithItsFailingRisks(@TempDir Path dir) throws Exception {
        String text = Files.readString(Path.of("experiments-plan/cdse-auger-1khz.plan.json"));
        assertThat(text).contains("\"1 kHz\"");
        Path plan = dir.resolve("p80.plan.json");
        Files.writeString(plan, text.replace("\"1 kHz\"", "\"80 MHz\""));

        CampaignPlan p = Planner.plan(PlanCodec.read(plan), Planner.Progress.NONE, false);

        assertThat(p.predictions().pulsesToSteadyState()).isGreaterThan(1000);
        double[] charged = p.predictions().buildUpCharged();
        assertThat(java.util.Arrays.stream(charged).allMatch(v -> Double.isFinite(v) && v >= -1e-12 && v <= 1 + 1e-12)).isTrue();
        // 1.2 × the pulses to steady state, cut at the chart's limit (the report says how many are drawn)
        int shown = Math.min(Planner.MAX_BUILD_UP_PULSES, (int) Math.ceil(1.2 * p.predictions().pulsesToSteadyState()));
        assertThat(charged).hasSize(shown);
        double steady = p.chosenRate().charged();
        assertThat(charged[charged.length - 1]).isBetween(0.95 * steady, steady + 1e-9);
        assertThat(p.risks().stream().filter(r -> r.verdict() == Verdict.FAIL).map(Risk::name))
                .contains(HeatBudget.RISK_NAME, "photocharging", "residual excitation at the next pulse");
    }
}
