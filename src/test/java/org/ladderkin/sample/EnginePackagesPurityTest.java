package org.ladderkin.sample;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** material, sample and excite are engine packages: no files, no command line, no Swing, no printing. */
class EnginePackagesPurityTest {

    private static final List<String> FORBIDDEN = List.of("import org.ladderkin.io", "import org.ladderkin.cli", "import picocli",
            "import javax.swing", "import java.awt", "import org.jfree", "import java.io.", "import java.nio.file", "System.out",
            "System.err");

    @ParameterizedTest
    @ValueSource(strings = {"material", "sample", "excite"})
    void noFilesNoCliNoSwing(String pkg) throws IOException {
        Path dir = Path.of(System.getProperty("ladderkin.home", ".")).resolve("src/main/java/org/ladderkin").resolve(pkg);
        try (Stream<Path> files = Files.list(dir)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String text = Files.readString(f);
                for (String bad : FORBIDDEN) {
                    assertThat(text).as(f + " must not contain '" + bad + "'").doesNotContain(bad);
                }
            }
        }
    }
}
