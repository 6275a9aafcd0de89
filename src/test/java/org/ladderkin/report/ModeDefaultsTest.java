package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.Planner;

/** Each mode's rows say which values are the library's defaults and where they come from. */
class ModeDefaultsTest {

    private static final Path PLANS = Path.of(System.getProperty("ladderkin.home", ".")).resolve("experiments-plan");

    private static CampaignPlan plan(String file) {
        return Planner.plan(PlanCodec.read(PLANS.resolve(file)), Planner.Progress.NONE, false);
    }

    @Test
    void theInpTcspcReportListsTheDefaultsItsCountingRestsOn() {
        CampaignPlan plan = plan("inp-zns-tcspc-5mhz.plan.json");
        String line = ModeSections.defaultsLine(plan, ModeSections.Mode.COUNTING);
        // the plan gives τ₁, the yield, σ and both size and peak: what is left are the library's charging and heat values
        assertThat(line).startsWith("Defaults used: ")
                .contains("Auger ionisation probability: default order of magnitude (from memory)")
                .contains("photocharge lifetime: default order of magnitude for solutions (from memory)")
                .contains("refresh: stirred, excited volume renewed in ~0.1 s (common practice, no source)")
                .contains("n-hexane heat capacity: density 0.6549 g/cm³ at 298.15 K from the reference equation of state")
                .doesNotContain("τ₁:").doesNotContain("PL quantum yield").doesNotContain("σ at")
                .doesNotContain("sizing curve");
        String html = PlanReport.html(plan);
        assertThat(html).contains(HtmlPage.escape(line));
    }

    @Test
    void theGainFilmReportNamesTheSizingCurveTheAugerLawAndTheHeatCapacities() {
        CampaignPlan plan = plan("cdse-cds-gain-film.plan.json");
        var material = plan.inputs().sample().material();
        String line = ModeSections.defaultsLine(plan, ModeSections.Mode.GAIN);
        // the film gives its peak and τ₂: the size comes from the sizing curve, σ and the degeneracy from the library
        assertThat(line).contains("size from the peak by the sizing curve: " + material.sizing().orElseThrow().source())
                .contains("σ at ").contains("band-edge degeneracy 2: " + material.electronDegeneracy().source())
                .contains("dot heat capacity: density " + material.densityKgPerM3().source())
                .contains("heat capacity: density " + plan.inputs().sample().spec().matrix().orElseThrow()
                        .densityKgPerM3().source())
                .doesNotContain("τ₂:");
        assertThat(ModeSections.gainLines(plan)).contains(line);
    }

    @Test
    void theCdseTaReportAndTextListTheDefaultsTheAugerSeriesRestsOn() {
        CampaignPlan plan = plan("cdse-auger-1khz.plan.json");
        String line = ModeSections.defaultsLine(plan, ModeSections.Mode.TRANSIENT_ABSORPTION);
        assertThat(line).startsWith("Defaults used: ").contains("photocharge lifetime").contains("heat capacity");
        assertThat(PlanReport.html(plan)).contains(HtmlPage.escape(line));
    }
}
