package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.awt.Window;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.UUID;
import java.util.prefs.Preferences;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.app.GuiPrefs;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.model.FieldSpec;
import org.ladderkin.gui.model.PlanForms;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.gui.model.RecoveryStore;

/**
 * Two planner windows with unsaved edits go away without the unsaved-changes question (as in a crash); the next start
 * offers both edits back, one in the new window and one in a window of its own. Skipped without a display.
 */
class RecoveryWindowTest {

    static final FieldSpec TITLE = PlanForms.SAMPLE.get(0);

    @TempDir
    Path dir;
    Preferences node;
    GuiPrefs prefs;
    RecoveryStore store;
    final List<PlannerFrame> frames = new ArrayList<>();

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void prefsOfItsOwn() {
        node = Preferences.userRoot().node("org/ladderkin/gui-test/" + UUID.randomUUID());
        prefs = new GuiPrefs(node);
        store = new RecoveryStore(dir.resolve("recovery"));
    }

    @AfterEach
    void closeEverything() throws Exception {
        GuiActionRunner.execute(() -> {
            for (Window w : Window.getWindows()) {
                if (w instanceof PlannerFrame || w instanceof JDialog) {
                    w.dispose();
                }
            }
        });
        node.removeNode();
    }

    @Test
    void twoWindowsKilledWithEditsAreBothOfferedAtTheNextStart() throws Exception {
        // untitled plans: they never read as valid, so no window starts a prediction on the shared cores
        PlannerFrame first = window();
        PlannerFrame second = window();
        GuiActionRunner.execute(() -> {
            first.editor().edit(TITLE, "first window's campaign");
            second.editor().edit(TITLE, "second window's campaign");
            first.autosaveNow();
            second.autosaveNow();
        });
        assertThat(store.readAll()).as("living windows' copies are not offered").isEmpty();

        // the crash: both windows go without quit(), so nobody asks and nobody removes a copy
        GuiActionRunner.execute(() -> {
            first.dispose();
            second.dispose();
        });
        frames.clear();
        assertThat(copies()).hasSize(2);

        PlannerFrame next = window();
        SwingUtilities.invokeLater(next::offerRecovery);
        List<String> questions = new ArrayList<>();
        questions.add(answerYes());
        questions.add(answerYes());
        assertThat(questions).allSatisfy(q -> assertThat(q).contains("an untitled plan"));

        PlannerWindowTest.waitFor("both plans restored", () -> titles().size() == 2);
        assertThat(titles()).containsExactlyInAnyOrder("first window's campaign", "second window's campaign");
        assertThat(GuiActionRunner.execute(() -> next.editor().text(TITLE))).isEqualTo("first window's campaign");
        assertThat(GuiActionRunner.execute(() -> next.editor().isDirty())).isTrue();
        assertThat(store.readAll()).as("each copy now held by the window that restored it").isEmpty();
        assertThat(copies()).as("kept until saved or discarded").hasSize(2);

        // saving removes that window's copy
        Path saved = dir.resolve("first.plan.json");
        GuiActionRunner.execute(() -> {
            next.editor().saveAs(saved);
            next.autosaveNow();
            return null;
        });
        assertThat(copies()).hasSize(1);
    }

    private PlannerFrame window() {
        PlannerFrame f = GuiActionRunner.execute(() -> {
            Theme.LIGHT.install();
            PlannerFrame frame = new PlannerFrame(prefs, store, new PlannerPrediction());
            frame.setVisible(true);
            return frame;
        });
        frames.add(f);
        return f;
    }

    /** Presses "Yes" on the next recovery question and returns its text. */
    private String answerYes() {
        PlannerWindowTest.waitFor("a recovery question", () -> question() != null);
        return GuiActionRunner.execute(() -> {
            JOptionPane pane = question();
            String text = String.valueOf(pane.getMessage());
            JButton yes = buttons(pane).stream().filter(b -> "Yes".equals(b.getText())).findFirst().orElseThrow();
            yes.doClick();
            return text;
        });
    }

    private static JOptionPane question() {
        return GuiActionRunner.execute(() -> Arrays.stream(Window.getWindows())
                .filter(w -> w instanceof JDialog d && d.isShowing() && "Restore unsaved changes".equals(d.getTitle()))
                .map(w -> find(((JDialog) w).getContentPane(), JOptionPane.class))
                .filter(p -> p != null).findFirst().orElse(null));
    }

    private static List<String> titles() {
        return GuiActionRunner.execute(() -> Arrays.stream(Window.getWindows())
                .filter(w -> w instanceof PlannerFrame f && f.isDisplayable() && f.editor().isDirty())
                .map(w -> ((PlannerFrame) w).editor().text(TITLE)).toList());
    }

    private List<Path> copies() throws Exception {
        try (var files = Files.list(dir.resolve("recovery"))) {
            return files.filter(p -> p.toString().endsWith(".json")).toList();
        }
    }

    private static List<JButton> buttons(java.awt.Container c) {
        List<JButton> out = new ArrayList<>();
        for (java.awt.Component x : c.getComponents()) {
            if (x instanceof JButton b) {
                out.add(b);
            } else if (x instanceof java.awt.Container k) {
                out.addAll(buttons(k));
            }
        }
        return out;
    }

    private static <T> T find(java.awt.Container c, Class<T> type) {
        for (java.awt.Component x : c.getComponents()) {
            if (type.isInstance(x)) {
                return type.cast(x);
            }
            if (x instanceof java.awt.Container k) {
                T t = find(k, type);
                if (t != null) {
                    return t;
                }
            }
        }
        return null;
    }
}
