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
        StringBuilder b = new StringBuilder(Math.min(text.length(), MAX_SHOWN) + 8);
        int shown = 0;
        for (int i = 0; i < text.length(); i++) {
            if (shown == MAX_SHOWN) {
                return b.append('…').toString();
            }
            char c = text.charAt(i);
            switch (c) {
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029') {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
            shown++;
        }
        return b.toString();
    }
}
