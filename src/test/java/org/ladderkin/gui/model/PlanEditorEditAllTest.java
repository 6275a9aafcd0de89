package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Several field edits applied as one undo step (how fitted values reach the plan), and the model form fields. */
class PlanEditorEditAllTest {

    @TempDir
    Path dir;
    PlanEditor editor;
    final List<String> events = new ArrayList<>();

    static final FieldSpec TAU2 = PlanEditorTest.field("model.biexcitonLifetime");
    static final FieldSpec SIGMA = PlanEditorTest.field("sample.crossSection.value");
    static final FieldSpec SIGMA_AT = PlanEditorTest.field("sample.crossSection.at");

    @BeforeEach
    void openDemoCopy() throws Exception {
        Path planFile = dir.resolve("demo.plan.json");
        Files.copy(PlanEditorTest.DEMO, planFile);
        editor = new PlanEditor();
        editor.open(planFile);
        editor.addListener((change, path) -> events.add(change + " " + path));
    }

    @Test
    void oneUndoRestoresEveryFieldAndOneRedoSetsThemAgain() {
        String before = editor.text();
        editor.edit(PlanEditorTest.PUMP_RADIUS, "140 µm");
        editor.endEdit();
        String afterTyping = editor.text();
        editor.editAll(List.of(Map.entry(TAU2, "61 ps"), Map.entry(SIGMA, "3.2e-15 cm²"), Map.entry(SIGMA_AT, "400 nm")));
        assertThat(editor.text(TAU2)).isEqualTo("61 ps");
        assertThat(editor.text(SIGMA)).isEqualTo("3.2e-15 cm²");
        assertThat(editor.text(SIGMA_AT)).isEqualTo("400 nm");
        assertThat(editor.check().valid()).as(editor.check().problem()).isTrue();
        assertThat(editor.lastValid().orElseThrow().modelOverrides().tauBiexcitonS()).isEqualTo(61e-12);
        assertThat(events).last().isEqualTo("REPLACED null");
        assertThat(editor.isDirty()).isTrue();

        editor.undo();
        assertThat(editor.text()).isEqualTo(afterTyping);
        assertThat(editor.text(TAU2)).isEmpty();
        assertThat(editor.text(SIGMA)).isEmpty();
        assertThat(editor.text(SIGMA_AT)).isEmpty();
        editor.redo();
        assertThat(editor.text(TAU2)).isEqualTo("61 ps");
        assertThat(editor.text(SIGMA_AT)).isEqualTo("400 nm");
        editor.undo();
        editor.undo();
        assertThat(editor.text()).isEqualTo(before);
        assertThat(editor.isDirty()).isFalse();
    }

    @Test
    void aFollowingEditOfOneOfTheFieldsIsItsOwnStep() {
        editor.editAll(List.of(Map.entry(TAU2, "61 ps"), Map.entry(SIGMA, "3.2e-15 cm²"), Map.entry(SIGMA_AT, "400 nm")));
        editor.edit(TAU2, "70 ps");
        editor.undo();
        assertThat(editor.text(TAU2)).isEqualTo("61 ps");
        assertThat(editor.text(SIGMA)).isEqualTo("3.2e-15 cm²");
    }

    @Test
    void editsThatChangeNothingMakeNoUndoStepAndAnEmptyListDoesNothing() {
        editor.editAll(List.of());
        editor.editAll(List.of(Map.entry(PlanEditorTest.REP_RATE, "1 kHz")));
        assertThat(editor.canUndo()).isFalse();
        assertThat(editor.isDirty()).isFalse();
        assertThat(events).isEmpty();
    }

    @Test
    void badTextIsStoredAsTypedAndMarkedPerField() {
        editor.editAll(List.of(Map.entry(TAU2, "61 pz"), Map.entry(SIGMA_AT, "400 nm")));
        assertThat(editor.problem(TAU2)).isPresent();
        assertThat(editor.problem(SIGMA_AT)).isEmpty();
        assertThat(editor.check().valid()).isFalse();
        editor.undo();
        assertThat(editor.problem(TAU2)).isEmpty();
        assertThat(editor.check().valid()).isTrue();
    }

    @Test
    void theModelFormHasAnOptionalFieldForEveryModelKeyOfThePlanFormat() throws Exception {
        String format = Files.readString(Path.of(System.getProperty("ladderkin.home", ".")).resolve("docs/plan-format.md"));
        String row = format.lines().filter(l -> l.startsWith("| `model`")).findFirst().orElseThrow();
        for (FieldSpec f : PlanForms.MODEL) {
            assertThat(f.optional()).as(f.path().toString()).isTrue();
            assertThat(f.check("")).isEmpty();
            String key = f.path().toString().substring("model.".length());
            assertThat(row).as("docs/plan-format.md lists " + key).contains("`" + key + "`");
        }
        long keys = java.util.regex.Pattern.compile("`[a-zA-Z]+`").matcher(row.substring(row.indexOf("values that replace")))
                .results().map(m -> m.group()).filter(k -> !k.matches("`(statistical|pairs|quadratic|linear)`")).count();
        assertThat(PlanForms.MODEL).hasSize((int) keys);
    }
}
