package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.report.Cautions;
import org.ladderkin.report.HtmlPage;

class PredictionReportTest {

    @Test
    void theReportHoldsWhatThePlannerShows() {
        Prediction p = new PlannerPrediction().predict(RecomputeServiceTest.DEMO);
        String html = PredictionReport.html(RecomputeServiceTest.DEMO, "demo.plan.json", p);
        assertThat(html).startsWith("<!DOCTYPE html>").contains(HtmlPage.escape(RecomputeServiceTest.DEMO.title()))
                .contains(HtmlPage.escape(Cautions.LASER)).contains("multiexciton ladder");
        for (var r : p.risks()) {
            assertThat(html).contains(HtmlPage.escape(r.name()));
        }
        for (var d : p.derived()) {
            assertThat(html).contains(HtmlPage.escape(d.formula()));
        }
        assertThat(html.split("<svg", -1)).hasSize(p.charts().size() + 1);
        assertThat(html).doesNotContain("<script");
    }
}
