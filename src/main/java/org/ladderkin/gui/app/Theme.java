package org.ladderkin.gui.app;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;

/** The planner's two looks. Colours live in {@code org/ladderkin/gui/Flat*Laf.properties}, not in code. */
public enum Theme {
    LIGHT("Light"),
    DARK("Dark");

    private static boolean defaultsRegistered;
    private final String label;

    Theme(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** The theme named {@code name} (as stored in preferences), or LIGHT. */
    public static Theme byName(String name) {
        for (Theme t : values()) {
            if (t.name().equalsIgnoreCase(name)) {
                return t;
            }
        }
        return LIGHT;
    }

    /** Installs this look and feel; call on the event thread, then {@link FlatLaf#updateUI()} if windows exist. */
    public void install() {
        if (!defaultsRegistered) {
            FlatLaf.registerCustomDefaultsSource("org.ladderkin.gui");
            defaultsRegistered = true;
        }
        if (this == DARK) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }

    /** Switches every open window to this theme. */
    public void switchTo() {
        install();
        FlatLaf.updateUI();
    }
}
