package org.ladderkin.units;

/** Text that could not be read as a quantity. The message names the text and lists what is accepted. */
public final class QuantityFormatException extends IllegalArgumentException {

    private final String text;

    public QuantityFormatException(String text, String message) {
        super(message);
        this.text = text;
    }

    /** The text that could not be read, exactly as given. */
    public String text() {
        return text;
    }
}
