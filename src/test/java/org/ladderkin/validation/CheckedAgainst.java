package org.ladderkin.validation;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.junit.jupiter.api.extension.ExtendWith;

/**
 * Marks a test that compares ladderkin with something outside the project. Every comparison inside it goes through
 * {@link Reference#check}, which records value, reference and tolerance for the validation dossier
 * ({@code target/validation.md}, committed as {@code docs/validation.md}).
 */
@Target(ElementType.METHOD)
@Retention(RetentionPolicy.RUNTIME)
@ExtendWith(ValidationRecorder.class)
public @interface CheckedAgainst {

    /** Where the reference comes from: authors, journal, year and equation/table/figure; or the library and routine. */
    String source();

    /** What kind of reference it is. */
    Kind kind();

    /** Reference kinds, from strongest to weakest. */
    enum Kind {
        /** A published paper or handbook, cited with equation, table or figure. */
        PUBLISHED,
        /** A closed-form result derived by hand (the derivation is in the test or docs/physics.md). */
        CLOSED_FORM,
        /** A general-purpose numerical library used as an independent reference. */
        REFERENCE_LIBRARY,
        /** A value known in the trade with no citable source. */
        COMMON_PRACTICE,
        /** A value recalled without a source at hand. */
        FROM_MEMORY
    }
}
