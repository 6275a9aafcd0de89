package org.ladderkin.io;

import java.util.Objects;

/**
 * A place in an input file. Line and column count from 1; zero means unknown.
 *
 * @param file   the file as the user named it
 * @param line   line number, or 0 when unknown
 * @param column column number, or 0 when unknown
 */
public record SourceLocation(String file, int line, int column) {

    public SourceLocation {
        Objects.requireNonNull(file, "file");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be >= 0, were " + line + ":" + column);
        }
    }

    /** The whole file, no position. */
    public static SourceLocation of(String file) {
        return new SourceLocation(file, 0, 0);
    }

    /** {@code FILE:LINE:COLUMN}, {@code FILE:LINE} or {@code FILE}, depending on what is known. */
    @Override
    public String toString() {
        // an empty path given on the command line still needs something to point at
        String shown = file.isEmpty() ? "''" : file;
        if (line == 0) {
            return shown;
        }
        return column == 0 ? shown + ":" + line : shown + ":" + line + ":" + column;
    }
}
