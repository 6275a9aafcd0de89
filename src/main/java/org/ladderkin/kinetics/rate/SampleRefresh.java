package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Stirring or flow replaces the dots in the probed volume with fresh ones: any state goes to the neutral ground
 * state at k_refresh.
 *
 * @param ratePerS k_refresh (1/s)
 */
public record SampleRefresh(double ratePerS) implements RateLaw {

    public SampleRefresh {
        Rates.requireRate("refresh rate", ratePerS);
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        for (int s = 1; s < space.size(); s++) {
            out.add(s, space.ground(), ratePerS);
        }
    }
}
