package org.ladderkin.cli;

/** Process exit codes, the same for every command. */
public final class ExitCodes {

    /** Success. */
    public static final int OK = 0;
    /** An unexpected internal error: a bug, reported with its stack trace. */
    public static final int INTERNAL = 1;
    /** The command line was wrong (unknown option, unreadable flag value). */
    public static final int USAGE = 2;
    /** An input file or value was wrong. */
    public static final int BAD_INPUT = 3;
    /** An output could not be written. */
    public static final int CANNOT_WRITE = 4;

    private ExitCodes() {
    }
}
