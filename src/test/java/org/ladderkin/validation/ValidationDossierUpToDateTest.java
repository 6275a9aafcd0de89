package org.ladderkin.validation;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * Runs in its own Surefire execution after every other test (see pom.xml), so that {@code target/validation.md}
 * holds the table of this very run. The committed {@code docs/validation.md} must be identical: the dossier can
 * never claim a check that no longer exists, or hide one that was added or edited.
 */
class ValidationDossierUpToDateTest {

    private static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));

    @Test
    void committedDossierMatchesThisRun() throws IOException {
        Path generated = HOME.resolve("target/validation.md");
        Path committed = HOME.resolve("docs/validation.md");
        assertThat(generated).as("the validation tests did not write target/validation.md").exists();
        String fresh = Files.readString(generated, StandardCharsets.UTF_8);
        assertThat(fresh).as("a @CheckedAgainst test recorded no comparison").doesNotContain(DossierWriter.NO_COMPARISON);
        assertThat(committed).as("docs/validation.md is missing: cp target/validation.md docs/validation.md").exists();
        String old = Files.readString(committed, StandardCharsets.UTF_8);
        assertThat(old)
                .as("docs/validation.md is stale: after 'mvn -B test', run 'cp target/validation.md docs/validation.md' and commit")
                .isEqualTo(fresh);
    }
}
