package org.ladderkin.archive;

import java.util.Objects;

/**
 * One sample on a trend plot, in the axes' trade units.
 *
 * @param sample     sample name
 * @param material   material key
 * @param x          x value (> 0: the fit is in log-log)
 * @param y          fitted y value (> 0)
 * @param yStdError  the fit's own standard error of y (> 0)
 * @param fitId      the archive row of the fit
 * @param reportPath the fit's HTML report, or "" when not known
 */
public record TrendPoint(String sample, String material, double x, double y, double yStdError, long fitId, String reportPath) {

    public TrendPoint {
        Objects.requireNonNull(sample, "sample");
        Objects.requireNonNull(material, "material");
        reportPath = reportPath == null ? "" : reportPath;
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new IllegalArgumentException("sample '" + sample + "': x must be > 0 on a log-log trend, was " + x);
        }
        if (!(y > 0) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("sample '" + sample + "': y must be > 0 on a log-log trend, was " + y);
        }
        if (!(yStdError > 0) || !Double.isFinite(yStdError)) {
            throw new IllegalArgumentException("sample '" + sample + "': the fit gives no standard error for y");
        }
    }
}
