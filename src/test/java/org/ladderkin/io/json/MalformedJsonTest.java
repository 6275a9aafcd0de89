package org.ladderkin.io.json;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;

/** A syntax error is one line in the user's terms: where, what, what instead; no parser internals, no echoed text. */
class MalformedJsonTest {

    private static InputException fail(String text) {
        try {
            JsonTree.of(text, "plan.json");
        } catch (InputException e) {
            return e;
        }
        throw new AssertionError("accepted: " + text);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        "{\\n  \"a\": 1\\n  \"b\": 2}|plan.json:3:3: malformed JSON: expected ',' or '}' after a value, found '\"'",
        "{\"a\": [1 2]}|plan.json:1:10: malformed JSON: expected ',' or ']' after a value, found '2'",
        "{\"a\": 1,}|plan.json:1:9: malformed JSON: expected a field name after ',' (a comma after the last field is not allowed)",
        "{\"a\" 1}|plan.json:1:6: malformed JSON: expected ':' after the field name, found '1'",
        "{a: 1}|plan.json:1:2: malformed JSON: expected a field name in double quotes, found 'a'",
        "{\"a\": tru}|plan.json:1:7: malformed JSON: unknown word 'tru' (expected a string in double quotes, a number, an object, a list, true, false or null)",
        "{\"a\": 'x'}|plan.json:1:7: malformed JSON: strings take double quotes, not single quotes",
        "{\\n\"a\": {\"b\": 1}|plan.json:2:14: malformed JSON: the file ends inside an object (missing '}' for the object opened at line 1, column 1)",
        "{\"a\": \"x|plan.json:1:9: malformed JSON: the file ends inside a string (missing closing '\"')",
        "{\"a\": NaN}|plan.json:1:10: malformed JSON: 'NaN' is not a JSON number (write a finite number)",
        "{\"a\": 01}|plan.json:1:8: malformed JSON: malformed number (a number does not start with 0 unless it is 0 or 0.something)",
        "{\"a\": [1}|plan.json:1:9: malformed JSON: found '}' where ']' should close the list opened at line 1, column 7",
        "// note\\n{}|plan.json:1:1: malformed JSON: comments are not allowed in JSON (remove the line, or keep notes in a \"note\" string)",
        "{\"a\": \"x\\ny\"}|plan.json:1:9: malformed JSON: a line break inside a string (close the string with '\"' first, or write \\n)",
        "{\"a\": 1.}|plan.json:1:8: malformed JSON: malformed number (a digit must follow '.': write 1.0, not 1.)",
        "[1,]|plan.json:1:4: malformed JSON: expected a value before ']' (a value after ':', or no comma after the last item)",
        "]|plan.json:1:1: malformed JSON: ']' closes nothing (no list is open here)",
    })
    void eachMistakeReadsAsOneSentence(String text, String message) {
        InputException e = fail(text.replace("\\n", "\n"));
        assertThat(e.key()).isEqualTo(InputProblem.BAD_SYNTAX);
        assertThat(e.getMessage()).isEqualTo(message.replace("\\\\n", "\\n"));
        assertThat(e.getCause()).isNull();
    }

    @Test
    void noParserNamesFeatureFlagsOrDocumentTextInAnyMessage() {
        String[] texts = {"{\"secret-title\": 1", "{\"a\": [1}", "{\"a\": +1}", "{\"a\": Infinity}", "{\"a\": \"\u0001\"}",
            "{\"a\": \"\\q\"}", "{\"a\": -}", "{\"a\": 1e}", "{\"a\": .5}", "{\"a\": }"};
        for (String t : texts) {
            String m = fail(t).getMessage();
            assertThat(m).as(t).doesNotContain("Source", "code ", "Feature", "JsonReadFeature", "enable", "marker", "token",
                    "(String)", "secret-title", "\n").startsWith("plan.json:1:");
        }
    }

    @Test
    void aDocumentThatParsesIsNotTouched() {
        assertThatThrownBy(() -> JsonTree.of("{} {}", "p.json")).hasMessage(
                "p.json:1:4: unexpected content after the end of the document (only one JSON value is allowed)");
        assertThat(JsonTree.of("{\"a\": [1, 2]}", "p.json").json().get("a").size()).isEqualTo(2);
    }
}
