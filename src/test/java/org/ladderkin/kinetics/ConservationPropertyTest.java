package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/** Conservation and positivity over seeded random models (every process on, random rates over seven decades). */
class ConservationPropertyTest {

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16})
    void probabilityIsConservedAndNonNegative(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        KineticModel model = TestModels.random(rnd);
        PulseExcitation pulse = rnd.nextBoolean() ? new PulseExcitation.Poisson(rnd.nextDouble() * 2.5)
                : new PulseExcitation.Multiplication(rnd.nextDouble() * 1.5, rnd.nextDouble());
        LadderKinetics k = LadderKinetics.forPulses(model, pulse);
        Populations p = k.applyPulse(Populations.ground(k.space()), pulse);
        for (double t : new double[] {1e-14, 1e-12, 1e-10, 1e-8, 1e-6, 1e-3}) {
            double[] q = k.propagate(p, t).probabilities();
            assertNormalised(q);
        }
        double period = 1 / (1e3 * Math.pow(10, rnd.nextDouble() * 5));
        SteadyState ss = k.steadyState(pulse, period, false);
        assertNormalised(ss.beforePulse().probabilities());
        assertNormalised(ss.afterPulse().probabilities());
        // the generator conserves probability column by column
        double[][] q = k.generator();
        for (int j = 0; j < q.length; j++) {
            double s = 0;
            double scale = 0;
            for (double[] row : q) {
                s += row[j];
                scale += Math.abs(row[j]);
            }
            assertThat(Math.abs(s)).isLessThanOrEqualTo(1e-15 * scale);
        }
    }

    private static void assertNormalised(double[] p) {
        double s = 0;
        for (double x : p) {
            assertThat(x).isGreaterThanOrEqualTo(-PopulationGuard.NEGATIVE_TOLERANCE);
            s += x;
        }
        assertThat(s).isCloseTo(1.0, org.assertj.core.data.Offset.offset(PopulationGuard.SUM_TOLERANCE));
    }
}
