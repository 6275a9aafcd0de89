package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.json.JsonTree;

/** A value or field name holding a newline or a megabyte of text still gives a one-line, short message. */
class OneLineMessagesTest {

    @Test
    void aNewlineInAStringValueIsEscapedInTheMessage() throws Exception {
        String text = PlanCodecRejectionTest.demoText().replace("\"transient-absorption\"", "\"transient\\nabsorption\"");
        assertThatThrownBy(() -> PlanCodec.read(JsonTree.parse(text, "plan.json")))
                .isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(e.getMessage()).doesNotContain("\n").contains("'transient\\nabsorption' is not one of"));
    }

    @Test
    void aLongUnknownFieldNameIsCut() throws Exception {
        String name = "x".repeat(20_000);
        String text = PlanCodecRejectionTest.demoText().replaceFirst("\\{", "{ \"" + name + "\\u0007\": 1,");
        assertThatThrownBy(() -> PlanCodec.read(JsonTree.parse(text, "plan.json")))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.key()).isEqualTo(InputProblem.UNKNOWN_FIELD);
                    assertThat(e.getMessage()).doesNotContain("\u0007").hasSizeLessThan(2_000);
                });
    }

    /** Past the JSON reader's own name limit the file is unreadable; the message is still one short line. */
    @Test
    void aFieldNameBeyondTheParserLimitIsOneShortLine() throws Exception {
        String text = PlanCodecRejectionTest.demoText().replaceFirst("\\{", "{ \"" + "y".repeat(100_000) + "\": 1,");
        assertThatThrownBy(() -> PlanCodec.read(JsonTree.parse(text, "plan.json")))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.key()).isEqualTo(InputProblem.UNREADABLE);
                    assertThat(e.getMessage()).doesNotContain("\n").hasSizeLessThan(500);
                });
    }
}
