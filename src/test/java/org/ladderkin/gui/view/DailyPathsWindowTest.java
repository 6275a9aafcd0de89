package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;
import static org.ladderkin.gui.view.PlannerWindowTest.waitFor;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.GraphicsEnvironment;
import java.awt.KeyboardFocusManager;
import java.awt.Rectangle;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.observe.Verdict;

/**
 * Daily paths of the planner window on a (virtual) display: results of a plan left behind are cleared or marked
 * stale, invalid fields are found from their tab and jumped to, every tab and form fits the window at the default
 * size and at 1024×700, and the status bar counts failing risks. Skipped without a display.
 */
class DailyPathsWindowTest {

    @TempDir
    Path dir;
    DemoPlannerWindow demo;
    PlannerFrame frame;
    FrameFixture window;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void openTheDemoPlan() throws Exception {
        demo = DemoPlannerWindow.open(dir, p -> { });
        frame = demo.frame;
        window = demo.window;
    }

    @AfterEach
    void closeWindow() throws Exception {
        if (demo != null) {
            demo.close();
        }
    }

    @Test
    void newClearsThePreviousPlansResults() {
        assertThat(chartCount()).isPositive();
        assertThat(window.table("risks").rowCount()).isPositive();
        assertThat(cautions()).hasSizeGreaterThan(1);

        window.menuItemWithPath("File", "New").click();

        waitFor("the new, blank plan", () -> GuiActionRunner.execute(() -> frame.getTitle()).startsWith("untitled"));
        assertThat(chartCount()).isZero();
        window.table("risks").requireRowCount(0);
        assertThat(GuiActionRunner.execute(() -> frame.prediction())).isNull();
        assertThat(cautions()).containsExactly(org.ladderkin.report.Cautions.LASER);
        // nothing is left to wash out; the note says why the centre is empty
        assertThat(GuiActionRunner.execute(() -> frame.resultsStale())).isFalse();
        window.label("prediction:stale").requireVisible();
        assertThat(window.label("prediction:stale").text()).contains("no results yet").contains("the plan has errors");
        window.menuItem("export:CSV").requireDisabled();
    }

    @Test
    void openingAPlanWithAnErrorMarksTheResultsStaleMarksTheTabAndFocusesTheField() throws Exception {
        String shownRisks = GuiActionRunner.execute(() -> frame.prediction().risks().toString());
        Path bad = dir.resolve("bad.plan.json");
        Files.writeString(bad, Files.readString(demo.plan).replace("\"repetitionRate\": \"1 kHz\"",
                "\"repetitionRate\": \"1 kH\""));
        assertThat(Files.readString(bad)).contains("1 kH\"");

        GuiActionRunner.execute(() -> frame.openFile(bad));

        waitFor("the stale mark", () -> GuiActionRunner.execute(() -> frame.resultsStale()));
        // the previous plan's results stay readable under the new title, washed out and labelled
        assertThat(GuiActionRunner.execute(() -> frame.getTitle())).startsWith("bad.plan.json");
        assertThat(chartCount()).isPositive();
        assertThat(GuiActionRunner.execute(() -> frame.prediction().risks().toString())).isEqualTo(shownRisks);
        window.label("prediction:stale").requireVisible();
        assertThat(window.label("prediction:stale").text()).isEqualTo(
                "⚠ stale — from the previous plan; this plan has errors");
        assertThat(GuiActionRunner.execute(() -> window.panel("cautions").target() instanceof CautionBar c && c.stale()))
                .isTrue();

        JTabbedPane forms = window.tabbedPane("forms").target();
        List<String> marked = GuiActionRunner.execute(() -> markedTabs(forms));
        assertThat(marked).containsExactly("Laser");
        assertThat(GuiActionRunner.execute(() -> forms.getToolTipTextAt(forms.indexOfTab("Laser"))))
                .contains("holds a field with a problem");
        Component field = window.textBox("laser.repetitionRate").target();
        waitFor("the cursor in the invalid field", () -> GuiActionRunner.execute(() -> focusOwner() == field));
        assertThat(GuiActionRunner.execute(() -> forms.getTitleAt(forms.getSelectedIndex()))).isEqualTo("Laser");

        // from elsewhere, the menu action finds the field again
        GuiActionRunner.execute(() -> forms.setSelectedIndex(forms.indexOfTab("Sample")));
        waitFor("the sample form in front", () -> GuiActionRunner.execute(() -> !field.isShowing()));
        window.menuItem("menu:first-problem").click();
        waitFor("the cursor back in the invalid field", () -> GuiActionRunner.execute(() -> focusOwner() == field));

        // repaired, the plan gets its own prediction and the marks go
        window.textBox("laser.repetitionRate").deleteText().enterText("1 kHz");
        waitFor("fresh results", () -> GuiActionRunner.execute(() -> !frame.resultsStale()
                && !staleNote().isVisible()), 60_000);
        assertThat(GuiActionRunner.execute(() -> markedTabs(forms))).isEmpty();
        assertThat(GuiActionRunner.execute(() -> window.panel("cautions").target() instanceof CautionBar c && c.stale()))
                .isFalse();
    }

    @Test
    void anEditThatBreaksThePlanWashesOutItsResults() {
        JTabbedPane forms = window.tabbedPane("forms").target();
        GuiActionRunner.execute(() -> forms.setSelectedIndex(forms.indexOfTab("Goals")));
        window.textBox("limits.beamTime").deleteText().enterText("8 parsecs");
        waitFor("the stale mark", () -> GuiActionRunner.execute(() -> frame.resultsStale()));
        assertThat(window.label("prediction:stale").text()).isEqualTo(
                "⚠ stale — plan has errors; showing its last valid version");
        assertThat(GuiActionRunner.execute(() -> markedTabs(forms))).containsExactly("Goals");
        window.textBox("limits.beamTime").deleteText().enterText("8 h");
        waitFor("the mark to go", () -> GuiActionRunner.execute(() -> !frame.resultsStale()));
        assertThat(GuiActionRunner.execute(() -> markedTabs(forms))).isEmpty();
    }

    @Test
    void everyTabAndFormFitsAtTheDefaultSizeAndAt1024By700() {
        GuiActionRunner.execute(() -> {
            frame.setSize(frame.getWidth(), frame.getHeight());
        });
        assertEverythingFits("1360×860 (the default size)");
        window.resizeTo(new Dimension(1024, 700));
        waitFor("the smaller window", () -> GuiActionRunner.execute(() -> frame.getWidth() == 1024
                && frame.getHeight() == 700));
        assertEverythingFits("1024×700");
        // the widest numbers: an 80 MHz edit predicts a rise of thousands of kelvin
        JTabbedPane forms = window.tabbedPane("forms").target();
        GuiActionRunner.execute(() -> forms.setSelectedIndex(forms.indexOfTab("Laser")));
        window.textBox("laser.repetitionRate").deleteText().enterText("80 MHz");
        waitFor("the 80 MHz risks", () -> GuiActionRunner.execute(() -> frame.prediction().risks().stream()
                .anyMatch(r -> r.verdict() == Verdict.FAIL)), 60_000);
        assertEverythingFits("1024×700 with failing risks");
    }

    @Test
    void theStatusBarCountsFailingRisksOfAReadablePlan() {
        JTabbedPane forms = window.tabbedPane("forms").target();
        GuiActionRunner.execute(() -> forms.setSelectedIndex(forms.indexOfTab("Laser")));
        window.textBox("laser.repetitionRate").deleteText().enterText("80 MHz");
        waitFor("the 80 MHz prediction", () -> GuiActionRunner.execute(() -> frame.prediction().risks().stream()
                .anyMatch(r -> r.verdict() == Verdict.FAIL)), 60_000);
        long fail = GuiActionRunner.execute(() -> frame.prediction().risks().stream()
                .filter(r -> r.verdict() == Verdict.FAIL).count());
        long warn = GuiActionRunner.execute(() -> frame.prediction().risks().stream()
                .filter(r -> r.verdict() == Verdict.WARN).count());
        String expected = "plan readable — " + fail + (fail == 1 ? " risk fails" : " risks fail")
                + (warn == 0 ? "" : ", " + warn + (warn == 1 ? " warns" : " warn"));
        waitFor("the count in the status bar", () -> window.label("status:plan").text().equals(expected));
        System.out.println("planner status at 80 MHz: " + expected);
        assertThat(window.label("status:plan").text()).doesNotContain("valid");
    }

    @Test
    void derivedValuesAreThePlaceholdersOfTheEmptyFieldsTheyFill() {
        String sigma = GuiActionRunner.execute(() -> frame.prediction().derived().stream()
                .filter(d -> d.label().contains("σ") && d.label().contains("pump")).findFirst().orElseThrow().value());
        JTabbedPane forms = window.tabbedPane("forms").target();
        GuiActionRunner.execute(() -> forms.setSelectedIndex(forms.indexOfTab("Sample")));
        var crossSection = window.textBox("sample.crossSection.value");
        crossSection.requireText("");
        assertThat(FieldFormPanel.placeholder(crossSection.target())).isEqualTo(sigma + " (derived)");
        // the pump radius is given in the plan: nothing derived stands in for it
        assertThat(FieldFormPanel.placeholder(window.textBox("sample.pathLength").target())).isNull();
        System.out.println("placeholders: " + GuiActionRunner.execute(() -> DerivedPlaceholders.of(frame.prediction()
                .derived())));
    }

    @Test
    void helpOffersAboutWithTheSafetyCautionAndPointsToTheUserGuide() {
        window.menuItem("help:about").click();
        var about = window.optionPane().requireTitle(HelpDialogs.ABOUT_TITLE);
        String text = GuiActionRunner.execute(() -> String.valueOf(about.target().getMessage()));
        assertThat(text).contains("ladderkin").contains("Licence").contains("laser safety officer");
        GuiActionRunner.execute(() -> about.okButton().target().doClick());
        window.menuItem("help:using").click();
        var using = window.optionPane().requireTitle(HelpDialogs.USING_TITLE);
        assertThat(GuiActionRunner.execute(() -> String.valueOf(using.target().getMessage()))).contains("user-guide.md");
        GuiActionRunner.execute(() -> using.okButton().target().doClick());
    }

    // ---- checks -------------------------------------------------------------------------------------------------

    private void assertEverythingFits(String size) {
        JTabbedPane forms = window.tabbedPane("forms").target();
        int formCount = GuiActionRunner.execute(forms::getTabCount);
        for (int i = 0; i < formCount; i++) {
            int tab = i;
            GuiActionRunner.execute(() -> {
                forms.setSelectedIndex(tab);
                frame.getRootPane().validate();
            });
            List<String> problems = GuiActionRunner.execute(() -> {
                List<String> out = new ArrayList<>();
                tabsFit(frame.getContentPane(), out);
                formFits((JScrollPane) forms.getSelectedComponent(), forms.getTitleAt(tab), out);
                riskColumnsFit(out);
                return out;
            });
            assertThat(problems).as("at " + size + ", form tab " + tab).isEmpty();
        }
        System.out.println("layout at " + size + ": " + GuiActionRunner.execute(() -> describe(forms)) + "; charts "
                + GuiActionRunner.execute(() -> describe(window.tabbedPane("charts").target())));
    }

    /** Every showing tabbed pane: one row of tabs, each tab inside the pane. */
    private static void tabsFit(Container c, List<String> out) {
        if (c instanceof JTabbedPane tabs && tabs.isShowing() && tabs.getTabCount() > 0) {
            if (tabs.getTabRunCount() != 1) {
                out.add(tabs.getName() + ": " + tabs.getTabRunCount() + " rows of tabs");
            }
            for (int i = 0; i < tabs.getTabCount(); i++) {
                Rectangle r = tabs.getBoundsAt(i);
                if (r == null || r.x < 0 || r.x + r.width > tabs.getWidth() || r.width <= 0) {
                    out.add(tabs.getName() + ": tab '" + tabs.getTitleAt(i) + "' at " + r + " outside 0.." + tabs.getWidth());
                }
            }
        }
        for (Component k : c.getComponents()) {
            if (k instanceof Container kc) {
                tabsFit(kc, out);
            }
        }
    }

    /** No horizontal scroll bar, and nothing in the form reaches past the right edge of what is shown. */
    private static void formFits(JScrollPane scroll, String title, List<String> out) {
        if (scroll.getHorizontalScrollBar().isVisible()) {
            out.add(title + ": horizontal scroll bar shown");
        }
        JViewport viewport = scroll.getViewport();
        Container form = (Container) viewport.getView();
        if (form.getWidth() > viewport.getWidth()) {
            out.add(title + ": form " + form.getWidth() + " px wide in a " + viewport.getWidth() + " px column");
        }
        for (Component k : form.getComponents()) {
            if (!k.isVisible()) {
                continue;
            }
            Rectangle r = SwingUtilities.convertRectangle(form, k.getBounds(), viewport);
            if (r.x + r.width > viewport.getWidth() || k.getWidth() < Math.min(k.getPreferredSize().width, 60)) {
                out.add(title + ": " + k.getClass().getSimpleName() + " '" + k.getName() + "' at " + r
                        + " in a " + viewport.getWidth() + " px column");
            }
        }
    }

    /** The verdict and the two numbers of the risk table are never cut. */
    private void riskColumnsFit(List<String> out) {
        RiskTable risks = (RiskTable) window.table("risks").target();
        if (!risks.isShowing()) {
            out.add("the risk table is not on screen");
            return;
        }
        for (int column : new int[] {RiskTable.VERDICT, RiskTable.PREDICTED, RiskTable.LIMIT}) {
            int width = risks.getColumnModel().getColumn(column).getWidth();
            int widest = risks.widestCell(column);
            if (width < widest) {
                List<Object> values = new ArrayList<>();
                for (int r = 0; r < risks.getRowCount(); r++) {
                    values.add(risks.getValueAt(r, column));
                }
                out.add("risk column '" + risks.getColumnName(column) + "' " + width + " px (min "
                        + risks.getColumnModel().getColumn(column).getMinWidth() + "), its widest value " + widest
                        + " px, of " + values);
            }
        }
        Rectangle visible = risks.getVisibleRect();
        if (visible.width < risks.getWidth()) {
            out.add("risk table " + risks.getWidth() + " px wide, " + visible.width + " px shown");
        }
    }

    private static String describe(JTabbedPane tabs) {
        StringBuilder b = new StringBuilder(tabs.getWidth() + " px:");
        for (int i = 0; i < tabs.getTabCount(); i++) {
            Rectangle r = tabs.getBoundsAt(i);
            b.append(' ').append(tabs.getTitleAt(i)).append('[').append(r.x).append('+').append(r.width).append(']');
        }
        Object cap = tabs.getClientProperty(TabFit.MAXIMUM_TAB_WIDTH);
        return b.append(cap == null ? "" : " capped at " + cap).toString();
    }

    private static List<String> markedTabs(JTabbedPane tabs) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < tabs.getTabCount(); i++) {
            if (tabs.getIconAt(i) != null) {
                out.add(tabs.getTitleAt(i));
            }
        }
        return out;
    }

    private javax.swing.JLabel staleNote() {
        return (javax.swing.JLabel) window.robot().finder().findByName(frame, "prediction:stale", false);
    }

    private static Component focusOwner() {
        return KeyboardFocusManager.getCurrentKeyboardFocusManager().getFocusOwner();
    }

    private int chartCount() {
        return GuiActionRunner.execute(() -> window.tabbedPane("charts").target().getTabCount());
    }

    private List<String> cautions() {
        return GuiActionRunner.execute(() -> ((CautionBar) window.panel("cautions").target()).cautions());
    }
}
