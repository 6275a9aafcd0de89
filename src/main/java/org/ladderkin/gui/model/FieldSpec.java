package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.TextNode;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.QuantityFormatException;

/**
 * One form field: what it is called, where its text lives in the plan document and how to check it while the user
 * types. Forms are tables of these, so adapting a form to a changed plan schema means editing a table.
 *
 * @param label     what the form shows next to the field
 * @param path      where the value lives in the plan document
 * @param kind      how text maps to JSON
 * @param dimension what a quantity measures (for {@link Kind#QUANTITY} and {@link Kind#QUANTITY_LIST}), else null
 * @param choices   allowed words (for {@link Kind#CHOICE} and {@link Kind#KEY_SET}), file-name extensions offered
 *                  for {@link Kind#FILE}, else empty
 * @param optional  a blank field removes the key from the document instead of storing ""
 * @param help      one sentence for the tooltip, in the user's words (no file keys)
 * @param choiceLabels what a form shows for a choice ("biexciton Auger lifetime" for "biexciton-auger"); a choice
 *                  missing here is shown as written
 */
public record FieldSpec(String label, JsonPath path, Kind kind, Dimension dimension, List<String> choices,
                        boolean optional, String help, Map<String, String> choiceLabels) {

    /** How the text of a field maps to JSON. */
    public enum Kind {
        /** Free text, stored as a JSON string. */
        TEXT,
        /** A quantity with a unit ("50 nJ"), stored as a string. */
        QUANTITY,
        /** Comma-separated quantities ("400 nm, 515 nm"), stored as an array of strings. */
        QUANTITY_LIST,
        /** Comma-separated whole numbers ≥ 1 ("1, 2, 5"), stored as an array of numbers. */
        INTEGER_LIST,
        /** A fraction in [0, 1], written "6 %" or "0.06", stored as a string. */
        FRACTION,
        /** One word from {@link #choices()}, stored as a string. */
        CHOICE,
        /** A set of words from {@link #choices()}, stored as an array of strings; text is comma-separated. */
        KEY_SET,
        /**
         * A data file the plan refers to (a spectrum, an IRF), stored as a string: relative to the plan file's folder,
         * or absolute. Its contents are checked by the plan reader, which names the file and line.
         */
        FILE
    }

    public FieldSpec {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(kind, "kind");
        choices = List.copyOf(choices);
        help = help == null ? "" : help;
        choiceLabels = Map.copyOf(choiceLabels);
        if ((kind == Kind.QUANTITY || kind == Kind.QUANTITY_LIST) && dimension == null) {
            throw new IllegalArgumentException("quantity field '" + path + "' needs a dimension");
        }
        if ((kind == Kind.CHOICE || kind == Kind.KEY_SET) && choices.isEmpty()) {
            throw new IllegalArgumentException("choice field '" + path + "' needs choices");
        }
    }

    /** A field whose choices are shown as written. */
    public FieldSpec(String label, JsonPath path, Kind kind, Dimension dimension, List<String> choices, boolean optional,
                     String help) {
        this(label, path, kind, dimension, choices, optional, help, Map.of());
    }

    /** A required quantity field. */
    public static FieldSpec quantity(String label, String path, Dimension dimension, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.QUANTITY, dimension, List.of(), false, help);
    }

    /** A quantity field that may be left blank (the key is then removed). */
    public static FieldSpec optionalQuantity(String label, String path, Dimension dimension, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.QUANTITY, dimension, List.of(), true, help);
    }

    public static FieldSpec quantityList(String label, String path, Dimension dimension, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.QUANTITY_LIST, dimension, List.of(), false, help);
    }

    public static FieldSpec integerList(String label, String path, boolean optional, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.INTEGER_LIST, null, List.of(), optional, help);
    }

    public static FieldSpec text(String label, String path, boolean optional, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.TEXT, null, List.of(), optional, help);
    }

    public static FieldSpec fraction(String label, String path, boolean optional, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.FRACTION, null, List.of(), optional, help);
    }

    public static FieldSpec choice(String label, String path, List<String> choices, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.CHOICE, null, choices, false, help);
    }

    /** An optional data file; {@code choices} holds the file-name extensions a chooser offers (e.g. "csv"). */
    public static FieldSpec file(String label, String path, List<String> extensions, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.FILE, null, extensions, true, help);
    }

    public static FieldSpec keySet(String label, String path, List<String> choices, String help) {
        return new FieldSpec(label, JsonPath.of(path), Kind.KEY_SET, null, choices, false, help);
    }

    /** The same field, but a blank value removes the key (the instance is not changed). */
    public FieldSpec asOptional() {
        return new FieldSpec(label, path, kind, dimension, choices, true, help, choiceLabels);
    }

    /** The same field showing its choices in these words. */
    public FieldSpec withChoiceLabels(Map<String, String> labels) {
        return new FieldSpec(label, path, kind, dimension, choices, optional, help, labels);
    }

    /** What a form shows for {@code choice}. */
    public String choiceLabel(String choice) {
        return choiceLabels.getOrDefault(choice, choice);
    }

    /** The text this field shows for the document: "" when absent, list items joined by ", ". */
    public String read(JsonNode document) {
        JsonNode n = path.get(document);
        if (n == null || n.isNull()) {
            return "";
        }
        if (n.isArray()) {
            List<String> parts = new ArrayList<>();
            n.forEach(item -> parts.add(item.isValueNode() ? item.asText() : item.toString()));
            return String.join(", ", parts);
        }
        return n.isValueNode() ? n.asText() : n.toString();
    }

    /**
     * The JSON to store for {@code text}, or empty when the key should be removed (a blank optional field).
     * Text that does not parse is stored as typed so that the document keeps what the user wrote; the plan reader
     * then reports it at this path.
     */
    public Optional<JsonNode> toJson(String text) {
        String t = text.strip();
        if (t.isEmpty() && optional) {
            return Optional.empty();
        }
        JsonNodeFactory f = JsonNodeFactory.instance;
        return Optional.of(switch (kind) {
            case QUANTITY, FRACTION -> TextNode.valueOf(decimalPoint(t));
            case TEXT, CHOICE, FILE -> TextNode.valueOf(t);
            case QUANTITY_LIST, KEY_SET -> {
                ArrayNode a = f.arrayNode();
                splitList(t).forEach(a::add);
                yield a;
            }
            case INTEGER_LIST -> {
                ArrayNode a = f.arrayNode();
                for (String part : splitList(t)) {
                    try {
                        a.add(Integer.parseInt(part));
                    } catch (NumberFormatException e) {
                        a.add(part);
                    }
                }
                yield a;
            }
        });
    }

    /** The problem with {@code text} for this field alone, or empty when it reads well. */
    public Optional<String> check(String text) {
        String t = text.strip();
        if (t.isEmpty()) {
            return optional ? Optional.empty() : Optional.of("required (e.g. " + example() + ")");
        }
        try {
            switch (kind) {
                case TEXT, FILE -> { }
                case QUANTITY -> positive(Quantity.parse(decimalPoint(t), dimension));
                case QUANTITY_LIST -> {
                    Optional<String> comma = decimalCommaInList(t);
                    if (comma.isPresent()) {
                        return comma;
                    }
                    for (String part : splitList(t)) {
                        positive(Quantity.parse(part, dimension));
                    }
                }
                case FRACTION -> {
                    double p = Quantity.parse(decimalPoint(t), Dimension.DIMENSIONLESS).si();
                    if (p < 0 || p > 1) {
                        return Optional.of("must be a fraction between 0 and 1 (e.g. \"5 %\"), was " + t);
                    }
                }
                case INTEGER_LIST -> {
                    for (String part : splitList(t)) {
                        int v;
                        try {
                            v = Integer.parseInt(part);
                        } catch (NumberFormatException e) {
                            return Optional.of("'" + part + "' is not a whole number");
                        }
                        if (v < 1) {
                            return Optional.of("must be whole numbers >= 1, was " + part);
                        }
                    }
                }
                case CHOICE -> {
                    if (!choices.contains(t)) {
                        return Optional.of("'" + t + "' is not one of: " + String.join(", ", choices));
                    }
                }
                case KEY_SET -> {
                    Set<String> seen = new LinkedHashSet<>();
                    for (String part : splitList(t)) {
                        if (!choices.contains(part)) {
                            return Optional.of("'" + part + "' is not one of: " + String.join(", ", choices));
                        }
                        if (!seen.add(part)) {
                            return Optional.of("'" + part + "' is listed twice");
                        }
                    }
                }
            }
        } catch (QuantityFormatException e) {
            return Optional.of(e.getMessage());
        }
        return Optional.empty();
    }

    /** The plan reader's own words for the same problem, so a field and the status bar never disagree. */
    private static void positive(Quantity q) {
        if (!(q.si() > 0) && q.unit().offsetSi() == 0) {
            throw new QuantityFormatException(q.format(), QuantityFormatException.Reason.OUT_OF_RANGE, "must be > 0, was " + q.format());
        }
    }

    /** A single number written with a decimal comma ("1,5 nJ"), or null. */
    private static final Pattern DECIMAL_COMMA = Pattern.compile("^([+-]?\\d+),(\\d+(?:[eE][+-]?\\d+)?)(\\s*[^\\d,;].*)?$");

    /**
     * "1,5 nJ" read as "1.5 nJ", as the trace tables read decimal commas; stored with a point so the plan file reads
     * the same everywhere. Only one value: in a list the comma separates items.
     */
    static String decimalPoint(String text) {
        Matcher m = DECIMAL_COMMA.matcher(text);
        return m.matches() ? m.group(1) + "." + m.group(2) + (m.group(3) == null ? "" : m.group(3)) : text;
    }

    /** In a list, "1,5 nJ" is the items "1" and "5 nJ": said plainly instead of "missing unit in '1'". */
    private Optional<String> decimalCommaInList(String text) {
        List<String> parts = splitList(text);
        for (int i = 0; i + 1 < parts.size(); i++) {
            String joined = parts.get(i) + "," + parts.get(i + 1);
            // "1, 2 nJ" is a list with a unit missing; only "1,2 nJ" without a space reads as a decimal comma
            if (parts.get(i).matches("[+-]?\\d+") && parts.get(i + 1).matches("\\d.*") && text.contains(joined)) {
                return Optional.of("'" + joined + "': commas separate the items of this list; write decimals with a point ("
                        + decimalPoint(joined) + ")");
            }
        }
        return Optional.empty();
    }

    private String example() {
        return switch (kind) {
            case QUANTITY, QUANTITY_LIST -> "\"" + dimension.example() + "\"";
            case FRACTION -> "\"5 %\"";
            case INTEGER_LIST -> "\"1, 2, 5\"";
            case CHOICE, KEY_SET -> choices.get(0);
            case TEXT -> "a name";
            case FILE -> "\"spectrum.csv\"";
        };
    }

    /** Items of a comma- or semicolon-separated list, blanks dropped. */
    static List<String> splitList(String text) {
        List<String> out = new ArrayList<>();
        for (String part : text.split("[,;]")) {
            if (!part.isBlank()) {
                out.add(part.strip());
            }
        }
        return out;
    }
}
