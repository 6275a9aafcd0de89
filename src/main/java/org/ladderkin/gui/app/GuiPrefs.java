package org.ladderkin.gui.app;

import java.awt.Rectangle;
import java.nio.file.Path;
import java.util.Optional;
import java.util.prefs.Preferences;
import org.ladderkin.gui.model.RecentFiles;

/**
 * Everything the planner remembers between runs, in one place: theme, window bounds, recent files and the last
 * folder used in a file chooser. Backed by {@link Preferences} so nothing is written next to the user's plans.
 */
public final class GuiPrefs {

    private static final String THEME = "theme";
    private static final String BOUNDS = "windowBounds";
    private static final String MAXIMIZED = "windowMaximized";
    private static final String RECENT = "recentFiles";
    private static final String LAST_DIR = "lastDirectory";
    private static final String DIVIDER = "divider";

    private final Preferences node;

    /** @param node where to keep the values (the user node in the planner, a scratch node in tests) */
    public GuiPrefs(Preferences node) {
        this.node = node;
    }

    /** The current user's planner preferences. */
    public static GuiPrefs user() {
        return new GuiPrefs(Preferences.userRoot().node("org/ladderkin/gui"));
    }

    public Theme theme() {
        return Theme.byName(node.get(THEME, Theme.LIGHT.name()));
    }

    public void theme(Theme theme) {
        node.put(THEME, theme.name());
    }

    /** The window bounds of the last run, if any were stored and still make sense. */
    public Optional<Rectangle> bounds() {
        String[] parts = node.get(BOUNDS, "").split(",");
        if (parts.length != 4) {
            return Optional.empty();
        }
        try {
            Rectangle r = new Rectangle(Integer.parseInt(parts[0]), Integer.parseInt(parts[1]),
                    Integer.parseInt(parts[2]), Integer.parseInt(parts[3]));
            return r.width >= 200 && r.height >= 150 ? Optional.of(r) : Optional.empty();
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    public void bounds(Rectangle r) {
        node.put(BOUNDS, r.x + "," + r.y + "," + r.width + "," + r.height);
    }

    public boolean maximized() {
        return node.getBoolean(MAXIMIZED, false);
    }

    public void maximized(boolean maximized) {
        node.putBoolean(MAXIMIZED, maximized);
    }

    /** Position of the named split-pane divider in pixels, or -1 when never stored. */
    public int divider(String name) {
        return node.getInt(DIVIDER + "." + name, -1);
    }

    public void divider(String name, int px) {
        node.putInt(DIVIDER + "." + name, px);
    }

    public RecentFiles recentFiles() {
        return RecentFiles.decode(node.get(RECENT, ""), RecentFiles.DEFAULT_CAPACITY);
    }

    public void recentFiles(RecentFiles files) {
        node.put(RECENT, files.encode());
    }

    public Optional<Path> lastDirectory() {
        String d = node.get(LAST_DIR, "");
        return d.isEmpty() ? Optional.empty() : Optional.of(Path.of(d));
    }

    public void lastDirectory(Path dir) {
        node.put(LAST_DIR, dir.toAbsolutePath().toString());
    }
}
