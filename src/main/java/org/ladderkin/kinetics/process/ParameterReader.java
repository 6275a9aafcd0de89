package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.ExcitonScaling;

/**
 * A {@link ParameterSource} with the registry's defaults applied: a missing parameter that has a default reads as
 * that default, a missing one without a default is an error located by the source.
 */
public final class ParameterReader {

    private final ParameterSource source;

    public ParameterReader(ParameterSource source) {
        this.source = source;
    }

    public boolean has(ProcessParameter p) {
        return source.has(p);
    }

    /** A lifetime (s); a missing optional lifetime reads as +∞ (the process it belongs to is then off). */
    public double seconds(ProcessParameter p) {
        check(p, ParameterKind.LIFETIME);
        if (source.has(p)) {
            return source.seconds(p);
        }
        if (p.required()) {
            throw missing(p);
        }
        return Double.POSITIVE_INFINITY;
    }

    public double number(ProcessParameter p) {
        if (p.kind() != ParameterKind.FACTOR && p.kind() != ParameterKind.PROBABILITY) {
            throw new IllegalStateException(p.key() + " is not a number");
        }
        if (source.has(p)) {
            return source.number(p);
        }
        if (p.required()) {
            throw missing(p);
        }
        return Double.parseDouble(p.defaultText());
    }

    public String choice(ProcessParameter p) {
        check(p, ParameterKind.CHOICE);
        if (source.has(p)) {
            return source.choice(p);
        }
        if (p.required()) {
            throw missing(p);
        }
        return p.defaultText();
    }

    /** A list of words; a missing optional list is empty. */
    public List<String> choices(ProcessParameter p) {
        check(p, ParameterKind.CHOICE_LIST);
        if (source.has(p)) {
            return source.choices(p);
        }
        if (p.required()) {
            throw missing(p);
        }
        return List.of();
    }

    /** A scaling law or table; {@code byName} turns a law's name into the law. */
    public ExcitonScaling scaling(ProcessParameter p, int firstN, java.util.function.Function<String, ExcitonScaling> byName) {
        check(p, ParameterKind.SCALING_LAW);
        if (source.has(p)) {
            return source.scaling(p, firstN);
        }
        if (p.required()) {
            throw missing(p);
        }
        return byName.apply(p.defaultText());
    }

    /** An error about {@code p}, located by the source. */
    public RuntimeException error(ProcessParameter p, String problem) {
        return source.error(p, problem);
    }

    private RuntimeException missing(ProcessParameter p) {
        return source.missing(p);
    }

    private static void check(ProcessParameter p, ParameterKind kind) {
        if (p.kind() != kind) {
            throw new IllegalStateException(p.key() + " is a " + p.kind() + ", not a " + kind);
        }
    }
}
