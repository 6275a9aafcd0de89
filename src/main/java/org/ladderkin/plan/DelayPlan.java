package org.ladderkin.plan;

import java.util.List;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.TimeWindows;

/**
 * Delays to record with one instrument.
 *
 * @param instrument          the instrument
 * @param delaysS             the delay grid (s); for TCSPC the bin centres are implied by bin and range
 * @param stageTravelM        delay-stage travel the longest delay needs (m); 0 for TCSPC
 * @param windows             early/late analysis windows
 * @param timePerPointS       averaging time per delay point (s)
 * @param timePerFluenceS     acquisition time of one trace (s)
 * @param risks               instrument-specific risks (coverage, pile-up)
 * @param counting            the photon-counting decay's plan (TCSPC), null for transient absorption
 */
public record DelayPlan(Instrument instrument, double[] delaysS, double stageTravelM, TimeWindows.EarlyLate windows,
                        double timePerPointS, double timePerFluenceS, List<Risk> risks, PhotonCounting counting) {

    public DelayPlan {
        delaysS = delaysS.clone();
        risks = List.copyOf(risks);
        if ((counting != null) != (instrument.kind() == Instrument.Kind.TCSPC)) {
            throw new IllegalArgumentException("a TCSPC delay plan, and only one, carries its photon-counting plan");
        }
    }

    @Override
    public double[] delaysS() {
        return delaysS.clone();
    }
}
