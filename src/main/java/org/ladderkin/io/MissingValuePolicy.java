package org.ladderkin.io;

/** What a reader does with an empty, NaN or NA cell. */
public enum MissingValuePolicy {
    /** Drop the point from that trace only; the count is kept on the trace and reported. */
    DROP,
    /** Refuse the file at the first missing value. */
    REJECT
}
