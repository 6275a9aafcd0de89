package org.ladderkin.plan;

import java.util.Locale;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.PulseTrainRisks;
import org.ladderkin.observe.Risk;
import org.ladderkin.sample.Refresh;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * Photocharging advice for a film: it cannot be stirred or flowed, only moved under the beam, so the advice names the
 * translation speed v that renews a pump spot of 1/e² diameter D often enough (refresh rate v/D).
 */
final class FilmTranslation {

    /** Share of the charging limit below which the row passes, as in {@link PulseTrainRisks#chargingRisk}. */
    static final double PASS_FRACTION = 0.5;

    private FilmTranslation() {
    }

    /** The slowest translation speed (m/s) that keeps the charged fraction at or below {@code limit}; 0 or +∞ as below. */
    static double speedForCharging(KineticModel km, double n, double periodS, double limit, double pumpDiameterM) {
        double rate = PulseTrainRisks.refreshRateForCharging(km, new PulseExcitation.Poisson(n), periodS, limit);
        return rate * pumpDiameterM;
    }

    /** The charging row with its stir-or-flow advice replaced by the film's translation speed. */
    static Risk advise(Risk charging, KineticModel km, double n, double periodS, double limit, Refresh refresh,
                       double pumpDiameterM) {
        // the charging row passes below half its limit (PulseTrainRisks.chargingRisk): the speed aims there
        double speed = speedForCharging(km, n, periodS, PASS_FRACTION * limit, pumpDiameterM);
        String now = refresh.mode() == Refresh.Mode.TRANSLATED
                ? ", now " + Quantity.formatBest(refresh.speedMPerS(), Dimension.SPEED, 3) : ", now static";
        String advice;
        if (speed == 0) {
            advice = "no translation is needed at this setting" + now;
        } else if (Double.isInfinite(speed)) {
            advice = "no translation speed is enough" + now;
        } else {
            advice = String.format(Locale.ROOT, "translate the film at %s or faster to pass (a fresh %s spot every %s%s)",
                    Quantity.formatBest(speed, Dimension.SPEED, 2), Quantity.formatBest(pumpDiameterM, Dimension.LENGTH, 3),
                    Quantity.formatBest(pumpDiameterM / speed, Dimension.TIME, 2), now);
        }
        return new Risk(charging.name(), charging.verdict(), charging.value(), charging.limit(), charging.unit(),
                charging.why().replace("stir or flow the sample", advice));
    }
}
