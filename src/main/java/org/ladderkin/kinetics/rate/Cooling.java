package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Intraband cooling: each hot exciton relaxes to the band edge independently at k_cool, h → h−1 at h·k_cool.
 * Does nothing in a ladder that does not resolve hot excitons.
 *
 * @param perHotExcitonRatePerS k_cool (1/s)
 */
public record Cooling(double perHotExcitonRatePerS) implements RateLaw {

    public Cooling {
        Rates.requireRate("cooling rate", perHotExcitonRatePerS);
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        for (int s = 0; s < space.size(); s++) {
            int h = space.hot(s);
            if (h > 0) {
                out.add(s, space.index(space.charge(s), space.excitons(s), h - 1), h * perHotExcitonRatePerS);
            }
        }
    }
}
