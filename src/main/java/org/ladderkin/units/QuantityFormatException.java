package org.ladderkin.units;

/** Text that could not be read as a quantity. The message names the text and lists what is accepted. */
public final class QuantityFormatException extends IllegalArgumentException {

    /** Why the text was refused, so readers can classify the problem without reading the message. */
    public enum Reason { BAD_NUMBER, OUT_OF_RANGE, MISSING_UNIT, UNKNOWN_UNIT, WRONG_DIMENSION }

    private final String text;
    private final Reason reason;

    public QuantityFormatException(String text, Reason reason, String message) {
        super(message);
        this.text = text;
        this.reason = java.util.Objects.requireNonNull(reason, "reason");
    }

    /** The text that could not be read, exactly as given. */
    public String text() {
        return text;
    }

    public Reason reason() {
        return reason;
    }
}
