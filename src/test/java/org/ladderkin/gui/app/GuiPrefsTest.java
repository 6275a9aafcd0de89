package org.ladderkin.gui.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Rectangle;
import java.nio.file.Path;
import java.util.UUID;
import java.util.prefs.Preferences;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.ladderkin.gui.model.RecentFiles;

class GuiPrefsTest {

    final Preferences node = Preferences.userRoot().node("org/ladderkin/gui-test/" + UUID.randomUUID());

    @AfterEach
    void removeNode() throws Exception {
        node.removeNode();
    }

    @Test
    void defaultsBeforeTheFirstRun() {
        GuiPrefs p = new GuiPrefs(node);
        assertThat(p.theme()).isEqualTo(Theme.LIGHT);
        assertThat(p.bounds()).isEmpty();
        assertThat(p.maximized()).isFalse();
        assertThat(p.recentFiles().files()).isEmpty();
        assertThat(p.lastDirectory()).isEmpty();
    }

    @Test
    void whatOneRunStoresTheNextRunReads() {
        GuiPrefs first = new GuiPrefs(node);
        first.theme(Theme.DARK);
        first.bounds(new Rectangle(10, 20, 1200, 800));
        first.maximized(true);
        first.divider("forms", 420);
        first.divider("fit", 610);
        first.recentFiles(RecentFiles.empty().add(Path.of("/plans/a.plan.json")));
        first.lastDirectory(Path.of("/plans"));
        GuiPrefs next = new GuiPrefs(node);
        assertThat(next.theme()).isEqualTo(Theme.DARK);
        assertThat(next.bounds()).contains(new Rectangle(10, 20, 1200, 800));
        assertThat(next.maximized()).isTrue();
        assertThat(next.divider("forms")).isEqualTo(420);
        assertThat(next.divider("fit")).isEqualTo(610);
        assertThat(next.divider("never-stored")).isEqualTo(-1);
        assertThat(next.recentFiles().files()).containsExactly(Path.of("/plans/a.plan.json"));
        assertThat(next.lastDirectory()).contains(Path.of("/plans"));
    }

    @Test
    void damagedOrTinyBoundsAreIgnored() {
        node.put("windowBounds", "1,2,three,4");
        assertThat(new GuiPrefs(node).bounds()).isEmpty();
        node.put("windowBounds", "0,0,50,40");
        assertThat(new GuiPrefs(node).bounds()).isEmpty();
        node.put("theme", "PURPLE");
        assertThat(new GuiPrefs(node).theme()).isEqualTo(Theme.LIGHT);
    }
}
