// Over 400 lines: one editor state (document, positions, history, file, check) kept consistent in one place.
package org.ladderkin.gui.model;


import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.ResolvedJson;
import org.ladderkin.io.SampleCodec;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.io.json.JsonTree;
import org.ladderkin.io.json.SourcePositions;
import org.ladderkin.plan.PlanInputs;

/**
 * The plan being edited: the plan document itself (a JSON tree), its file, undo/redo, validation and the last valid
 * plan. Views bind each form field to a {@link FieldSpec} and call {@link #edit}; they redraw on {@link Listener}
 * events. No Swing here, so everything is tested without a display.
 */
public final class PlanEditor {

    /** What changed. */
    public enum Change {
        /** One field was edited; the path names it. */
        EDIT,
        /** The whole document was replaced (new, open, undo, redo, restore): every field must be re-read. */
        REPLACED,
        /** The document was saved; only the file name and the dirty mark change. */
        SAVED
    }

    /** Told after every change, on the thread that made it. */
    @FunctionalInterface
    public interface Listener {
        void planChanged(Change change, String path);
    }

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final int UNDO_STEPS = 200;

    /** An undo step: the document and where its values stood in the file (both never changed once stored). */
    private record Snapshot(ObjectNode document, SourcePositions positions) {
    }

    private final EditHistory<Snapshot> history = new EditHistory<>(UNDO_STEPS);
    private final Map<String, String> typedProblems = new LinkedHashMap<>();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    // edited by replacement only: every change builds a new tree, so a snapshot handed to the history stays as it was
    private ObjectNode document;
    private SourcePositions positions = SourcePositions.NONE;
    private ObjectNode saved;
    // the file's text as opened or last saved, and the document it reads as: a save changes only what changed
    private String sourceText;
    private ObjectNode sourceDocument;
    private Path file;
    private PlanCheck check;
    private PlanInputs lastValid;

    /** An editor on a new, untitled, blank plan. */
    public PlanEditor() {
        replace(PlanTemplate.blank().deepCopy(), SourcePositions.NONE, null);
    }

    public void addListener(Listener l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    // ---- reading -----------------------------------------------------------------------------------------------

    /** A copy of the document (changes to it do not reach the editor). */
    public ObjectNode document() {
        return document.deepCopy();
    }

    /** The document as the JSON text a save would write. */
    public String text() {
        return ResolvedJson.toText(document);
    }

    /** The text a field shows for the current document. */
    public String text(FieldSpec field) {
        return field.read(document);
    }

    /** The file this plan was opened from or last saved to, if any. */
    public Optional<Path> file() {
        return Optional.ofNullable(file);
    }

    /** "name.plan.json" or "untitled". */
    public String displayName() {
        return file == null ? "untitled" : file.getFileName().toString();
    }

    /** Whether the document differs from what was last opened or saved. */
    public boolean isDirty() {
        return saved == null || !saved.equals(document);
    }

    /** The outcome of reading the current document as a plan. */
    public PlanCheck check() {
        return check;
    }

    /** The most recent document state that read as a valid plan, if any: predictions stay alive while typing. */
    public Optional<PlanInputs> lastValid() {
        return Optional.ofNullable(lastValid);
    }

    /** Every field of the forms for the current document. */
    public List<FieldSpec> fields() {
        List<FieldSpec> all = new ArrayList<>(PlanForms.SAMPLE);
        all.addAll(PlanForms.LASER);
        for (int i = 0; i < PlanForms.instrumentCount(document); i++) {
            all.addAll(PlanForms.instrument(document, i));
        }
        all.addAll(PlanForms.GOALS_AND_LIMITS);
        all.addAll(PlanForms.MODEL);
        return all;
    }

    /**
     * Why a field is invalid, or empty: its own check of the typed text first (instant, and one per field), then the
     * plan reader's first problem when it concerns this field.
     */
    public Optional<String> problem(FieldSpec field) {
        String typed = typedProblems.get(field.path().toString());
        if (typed != null) {
            return Optional.of(typed);
        }
        if (!check.valid() && field.path().concerns(check.field())) {
            return Optional.of(inFormWords(field));
        }
        return Optional.empty();
    }

    /**
     * The first marked field and its problem, in the words its tooltip uses ("Lowest pulse energy: must be > 0, was
     * 0 nJ"), for a status line; empty when no field is marked.
     */
    public Optional<String> firstFieldProblem() {
        for (FieldSpec f : fields()) {
            Optional<String> p = problem(f);
            if (p.isPresent()) {
                return Optional.of(f.label() + ": " + p.get());
            }
        }
        return Optional.empty();
    }

    /**
     * The plan reader's problem as the form shows it. The file writes a range as one list, "[lowest, highest]", and
     * the reader says so; the form shows the two ends as two fields, so it names the other field instead.
     */
    private String inFormWords(FieldSpec field) {
        if (check.key() == InputProblem.BAD_ORDER && check.field() != null) {
            FieldSpec low = fieldAt(check.field() + "[0]");
            FieldSpec high = fieldAt(check.field() + "[1]");
            if (low != null && high != null) {
                boolean isHigh = field.path().equals(high.path());
                FieldSpec other = isHigh ? low : high;
                return (isHigh ? "must be above the " : "must be below the ") + stepName(other) + " ("
                        + other.read(document) + ")";
            }
        }
        return check.problem();
    }

    private FieldSpec fieldAt(String path) {
        for (FieldSpec f : fields()) {
            if (f.path().toString().equals(path)) {
                return f;
            }
        }
        return null;
    }

    /**
     * The plan reader's problem when no form field shows it (a missing section, "give either diameter or peak"),
     * prefixed by its path when it has one; empty when the plan is valid or a field shows the problem.
     */
    public Optional<String> generalProblem() {
        if (check.valid()) {
            return Optional.empty();
        }
        for (FieldSpec f : fields()) {
            if (f.path().concerns(check.field())) {
                return Optional.empty();
            }
        }
        String where = check.field() == null ? "" : "'" + check.field() + "': ";
        return Optional.of(where + check.problem());
    }

    /** The folder relative data-file paths start at: the plan file's folder, or the working folder when untitled. */
    public Path baseDir() {
        return file == null ? Path.of("").toAbsolutePath() : SampleCodec.baseDir(file);
    }

    /**
     * The text a file field stores for a chosen file: relative to the plan's folder when the plan has a file and the
     * chosen file lies on the same file-system root, else absolute (an untitled plan has no folder yet).
     */
    public String fileFieldText(Path chosen) {
        Path absolute = chosen.toAbsolutePath().normalize();
        return file == null ? absolute.toString() : relativeTo(baseDir(), absolute);
    }

    private static String relativeTo(Path base, Path absolute) {
        if (!absolute.isAbsolute() || base.getRoot() == null || !base.getRoot().equals(absolute.getRoot())) {
            return absolute.toString();
        }
        // forward slashes keep the plan portable between systems; Path.of reads them everywhere
        return base.relativize(absolute).toString().replace(java.io.File.separatorChar, '/');
    }

    public boolean canUndo() {
        return history.canUndo();
    }

    public boolean canRedo() {
        return history.canRedo();
    }

    /** What undo would take back, in the form's words ("pump radius"), if anything. */
    public Optional<String> undoName() {
        return history.undoName();
    }

    /** What redo would make again, if anything. */
    public Optional<String> redoName() {
        return history.redoName();
    }

    /** A field's label as a menu names its step: "pump radius", but "IRF FWHM" as written. */
    static String stepName(FieldSpec field) {
        String label = field.label();
        boolean word = label.length() > 1 && Character.isUpperCase(label.charAt(0)) && Character.isLowerCase(label.charAt(1));
        return word ? Character.toLowerCase(label.charAt(0)) + label.substring(1) : label;
    }

    // ---- editing -----------------------------------------------------------------------------------------------

    /**
     * Sets the text of one field. The text is stored as typed (even when it does not parse), so the document always
     * holds what the form shows; the field's own check marks it at once. Consecutive edits of one field make one
     * undo step until {@link #endEdit()}.
     */
    public void edit(FieldSpec field, String text) {
        String path = field.path().toString();
        Optional<String> typed = field.check(text);
        boolean problemChanged = !Objects.equals(typedProblems.get(path), typed.orElse(null));
        typed.ifPresentOrElse(p -> typedProblems.put(path, p), () -> typedProblems.remove(path));
        ObjectNode next = document.deepCopy();
        field.toJson(text).ifPresentOrElse(v -> field.path().set(next, v), () -> field.path().remove(next));
        if (next.equals(document)) {
            if (problemChanged) {
                fire(Change.EDIT, path);
            }
            return;
        }
        // typing that came back to where it began leaves no step behind
        if (!history.revertsOpenRun(path, s -> s.document().equals(next))) {
            history.beforeEdit(new Snapshot(document, positions), path, stepName(field));
        }
        document = next;
        positions = positions.without(field.path().pointer());
        recheck();
        fire(Change.EDIT, path);
    }

    /**
     * Sets several fields at once as ONE undo step (e.g. fitted values pushed into the plan): one undo restores every
     * field, one redo sets them all again. Texts are stored as typed and checked per field, as in {@link #edit}.
     * Listeners hear {@link Change#REPLACED} because several fields changed.
     */
    public void editAll(List<Map.Entry<FieldSpec, String>> edits) {
        if (edits.isEmpty()) {
            return;
        }
        ObjectNode next = document.deepCopy();
        SourcePositions nextPositions = positions;
        boolean problemChanged = false;
        for (Map.Entry<FieldSpec, String> e : edits) {
            FieldSpec field = e.getKey();
            String path = field.path().toString();
            Optional<String> typed = field.check(e.getValue());
            problemChanged |= !Objects.equals(typedProblems.get(path), typed.orElse(null));
            typed.ifPresentOrElse(p -> typedProblems.put(path, p), () -> typedProblems.remove(path));
            field.toJson(e.getValue()).ifPresentOrElse(v -> field.path().set(next, v), () -> field.path().remove(next));
            nextPositions = nextPositions.without(field.path().pointer());
        }
        if (next.equals(document)) {
            if (problemChanged) {
                fire(Change.REPLACED, null);
            }
            return;
        }
        history.boundary();
        history.beforeEdit(new Snapshot(document, positions), null, edits.size() == 1
                ? stepName(edits.get(0).getKey()) : edits.size() + " fields");
        history.boundary();
        document = next;
        positions = nextPositions;
        recheck();
        fire(Change.REPLACED, null);
    }

    /** Ends a run of typing in one field: the next edit is a new undo step. */
    public void endEdit() {
        history.boundary();
    }

    public void undo() {
        restoreSnapshot(history.undo(new Snapshot(document, positions)));
    }

    public void redo() {
        restoreSnapshot(history.redo(new Snapshot(document, positions)));
    }

    // ---- files -------------------------------------------------------------------------------------------------

    /** Replaces the document with a blank plan, untitled. */
    public void newPlan() {
        replace(PlanTemplate.blank().deepCopy(), SourcePositions.NONE, null);
        fire(Change.REPLACED, null);
    }

    /**
     * Opens a plan file. The file must be a JSON object; it need not be a valid plan (problems are marked for
     * editing).
     *
     * @throws InputException when the file is missing, not UTF-8 or not well-formed JSON (located)
     */
    public void open(Path planFile) {
        JsonTree tree = JsonTree.load(planFile, planFile.toString());
        if (!(tree.json() instanceof ObjectNode object)) {
            throw new InputException(SourceLocation.of(planFile.toString()), null, InputProblem.WRONG_TYPE,
                    "a plan file must hold one JSON object");
        }
        // the tree was built for this editor alone, so it is taken without a copy
        replace(object, tree.positions(), planFile.toAbsolutePath().normalize());
        source(readText(planFile), object);
        fire(Change.REPLACED, null);
    }

    /** Saves to the current file, atomically. */
    public void save() throws IOException {
        if (file == null) {
            throw new IllegalStateException("an untitled plan needs a file: use saveAs");
        }
        saveAs(file);
    }

    /**
     * Saves to {@code target}, atomically, and makes it the current file. The text is the file's text as opened (or
     * last saved) with only the changed values rewritten ({@link SplicedJson}), so key order, layout and number
     * spellings stay; an untitled plan is written whole. Data files the plan names by a relative
     * path (spectrum, IRF) are re-expressed relative to the new folder, so a plan saved elsewhere still finds them.
     */
    public void saveAs(Path target) throws IOException {
        ObjectNode toSave = rebased(SampleCodec.baseDir(target.toAbsolutePath().normalize()));
        String text = sourceText == null ? ResolvedJson.toText(toSave)
                : SplicedJson.update(sourceText, sourceDocument, toSave).orElseGet(() -> ResolvedJson.toText(toSave));
        AtomicFiles.writeString(target, text);
        boolean pathsChanged = !toSave.equals(document);
        file = target.toAbsolutePath().normalize();
        // positions from now on refer to the text just written (read back once per save, never per edit)
        JsonTree written = JsonTree.of(text, file.toString());
        document = (ObjectNode) written.json();
        positions = written.positions();
        saved = document.deepCopy();
        source(text, document);
        history.boundary();
        recheck();
        if (pathsChanged) {
            // Undo steps recorded earlier keep their old relative paths; the reader names such a file as missing.
            fire(Change.REPLACED, null);
        }
        fire(Change.SAVED, null);
    }

    /** The document with every relative data-file path re-expressed from {@code newBase}. */
    private ObjectNode rebased(Path newBase) {
        ObjectNode copy = document.deepCopy();
        Path oldBase = baseDir();
        if (newBase.equals(oldBase)) {
            return copy;
        }
        for (FieldSpec f : fields()) {
            String given = f.read(copy);
            if (f.kind() != FieldSpec.Kind.FILE || given.isBlank()) {
                continue;
            }
            try {
                if (!Path.of(given).isAbsolute()) {
                    f.path().set(copy, TextNode.valueOf(relativeTo(newBase, oldBase.resolve(given).normalize())));
                }
            } catch (java.nio.file.InvalidPathException e) {
                // not a path at all: saved as typed; the reader reports it at the field
            }
        }
        return copy;
    }

    /**
     * Puts back a recovered document. It counts as unsaved: {@code originalFile} (if any) becomes the current file
     * but what is on disk there stays as it was until the user saves.
     */
    public void restore(ObjectNode recovered, Path originalFile) {
        replace(recovered.deepCopy(), SourcePositions.NONE, originalFile);
        saved = null;
        if (originalFile != null) {
            // the file as it is on disk: saving the restored plan then changes only what the recovery changed
            try {
                String text = readText(originalFile);
                if (JsonTree.of(text, originalFile.toString()).json() instanceof ObjectNode onDisk) {
                    source(text, onDisk);
                }
            } catch (InputException e) {
                // unreadable or gone: the plan is saved as a whole
            }
        }
        fire(Change.REPLACED, null);
    }

    // ---- internals ---------------------------------------------------------------------------------------------

    private void replace(ObjectNode doc, SourcePositions newPositions, Path newFile) {
        sourceText = null;
        sourceDocument = null;
        document = doc;
        positions = newPositions;
        file = newFile;
        history.clear();
        saved = doc.deepCopy();
        lastValid = null;
        recheckAllFields();
    }

    private void source(String text, ObjectNode readAs) {
        sourceText = text;
        sourceDocument = text == null ? null : readAs.deepCopy();
    }

    /** The file's text, or null when it cannot be read again (it was read a moment ago). */
    private static String readText(Path f) {
        try {
            return java.nio.file.Files.readString(f);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    private void restoreSnapshot(Snapshot snapshot) {
        document = snapshot.document();
        positions = snapshot.positions();
        recheckAllFields();
        fire(Change.REPLACED, null);
    }

    private void recheckAllFields() {
        typedProblems.clear();
        for (FieldSpec f : fields()) {
            f.check(f.read(document)).ifPresent(p -> typedProblems.put(f.path().toString(), p));
        }
        recheck();
    }

    private void recheck() {
        // the full path, so the reader resolves relative data-file paths from the plan's folder
        check = PlanCheck.of(document, positions, file == null ? displayName() : file.toString());
        if (check.valid()) {
            lastValid = check.inputs();
        }
    }

    private void fire(Change change, String path) {
        for (Listener l : listeners) {
            l.planChanged(change, path);
        }
    }

    /** Used by tests and the recovery store: the document parsed from JSON text. */
    static ObjectNode parseObject(String json) {
        try {
            JsonNode n = MAPPER.readTree(json);
            if (n instanceof ObjectNode o) {
                return o;
            }
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not JSON: " + e.getOriginalMessage(), e);
        }
        throw new IllegalArgumentException("not a JSON object");
    }
}
