package org.ladderkin;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** Small classes with one job: a main source file over 400 lines says why on its first line. */
class SourceSizeTest {

    static final int LIMIT = 400;
    static final String REASON = "// Over 400 lines: ";

    @Test
    void everyLongSourceFileSaysWhyOnItsFirstLine() throws IOException {
        Path root = Path.of(System.getProperty("ladderkin.home", ".")).resolve("src/main/java");
        List<String> unexplained = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                List<String> lines = Files.readAllLines(f);
                if (lines.size() > LIMIT && !(lines.get(0).startsWith(REASON) && lines.get(0).length() > REASON.length() + 10)) {
                    unexplained.add(root.relativize(f) + " (" + lines.size() + " lines)");
                }
            }
        }
        assertThat(unexplained).as("files over %d lines without a '%s…' first line", LIMIT, REASON).isEmpty();
    }
}
