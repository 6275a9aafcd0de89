package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.LadderSeries;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.fit.SyntheticSeries;
import org.ladderkin.kinetics.process.TrappingProcess;

/** What fit-report.html says in words: labels with trade units, never code names, and a reduced χ² near 1 for noise. */
class FitReportTextTest {

    private static final double SIGMA_M2 = 1e-19;
    private static final double NOISE = 2e-4;
    /** A word with a capital after lower-case letters: a code name such as crossSectionCm2 or tauAuger2Ps. */
    private static final Pattern CAMEL = Pattern.compile("\\b[a-z]+[A-Z][A-Za-z0-9]*\\b");

    static Dataset data;
    static LadderFit.Outcome outcome;

    @BeforeAll
    static void fitASeries() {
        var base = LadderSeries.BASE.with(new TrappingProcess(2e-9));
        double[] j = LadderSeries.fluencesPerM2(4, SIGMA_M2);
        LadderBleachModel model = LadderBleachModel.forModel(base, "crossSectionM2", j, Double.NaN);
        data = LadderSeries.withFluences(LadderSeries.make(model, List.of("crossSectionM2"), new double[] {SIGMA_M2},
                SyntheticSeries.logDelays(0.2e-12, 2e-9, 60), 1, 0, NOISE, 5), j);
        outcome = LadderFit.fit(data, new LadderFitSetup(base, Double.NaN,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2, LadderParameter.TAU_TRAP), 0.8 * SIGMA_M2, 0,
                Double.NaN, false, false), org.ladderkin.fit.FitProgress.NONE);
        assertThat(outcome.result().ok()).as(outcome.result().message()).isTrue();
    }

    /** The text a reader sees: charts, styles and scripts left out, tags removed, entities read. */
    static String visibleText(String html) {
        String t = html.replaceAll("(?s)<svg.*?</svg>", " ").replaceAll("(?s)<style.*?</style>", " ")
                .replaceAll("(?s)<script.*?</script>", " ").replaceAll("<[^>]+>", " ");
        return t.replace("&lt;", "<").replace("&gt;", ">").replace("&amp;", "&").replace("&quot;", "\"");
    }

    @Test
    void theParameterTableShowsLabelsWithTradeUnitsAndNoCodeNames() {
        String text = visibleText(FitReport.html(data, outcome, List.of()));
        List<String> codeNames = new ArrayList<>();
        Matcher m = CAMEL.matcher(text);
        while (m.find()) {
            codeNames.add(m.group());
        }
        assertThat(codeNames).as(text).isEmpty();
        assertThat(text).contains("σ (cm²)", "τ₂ (ps)", "τ_trap (ps)", "τ_rad (ns)")
                .doesNotContain("crossSectionCm2", "tauAuger2Ps");
    }

    @Test
    void theReportedReducedChiSquareIsMeasuredAgainstTheDataNoise() {
        String text = visibleText(FitReport.html(data, outcome, List.of()));
        Matcher m = Pattern.compile("reduced χ² ([0-9.eE+-]+) \\(noise from the point-to-point scatter of the residuals\\)")
                .matcher(text);
        assertThat(m.find()).as(text).isTrue();
        // white noise of 2e-4 fitted by the model that made it: near 1, where the unweighted mean square is ~4e-8
        assertThat(Double.parseDouble(m.group(1))).isBetween(0.7, 1.4);
        assertThat(outcome.result().reducedChiSquare()).isLessThan(1e-6);
        assertThat(text).doesNotContain("mean square residual");
    }

    @Test
    void anOutcomeBuiltWithoutAQualityStillReportsAReducedChiSquareAgainstTheNoise() {
        LadderFit.Outcome bare = new LadderFit.Outcome(outcome.result(), outcome.kind(), outcome.scaleKey(),
                outcome.excitation(), outcome.meanN(), outcome.curves(), outcome.diagnostics());
        assertThat(FitReport.quality(data, bare).reducedChiSquare()).isEqualTo(outcome.quality().reducedChiSquare());
        assertThat(visibleText(FitReport.html(data, bare, List.of()))).contains("reduced χ² ");
    }

    @Test
    void everyKeyALadderFitReportsHasALabel() {
        for (var e : outcome.result().estimates()) {
            if (e.shared()) {
                assertThat(ParameterNaming.labelled(e.key())).as(e.key()).isTrue();
            }
        }
        for (String key : List.of("occupancyPerJ", "occupancyScale", "timeZeroS", "irfFwhmS", "tauAuger3S", "tauRadS")) {
            assertThat(ParameterNaming.labelled(key)).as(key).isTrue();
        }
        assertThat(ParameterNaming.label("timeZeroS[2]").withUnit()).isEqualTo("time zero of trace 3 (ps)");
    }
}
