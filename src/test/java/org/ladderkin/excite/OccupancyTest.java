package org.ladderkin.excite;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class OccupancyTest {

    @Test
    @CheckedAgainst(source = "derived: compound Poisson with Poisson(m) photons, each giving 2 excitons with probability η:"
            + " P(0) = e^{−m}, P(1) = m·e^{−m}(1−η), P(2) = e^{−m}(m·η + m²(1−η)²/2), mean m(1+η)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void compoundPoissonMatchesItsFirstTermsAndMean() {
        double m = 1.7;
        double eta = 0.35;
        double[] p = Occupancy.compoundPoisson(m, eta, 80);
        double e = Math.exp(-m);
        Reference.checkRelative("P(0)", p[0], e, 1e-14);
        Reference.checkRelative("P(1)", p[1], m * e * (1 - eta), 1e-14);
        Reference.checkRelative("P(2)", p[2], e * (m * eta + m * m * (1 - eta) * (1 - eta) / 2), 1e-14);
        double mean = 0;
        double total = 0;
        for (int k = 0; k < p.length; k++) {
            mean += k * p[k];
            total += p[k];
        }
        Reference.checkRelative("mean excitons", mean, m * (1 + eta), 1e-13);
        Reference.check("total probability", total, 1, 1e-14);
    }

    @Test
    void poissonCutoffLeavesLessThanTheTail() {
        for (double mean : new double[] {0.01, 1, 10, 40}) {
            int n = Occupancy.poissonCutoff(mean, 1e-9);
            assertThat(Occupancy.poissonTail(mean, n)).isLessThan(1e-9);
            assertThat(n == 0 || Occupancy.poissonTail(mean, n - 1) >= 1e-9).isTrue();
        }
    }

    @Test
    void quantumYieldLawsAreCappedAndOrdered() {
        double ev = 1.602176634e-19;
        QuantumYieldLaw stair = new QuantumYieldLaw.Staircase(0.9 * ev);
        assertThat(stair.eta(1.7 * ev)).isZero();
        assertThat(stair.eta(1.9 * ev)).isEqualTo(1.0);
        QuantumYieldLaw lin = new QuantumYieldLaw.ThresholdLinear(2.7 * ev, 1.0 * ev);
        assertThat(lin.eta(3.2 * ev)).isCloseTo(0.5, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(lin.eta(9 * ev)).isEqualTo(1.0);
        QuantumYieldLaw table = new QuantumYieldLaw.Table(new double[] {2 * ev, 3 * ev}, new double[] {0, 0.4});
        assertThat(table.eta(2.5 * ev)).isCloseTo(0.2, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(new QuantumYieldLaw.None().eta(5 * ev)).isZero();
    }
}
