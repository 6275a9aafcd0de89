package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.Planner;

/** The planner window's derived numbers are the campaign planner's own numbers, each with its formula. */
class PlannerPredictionTest {

    @Test
    void derivedNumbersEchoThePlannersValues() {
        CampaignPlan plan = Planner.plan(RecomputeServiceTest.DEMO, Planner.Progress.NONE, false);
        Map<String, Prediction.DerivedNumber> byLabel = PlannerPrediction.derived(plan).stream()
                .collect(Collectors.toMap(Prediction.DerivedNumber::label, Function.identity()));
        assertThat(byLabel.get("steady-state temperature rise").value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g K", plan.heat().steadyRiseK()));
        assertThat(byLabel.get("steady-state charged fraction").value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g", plan.chosenRate().charged()));
        assertThat(byLabel.get("residual excitation at the next pulse").value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g", plan.chosenRate().residual()));
        assertThat(byLabel.get("pulses to steady state").value())
                .isEqualTo(String.valueOf(plan.predictions().pulsesToSteadyState()));
        assertThat(byLabel.keySet().stream().filter(k -> k.startsWith("pulse energy for ⟨N⟩"))).hasSize(plan.fluences().size());
        for (Prediction.DerivedNumber d : byLabel.values()) {
            assertThat(d.formula()).as(d.label()).isNotBlank();
        }
    }

    @Test
    void thePredictionCarriesTheCautionsAndOneChartPerPlanChart() {
        Prediction p = new PlannerPrediction().predict(RecomputeServiceTest.DEMO);
        assertThat(p.cautions()).isNotEmpty();
        assertThat(p.charts()).extracting(c -> c.title()).contains("Band-edge bleach (steady state)",
                "Photoluminescence per dot", "Pulse-train build-up (highest fluence)");
    }

    @Test
    void aPredictionWhoseThreadIsInterruptedStopsAtThePlannersNextStep() {
        Thread.currentThread().interrupt();
        try {
            org.assertj.core.api.Assertions.assertThatThrownBy(() -> new PlannerPrediction().predict(RecomputeServiceTest.DEMO))
                    .isInstanceOf(java.util.concurrent.CancellationException.class)
                    .hasMessageContaining("a newer edit replaced this prediction");
        } finally {
            Thread.interrupted();
        }
    }
}
