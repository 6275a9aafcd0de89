package org.ladderkin.gui.app;

import java.awt.GraphicsEnvironment;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import javax.swing.SwingUtilities;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.gui.model.RecoveryStore;
import org.ladderkin.gui.view.PlannerFrame;

/**
 * Starts the desktop planner: platform properties first, then everything Swing on the event thread (theme, window,
 * plan, recovery offer), and waits until the window is closed.
 */
public final class PlannerApp {

    private PlannerApp() {
    }

    /** Whether a window can be shown at all (false on a machine without a display). */
    public static boolean displayAvailable() {
        return !GraphicsEnvironment.isHeadless();
    }

    /**
     * Opens the planner on {@code plan} (null for a new plan) and blocks until its window is closed.
     *
     * @throws InterruptedException when the waiting thread is interrupted
     */
    public static void runUntilClosed(Path plan) throws InterruptedException {
        System.setProperty("awt.useSystemAAFontSettings", System.getProperty("awt.useSystemAAFontSettings", "on"));
        GuiPrefs prefs = GuiPrefs.user();
        CountDownLatch closed = new CountDownLatch(1);
        try {
            SwingUtilities.invokeAndWait(() -> {
                prefs.theme().install();
                PlannerFrame frame = new PlannerFrame(prefs, new RecoveryStore(RecoveryStore.defaultFolder()),
                        new PlannerPrediction());
                frame.addWindowListener(new WindowAdapter() {
                    @Override
                    public void windowClosed(WindowEvent e) {
                        closed.countDown();
                    }
                });
                if (plan != null) {
                    frame.openFile(plan);
                }
                frame.setVisible(true);
                frame.offerRecovery();
                frame.editor().lastValid().ifPresent(PlannerApp::warmUpInBackground);
            });
        } catch (InvocationTargetException e) {
            Throwable cause = e.getCause();
            throw cause instanceof RuntimeException r ? r : new IllegalStateException(cause);
        }
        closed.await();
    }

    /** Predictions computed after start-up so the compiler has done its work before the user's first edit. */
    private static final int WARM_UP_PREDICTIONS = 8;

    /**
     * Runs the planner's prediction a few times on a low-priority daemon thread: a cold JVM needs about a second for
     * the first prediction and a warm one a few tens of milliseconds, and the first edit should already feel warm.
     */
    private static void warmUpInBackground(org.ladderkin.plan.PlanInputs plan) {
        Thread t = new Thread(() -> {
            PlannerPrediction source = new PlannerPrediction();
            for (int i = 0; i < WARM_UP_PREDICTIONS && !Thread.currentThread().isInterrupted(); i++) {
                try {
                    source.predict(plan);
                } catch (RuntimeException e) {
                    return; // the window shows the real error when it computes the same plan
                }
            }
        }, "ladderkin-warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
    }
}
