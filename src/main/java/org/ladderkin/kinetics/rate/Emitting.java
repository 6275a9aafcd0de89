package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/** A process that emits photons; its rate out of a state is the photoluminescence of that state. */
public interface Emitting {

    /** Photon emission rate (1/s) of one dot in {@code state}. */
    double emissionRatePerS(LadderSpace space, int state);
}
