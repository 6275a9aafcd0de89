package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Non-radiative trapping: each exciton is lost independently at k_trap, so N → N−1 at N·k_trap (cold first).
 *
 * @param perExcitonRatePerS k_trap (1/s)
 */
public record Trapping(double perExcitonRatePerS) implements RateLaw {

    public Trapping {
        Rates.requireRate("trapping rate", perExcitonRatePerS);
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        for (int s = 0; s < space.size(); s++) {
            int n = space.excitons(s);
            if (n > 0) {
                out.add(s, space.afterDecay(s), n * perExcitonRatePerS);
            }
        }
    }
}
