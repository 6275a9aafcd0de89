package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.plan.PlanInputs;

class PlanEditorTest {

    static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");

    @TempDir
    Path dir;
    Path planFile;
    PlanEditor editor;
    final List<String> events = new ArrayList<>();

    static FieldSpec field(String path) {
        return new PlanEditor().fields().stream().filter(f -> f.path().toString().equals(path)).findFirst()
                .orElseThrow(() -> new AssertionError("no field " + path));
    }

    static final FieldSpec REP_RATE = field("laser.repetitionRate");
    static final FieldSpec E_LOW = field("laser.pulseEnergyRange[0]");
    static final FieldSpec E_HIGH = field("laser.pulseEnergyRange[1]");
    static final FieldSpec PUMP_RADIUS = field("laser.pumpRadius");
    static final FieldSpec DIAMETER = field("sample.diameter");

    @BeforeEach
    void openDemoCopy() throws Exception {
        planFile = dir.resolve("demo.plan.json");
        Files.copy(DEMO, planFile);
        editor = new PlanEditor();
        editor.open(planFile);
        editor.addListener((change, path) -> events.add(change + " " + path));
    }

    @Test
    void theDemoPlanOpensValidAndClean() {
        assertThat(editor.check().valid()).isTrue();
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.text(REP_RATE)).isEqualTo("1 kHz");
        assertThat(editor.text(field("laser.pumpWavelengths"))).isEqualTo("400 nm, 515 nm, 565 nm");
        assertThat(editor.fields()).extracting(f -> f.path().toString())
                .contains("instruments[0].delayRange[1]", "instruments[1].timeRange");
        for (FieldSpec f : editor.fields()) {
            assertThat(editor.problem(f)).as(f.path().toString()).isEmpty();
        }
    }

    @Test
    void anEditChangesTheTextAtItsPathAndTheResolvedPlan() {
        editor.edit(REP_RATE, "5 kHz");
        assertThat(editor.document().at("/laser/repetitionRate").asText()).isEqualTo("5 kHz");
        assertThat(editor.lastValid().orElseThrow().laser().repetitionRateHz()).isEqualTo(5000.0);
        assertThat(editor.isDirty()).isTrue();
        assertThat(events).containsExactly("EDIT laser.repetitionRate");
    }

    @Test
    void typingInOneFieldIsOneUndoStep() {
        editor.edit(REP_RATE, "2");
        editor.edit(REP_RATE, "2 k");
        editor.edit(REP_RATE, "2 kHz");
        editor.endEdit();
        editor.edit(PUMP_RADIUS, "100 µm");
        editor.undo();
        assertThat(editor.text(PUMP_RADIUS)).isEqualTo("150 µm");
        assertThat(editor.text(REP_RATE)).isEqualTo("2 kHz");
        editor.undo();
        assertThat(editor.text(REP_RATE)).isEqualTo("1 kHz");
        assertThat(editor.canUndo()).isFalse();
        assertThat(editor.isDirty()).as("back to the saved state").isFalse();
        editor.redo();
        editor.redo();
        assertThat(editor.text(REP_RATE)).isEqualTo("2 kHz");
        assertThat(editor.text(PUMP_RADIUS)).isEqualTo("100 µm");
        assertThat(editor.canRedo()).isFalse();
    }

    @Test
    void editingAnotherFieldEndsCoalescingAndANewEditClearsRedo() {
        editor.edit(REP_RATE, "2 kHz");
        editor.edit(PUMP_RADIUS, "100 µm");
        editor.edit(REP_RATE, "3 kHz");
        editor.undo();
        assertThat(editor.text(REP_RATE)).isEqualTo("2 kHz");
        assertThat(editor.canRedo()).isTrue();
        editor.edit(E_HIGH, "1 µJ");
        assertThat(editor.canRedo()).isFalse();
    }

    @Test
    void anEditThatChangesNothingMakesNoUndoStep() {
        editor.edit(REP_RATE, " 1 kHz ");
        assertThat(editor.canUndo()).isFalse();
        assertThat(editor.isDirty()).isFalse();
    }

    @Test
    void aBadQuantityIsMarkedOnItsFieldAtOnceAndPredictionsKeepTheLastValidPlan() {
        PlanInputs before = editor.lastValid().orElseThrow();
        editor.edit(REP_RATE, "1 kH");
        assertThat(editor.problem(REP_RATE)).get().asString().contains("unknown unit 'kH'");
        assertThat(editor.problem(PUMP_RADIUS)).isEmpty();
        assertThat(editor.check().valid()).isFalse();
        assertThat(editor.check().field()).isEqualTo("laser.repetitionRate");
        assertThat(editor.lastValid()).containsSame(before);
        assertThat(editor.document().at("/laser/repetitionRate").asText()).as("stored as typed").isEqualTo("1 kH");
        editor.edit(REP_RATE, "1 kHz");
        assertThat(editor.problem(REP_RATE)).isEmpty();
        assertThat(editor.check().valid()).isTrue();
    }

    @Test
    void eachBadFieldIsMarkedEvenThoughTheReaderStopsAtTheFirst() {
        editor.edit(REP_RATE, "fast");
        editor.edit(PUMP_RADIUS, "150 ps");
        assertThat(editor.problem(REP_RATE)).isPresent();
        assertThat(editor.problem(PUMP_RADIUS)).get().asString().contains("is a time");
    }

    @Test
    void aProblemTheReaderFindsIsMarkedOnTheFieldsAtItsPath() {
        editor.edit(E_LOW, "5 µJ");
        assertThat(E_LOW.check("5 µJ")).as("5 µJ is a fine energy on its own").isEmpty();
        assertThat(editor.check().field()).isEqualTo("laser.pulseEnergyRange");
        assertThat(editor.check().key()).isEqualTo(InputProblem.BAD_ORDER);
        // both ends are marked, each naming the other end in the form's words (the reader speaks of the file's list)
        assertThat(editor.problem(E_LOW)).contains("must be below the highest pulse energy (2 µJ)");
        assertThat(editor.problem(E_HIGH)).contains("must be above the lowest pulse energy (5 µJ)");
        assertThat(editor.problem(REP_RATE)).isEmpty();
        assertThat(editor.generalProblem()).isEmpty();
    }

    @Test
    void aProblemNoFieldShowsIsAGeneralProblem() {
        // a concentration beside the absorbance says the amount twice: the conflict is the sample's, not one field's
        FieldSpec concentration = field("sample.concentration");
        editor.edit(concentration, "2 µM");
        assertThat(editor.check().field()).isEqualTo("sample");
        assertThat(editor.problem(concentration)).isEmpty();
        assertThat(editor.check().key()).isEqualTo(InputProblem.CONFLICT);
        assertThat(editor.generalProblem()).contains("'sample': " + editor.check().problem());
        editor.edit(concentration, "");
        assertThat(editor.document().at("/sample").has("concentration")).as("blank optional field removes the key").isFalse();
        assertThat(editor.check().valid()).isTrue();
    }

    @Test
    void undoRestoresMarksAndReplacesTheDocument() {
        editor.edit(REP_RATE, "bad");
        editor.endEdit();
        editor.undo();
        assertThat(editor.problem(REP_RATE)).isEmpty();
        assertThat(events).last().isEqualTo("REPLACED null");
    }

    @Test
    void saveWritesAtomicallyAndReopeningGivesTheSameDocumentAndPlan() throws Exception {
        editor.edit(E_HIGH, "1.5 µJ");
        editor.edit(field("laser.pulsePickerDivisions"), "1, 4");
        Path copy = dir.resolve("sub/copy.plan.json");
        editor.saveAs(copy);
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.file()).contains(copy.toAbsolutePath().normalize());
        assertThat(events).last().isEqualTo("SAVED null");
        try (var files = Files.list(copy.getParent())) {
            assertThat(files).as("no temporary files left").containsExactly(copy);
        }
        PlanEditor reopened = new PlanEditor();
        reopened.open(copy);
        assertThat(reopened.document()).isEqualTo(editor.document());
        assertThat(reopened.lastValid()).isEqualTo(editor.lastValid());
        assertThat(reopened.lastValid().orElseThrow().laser().pulsePickerDivisions()).containsExactly(1, 4);
        assertThat(reopened.lastValid().orElseThrow().laser().maxPulseEnergyJ()).isEqualTo(1.5e-6);
    }

    @Test
    void saveToTheOpenedFileClearsDirty() throws Exception {
        editor.edit(REP_RATE, "2 kHz");
        editor.save();
        assertThat(editor.isDirty()).isFalse();
        assertThat(Files.readString(planFile)).contains("\"2 kHz\"");
    }

    @Test
    void anUntitledPlanCannotBeSavedWithoutAFile() {
        editor.newPlan();
        assertThatThrownBy(editor::save).isInstanceOf(IllegalStateException.class);
    }

    @Test
    void aNewPlanIsBlankCleanAndMarksWhatIsMissing() {
        editor.newPlan();
        assertThat(editor.file()).isEmpty();
        assertThat(editor.displayName()).isEqualTo("untitled");
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.check().valid()).isFalse();
        assertThat(editor.lastValid()).isEmpty();
        assertThat(editor.problem(REP_RATE)).get().asString().startsWith("required");
        assertThat(editor.fields()).extracting(f -> f.path().toString()).contains("instruments[1].timeBin");
    }

    @Test
    void malformedJsonIsRefusedWithItsLocationAndTheOpenPlanStays() throws Exception {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"schema\": \"ladderkin.plan/1\",\n  \"title\": }");
        assertThatThrownBy(() -> editor.open(bad)).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(InputProblem.BAD_SYNTAX);
            assertThat(e.location().line()).isEqualTo(2);
        });
        assertThat(editor.text(REP_RATE)).isEqualTo("1 kHz");
    }

    @Test
    void restoringARecoveredDocumentCountsAsUnsaved() {
        var doc = editor.document();
        ((com.fasterxml.jackson.databind.node.ObjectNode) doc.get("laser")).put("repetitionRate", "3 kHz");
        editor.restore(doc, planFile);
        assertThat(editor.isDirty()).isTrue();
        assertThat(editor.text(REP_RATE)).isEqualTo("3 kHz");
        assertThat(editor.file()).contains(planFile);
    }

    static final FieldSpec SPECTRUM = field("sample.absorptionSpectrum");

    /** An invented demo spectrum (not a measurement). */
    static void writeSpectrum(Path file) throws Exception {
        Files.createDirectories(file.getParent());
        Files.writeString(file, "wavelength_nm,absorbance\n350,1.2\n400,0.9\n500,0.5\n550,0.35\n600,0.1\n");
    }

    @Test
    void aChosenSpectrumIsStoredRelativeToThePlansFolderAndReadFromThere() throws Exception {
        Path spectrum = dir.resolve("spectra/batch-7.csv");
        writeSpectrum(spectrum);
        String text = editor.fileFieldText(spectrum);
        assertThat(text).isEqualTo("spectra/batch-7.csv");
        editor.edit(SPECTRUM, text);
        // the reader resolves the path from the plan's folder, not from wherever the planner was started
        assertThat(editor.check().valid()).as(String.valueOf(editor.check().problem())).isTrue();
        assertThat(editor.lastValid().orElseThrow().sample().spec().spectrum()).isPresent();
    }

    @Test
    void aMissingSpectrumIsMarkedOnItsFieldWithTheResolvedPath() {
        editor.edit(SPECTRUM, "spectra/none.csv");
        assertThat(editor.problem(SPECTRUM)).hasValueSatisfying(p -> assertThat(p)
                .contains("spectrum file not found").contains(dir.resolve("spectra/none.csv").toString()));
    }

    @Test
    void anUntitledPlanStoresAChosenFileAbsolutely() throws Exception {
        editor.newPlan();
        Path spectrum = dir.resolve("abs.csv");
        assertThat(editor.fileFieldText(spectrum)).isEqualTo(spectrum.toAbsolutePath().normalize().toString());
    }

    @Test
    void saveAsToAnotherFolderKeepsRelativeDataFilesPointingAtTheSameFile() throws Exception {
        Path spectrum = dir.resolve("spectra/batch-7.csv");
        writeSpectrum(spectrum);
        editor.edit(SPECTRUM, "spectra/batch-7.csv");
        Path elsewhere = dir.resolve("campaigns/2026/plan.json");
        Files.createDirectories(elsewhere.getParent());
        events.clear();
        editor.saveAs(elsewhere);
        assertThat(editor.text(SPECTRUM)).isEqualTo("../../spectra/batch-7.csv");
        assertThat(events).containsExactly("REPLACED null", "SAVED null");
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.check().valid()).isTrue();
        PlanEditor reopened = new PlanEditor();
        reopened.open(elsewhere);
        assertThat(reopened.check().valid()).as(String.valueOf(reopened.check().problem())).isTrue();
        assertThat(reopened.text(SPECTRUM)).isEqualTo("../../spectra/batch-7.csv");
    }

    @Test
    void saveInTheSameFolderLeavesPathsAsTyped() throws Exception {
        Path spectrum = dir.resolve("abs.csv");
        writeSpectrum(spectrum);
        editor.edit(SPECTRUM, "./abs.csv");
        events.clear();
        editor.saveAs(dir.resolve("copy.plan.json"));
        assertThat(editor.text(SPECTRUM)).isEqualTo("./abs.csv");
        assertThat(events).containsExactly("SAVED null");
    }
}
