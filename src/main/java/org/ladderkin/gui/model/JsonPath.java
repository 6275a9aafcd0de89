package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A dotted path into a JSON document, spelled the way {@link org.ladderkin.io.InputException#field()} names fields:
 * {@code laser.pulseEnergyRange[1]}, {@code instruments[0].irfFwhm}. Forms bind their fields to such paths, so an
 * error from the plan reader lands on the field that shows the offending value.
 */
public final class JsonPath {

    private final String text;
    private final List<Object> steps;

    private JsonPath(String text, List<Object> steps) {
        this.text = text;
        this.steps = List.copyOf(steps);
    }

    /** Parses {@code a.b[2].c}; names are non-empty, indexes are whole numbers ≥ 0. */
    public static JsonPath of(String text) {
        Objects.requireNonNull(text, "path");
        List<Object> steps = new ArrayList<>();
        int i = 0;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (c == '[') {
                int close = text.indexOf(']', i);
                if (close < 0) {
                    throw new IllegalArgumentException("unclosed '[' in path '" + text + "'");
                }
                steps.add(Integer.parseInt(text.substring(i + 1, close)));
                i = close + 1;
            } else if (c == '.') {
                i++;
            } else {
                int end = i;
                while (end < text.length() && text.charAt(end) != '.' && text.charAt(end) != '[') {
                    end++;
                }
                steps.add(text.substring(i, end));
                i = end;
            }
        }
        if (steps.isEmpty()) {
            throw new IllegalArgumentException("empty path");
        }
        return new JsonPath(text, steps);
    }

    /** The node at this path, or null when any step is missing. */
    public JsonNode get(JsonNode root) {
        JsonNode n = root;
        for (Object step : steps) {
            if (n == null) {
                return null;
            }
            n = step instanceof Integer index ? (n.isArray() ? n.get(index) : null) : (n.isObject() ? n.get((String) step) : null);
        }
        return n;
    }

    /**
     * Puts {@code value} at this path, creating missing objects and arrays on the way; an array grows with empty
     * strings up to the index.
     */
    public void set(ObjectNode root, JsonNode value) {
        JsonNode parent = parent(root, true);
        Object last = steps.get(steps.size() - 1);
        if (last instanceof Integer index) {
            ArrayNode array = (ArrayNode) parent;
            while (array.size() <= index) {
                array.add("");
            }
            array.set(index, value);
        } else {
            ((ObjectNode) parent).set((String) last, value);
        }
    }

    /** Removes the value at this path if present (an object field; array items are never removed by a form). */
    public void remove(ObjectNode root) {
        JsonNode parent = parent(root, false);
        Object last = steps.get(steps.size() - 1);
        if (parent instanceof ObjectNode o && last instanceof String name) {
            o.remove(name);
        }
    }

    private JsonNode parent(ObjectNode root, boolean create) {
        JsonNode n = root;
        for (int i = 0; i < steps.size() - 1; i++) {
            Object step = steps.get(i);
            Object next = steps.get(i + 1);
            JsonNode child = step instanceof Integer index ? n.get(index) : n.get((String) step);
            if (child == null || child.isNull() || !(child.isContainerNode())) {
                if (!create) {
                    return null;
                }
                child = next instanceof Integer ? JsonNodeFactory.instance.arrayNode() : JsonNodeFactory.instance.objectNode();
                if (step instanceof Integer index) {
                    ArrayNode array = (ArrayNode) n;
                    while (array.size() <= index) {
                        array.add("");
                    }
                    array.set(index, child);
                } else {
                    ((ObjectNode) n).set((String) step, child);
                }
            }
            n = child;
        }
        return n;
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
