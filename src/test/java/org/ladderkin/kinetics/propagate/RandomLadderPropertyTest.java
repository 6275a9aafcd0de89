package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Seeded random ladders (4 to 16 states, rates log-uniform in 1/(1 µs)..1/(1 ps), some rates deliberately equal,
 * random initial distribution): agreement with the matrix exponential, conservation and positivity.
 */
class RandomLadderPropertyTest {

    @ParameterizedTest(name = "seed {0}")
    @ValueSource(longs = {11, 12, 13, 14, 15, 16, 17, 18})
    @CheckedAgainst(source = "Hipparchus 4.0.3 MatrixUtils.matrixExponential applied to P(0)",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void randomLadderAgreesWithMatrixExponentialAndKeepsProbability(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int n = 4 + random.nextInt(13);
        double[] k = new double[n];
        for (int i = 1; i < n; i++) {
            k[i] = 1e6 * Math.pow(10, 6 * random.nextDouble());
        }
        if (n > 3) {
            k[2] = k[1]; // coincident rates: where closed-form (Bateman) sums break down
        }
        double[] p0 = new double[n];
        double sum = 0;
        for (int i = 0; i < n; i++) {
            p0[i] = random.nextDouble();
            sum += p0[i];
        }
        for (int i = 0; i < n; i++) {
            p0[i] /= sum;
        }
        double tEnd = 1e-12 * Math.pow(10, 6 * random.nextDouble());
        double[] times = {tEnd / 100, tEnd / 10, tEnd};
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-11, 1e-8))
                .integrate(StiffFixtures.ladder(k), 0, p0, times);
        double[][] g = StiffFixtures.ladderGenerator(k);
        double worst = 0;
        double worstSum = 0;
        double lowest = 0;
        for (int i = 0; i < times.length; i++) {
            double[] ref = HipparchusReference.expmTimes(g, times[i], p0);
            double largest = 0;
            double diff = 0;
            double total = 0;
            for (int j = 0; j < n; j++) {
                largest = Math.max(largest, Math.abs(ref[j]));
                diff = Math.max(diff, Math.abs(r.states()[i][j] - ref[j]));
                total += r.states()[i][j];
                lowest = Math.min(lowest, r.states()[i][j]);
            }
            worst = Math.max(worst, diff / largest);
            worstSum = Math.max(worstSum, Math.abs(total - 1));
        }
        Reference.check(n + "-state random ladder to t = " + tEnd + " s: max |P - expm| / max P", worst, 0.0, 1e-8);
        assertThat(worstSum).as("|sum P - 1|").isLessThan(1e-12);
        assertThat(lowest).as("lowest population").isGreaterThan(-1e-15);
    }
}
