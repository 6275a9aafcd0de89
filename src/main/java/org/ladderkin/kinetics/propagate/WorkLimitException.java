package org.ladderkin.kinetics.propagate;

/**
 * A computation refused before it starts because its estimated work is above {@link WorkBound}. An
 * {@link IllegalArgumentException} because the input asked for it (the command line reports it as bad input, exit 3);
 * the message is one line naming what made the work large and what is allowed.
 */
public final class WorkLimitException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    public WorkLimitException(String message) {
        super(message);
    }
}
