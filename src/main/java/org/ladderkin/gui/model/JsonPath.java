package org.ladderkin.gui.model;

import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Objects;

/**
 * A form field's place in the plan document, spelled the way {@link org.ladderkin.io.InputException#field()} names
 * fields ({@code laser.pulseEnergyRange[1]}, {@code instruments[0].irfFwhm}) so an error from the plan reader lands
 * on the field that shows the offending value. Reading and removing go through the equivalent Jackson
 * {@link JsonPointer}; only setting is done here, because a form may fill an item beyond the end of a list and
 * Jackson has no "grow the list up to this index" operation.
 */
public final class JsonPath {

    private final String text;
    private final JsonPointer pointer;

    private JsonPath(String text, JsonPointer pointer) {
        this.text = text;
        this.pointer = pointer;
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
     * Puts {@code value} at this path, creating missing objects and arrays on the way; an array grows with empty
     * strings up to the index.
     */
    public void set(ObjectNode root, JsonNode value) {
        JsonNode n = root;
        for (JsonPointer step = pointer; ; step = step.tail()) {
            JsonPointer rest = step.tail();
            if (rest.matches()) {
                put(n, step, value);
                return;
            }
            JsonNode child = child(n, step);
            if (child == null || !child.isContainerNode()) {
                // a pointer cannot say "[1]" from ".1"; the forms' paths never name a field with a number
                child = rest.getMatchingIndex() >= 0
                        ? JsonNodeFactory.instance.arrayNode() : JsonNodeFactory.instance.objectNode();
                put(n, step, child);
            }
            n = child;
        }
    }

    /** Removes the value at this path if present (an object field; array items are never removed by a form). */
    public void remove(ObjectNode root) {
        if (root.at(pointer.head()) instanceof ObjectNode parent) {
            parent.remove(pointer.last().getMatchingProperty());
        }
    }

    private static JsonNode child(JsonNode n, JsonPointer step) {
        return n.isArray() ? n.get(step.getMatchingIndex()) : n.get(step.getMatchingProperty());
    }

    private static void put(JsonNode parent, JsonPointer step, JsonNode value) {
        if (parent instanceof ArrayNode array) {
            int index = step.getMatchingIndex();
            while (array.size() <= index) {
                array.add("");
            }
            array.set(index, value);
        } else {
            ((ObjectNode) parent).set(step.getMatchingProperty(), value);
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
