package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecoveryTest {

    @TempDir
    Path dir;

    @Test
    void autosaveCopiesUnsavedChangesOnceAndRestoringGivesThemBack() throws Exception {
        Path plan = dir.resolve("p.plan.json");
        Files.copy(PlanEditorTest.DEMO, plan);
        RecoveryStore store = new RecoveryStore(dir.resolve("recovery"));
        PlanEditor editor = new PlanEditor();
        editor.open(plan);
        Autosaver autosaver = new Autosaver(editor, store, Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"), ZoneOffset.UTC));

        assertThat(autosaver.tick()).as("clean: nothing to copy").isFalse();
        assertThat(store.read()).isEmpty();

        editor.edit(PlanEditorTest.REP_RATE, "4 kHz");
        assertThat(autosaver.tick()).isTrue();
        assertThat(autosaver.tick()).as("unchanged since the last copy").isFalse();

        // a new session after a crash
        RecoveryStore.Recovered r = store.read().orElseThrow();
        assertThat(r.originalFile()).isEqualTo(plan.toAbsolutePath().normalize());
        assertThat(r.savedAt()).isEqualTo(Instant.parse("2026-01-02T03:04:05Z"));
        PlanEditor next = new PlanEditor();
        next.restore(r.document(), r.originalFile());
        assertThat(next.text(PlanEditorTest.REP_RATE)).isEqualTo("4 kHz");
        assertThat(next.isDirty()).isTrue();
        assertThat(Files.readString(plan)).as("the file itself is untouched").contains("\"1 kHz\"");

        editor.save();
        assertThat(autosaver.tick()).isFalse();
        assertThat(store.read()).as("a save makes the copy unnecessary").isEmpty();
    }

    @Test
    void anUntitledPlanIsRecoveredWithoutAFileAndDiscardRemovesTheCopy() throws Exception {
        RecoveryStore store = new RecoveryStore(dir);
        PlanEditor editor = new PlanEditor();
        editor.edit(PlanEditorTest.REP_RATE, "4 kHz");
        Autosaver autosaver = new Autosaver(editor, store, Clock.systemUTC());
        autosaver.tick();
        assertThat(store.read().orElseThrow().originalFile()).isNull();
        autosaver.discard();
        assertThat(Files.exists(store.file())).isFalse();
    }

    @Test
    void aDamagedCopyIsIgnoredNotFatal() throws Exception {
        RecoveryStore store = new RecoveryStore(dir);
        Files.writeString(store.file(), "{ not json");
        assertThat(store.read()).isEmpty();
        Files.writeString(store.file(), "{\"schema\": \"other/1\"}");
        assertThat(store.read()).isEmpty();
    }
}
