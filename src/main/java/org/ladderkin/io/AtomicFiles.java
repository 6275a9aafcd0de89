package org.ladderkin.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NotDirectoryException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Every file ladderkin writes goes through here: the content is written to a temporary file in the same folder,
 * flushed to disk, and then moved over the target in one step. A failure at any point leaves the old file as it was
 * and removes the temporary file.
 */
public final class AtomicFiles {

    /** Writes the content of a file; may throw, in which case nothing is replaced. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes text content; may throw, in which case nothing is replaced. */
    @FunctionalInterface
    public interface TextContent {
        void writeTo(Writer out) throws IOException;
    }

    private AtomicFiles() {
    }

    /** Replaces {@code target} with the bytes {@code content} writes, or leaves it untouched on failure. */
    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        String prefix = "." + absolute.getFileName() + ".";
        Path tmp = Files.createTempFile(dir, prefix + ProcessHandle.current().pid() + "-", ".tmp");
        removeStaleTemporaries(dir, prefix);
        boolean moved = false;
        try {
            keepPermissions(absolute, tmp);
            try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream out = Channels.newOutputStream(channel)) {
                content.writeTo(out);
                out.flush();
                channel.force(true);
            }
            try {
                Files.move(tmp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            moved = true;
        } finally {
            if (!moved) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /** Age after which a temporary file named without its writer's process id (older versions) counts as left over. */
    private static final java.time.Duration UNOWNED_TEMPORARY_AGE = java.time.Duration.ofMinutes(10);

    /**
     * Removes this file's temporary files left by writers that were killed: those naming a process id that is no longer
     * running, and old unnamed ones. A killed run otherwise leaves one behind on every kill, and no later run removed them.
     */
    static void removeStaleTemporaries(Path dir, String prefix) {
        try (var entries = Files.newDirectoryStream(dir, p -> {
            String n = p.getFileName().toString();
            return n.startsWith(prefix) && n.endsWith(".tmp");
        })) {
            for (Path p : entries) {
                String middle = p.getFileName().toString();
                middle = middle.substring(prefix.length(), middle.length() - ".tmp".length());
                int dash = middle.indexOf('-');
                boolean stale;
                if (dash > 0 && digits(middle.substring(0, dash)) && digits(middle.substring(dash + 1))) {
                    stale = !writerRunning(Long.parseLong(middle.substring(0, dash)));
                } else {
                    stale = digits(middle) && Files.getLastModifiedTime(p).toInstant()
                            .isBefore(java.time.Instant.now().minus(UNOWNED_TEMPORARY_AGE));
                }
                if (stale) {
                    Files.deleteIfExists(p);
                }
            }
        } catch (IOException | RuntimeException e) {
            // tidying is a courtesy: it must never stop the write the user asked for
        }
    }

    /** Whether the process that named a temporary file or folder after itself may still be writing it. */
    static boolean writerRunning(long pid) {
        return pid == ProcessHandle.current().pid() || ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
    }

    private static boolean digits(String s) {
        if (s.isEmpty() || s.length() > 19) {
            return false;
        }
        for (int i = 0; i < s.length(); i++) {
            if (s.charAt(i) < '0' || s.charAt(i) > '9') {
                return false;
            }
        }
        return true;
    }

    /**
     * The temporary file is created private (rw-------); give the replacement the old file's permissions, or the usual
     * rw-r--r-- for a new file, so saving does not silently change who can read the user's file.
     */
    private static void keepPermissions(Path target, Path tmp) throws IOException {
        if (!tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return;
        }
        java.util.Set<java.nio.file.attribute.PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    private static final String WRITE_CHECK_PREFIX = ".ladderkin-write-check.";

    /**
     * Makes sure files can be written into {@code dir} (creating it when missing) the way {@link #write} writes them,
     * so a caller can find an unusable output folder before the work whose results go there, not after it.
     *
     * @throws IOException with a one-line message that names {@code dir} and what is in the way
     */
    public static void checkWritableFolder(Path dir) throws IOException {
        Path absolute = dir.toAbsolutePath();
        try {
            if (Files.exists(absolute) && !Files.isDirectory(absolute)) {
                throw new IOException(dir + ": is a file, not a folder");
            }
            Files.createDirectories(absolute);
            // named after this process like every temporary file, so one left by a kill is removed by the next run
            Files.delete(Files.createTempFile(absolute, WRITE_CHECK_PREFIX + ProcessHandle.current().pid() + "-", ".tmp"));
            removeStaleTemporaries(absolute, WRITE_CHECK_PREFIX);
        } catch (FileSystemException e) {
            throw new IOException(dir + ": " + reason(e), e);
        }
    }

    private static String reason(FileSystemException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied" + (e.getFile() == null ? "" : " (" + e.getFile() + ")");
        }
        if (e instanceof FileAlreadyExistsException || e instanceof NotDirectoryException) {
            return "a file is in the way" + (e.getFile() == null ? "" : " (" + e.getFile() + " is not a folder)");
        }
        return e.getReason() != null ? e.getReason().toLowerCase(java.util.Locale.ROOT) : "cannot write here";
    }

    /** Replaces {@code target} with UTF-8 text, or leaves it untouched on failure. */
    public static void writeText(Path target, TextContent content) throws IOException {
        write(target, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            content.writeTo(w);
            w.flush();
        });
    }

    /** Replaces {@code target} with the UTF-8 string {@code text}. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }
}
