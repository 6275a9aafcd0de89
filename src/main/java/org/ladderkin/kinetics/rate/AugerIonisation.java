package org.ladderkin.kinetics.rate;

import org.ladderkin.kinetics.state.Charge;

/**
 * Photocharging by Auger ionisation: each Auger event in a neutral dot ejects a carrier with probability
 * {@code probability}. Assumption: the ejected carrier breaks a second exciton, whose partner stays as the excess
 * charge, so a neutral N-exciton dot becomes a dot with N−2 excitons and charge {@code leftCharge}. Charged dots are
 * not ionised further (the ladder holds at most one excess carrier).
 *
 * @param probability ejection probability per Auger event
 * @param leftCharge charge the dot keeps (negative when the hole is ejected, positive when the electron is)
 */
public record AugerIonisation(double probability, Charge leftCharge) {

    /** No ionisation. */
    public static final AugerIonisation NONE = new AugerIonisation(0, Charge.NEGATIVE);

    public AugerIonisation {
        Rates.requireProbability("Auger ionisation probability", probability);
        if (leftCharge == null || !leftCharge.charged()) {
            throw new IllegalArgumentException("Auger ionisation must leave a negative or positive dot, not " + leftCharge);
        }
    }
}
