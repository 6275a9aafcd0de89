package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class RecentFilesTest {

    static Path p(String name) {
        return Path.of("/plans", name).toAbsolutePath();
    }

    @Test
    void newestFirstNoDuplicatesCapped() {
        RecentFiles r = new RecentFiles(List.of(), 3);
        r = r.add(p("a")).add(p("b")).add(p("c")).add(p("a"));
        assertThat(r.files()).containsExactly(p("a"), p("c"), p("b"));
        r = r.add(p("d"));
        assertThat(r.files()).containsExactly(p("d"), p("a"), p("c"));
        assertThat(r.remove(p("a")).files()).containsExactly(p("d"), p("c"));
    }

    @Test
    void pathsAreNormalisedSoOneFileIsListedOnce() {
        RecentFiles r = RecentFiles.empty().add(Path.of("/plans/x/../a")).add(Path.of("/plans/a"));
        assertThat(r.files()).containsExactly(Path.of("/plans/a"));
    }

    @Test
    void encodeDecodeRoundTrip() {
        RecentFiles r = RecentFiles.empty().add(p("a b.json")).add(p("c.json"));
        RecentFiles back = RecentFiles.decode(r.encode(), RecentFiles.DEFAULT_CAPACITY);
        assertThat(back).isEqualTo(r);
        assertThat(RecentFiles.decode("", 8).files()).isEmpty();
    }
}
