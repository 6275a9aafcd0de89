package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class UnsavedChangesTest {

    @TempDir
    Path dir;
    final List<String> asked = new ArrayList<>();

    PlanEditor dirtyDemo() throws Exception {
        Path f = dir.resolve("p.plan.json");
        Files.copy(PlanEditorTest.DEMO, f);
        PlanEditor e = new PlanEditor();
        e.open(f);
        e.edit(PlanEditorTest.REP_RATE, "2 kHz");
        return e;
    }

    UnsavedChanges.Asker answer(UnsavedChanges.Answer a) {
        return name -> {
            asked.add(name);
            return a;
        };
    }

    @Test
    void aCleanPlanNeverAsks() throws Exception {
        PlanEditor e = new PlanEditor();
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.CANCEL), Optional::empty)).isTrue();
        assertThat(asked).isEmpty();
    }

    @Test
    void cancelStopsAndDiscardProceedsWithoutSaving() throws Exception {
        PlanEditor e = dirtyDemo();
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.CANCEL), Optional::empty)).isFalse();
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.DISCARD), Optional::empty)).isTrue();
        assertThat(asked).containsExactly("p.plan.json", "p.plan.json");
        assertThat(e.isDirty()).isTrue();
        assertThat(Files.readString(e.file().orElseThrow())).contains("\"1 kHz\"");
    }

    @Test
    void saveWritesTheCurrentFile() throws Exception {
        PlanEditor e = dirtyDemo();
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.SAVE), Optional::empty)).isTrue();
        assertThat(e.isDirty()).isFalse();
        assertThat(Files.readString(e.file().orElseThrow())).contains("\"2 kHz\"");
    }

    @Test
    void saveOfAnUntitledPlanAsksForAFileAndCancellingThatCancels() throws Exception {
        PlanEditor e = new PlanEditor();
        e.edit(PlanEditorTest.REP_RATE, "2 kHz");
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.SAVE), Optional::empty)).isFalse();
        assertThat(e.isDirty()).isTrue();
        Path target = dir.resolve("new.plan.json");
        assertThat(UnsavedChanges.mayProceed(e, answer(UnsavedChanges.Answer.SAVE), () -> Optional.of(target))).isTrue();
        assertThat(Files.readString(target)).contains("\"2 kHz\"");
        assertThat(e.file()).contains(target.toAbsolutePath().normalize());
    }
}
