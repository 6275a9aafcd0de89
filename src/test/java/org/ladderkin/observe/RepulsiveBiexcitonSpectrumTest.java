package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.units.PhysicalConstants;

/** A core/shell's biexciton interaction in the spectra: repulsion puts the induced absorption on the blue side. */
class RepulsiveBiexcitonSpectrumTest {

    @Test
    void repulsionMovesTheInducedAbsorptionAboveTheBandEdge() {
        double ev = PhysicalConstants.ELECTRONVOLT_J;
        double e1 = 2.1 * ev;
        SpectralModel base = new SpectralModel(List.of(new Transition("1S", e1, 0.05 * ev, 0.2, Transition.Role.BAND_EDGE)),
                BandEdgeFilling.electronsOnly(2), 6, 0, 0);
        LadderSpace space = LadderSpace.neutral(3);
        double[] p = new double[space.size()];
        p[space.index(Charge.NEUTRAL, 1, 0)] = 1;
        Populations one = new Populations(space, p);
        double[] probe = {e1 - 0.06 * ev, e1 + 0.06 * ev};
        double[] repulsive = base.withBiexcitonInteraction(0.03 * ev).spectrum(one, probe);
        double[] attractive = base.withBiexcitonInteraction(-0.03 * ev).spectrum(one, probe);
        assertThat(base.withBiexcitonInteraction(0.03 * ev).biexcitonShiftJ()).isEqualTo(-0.03 * ev);
        assertThat(repulsive[1]).as("induced absorption above E₁").isPositive();
        assertThat(repulsive[0]).as("no induced absorption below E₁").isLessThanOrEqualTo(0);
        assertThat(attractive[0]).as("attractive: induced absorption below E₁").isPositive();
        assertThat(attractive[1]).isLessThanOrEqualTo(0);
    }
}
