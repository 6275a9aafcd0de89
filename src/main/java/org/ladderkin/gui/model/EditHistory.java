package org.ladderkin.gui.model;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;

/**
 * Undo and redo as snapshots of the whole plan document. A plan is a few kilobytes, so snapshots are cheaper to get
 * right than inverse operations. Snapshots must not change once handed over. Consecutive edits with the same coalescing key (typing in one field)
 * make one undo step until {@link #boundary()} is called (focus left the field, a save, an undo).
 */
public final class EditHistory<S> {

    private final int capacity;
    private final Deque<S> undo = new ArrayDeque<>();
    private final Deque<S> redo = new ArrayDeque<>();
    private String openKey;

    /** @param capacity how many undo steps are kept; older ones are dropped */
    public EditHistory(int capacity) {
        if (capacity < 1) {
            throw new IllegalArgumentException("undo capacity must be >= 1, was " + capacity);
        }
        this.capacity = capacity;
    }

    /**
     * Called before an edit changes the document.
     *
     * @param before the document as it was before this edit
     * @param key    coalescing key (the field's path), or null for an edit that never merges
     */
    public void beforeEdit(S before, String key) {
        Objects.requireNonNull(before, "before");
        redo.clear();
        if (key != null && key.equals(openKey)) {
            return;
        }
        undo.push(before);
        while (undo.size() > capacity) {
            undo.removeLast();
        }
        openKey = key;
    }

    /** Ends the current run of merged edits: the next edit starts a new undo step. */
    public void boundary() {
        openKey = null;
    }

    public boolean canUndo() {
        return !undo.isEmpty();
    }

    public boolean canRedo() {
        return !redo.isEmpty();
    }

    /** The snapshot to return to, given the current document; the current one becomes redoable. */
    public S undo(S current) {
        if (undo.isEmpty()) {
            throw new IllegalStateException("nothing to undo");
        }
        openKey = null;
        redo.push(current);
        return undo.pop();
    }

    /** The snapshot undone last, given the current document; the current one becomes undoable. */
    public S redo(S current) {
        if (redo.isEmpty()) {
            throw new IllegalStateException("nothing to redo");
        }
        openKey = null;
        undo.push(current);
        return redo.pop();
    }

    /** Forgets everything (a new or opened document). */
    public void clear() {
        undo.clear();
        redo.clear();
        openKey = null;
    }
}
