package org.ladderkin.gui.model;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.UUID;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.ResolvedJson;

/**
 * Recovery copies of plans being edited, kept in a per-user folder so that a crash or a killed session loses at most
 * one autosave interval of work. Every window writes its own copy ({@link Slot}), so two windows killed together both
 * come back. A window holds a lock on its copy while it lives: the operating system drops the lock when the process
 * dies, which is how a copy left by a crash is told from the copy of a window still open (in this process or
 * another).
 */
public final class RecoveryStore {

    /** Schema of a recovery file. */
    public static final String SCHEMA = "ladderkin.recovery/1";
    private static final String PREFIX = "recovery-";
    private static final String COPY = ".json";
    private static final String LOCK = ".lock";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final Path folder;

    /** @param folder where the recovery copies live (created on first write) */
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
     * @param copy         the recovery file it was read from
     */
    public record Recovered(ObjectNode document, Path originalFile, Instant savedAt, Path copy) {
        public Recovered {
            Objects.requireNonNull(document, "document");
            Objects.requireNonNull(savedAt, "savedAt");
            Objects.requireNonNull(copy, "copy");
        }

        /** "name.plan.json" or "an untitled plan", for the question at start-up. */
        public String planName() {
            return originalFile == null ? "an untitled plan" : originalFile.toString();
        }
    }

    /** A new copy of its own for one window; nothing is written or locked before the first {@link Slot#write}. */
    public Slot newSlot() {
        return new Slot(folder.resolve(PREFIX + UUID.randomUUID() + COPY));
    }

    /** Takes over a recovered copy: the window that restored it keeps it up to date and removes it once saved. */
    public Slot adopt(Recovered recovered) throws IOException {
        Slot slot = new Slot(recovered.copy());
        slot.lock();
        return slot;
    }

    /**
     * Writes a copy that no window holds, as a session that ended without closing its window leaves it.
     *
     * @return the copy's file
     */
    public Path write(ObjectNode document, Path originalFile, Instant now) throws IOException {
        Slot slot = newSlot();
        slot.write(document, originalFile, now);
        slot.release();
        return slot.file();
    }

    /**
     * Every copy that no living window holds, oldest first. A damaged copy is skipped rather than blocking start-up;
     * it is left in place for the user to inspect.
     */
    public List<Recovered> readAll() {
        List<Recovered> found = new ArrayList<>();
        if (!Files.isDirectory(folder)) {
            return found;
        }
        try (DirectoryStream<Path> files = Files.newDirectoryStream(folder, "*" + COPY)) {
            for (Path f : files) {
                if (!held(f)) {
                    read(f).ifPresent(found::add);
                }
            }
        } catch (IOException e) {
            return found;
        }
        found.sort(Comparator.comparing(Recovered::savedAt).thenComparing(r -> r.copy().toString()));
        return found;
    }

    /** The first copy no window holds, if any. */
    public Optional<Recovered> read() {
        List<Recovered> all = readAll();
        return all.isEmpty() ? Optional.empty() : Optional.of(all.get(0));
    }

    /** Deletes a recovered copy (the user declined to restore it). */
    public void discard(Recovered recovered) throws IOException {
        Files.deleteIfExists(recovered.copy());
        Files.deleteIfExists(lockFile(recovered.copy()));
    }

    private static Optional<Recovered> read(Path f) {
        try {
            JsonNode root = MAPPER.readTree(Files.readString(f));
            if (!root.isObject() || !SCHEMA.equals(root.path("schema").asText())
                    || !(root.get("plan") instanceof ObjectNode plan)) {
                return Optional.empty();
            }
            JsonNode original = root.get("originalFile");
            Instant at = Instant.parse(root.path("savedAt").asText());
            return Optional.of(new Recovered(plan, original == null ? null : Path.of(original.asText()), at, f));
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Whether a living window (of any process) holds the copy's lock. */
    private static boolean held(Path copy) {
        Path lock = lockFile(copy);
        if (!Files.exists(lock)) {
            return false;
        }
        try (FileChannel channel = FileChannel.open(lock, StandardOpenOption.WRITE)) {
            FileLock l = channel.tryLock();
            if (l == null) {
                return true;
            }
            l.release();
            return false;
        } catch (OverlappingFileLockException e) {
            return true; // held by a window of this process
        } catch (IOException e) {
            return false;
        }
    }

    private static Path lockFile(Path copy) {
        String name = copy.getFileName().toString();
        return copy.resolveSibling(name.substring(0, name.length() - COPY.length()) + LOCK);
    }

    /** One window's recovery copy, locked while the window lives. Not thread-safe: one window's event thread uses it. */
    public static final class Slot {

        private final Path file;
        private FileChannel channel;
        private FileLock lock;

        private Slot(Path file) {
            this.file = file;
        }

        /** The copy's file. */
        public Path file() {
            return file;
        }

        /** Writes the copy atomically, replacing the previous one of this window. */
        public void write(ObjectNode document, Path originalFile, Instant now) throws IOException {
            lock();
            ObjectNode root = ResolvedJson.object();
            root.put("schema", SCHEMA);
            root.put("savedAt", now.toString());
            if (originalFile != null) {
                root.put("originalFile", originalFile.toAbsolutePath().toString());
            }
            root.set("plan", document.deepCopy());
            AtomicFiles.writeString(file, ResolvedJson.toText(root));
        }

        /** Deletes the copy (the plan was saved, or the window closed and the user chose to discard). */
        public void clear() throws IOException {
            Files.deleteIfExists(file);
            release();
            Files.deleteIfExists(lockFile(file));
        }

        /** Lets go of the copy without deleting it: the window went away without a clean close. */
        public void release() throws IOException {
            if (channel != null) {
                channel.close(); // releases the lock too
                channel = null;
                lock = null;
            }
        }

        private void lock() throws IOException {
            if (lock != null) {
                return;
            }
            Files.createDirectories(file.getParent());
            FileChannel c = FileChannel.open(lockFile(file), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            try {
                FileLock l = c.tryLock();
                if (l == null) {
                    throw new IOException("the recovery copy " + file + " is held by another window");
                }
                channel = c;
                lock = l;
            } catch (OverlappingFileLockException e) {
                c.close();
                throw new IOException("the recovery copy " + file + " is held by another window", e);
            } catch (IOException | RuntimeException e) {
                c.close();
                throw e;
            }
        }
    }
}
