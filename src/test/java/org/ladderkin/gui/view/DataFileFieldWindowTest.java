package org.ladderkin.gui.view;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.StringSelection;
import java.awt.datatransfer.Transferable;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JTextField;
import javax.swing.TransferHandler;
import org.assertj.swing.edt.FailOnThreadViolationRepaintManager;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.fixture.JFileChooserFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.gui.app.Theme;
import org.ladderkin.gui.model.FieldSpec;
import org.ladderkin.gui.model.PlanEditor;
import org.ladderkin.gui.model.PlanForms;

/**
 * The data-file field of the sample form on a (virtual) display: a dropped file and a file picked in the chooser
 * both end up in the plan relative to its folder; text still pastes as in any field. Skipped without a display.
 */
class DataFileFieldWindowTest {

    static final String SPECTRUM = "sample.absorptionSpectrum";

    @TempDir
    Path dir;
    PlanEditor editor;
    FrameFixture window;
    FieldSpec field;

    @BeforeAll
    static void needsADisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: run under xvfb-run (scripts/test)");
        FailOnThreadViolationRepaintManager.install();
    }

    @BeforeEach
    void showTheSampleForm() throws Exception {
        Path plan = dir.resolve("demo.plan.json");
        Files.copy(PlannerWindowTest.DEMO, plan);
        for (String name : List.of("spectra/batch-7.csv", "spectra/batch-8.csv")) {
            Path f = dir.resolve(name);
            Files.createDirectories(f.getParent());
            // invented demo spectrum, not a measurement
            Files.writeString(f, "wavelength_nm,absorbance\n350,1.2\n400,0.9\n500,0.5\n550,0.35\n600,0.1\n");
        }
        JFrame frame = GuiActionRunner.execute(() -> {
            Theme.LIGHT.install();
            editor = new PlanEditor();
            editor.open(plan);
            JFrame f = new JFrame("sample form");
            f.setContentPane(new FieldFormPanel(editor, List.of(new FieldFormPanel.Section("", PlanForms.SAMPLE))));
            return f;
        });
        field = PlanForms.SAMPLE.stream().filter(f -> f.path().toString().equals(SPECTRUM)).findFirst().orElseThrow();
        window = new FrameFixture(frame);
        window.show(new java.awt.Dimension(640, 820));
    }

    @AfterEach
    void close() {
        if (window != null) {
            window.cleanUp();
        }
    }

    @Test
    void aFileDroppedOnTheFieldIsStoredRelativeToThePlan() {
        JTextField text = (JTextField) window.textBox(SPECTRUM).target();
        boolean accepted = GuiActionRunner.execute(() -> drop(text, files(dir.resolve("spectra/batch-7.csv").toFile())));
        assertThat(accepted).isTrue();
        window.textBox(SPECTRUM).requireText("spectra/batch-7.csv");
        assertThat(GuiActionRunner.execute(() -> editor.text(field))).isEqualTo("spectra/batch-7.csv");
        assertThat(GuiActionRunner.execute(() -> editor.check().valid())).isTrue();
        assertThat(text.getClientProperty("JComponent.outline")).isNull();
    }

    @Test
    void twoDroppedFilesAreRefused() {
        JTextField text = (JTextField) window.textBox(SPECTRUM).target();
        boolean accepted = GuiActionRunner.execute(() -> drop(text, files(dir.resolve("spectra/batch-7.csv").toFile(),
                dir.resolve("spectra/batch-8.csv").toFile())));
        assertThat(accepted).isFalse();
        window.textBox(SPECTRUM).requireText("");
    }

    @Test
    void pastedTextStillReachesTheField() {
        JTextField text = (JTextField) window.textBox(SPECTRUM).target();
        boolean accepted = GuiActionRunner.execute(() -> drop(text, new StringSelection("spectra/batch-8.csv")));
        assertThat(accepted).isTrue();
        window.textBox(SPECTRUM).requireText("spectra/batch-8.csv");
        assertThat(GuiActionRunner.execute(() -> editor.check().valid())).isTrue();
    }

    @Test
    void theChooserOpensInThePlansFolderAndStoresTheChoiceRelatively() {
        window.button(SPECTRUM + ":choose").click();
        JFileChooserFixture chooser = window.fileChooser();
        assertThat(GuiActionRunner.execute(() -> chooser.target().getCurrentDirectory().toPath().toRealPath()))
                .isEqualTo(GuiActionRunner.execute(() -> dir.toRealPath()));
        chooser.selectFile(dir.resolve("spectra/batch-8.csv").toFile()).approve();
        window.textBox(SPECTRUM).requireText("spectra/batch-8.csv");
        assertThat(GuiActionRunner.execute(() -> editor.text(field))).isEqualTo("spectra/batch-8.csv");
        assertThat(GuiActionRunner.execute(() -> editor.check().valid())).isTrue();
    }

    private static boolean drop(JComponent target, Transferable data) {
        return target.getTransferHandler().importData(new TransferHandler.TransferSupport(target, data));
    }

    private static Transferable files(File... files) {
        return new Transferable() {
            @Override
            public DataFlavor[] getTransferDataFlavors() {
                return new DataFlavor[] {DataFlavor.javaFileListFlavor};
            }

            @Override
            public boolean isDataFlavorSupported(DataFlavor flavor) {
                return DataFlavor.javaFileListFlavor.equals(flavor);
            }

            @Override
            public Object getTransferData(DataFlavor flavor) {
                return List.of(files);
            }
        };
    }
}
