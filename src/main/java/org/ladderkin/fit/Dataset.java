package org.ladderkin.fit;

import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * An ordered series of traces to be fitted together (usually one per pump fluence, weakest first as measured) and
 * the files they came from.
 *
 * @param traces      at least one trace; labels are unique
 * @param sourceFiles the files as the user named them (may be empty for data made in memory)
 */
public record Dataset(List<Trace> traces, List<String> sourceFiles) {

    public Dataset {
        traces = List.copyOf(Objects.requireNonNull(traces, "traces"));
        sourceFiles = List.copyOf(Objects.requireNonNull(sourceFiles, "sourceFiles"));
        if (traces.isEmpty()) {
            throw new IllegalArgumentException("a dataset needs at least one trace");
        }
        Set<String> labels = new HashSet<>();
        for (Trace t : traces) {
            if (!labels.add(t.label())) {
                throw new IllegalArgumentException("two traces are labelled '" + t.label() + "' (labels must be unique)");
            }
        }
    }

    /** Number of traces. */
    public int size() {
        return traces.size();
    }

    /** Total number of dropped missing values over all traces. */
    public int droppedMissing() {
        return traces.stream().mapToInt(Trace::droppedMissing).sum();
    }

    /**
     * One line for the user about dropped missing values, e.g. "dropped 4 missing values (a: 1, b: 3)", or empty when
     * none were dropped.
     */
    public String missingSummary() {
        int total = droppedMissing();
        if (total == 0) {
            return "";
        }
        StringBuilder b = new StringBuilder("dropped ").append(total).append(" missing value").append(total == 1 ? "" : "s").append(" (");
        boolean first = true;
        for (Trace t : traces) {
            if (t.droppedMissing() > 0) {
                b.append(first ? "" : ", ").append(t.label()).append(": ").append(t.droppedMissing());
                first = false;
            }
        }
        return b.append(')').toString();
    }

    /** Labels in order. */
    public List<String> labels() {
        return traces.stream().map(Trace::label).toList();
    }

    /** A copy whose traces carry {@code metadata}, one per trace in order. */
    public Dataset withMetadata(List<TraceMetadata> metadata) {
        if (metadata.size() != traces.size()) {
            throw new IllegalArgumentException(metadata.size() + " metadata entries for " + traces.size() + " traces");
        }
        return new Dataset(java.util.stream.IntStream.range(0, traces.size())
                .mapToObj(i -> traces.get(i).withMetadata(metadata.get(i))).toList(), sourceFiles);
    }

    /** This dataset followed by the traces and files of {@code other}. */
    public Dataset concat(Dataset other) {
        List<Trace> all = new java.util.ArrayList<>(traces);
        all.addAll(other.traces);
        List<String> files = new java.util.ArrayList<>(sourceFiles);
        files.addAll(other.sourceFiles);
        return new Dataset(all, files);
    }
}
