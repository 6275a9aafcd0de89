package org.ladderkin.gui.model;

import java.io.IOException;
import java.time.Clock;
import java.util.Objects;

/**
 * Decides when to write one window's recovery copy: on each tick (a timer in the view) if the plan has unsaved
 * changes that were not yet copied. A saved or clean plan needs no copy, so the copy is removed. Each autosaver
 * writes a copy of its own, so several windows never overwrite each other's.
 */
public final class Autosaver {

    private final PlanEditor editor;
    private final RecoveryStore store;
    private final Clock clock;
    private RecoveryStore.Slot slot;
    private String lastCopied;

    public Autosaver(PlanEditor editor, RecoveryStore store, Clock clock) {
        this.editor = Objects.requireNonNull(editor, "editor");
        this.store = Objects.requireNonNull(store, "store");
        this.clock = Objects.requireNonNull(clock, "clock");
    }

    /**
     * Writes the copy if needed.
     *
     * @return true when a copy was written
     */
    public boolean tick() throws IOException {
        if (!editor.isDirty()) {
            if (slot != null) {
                discard();
            }
            return false;
        }
        String text = editor.text();
        if (text.equals(lastCopied)) {
            return false;
        }
        if (slot == null) {
            slot = store.newSlot();
        }
        slot.write(editor.document(), editor.file().orElse(null), clock.instant());
        lastCopied = text;
        return true;
    }

    /**
     * Takes over a copy restored into this autosaver's editor: kept up to date from now on, removed once the plan is
     * saved or discarded. A copy this autosaver held before is removed (its plan was replaced).
     */
    public void adopt(RecoveryStore.Recovered recovered) throws IOException {
        discard();
        slot = store.adopt(recovered);
    }

    /** Removes the copy: the user saved, or closed and chose to discard. */
    public void discard() throws IOException {
        if (slot != null) {
            slot.clear();
            slot = null;
        }
        lastCopied = null;
    }

    /** Keeps the copy but lets go of it: the window went away without the unsaved-changes question. */
    public void release() throws IOException {
        if (slot != null) {
            slot.release();
            slot = null;
        }
        lastCopied = null;
    }

    /** The file of this autosaver's copy, or null when it has none. */
    public java.nio.file.Path copyFile() {
        return slot == null ? null : slot.file();
    }
}
