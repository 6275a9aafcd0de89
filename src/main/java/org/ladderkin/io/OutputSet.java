package org.ladderkin.io;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ThreadLocalRandom;

/**
 * Files a command writes together (a report and the JSON and CSV it was made from) replace the previous set together.
 * They are written into a hidden staging folder inside the output folder; {@link #commit()} renames that folder to
 * "ready" in one step and then moves each file into place. A writer killed before the rename leaves the old set (its
 * staging folder is removed by the next writer); one killed after it leaves a ready folder that the next writer, or
 * {@link #recover}, moves into place first. Either way nobody is left with half of one run beside half of another once
 * ladderkin has touched the folder again.
 */
public final class OutputSet implements AutoCloseable {

    private static final String PREFIX = ".ladderkin-set.";
    private static final String STAGING = ".staging";
    private static final String READY = ".ready";

    private final Path dir;
    private final Path staging;
    private boolean committed;

    private OutputSet(Path dir, Path staging) {
        this.dir = dir;
        this.staging = staging;
    }

    /** Starts a set in {@code dir} (created when missing), after finishing or removing what killed writers left. */
    public static OutputSet begin(Path dir) throws IOException {
        Path absolute = dir.toAbsolutePath();
        Files.createDirectories(absolute);
        recover(absolute);
        String name = PREFIX + ProcessHandle.current().pid() + "-" + Long.toUnsignedString(ThreadLocalRandom.current().nextLong(), 36);
        return new OutputSet(absolute, Files.createDirectory(absolute.resolve(name + STAGING)));
    }

    /** Where to write the set's files; the same names appear in the output folder after {@link #commit()}. */
    public Path folder() {
        return staging;
    }

    /** The path of file {@code name} in the staging folder. */
    public Path resolve(String name) {
        return staging.resolve(name);
    }

    /** Replaces the previous set with this one; the names written are the names kept. */
    public void commit() throws IOException {
        syncFiles(staging);
        Path ready = dir.resolve(staging.getFileName().toString().replace(STAGING, READY));
        move(staging, ready);
        sync(dir);
        committed = true;
        finish(ready, dir);
    }

    /** Without a commit the staging folder is removed and the previous set stays as it was. */
    @Override
    public void close() throws IOException {
        if (!committed) {
            deleteTree(staging);
        }
    }

    /**
     * Finishes what writers that are no longer running left in {@code dir}: a ready set is moved into place, a staging
     * folder is removed. Sets of writers still running are left alone.
     */
    public static void recover(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return;
        }
        List<Path> left = new ArrayList<>();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir, p -> p.getFileName().toString().startsWith(PREFIX))) {
            entries.forEach(left::add);
        }
        left.sort(null);
        for (Path p : left) {
            String n = p.getFileName().toString();
            if (!Files.isDirectory(p) || writerAlive(n)) {
                continue;
            }
            if (n.endsWith(READY)) {
                finish(p, dir);
            } else if (n.endsWith(STAGING)) {
                deleteTree(p);
            }
        }
    }

    private static boolean writerAlive(String name) {
        String rest = name.substring(PREFIX.length());
        int dash = rest.indexOf('-');
        if (dash <= 0) {
            return false;
        }
        try {
            return AtomicFiles.writerRunning(Long.parseLong(rest.substring(0, dash)));
        } catch (NumberFormatException e) {
            return false;
        }
    }

    private static void finish(Path ready, Path dir) throws IOException {
        List<Path> files = new ArrayList<>();
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(ready)) {
            entries.forEach(files::add);
        }
        files.sort(null);
        for (Path f : files) {
            move(f, dir.resolve(f.getFileName().toString()));
        }
        sync(dir);
        Files.delete(ready);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void syncFiles(Path folder) throws IOException {
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
            for (Path f : entries) {
                if (Files.isRegularFile(f)) {
                    try (FileChannel c = FileChannel.open(f, StandardOpenOption.WRITE)) {
                        c.force(true);
                    }
                }
            }
        }
        sync(folder);
    }

    /** Makes a rename durable where the platform allows opening a folder (Linux does; elsewhere this is skipped). */
    private static void sync(Path folder) {
        try (FileChannel c = FileChannel.open(folder, StandardOpenOption.READ)) {
            c.force(true);
        } catch (IOException | RuntimeException e) {
            // not every platform can sync a folder; the moves are still atomic, only their durability is weaker
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (var walk = Files.walk(root)) {
            for (Path p : walk.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        }
    }
}
