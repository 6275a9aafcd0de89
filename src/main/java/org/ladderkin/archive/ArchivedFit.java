package org.ladderkin.archive;

import java.util.Objects;
import java.util.Optional;

/**
 * A fit row read back: its id, when it was added, its sample, whether a later fit superseded it, and the fit itself.
 *
 * @param id          row id
 * @param addedAt     ISO-8601 instant the row was written
 * @param sampleId    the sample's row id
 * @param sample      the sample
 * @param superseded  marked superseded (kept, left out of trends by default)
 * @param fit         the fit
 */
public record ArchivedFit(long id, String addedAt, long sampleId, SampleEntry sample, boolean superseded, FitEntry fit) {

    public ArchivedFit {
        Objects.requireNonNull(addedAt, "addedAt");
        Objects.requireNonNull(sample, "sample");
        Objects.requireNonNull(fit, "fit");
    }

    /** The parameter with trade key {@code key}, if the fit has it. */
    public Optional<FitParameter> parameter(String key) {
        return fit.parameters().stream().filter(p -> p.key().equals(key)).findFirst();
    }
}
