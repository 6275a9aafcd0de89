package org.ladderkin.gui.view;

import java.awt.Dimension;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.UUID;
import java.util.function.Consumer;
import java.util.prefs.BackingStoreException;
import java.util.prefs.Preferences;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.ladderkin.gui.app.GuiPrefs;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.gui.model.RecoveryStore;

/**
 * For window tests: the planner, light theme, on a copy of the demo plan in {@code dir}, with preferences of its own,
 * shown at 1360×860 once its first prediction has arrived. Closing disposes of the window and the preferences.
 */
final class DemoPlannerWindow implements AutoCloseable {

    final Path plan;
    final Preferences node;
    final GuiPrefs prefs;
    final PlannerFrame frame;
    final FrameFixture window;

    private DemoPlannerWindow(Path plan, Preferences node, GuiPrefs prefs, PlannerFrame frame, FrameFixture window) {
        this.plan = plan;
        this.node = node;
        this.prefs = prefs;
        this.frame = frame;
        this.window = window;
    }

    /** Opens the window; {@code setUp} may adjust the preferences before the window reads them. */
    static DemoPlannerWindow open(Path dir, Consumer<GuiPrefs> setUp) throws Exception {
        Path plan = dir.resolve("demo.plan.json");
        Files.copy(PlannerWindowTest.DEMO, plan);
        Preferences node = Preferences.userRoot().node("org/ladderkin/gui-test/" + UUID.randomUUID());
        GuiPrefs prefs = new GuiPrefs(node);
        setUp.accept(prefs);
        PlannerFrame frame = GuiActionRunner.execute(() -> {
            Theme.LIGHT.install();
            PlannerFrame f = new PlannerFrame(prefs, new RecoveryStore(dir.resolve("recovery")), new PlannerPrediction());
            f.openFile(plan);
            return f;
        });
        FrameFixture window = new FrameFixture(frame);
        try {
            window.show(new Dimension(1360, 860));
            // generous: a design search of the previous window may still hold the shared cores for a few seconds
            PlannerWindowTest.waitFor("first prediction", () -> frame.deliveredCount() >= 1, 60_000);
        } catch (RuntimeException | Error e) {
            // the fixture holds the robot's screen lock: release it, or every later window test waits for it forever
            window.cleanUp();
            node.removeNode();
            throw e;
        }
        return new DemoPlannerWindow(plan, node, prefs, frame, window);
    }

    @Override
    public void close() throws BackingStoreException {
        window.cleanUp();
        node.removeNode();
    }
}
