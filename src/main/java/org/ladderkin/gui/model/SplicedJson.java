package org.ladderkin.gui.model;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Saves an edited plan as its original file text with only the changed values rewritten, so a one-field edit is a
 * one-line change in version control and the author's key order, spacing and number spellings survive. Each changed
 * value's text is spliced in at its place in the original text; a removed key takes its comma with it; added keys go
 * after the last key of their object, in the object's own style (one line or one key per line). Whatever this cannot
 * express (say, keys removed and added in one object) rewrites that object alone. The result is read back and must
 * equal the edited document, else the caller writes the whole document afresh.
 */
final class SplicedJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** Objects of values with at most this many keys are written on one line, as in "absorbance". */
    private static final int SMALL_OBJECT = 3;

    /** A value's place in the text: [start, end); members or items when it is a container. */
    private static final class Span {
        final int start;
        int end;
        final List<String> keys = new ArrayList<>();
        final List<Integer> keyStarts = new ArrayList<>();
        final List<Span> children = new ArrayList<>();

        Span(int start) {
            this.start = start;
        }
    }

    /** One replacement of [start, end) by text. */
    private record Patch(int start, int end, String text) {
    }

    private final String text;
    private final String newline;
    private final String indentUnit;
    private int pos;

    private SplicedJson(String text) {
        this.text = text;
        this.newline = text.contains("\r\n") ? "\r\n" : "\n";
        this.indentUnit = detectIndentUnit(text);
    }

    /**
     * {@code original} (the file's text, which reads as {@code before}) changed so that it reads as {@code after}, or
     * empty when that cannot be done by splicing.
     */
    static Optional<String> update(String original, JsonNode before, JsonNode after) {
        try {
            SplicedJson s = new SplicedJson(original);
            Span root = s.scan();
            List<Patch> patches = new ArrayList<>();
            s.diff(root, before, after, patches);
            patches.sort(Comparator.comparingInt(Patch::start).reversed());
            StringBuilder b = new StringBuilder(original);
            int limit = Integer.MAX_VALUE;
            for (Patch p : patches) {
                if (p.end() > limit) {
                    return Optional.empty(); // overlapping changes: not expected, but never written wrong
                }
                b.replace(p.start(), p.end(), p.text());
                limit = p.start();
            }
            String result = b.toString();
            String json = result.startsWith("\uFEFF") ? result.substring(1) : result;
            return after.equals(MAPPER.readTree(json)) ? Optional.of(result) : Optional.empty();
        } catch (JsonProcessingException | RuntimeException e) {
            return Optional.empty();
        }
    }

    // ---- comparing ---------------------------------------------------------------------------------------------

    private void diff(Span span, JsonNode before, JsonNode after, List<Patch> out) {
        if (before.equals(after)) {
            return;
        }
        if (before instanceof ObjectNode b && after instanceof ObjectNode a && !span.keys.isEmpty()) {
            diffObject(span, b, a, out);
        } else if (before instanceof ArrayNode b && after instanceof ArrayNode a && b.size() == a.size()) {
            for (int i = 0; i < a.size(); i++) {
                diff(span.children.get(i), b.get(i), a.get(i), out);
            }
        } else {
            out.add(new Patch(span.start, span.end, write(after, indentAt(span.start), oneLine(span))));
        }
    }

    private void diffObject(Span span, ObjectNode before, ObjectNode after, List<Patch> out) {
        List<String> added = new ArrayList<>();
        after.fieldNames().forEachRemaining(k -> {
            if (!before.has(k)) {
                added.add(k);
            }
        });
        List<Integer> removed = new ArrayList<>();
        for (int i = 0; i < span.keys.size(); i++) {
            if (!after.has(span.keys.get(i))) {
                removed.add(i);
            }
        }
        boolean allRemoved = removed.size() == span.keys.size();
        if (!added.isEmpty() && !removed.isEmpty() || allRemoved) {
            out.add(new Patch(span.start, span.end, write(after, indentAt(span.start), oneLine(span))));
            return;
        }
        for (int i = 0; i < span.keys.size(); i++) {
            String k = span.keys.get(i);
            if (after.has(k)) {
                diff(span.children.get(i), before.get(k), after.get(k), out);
            }
        }
        int firstKept = 0;
        while (removed.contains(firstKept)) {
            firstKept++;
        }
        if (firstKept > 0) {
            // leading keys go up to the first key that stays, so it takes their place and no comma is left over
            out.add(new Patch(span.keyStarts.get(0), span.keyStarts.get(firstKept), ""));
        }
        for (int i : removed) {
            if (i > firstKept) {
                out.add(new Patch(span.children.get(i - 1).end, span.children.get(i).end, ""));
            }
        }
        if (!added.isEmpty()) {
            int last = span.keys.size() - 1;
            boolean inline = oneLine(span);
            String indent = indentAt(span.keyStarts.get(last));
            StringBuilder insert = new StringBuilder();
            for (String k : added) {
                insert.append(inline ? ", " : "," + newline + indent)
                        .append(quote(k)).append(": ").append(write(after.get(k), indent, inline));
            }
            int at = span.children.get(last).end;
            out.add(new Patch(at, at, insert.toString()));
        }
    }

    // ---- writing new values in the file's style ----------------------------------------------------------------

    /** A value as text; {@code indent} is the indentation of the line it starts on. */
    private String write(JsonNode n, String indent, boolean inline) {
        if (n.isValueNode() || n.isEmpty()) {
            return n.isContainerNode() ? (n.isArray() ? "[]" : "{}") : scalar(n);
        }
        boolean scalarsOnly = true;
        for (JsonNode child : n) {
            scalarsOnly &= child.isValueNode();
        }
        String open = n.isArray() ? "[" : "{";
        String close = n.isArray() ? "]" : "}";
        // the plans' own style: lists of values and small groups of values on one line
        if (inline || scalarsOnly && (n.isArray() || n.size() <= SMALL_OBJECT)) {
            List<String> parts = new ArrayList<>();
            if (n.isArray()) {
                n.forEach(item -> parts.add(write(item, indent, true)));
                return open + String.join(", ", parts) + close;
            }
            n.fields().forEachRemaining(e -> parts.add(quote(e.getKey()) + ": " + write(e.getValue(), indent, true)));
            return "{ " + String.join(", ", parts) + " }";
        }
        String inner = indent + indentUnit;
        StringBuilder b = new StringBuilder(open);
        if (n.isArray()) {
            Iterator<JsonNode> items = n.elements();
            while (items.hasNext()) {
                b.append(newline).append(inner).append(write(items.next(), inner, false)).append(items.hasNext() ? "," : "");
            }
        } else {
            Iterator<Map.Entry<String, JsonNode>> fields = n.fields();
            while (fields.hasNext()) {
                Map.Entry<String, JsonNode> e = fields.next();
                b.append(newline).append(inner).append(quote(e.getKey())).append(": ")
                        .append(write(e.getValue(), inner, false)).append(fields.hasNext() ? "," : "");
            }
        }
        return b.append(newline).append(indent).append(close).toString();
    }

    private static String scalar(JsonNode n) {
        try {
            return MAPPER.writeValueAsString(n);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write a JSON value", e);
        }
    }

    private static String quote(String key) {
        try {
            return MAPPER.writeValueAsString(key);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write a JSON key", e);
        }
    }

    private boolean oneLine(Span span) {
        return text.indexOf('\n', span.start) < 0 || text.indexOf('\n', span.start) >= span.end;
    }

    /** The leading white space of the line holding {@code offset}. */
    private String indentAt(int offset) {
        int lineStart = text.lastIndexOf('\n', offset - 1) + 1;
        int i = lineStart;
        while (i < text.length() && (text.charAt(i) == ' ' || text.charAt(i) == '\t')) {
            i++;
        }
        return text.substring(lineStart, i);
    }

    /** The indentation of the first indented line ("  " when there is none). */
    private static String detectIndentUnit(String text) {
        for (String line : text.split("\n")) {
            int i = 0;
            while (i < line.length() && (line.charAt(i) == ' ' || line.charAt(i) == '\t')) {
                i++;
            }
            if (i > 0 && i < line.length()) {
                return line.substring(0, i);
            }
        }
        return "  ";
    }

    // ---- scanning (the text is known to be well-formed JSON: the file was read from it) -----------------------

    private Span scan() {
        pos = 0;
        Span root = value();
        skipSpace();
        if (pos != text.length()) {
            throw new IllegalArgumentException("content after the document");
        }
        return root;
    }

    private Span value() {
        skipSpace();
        Span s = new Span(pos);
        char c = text.charAt(pos);
        if (c == '{') {
            pos++;
            skipSpace();
            if (text.charAt(pos) != '}') {
                while (true) {
                    skipSpace();
                    s.keyStarts.add(pos);
                    s.keys.add(string());
                    skipSpace();
                    expect(':');
                    s.children.add(value());
                    skipSpace();
                    if (text.charAt(pos) == ',') {
                        pos++;
                        continue;
                    }
                    break;
                }
            }
            expect('}');
        } else if (c == '[') {
            pos++;
            skipSpace();
            if (text.charAt(pos) != ']') {
                while (true) {
                    s.children.add(value());
                    skipSpace();
                    if (text.charAt(pos) == ',') {
                        pos++;
                        continue;
                    }
                    break;
                }
            }
            expect(']');
        } else if (c == '"') {
            string();
        } else {
            while (pos < text.length() && ",]} \t\r\n".indexOf(text.charAt(pos)) < 0) {
                pos++;
            }
        }
        s.end = pos;
        return s;
    }

    /** Skips a string and returns its decoded content. */
    private String string() {
        int start = pos;
        expect('"');
        while (text.charAt(pos) != '"') {
            pos += text.charAt(pos) == '\\' ? 2 : 1;
        }
        pos++;
        try {
            return MAPPER.readValue(text.substring(start, pos), String.class);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not a JSON string", e);
        }
    }

    private void expect(char c) {
        if (text.charAt(pos) != c) {
            throw new IllegalArgumentException("expected '" + c + "' at " + pos);
        }
        pos++;
    }

    private void skipSpace() {
        while (pos < text.length() && " \t\r\n\uFEFF".indexOf(text.charAt(pos)) >= 0) {
            pos++;
        }
    }
}
