package org.ladderkin.fit;

/**
 * Told how far a fit has got, for a progress bar. Called on the fitting thread; implementations must be quick and must
 * not throw.
 */
@FunctionalInterface
public interface FitProgress {

    /** Ignores all progress. */
    FitProgress NONE = (stage, done, total) -> { };

    /**
     * @param stage "start" while start vectors are tried, "profile KEY" while a profile is traced
     * @param done  steps finished in this stage
     * @param total steps expected in this stage (for a profile, an upper estimate)
     */
    void update(String stage, int done, int total);
}
