package org.ladderkin.gui.model;

import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Objects;

/**
 * A form field's place in the plan document, spelled the way {@link org.ladderkin.io.InputException#field()} names
 * fields ({@code laser.pulseEnergyRange[1]}, {@code instruments[0].irfFwhm}) so an error from the plan reader lands
 * on the field that shows the offending value. Everything else is Jackson's JSON Pointer support on the equivalent
 * {@link JsonPointer}: reading ({@link JsonNode#at}), creating what is missing ({@code withObject}, {@code withArray})
 * and removing; only the growth of a list up to an index, which Jackson leaves to the caller, is done here.
 */
public final class JsonPath {

    private final String text;
    private final JsonPointer pointer;
    // a pointer cannot tell "[1]" from ".1"; the path can
    private final boolean lastIsIndex;

    private JsonPath(String text, JsonPointer pointer) {
        this.text = text;
        this.pointer = pointer;
        this.lastIsIndex = text.endsWith("]");
    }

    /** Parses {@code a.b[2].c}; names are non-empty, indexes are whole numbers ≥ 0. */
    public static JsonPath of(String text) {
        Objects.requireNonNull(text, "path");
        JsonPointer p = JsonPointer.empty();
        int i = 0;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (c == '[') {
                int close = text.indexOf(']', i);
                if (close < 0) {
                    throw new IllegalArgumentException("unclosed '[' in path '" + text + "'");
                }
                p = p.appendIndex(Integer.parseInt(text.substring(i + 1, close)));
                i = close + 1;
            } else if (c == '.') {
                i++;
            } else {
                int end = i;
                while (end < text.length() && text.charAt(end) != '.' && text.charAt(end) != '[') {
                    end++;
                }
                p = p.appendProperty(text.substring(i, end));
                i = end;
            }
        }
        if (p.matches()) {
            throw new IllegalArgumentException("empty path");
        }
        return new JsonPath(text, p);
    }

    /** The same place as a JSON Pointer ("/laser/pulseEnergyRange/1"). */
    public JsonPointer pointer() {
        return pointer;
    }

    /** The node at this path, or null when any step is missing. */
    public JsonNode get(JsonNode root) {
        JsonNode n = root.at(pointer);
        return n.isMissingNode() ? null : n;
    }

    /**
     * Puts {@code value} at this path, creating missing objects and arrays on the way (Jackson's
     * {@link JsonNode#withObject(JsonPointer, JsonNode.OverwriteMode, boolean)}); a list the value goes into grows
     * with empty strings up to the index, so a form may fill the second end of a range before the first.
     */
    public void set(ObjectNode root, JsonNode value) {
        JsonPointer parent = pointer.head();
        JsonPointer last = pointer.last();
        if (lastIsIndex) {
            ArrayNode array = root.withArray(parent, JsonNode.OverwriteMode.ALL, true);
            int index = last.getMatchingIndex();
            while (array.size() <= index) {
                array.add("");
            }
            array.set(index, value);
        } else {
            ObjectNode object = parent.matches() ? root : root.withObject(parent, JsonNode.OverwriteMode.ALL, true);
            object.set(last.getMatchingProperty(), value);
        }
    }

    /** Removes the value at this path if present (an object field; array items are never removed by a form). */
    public void remove(ObjectNode root) {
        if (root.at(pointer.head()) instanceof ObjectNode parent) {
            parent.remove(pointer.last().getMatchingProperty());
        }
    }

    /**
     * Whether a problem reported at {@code errorPath} concerns the field bound to this path: the same path, an item
     * inside this list, or the whole list this item belongs to. A problem with a whole object (say, "sample") does
     * not mark every field inside it.
     */
    public boolean concerns(String errorPath) {
        if (errorPath == null || errorPath.isEmpty()) {
            return false;
        }
        return errorPath.equals(text) || errorPath.startsWith(text + "[") || errorPath.startsWith(text + ".")
                || text.startsWith(errorPath + "[");
    }

    @Override
    public String toString() {
        return text;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof JsonPath p && p.text.equals(text);
    }

    @Override
    public int hashCode() {
        return text.hashCode();
    }
}
