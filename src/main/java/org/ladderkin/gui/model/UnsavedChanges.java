package org.ladderkin.gui.model;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * The question before closing, opening or starting a new plan while there are unsaved changes: save, discard or
 * cancel. The view supplies the dialogs; the decision logic lives here so it is tested without a display.
 */
public final class UnsavedChanges {

    /** What the user answered. */
    public enum Answer { SAVE, DISCARD, CANCEL }

    /** Asks the user; gets the name of the plan. */
    @FunctionalInterface
    public interface Asker {
        Answer ask(String planName);
    }

    private UnsavedChanges() {
    }

    /**
     * Whether the pending action (close, open, new) may go ahead. A clean plan never asks. SAVE saves to the current
     * file, or to the file {@code chooseTarget} returns for an untitled plan; if that chooser is cancelled the action
     * is cancelled too.
     *
     * @throws IOException when saving fails (the action must not go ahead)
     */
    public static boolean mayProceed(PlanEditor editor, Asker asker, Supplier<Optional<Path>> chooseTarget)
            throws IOException {
        if (!editor.isDirty()) {
            return true;
        }
        return switch (asker.ask(editor.displayName())) {
            case CANCEL -> false;
            case DISCARD -> true;
            case SAVE -> {
                if (editor.file().isPresent()) {
                    editor.save();
                    yield true;
                }
                Optional<Path> target = chooseTarget.get();
                if (target.isEmpty()) {
                    yield false;
                }
                editor.saveAs(target.get());
                yield true;
            }
        };
    }
}
