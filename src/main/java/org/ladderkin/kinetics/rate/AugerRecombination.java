package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Auger recombination N → N−1. Neutral dots: k_A(N) = k_A,2·g(N) (g(2) = 1). Charged dots: the trion rate of their
 * charge times g(N+1), i.e. the excess carrier counts like the missing half of one more exciton, so a trion (N = 1)
 * decays at exactly the trion rate. A fraction {@link AugerIonisation#probability()} of neutral Auger events ionises
 * the dot instead (see {@link AugerIonisation}); it is dropped when that charge is not in the ladder.
 *
 * @param biexcitonRatePerS k_A,2 = 1/τ₂ (1/s)
 * @param scaling g(N)
 * @param negativeTrionRatePerS Auger rate of the negative trion X⁻ (1/s)
 * @param positiveTrionRatePerS Auger rate of the positive trion X⁺ (1/s)
 * @param ionisation photocharging by Auger ejection
 */
public record AugerRecombination(double biexcitonRatePerS, ExcitonScaling scaling, double negativeTrionRatePerS,
                                 double positiveTrionRatePerS, AugerIonisation ionisation) implements RateLaw {

    public AugerRecombination {
        Rates.requireRate("biexciton Auger rate", biexcitonRatePerS);
        Rates.requireRate("negative-trion Auger rate", negativeTrionRatePerS);
        Rates.requireRate("positive-trion Auger rate", positiveTrionRatePerS);
        if (scaling == null || ionisation == null) {
            throw new IllegalArgumentException("Auger scaling and ionisation must be given");
        }
    }

    /** Total Auger rate (1/s) out of {@code state}. */
    public double ratePerS(LadderSpace space, int state) {
        int n = space.excitons(state);
        return switch (space.charge(state)) {
            case NEUTRAL -> biexcitonRatePerS * scaling.factor(n);
            case NEGATIVE -> n == 0 ? 0 : negativeTrionRatePerS * scaling.factor(n + 1);
            case POSITIVE -> n == 0 ? 0 : positiveTrionRatePerS * scaling.factor(n + 1);
        };
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        boolean canIonise = ionisation.probability() > 0 && space.has(ionisation.leftCharge());
        for (int s = 0; s < space.size(); s++) {
            double k = ratePerS(space, s);
            if (k == 0) {
                continue;
            }
            if (canIonise && space.charge(s) == Charge.NEUTRAL) {
                int after = space.afterDecay(s);
                int twiceDecayed = space.afterDecay(after);
                int ionised = space.index(ionisation.leftCharge(), space.excitons(twiceDecayed), space.hot(twiceDecayed));
                out.add(s, after, k * (1 - ionisation.probability()));
                out.add(s, ionised, k * ionisation.probability());
            } else {
                out.add(s, space.afterDecay(s), k);
            }
        }
    }
}
