package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
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

        assertThat(store.readAll()).as("the copy of a living window is not offered").isEmpty();
        // a new session after a crash: the window went away without the unsaved-changes question
        autosaver.release();
        RecoveryStore.Recovered r = store.read().orElseThrow();
        assertThat(r.originalFile()).isEqualTo(plan.toAbsolutePath().normalize());
        assertThat(r.savedAt()).isEqualTo(Instant.parse("2026-01-02T03:04:05Z"));
        PlanEditor next = new PlanEditor();
        next.restore(r.document(), r.originalFile());
        assertThat(next.text(PlanEditorTest.REP_RATE)).isEqualTo("4 kHz");
        assertThat(next.isDirty()).isTrue();
        assertThat(Files.readString(plan)).as("the file itself is untouched").contains("\"1 kHz\"");

        Autosaver restored = new Autosaver(next, store, Clock.systemUTC());
        restored.adopt(r);
        assertThat(store.readAll()).as("adopted by the window that restored it").isEmpty();
        next.save();
        assertThat(restored.tick()).isFalse();
        restored.release();
        assertThat(store.readAll()).as("a save makes the copy unnecessary").isEmpty();
        assertThat(Files.exists(r.copy())).isFalse();
    }

    @Test
    void anUntitledPlanIsRecoveredWithoutAFileAndDiscardRemovesTheCopy() throws Exception {
        RecoveryStore store = new RecoveryStore(dir);
        PlanEditor editor = new PlanEditor();
        editor.edit(PlanEditorTest.REP_RATE, "4 kHz");
        Autosaver autosaver = new Autosaver(editor, store, Clock.systemUTC());
        autosaver.tick();
        Path copy = autosaver.copyFile();
        autosaver.release();
        assertThat(store.read().orElseThrow().originalFile()).isNull();
        RecoveryStore.Recovered r = store.read().orElseThrow();
        store.discard(r);
        assertThat(Files.exists(copy)).isFalse();
        assertThat(store.readAll()).isEmpty();
    }

    @Test
    void aDamagedCopyIsIgnoredNotFatal() throws Exception {
        RecoveryStore store = new RecoveryStore(dir);
        Files.writeString(dir.resolve("recovery-a.json"), "{ not json");
        assertThat(store.read()).isEmpty();
        Files.writeString(dir.resolve("recovery-a.json"), "{\"schema\": \"other/1\"}");
        assertThat(store.read()).isEmpty();
        assertThat(Files.exists(dir.resolve("recovery-a.json"))).as("left for the user to inspect").isTrue();
    }

    @Test
    void twoEditorsKilledTogetherAreBothOfferedAndEachCopyGoesOnceSavedOrDiscarded() throws Exception {
        Path a = dir.resolve("a.plan.json");
        Path b = dir.resolve("b.plan.json");
        Files.copy(PlanEditorTest.DEMO, a);
        Files.copy(PlanEditorTest.DEMO, b);
        RecoveryStore store = new RecoveryStore(dir.resolve("recovery"));
        PlanEditor first = new PlanEditor();
        first.open(a);
        PlanEditor second = new PlanEditor();
        second.open(b);
        Autosaver firstSaver = new Autosaver(first, store, Clock.fixed(Instant.parse("2026-01-02T03:00:00Z"), ZoneOffset.UTC));
        Autosaver secondSaver = new Autosaver(second, store, Clock.fixed(Instant.parse("2026-01-02T03:01:00Z"), ZoneOffset.UTC));
        first.edit(PlanEditorTest.REP_RATE, "4 kHz");
        second.edit(PlanEditorTest.REP_RATE, "8 kHz");
        assertThat(firstSaver.tick()).isTrue();
        assertThat(secondSaver.tick()).isTrue();
        assertThat(firstSaver.copyFile()).isNotEqualTo(secondSaver.copyFile());

        // both killed: no clean close, so the copies stay and their locks go
        firstSaver.release();
        secondSaver.release();

        List<RecoveryStore.Recovered> offered = store.readAll();
        assertThat(offered).extracting(RecoveryStore.Recovered::originalFile)
                .containsExactly(a.toAbsolutePath().normalize(), b.toAbsolutePath().normalize());
        assertThat(offered).extracting(r -> r.document().at("/laser/repetitionRate").asText())
                .containsExactly("4 kHz", "8 kHz");

        PlanEditor restored = new PlanEditor();
        restored.restore(offered.get(0).document(), offered.get(0).originalFile());
        Autosaver restoredSaver = new Autosaver(restored, store, Clock.systemUTC());
        restoredSaver.adopt(offered.get(0));
        store.discard(offered.get(1));
        assertThat(store.readAll()).as("one adopted, one discarded").isEmpty();
        restored.save();
        restoredSaver.discard();
        restoredSaver.release();
        assertThat(store.readAll()).isEmpty();
        try (var left = Files.list(dir.resolve("recovery"))) {
            assertThat(left.toList()).as("no copy and no lock left behind").isEmpty();
        }
        assertThat(Files.readString(a)).contains("\"4 kHz\"");
    }
}
