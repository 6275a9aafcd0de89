package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.gui.model.Prediction;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/** The planner window's texts that need no display: status line, compact risk numbers, placeholders, tab caps. */
class WindowTextTest {

    private static Risk risk(Verdict v) {
        return new Risk("r", v, 1, 2, "K", "why");
    }

    @Test
    void aReadablePlanWithFailingRisksIsNotCalledValid() {
        assertThat(PlanStatus.readable(List.of(risk(Verdict.FAIL), risk(Verdict.PASS), risk(Verdict.FAIL),
                risk(Verdict.FAIL), risk(Verdict.WARN)))).isEqualTo("plan readable — 3 risks fail, 1 warns");
        assertThat(PlanStatus.readable(List.of(risk(Verdict.FAIL)))).isEqualTo("plan readable — 1 risk fails");
        assertThat(PlanStatus.readable(List.of(risk(Verdict.WARN), risk(Verdict.WARN), risk(Verdict.PASS))))
                .isEqualTo("plan readable — 2 risks warn");
        assertThat(PlanStatus.readable(List.of(risk(Verdict.PASS), risk(Verdict.PASS))))
                .isEqualTo("plan readable — all 2 risks pass");
        assertThat(PlanStatus.readable(null)).isEqualTo("plan readable — checking the risks…");
        assertThat(PlanStatus.worst(List.of(risk(Verdict.WARN), risk(Verdict.PASS)))).isEqualTo(Verdict.WARN);
    }

    @Test
    void riskNumbersAreCompact() {
        assertThat(RiskTable.number(5391.2, "K")).isEqualTo("5391 K");
        assertThat(RiskTable.number(1.7037, "K")).isEqualTo("1.7 K");
        assertThat(RiskTable.number(0.0379, "fraction")).isEqualTo("3.79 %");
        assertThat(RiskTable.number(2.5e-6, "s")).isEqualTo("2.5e-6 s");
        assertThat(RiskTable.number(1.234e7, "")).isEqualTo("1.23e7");
        assertThat(RiskTable.number(0.05, "fraction")).isEqualTo("5 %");
        assertThat(RiskTable.number(Double.POSITIVE_INFINITY, "K")).isEqualTo("∞ K");
    }

    @Test
    void derivedNumbersFillTheFieldsTheyStandInForByTheirLabels() {
        var derived = List.of(
                new Prediction.DerivedNumber("cross-section σ at the pump", "2.1e-15 cm²", "f"),
                new Prediction.DerivedNumber("pump beam diameter (D4σ)", "300 µm", "f"),
                new Prediction.DerivedNumber("diameter (from the first-exciton peak)", "4.1 nm", "f"),
                new Prediction.DerivedNumber("single-exciton lifetime τ₁ (volume law)", "20 ns", "f"),
                new Prediction.DerivedNumber("biexciton lifetime τ₂ (volume law)", "48 ps", "f"),
                new Prediction.DerivedNumber("dot concentration", "3.2 µM", "f"));
        var shown = DerivedPlaceholders.of(derived);
        assertThat(shown).containsEntry("sample.crossSection.value", "2.1e-15 cm² (derived)")
                .containsEntry("sample.diameter", "4.1 nm (derived)")
                .containsEntry("model.singleExcitonLifetime", "20 ns (derived)")
                .containsEntry("model.biexcitonLifetime", "48 ps (derived)")
                .containsEntry("sample.concentration", "3.2 µM (derived)")
                .hasSize(5);
        assertThat(DerivedPlaceholders.of(List.of(new Prediction.DerivedNumber("photon energy", "3.1 eV", "f"))))
                .isEmpty();
    }

    @Test
    void tabsAreCappedOnlyWhenTheyDoNotFitAndShortTabsKeepTheirWidth() {
        assertThat(TabFit.cap(new int[] {60, 70, 80}, 300)).isNull();
        // 60 and 70 fit as they are; the two long ones share the remaining 170
        assertThat(TabFit.cap(new int[] {60, 200, 70, 180}, 300)).isEqualTo(85);
        assertThat(TabFit.cap(new int[] {100, 100, 100}, 150)).isEqualTo(50);
    }
}
