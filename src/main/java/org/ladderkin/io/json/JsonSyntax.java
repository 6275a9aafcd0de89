package org.ladderkin.io.json;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Words a JSON syntax error for the person who edits the file. Jackson's own messages name its classes, its feature
 * flags and character codes, and some quote the document's text; here each kind of mistake becomes one short
 * sentence with what is expected instead. The location comes separately, from the parser.
 */
final class JsonSyntax {

    private static final Pattern CHARACTER = Pattern.compile("Unexpected character \\('(.)' \\(code \\d+\\)\\)");
    private static final Pattern TOKEN = Pattern.compile("(?:Unrecognized|Non-standard) token '([^']*)'");
    private static final Pattern START = Pattern.compile("line: (\\d+), column: (\\d+)\\]");
    private static final Pattern CONTROL = Pattern.compile("CTRL-CHAR, code (\\d+)");
    private static final Pattern ESCAPE = Pattern.compile("Unrecognized character escape '(.)'");
    private static final Pattern CLOSE = Pattern.compile("Unexpected close marker '(.)': expected '(.)'");
    private static final String VALUES = "a string in double quotes, a number, an object, a list, true, false or null";

    private JsonSyntax() {
    }

    /** One sentence for Jackson's message {@code original}, without parser names or the document's text. */
    static String describe(String original) {
        String m = original == null ? "" : original;
        String c = group(CHARACTER, m);
        if (m.contains("comma to separate Object entries")) {
            return "expected ',' or '}' after a value" + found(c);
        }
        if (m.contains("comma to separate Array entries")) {
            return "expected ',' or ']' after a value" + found(c);
        }
        if (m.contains("double-quote to start field name")) {
            return "}".equals(c) ? "expected a field name after ',' (a comma after the last field is not allowed)"
                    : "expected a field name in double quotes" + found(c);
        }
        if (m.contains("colon to separate field name")) {
            return "expected ':' after the field name" + found(c);
        }
        if (m.contains("maybe a (non-standard) comment")) {
            return "comments are not allowed in JSON (remove the line, or keep notes in a \"note\" string)";
        }
        String token = group(TOKEN, m);
        if (token != null && (token.equals("NaN") || token.contains("Infinity"))) {
            return "'" + token + "' is not a JSON number (write a finite number)";
        }
        if (token != null) {
            return "unknown word '" + token + "' (expected " + VALUES + ")";
        }
        if (m.contains("in numeric value") || m.contains("Invalid numeric value")) {
            return "malformed number" + numberHint(m);
        }
        if (m.contains("expected a valid value") || m.contains("expected a value")) {
            if ("'".equals(c)) {
                return "strings take double quotes, not single quotes";
            }
            if ("]".equals(c) || "}".equals(c)) {
                return "expected a value before '" + c + "' (a value after ':', or no comma after the last item)";
            }
            return "unexpected character" + quoted(c) + " (expected " + VALUES + ")";
        }
        Matcher close = CLOSE.matcher(m);
        if (close.find()) {
            return "found '" + close.group(1) + "' where '" + close.group(2) + "' should close the "
                    + (close.group(2).equals("]") ? "list" : "object") + opened(m);
        }
        if (m.contains("no open Array to close") || m.contains("no open Object to close")) {
            return "'" + (m.contains("Array") ? "]" : "}") + "' closes nothing (no "
                    + (m.contains("Array") ? "list" : "object") + " is open here)";
        }
        if (m.contains("end-of-input")) {
            if (m.contains("close marker for Object")) {
                return "the file ends inside an object (missing '}' for the object" + opened(m) + ")";
            }
            if (m.contains("close marker for Array")) {
                return "the file ends inside a list (missing ']' for the list" + opened(m) + ")";
            }
            if (m.contains("quote")) {
                return "the file ends inside a string (missing closing '\"')";
            }
            return "the file ends too early (an object, list or string is not closed)";
        }
        String control = group(CONTROL, m);
        if (control != null) {
            return control.equals("10") || control.equals("13")
                    ? "a line break inside a string (close the string with '\"' first, or write \\n)"
                    : String.format(java.util.Locale.ROOT, "a control character (U+%04X) inside a string (write it as \\u%04x)", Integer.parseInt(control),
                            Integer.parseInt(control));
        }
        String escape = group(ESCAPE, m);
        if (escape != null) {
            return "unknown escape '\\" + escape + "' in a string (allowed: \\\" \\\\ \\/ \\b \\f \\n \\r \\t \\uXXXX)";
        }
        if (m.contains("exceeds the maximum")) {
            return "the document nests too deeply or holds a value too long to read";
        }
        return c != null ? "unexpected character '" + c + "'" : "not well-formed JSON";
    }

    private static String numberHint(String m) {
        if (m.contains("Leading zeroes")) {
            return " (a number does not start with 0 unless it is 0 or 0.something)";
        }
        if (m.contains("plus sign")) {
            return " (write 5, not +5)";
        }
        if (m.contains("minus sign")) {
            return " (a digit must follow '-')";
        }
        if (m.contains("Decimal point")) {
            return " (a digit must follow '.': write 1.0, not 1.)";
        }
        if (m.contains("Exponent")) {
            return " (a digit must follow the exponent: write 1e-3)";
        }
        return " (write numbers such as 12, -0.5 or 1.5e-3)";
    }

    private static String opened(String m) {
        Matcher s = START.matcher(m);
        return s.find() ? " opened at line " + s.group(1) + ", column " + s.group(2) : "";
    }

    private static String found(String c) {
        return c == null ? "" : ", found '" + c + "'";
    }

    private static String quoted(String c) {
        return c == null ? "" : " '" + c + "'";
    }

    private static String group(Pattern p, String m) {
        Matcher matcher = p.matcher(m);
        return matcher.find() ? matcher.group(1) : null;
    }
}
