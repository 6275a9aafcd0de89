package org.ladderkin.io;

/**
 * What kind of thing is wrong with an input, independent of how the message words it. Tests, the desktop planner and
 * anything else that reacts to bad input match on this key; the wording stays free to improve.
 */
public enum InputProblem {
    /** A required field, column or header part is absent. */
    MISSING_FIELD,
    /** A table cell that must hold a value is empty. */
    MISSING_VALUE,
    /** A field nobody reads here (usually a misspelling). */
    UNKNOWN_FIELD,
    /** The same field, header, label or list entry appears twice. */
    DUPLICATE,
    /** A value of the wrong JSON type (a number where a string belongs, an object where a list belongs). */
    WRONG_TYPE,
    /** A value outside what is allowed (negative, above one, not whole, too large). */
    OUT_OF_RANGE,
    /** Values that must be ordered are not (a reversed range, delays that do not increase). */
    BAD_ORDER,
    /** A unit that is not known, or not of the dimension asked for in a header. */
    UNKNOWN_UNIT,
    /** A unit is missing, or measures something else than the field (an energy where a time belongs). */
    WRONG_UNIT,
    /** Text that does not read as a number. */
    BAD_NUMBER,
    /** A word that is not among the allowed choices. */
    BAD_CHOICE,
    /** Fields that exclude each other are given together. */
    CONFLICT,
    /** Two parts of the input disagree (counts that differ, a label or key that matches nothing). */
    MISMATCH,
    /** The document's {@code schema} names another kind of document or an unsupported version. */
    WRONG_SCHEMA,
    /** Malformed JSON or CSV: the text does not have the shape of the format at all. */
    BAD_SYNTAX,
    /** No data, or too few items, rows or columns to work with. */
    EMPTY,
    /** A named file does not exist. */
    NOT_FOUND,
    /** The file exists but cannot be read as text (not UTF-8, an I/O error). */
    UNREADABLE,
    /**
     * A value the domain refuses for a reason none of the other keys names, typically a record constructor's own
     * check; also the key of the untyped {@code Node.error(String)}.
     */
    INVALID_VALUE;

    /** The key for a quantity that did not read. */
    public static InputProblem of(org.ladderkin.units.QuantityFormatException e) {
        return switch (e.reason()) {
            case BAD_NUMBER -> BAD_NUMBER;
            case OUT_OF_RANGE -> OUT_OF_RANGE;
            case MISSING_UNIT, WRONG_DIMENSION -> WRONG_UNIT;
            case UNKNOWN_UNIT -> UNKNOWN_UNIT;
        };
    }
}
