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
        window.tabbedPane("charts").selectTab(ChartsPanel.shortTitle("Photoluminescence per dot"));
        ChartView view = (ChartView) GuiActionRunner.execute(() -> ((javax.swing.JTabbedPane) window.tabbedPane("charts")
                .target()).getSelectedComponent());
        ChartSpec shown = GuiActionRunner.execute(view::spec);
        javax.swing.JComponent chartPanel = (javax.swing.JComponent) GuiActionRunner.execute(() -> view.getComponent(0));
        // the right click is real; the clicks into the menu and the modal chooser are made on the event thread,
        // because robot clicks on freshly shown popups and dialogs are sometimes lost under Xvfb (no window manager)
        javax.swing.JPopupMenu menu = (javax.swing.JPopupMenu) window.robot().showPopupMenu(chartPanel);
        javax.swing.JMenuItem csvItem = GuiActionRunner.execute(() -> java.util.Arrays.stream(menu.getComponents())
                .filter(c -> "export-chart:CSV".equals(c.getName())).map(c -> (javax.swing.JMenuItem) c)
                .findFirst().orElseThrow());
        // later, not now: the item opens a modal chooser, which would hold the event thread inside this call
        javax.swing.SwingUtilities.invokeLater(csvItem::doClick);
        JFileChooserFixture chooser = window.fileChooser();
        GuiActionRunner.execute(() -> {
            chooser.target().setSelectedFile(dir.resolve("pl-per-dot").toFile());
            chooser.target().approveSelection();
        });
        Path written = dir.resolve("pl-per-dot.csv");
        PlannerWindowTest.waitFor("the export", () -> Files.isRegularFile(written));
        assertThat(Files.readString(written)).isEqualTo(ChartCsv.of(shown));
        assertThat(shown.title()).isEqualTo("Photoluminescence per dot");
    }
}
