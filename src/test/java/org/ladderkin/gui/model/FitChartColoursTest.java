package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Paint;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartChecks;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.Charts;
import org.ladderkin.report.FitReport;

/**
 * The fit charts of the demo series (experiments-plan/fh-cdse-ta-series.csv over the CdSe demo plan's model): each
 * trace's markers, curve and residuals in one colour, in the JFreeChart the window draws and in the SVG of the fit
 * report; legends naming each trace with its ⟨N⟩; readable axes; ΔA in the report's convention.
 */
class FitChartColoursTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    static Dataset data;
    static LadderFit.Outcome outcome;

    @BeforeAll
    static void drawTheDemoSeriesOverThePlansModel() {
        FitData loaded = new FitData();
        assertThat(loaded.load(List.of(HOME.resolve("experiments-plan/fh-cdse-ta-series.csv")))).isEmpty();
        data = loaded.excited().orElseThrow();
        PlanInputs plan = PlanCodec.read(HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json"));
        outcome = new FitJobs().compute(new FitRequest(data, plan, FitOptions.initial().allHeld()), FitProgress.NONE).outcome();
        assertThat(outcome.result().ok()).isTrue();
    }

    static List<ChartSpec> specs() {
        return List.of(FitCharts.overlay(data, null, false), FitCharts.overlay(data, outcome, false),
                FitCharts.overlay(data, outcome, true), FitCharts.residuals(data, outcome, true));
    }

    @Test
    void everyFitChartIsReadableAndNamesEachTraceWithItsMeanN() {
        for (ChartSpec spec : specs()) {
            for (int[] size : new int[][] {{760, 420}, {520, 340}, {420, 260}}) {
                ChartChecks.assertReadableAxes(spec, size[0], size[1]);
            }
        }
        for (ChartSpec spec : specs().subList(1, 4)) {
            List<String> legend = ChartChecks.legend(spec);
            assertThat(legend).as(spec.title()).hasSize(data.size());
            for (int i = 0; i < data.size(); i++) {
                assertThat(legend.get(i)).isEqualTo(data.traces().get(i).label() + ", " + ChartSpec.meanN(outcome.meanN()[i]))
                        .contains("⟨N⟩").doesNotContain("<N>").doesNotContain("((N)");
            }
        }
        assertThat(specs().get(2).yLabel()).isEqualTo(ChartSpec.BLEACH_AXIS);
        // the demo's bleach is a negative ΔA in the file and positive on the axis, in mOD
        double firstFile = data.traces().get(3).signal()[0];
        assertThat(firstFile).isNegative();
        assertThat(specs().get(2).series().get(6).y()[0]).isEqualTo(-1e3 * firstFile);
    }

    @Test
    void eachTracesMarkersCurveAndResidualsShareOnePaintInTheBuiltCharts() {
        JFreeChart overlay = Charts.build(FitCharts.overlay(data, outcome, true));
        JFreeChart residuals = Charts.build(FitCharts.residuals(data, outcome, true));
        Set<Paint> seen = new HashSet<>();
        for (int i = 0; i < data.size(); i++) {
            Paint markers = paint(overlay, 2 * i);
            assertThat(shapesOnly(overlay, 2 * i)).as("trace %d drawn as markers", i).isTrue();
            assertThat(paint(overlay, 2 * i + 1)).as("trace %d curve", i).isEqualTo(markers);
            assertThat(paint(residuals, i)).as("trace %d residuals", i).isEqualTo(markers);
            assertThat(seen.add(markers)).as("trace %d has a colour of its own", i).isTrue();
        }
    }

    @Test
    void theFitReportsSvgDrawsEachTraceInOneColour() {
        String html = FitReport.html(data, outcome, List.of());
        List<ChartSpec> charts = FitReport.charts(data, outcome);
        Map<String, String> paints = svgPaints(html);
        String overlay = Charts.slug(charts.get(0).title());
        String residual = Charts.slug(charts.get(1).title());
        Set<String> colours = new HashSet<>();
        for (int i = 0; i < data.size(); i++) {
            List<String> layers = new ArrayList<>();
            int points = 0;
            for (Map.Entry<String, String> e : paints.entrySet()) {
                if (e.getKey().startsWith(overlay + "-s" + (2 * i) + "-p")) {
                    layers.add(e.getValue());
                    points++;
                }
            }
            assertThat(points).as("trace %d markers in the SVG", i).isGreaterThan(10);
            layers.add(paints.get(overlay + "-s" + (2 * i + 1) + "-line"));
            layers.add(paints.get(residual + "-s" + i + "-line"));
            assertThat(new HashSet<>(layers)).as("trace %d: markers, curve, residuals", i).hasSize(1).doesNotContainNull();
            assertThat(colours.add(layers.get(0))).as("trace %d has a colour of its own", i).isTrue();
        }
        assertThat(html).contains(data.traces().get(0).label() + ", ⟨N⟩ = ").doesNotContain("&lt;N&gt;");
    }

    private static Paint paint(JFreeChart chart, int specIndex) {
        XYPlot plot = chart.getXYPlot();
        return ((org.jfree.chart.renderer.AbstractRenderer) plot.getRenderer(0)).lookupSeriesPaint(specIndex);
    }

    private static boolean shapesOnly(JFreeChart chart, int specIndex) {
        var r = (org.jfree.chart.renderer.xy.XYLineAndShapeRenderer) chart.getXYPlot().getRenderer(0);
        return r.getSeriesShapesVisible(specIndex) && !r.getSeriesLinesVisible(specIndex);
    }

    private static final Pattern ELEMENT = Pattern.compile("<[a-z]+ id='(chart-[^']+)'[^>]*?style='([^']*)'");
    private static final Pattern PAINT = Pattern.compile("(?:fill|stroke): *(rgb\\([^)]*\\)|#[0-9a-fA-F]{6})");

    /** Element id → its fill or stroke colour, for every element a chart named. */
    static Map<String, String> svgPaints(String svg) {
        Map<String, String> out = new java.util.LinkedHashMap<>();
        Matcher m = ELEMENT.matcher(svg);
        while (m.find()) {
            Matcher p = PAINT.matcher(m.group(2));
            if (p.find()) {
                out.put(m.group(1), p.group(1));
            }
        }
        return out;
    }
}
