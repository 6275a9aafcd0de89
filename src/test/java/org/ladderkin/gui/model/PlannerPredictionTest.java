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
    void derivedNumbersEchoThePlannersValuesAndNameTheSeriesTop() {
        CampaignPlan plan = Planner.plan(RecomputeServiceTest.DEMO, Planner.Progress.NONE, false);
        String atTop = String.format(Locale.ROOT, " at ⟨N⟩ = %.4g (preview series)", plan.highestFluence().nProbeAveraged());
        Map<String, Prediction.DerivedNumber> byLabel = PlannerPrediction.derived(plan, true).stream()
                .collect(Collectors.toMap(Prediction.DerivedNumber::label, Function.identity()));
        assertThat(byLabel.get("steady-state temperature rise" + atTop).value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g K", plan.heat().steadyRiseK()));
        assertThat(byLabel.get("steady-state charged fraction" + atTop).value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g", plan.chosenRate().charged()));
        assertThat(byLabel.get("residual excitation at the next pulse" + atTop).value())
                .isEqualTo(String.format(Locale.ROOT, "%.3g", plan.chosenRate().residual()));
        assertThat(byLabel.get("pulses to steady state" + atTop).value())
                .isEqualTo(String.valueOf(plan.predictions().pulsesToSteadyState()));
        assertThat(byLabel.keySet().stream().filter(k -> k.startsWith("pulse energy for ⟨N⟩"))).hasSize(plan.fluences().size());
        for (Prediction.DerivedNumber d : byLabel.values()) {
            assertThat(d.formula()).as(d.label()).isNotBlank();
        }
        // the values the prediction rests on, each with its source
        assertThat(byLabel.get("diameter").value()).isEqualTo(String.format(Locale.ROOT, "%.3g nm",
                plan.inputs().sample().sizeM() * 1e9));
        assertThat(byLabel.get("diameter").formula()).contains("sizing curve");
        assertThat(byLabel.get("concentration").formula()).isEqualTo(plan.inputs().sample().concentrationBasis());
        assertThat(byLabel.get("τ₁ single exciton").formula()).startsWith("τ₁: ").contains("τ_rad = τ₁/QY");
        assertThat(byLabel.get("τ₂ biexciton Auger").formula()).startsWith("τ₂: ").contains("τ₂ = C·V");
        assertThat(byLabel.get("cross-section σ at the pump").formula()).isEqualTo(plan.chosenWavelength().crossSectionBasis());
    }

    @Test
    void thePreviewSaysItIsOneAndTheDesignedPredictionIsTheFullPlans() {
        Prediction preview = new PlannerPrediction().predict(RecomputeServiceTest.DEMO);
        assertThat(preview.designed()).isFalse();
        assertThat(preview.basis()).startsWith("preview: log-spaced ⟨N⟩ 0.05–").contains("the designed series follows");
        CampaignPlan full = Planner.plan(RecomputeServiceTest.DEMO, Planner.Progress.NONE, true);
        Prediction designed = PlannerPrediction.designed(full);
        assertThat(designed.designed()).isTrue();
        assertThat(designed.risks()).isEqualTo(full.risks());
        assertThat(designed.derived()).noneMatch(d -> d.label().contains("preview"));
        assertThat(designed.basis()).contains(String.format(Locale.ROOT, "%.3g", full.highestFluence().nProbeAveraged()));
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
