package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;

import org.assertj.core.api.ThrowingConsumer;

/** Checks bad input by what the reader decided (key, place, field) rather than by how the message words it. */
public final class InputAssertions {

    private InputAssertions() {
    }

    /**
     * @param key      the expected problem
     * @param location {@code FILE}, {@code FILE:LINE} or {@code FILE:LINE:COLUMN} as the message prints it
     * @param field    the field named, or null when none is
     */
    public static ThrowingConsumer<Throwable> input(InputProblem key, String location, String field) {
        return t -> {
            assertThat(t).as("message: %s", t.getMessage()).isInstanceOf(InputException.class);
            InputException e = (InputException) t;
            assertThat(e.key()).as("key of: %s", e.getMessage()).isEqualTo(key);
            assertThat(e.location().toString()).as("location of: %s", e.getMessage()).isEqualTo(location);
            assertThat(e.field()).as("field of: %s", e.getMessage()).isEqualTo(field);
            assertThat(e.getMessage()).as("one line").doesNotContain("\n");
        };
    }
}
