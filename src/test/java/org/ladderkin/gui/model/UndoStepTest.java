package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Undo names the step it takes back, in the form's words, and never offers a step that changes nothing. */
class UndoStepTest {

    @TempDir
    Path dir;
    PlanEditor editor;

    @BeforeEach
    void openDemoCopy() throws Exception {
        Path plan = dir.resolve("demo.plan.json");
        Files.copy(PlanEditorTest.DEMO, plan);
        editor = new PlanEditor();
        editor.open(plan);
    }

    @Test
    void undoAndRedoNameTheFieldTheyChange() {
        assertThat(editor.undoName()).isEmpty();
        editor.edit(PlanEditorTest.PUMP_RADIUS, "120 µm");
        editor.endEdit();
        editor.edit(PlanEditorTest.REP_RATE, "2 kHz");
        editor.endEdit();
        assertThat(editor.undoName()).contains("repetition rate");
        editor.undo();
        assertThat(editor.undoName()).contains("pump radius");
        assertThat(editor.redoName()).contains("repetition rate");
        editor.undo();
        assertThat(editor.undoName()).isEmpty();
        assertThat(editor.redoName()).contains("pump radius");
    }

    @Test
    void anAcronymKeepsItsCapitalsAndAJointEditCountsItsFields() {
        FieldSpec irf = PlanEditorTest.field("instruments[0].irfFwhm");
        editor.edit(irf, "150 fs");
        assertThat(editor.undoName()).contains("IRF FWHM");
        editor.editAll(List.of(Map.entry(PlanEditorTest.PUMP_RADIUS, "100 µm"), Map.entry(PlanEditorTest.REP_RATE, "3 kHz")));
        assertThat(editor.undoName()).contains("2 fields");
    }

    @Test
    void typingThatEndsWhereItBeganLeavesNoStep() {
        editor.edit(PlanEditorTest.REP_RATE, "2 kHz");
        editor.edit(PlanEditorTest.REP_RATE, "1 kHz");
        editor.endEdit();
        assertThat(editor.canUndo()).as("back to the file's value").isFalse();
        assertThat(editor.isDirty()).isFalse();

        editor.edit(PlanEditorTest.REP_RATE, "1 kHz ");
        assertThat(editor.canUndo()).as("white space changes nothing").isFalse();

        editor.edit(PlanEditorTest.PUMP_RADIUS, "120 µm");
        editor.endEdit();
        editor.edit(PlanEditorTest.REP_RATE, "5 kHz");
        editor.edit(PlanEditorTest.REP_RATE, "1 kHz");
        editor.endEdit();
        assertThat(editor.undoName()).as("only the real step is left").contains("pump radius");
        editor.undo();
        assertThat(editor.text(PlanEditorTest.PUMP_RADIUS)).isEqualTo("150 µm");
        assertThat(editor.canUndo()).isFalse();
    }

    @Test
    void aFieldSetBackInALaterRunIsAStepOfItsOwn() {
        editor.edit(PlanEditorTest.REP_RATE, "2 kHz");
        editor.endEdit();
        editor.edit(PlanEditorTest.REP_RATE, "1 kHz");
        editor.endEdit();
        editor.undo();
        assertThat(editor.text(PlanEditorTest.REP_RATE)).isEqualTo("2 kHz");
    }
}
