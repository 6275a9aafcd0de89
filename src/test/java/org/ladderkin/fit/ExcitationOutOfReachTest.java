package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The fit's model refuses an excitation it cannot evaluate before building a ladder for it. */
class ExcitationOutOfReachTest {

    @Test
    void aStepToAHugeCrossSectionIsRefusedWithoutBuildingTheLadder() {
        double[] j = LadderSeries.fluencesPerM2(3, 1e-19);
        LadderBleachModel model = LadderBleachModel.forModel(LadderSeries.BASE, "crossSectionM2", j, Double.NaN);
        List<String> keys = List.of("crossSectionM2", "tauAuger2S");
        double[] delays = {1e-12, 1e-10};
        assertThat(java.util.Arrays.stream(model.predict(2, delays, ParameterValues.shared(keys, new double[] {1e-19, 40e-12})))
                .allMatch(Double::isFinite)).isTrue();
        // σ·j ≈ 1e8: the ladder would need hundreds of millions of states (it used to exhaust the heap)
        double hugeSigma = 1e8 / j[2];
        assertThatThrownBy(() -> model.predict(0, delays, ParameterValues.shared(keys, new double[] {hugeSigma, 40e-12})))
                .isInstanceOfSatisfying(ExcitationOutOfReach.class, e -> assertThat(e.occupancy()).isGreaterThan(LadderBleachModel.MAX_FIT_OCCUPANCY))
                .hasMessageContaining("beyond the 100 the fit's model evaluates");
        assertThatThrownBy(() -> model.predict(0, delays, ParameterValues.shared(keys, new double[] {Double.NaN, 40e-12})))
                .isInstanceOf(ExcitationOutOfReach.class);
    }
}
