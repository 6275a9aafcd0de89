package org.ladderkin.kinetics.rate;

import java.util.Map;
import java.util.TreeMap;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Auger recombination N → N−1. Neutral dots: k_A(N) = k_A,2·g(N) (g(2) = 1), unless a measured rate for that N
 * replaces the scaling law (e.g. a triexciton lifetime τ₃ measured separately). Charged dots: the trion rate of their
 * charge times g(N+1), i.e. the excess carrier counts like the missing half of one more exciton, so a trion (N = 1)
 * decays at exactly the trion rate; neutral overrides do not touch them. A fraction
 * {@link AugerIonisation#probability()} of neutral Auger events ionises the dot instead (see {@link AugerIonisation});
 * it is dropped when that charge is not in the ladder.
 *
 * @param biexcitonRatePerS     k_A,2 = 1/τ₂ (1/s)
 * @param scaling               g(N)
 * @param negativeTrionRatePerS Auger rate of the negative trion X⁻ (1/s)
 * @param positiveTrionRatePerS Auger rate of the positive trion X⁺ (1/s)
 * @param ionisation            photocharging by Auger ejection
 * @param neutralRatesPerS      Auger rates (1/s) of neutral dots with N ≥ 3 excitons that replace k_A,2·g(N)
 */
public record AugerRecombination(double biexcitonRatePerS, ExcitonScaling scaling, double negativeTrionRatePerS,
                                 double positiveTrionRatePerS, AugerIonisation ionisation,
                                 Map<Integer, Double> neutralRatesPerS) implements RateLaw {

    public AugerRecombination {
        Rates.requireRate("biexciton Auger rate", biexcitonRatePerS);
        Rates.requireRate("negative-trion Auger rate", negativeTrionRatePerS);
        Rates.requireRate("positive-trion Auger rate", positiveTrionRatePerS);
        if (scaling == null || ionisation == null) {
            throw new IllegalArgumentException("Auger scaling and ionisation must be given");
        }
        for (var e : neutralRatesPerS.entrySet()) {
            if (e.getKey() < 3) {
                throw new IllegalArgumentException("an Auger rate override is for N >= 3 (N = 2 is the biexciton rate), was N="
                        + e.getKey());
            }
            Rates.requireRate("Auger rate at N=" + e.getKey(), e.getValue());
        }
        neutralRatesPerS = Map.copyOf(neutralRatesPerS);
    }

    /** The law without rate overrides. */
    public AugerRecombination(double biexcitonRatePerS, ExcitonScaling scaling, double negativeTrionRatePerS,
                              double positiveTrionRatePerS, AugerIonisation ionisation) {
        this(biexcitonRatePerS, scaling, negativeTrionRatePerS, positiveTrionRatePerS, ionisation, Map.of());
    }

    /** A copy whose neutral N-exciton Auger rate is {@code ratePerS} instead of the scaling law's. */
    public AugerRecombination withNeutralRate(int n, double ratePerS) {
        Map<Integer, Double> next = new TreeMap<>(neutralRatesPerS);
        next.put(n, ratePerS);
        return new AugerRecombination(biexcitonRatePerS, scaling, negativeTrionRatePerS, positiveTrionRatePerS, ionisation,
                next);
    }

    /** A copy with another ionisation law. */
    public AugerRecombination withIonisation(AugerIonisation next) {
        return new AugerRecombination(biexcitonRatePerS, scaling, negativeTrionRatePerS, positiveTrionRatePerS, next,
                neutralRatesPerS);
    }

    /** The same law with every Auger rate {@code factor} times faster (a smaller dot of a size ensemble). */
    public AugerRecombination scaled(double factor) {
        if (!(factor >= 0) || !Double.isFinite(factor)) {
            throw new IllegalArgumentException("Auger rate factor must be finite and >= 0, was " + factor);
        }
        Map<Integer, Double> next = new TreeMap<>();
        neutralRatesPerS.forEach((n, k) -> next.put(n, k * factor));
        return new AugerRecombination(biexcitonRatePerS * factor, scaling, negativeTrionRatePerS * factor,
                positiveTrionRatePerS * factor, ionisation, next);
    }

    /** Total Auger rate (1/s) out of {@code state}. */
    public double ratePerS(LadderSpace space, int state) {
        int n = space.excitons(state);
        return switch (space.charge(state)) {
            case NEUTRAL -> neutralRatesPerS.containsKey(n) ? neutralRatesPerS.get(n) : biexcitonRatePerS * scaling.factor(n);
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
