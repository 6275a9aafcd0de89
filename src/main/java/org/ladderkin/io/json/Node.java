package org.ladderkin.io.json;

import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Excerpt;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;
import org.ladderkin.units.Unit;

/**
 * One value of a JSON document with its position: a view over a Jackson node, its JSON Pointer, the document's
 * {@link SourcePositions} and the name messages give the document. Readers ask an object node for the fields they know
 * and then call {@link #finish()}, which rejects any field nobody asked for: a misspelt field never passes silently.
 * Every accessor throws {@link InputException} located at the offending value; a value without a position (edited
 * after the file was read) is located at the file alone and still names its field.
 */
public final class Node {

    /** JSON value kinds. */
    public enum Kind { OBJECT, ARRAY, STRING, NUMBER, BOOLEAN, NULL }

    private final JsonNode json;
    private final JsonPointer pointer;
    private final SourcePositions positions;
    private final String file;
    private final String path;
    private final Kind kind;
    private final String text;
    private final Set<String> asked = new LinkedHashSet<>();
    // one view per child, so that what a reader asked of a child is still known when it calls finish() on it
    private final Map<String, Node> children = new HashMap<>();
    private List<Node> items;

    private Node(JsonNode json, JsonPointer pointer, SourcePositions positions, String file, String path) {
        this.json = json;
        this.pointer = pointer;
        this.positions = positions;
        this.file = file;
        this.path = path;
        this.kind = kindOf(json);
        this.text = switch (kind) {
            case STRING -> json.textValue();
            case NUMBER -> Objects.requireNonNullElseGet(positions.literal(pointer), json::asText);
            case BOOLEAN -> json.asText();
            case NULL -> "null";
            default -> null;
        };
    }

    /**
     * The root of a document.
     *
     * @param json        the Jackson tree
     * @param positions   where its values started ({@link SourcePositions#NONE} for a tree built in memory)
     * @param displayName how messages name the document
     */
    public static Node of(JsonNode json, SourcePositions positions, String displayName) {
        return new Node(Objects.requireNonNull(json, "json"), JsonPointer.empty(),
                Objects.requireNonNull(positions, "positions"), Objects.requireNonNull(displayName, "displayName"), "");
    }

    private static Kind kindOf(JsonNode n) {
        if (n == null || n.isNull() || n.isMissingNode()) {
            return Kind.NULL;
        }
        if (n.isObject()) {
            return Kind.OBJECT;
        }
        if (n.isArray()) {
            return Kind.ARRAY;
        }
        if (n.isNumber()) {
            return Kind.NUMBER;
        }
        if (n.isBoolean()) {
            return Kind.BOOLEAN;
        }
        return Kind.STRING;
    }

    public Kind kind() {
        return kind;
    }

    public SourceLocation location() {
        return positions.location(pointer, file);
    }

    /** Dotted path from the document root, e.g. "laser.spots.pump". */
    public String path() {
        return path;
    }

    /** JSON Pointer from the document root, e.g. "/laser/spots/pump". */
    public JsonPointer pointer() {
        return pointer;
    }

    /** The Jackson node this view reads. */
    public JsonNode json() {
        return json;
    }

    /** An error of kind {@code key} located at this value and naming its field. */
    public InputException error(InputProblem key, String problem) {
        return new InputException(location(), path.isEmpty() ? null : path, key, problem);
    }

    /**
     * An error located at this value, of kind {@link InputProblem#INVALID_VALUE}: for readers that have not said
     * what kind of problem they report. Prefer {@link #error(InputProblem, String)}.
     */
    public InputException error(String problem) {
        return error(InputProblem.INVALID_VALUE, problem);
    }

    private Node child(String name) {
        return children.computeIfAbsent(name, n -> new Node(json.get(n), pointer.appendProperty(n), positions, file,
                path.isEmpty() ? n : path + "." + n));
    }

    private boolean present(String name) {
        JsonNode n = json.get(name);
        return n != null && !n.isNull();
    }

    // ---- objects ---------------------------------------------------------------------------------------------

    /** The required field {@code name} of this object. */
    public Node field(String name) {
        requireKind(Kind.OBJECT, "an object");
        asked.add(name);
        if (!present(name)) {
            String where = path.isEmpty() ? "" : " in '" + path + "'";
            throw new InputException(location(), path.isEmpty() ? name : path + "." + name, InputProblem.MISSING_FIELD,
                    "missing required field" + where + " (add \"" + name + "\": ...)");
        }
        return child(name);
    }

    /** The field {@code name} if present and not null. */
    public Optional<Node> optional(String name) {
        requireKind(Kind.OBJECT, "an object");
        asked.add(name);
        return present(name) ? Optional.of(child(name)) : Optional.empty();
    }

    /** Whether this object has a non-null field {@code name}; does not count as reading it. */
    public boolean has(String name) {
        requireKind(Kind.OBJECT, "an object");
        return present(name);
    }

    /** Field names in document order. */
    public List<String> fieldNames() {
        requireKind(Kind.OBJECT, "an object");
        List<String> names = new ArrayList<>();
        json.fieldNames().forEachRemaining(names::add);
        return List.copyOf(names);
    }

    /** Requires exactly one of the given fields and returns its name. */
    public String oneOf(String... names) {
        List<String> present = new ArrayList<>();
        for (String n : names) {
            asked.add(n);
            if (has(n)) {
                present.add(n);
            }
        }
        if (present.size() != 1) {
            String choices = String.join("', '", names);
            throw error(present.isEmpty() ? InputProblem.MISSING_FIELD : InputProblem.CONFLICT, present.isEmpty()
                    ? "needs one of '" + choices + "'"
                    : "give only one of '" + String.join("', '", present) + "' (they say the same thing)");
        }
        return present.get(0);
    }

    /** Rejects any field that no reader asked for, naming the ones allowed here. */
    public void finish() {
        requireKind(Kind.OBJECT, "an object");
        for (Iterator<String> names = json.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            if (!asked.contains(name)) {
                Node unknown = child(name);
                throw new InputException(unknown.location(), unknown.path, InputProblem.UNKNOWN_FIELD,
                        "unknown field (allowed here: " + String.join(", ", asked) + ")");
            }
        }
    }

    /**
     * Checks the document's {@code schema} field against {@code name/version} and returns the version found.
     * Files from a newer ladderkin are refused rather than half-read.
     */
    public int schema(String name, int newestVersion) {
        Node s = field("schema");
        String v = s.string();
        String prefix = name + "/";
        if (!v.startsWith(prefix)) {
            throw s.error(InputProblem.WRONG_SCHEMA, "expected schema '" + name + "/" + newestVersion + "', found '" + Excerpt.of(v) + "'");
        }
        int version;
        try {
            version = Integer.parseInt(v.substring(prefix.length()));
        } catch (NumberFormatException e) {
            throw s.error(InputProblem.WRONG_SCHEMA, "schema version must be a whole number, found '" + Excerpt.of(v) + "'");
        }
        if (version < 1 || version > newestVersion) {
            throw s.error(InputProblem.WRONG_SCHEMA, "unsupported schema version " + version + " (this build reads " + name + "/1 to /" + newestVersion + ")");
        }
        return version;
    }

    // ---- arrays ----------------------------------------------------------------------------------------------

    /** The items of this array. */
    public List<Node> items() {
        requireKind(Kind.ARRAY, "an array");
        if (items == null) {
            List<Node> list = new ArrayList<>(json.size());
            for (int i = 0; i < json.size(); i++) {
                list.add(new Node(json.get(i), pointer.appendIndex(i), positions, file, path + "[" + i + "]"));
            }
            items = List.copyOf(list);
        }
        return items;
    }

    /** The items of this array, requiring at least {@code min}. */
    public List<Node> items(int min) {
        List<Node> list = items();
        if (list.size() < min) {
            throw error(InputProblem.EMPTY, "needs at least " + min + " item" + (min == 1 ? "" : "s") + ", found " + list.size());
        }
        return list;
    }

    /** Maps every item of this array. */
    public <T> List<T> map(Function<Node, T> reader) {
        List<T> out = new ArrayList<>();
        for (Node n : items()) {
            out.add(reader.apply(n));
        }
        return Collections.unmodifiableList(out);
    }

    // ---- scalars ---------------------------------------------------------------------------------------------

    public String string() {
        requireKind(Kind.STRING, "a string");
        return text;
    }

    /**
     * This string as a path under {@code base}; a string the file system cannot name (a NUL character) is this field's
     * error, not the file system's unlocated one.
     */
    public java.nio.file.Path path(java.nio.file.Path base) {
        String s = string();
        try {
            return base.resolve(s);
        } catch (java.nio.file.InvalidPathException e) {
            throw error(InputProblem.INVALID_VALUE, "'" + Excerpt.of(s) + "' is not a usable path: " + e.getReason());
        }
    }

    public boolean bool() {
        requireKind(Kind.BOOLEAN, "true or false");
        return json.booleanValue();
    }

    /** A finite JSON number. */
    public double number() {
        requireKind(Kind.NUMBER, "a number");
        double number = json.doubleValue();
        if (!Double.isFinite(number)) {
            throw error(InputProblem.OUT_OF_RANGE, "number out of range: " + text);
        }
        return number;
    }

    /** A whole JSON number within [min, max]. */
    public int integer(int min, int max) {
        requireKind(Kind.NUMBER, "a whole number");
        double number = json.doubleValue();
        if (number != Math.rint(number) || text.contains(".") || text.contains("e") || text.contains("E")) {
            throw error(InputProblem.OUT_OF_RANGE, "must be a whole number, was " + Excerpt.of(text));
        }
        if (number < min || number > max) {
            throw error(InputProblem.OUT_OF_RANGE, "must be between " + min + " and " + max + ", was " + Excerpt.of(text));
        }
        return (int) number;
    }

    /** A string among {@code allowed}, case-sensitive. */
    public String choice(String... allowed) {
        String s = string();
        for (String a : allowed) {
            if (a.equals(s)) {
                return s;
            }
        }
        throw error(InputProblem.BAD_CHOICE, "'" + Excerpt.of(s) + "' is not one of: " + String.join(", ", allowed));
    }

    /**
     * A quantity: a string with a unit ("20 ns") or a bare number taken in {@code documentedUnit}.
     *
     * @param documentedUnit unit of a bare number, or null when a unit must be written
     */
    public Quantity quantity(Dimension dimension, Unit documentedUnit) {
        if (kind == Kind.NUMBER) {
            if (documentedUnit == null) {
                throw error(InputProblem.WRONG_UNIT, "a bare number needs a unit here: write it as a string such as \"" + dimension.example() + "\"");
            }
            return new Quantity(number(), documentedUnit);
        }
        if (kind != Kind.STRING) {
            throw error(InputProblem.WRONG_TYPE, "expected " + dimension.label() + " as a string with a unit such as \"" + dimension.example()
                    + "\", found " + describe());
        }
        try {
            return Quantity.parse(text, dimension);
        } catch (QuantityFormatException e) {
            throw error(InputProblem.of(e), e.getMessage());
        }
    }

    /** SI value of a quantity that must be > 0 and finite. */
    public double positive(Dimension dimension, Unit documentedUnit) {
        Quantity q = quantity(dimension, documentedUnit);
        if (!(q.si() > 0)) {
            throw error(InputProblem.OUT_OF_RANGE, "must be > 0, was " + q.format());
        }
        return q.si();
    }

    /** SI value of a quantity that must be ≥ 0. */
    public double nonNegative(Dimension dimension, Unit documentedUnit) {
        Quantity q = quantity(dimension, documentedUnit);
        if (q.si() < 0) {
            throw error(InputProblem.OUT_OF_RANGE, "must be >= 0, was " + q.format());
        }
        return q.si();
    }

    /** A probability or fraction in [0, 1]; "25 %" is accepted. */
    public double probability() {
        double p = quantity(Dimension.DIMENSIONLESS, org.ladderkin.units.Units.of("")).si();
        if (p < 0 || p > 1) {
            throw error(InputProblem.OUT_OF_RANGE, "must be a probability between 0 and 1, was " + (kind == Kind.STRING ? Excerpt.of(text) : p));
        }
        return p;
    }

    private void requireKind(Kind wanted, String description) {
        if (kind != wanted) {
            throw error(InputProblem.WRONG_TYPE, "expected " + description + ", found " + describe());
        }
    }

    private String describe() {
        return switch (kind) {
            case OBJECT -> "an object";
            case ARRAY -> "an array";
            case STRING -> "the string \"" + text + "\"";
            case NUMBER -> "the number " + text;
            case BOOLEAN -> text;
            case NULL -> "null";
        };
    }
}
