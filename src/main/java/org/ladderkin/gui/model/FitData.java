package org.ladderkin.gui.model;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.CopyOnWriteArrayList;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.io.InputException;
import org.ladderkin.io.MissingValuePolicy;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceSidecarCodec;
import org.ladderkin.io.TraceTableReader;

/**
 * The measured side of the fit tab: the loaded trace tables (with their {@code NAME.traces.json} sidecars), each
 * trace's excitation as the user typed it, checked as it is typed, and the located message of a load that failed.
 *
 * <p>Threads: only the caller changes this model (the event thread in the planner; no worker ever does). Changes are
 * serialized on this object so a test calling from two threads stays safe, and each replaces one immutable
 * {@link Traces} value, so readers on any thread see the traces and their texts from the same load. Listeners are
 * told after the change, on the thread that made it.
 */
public final class FitData {

    /** Sidecar file next to a trace table: {@code NAME.traces.json} for {@code NAME.csv}. */
    static final String SIDECAR_SUFFIX = ".traces.json";

    /** One load and the excitation texts typed since, replaced whole on every change. */
    private record Traces(Dataset dataset, List<String> texts, List<ExcitationText.Reading> readings, String summary) {

        Traces withText(int i, String text) {
            List<String> t = new ArrayList<>(texts);
            t.set(i, text);
            return new Traces(dataset, List.copyOf(t), readAll(dataset, t), summary);
        }
    }

    private final List<Runnable> listeners = new CopyOnWriteArrayList<>();
    private volatile Traces traces;
    private volatile String loadProblem = "";

    /** {@code l} is told after every change, on the thread that made it. */
    public void addListener(Runnable l) {
        listeners.add(Objects.requireNonNull(l, "listener"));
    }

    /**
     * Loads trace tables, replacing the traces loaded before. On bad input nothing loaded before changes and the
     * one-line message, located to the file (and line), is returned and kept in {@link #loadProblem()}.
     */
    public Optional<String> load(List<Path> files) {
        Optional<String> problem;
        synchronized (this) {
            problem = read(files);
        }
        fire();
        return problem;
    }

    private Optional<String> read(List<Path> files) {
        Dataset read;
        try {
            read = TraceTableReader.readAll(files, new TableOptions(null, MissingValuePolicy.DROP));
            for (Path f : files) {
                Path sidecar = sidecarOf(f);
                if (Files.isRegularFile(sidecar)) {
                    read = TraceSidecarCodec.apply(sidecar, read);
                }
            }
        } catch (InputException | IllegalArgumentException e) {
            loadProblem = e.getMessage();
            return Optional.of(loadProblem);
        }
        List<String> texts = read.traces().stream().map(t -> initialText(t.metadata())).toList();
        String summary = "loaded " + read.size() + " trace" + (read.size() == 1 ? "" : "s") + " from "
                + String.join(", ", read.sourceFiles().stream().map(s -> Path.of(s).getFileName().toString()).toList())
                + (read.droppedMissing() > 0 ? "; " + read.missingSummary() : "");
        traces = new Traces(read, texts, readAll(read, texts), summary);
        loadProblem = "";
        return Optional.empty();
    }

    /**
     * Sets trace {@code i}'s excitation text.
     *
     * @return whether it changed (the caller then treats the fit's inputs as changed)
     */
    public boolean setExcitation(int i, String text) {
        Objects.requireNonNull(text, "text");
        synchronized (this) {
            if (traces.texts().get(i).equals(text)) {
                return false;
            }
            traces = traces.withText(i, text);
        }
        fire();
        return true;
    }

    /** The loaded traces as read (without the typed excitations), if any. */
    public Optional<Dataset> dataset() {
        Traces t = traces;
        return t == null ? Optional.empty() : Optional.of(t.dataset());
    }

    /** The message of the last load that failed, or "" after a good load. */
    public String loadProblem() {
        return loadProblem;
    }

    /** "loaded 5 traces from series.csv", or "" before a load. */
    public String summary() {
        Traces t = traces;
        return t == null ? "" : t.summary();
    }

    public int traceCount() {
        Traces t = traces;
        return t == null ? 0 : t.dataset().size();
    }

    public String label(int i) {
        return traces.dataset().traces().get(i).label();
    }

    public String excitationText(int i) {
        return traces.texts().get(i);
    }

    /** Why trace {@code i}'s excitation text cannot be used, or empty. */
    public Optional<String> excitationProblem(int i) {
        return Optional.ofNullable(traces.readings().get(i).problem());
    }

    /** Why {@code text} would not do as trace {@code i}'s excitation, or empty: for checking while the user types. */
    public Optional<String> checkExcitation(int i, String text) {
        return Optional.ofNullable(ExcitationText.read(text, traces.dataset().traces().get(i).metadata().photonEnergyJ()).problem());
    }

    /** Why these traces cannot be fitted as they stand (none loaded, an unusable excitation, mixed kinds), or empty. */
    public Optional<String> problem() {
        return problem(traces);
    }

    /** The traces carrying their typed excitations, when {@link #problem()} has nothing to say. */
    Optional<Dataset> excited() {
        Traces t = traces;
        if (problem(t).isPresent()) {
            return Optional.empty();
        }
        List<TraceMetadata> meta = new ArrayList<>();
        for (int i = 0; i < t.dataset().size(); i++) {
            TraceMetadata m = t.dataset().traces().get(i).metadata();
            meta.add(m.with(Optional.of(t.readings().get(i).excitation()), m.photonEnergyJ()));
        }
        return Optional.of(t.dataset().withMetadata(meta));
    }

    private static Optional<String> problem(Traces t) {
        if (t == null) {
            return Optional.of("load measured traces first");
        }
        List<ExcitationText.Reading> r = t.readings();
        for (int i = 0; i < r.size(); i++) {
            if (!r.get(i).ok()) {
                return Optional.of("trace '" + t.dataset().traces().get(i).label() + "': " + r.get(i).problem());
            }
        }
        Excitation.Kind kind = r.get(0).excitation().kind();
        for (int i = 1; i < r.size(); i++) {
            Excitation.Kind k = r.get(i).excitation().kind();
            if (k != kind) {
                return Optional.of("trace '" + t.dataset().traces().get(i).label() + "' gives " + ExcitationText.kindLabel(k)
                        + " but trace '" + t.dataset().traces().get(0).label() + "' " + ExcitationText.kindLabel(kind)
                        + " (use one kind for the whole series)");
            }
        }
        return Optional.empty();
    }

    private static List<ExcitationText.Reading> readAll(Dataset d, List<String> texts) {
        List<ExcitationText.Reading> out = new ArrayList<>();
        for (int i = 0; i < texts.size(); i++) {
            OptionalDouble photon = d.traces().get(i).metadata().photonEnergyJ();
            out.add(ExcitationText.read(texts.get(i), photon));
        }
        return List.copyOf(out);
    }

    /** The excitation the file or sidecar gave, else the column header when it reads as one ("2 nJ"), else "". */
    private static String initialText(TraceMetadata m) {
        if (m.excitation().isPresent()) {
            return ExcitationText.format(m.excitation().get());
        }
        ExcitationText.Reading fromLabel = ExcitationText.read(m.label(), m.photonEnergyJ());
        // a bare number as a column header is more likely an index than ⟨N⟩: only headers with a unit count
        return fromLabel.ok() && fromLabel.excitation().kind() != Excitation.Kind.MEAN_OCCUPANCY ? m.label().strip() : "";
    }

    static Path sidecarOf(Path table) {
        String name = table.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return table.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + SIDECAR_SUFFIX);
    }

    private void fire() {
        for (Runnable l : listeners) {
            l.run();
        }
    }
}
