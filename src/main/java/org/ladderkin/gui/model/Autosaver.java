package org.ladderkin.gui.model;

import java.io.IOException;
import java.time.Clock;
import java.util.Objects;

/**
 * Decides when to write the recovery copy: on each tick (a timer in the view) if the plan has unsaved changes that
 * were not yet copied. A saved or clean plan needs no copy, so the copy is removed.
 */
public final class Autosaver {

    private final PlanEditor editor;
    private final RecoveryStore store;
    private final Clock clock;
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
            if (lastCopied != null) {
                store.clear();
                lastCopied = null;
            }
            return false;
        }
        String text = editor.text();
        if (text.equals(lastCopied)) {
            return false;
        }
        store.write(editor.document(), editor.file().orElse(null), clock.instant());
        lastCopied = text;
        return true;
    }

    /** Removes the copy: the user saved, or closed and chose to discard. */
    public void discard() throws IOException {
        store.clear();
        lastCopied = null;
    }
}
