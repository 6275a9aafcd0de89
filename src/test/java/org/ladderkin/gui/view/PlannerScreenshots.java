package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.UUID;
import java.util.prefs.Preferences;
import javax.imageio.ImageIO;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.ladderkin.gui.app.GuiPrefs;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.gui.model.RecoveryStore;
import org.ladderkin.io.AtomicFiles;

/**
 * Screenshots of the main views on the demo plan, light and dark, for the documentation. Always written to
 * target/screenshots; {@code scripts/screenshots} also writes them to docs/screenshots (property
 * {@code ladderkin.screenshots.dir}). Needs a display (Xvfb).
 */
class PlannerScreenshots {

    @TempDir
    Path dir;

    @ParameterizedTest
    @EnumSource(Theme.class)
    void mainViews(Theme theme) throws Exception {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run");
        Preferences node = Preferences.userRoot().node("org/ladderkin/gui-test/" + UUID.randomUUID());
        FrameFixture window = null;
        try {
            GuiPrefs prefs = new GuiPrefs(node);
            PlannerFrame frame = GuiActionRunner.execute(() -> {
                theme.install();
                PlannerFrame f = new PlannerFrame(prefs, new RecoveryStore(dir), new PlannerPrediction());
                f.openFile(PlannerWindowTest.DEMO);
                return f;
            });
            FrameFixture w = new FrameFixture(frame);
            window = w;
            window.show(new Dimension(1360, 860));
            PlannerWindowTest.waitFor("first prediction", () -> frame.deliveredCount() >= 1);
            // as the planner does after start-up: warm the compiler, so the status bar shows an edit's usual timing
            PlannerPrediction warm = new PlannerPrediction();
            for (int i = 0; i < 8; i++) {
                warm.predict(GuiActionRunner.execute(() -> frame.editor().lastValid().orElseThrow()));
            }
            window.tabbedPane("forms").selectTab("Laser");
            window.textBox("laser.pulseEnergyRange[1]").deleteText().enterText("1.5 uJ");
            PlannerWindowTest.waitFor("the edit's prediction", () -> frame.deliveredCount() >= 2);
            long delivered = GuiActionRunner.execute(() -> frame.deliveredCount());
            GuiActionRunner.execute(() -> frame.editor().undo());
            PlannerWindowTest.waitFor("the undo's prediction", () -> frame.deliveredCount() > delivered);
            String suffix = theme.name().toLowerCase(java.util.Locale.ROOT);

            window.tabbedPane("forms").selectTab("Laser");
            save(PlannerWindowTest.screenshot(frame, "planner-laser-" + suffix + ".png"));

            window.tabbedPane("forms").selectTab("Instruments");
            window.tabbedPane("charts").selectTab("Early/late");
            save(PlannerWindowTest.screenshot(frame, "planner-instruments-" + suffix + ".png"));

            window.tabbedPane("forms").selectTab("Sample");
            window.textBox("sample.pathLength").deleteText().enterText("1 mn");
            PlannerWindowTest.waitFor("the field to be marked", () -> "error".equals(
                    w.textBox("sample.pathLength").target().getClientProperty("JComponent.outline")));
            window.tabbedPane("lower").selectTab("Derived numbers");
            save(PlannerWindowTest.screenshot(frame, "planner-invalid-field-" + suffix + ".png"));
            GuiActionRunner.execute(() -> frame.editor().undo());

            // the fit tab with the demo series fitted
            window.tabbedPane("centre").selectTab("Measured data & fit");
            GuiActionRunner.execute(() -> frame.fitPanel().loadFiles(java.util.List.of(
                    PlannerWindowTest.HOME.resolve("experiments-plan/fh-cdse-ta-series.csv"))));
            GuiActionRunner.execute(() -> frame.fitPanel().runFit());
            FitViewWindowTest.waitFor("the fit", () -> GuiActionRunner.execute(() -> frame.fitSession().fit().state())
                    == org.ladderkin.gui.model.FitRun.RunState.DONE);
            save(PlannerWindowTest.screenshot(frame, "planner-fit-" + suffix + ".png"));
        } finally {
            if (window != null) {
                window.cleanUp();
            }
            node.removeNode();
        }
    }

    private static void save(Path shot) throws Exception {
        assertThat(ImageIO.read(shot.toFile()).getWidth()).isGreaterThan(1000);
        String target = System.getProperty("ladderkin.screenshots.dir");
        if (target != null && !target.isBlank()) {
            Path dir = Files.createDirectories(Path.of(target));
            AtomicFiles.write(dir.resolve(shot.getFileName()), out -> Files.copy(shot, out));
        }
    }
}
