package org.ladderkin.archive;

import java.util.Objects;

/**
 * A campaign plan as the archive keeps it: the resolved plan document (inputs, predictions and expected errors all
 * in it), and where it came from.
 *
 * @param resolvedJson the plan-resolved document as written (schema ladderkin.plan-resolved/1)
 * @param title        the plan's title
 * @param sourceDir    the output folder, or ""
 * @param toolVersion  ladderkin version that planned
 */
public record PlanEntry(String resolvedJson, String title, String sourceDir, String toolVersion) {

    public PlanEntry {
        Objects.requireNonNull(resolvedJson, "resolvedJson");
        title = title == null ? "" : title;
        sourceDir = sourceDir == null ? "" : sourceDir;
        toolVersion = toolVersion == null ? "" : toolVersion;
    }
}
