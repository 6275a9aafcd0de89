package org.ladderkin.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jfree.chart.JFreeChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.Planner;

/**
 * The chart rules of issue 22 on every chart of both demo plans and on made-up extremes: log ticks at 1–2–5 × 10^k
 * only, one number format per axis, ⟨N⟩ in legends, distinguishable colours, ΔA in one stated convention, P(N) as
 * bars, A and B apart from their ratio.
 */
class ChartsTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    /** The sizes the charts are drawn at: report, fit report, window export default, a small window pane. */
    static final int[][] SIZES = {{520, 340}, {760, 420}, {900, 560}, {420, 260}};

    private static CampaignPlan demo(String file) {
        return Planner.plan(PlanCodec.read(HOME.resolve("experiments-plan").resolve(file)), Planner.Progress.NONE, false);
    }

    @ParameterizedTest
    @ValueSource(strings = {"cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json"})
    void everyPlanChartOfTheDemosIsReadable(String file) {
        List<ChartSpec> charts = PlanReport.charts(demo(file));
        assertThat(charts).extracting(ChartSpec::title).containsExactly("Band-edge bleach (steady state)",
                "Photoluminescence per dot", "Early and late bleach", "Early/late ratio", "Excitons per dot after a pulse",
                "Pulse-train build-up (highest fluence)");
        for (ChartSpec spec : charts) {
            for (int[] size : SIZES) {
                ChartChecks.assertReadableAxes(spec, size[0], size[1]);
            }
            String text = spec.title() + spec.xLabel() + spec.yLabel() + String.join("", ChartChecks.legend(spec));
            assertThat(text).as(spec.title()).doesNotContain("<N>").doesNotContain("((N)");
        }
        for (ChartSpec fluenceSeries : List.of(charts.get(0), charts.get(1), charts.get(4))) {
            assertThat(ChartChecks.legend(fluenceSeries)).as(fluenceSeries.title()).isNotEmpty()
                    .allMatch(l -> l.matches("⟨N⟩ = [0-9.]+"));
            assertThat(fluenceSeries.palette()).isEqualTo(ChartSpec.Palette.SEQUENTIAL);
        }
        assertThat(charts.get(0).yLabel()).isEqualTo("−ΔA (bleach, mOD)");
        assertThat(charts.get(2).series()).extracting(ChartSpec.Series::name).containsExactly("early A", "late B");
        assertThat(charts.get(3).series()).extracting(ChartSpec.Series::name).containsExactly("A/B");
        assertThat(charts.get(4).series()).allMatch(s -> s.style() == ChartSpec.Style.BARS);
    }

    @Test
    void theBleachChartShowsTheBleachPositiveInMilliOd() {
        CampaignPlan plan = demo("cdse-auger-1khz.plan.json");
        ChartSpec bleach = PlanReport.charts(plan).get(0);
        double[] deltaAOd = plan.predictions().deltaAOd().get(plan.fluences().size() - 1);
        double[] shown = bleach.series().get(plan.fluences().size() - 1).y();
        int peak = 0;
        for (int i = 0; i < deltaAOd.length; i++) {
            peak = deltaAOd[i] < deltaAOd[peak] ? i : peak;
        }
        assertThat(deltaAOd[peak]).as("a bleach is a negative ΔA").isNegative();
        assertThat(shown[peak]).isEqualTo(-1e3 * deltaAOd[peak]);
    }

    @Test
    void fluenceSeriesAreColouredInOrderOfMeanN() {
        CampaignPlan plan = demo("cdse-auger-1khz.plan.json");
        ChartSpec bleach = PlanReport.charts(plan).get(0);
        double[] n = plan.fluences().stream().mapToDouble(f -> f.nProbeAveraged()).toArray();
        int[] colour = bleach.colourIndices();
        for (int i = 0; i < n.length; i++) {
            for (int j = 0; j < n.length; j++) {
                if (n[i] < n[j]) {
                    assertThat(colour[i]).as("⟨N⟩ %s before %s", n[i], n[j]).isLessThan(colour[j]);
                }
            }
        }
    }

    @Test
    void wideAndTinyRangesKeepOneFormatPerAxis() {
        double[] x = {0.3, 1, 10, 100, 3000};
        // a PL-like axis over six decades, a residual axis of 1e-5, a delay axis under one decade
        ChartSpec wide = new ChartSpec("wide", "delay (ps)", "rate", true, true, List.of(ChartSpec.Series.line("a", x,
                new double[] {3e8, 1e7, 2e5, 1e4, 150})));
        ChartSpec tiny = new ChartSpec("tiny", "delay (ps)", "residual", true, false, List.of(ChartSpec.Series.line("a", x,
                new double[] {-2e-5, 1e-5, 0, 3e-5, -1e-5})));
        ChartSpec narrow = new ChartSpec("narrow", "delay (ps)", "signal", true, false, List.of(ChartSpec.Series.line("a",
                new double[] {3.1, 3.5, 4.2}, new double[] {1, 2, 3})));
        ChartSpec large = new ChartSpec("large", "pulses", "photons", false, false, List.of(ChartSpec.Series.line("a",
                new double[] {0, 1, 2}, new double[] {1.2e6, 1.5e6, 2.3e6})));
        for (ChartSpec s : List.of(wide, tiny, narrow, large)) {
            for (int[] size : SIZES) {
                ChartChecks.assertReadableAxes(s, size[0], size[1]);
            }
        }
        JFreeChart w = Charts.build(wide);
        assertThat(ChartChecks.ticks(w, false, 520, 340)).extracting(ChartChecks.Tick::label).contains("10⁴", "10⁶", "10⁸")
                .noneMatch(l -> l.contains("E") || l.contains("e"));
        assertThat(ChartChecks.ticks(Charts.build(tiny), false, 520, 340)).extracting(ChartChecks.Tick::label)
                .contains("0").allMatch(l -> l.equals("0") || l.contains("×10⁻"));
        assertThat(ChartChecks.ticks(Charts.build(narrow), true, 520, 340)).extracting(ChartChecks.Tick::label)
                .containsExactly("2", "5");
    }

    @ParameterizedTest
    @EnumSource(ChartSpec.Palette.class)
    void twelveSeriesGetClearlyDifferentColours(ChartSpec.Palette palette) {
        for (int count = 2; count <= 12; count++) {
            List<Color> colours = new ArrayList<>();
            for (int i = 0; i < count; i++) {
                colours.add(Charts.colour(palette, i, count));
            }
            for (int i = 0; i < count; i++) {
                // ΔE*ab 15: two colours of a legend told apart at a glance; 40 from the white report background
                assertThat(ChartColours.distance(colours.get(i), Color.WHITE)).as("%s %d of %d on white", palette, i, count)
                        .isGreaterThan(40);
                for (int j = i + 1; j < count; j++) {
                    assertThat(ChartColours.distance(colours.get(i), colours.get(j))).as("%s %d and %d of %d", palette, i, j, count)
                            .isGreaterThan(15);
                }
            }
        }
    }

    @Test
    void colourDistanceIsTheCie1976DifferenceOfLabValues() {
        // sRGB white is L* = 100, a* = b* = 0 and black L* = 0 (closed form of the D65 conversion)
        assertThat(ChartColours.lab(Color.WHITE)[0]).isCloseTo(100, org.assertj.core.data.Offset.offset(0.01));
        assertThat(ChartColours.distance(Color.BLACK, Color.WHITE)).isCloseTo(100, org.assertj.core.data.Offset.offset(0.01));
    }

    @Test
    void aTraceItsCurveAndItsResidualsShareOneColourInTheSvg() {
        double[] x = {1, 10, 100};
        ChartSpec data = new ChartSpec("Data", "delay (ps)", "signal", true, false, List.of(
                ChartSpec.Series.points("F1", x, new double[] {3, 2, 1}).colour(1),
                ChartSpec.Series.line("F1 (fit)", x, new double[] {3, 2, 1}).colour(1).unlisted(),
                ChartSpec.Series.points("F2", x, new double[] {6, 4, 2}).colour(0),
                ChartSpec.Series.line("F2 (fit)", x, new double[] {6, 4, 2}).colour(0).unlisted()), ChartSpec.Palette.SEQUENTIAL);
        Map<String, String> paints = svgPaints(Charts.svg(data, 520, 340));
        assertThat(paints.get("chart-data-s0-p0")).isEqualTo(paints.get("chart-data-s1-line")).isEqualTo(paints.get("chart-data-s0-p2"));
        assertThat(paints.get("chart-data-s2-p1")).isEqualTo(paints.get("chart-data-s3-line"));
        assertThat(paints.get("chart-data-s0-p0")).isNotEqualTo(paints.get("chart-data-s2-p0"));
        assertThat(ChartChecks.legend(data)).containsExactly("F1", "F2");
    }

    private static final Pattern ELEMENT = Pattern.compile("<[a-z]+ id='(chart-[^']+)'[^>]*?style='([^']*)'");
    private static final Pattern PAINT = Pattern.compile("(?:fill|stroke): *(rgb\\([^)]*\\)|#[0-9a-fA-F]{6})");

    /** Element id → the fill or stroke colour in its style, for every element a chart named. */
    public static Map<String, String> svgPaints(String svg) {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        Matcher m = ELEMENT.matcher(svg);
        while (m.find()) {
            Matcher p = PAINT.matcher(m.group(2));
            while (p.find()) {
                if (!p.group(1).equals("none")) {
                    out.put(m.group(1), p.group(1));
                }
            }
        }
        return out;
    }
}
