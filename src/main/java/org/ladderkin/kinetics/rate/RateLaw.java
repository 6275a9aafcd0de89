package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * One physical process: it adds its transitions to the generator. Adding a process means adding an implementation,
 * never editing a switch. Between-pulse processes must only move population to a lower index (see {@link LadderSpace}).
 */
public interface RateLaw {

    /** Adds this process's transitions (rates in 1/s) for every state of {@code space}. */
    void contribute(LadderSpace space, GeneratorBuilder out);
}
