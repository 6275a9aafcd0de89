package org.ladderkin.gui.model;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Which files an open dialog lists as plans, and how a recent file is named in a menu. Beside plans, a plan's folder
 * holds trace sidecars ({@code *.traces.json}), samples and materials, all JSON: a file counts as a plan when its name
 * says so ({@code *.plan.json}) or its {@code schema} field does.
 */
public final class PlanFiles {

    /** The schema name every plan file declares, before its version. */
    static final String PLAN_SCHEMA = "ladderkin.plan/";
    /** The schema field comes first in every ladderkin file; a few kilobytes hold it even after a long comment-free title. */
    private static final int HEAD_CHARS = 4096;
    private static final Pattern SCHEMA = Pattern.compile("\"schema\"\\s*:\\s*\"([^\"]*)\"");

    private PlanFiles() {
    }

    /** Whether an open dialog lists {@code file} as a plan (folders are listed so one can walk into them). */
    public static boolean listed(Path file) {
        if (Files.isDirectory(file)) {
            return true;
        }
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (name.endsWith(".plan.json")) {
            return true;
        }
        return name.endsWith(".json") && schema(file).map(s -> s.startsWith(PLAN_SCHEMA)).orElse(false);
    }

    /** The {@code schema} a JSON file declares near its start, if any (read without parsing the whole file). */
    static Optional<String> schema(Path file) {
        char[] head = new char[HEAD_CHARS];
        int n = 0;
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            int got;
            while (n < head.length && (got = r.read(head, n, head.length - n)) > 0) {
                n += got;
            }
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
        Matcher m = SCHEMA.matcher(new String(head, 0, n));
        return m.find() ? Optional.of(m.group(1)) : Optional.empty();
    }

    /**
     * How a menu names a recent file: its full path, with the home folder written "~" ("~/plans/cdse.plan.json"), so
     * two plans of the same name in different folders are told apart.
     */
    public static String menuLabel(Path file, Path home) {
        Path f = file.toAbsolutePath().normalize();
        Path h = home == null ? null : home.toAbsolutePath().normalize();
        if (h != null && h.getNameCount() > 0 && f.startsWith(h) && !f.equals(h)) {
            return "~" + java.io.File.separator + h.relativize(f);
        }
        return f.toString();
    }

    /** {@link #menuLabel(Path, Path)} for the current user's home folder. */
    public static String menuLabel(Path file) {
        String home = System.getProperty("user.home");
        return menuLabel(file, home == null || home.isBlank() ? null : Path.of(home));
    }
}
