package org.ladderkin.kinetics;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.SplittableRandom;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;

/** Models used by several tests. */
public final class TestModels {

    private TestModels() {
    }

    /** Neutral ladder with radiative (linear or statistical) and Auger decay. */
    public static KineticModel ladder(double tauRadS, RadiativeScaling rad, double tauAuger2S, AugerScaling auger,
                                      int degeneracy, int nMax) {
        List<RateLaw> laws = new ArrayList<>();
        laws.add(new RadiativeDecay(tauRadS > 0 ? 1 / tauRadS : 0, rad, 2));
        laws.add(new AugerRecombination(1 / tauAuger2S, auger, 0, 0, AugerIonisation.NONE));
        return new KineticModel(laws, EnumSet.of(Charge.NEUTRAL), false, degeneracy, nMax);
    }

    /** The 31-state ladder of the benchmark: τ_rad 20 ns statistical, τ₂ 50 ps statistical, g = 2. */
    public static KineticModel benchLadder() {
        return ladder(20e-9, RadiativeScaling.STATISTICAL, 50e-12, AugerScaling.STATISTICAL, 2, 30);
    }

    /** A random model with every process switched on at random rates (1/(0.5 ps) to 1/(5 µs)), Nmax 3 to 10. */
    public static KineticModel random(SplittableRandom rnd) {
        List<RateLaw> laws = new ArrayList<>();
        laws.add(new RadiativeDecay(rate(rnd), rnd.nextBoolean() ? RadiativeScaling.LINEAR : RadiativeScaling.STATISTICAL,
                1 + rnd.nextDouble() * 2));
        AugerScaling[] scalings = AugerScaling.values();
        Charge left = rnd.nextBoolean() ? Charge.NEGATIVE : Charge.POSITIVE;
        laws.add(new AugerRecombination(rate(rnd), scalings[rnd.nextInt(scalings.length)], rate(rnd), rate(rnd),
                new AugerIonisation(rnd.nextDouble() * 0.2, left)));
        if (rnd.nextBoolean()) {
            laws.add(new Trapping(rate(rnd)));
        }
        boolean hot = rnd.nextBoolean();
        if (hot) {
            laws.add(new Cooling(rate(rnd)));
        }
        laws.add(new Neutralisation(rate(rnd) * 1e-3));
        if (rnd.nextBoolean()) {
            laws.add(new SampleRefresh(1 / (1e-3 * (1 + rnd.nextDouble()))));
        }
        EnumSet<Charge> charges = EnumSet.of(Charge.NEUTRAL, left);
        if (rnd.nextBoolean()) {
            charges.add(left == Charge.NEGATIVE ? Charge.POSITIVE : Charge.NEGATIVE);
        }
        return new KineticModel(laws, charges, hot, rnd.nextBoolean() ? 2 : 8, 3 + rnd.nextInt(8));
    }

    private static double rate(SplittableRandom rnd) {
        return 1 / (0.5e-12 * Math.pow(10, rnd.nextDouble() * 7));
    }
}
