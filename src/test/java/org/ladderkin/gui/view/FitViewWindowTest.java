package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.awt.event.KeyEvent;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import org.assertj.swing.core.KeyPressInfo;
import org.assertj.swing.data.TableCell;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.model.FitDemoSeries;
import org.ladderkin.gui.model.FitRun;
import org.ladderkin.units.Quantity;

/**
 * The "Measured data &amp; fit" tab on a real (virtual) display: load a simulated series through the file chooser,
 * fit with Ctrl+R, read τ₂ in the parameter table, push it into the plan and see the plan's field change. Skipped
 * without a display (run with {@code scripts/test}).
 */
class FitViewWindowTest {

    @TempDir
    Path dir;
    DemoPlannerWindow demo;
    FrameFixture window;
    PlannerFrame frame;
    Path csv;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void openTheDemoPlanAndSimulateASeries() throws Exception {
        demo = DemoPlannerWindow.open(dir, prefs -> { });
        window = demo.window;
        frame = demo.frame;
        var inputs = GuiActionRunner.execute(() -> frame.editor().lastValid().orElseThrow());
        csv = FitDemoSeries.write(FitDemoSeries.simulate(inputs, 40, 3), dir, "fh-series");
    }

    @AfterEach
    void closeWindow() throws Exception {
        if (demo != null) {
            demo.close();
        }
    }

    @Test
    void loadFitReadTau2AndPushItIntoThePlan() throws Exception {
        window.tabbedPane("centre").selectTab("Measured data & fit");
        window.button("fit:run").requireDisabled();
        window.button("fit:load").click();
        var chooser = window.fileChooser();
        GuiActionRunner.execute(() -> {
            chooser.target().setSelectedFiles(new File[] {csv.toFile()});
            chooser.target().approveSelection();
        });
        waitFor("the traces", () -> GuiActionRunner.execute(() -> frame.fitSession().data().traceCount()) == FitDemoSeries.MEAN_N.length);
        window.table("fit:excitations").requireRowCount(FitDemoSeries.MEAN_N.length);
        assertThat(window.table("fit:excitations").valueAt(TableCell.row(0).column(0))).isEqualTo("F1");
        assertThat(window.table("fit:excitations").valueAt(TableCell.row(0).column(1))).endsWith("photons/cm²");
        waitFor("the plan's curves", () -> GuiActionRunner.execute(() -> frame.fitSession().preview().hasCurves()));

        // an unusable excitation is marked and blocks the fit, with the reason
        String original = window.table("fit:excitations").valueAt(TableCell.row(1).column(1));
        window.table("fit:excitations").enterValue(TableCell.row(1).column(1), "3 nK");
        waitFor("the mark", () -> GuiActionRunner.execute(() -> frame.fitSession().data().excitationProblem(1).isPresent()));
        assertThat(window.table("fit:excitations").valueAt(TableCell.row(1).column(1))).startsWith("⚠");
        window.button("fit:run").requireDisabled();
        assertThat(window.label("fit:status").text()).startsWith("⚠ trace 'F2'");
        window.table("fit:excitations").enterValue(TableCell.row(1).column(1), original);
        waitFor("the mark to go", () -> GuiActionRunner.execute(() -> frame.fitSession().data().excitationProblem(1).isEmpty()));
        window.button("fit:run").requireEnabled();

        window.pressAndReleaseKey(KeyPressInfo.keyCode(KeyEvent.VK_R).modifiers(PlannerWindowTest.CTRL));
        waitFor("the fit", () -> GuiActionRunner.execute(() -> frame.fitSession().fit().state()) == FitRun.RunState.DONE);
        assertThat(window.label("fit:progress").text()).matches("done in \\d+:\\d\\d · \\d+ model evaluations · best χ²/ν [0-9.e+-]+");
        var table = window.table("fit:parameters");
        int tauRow = -1;
        for (int r = 0; r < table.rowCount(); r++) {
            if (table.valueAt(TableCell.row(r).column(0)).startsWith("τ₂")) {
                tauRow = r;
            }
        }
        assertThat(tauRow).as("a τ₂ row").isNotNegative();
        assertThat(table.valueAt(TableCell.row(tauRow).column(0))).isEqualTo("τ₂ (ps)");
        assertThat(Double.parseDouble(table.valueAt(TableCell.row(tauRow).column(1)))).isPositive();
        assertThat(table.valueAt(TableCell.row(tauRow).column(2))).startsWith("± ");
        assertThat(table.valueAt(TableCell.row(tauRow).column(3))).isEqualTo("free");
        assertThat(window.textBox("fit:diagnostics").text()).contains("reduced χ² = ").doesNotContain("χ²/dof");
        PlannerWindowTest.screenshot(frame, "planner-fit-light.png");

        double fittedTauS = GuiActionRunner.execute(() -> frame.fitSession().fit().outcome().orElseThrow().result().estimate("tauAuger2S").value());
        window.button("fit:push").requireEnabled().click();
        waitFor("the plan to change", () -> GuiActionRunner.execute(() -> frame.editor().isDirty()));
        selectForm("Model");
        String pushed = window.textBox("model.biexcitonLifetime").text();
        assertThat(Quantity.parse(pushed).si() / fittedTauS).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-3));
        selectForm("Sample");
        assertThat(window.textBox("sample.crossSection.value").text()).endsWith("cm²");
        assertThat(window.textBox("fit:diagnostics").text()).contains("Written into the plan as one step");

        window.pressAndReleaseKey(KeyPressInfo.keyCode(KeyEvent.VK_Z).modifiers(PlannerWindowTest.CTRL));
        selectForm("Model");
        window.textBox("model.biexcitonLifetime").requireText("");
        assertThat(GuiActionRunner.execute(() -> frame.editor().isDirty())).isFalse();
    }

    @Test
    void droppedFilesAreLoadedAndCancelStopsARunningFit() {
        window.tabbedPane("centre").selectTab("Measured data & fit");
        boolean imported = GuiActionRunner.execute(() -> {
            FitPanel panel = frame.fitPanel();
            java.awt.datatransfer.Transferable files = new java.awt.datatransfer.Transferable() {
                @Override
                public java.awt.datatransfer.DataFlavor[] getTransferDataFlavors() {
                    return new java.awt.datatransfer.DataFlavor[] {java.awt.datatransfer.DataFlavor.javaFileListFlavor};
                }

                @Override
                public boolean isDataFlavorSupported(java.awt.datatransfer.DataFlavor flavor) {
                    return flavor.equals(java.awt.datatransfer.DataFlavor.javaFileListFlavor);
                }

                @Override
                public Object getTransferData(java.awt.datatransfer.DataFlavor flavor) {
                    return java.util.List.of(csv.toFile());
                }
            };
            return panel.getTransferHandler().importData(new javax.swing.TransferHandler.TransferSupport(panel, files));
        });
        assertThat(imported).isTrue();
        window.table("fit:excitations").requireRowCount(FitDemoSeries.MEAN_N.length);
        waitFor("the plan's curves", () -> GuiActionRunner.execute(() -> frame.fitSession().preview().hasCurves()));

        // Fit and Cancel in one event-thread step: the fit is certainly still running when Cancel is pressed
        boolean cancelWasEnabled = GuiActionRunner.execute(() -> {
            window.button("fit:run").target().doClick();
            boolean enabled = window.button("fit:cancel").target().isEnabled();
            window.button("fit:cancel").target().doClick();
            return enabled;
        });
        assertThat(cancelWasEnabled).isTrue();
        assertThat(GuiActionRunner.execute(() -> frame.fitSession().fit().state())).isEqualTo(FitRun.RunState.CANCELLED);
        window.button("fit:cancel").requireDisabled();
        window.button("fit:run").requireEnabled();
        assertThat(window.label("fit:status").text()).isEqualTo("fit cancelled");
        assertThat(window.label("fit:progress").text()).startsWith("cancelled after ");
        window.button("fit:push").requireDisabled();
    }

    @Test
    void runAndCancelAreDisabledWithoutTracesAndProgressShowsEvaluationsAndTheBestChiSquare() throws Exception {
        window.tabbedPane("centre").selectTab("Measured data & fit");
        window.button("fit:run").requireDisabled().requireText("Run Fit");
        window.button("fit:cancel").requireDisabled().requireText("Cancel Fit");
        assertThat(GuiActionRunner.execute(() -> frame.fitPanel().runAction().isEnabled())).isFalse();
        assertThat(GuiActionRunner.execute(() -> frame.fitPanel().cancelAction().isEnabled())).isFalse();
        assertThat(window.label("fit:progress").text().trim()).isEmpty();

        GuiActionRunner.execute(() -> frame.fitPanel().loadFiles(java.util.List.of(csv)));
        waitFor("the plan's curves", () -> GuiActionRunner.execute(() -> frame.fitSession().preview().hasCurves()));
        window.button("fit:run").requireEnabled();
        window.button("fit:cancel").requireDisabled();
        assertThat(GuiActionRunner.execute(() -> frame.fitPanel().runAction().isEnabled())).isTrue();
        assertThat(GuiActionRunner.execute(() -> frame.fitPanel().cancelAction().isEnabled())).isFalse();

        // two 40-ns-scale lifetimes freed on data that end at 3 ns: warned before the run, which still runs
        freeOrHold("tau-rad");
        freeOrHold("tau-trap");
        // wait for the check of this choice, not an earlier one (a busy machine may deliver the clicks late)
        waitFor("the check", () -> GuiActionRunner.execute(() -> !frame.fitSession().check().checking()
                && frame.fitSession().check().result().map(r -> r.free().containsAll(java.util.List.of("tauRadS", "tauTrapS")))
                .orElse(false)));
        String found = GuiActionRunner.execute(() -> frame.fitSession().check().result() + " " + frame.fitSession().check().failure()
                + " " + frame.fitSession().fit().free());
        assertThat(window.textBox("fit:check").text()).as(found).startsWith("⚠ Before fitting: τ_rad and τ_trap cannot be told apart");
        window.button("fit:run").requireEnabled();
        PlannerWindowTest.screenshot(frame, "planner-fit-check.png");
        freeOrHold("tau-rad");
        freeOrHold("tau-trap");
        waitFor("the check", () -> GuiActionRunner.execute(() -> !frame.fitSession().check().checking()
                && frame.fitSession().check().result().map(r -> r.free().size() == 2).orElse(false)));
        assertThat(window.textBox("fit:check").text()).as("no warning for σ and τ₂").isBlank();

        // what the progress label says while the fit runs, read right after the panel redrew it
        java.util.List<String> shown = new java.util.concurrent.CopyOnWriteArrayList<>();
        boolean[] cancelEnabled = {false};
        GuiActionRunner.execute(() -> frame.fitSession().addListener(() -> {
            if (frame.fitSession().fit().state() == FitRun.RunState.RUNNING) {
                shown.add(window.label("fit:progress").target().getText());
                cancelEnabled[0] |= frame.fitPanel().cancelAction().isEnabled() && !frame.fitPanel().runAction().isEnabled();
            }
        }));
        window.button("fit:run").click();
        waitFor("the fit", () -> GuiActionRunner.execute(() -> frame.fitSession().fit().state()) == FitRun.RunState.DONE);
        assertThat(cancelEnabled[0]).as("Cancel enabled and Run disabled while running").isTrue();
        assertThat(shown).anyMatch(t -> t.matches("\\d+:\\d\\d elapsed · \\d+ model evaluations? · best χ²/ν [0-9.e+-]+"));
        window.button("fit:cancel").requireDisabled();
        window.button("fit:run").requireEnabled();
        assertThat(window.label("fit:progress").text()).startsWith("done in ").contains("model evaluations").contains("best χ²/ν");
    }

    @Test
    void aBadTraceFileIsReportedInOneLineAndNothingIsLoaded() throws Exception {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "delay (ps),a\n1,0.1\n1,0.2\n3,0.1\n");
        window.tabbedPane("centre").selectTab("Measured data & fit");
        GuiActionRunner.execute(() -> frame.fitPanel().loadFiles(java.util.List.of(bad)));
        assertThat(window.label("fit:status").text()).startsWith("⚠ " + bad + ":3:").contains("duplicate delay");
        window.table("fit:excitations").requireRowCount(0);
        window.button("fit:run").requireDisabled();
    }

    /** Toggles a free-parameter box on the event thread, as a click would. */
    private void freeOrHold(String key) {
        var box = window.checkBox("fit:free:" + key).target();
        GuiActionRunner.execute(() -> box.doClick());
    }

    /**
     * Selects a form tab on the event thread: with five tabs in the narrow forms column some scroll out of view, where
     * a robot click on the tab cannot reach them.
     */
    private void selectForm(String title) {
        var tabs = window.tabbedPane("forms").target();
        GuiActionRunner.execute(() -> tabs.setSelectedIndex(tabs.indexOfTab(title)));
    }

    /** Waits up to two minutes: fits run on a shared, possibly busy machine (a guard, not a speed requirement). */
    static void waitFor(String what, BooleanSupplier condition) {
        Pause.pause(new Condition(what) {
            @Override
            public boolean test() {
                return condition.getAsBoolean();
            }
        }, Timeout.timeout(120_000));
    }
}
