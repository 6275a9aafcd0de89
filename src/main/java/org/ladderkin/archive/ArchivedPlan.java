package org.ladderkin.archive;

import java.util.Objects;

/**
 * A plan row read back.
 *
 * @param id        row id
 * @param addedAt   ISO-8601 instant the row was written
 * @param sampleId  the sample's row id
 * @param sample    the sample
 * @param plan      the plan
 */
public record ArchivedPlan(long id, String addedAt, long sampleId, SampleEntry sample, PlanEntry plan) {

    public ArchivedPlan {
        Objects.requireNonNull(addedAt, "addedAt");
        Objects.requireNonNull(sample, "sample");
        Objects.requireNonNull(plan, "plan");
    }
}
