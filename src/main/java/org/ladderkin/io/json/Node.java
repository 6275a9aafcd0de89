package org.ladderkin.io.json;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import org.ladderkin.io.InputException;
import org.ladderkin.io.SourceLocation;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;
import org.ladderkin.units.Unit;

/**
 * One value of a JSON document with its position. Readers ask an object node for the fields they know and then
 * call {@link #finish()}, which rejects any field nobody asked for: a misspelt field never passes silently.
 * Every accessor throws {@link InputException} located at the offending value.
 */
public final class Node {

    /** JSON value kinds. */
    public enum Kind { OBJECT, ARRAY, STRING, NUMBER, BOOLEAN, NULL }

    private final Kind kind;
    private final SourceLocation location;
    private final String path;
    private final String text;
    private final double number;
    private final boolean bool;
    private final Map<String, Node> fields;
    private final List<Node> items;
    private final Set<String> asked = new LinkedHashSet<>();

    private Node(Kind kind, SourceLocation location, String path, String text, double number, boolean bool,
                 Map<String, Node> fields, List<Node> items) {
        this.kind = kind;
        this.location = location;
        this.path = path;
        this.text = text;
        this.number = number;
        this.bool = bool;
        this.fields = fields;
        this.items = items;
    }

    static Node object(SourceLocation loc, String path, Map<String, Node> fields) {
        return new Node(Kind.OBJECT, loc, path, null, 0, false, fields, null);
    }

    static Node array(SourceLocation loc, String path, List<Node> items) {
        return new Node(Kind.ARRAY, loc, path, null, 0, false, null, List.copyOf(items));
    }

    static Node scalar(Kind kind, SourceLocation loc, String path, String text, double number, boolean bool) {
        return new Node(kind, loc, path, text, number, bool, null, null);
    }

    public Kind kind() {
        return kind;
    }

    public SourceLocation location() {
        return location;
    }

    /** Dotted path from the document root, e.g. "laser.spots.pump". */
    public String path() {
        return path;
    }

    /** An error located at this value and naming its field. */
    public InputException error(String problem) {
        return new InputException(location, path.isEmpty() ? null : path, problem);
    }

    // ---- objects ---------------------------------------------------------------------------------------------

    /** The required field {@code name} of this object. */
    public Node field(String name) {
        requireKind(Kind.OBJECT, "an object");
        asked.add(name);
        Node n = fields.get(name);
        if (n == null || n.kind == Kind.NULL) {
            String where = path.isEmpty() ? "" : " in '" + path + "'";
            throw new InputException(location, path.isEmpty() ? name : path + "." + name,
                    "missing required field" + where + " (add \"" + name + "\": ...)");
        }
        return n;
    }

    /** The field {@code name} if present and not null. */
    public Optional<Node> optional(String name) {
        requireKind(Kind.OBJECT, "an object");
        asked.add(name);
        Node n = fields.get(name);
        return n == null || n.kind == Kind.NULL ? Optional.empty() : Optional.of(n);
    }

    /** Whether this object has a non-null field {@code name}; does not count as reading it. */
    public boolean has(String name) {
        requireKind(Kind.OBJECT, "an object");
        Node n = fields.get(name);
        return n != null && n.kind != Kind.NULL;
    }

    /** Field names in document order. */
    public List<String> fieldNames() {
        requireKind(Kind.OBJECT, "an object");
        return List.copyOf(fields.keySet());
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
            throw error(present.isEmpty()
                    ? "needs one of '" + choices + "'"
                    : "give only one of '" + String.join("', '", present) + "' (they say the same thing)");
        }
        return present.get(0);
    }

    /** Rejects any field that no reader asked for, naming the ones allowed here. */
    public void finish() {
        requireKind(Kind.OBJECT, "an object");
        for (Map.Entry<String, Node> e : fields.entrySet()) {
            if (!asked.contains(e.getKey())) {
                throw new InputException(e.getValue().location, e.getValue().path,
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
            throw s.error("expected schema '" + name + "/" + newestVersion + "', found '" + v + "'");
        }
        int version;
        try {
            version = Integer.parseInt(v.substring(prefix.length()));
        } catch (NumberFormatException e) {
            throw s.error("schema version must be a whole number, found '" + v + "'");
        }
        if (version < 1 || version > newestVersion) {
            throw s.error("unsupported schema version " + version + " (this build reads " + name + "/1 to /" + newestVersion + ")");
        }
        return version;
    }

    // ---- arrays ----------------------------------------------------------------------------------------------

    /** The items of this array. */
    public List<Node> items() {
        requireKind(Kind.ARRAY, "an array");
        return items;
    }

    /** The items of this array, requiring at least {@code min}. */
    public List<Node> items(int min) {
        List<Node> list = items();
        if (list.size() < min) {
            throw error("needs at least " + min + " item" + (min == 1 ? "" : "s") + ", found " + list.size());
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

    public boolean bool() {
        requireKind(Kind.BOOLEAN, "true or false");
        return bool;
    }

    /** A finite JSON number. */
    public double number() {
        requireKind(Kind.NUMBER, "a number");
        if (!Double.isFinite(number)) {
            throw error("number out of range: " + text);
        }
        return number;
    }

    /** A whole JSON number within [min, max]. */
    public int integer(int min, int max) {
        requireKind(Kind.NUMBER, "a whole number");
        if (number != Math.rint(number) || text.contains(".") || text.contains("e") || text.contains("E")) {
            throw error("must be a whole number, was " + text);
        }
        if (number < min || number > max) {
            throw error("must be between " + min + " and " + max + ", was " + text);
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
        throw error("'" + s + "' is not one of: " + String.join(", ", allowed));
    }

    /**
     * A quantity: a string with a unit ("20 ns") or a bare number taken in {@code documentedUnit}.
     *
     * @param documentedUnit unit of a bare number, or null when a unit must be written
     */
    public Quantity quantity(Dimension dimension, Unit documentedUnit) {
        if (kind == Kind.NUMBER) {
            if (documentedUnit == null) {
                throw error("a bare number needs a unit here: write it as a string such as \"" + dimension.example() + "\"");
            }
            return new Quantity(number(), documentedUnit);
        }
        if (kind != Kind.STRING) {
            throw error("expected " + dimension.label() + " as a string with a unit such as \"" + dimension.example()
                    + "\", found " + describe());
        }
        try {
            return Quantity.parse(text, dimension);
        } catch (QuantityFormatException e) {
            throw error(e.getMessage());
        }
    }

    /** SI value of a quantity that must be > 0 and finite. */
    public double positive(Dimension dimension, Unit documentedUnit) {
        Quantity q = quantity(dimension, documentedUnit);
        if (!(q.si() > 0)) {
            throw error("must be > 0, was " + q.format());
        }
        return q.si();
    }

    /** SI value of a quantity that must be ≥ 0. */
    public double nonNegative(Dimension dimension, Unit documentedUnit) {
        Quantity q = quantity(dimension, documentedUnit);
        if (q.si() < 0) {
            throw error("must be >= 0, was " + q.format());
        }
        return q.si();
    }

    /** A probability or fraction in [0, 1]; "25 %" is accepted. */
    public double probability() {
        double p = quantity(Dimension.DIMENSIONLESS, org.ladderkin.units.Units.of("")).si();
        if (p < 0 || p > 1) {
            throw error("must be a probability between 0 and 1, was " + (kind == Kind.STRING ? text : p));
        }
        return p;
    }

    private void requireKind(Kind wanted, String description) {
        if (kind != wanted) {
            throw error("expected " + description + ", found " + describe());
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
