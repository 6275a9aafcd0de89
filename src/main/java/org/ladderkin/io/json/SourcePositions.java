package org.ladderkin.io.json;

import com.fasterxml.jackson.core.JsonPointer;
import java.util.HashMap;
import java.util.Map;
import org.ladderkin.io.SourceLocation;

/**
 * Where each value of a parsed JSON document started, keyed by its JSON Pointer, and how each number was written.
 * Kept beside the Jackson tree rather than inside it so that the tree stays an ordinary Jackson tree that an editor can
 * change; a value edited after reading is dropped from the table ({@link #without}) and then has no position.
 */
public final class SourcePositions {

    /** No positions at all: a document built in memory. */
    public static final SourcePositions NONE = new SourcePositions(Map.of());

    /** Line and column (1-based) where a value starts; {@code literal} is a number as written, else null. */
    record Entry(int line, int column, String literal) {
    }

    private final Map<JsonPointer, Entry> entries;

    SourcePositions(Map<JsonPointer, Entry> entries) {
        this.entries = entries;
    }

    /** Where the value at {@code pointer} started in {@code file}, or the bare file when the value has no position. */
    public SourceLocation location(JsonPointer pointer, String file) {
        Entry e = entries.get(pointer);
        return e == null ? SourceLocation.of(file) : new SourceLocation(file, e.line(), e.column());
    }

    /** Whether the value at {@code pointer} still has its position from the file. */
    public boolean has(JsonPointer pointer) {
        return entries.containsKey(pointer);
    }

    /** The number at {@code pointer} exactly as the file wrote it ("1e3", "2.50"), or null. */
    String literal(JsonPointer pointer) {
        Entry e = entries.get(pointer);
        return e == null ? null : e.literal();
    }

    /** These positions less the value at {@code pointer} and everything inside it (the value was edited). */
    public SourcePositions without(JsonPointer pointer) {
        String prefix = pointer.toString();
        Map<JsonPointer, Entry> kept = new HashMap<>();
        boolean dropped = false;
        for (Map.Entry<JsonPointer, Entry> e : entries.entrySet()) {
            String p = e.getKey().toString();
            if (p.equals(prefix) || p.startsWith(prefix + "/")) {
                dropped = true;
            } else {
                kept.put(e.getKey(), e.getValue());
            }
        }
        return dropped ? new SourcePositions(Map.copyOf(kept)) : this;
    }

    /** How many values have a position (for tests). */
    public int size() {
        return entries.size();
    }
}
