package org.ladderkin.archive;

import java.util.Objects;

/**
 * A sample row read back with how many plans and fits hang on it.
 *
 * @param id       row id
 * @param addedAt  ISO-8601 instant the row was written
 * @param sample   the sample
 * @param plans    plans linked to it
 * @param fits     fits linked to it (superseded ones included)
 */
public record ArchivedSample(long id, String addedAt, SampleEntry sample, int plans, int fits) {

    public ArchivedSample {
        Objects.requireNonNull(addedAt, "addedAt");
        Objects.requireNonNull(sample, "sample");
        if (plans < 0 || fits < 0) {
            throw new IllegalArgumentException("negative row count");
        }
    }
}
