package org.ladderkin.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.ladderkin.archive.ArchiveException;
import org.ladderkin.archive.ArchiveStore;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;

/**
 * Where the archive is: {@code --archive} (a SQLite file or a {@code jdbc:postgresql:} URL), else the
 * {@code LADDERKIN_ARCHIVE} environment variable, else {@code ~/.ladderkin/archive.sqlite}. Opening it turns the
 * archive's own errors into located input errors (exit 3, one line).
 *
 * @param jdbcUrl the URL the store opens
 * @param where   how messages name it (the file, or the URL without its query, which may hold a password)
 */
record ArchiveLocation(String jdbcUrl, String where) {

    /** Environment variable naming the archive when {@code --archive} is not given. */
    static final String ENV = "LADDERKIN_ARCHIVE";

    static ArchiveLocation resolve(String option) {
        String given = option != null && !option.isBlank() ? option.trim() : System.getenv(ENV);
        if (given == null || given.isBlank()) {
            given = Path.of(System.getProperty("user.home"), ".ladderkin", "archive.sqlite").toString();
        }
        if (given.startsWith("jdbc:")) {
            int q = given.indexOf('?');
            return new ArchiveLocation(given, q < 0 ? given : given.substring(0, q));
        }
        Path file = Path.of(given).toAbsolutePath();
        return new ArchiveLocation(ArchiveStore.sqliteUrl(file.toString()), file.toString());
    }

    /** Opens the archive (creating a SQLite file and its folder when missing). */
    ArchiveStore open() {
        if (jdbcUrl.startsWith("jdbc:sqlite:")) {
            Path file = Path.of(where);
            try {
                if (file.getParent() != null) {
                    Files.createDirectories(file.getParent());
                }
            } catch (IOException e) {
                throw new InputException(SourceLocation.of(where), null, InputProblem.UNREADABLE,
                        "cannot create the archive's folder (" + e.getMessage() + ")");
            }
            if (Files.isDirectory(file)) {
                throw new InputException(SourceLocation.of(where), null, InputProblem.UNREADABLE,
                        "is a folder, not an archive file");
            }
        }
        try {
            return ArchiveStore.open(jdbcUrl, where);
        } catch (ArchiveException e) {
            throw located(e);
        }
    }

    /** The archive's error as an input error at the archive's place. */
    InputException located(ArchiveException e) {
        InputProblem key = switch (e.kind()) {
            case UNREADABLE -> InputProblem.UNREADABLE;
            case NEWER_SCHEMA -> InputProblem.WRONG_SCHEMA;
            case NOT_FOUND -> InputProblem.NOT_FOUND;
            case INVALID -> InputProblem.INVALID_VALUE;
        };
        String m = e.getMessage();
        String detail = m.startsWith(where + ": ") ? m.substring(where.length() + 2) : m;
        return new InputException(SourceLocation.of(where), null, key, detail, e);
    }
}
