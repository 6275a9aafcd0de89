package org.ladderkin.gui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;

/** The planner's Open reads through io's JSON reader, so its dialog shows the same one line the command line prints. */
class PlanEditorMalformedJsonTest {

    @Test
    void openingAMalformedPlanGivesOneLocatedLine(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("plan.json");
        Files.writeString(bad, "{\n  \"schema\": \"ladderkin.plan/1\"\n  \"title\": \"x\"\n}\n");
        assertThatThrownBy(() -> new PlanEditor().open(bad)).isInstanceOfSatisfying(InputException.class, e -> {
            assertThat(e.key()).isEqualTo(InputProblem.BAD_SYNTAX);
            assertThat(e.getMessage())
                    .isEqualTo(bad + ":3:3: malformed JSON: expected ',' or '}' after a value, found '\"'");
        });
    }
}
