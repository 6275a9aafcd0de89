package org.ladderkin.archive;

import java.util.Objects;

/**
 * A data file a fit read, with its SHA-256 at fit time, so a later look can tell whether the file changed.
 *
 * @param path    absolute path as the fit saw it
 * @param sha256  lower-case hex digest, or "" when the file could not be read when archived
 */
public record DataFileHash(String path, String sha256) {

    public DataFileHash {
        Objects.requireNonNull(path, "path");
        sha256 = sha256 == null ? "" : sha256;
        if (!sha256.isEmpty() && !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("not a SHA-256 hex digest: " + sha256);
        }
    }
}
