package org.ladderkin.io;

import java.util.Objects;

/**
 * Bad input, located as precisely as known. The message reads
 * {@code FILE:LINE:COLUMN: field 'x': what is wrong (what is allowed)}, the form compilers use, so editors can jump to it.
 */
public final class InputException extends RuntimeException {

    private final SourceLocation location;
    private final String field;
    private final String problem;

    /**
     * @param location where (file, and line/column when known)
     * @param field    the dotted path of the field, or null when the problem is not about one field
     * @param problem  what is wrong, with what is allowed in parentheses
     */
    public InputException(SourceLocation location, String field, String problem) {
        super(compose(location, field, problem));
        this.location = Objects.requireNonNull(location, "location");
        this.field = field;
        this.problem = Objects.requireNonNull(problem, "problem");
    }

    public InputException(SourceLocation location, String field, String problem, Throwable cause) {
        this(location, field, problem);
        initCause(cause);
    }

    public SourceLocation location() {
        return location;
    }

    /** Dotted path of the offending field (e.g. "laser.repetitionRates[1]"), or null. */
    public String field() {
        return field;
    }

    /** What is wrong, without the location prefix. */
    public String problem() {
        return problem;
    }

    private static String compose(SourceLocation location, String field, String problem) {
        StringBuilder b = new StringBuilder(location.toString()).append(": ");
        if (field != null && !field.isEmpty()) {
            b.append("field '").append(field).append("': ");
        }
        return b.append(problem).toString();
    }
}
