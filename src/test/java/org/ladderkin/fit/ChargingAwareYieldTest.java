package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.ChargingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;

/**
 * The photocharging false positive: a static 80 MHz series with trions and no multiplication, with and without a
 * refreshed run beside it.
 */
class ChargingAwareYieldTest {

    private static final double SIGMA_M2 = 1e-19;
    private static final double PERIOD_S = 1 / 80e6;
    /** Invented charging: 5 % of Auger events ionise, the charge lives 1 µs, the negative trion decays in 100 ps. */
    private static final LadderModel CHARGING = new LadderModel(List.of(
            new RadiativeProcess(20e-9, RadiativeScaling.STATISTICAL, RadiativeDecay.DEFAULT_CHARGED_FACTOR),
            new AugerProcess(40e-12, AugerScaling.STATISTICAL, 100e-12, Double.POSITIVE_INFINITY),
            new ChargingProcess(Set.of(Charge.NEGATIVE), new AugerIonisation(0.05, Charge.NEGATIVE), 1e-6)), 2, 0);
    private static final double[] FLUENCES = {0.15 / SIGMA_M2, 0.5 / SIGMA_M2, 1.5 / SIGMA_M2};
    private static final double[] DELAYS = SyntheticSeries.logDelays(0.5e-12, 1e-9, 16);

    private static Dataset staticRun() {
        LadderBleachModel model = LadderBleachModel.forModel(CHARGING, "crossSectionM2", FLUENCES, PERIOD_S);
        ParameterValues truth = ParameterValues.shared(List.of("crossSectionM2"), new double[] {SIGMA_M2});
        assertThat(model.chargedFractionBeforePulse(2, truth)).as("the simulated static run holds trions").isGreaterThan(0.05);
        return LadderSeries.withFluences(LadderSeries.make(model, List.of("crossSectionM2"), new double[] {SIGMA_M2}, DELAYS,
                0.01, 0, 1e-4, 21), FLUENCES);
    }

    private static LadderFitSetup setup(LadderModel base, double periodS) {
        return new LadderFitSetup(base, periodS, Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2,
                LadderParameter.MULTIPLICATION_YIELD), 0.8 * SIGMA_M2, 0, Double.NaN, true, false);
    }

    @Test
    void withAStirredRunTheTrionsAreNotReportedAsMultiplication() {
        Dataset stirred = CompoundPoissonSeries.series(SIGMA_M2, 0, FLUENCES, DELAYS, 0.01, 1e-4, 22);
        ChargingAwareYield.Verdict v = ChargingAwareYield.analyse(staticRun(), setup(CHARGING, PERIOD_S), stirred,
                setup(LadderSeries.BASE, Double.NaN), FitProgress.NONE);
        assertThat(v.upperBound()).isFalse();
        assertThat(v.refreshedRun()).isPresent();
        double tolerance = Double.isFinite(v.etaStdError()) ? Math.max(3 * v.etaStdError(), 0.02) : 0.05;
        assertThat(v.eta()).as("η = %s ± %s from the stirred run", v.eta(), v.etaStdError()).isLessThanOrEqualTo(tolerance);
        assertThat(v.chargedFraction()).as("the static fit sees the charged fraction").isGreaterThan(0.02);
    }

    @Test
    void aStaticHighRateRunAloneGivesAnUpperBoundAndSaysWhy() {
        ChargingAwareYield.Verdict v = ChargingAwareYield.analyse(staticRun(), setup(CHARGING, PERIOD_S), null, null,
                FitProgress.NONE);
        assertThat(v.upperBound()).isTrue();
        assertThat(v.reason()).contains("upper bound").contains("80 MHz").contains("stirred or flowed");
        assertThat(ChargingAwareYield.exposed(setup(LadderSeries.BASE, Double.NaN))).isFalse();
    }
}
