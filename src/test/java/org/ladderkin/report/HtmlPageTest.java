package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.plan.CautionRules;

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
        assertThat(campaign("CdSe", "toluene", 1.5, 295, 383.75, 1)).hasSize(3);
        assertThat(campaign("InP", "water", 0.1, 295, 373.15, 1)).containsExactly(Cautions.LASER);
        assertThat(campaign("PbS", "tetrachloroethylene", 0.1, 295, 394.25, 1)).hasSize(2);
        assertThat(Cautions.LASER).contains("laser safety officer");
    }

    @Test
    void aStrongPumpAndAHotSampleAddTheirCautions() {
        // 1 mJ/cm² = 10 J/m² is where the high-fluence caution starts (a threshold of this project, not a standard)
        assertThat(campaign("InP", "water", 0.1, 295, 373.15, 9.99)).containsExactly(Cautions.LASER);
        List<String> strong = campaign("InP", "water", 0.1, 295, 373.15, 57);
        assertThat(strong).hasSize(2);
        assertThat(strong.get(1)).startsWith("High pump fluence").contains("5.7 mJ/cm²").contains("laser safety officer");
        // a 12 K rise, or a rise that brings water within 20 K of boiling
        List<String> hot = campaign("InP", "water", 12, 295, 373.15, 1);
        assertThat(hot).hasSize(2);
        assertThat(hot.get(1)).startsWith("Hot sample").contains("12 K").contains("to about 34 °C").contains("boils at 100 °C");
        assertThat(campaign("InP", "water", 9, 350, 373.15, 1).get(1)).startsWith("Hot sample");
        assertThat(campaign("InP", "water", 9, 295, 373.15, 1)).containsExactly(Cautions.LASER);
        // a film has no boiling point: only the rise counts
        assertThat(campaign("InP", "film", 9, 295, Double.POSITIVE_INFINITY, 1)).containsExactly(Cautions.LASER);
        assertThat(campaign("InP", "film", 15, 295, Double.POSITIVE_INFINITY, 1).get(1))
                .startsWith("Hot sample").doesNotContain("boils");
    }

    /** The wording of what plan decides for these inputs. */
    private static List<String> campaign(String material, String matrix, double riseK, double sampleK, double boilingK,
                                         double peakFluenceJPerM2) {
        return Cautions.texts(CautionRules.forCampaign(material, matrix, riseK, sampleK, boilingK, peakFluenceJPerM2));
    }
}
