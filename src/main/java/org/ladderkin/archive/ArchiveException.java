package org.ladderkin.archive;

/**
 * The archive could not do what was asked: the database is not one (a damaged file), its schema is newer than this
 * program, a row does not exist, or a value cannot be stored. The {@link Kind} lets the command line pick the input
 * problem and exit code without parsing the wording; the message is one line a person can act on.
 */
public final class ArchiveException extends RuntimeException {

    /** What went wrong. */
    public enum Kind {
        /** The file or server is not a readable archive (damaged SQLite file, refused connection). */
        UNREADABLE,
        /** The archive's schema is newer than this program knows; an older binary must not write to it. */
        NEWER_SCHEMA,
        /** No row with the given id or name. */
        NOT_FOUND,
        /** A value the archive cannot take (a sample under a different material, an unknown quantity). */
        INVALID
    }

    private final Kind kind;

    public ArchiveException(Kind kind, String message) {
        super(message);
        this.kind = java.util.Objects.requireNonNull(kind, "kind");
    }

    public ArchiveException(Kind kind, String message, Throwable cause) {
        this(kind, message);
        initCause(cause);
    }

    public Kind kind() {
        return kind;
    }
}
