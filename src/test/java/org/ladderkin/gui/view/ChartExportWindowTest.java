package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.fixture.JFileChooserFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.chart.ChartCsv;
import org.ladderkin.gui.chart.ChartView;
import org.ladderkin.report.ChartSpec;

/** A right click on any chart exports what it shows; skipped without a display. */
class ChartExportWindowTest {

    @TempDir
    Path dir;
    DemoPlannerWindow demo;
    FrameFixture window;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void open() throws Exception {
        demo = DemoPlannerWindow.open(dir, prefs -> prefs.lastDirectory(dir));
        window = demo.window;
    }

    @AfterEach
    void close() throws Exception {
        if (demo != null) {
            demo.close();
        }
    }

    @Test
    void rightClickOnAPredictionChartWritesItsPointsAsCsv() throws Exception {
        window.tabbedPane("charts").selectTab("Photoluminescence per dot");
        ChartView view = (ChartView) GuiActionRunner.execute(() -> ((javax.swing.JTabbedPane) window.tabbedPane("charts")
                .target()).getSelectedComponent());
        ChartSpec shown = GuiActionRunner.execute(view::spec);
        javax.swing.JComponent chartPanel = (javax.swing.JComponent) GuiActionRunner.execute(() -> view.getComponent(0));
        window.robot().showPopupMenu(chartPanel);
        window.menuItem("export-chart:CSV").click();
        JFileChooserFixture chooser = window.fileChooser();
        Path target = dir.resolve("pl-per-dot");
        chooser.fileNameTextBox().setText(target.toString());
        chooser.approve();
        Path written = dir.resolve("pl-per-dot.csv");
        PlannerWindowTest.waitFor("the export", () -> Files.isRegularFile(written));
        assertThat(Files.readString(written)).isEqualTo(ChartCsv.of(shown));
        assertThat(shown.title()).isEqualTo("Photoluminescence per dot");
    }
}
