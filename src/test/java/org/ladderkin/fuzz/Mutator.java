package org.ladderkin.fuzz;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns a valid input into a hostile one, deterministically from a {@link Random}. Each mutation returns the bytes to
 * write and a short name, so a failure can say what was done. Mutations know JSON (fields deleted, duplicated, renamed,
 * retyped) and tables (cells, headers, columns) besides the format-blind ones (bytes, truncation, lines, BOM, CRLF).
 */
final class Mutator {

    /** A mutated input: the bytes and what was done to them. */
    record Mutant(byte[] bytes, String what) {
    }

    private static final ObjectMapper JSON = new ObjectMapper();

    /** Numbers a careless or hostile file holds. */
    static final List<String> NASTY_NUMBERS = List.of("NaN", "Infinity", "-Infinity", "1e308", "-1e308", "1e-308", "-1", "0",
            "-0", "4.9e-324", "1e999", "0x10", "1,5", "", " ", "+", "-", "1e", "..1", "9".repeat(400), "1_000", "٣",
            "1.7976931348623157E308", "2147483648", "-2147483649");
    /** Units that are unknown, of the wrong kind, or spelled strangely. */
    static final List<String> NASTY_UNITS = List.of("furlong", "ps/ps", "K", "", "µ", "m^2", "nm nm", "kHz/s", "photons", "%",
            "J/cm²/s", "cm-2", "eV", "ms", "um", "\u0000", "nm\n", "mJ/cm2", "OD", "1/s");
    /** Text that should be echoed back escaped, never raw. */
    static final List<String> NASTY_TEXT = List.of("\n", "\r\n", "\u0000", "\u0007", "\u001b[31m", "\u2028", "\ufeff", "é", "😀",
            "\ud800", "<script>alert(1)</script>", "\"", "\\", "'", "%s%n", "${x}", "../../etc/passwd", "/proc/self/environ",
            "\t");

    private final Random rnd;
    private final boolean huge;

    /** @param huge whether the 10 MB mutations may be drawn (rarely even then, to keep runs fast) */
    Mutator(Random rnd, boolean huge) {
        this.rnd = rnd;
        this.huge = huge;
    }

    /** One random mutation of {@code seed}, chosen among those that suit its format. */
    Mutant mutate(byte[] seed, Format format) {
        String text = new String(seed, StandardCharsets.UTF_8);
        int pick = rnd.nextInt(100);
        if (format == Format.BINARY) {
            return pick < 70 ? byteFlips(seed) : pick < 90 ? truncate(seed) : insertBytes(seed);
        }
        if (huge && rnd.nextInt(400) == 0) {
            return longLine(text);
        }
        if (pick < 10) {
            return byteFlips(seed);
        }
        if (pick < 16) {
            return truncate(seed);
        }
        if (pick < 24) {
            return lines(text);
        }
        if (pick < 28) {
            return whole(text);
        }
        if (format == Format.JSON) {
            Mutant m = json(text);
            if (m != null) {
                return m;
            }
            return quantityInText(text);
        }
        return table(text);
    }

    enum Format {
        JSON, TABLE, BINARY
    }

    // ---- format-blind -------------------------------------------------------------------------------------------

    private Mutant byteFlips(byte[] seed) {
        byte[] b = seed.clone();
        int n = 1 + rnd.nextInt(4);
        for (int i = 0; i < n && b.length > 0; i++) {
            int at = rnd.nextInt(b.length);
            b[at] = (byte) (b[at] ^ (1 << rnd.nextInt(8)));
        }
        return new Mutant(b, n + " bit flips");
    }

    private Mutant insertBytes(byte[] seed) {
        int at = seed.length == 0 ? 0 : rnd.nextInt(seed.length);
        byte[] junk = new byte[1 + rnd.nextInt(16)];
        rnd.nextBytes(junk);
        byte[] b = new byte[seed.length + junk.length];
        System.arraycopy(seed, 0, b, 0, at);
        System.arraycopy(junk, 0, b, at, junk.length);
        System.arraycopy(seed, at, b, at + junk.length, seed.length - at);
        return new Mutant(b, junk.length + " random bytes inserted at " + at);
    }

    private Mutant truncate(byte[] seed) {
        int at = seed.length == 0 ? 0 : rnd.nextInt(seed.length);
        byte[] b = new byte[at];
        System.arraycopy(seed, 0, b, 0, at);
        return new Mutant(b, "truncated at byte " + at);
    }

    private Mutant lines(String text) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        int i = rnd.nextInt(lines.size());
        String what;
        switch (rnd.nextInt(4)) {
            case 0 -> {
                lines.remove(i);
                what = "line " + (i + 1) + " deleted";
            }
            case 1 -> {
                lines.add(i, lines.get(i));
                what = "line " + (i + 1) + " duplicated";
            }
            case 2 -> {
                int j = rnd.nextInt(lines.size());
                String t = lines.get(i);
                lines.set(i, lines.get(j));
                lines.set(j, t);
                what = "lines " + (i + 1) + " and " + (j + 1) + " swapped";
            }
            default -> {
                String s = lines.get(i);
                int at = s.isEmpty() ? 0 : rnd.nextInt(s.length());
                String junk = pick(NASTY_TEXT);
                lines.set(i, s.substring(0, at) + junk + s.substring(at));
                what = "text " + escape(junk) + " inserted in line " + (i + 1);
            }
        }
        return text(String.join("\n", lines), what);
    }

    private Mutant whole(String text) {
        return switch (rnd.nextInt(5)) {
            case 0 -> text("\ufeff" + text, "byte-order mark");
            case 1 -> text(text.replace("\n", "\r\n"), "CRLF line ends");
            case 2 -> text(text.replace("\n", "\r"), "CR line ends");
            case 3 -> text("", "empty file");
            default -> new Mutant(text.getBytes(StandardCharsets.UTF_16LE), "UTF-16 encoded");
        };
    }

    /** One line of 10 MB: a reader must refuse it or read it in time, not hang on it. */
    private Mutant longLine(String text) {
        String fill = rnd.nextBoolean() ? "9" : "a";
        int at = text.isEmpty() ? 0 : rnd.nextInt(text.length());
        return text(text.substring(0, at) + fill.repeat(10_000_000) + text.substring(at), "a 10 MB run of '" + fill + "' at " + at);
    }

    // ---- JSON ---------------------------------------------------------------------------------------------------

    private Mutant json(String text) {
        JsonNode root;
        try {
            root = JSON.readTree(text);
        } catch (Exception e) {
            return null;
        }
        if (root == null || !root.isContainerNode()) {
            return null;
        }
        List<String> paths = new ArrayList<>();
        collect(root, "", paths);
        if (paths.isEmpty()) {
            return null;
        }
        String path = pick(paths);
        int kind = rnd.nextInt(100);
        if (kind < 8) {
            return duplicateField(text, path);
        }
        if (kind < 12) {
            return deepNesting(root, path);
        }
        JsonNode copy = root.deepCopy();
        String what = mutateAt(copy, path, kind);
        if (what == null) {
            return null;
        }
        try {
            return text(JSON.writerWithDefaultPrettyPrinter().writeValueAsString(copy), what);
        } catch (Exception e) {
            return null;
        }
    }

    private static void collect(JsonNode n, String at, List<String> out) {
        if (!at.isEmpty()) {
            out.add(at);
        }
        if (n.isObject()) {
            for (Iterator<String> it = n.fieldNames(); it.hasNext();) {
                String f = it.next();
                collect(n.get(f), at + "/" + f.replace("~", "~0").replace("/", "~1"), out);
            }
        } else if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                collect(n.get(i), at + "/" + i, out);
            }
        }
    }

    private String mutateAt(JsonNode root, String path, int kind) {
        int cut = path.lastIndexOf('/');
        JsonNode parent = root.at(path.substring(0, cut));
        String last = path.substring(cut + 1).replace("~1", "/").replace("~0", "~");
        JsonNode old = root.at(path);
        JsonNode replacement;
        String what;
        if (kind < 30 && parent.isObject()) {
            ((ObjectNode) parent).remove(last);
            return "field " + path + " deleted";
        }
        if (kind < 38 && parent.isObject()) {
            ObjectNode o = (ObjectNode) parent;
            String renamed = switch (rnd.nextInt(4)) {
                case 0 -> last.toUpperCase(java.util.Locale.ROOT);
                case 1 -> last + "s";
                case 2 -> last.isEmpty() ? "x" : last.substring(1);
                default -> last + pick(NASTY_TEXT);
            };
            JsonNode v = o.remove(last);
            o.set(renamed, v);
            return "field " + path + " renamed to " + escape(renamed);
        }
        if (kind < 60 && old.isTextual()) {
            String s = old.asText();
            String changed = quantity(s);
            replacement = JsonNodeFactory.instance.textNode(changed);
            what = "text at " + path + " set to " + escape(changed);
        } else if (kind < 72 && old.isNumber()) {
            String n = pick(NASTY_NUMBERS);
            replacement = numberNode(n);
            what = "number at " + path + " set to " + escape(n);
        } else {
            replacement = wrongType(old);
            what = "value at " + path + " replaced by " + escape(replacement.toString());
        }
        if (parent.isObject()) {
            ((ObjectNode) parent).set(last, replacement);
        } else if (parent.isArray()) {
            ArrayNode a = (ArrayNode) parent;
            int i = Integer.parseInt(last);
            if (rnd.nextInt(5) == 0) {
                a.insert(i, replacement);
                what += " (inserted)";
            } else {
                a.set(i, replacement);
            }
        }
        return what;
    }

    private JsonNode numberNode(String n) {
        try {
            double d = Double.parseDouble(n);
            if (Double.isFinite(d) && rnd.nextBoolean()) {
                return JsonNodeFactory.instance.numberNode(d);
            }
        } catch (NumberFormatException e) {
            // not a JSON number: written as text below
        }
        return JsonNodeFactory.instance.textNode(n);
    }

    private JsonNode wrongType(JsonNode old) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        return switch (rnd.nextInt(8)) {
            case 0 -> f.nullNode();
            case 1 -> f.booleanNode(rnd.nextBoolean());
            case 2 -> f.numberNode(rnd.nextBoolean() ? 1e308 : -3);
            case 3 -> f.textNode(old.isTextual() ? old.asText() + pick(NASTY_TEXT) : old.toString());
            case 4 -> f.arrayNode().add(old.deepCopy());
            case 5 -> f.objectNode().set("value", old.deepCopy());
            case 6 -> f.arrayNode();
            default -> f.objectNode();
        };
    }

    /** A quantity's number or unit replaced, or the text replaced by something nasty. */
    private String quantity(String s) {
        Matcher m = QUANTITY.matcher(s);
        int k = rnd.nextInt(6);
        if (m.matches() && k < 4) {
            return k < 2 ? pick(NASTY_NUMBERS) + " " + m.group(2) : k == 2 ? m.group(1) + " " + pick(NASTY_UNITS)
                    : pick(NASTY_NUMBERS) + pick(NASTY_UNITS);
        }
        return switch (k) {
            case 4 -> s + pick(NASTY_TEXT);
            case 5 -> rnd.nextBoolean() ? "" : "x".repeat(rnd.nextBoolean() ? 300 : 60_000);
            default -> pick(NASTY_TEXT) + s;
        };
    }

    private static final Pattern QUANTITY = Pattern.compile("\\s*([-+0-9.eE]+)\\s*(\\S.*)");

    private Mutant quantityInText(String text) {
        Matcher m = Pattern.compile("\"([-+0-9.eE]+) ?([^\"0-9][^\"]*)\"").matcher(text);
        List<int[]> spans = new ArrayList<>();
        while (m.find()) {
            spans.add(new int[] {m.start(1), m.end(1)});
        }
        if (spans.isEmpty()) {
            return byteFlips(text.getBytes(StandardCharsets.UTF_8));
        }
        int[] s = spans.get(rnd.nextInt(spans.size()));
        String n = pick(NASTY_NUMBERS);
        return text(text.substring(0, s[0]) + n + text.substring(s[1]), "quantity number set to " + escape(n));
    }

    private Mutant duplicateField(String text, String path) {
        String name = path.substring(path.lastIndexOf('/') + 1);
        Matcher m = Pattern.compile("(?m)^[ \\t]*\"" + Pattern.quote(name) + "\"\\s*:[^\\n{\\[]*,?\\s*$").matcher(text);
        if (!m.find()) {
            return quantityInText(text);
        }
        String line = m.group();
        String dup = line.endsWith(",") ? line : line + ",";
        return text(text.substring(0, m.start()) + dup + "\n" + text.substring(m.start()), "field '" + name + "' duplicated");
    }

    private Mutant deepNesting(JsonNode root, String path) {
        int depth = rnd.nextBoolean() ? 200 : 20_000;
        JsonNode copy = root.deepCopy();
        int cut = path.lastIndexOf('/');
        JsonNode parent = copy.at(path.substring(0, cut));
        String last = path.substring(cut + 1);
        String marker = "\"@@nest@@\"";
        if (parent.isObject()) {
            ((ObjectNode) parent).set(last.replace("~1", "/").replace("~0", "~"), JsonNodeFactory.instance.textNode("@@nest@@"));
        } else if (parent.isArray()) {
            ((ArrayNode) parent).set(Integer.parseInt(last), JsonNodeFactory.instance.textNode("@@nest@@"));
        }
        String nested = "[".repeat(depth) + "1" + "]".repeat(depth);
        if (rnd.nextBoolean()) {
            nested = "{\"a\":".repeat(depth) + "1" + "}".repeat(depth);
        }
        return text(copy.toString().replace(marker, nested), "value at " + path + " nested " + depth + " deep");
    }

    // ---- tables -------------------------------------------------------------------------------------------------

    private Mutant table(String text) {
        List<String> lines = new ArrayList<>(List.of(text.split("\n", -1)));
        List<Integer> data = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            if (!lines.get(i).isBlank() && !lines.get(i).startsWith("#")) {
                data.add(i);
            }
        }
        if (data.isEmpty()) {
            return byteFlips(text.getBytes(StandardCharsets.UTF_8));
        }
        String sep = text.contains("\t") ? "\t" : text.contains(";") ? ";" : ",";
        int header = data.get(0);
        int k = rnd.nextInt(100);
        int row = k < 25 ? header : data.get(rnd.nextInt(data.size()));
        List<String> cells = new ArrayList<>(List.of(lines.get(row).split(Pattern.quote(sep), -1)));
        int c = rnd.nextInt(cells.size());
        String what;
        if (k < 12) {
            String cell = cells.get(c);
            Matcher m = Pattern.compile("\\(([^)]*)\\)").matcher(cell);
            String unit = pick(NASTY_UNITS);
            cells.set(c, m.find() ? cell.substring(0, m.start(1)) + unit + cell.substring(m.end(1)) : cell + " (" + unit + ")");
            what = "header cell " + (c + 1) + " unit set to " + escape(unit);
        } else if (k < 25) {
            String t = rnd.nextInt(4) == 0 ? "x".repeat(60_000) : cells.get(c) + pick(NASTY_TEXT);
            cells.set(c, t);
            what = "header cell " + (c + 1) + " set to " + escape(t);
        } else if (k < 70) {
            String n = rnd.nextInt(5) == 0 ? pick(NASTY_TEXT) : pick(NASTY_NUMBERS);
            cells.set(c, n);
            what = "row " + (row + 1) + " cell " + (c + 1) + " set to " + escape(n);
        } else if (k < 80) {
            cells.remove(c);
            what = "row " + (row + 1) + " cell " + (c + 1) + " removed";
        } else if (k < 88) {
            cells.add(c, pick(NASTY_NUMBERS));
            what = "row " + (row + 1) + " extra cell at " + (c + 1);
        } else if (k < 94) {
            for (int i = 0; i < cells.size(); i++) {
                cells.set(i, "-" + cells.get(i));
            }
            what = "row " + (row + 1) + " negated";
        } else {
            for (int r : data) {
                List<String> cs = new ArrayList<>(List.of(lines.get(r).split(Pattern.quote(sep), -1)));
                if (c < cs.size()) {
                    cs.remove(c);
                }
                lines.set(r, String.join(sep, cs));
            }
            return text(String.join("\n", lines), "column " + (c + 1) + " removed");
        }
        lines.set(row, String.join(sep, cells));
        return text(String.join("\n", lines), what);
    }

    // ---- helpers ------------------------------------------------------------------------------------------------

    private <T> T pick(List<T> from) {
        return from.get(rnd.nextInt(from.size()));
    }

    private static Mutant text(String s, String what) {
        return new Mutant(s.getBytes(StandardCharsets.UTF_8), what);
    }

    /** A description safe to print: control characters escaped, cut after 80 characters. */
    static String escape(String s) {
        String cut = s.length() > 80 ? s.substring(0, 80) + "…(" + s.length() + " chars)" : s;
        StringBuilder b = new StringBuilder("'");
        for (char ch : cut.toCharArray()) {
            b.append(ch < 0x20 || ch == 0x7f || ch == '\u2028' ? String.format("\\u%04x", (int) ch) : String.valueOf(ch));
        }
        return b.append('\'').toString();
    }
}
