package org.ladderkin.kinetics;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.ExcitonScaling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;

/**
 * The flat parameter set a model file or the command line describes; {@link #toModel()} turns it into rate laws.
 * A rate of 0 switches its process off. Cooling on (rate &gt; 0) makes the ladder resolve hot excitons.
 *
 * @param radiativeRatePerS 1/τ_rad of a single exciton
 * @param radiativeScaling f(N)
 * @param chargedRadiativeFactor k_rad(charged)/k_rad(neutral)
 * @param biexcitonAugerRatePerS 1/τ₂
 * @param augerScaling g(N)
 * @param negativeTrionAugerRatePerS Auger rate of X⁻
 * @param positiveTrionAugerRatePerS Auger rate of X⁺
 * @param trappingRatePerS per-exciton trapping rate
 * @param coolingRatePerS per-hot-exciton cooling rate (0: hot excitons not resolved)
 * @param charges excess charges that exist (empty: neutral dots only)
 * @param ionisation Auger ionisation
 * @param neutralisationRatePerS rate at which a charged dot loses its excess carrier
 * @param refreshRatePerS sample exchange rate (stirring, flow)
 * @param degeneracy band-edge degeneracy g
 * @param nMax fixed Nmax, or 0 for automatic
 */
public record ModelParameters(double radiativeRatePerS, ExcitonScaling radiativeScaling, double chargedRadiativeFactor,
                              double biexcitonAugerRatePerS, ExcitonScaling augerScaling,
                              double negativeTrionAugerRatePerS, double positiveTrionAugerRatePerS,
                              double trappingRatePerS, double coolingRatePerS, Set<Charge> charges,
                              AugerIonisation ionisation, double neutralisationRatePerS, double refreshRatePerS,
                              int degeneracy, int nMax) {

    public ModelParameters {
        charges = charges.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(charges));
        if (charges.contains(Charge.NEUTRAL)) {
            throw new IllegalArgumentException("list only excess charges (negative, positive); neutral always exists");
        }
        if (ionisation.probability() > 0 && !charges.contains(ionisation.leftCharge())) {
            throw new IllegalArgumentException("Auger ionisation leaves " + ionisation.leftCharge().name().toLowerCase()
                    + " dots, but that charge is not in the model's charges");
        }
    }

    /** A neutral model with radiative and Auger decay only. */
    public static ModelParameters simple(double radiativeRatePerS, ExcitonScaling radiativeScaling,
                                         double biexcitonAugerRatePerS, ExcitonScaling augerScaling, int degeneracy) {
        return new ModelParameters(radiativeRatePerS, radiativeScaling, RadiativeDecay.DEFAULT_CHARGED_FACTOR,
                biexcitonAugerRatePerS, augerScaling, 0, 0, 0, 0, Set.of(), AugerIonisation.NONE, 0, 0, degeneracy, 0);
    }

    /** A copy with other radiative, biexciton Auger and trapping rates (1/s), e.g. while fitting them. */
    public ModelParameters withRates(double radiative, double biexcitonAuger, double trapping) {
        return new ModelParameters(radiative, radiativeScaling, chargedRadiativeFactor, biexcitonAuger, augerScaling,
                negativeTrionAugerRatePerS, positiveTrionAugerRatePerS, trapping, coolingRatePerS, charges, ionisation,
                neutralisationRatePerS, refreshRatePerS, degeneracy, nMax);
    }

    /** The kinetic model: one rate law per process that is switched on. */
    public KineticModel toModel() {
        List<RateLaw> laws = new ArrayList<>();
        laws.add(new RadiativeDecay(radiativeRatePerS, radiativeScaling, chargedRadiativeFactor));
        laws.add(new AugerRecombination(biexcitonAugerRatePerS, augerScaling, negativeTrionAugerRatePerS,
                positiveTrionAugerRatePerS, ionisation));
        if (trappingRatePerS > 0) {
            laws.add(new Trapping(trappingRatePerS));
        }
        if (coolingRatePerS > 0) {
            laws.add(new Cooling(coolingRatePerS));
        }
        if (!charges.isEmpty() && neutralisationRatePerS > 0) {
            laws.add(new Neutralisation(neutralisationRatePerS));
        }
        if (refreshRatePerS > 0) {
            laws.add(new SampleRefresh(refreshRatePerS));
        }
        return new KineticModel(laws, charges, coolingRatePerS > 0, degeneracy, nMax);
    }

    /** Radiative scaling by its key: linear or statistical. */
    public static RadiativeScaling radiativeScaling(String key) {
        for (RadiativeScaling s : RadiativeScaling.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("radiative scaling '" + key + "' is not one of: linear, statistical (or a table)");
    }

    /** Auger scaling by its key: statistical, pairs or quadratic. */
    public static AugerScaling augerScaling(String key) {
        for (AugerScaling s : AugerScaling.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("Auger scaling '" + key + "' is not one of: statistical, pairs, quadratic (or a table)");
    }
}
