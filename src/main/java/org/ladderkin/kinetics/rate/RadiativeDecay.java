package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.LadderSpace;

/**
 * Radiative recombination N → N−1 at k_rad(N) = k_rad,1·f(N) in a neutral dot and chargedFactor·k_rad,1·f(N) in a
 * charged one. The default charged factor 2 follows k_rad(X±) ≈ 2·k_rad(X) (Rajadell, Climente, Planelles, Bertoni,
 * J. Phys. Chem. C 113, 11268 (2009)). The rate depends on the total N; the exciton removed is a cold one while any
 * is cold (see {@link LadderSpace#afterDecay}).
 *
 * @param singleExcitonRatePerS k_rad,1 = 1/τ_rad of a single neutral exciton (1/s)
 * @param scaling f(N)
 * @param chargedFactor k_rad(charged, N)/k_rad(neutral, N)
 */
public record RadiativeDecay(double singleExcitonRatePerS, ExcitonScaling scaling, double chargedFactor)
        implements RateLaw, Emitting {

    /** Default ratio of trion to exciton radiative rate. */
    public static final double DEFAULT_CHARGED_FACTOR = 2.0;

    public RadiativeDecay {
        Rates.requireRate("radiative rate", singleExcitonRatePerS);
        if (scaling == null) {
            throw new IllegalArgumentException("radiative scaling is missing");
        }
        if (!(chargedFactor >= 0) || !Double.isFinite(chargedFactor)) {
            throw new IllegalArgumentException("charged radiative factor must be finite and >= 0, was " + chargedFactor);
        }
    }

    @Override
    public double emissionRatePerS(LadderSpace space, int state) {
        int n = space.excitons(state);
        if (n == 0) {
            return 0;
        }
        double k = singleExcitonRatePerS * scaling.factor(n);
        return space.charge(state).charged() ? chargedFactor * k : k;
    }

    @Override
    public void contribute(LadderSpace space, GeneratorBuilder out) {
        for (int s = 0; s < space.size(); s++) {
            if (space.excitons(s) > 0) {
                out.add(s, space.afterDecay(s), emissionRatePerS(space, s));
            }
        }
    }
}
