package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.swing.JCheckBox;
import javax.swing.JFrame;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.model.PlanEditor;
import org.ladderkin.gui.model.PlanForms;

/** The goals and model forms on a (virtual) display speak the user's words. Skipped without a display. */
class FormWordsWindowTest {

    @TempDir
    Path dir;
    PlanEditor editor;
    FieldFormPanel panel;
    FrameFixture window;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void showTheGoalsAndModelForms() throws Exception {
        Path plan = dir.resolve("demo.plan.json");
        Files.copy(PlannerWindowTest.DEMO, plan);
        JFrame frame = GuiActionRunner.execute(() -> {
            Theme.LIGHT.install();
            editor = new PlanEditor();
            editor.open(plan);
            JFrame f = new JFrame("goals and model");
            panel = new FieldFormPanel(editor, List.of(new FieldFormPanel.Section("", PlanForms.GOALS_AND_LIMITS),
                    new FieldFormPanel.Section("", PlanForms.MODEL)));
            // the planner window re-marks its forms on every edit; this bare panel is told the same way
            editor.addListener((change, path) -> panel.refreshProblems());
            f.setContentPane(panel);
            return f;
        });
        window = new FrameFixture(frame);
        window.show(new java.awt.Dimension(640, 900));
    }

    @AfterEach
    void close() {
        if (window != null) {
            window.cleanUp();
        }
    }

    @Test
    void goalBoxesShowWordsAndStillWriteTheKeys() {
        JCheckBox auger = window.checkBox("goals.measure=biexciton-auger").target();
        assertThat(GuiActionRunner.execute(auger::getText)).isEqualTo("Biexciton Auger lifetime τ2");
        assertThat(GuiActionRunner.execute(auger::isSelected)).isTrue();
        window.checkBox("goals.measure=gain-threshold").click();
        assertThat(GuiActionRunner.execute(() -> editor.document().at("/goals/measure").toString()))
                .isEqualTo("[\"biexciton-auger\",\"higher-auger\",\"cross-section\",\"single-exciton-lifetime\",\"gain-threshold\"]");
        window.checkBox("goals.measure=gain-threshold").click();
        assertThat(GuiActionRunner.execute(() -> editor.isDirty())).isFalse();
    }

    @Test
    void tooltipsCarryNoFileKeys() {
        String tip = GuiActionRunner.execute(() -> window.textBox("model.biexcitonLifetime").target().getToolTipText());
        assertThat(tip).isEqualTo("biexciton Auger lifetime; blank: Auger volume scaling of the material");
        window.textBox("model.biexcitonLifetime").enterText("-5 ps");
        PlannerWindowTest.waitFor("the field to be marked", () -> "error".equals(GuiActionRunner.execute(() ->
                window.textBox("model.biexcitonLifetime").target().getClientProperty("JComponent.outline"))));
        String marked = GuiActionRunner.execute(() -> window.textBox("model.biexcitonLifetime").target().getToolTipText());
        assertThat(marked).contains("must be &gt; 0, was -5 ps").doesNotContain("model.");
    }
}
