package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.ExpectedError;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.plan.Planner;

/** The window's error budget is the report's: the same planner with the design search, delivered off the event thread. */
class ErrorBudgetServiceTest {

    private static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");

    @Test
    void theBudgetIsTheReportsAndComesOnce() throws Exception {
        PlanInputs in = PlanCodec.read(DEMO);
        CampaignPlan report = Planner.plan(in, Planner.Progress.NONE, true);
        List<ErrorBudgetService.Result> got = new java.util.concurrent.CopyOnWriteArrayList<>();
        try (ErrorBudgetService s = new ErrorBudgetService(0, Runnable::run, got::add)) {
            long gen = s.request(in);
            long deadline = System.nanoTime() + 300_000_000_000L;
            while (got.isEmpty() && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertThat(got).hasSize(1);
            assertThat(got.get(0).generation()).isEqualTo(gen);
        }
        ErrorBudgetService.Result r = got.get(0);
        assertThat(r.error()).isNull();
        assertThat(r.errors()).isNotEmpty();
        List<ExpectedError> expected = report.design().best().expected();
        assertThat(r.errors()).hasSameSizeAs(expected);
        for (int i = 0; i < expected.size(); i++) {
            assertThat(r.errors().get(i).parameter()).isEqualTo(expected.get(i).parameter());
            assertThat(r.errors().get(i).totalRel()).isEqualTo(expected.get(i).totalRel());
            assertThat(r.errors().get(i).advice()).isEqualTo(expected.get(i).advice());
        }
        assertThat(r.delayPoints()).isEqualTo(report.design().best().delaysS().length);
    }

    @Test
    void theLivePredictionPrintsEveryNWithItsUncertainty() throws Exception {
        Prediction p = new PlannerPrediction().predict(PlanCodec.read(DEMO));
        assertThat(p.derived()).filteredOn(d -> d.label().startsWith("pulse energy for ⟨N⟩")).isNotEmpty()
                .allSatisfy(d -> assertThat(d.label()).containsPattern("⟨N⟩ = [0-9.]+ ± [0-9.]+ %"));
    }
}
