package org.ladderkin.kinetics.process;

/** What kind of value a process parameter holds, which fixes how every front end reads and shows it. */
public enum ParameterKind {
    /** A time written with a unit ("50 ps"), held in seconds, &gt; 0; a lifetime's process rate is its inverse. */
    LIFETIME,
    /** A plain number ≥ 0 (a ratio of rates). */
    FACTOR,
    /** A number in [0, 1]. */
    PROBABILITY,
    /** One word of {@link ProcessParameter#choices()}. */
    CHOICE,
    /** A scaling law by name ({@link ProcessParameter#choices()}) or a table of factors. */
    SCALING_LAW,
    /** A non-empty list of words of {@link ProcessParameter#choices()}. */
    CHOICE_LIST
}
