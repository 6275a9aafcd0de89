package org.ladderkin.excite.beam;

/**
 * Beam data that cannot give a width. {@link #reason()} says what is wrong and {@link #index()} which sample (point of
 * a scan, pixel of an image in row-major order) it concerns, or -1, so a reader can point at the place in its file.
 */
public final class BeamException extends IllegalArgumentException {

    /** What is wrong with the data. */
    public enum Reason {
        /** Too few points or pixels to fit. */
        TOO_FEW,
        /** The power does not change across the scan, or the edge lies outside it. */
        NO_EDGE,
        /** Blade positions that do not increase (or decrease) strictly. */
        NOT_MONOTONIC,
        /** Nothing above the background. */
        NO_SPOT,
        /** Pixels at the saturation level; {@link #count()} says how many. */
        SATURATED,
        /** The iteration or fit did not settle on a width. */
        NO_CONVERGENCE
    }

    private final Reason reason;
    private final int index;
    private final int count;

    public BeamException(Reason reason, String message, int index, int count) {
        super(message);
        this.reason = reason;
        this.index = index;
        this.count = count;
    }

    public BeamException(Reason reason, String message) {
        this(reason, message, -1, 0);
    }

    public Reason reason() {
        return reason;
    }

    /** The sample concerned (scan point, or row-major pixel index), or -1. */
    public int index() {
        return index;
    }

    /** How many samples are affected (saturated pixels), or 0. */
    public int count() {
        return count;
    }
}
