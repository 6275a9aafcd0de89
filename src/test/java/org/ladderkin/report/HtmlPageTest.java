package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class HtmlPageTest {

    @Test
    void escapesEverythingTheUserWrote() {
        String html = new HtmlPage("a <b> & \"c\"").paragraph("<script>alert(1)</script>").render();
        assertThat(html).doesNotContain("<script>").contains("&lt;script&gt;").contains("<title>a &lt;b&gt; &amp; &quot;c&quot;</title>");
    }

    @Test
    void colourCodesRiskRowsAndAlignsNumbers() {
        String html = new HtmlPage("t").table(List.of("risk", "value", "verdict"),
                List.of(List.of("heating", "3.2", "WARN"), List.of("charging", "0.01", "PASS"))).render();
        assertThat(html).contains("<tr class=\"warn\">").contains("<tr class=\"pass\">").contains("<td class=\"num\">3.2</td>");
    }

    @Test
    void embedsChartsAsInlineSvgWithoutExternalResources() {
        ChartSpec spec = new ChartSpec("Bleach", "delay (ps)", "bleach", true, false, List.of(
                ChartSpec.Series.line("⟨N⟩ = 0.1", new double[] {0.1, 1, 10, 100}, new double[] {1, 0.9, 0.5, 0.4}),
                ChartSpec.Series.line("⟨N⟩ = 3", new double[] {0.1, 1, 10, 100}, new double[] {2, 1.5, 1, 0.9})));
        String html = new HtmlPage("r").charts(List.of(spec), 480, 320).render();
        assertThat(html).contains("<svg").contains("Bleach").contains("delay (ps)");
        assertThat(html).doesNotContain("<script").doesNotContain("http://www.w3.org/1999/xlink\" xlink:href=\"http");
    }

    @Test
    void cautionsFollowMaterialAndSolvent() {
        assertThat(Cautions.forCampaign("CdSe", "toluene", 1.5, 383.75)).hasSize(3);
        assertThat(Cautions.forCampaign("InP", "water", 0.1, 373.15)).containsExactly(Cautions.LASER);
        assertThat(Cautions.forCampaign("PbS", "tetrachloroethylene", 0.1, 394.25)).hasSize(2);
        assertThat(Cautions.LASER).contains("laser safety officer");
    }
}
