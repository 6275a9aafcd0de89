package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The presentation models must stay testable without a display: no Swing, AWT or JFreeChart in gui.model. */
class ModelHasNoSwingTest {

    @Test
    void noDisplayImportsInTheModelPackage() throws Exception {
        Path dir = Path.of(System.getProperty("ladderkin.home", ".")).resolve("src/main/java/org/ladderkin/gui/model");
        List<Path> sources;
        try (Stream<Path> s = Files.list(dir)) {
            sources = s.filter(p -> p.toString().endsWith(".java")).toList();
        }
        assertThat(sources).hasSizeGreaterThan(10);
        for (Path p : sources) {
            assertThat(Files.readString(p)).as(p.getFileName().toString())
                    .doesNotContain("import javax.swing").doesNotContain("import java.awt").doesNotContain("import org.jfree");
        }
    }
}
