package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.io.json.SourcePositions;

/**
 * The editor checks its own Jackson tree: values as read keep their line and column, values edited since have none,
 * and undo brings the positions back with the values.
 */
class PlanEditorTreeTest {

    @TempDir
    Path dir;

    private Path planWithNegativePathLength() throws Exception {
        String text = Files.readString(PlanEditorTest.DEMO, StandardCharsets.UTF_8)
                .replace("\"pathLength\": \"1 mm\"", "\"pathLength\": \"-1 mm\"");
        Path f = dir.resolve("bad.plan.json");
        Files.writeString(f, text);
        return f;
    }

    private static int lineOf(Path f, String needle) throws Exception {
        String[] lines = Files.readString(f, StandardCharsets.UTF_8).split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(needle)) {
                return i + 1;
            }
        }
        throw new AssertionError(needle);
    }

    @Test
    void aValueAsReadIsLocatedAndStaysLocatedWhileOtherFieldsAreEdited() throws Exception {
        Path f = planWithNegativePathLength();
        PlanEditor editor = new PlanEditor();
        editor.open(f);
        PlanCheck first = editor.check();
        assertThat(first.key()).isEqualTo(InputProblem.OUT_OF_RANGE);
        assertThat(first.field()).isEqualTo("sample.pathLength");
        assertThat(first.location().line()).isEqualTo(lineOf(f, "\"-1 mm\""));
        assertThat(first.location().column()).isPositive();

        editor.edit(PlanEditorTest.REP_RATE, "2 kHz");
        assertThat(editor.check().location()).as("an edit elsewhere keeps this value's position")
                .isEqualTo(first.location());
    }

    @Test
    void anEditedValueHasNoLineButNamesTheFileAndField() throws Exception {
        Path f = planWithNegativePathLength();
        PlanEditor editor = new PlanEditor();
        editor.open(f);
        SourceLocation asRead = editor.check().location();
        FieldSpec pathLength = PlanEditorTest.field("sample.pathLength");

        editor.edit(pathLength, "-2 mm");
        PlanCheck edited = editor.check();
        assertThat(edited.key()).isEqualTo(InputProblem.OUT_OF_RANGE);
        assertThat(edited.field()).isEqualTo("sample.pathLength");
        assertThat(edited.location()).isEqualTo(SourceLocation.of(f.toAbsolutePath().normalize().toString()));

        editor.undo();
        assertThat(editor.check().location()).as("undo restores the value and its position").isEqualTo(asRead);
    }

    @Test
    void theCheckReadsTheTreeItselfNotText() {
        // a document that never existed as text: built in memory, no positions at all
        ObjectNode doc = PlanEditor.parseObject("{\"schema\": \"ladderkin.plan/1\"}");
        doc.put("title", 42);
        PlanCheck check = PlanCheck.of(doc, SourcePositions.NONE, "memory.plan.json");
        assertThat(check.key()).isEqualTo(InputProblem.WRONG_TYPE);
        assertThat(check.field()).isEqualTo("title");
        assertThat(check.location()).isEqualTo(SourceLocation.of("memory.plan.json"));
    }

    @Test
    void savingLocatesValuesInTheWrittenFile() throws Exception {
        Path f = planWithNegativePathLength();
        PlanEditor editor = new PlanEditor();
        editor.open(f);
        FieldSpec pathLength = PlanEditorTest.field("sample.pathLength");
        editor.edit(pathLength, "-2 mm");
        Path saved = dir.resolve("saved.plan.json");
        editor.saveAs(saved);
        assertThat(editor.isDirty()).isFalse();
        assertThat(editor.check().location().line()).isEqualTo(lineOf(saved, "\"-2 mm\""));
    }
}
