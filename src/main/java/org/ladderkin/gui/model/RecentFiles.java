package org.ladderkin.gui.model;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The recently used plan files, newest first, without duplicates and at most {@code capacity} long. Immutable:
 * every change returns a new list. Stored as text (one absolute path per line) by the preferences class.
 *
 * @param files    newest first
 * @param capacity how many are kept
 */
public record RecentFiles(List<Path> files, int capacity) {

    /** How many recent files the planner keeps. */
    public static final int DEFAULT_CAPACITY = 8;

    public RecentFiles {
        if (capacity < 1) {
            throw new IllegalArgumentException("recent-file capacity must be >= 1, was " + capacity);
        }
        files = List.copyOf(files.subList(0, Math.min(files.size(), capacity)));
    }

    public static RecentFiles empty() {
        return new RecentFiles(List.of(), DEFAULT_CAPACITY);
    }

    /** The list with {@code file} first (moved there if it was already listed). */
    public RecentFiles add(Path file) {
        Path key = normal(file);
        List<Path> next = new ArrayList<>();
        next.add(key);
        for (Path p : files) {
            if (!p.equals(key)) {
                next.add(p);
            }
        }
        return new RecentFiles(next, capacity);
    }

    /** The list without {@code file} (e.g. it no longer exists). */
    public RecentFiles remove(Path file) {
        Path key = normal(file);
        return new RecentFiles(files.stream().filter(p -> !p.equals(key)).toList(), capacity);
    }

    /** One absolute path per line. */
    public String encode() {
        StringBuilder b = new StringBuilder();
        for (Path p : files) {
            b.append(p).append('\n');
        }
        return b.toString();
    }

    /** Reads {@link #encode()} output; blank lines are skipped. */
    public static RecentFiles decode(String text, int capacity) {
        List<Path> out = new ArrayList<>();
        RecentFiles r = new RecentFiles(List.of(), capacity);
        for (String line : text.split("\n")) {
            if (!line.isBlank()) {
                out.add(Path.of(line.strip()));
            }
        }
        for (int i = out.size() - 1; i >= 0; i--) {
            r = r.add(out.get(i));
        }
        return r;
    }

    private static Path normal(Path p) {
        return p.toAbsolutePath().normalize();
    }
}
