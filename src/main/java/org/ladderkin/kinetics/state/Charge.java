package org.ladderkin.kinetics.state;

/** Net charge of a dot beyond its excitons: neutral, one extra electron, or one extra hole. */
public enum Charge {
    NEUTRAL, NEGATIVE, POSITIVE;

    /** Whether the dot carries an excess carrier. */
    public boolean charged() {
        return this != NEUTRAL;
    }
}
