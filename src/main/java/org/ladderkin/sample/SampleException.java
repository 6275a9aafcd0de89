package org.ladderkin.sample;

/**
 * A sample description that cannot be resolved. {@link #part()} says which part of the description is at fault, so a
 * reader can point at the right field of the file.
 */
public final class SampleException extends IllegalArgumentException {

    /** The part of the description at fault. */
    public enum Part { SIZE, AMOUNT, CROSS_SECTION }

    private final Part part;

    public SampleException(Part part, String message) {
        super(message);
        this.part = part;
    }

    public SampleException(Part part, String message, Throwable cause) {
        super(message, cause);
        this.part = part;
    }

    public Part part() {
        return part;
    }
}
