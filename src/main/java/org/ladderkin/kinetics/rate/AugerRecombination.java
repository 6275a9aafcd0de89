package org.ladderkin.kinetics.rate;

import java.util.Map;
import java.util.TreeMap;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Auger recombination N → N−1. Neutral dots: k_A(N) = k_A,2·g(N) (g(2) = 1), unless a measured rate for that N
 * replaces the scaling law (e.g. a triexciton lifetime τ₃ measured separately). Charged dots under the statistical
 * (carrier-triplet) law: the triplets are counted, the same counting that gives the neutral N²(N−1)/4 and
 * 1/τ₂ = 2/τ_X⁻ + 2/τ_X⁺. A dot X⁻ with N excitons holds N+1 electrons and N holes, so C(N+1,2)·N electron-electron-hole
 * triplets decay at the negative-trion rate k₋ each and (N+1)·C(N,2) hole-hole-electron triplets at k₊:
 * k(X⁻, N) = C(N+1,2)·N·k₋ + (N+1)·C(N,2)·k₊, and X⁺ with the charges swapped (a trion, N = 1, decays at exactly its
 * rate; equal trion rates give 9k at N = 2 and 30k at N = 3). Under the other laws, which count no carriers, a charged
 * dot decays at its trion rate times g(N+1). Neutral overrides do not touch charged dots. A fraction
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
            case NEGATIVE -> charged(n, negativeTrionRatePerS, positiveTrionRatePerS);
            case POSITIVE -> charged(n, positiveTrionRatePerS, negativeTrionRatePerS);
        };
    }

    /**
     * A dot with N excitons and one extra carrier: {@code sameRatePerS} is the trion rate of its own charge (triplets
     * with two carriers of the extra carrier's kind), {@code otherRatePerS} that of the opposite one.
     */
    private double charged(int n, double sameRatePerS, double otherRatePerS) {
        if (n == 0) {
            return 0;
        }
        if (scaling != AugerScaling.STATISTICAL) {
            return sameRatePerS * scaling.factor(n + 1);
        }
        double majority = n + 1.0;
        return majority * (majority - 1) / 2 * n * sameRatePerS + majority * n * (n - 1.0) / 2 * otherRatePerS;
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
