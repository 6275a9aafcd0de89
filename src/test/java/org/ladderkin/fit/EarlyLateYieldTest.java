package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The early/late estimate of the yield, in the fitted direction: from traces back to 1 + η. */
class EarlyLateYieldTest {

    private static final double SIGMA_M2 = 1e-19;
    private static final double EARLY_S = 0.5e-12;
    private static final double LATE_S = 400e-12;
    private static final double[] DELAYS = {0.5e-12, 0.8e-12, 2e-12, 5e-12, 10e-12, 20e-12, 50e-12, 100e-12, 200e-12,
        400e-12, 800e-12};

    /**
     * lim_{⟨N⟩→0} A/B for the death chain of {@link CompoundPoissonSeries}: a weak pulse makes one exciton with
     * probability ∝ 1 − η and two with probability ∝ η; one exciton bleaches ½e^{−γ₁t}; two bleach p₂ + ½p₁ with
     * p₂ = e^{−γ₂t} and p₁ = γ₂/(γ₂ − γ₁)·(e^{−γ₁t} − e^{−γ₂t}). At t_A ≪ τ₂ and τ₂ ≪ t_B ≪ τ_rad it is 1 + η.
     */
    static double limit(double eta, double tA, double tB) {
        double g1 = 1 / CompoundPoissonSeries.TAU_RAD_S;
        double g2 = 4 / CompoundPoissonSeries.TAU_RAD_S + 1 / CompoundPoissonSeries.TAU_AUGER2_S;
        return bleach(eta, g1, g2, tA) / bleach(eta, g1, g2, tB);
    }

    private static double bleach(double eta, double g1, double g2, double t) {
        double p2 = Math.exp(-g2 * t);
        double p1 = g2 / (g2 - g1) * (Math.exp(-g1 * t) - Math.exp(-g2 * t));
        return (1 - eta) * 0.5 * Math.exp(-g1 * t) + eta * (p2 + 0.5 * p1);
    }

    @Test
    @CheckedAgainst(source = "closed form derived in the test: the low-fluence limit of A/B of a death chain with one or two "
            + "excitons per absorbed photon (→ 1 + η for t_A ≪ τ₂ ≪ t_B ≪ τ_rad)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void extrapolatedRatioOfNoiseFreeTracesIsTheClosedFormLimit() {
        for (double eta : new double[] {0, 0.3, 0.7}) {
            double[] j = {0.005 / SIGMA_M2, 0.01 / SIGMA_M2, 0.02 / SIGMA_M2};
            Dataset d = CompoundPoissonSeries.series(SIGMA_M2, eta, j, DELAYS, 0.01, 0, 1);
            EarlyLateYield.Estimate e = EarlyLateYield.of(d, new double[] {0.005, 0.01, 0.02}, EARLY_S, LATE_S);
            Reference.check("A/B extrapolated to zero fluence, η = " + eta, e.limit(), limit(eta, EARLY_S, LATE_S), 2e-4);
            // radiative decay over t_B (2 %) and Auger decay before t_A (1 %) keep it off 1 + η
            Reference.check("closed-form limit against 1 + η, η = " + eta, limit(eta, EARLY_S, LATE_S), 1 + eta, 0.03 * (1 + eta));
        }
    }

    @Test
    @CheckedAgainst(source = "closed form derived in EarlyLateYieldTest.limit, data from the independent death chain with "
            + "Gaussian noise; a normal estimate lies within 3 standard errors with probability 0.997",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void noisyLowFluenceSeriesGivesTheLimitWithinThreeStandardErrors() {
        double[] j = {0.1 / SIGMA_M2, 0.2 / SIGMA_M2, 0.35 / SIGMA_M2, 0.5 / SIGMA_M2, 1.5 / SIGMA_M2};
        Dataset d = CompoundPoissonSeries.series(SIGMA_M2, 0.4, j, SyntheticSeries.logDelays(0.4e-12, 1e-9, 60), 0.01,
                2e-5, 4);
        EarlyLateYield.Estimate e = EarlyLateYield.of(d, new double[] {0.1, 0.2, 0.35, 0.5, 1.5}, EARLY_S, LATE_S);
        assertThat(e.x()).hasSize(4);
        assertThat(e.limitStdError()).isPositive().isLessThan(0.1);
        Reference.check("early/late limit from a noisy series, η = 0.4", e.limit(), limit(0.4, EARLY_S, LATE_S),
                3 * e.limitStdError());
    }
}
