package org.ladderkin.units;

/**
 * A user's text made safe to echo in a one-line message: control characters escaped, long text cut with "…".
 * A value pasted from somewhere else can hold a newline or run to megabytes; the message must still be one short line.
 */
public final class Excerpt {

    /** Characters of the user's text a message shows at most. */
    public static final int MAX_SHOWN = 60;

    private Excerpt() {
    }

    /** {@code text} with control characters written as escapes ({@code \n}, {@code \u0000}) and cut after {@link #MAX_SHOWN}. */
    public static String of(String text) {
        if (text == null) {
            return "null";
        }
        boolean cut = text.length() > MAX_SHOWN;
        return escaped(cut ? text.substring(0, MAX_SHOWN) : text) + (cut ? "…" : "");
    }

    /** {@code text} on one line: control characters written as escapes, nothing cut. */
    public static String escaped(String text) {
        StringBuilder b = null;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean control = Character.isISOControl(c) || c == '\u2028' || c == '\u2029';
            if (control && b == null) {
                b = new StringBuilder(text.length() + 16).append(text, 0, i);
            }
            if (b == null) {
                continue;
            }
            switch (c) {
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> b.append(control ? String.format("\\u%04x", (int) c) : String.valueOf(c));
            }
        }
        return b == null ? text : b.toString();
    }
}
