package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.ResolvedJson;

/**
 * A recovery copy of the plan being edited, kept in a per-user folder so that a crash or a killed session loses at
 * most one autosave interval of work. One file, written atomically, holding the document and the file it belongs to.
 */
public final class RecoveryStore {

    /** Schema of the recovery file. */
    public static final String SCHEMA = "ladderkin.recovery/1";
    private static final String FILE_NAME = "recovery.json";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final Path folder;

    /** @param folder where the recovery copy lives (created on first write) */
    public RecoveryStore(Path folder) {
        this.folder = Objects.requireNonNull(folder, "folder");
    }

    /** The default per-user folder: {@code ~/.ladderkin/recovery}, or the {@code ladderkin.recovery.dir} property. */
    public static Path defaultFolder() {
        String override = System.getProperty("ladderkin.recovery.dir");
        if (override != null && !override.isBlank()) {
            return Path.of(override);
        }
        return Path.of(System.getProperty("user.home"), ".ladderkin", "recovery");
    }

    /**
     * A recovered document.
     *
     * @param document     the plan document as it was being edited
     * @param originalFile the file it was opened from or saved to, or null for an untitled plan
     * @param savedAt      when the copy was written
     */
    public record Recovered(ObjectNode document, Path originalFile, Instant savedAt) {
        public Recovered {
            Objects.requireNonNull(document, "document");
            Objects.requireNonNull(savedAt, "savedAt");
        }
    }

    /** The recovery file's path. */
    public Path file() {
        return folder.resolve(FILE_NAME);
    }

    /** Writes the recovery copy atomically, replacing any older one. */
    public void write(ObjectNode document, Path originalFile, Instant now) throws IOException {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", SCHEMA);
        root.put("savedAt", now.toString());
        if (originalFile != null) {
            root.put("originalFile", originalFile.toAbsolutePath().toString());
        }
        root.set("plan", document.deepCopy());
        AtomicFiles.writeString(file(), ResolvedJson.toText(root));
    }

    /**
     * The recovery copy, if one exists and can be read. A damaged copy is reported as empty rather than blocking
     * start-up; it is left in place for the user to inspect.
     */
    public Optional<Recovered> read() {
        Path f = file();
        if (!Files.isRegularFile(f)) {
            return Optional.empty();
        }
        try {
            JsonNode root = MAPPER.readTree(Files.readString(f));
            if (!root.isObject() || !SCHEMA.equals(root.path("schema").asText()) || !(root.get("plan") instanceof ObjectNode plan)) {
                return Optional.empty();
            }
            JsonNode original = root.get("originalFile");
            Instant at = Instant.parse(root.path("savedAt").asText());
            return Optional.of(new Recovered(plan, original == null ? null : Path.of(original.asText()), at));
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Deletes the recovery copy (after a save, or when the user declines to restore it). */
    public void clear() throws IOException {
        Files.deleteIfExists(file());
    }
}
