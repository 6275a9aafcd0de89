package org.ladderkin.io;

import java.util.Objects;
import org.ladderkin.units.Excerpt;

/**
 * Bad input, located as precisely as known. The message reads
 * {@code FILE:LINE:COLUMN: field 'x': what is wrong (what is allowed)}, the form compilers use, so editors can jump to it.
 * The {@link #key()} says what kind of problem it is, so callers and tests need not parse the wording.
 */
public final class InputException extends RuntimeException {

    private final SourceLocation location;
    private final String field;
    private final InputProblem key;
    private final String detail;

    /**
     * @param location where (file, and line/column when known)
     * @param field    the dotted path of the field, or null when the problem is not about one field
     * @param key      what kind of problem
     * @param detail   what is wrong, with what is allowed in parentheses
     */
    public InputException(SourceLocation location, String field, InputProblem key, String detail) {
        super(compose(location, field, detail));
        this.location = Objects.requireNonNull(location, "location");
        this.field = field;
        this.key = Objects.requireNonNull(key, "key");
        this.detail = Objects.requireNonNull(detail, "detail");
    }

    public InputException(SourceLocation location, String field, InputProblem key, String detail, Throwable cause) {
        this(location, field, key, detail);
        initCause(cause);
    }

    public SourceLocation location() {
        return location;
    }

    /** Dotted path of the offending field (e.g. "laser.repetitionRates[1]"), or null. */
    public String field() {
        return field;
    }

    /** What kind of problem this is. */
    public InputProblem key() {
        return key;
    }

    /** What is wrong, without the location prefix. */
    public String problem() {
        return detail;
    }

    /** Longest field path shown; a field name comes from the user's file and may be anything. */
    private static final int MAX_FIELD_SHOWN = 120;

    private static String compose(SourceLocation location, String field, String detail) {
        StringBuilder b = new StringBuilder(location.toString()).append(": ");
        if (field != null && !field.isEmpty()) {
            String shown = field.length() > MAX_FIELD_SHOWN ? field.substring(0, MAX_FIELD_SHOWN) + "…" : field;
            b.append("field '").append(shown).append("': ");
        }
        // the user's text may hold anything: control characters are written as escapes so the message stays one line
        return Excerpt.escaped(b.append(shortened(detail)).toString());
    }

    /** Longest problem text shown whole; beyond it the middle goes, keeping the start and the "(allowed)" end. */
    static final int MAX_DETAIL_SHOWN = 600;

    /**
     * A reader that quotes the user's value without {@link Excerpt} (a header cell, a line) would otherwise put
     * megabytes into one message.
     */
    private static String shortened(String detail) {
        if (detail.length() <= MAX_DETAIL_SHOWN) {
            return detail;
        }
        int head = MAX_DETAIL_SHOWN * 2 / 3;
        int tail = MAX_DETAIL_SHOWN - head;
        return detail.substring(0, head) + "… (" + (detail.length() - head - tail) + " characters left out) …"
                + detail.substring(detail.length() - tail);
    }
}
