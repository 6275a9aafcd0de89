package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.TriexcitonAugerProcess;

/** {@code fit --free tau-auger3}: the registry's fittable lifetime is a fit parameter like τ₂. */
class TriexcitonFitTest {

    private static final double SIGMA_M2 = 1e-18;
    private static final LadderParameter TAU_AUGER3 = LadderParameter.of("tau-auger3");

    @Test
    void aMeasuredTriexcitonLifetimeIsRecoveredFromAHighFluenceSeries() {
        double tau3 = 6e-12;
        LadderModel truth = LadderSeries.BASE.with(new TriexcitonAugerProcess(tau3));
        double[] j = {0.3 / SIGMA_M2, 1 / SIGMA_M2, 2.5 / SIGMA_M2, 5 / SIGMA_M2, 8 / SIGMA_M2};
        double[] delays = SyntheticSeries.logDelays(0.2e-12, 1.5e-9, 90);
        LadderBleachModel model = LadderBleachModel.forModel(truth, "crossSectionM2", j, Double.NaN);
        Dataset data = LadderSeries.withFluences(LadderSeries.make(model, List.of("crossSectionM2"), new double[] {SIGMA_M2},
                delays, 0.01, 0, 2e-5, 7), j);
        // start from the plain ladder: freeing τ₃ adds the process at the scaling law's τ₂/g(3) = 40 ps / 4.5
        LadderFitSetup setup = new LadderFitSetup(LadderSeries.BASE, Double.NaN,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2, TAU_AUGER3), Double.NaN, 0, Double.NaN, false, false);
        LadderFit.Outcome o = LadderFit.fit(data, setup, FitProgress.NONE);
        assertThat(o.result().ok()).as(o.result().message()).isTrue();
        ParameterEstimate t3 = o.result().estimate("tauAuger3S");
        assertThat(t3.fixed()).isFalse();
        assertThat(Math.abs(t3.value() - tau3)).isLessThan(4 * t3.stdError());
        assertThat(t3.value()).isBetween(0.8 * tau3, 1.2 * tau3);
        assertThat(o.result().estimate("tauAuger2S").value()).isBetween(36e-12, 44e-12);
    }

    @Test
    void tauAuger3IsAFitNameFromTheRegistry() {
        assertThat(LadderParameter.values()).contains(TAU_AUGER3);
        assertThat(TAU_AUGER3.process()).isSameAs(TriexcitonAugerProcess.LIFETIME);
    }
}
