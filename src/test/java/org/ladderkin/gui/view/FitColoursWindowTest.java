package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Color;
import java.awt.Component;
import java.awt.Container;
import java.awt.GraphicsEnvironment;
import java.awt.Paint;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.renderer.AbstractRenderer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.chart.ChartView;
import org.ladderkin.report.ChartSpec;

/**
 * The fit tab on a real (virtual) display with the demo series (experiments-plan/fh-cdse-ta-series.csv) over the
 * plan's model: each trace's markers, curve and residuals are drawn in one colour of its own, on screen, and the
 * legend names each trace with its ⟨N⟩. Skipped without a display (run with {@code scripts/test}).
 */
class FitColoursWindowTest {

    static final Path SERIES = Path.of(System.getProperty("ladderkin.home", ".")).resolve("experiments-plan/fh-cdse-ta-series.csv");

    @TempDir
    Path dir;
    DemoPlannerWindow demo;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @AfterEach
    void closeWindow() throws Exception {
        if (demo != null) {
            demo.close();
        }
    }

    @Test
    void eachTraceIsOneColourInMarkersCurveAndResiduals() throws Exception {
        demo = DemoPlannerWindow.open(dir, prefs -> { });
        PlannerFrame frame = demo.frame;
        demo.window.tabbedPane("centre").selectTab("Measured data & fit");
        GuiActionRunner.execute(() -> frame.fitPanel().loadFiles(List.of(SERIES)));
        FitViewWindowTest.waitFor("the plan's curves", () -> GuiActionRunner.execute(() -> frame.fitSession().preview().hasCurves()));
        FitViewWindowTest.waitFor("the curves on screen", () -> GuiActionRunner.execute(() -> views(frame.fitPanel()).stream()
                .anyMatch(v -> !v.spec().series().isEmpty() && v.spec().title().startsWith("Residuals"))));
        int traces = GuiActionRunner.execute(() -> frame.fitSession().data().traceCount());
        List<ChartView> shown = GuiActionRunner.execute(() -> views(frame.fitPanel()));
        ChartView overlay = shown.stream().filter(v -> v.spec().title().startsWith("Measured traces")).findFirst().orElseThrow();
        ChartView residuals = shown.stream().filter(v -> v.spec().title().startsWith("Residuals")).findFirst().orElseThrow();
        ChartSpec overlaySpec = GuiActionRunner.execute(overlay::spec);
        assertThat(overlaySpec.series()).hasSize(2 * traces);

        JFreeChart overlayChart = GuiActionRunner.execute(() -> ((ChartPanel) overlay.getComponent(0)).getChart());
        JFreeChart residualChart = GuiActionRunner.execute(() -> ((ChartPanel) residuals.getComponent(0)).getChart());
        BufferedImage overlayPixels = GuiActionRunner.execute(() -> snapshot(overlay));
        BufferedImage residualPixels = GuiActionRunner.execute(() -> snapshot(residuals));
        Set<Paint> own = new HashSet<>();
        for (int i = 0; i < traces; i++) {
            Paint markers = paint(overlayChart, 2 * i);
            assertThat(paint(overlayChart, 2 * i + 1)).as("trace %d: curve as its markers", i).isEqualTo(markers);
            assertThat(paint(residualChart, i)).as("trace %d: residuals as its markers", i).isEqualTo(markers);
            assertThat(own.add(markers)).as("trace %d has a colour of its own", i).isTrue();
            Color c = (Color) markers;
            // drawn, not only configured: the colour is on screen in both panes
            assertThat(pixelsNear(overlayPixels, c)).as("trace %d colour in the data pane", i).isGreaterThan(30);
            assertThat(pixelsNear(residualPixels, c)).as("trace %d colour in the residual pane", i).isGreaterThan(30);
            String legend = overlayChart.getXYPlot().getLegendItems().get(i).getLabel();
            assertThat(legend).startsWith(overlaySpec.series().get(2 * i).name()).contains(", ⟨N⟩ = ");
        }
    }

    private static Paint paint(JFreeChart chart, int series) {
        return ((AbstractRenderer) chart.getXYPlot().getRenderer(0)).lookupSeriesPaint(series);
    }

    private static List<ChartView> views(Container root) {
        List<ChartView> out = new ArrayList<>();
        for (Component c : root.getComponents()) {
            if (c instanceof ChartView v) {
                out.add(v);
            } else if (c instanceof Container k) {
                out.addAll(views(k));
            }
        }
        return out;
    }

    private static BufferedImage snapshot(Component c) {
        BufferedImage image = new BufferedImage(Math.max(1, c.getWidth()), Math.max(1, c.getHeight()), BufferedImage.TYPE_INT_RGB);
        var g = image.createGraphics();
        c.paint(g);
        g.dispose();
        return image;
    }

    /** Pixels within a few levels of {@code c} in each channel (antialiased edges aside, markers are solid). */
    private static int pixelsNear(BufferedImage image, Color c) {
        int n = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                if (Math.abs(((rgb >> 16) & 0xff) - c.getRed()) <= 6 && Math.abs(((rgb >> 8) & 0xff) - c.getGreen()) <= 6
                        && Math.abs((rgb & 0xff) - c.getBlue()) <= 6) {
                    n++;
                }
            }
        }
        return n;
    }
}
