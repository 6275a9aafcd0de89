package org.ladderkin.gui.app;

import java.awt.GraphicsEnvironment;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
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
        RecoveryStore recovery = new RecoveryStore(RecoveryStore.defaultFolder());
        PlannerPrediction source = new PlannerPrediction();
        // the planner runs until its last window is closed: recovered plans may open windows of their own
        AtomicInteger open = new AtomicInteger();
        Consumer<PlannerFrame> track = frame -> {
            open.incrementAndGet();
            frame.addWindowListener(new WindowAdapter() {
                @Override
                public void windowClosed(WindowEvent e) {
                    if (open.decrementAndGet() == 0) {
                        closed.countDown();
                    }
                }
            });
        };
        try {
            SwingUtilities.invokeAndWait(() -> {
                prefs.theme().install();
                PlannerFrame frame = new PlannerFrame(prefs, recovery, source);
                track.accept(frame);
                frame.setWindowOpener(r -> openRecovered(prefs, recovery, source, track, r));
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

    /** A window of its own for a recovered plan that the first window did not take. */
    private static void openRecovered(GuiPrefs prefs, RecoveryStore recovery, PlannerPrediction source,
                                      Consumer<PlannerFrame> track, RecoveryStore.Recovered r) {
        PlannerFrame frame = new PlannerFrame(prefs, recovery, source);
        track.accept(frame);
        frame.setWindowOpener(next -> openRecovered(prefs, recovery, source, track, next));
        try {
            frame.restore(r);
        } catch (IOException e) {
            // the plan is restored all the same; only its copy stays unowned and is offered again next time
        }
        frame.setVisible(true);
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
