package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * A charged dot loses its excess carrier at k_neut, keeping its excitons.
 *
 * @param ratePerS k_neut (1/s)
 */
public record Neutralisation(double ratePerS) implements RateLaw {

    public Neutralisation {
        Rates.requireRate("neutralisation rate", ratePerS);
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        for (int s = 0; s < space.size(); s++) {
            if (space.charge(s).charged()) {
                out.add(s, space.index(Charge.NEUTRAL, space.excitons(s), space.hot(s)), ratePerS);
            }
        }
    }
}
