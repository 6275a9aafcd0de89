package org.ladderkin.gui.model;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * Undo and redo as snapshots of the whole plan document. A plan is a few kilobytes, so snapshots are cheaper to get
 * right than inverse operations. Snapshots must not change once handed over. Consecutive edits with the same coalescing key (typing in one field)
 * make one undo step until {@link #boundary()} is called (focus left the field, a save, an undo). Each step carries
 * the name a menu shows for it ("pump radius").
 */
public final class EditHistory<S> {

    private record Step<S>(S state, String name) {
    }

    private final int capacity;
    private final Deque<Step<S>> undo = new ArrayDeque<>();
    private final Deque<Step<S>> redo = new ArrayDeque<>();
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
        beforeEdit(before, key, "");
    }

    /**
     * Called before an edit changes the document.
     *
     * @param before the document as it was before this edit
     * @param key    coalescing key (the field's path), or null for an edit that never merges
     * @param name   what the step changes, for "Undo: name"
     */
    public void beforeEdit(S before, String key, String name) {
        Objects.requireNonNull(before, "before");
        Objects.requireNonNull(name, "name");
        redo.clear();
        if (key != null && key.equals(openKey)) {
            return;
        }
        undo.push(new Step<>(before, name));
        while (undo.size() > capacity) {
            undo.removeLast();
        }
        openKey = key;
    }

    /** Ends the current run of merged edits: the next edit starts a new undo step. */
    public void boundary() {
        openKey = null;
    }

    /**
     * Whether an edit with {@code key} ends the open run of merged edits where it began ({@code unchanged} says the
     * document after the edit equals that run's snapshot); if so the run's step is forgotten, so undo never offers a
     * step that changes nothing. The caller then records no step for this edit.
     */
    public boolean revertsOpenRun(String key, Predicate<S> unchanged) {
        if (key == null || !key.equals(openKey) || undo.isEmpty() || !unchanged.test(undo.peek().state())) {
            return false;
        }
        undo.pop();
        openKey = null;
        return true;
    }

    public boolean canUndo() {
        return !undo.isEmpty();
    }

    public boolean canRedo() {
        return !redo.isEmpty();
    }

    /** The name of the step undo would take back, if any. */
    public Optional<String> undoName() {
        return undo.isEmpty() ? Optional.empty() : Optional.of(undo.peek().name());
    }

    /** The name of the step redo would make again, if any. */
    public Optional<String> redoName() {
        return redo.isEmpty() ? Optional.empty() : Optional.of(redo.peek().name());
    }

    /** The snapshot to return to, given the current document; the current one becomes redoable. */
    public S undo(S current) {
        if (undo.isEmpty()) {
            throw new IllegalStateException("nothing to undo");
        }
        openKey = null;
        Step<S> step = undo.pop();
        redo.push(new Step<>(current, step.name()));
        return step.state();
    }

    /** The snapshot undone last, given the current document; the current one becomes undoable. */
    public S redo(S current) {
        if (redo.isEmpty()) {
            throw new IllegalStateException("nothing to redo");
        }
        openKey = null;
        Step<S> step = redo.pop();
        undo.push(new Step<>(current, step.name()));
        return step.state();
    }

    /** Forgets everything (a new or opened document). */
    public void clear() {
        undo.clear();
        redo.clear();
        openKey = null;
    }
}
