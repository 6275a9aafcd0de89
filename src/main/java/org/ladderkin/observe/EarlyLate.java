package org.ladderkin.observe;

import java.util.ArrayList;
import java.util.List;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Trace;
import org.ladderkin.kinetics.train.PulseExcitation;

/**
 * The early/late analysis: band-edge bleach A after cooling but before Auger decay and B after Auger decay but before
 * single-exciton decay, versus ⟨N⟩. For Poisson excitation of a g-fold level A/B = Σmin(N,g)P(N)/(1 − e^{−⟨N⟩}); at
 * ⟨N⟩ → 0 the ratio tends to the number of excitons per absorbed photon, which reveals carrier multiplication
 * (Schaller & Klimov, Phys. Rev. Lett. 92, 186601 (2004)).
 */
public final class EarlyLate {

    /**
     * One point of the analysis.
     *
     * @param meanExcitons ⟨N⟩ of the pulse (excitons per dot, multiplication included)
     * @param early        bleach at the early delay (fraction of one filled level)
     * @param late         bleach at the late delay
     */
    public record Point(double meanExcitons, double early, double late) {
        /** A/B. */
        public double ratio() {
            return early / late;
        }
    }

    private EarlyLate() {
    }

    /** Early and late bleach after one pulse on unexcited dots, for each pulse. */
    public static List<Point> curve(KineticModel model, List<PulseExcitation> pulses, double earlyS, double lateS) {
        if (!(earlyS >= 0) || !(lateS > earlyS)) {
            throw new IllegalArgumentException("the late delay must come after the early one (" + earlyS + " s, " + lateS + " s)");
        }
        LadderKinetics kin = LadderKinetics.forPulses(model, pulses.toArray(PulseExcitation[]::new));
        double[] delays = {earlyS, lateS};
        List<Point> out = new ArrayList<>();
        for (PulseExcitation p : pulses) {
            Trace t = kin.singlePulse(p, delays);
            out.add(new Point(p.meanExcitons(), t.bleach()[0], t.bleach()[1]));
        }
        return List.copyOf(out);
    }

    /**
     * The apparent excitons per absorbed photon at low fluence: A/B for a weak pulse that absorbs
     * {@code meanPhotons} photons per dot, each yielding a second exciton with probability η.
     */
    public static double lowFluenceRatio(KineticModel model, double meanPhotons, double eta, double earlyS, double lateS) {
        return curve(model, List.of(new PulseExcitation.Multiplication(meanPhotons, eta)), earlyS, lateS).get(0).ratio();
    }
}
