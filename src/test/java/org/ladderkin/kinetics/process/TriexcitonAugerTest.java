package org.ladderkin.kinetics.process;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class TriexcitonAugerTest {

    private static final double TAU_RAD_S = 20e-9;
    private static final double TAU2_S = 50e-12;
    private static final double TAU3_S = 7e-12;

    private static LadderModel withTriexciton() {
        return LadderModel.radiativeAndAuger(TAU_RAD_S, RadiativeScaling.STATISTICAL, TAU2_S, AugerScaling.STATISTICAL, 2)
                .with(new TriexcitonAugerProcess(TAU3_S)).withNMax(4);
    }

    @Test
    @CheckedAgainst(source = "derived: triexciton → biexciton → exciton with total rates K₃ = 1/τ₃ + 9/τ_rad (statistical"
            + " radiative f(3) = 9) and K₂ = 1/τ₂ + 4/τ_rad: P₃ = e^{−K₃t}, P₂ = K₃/(K₂ − K₃)·(e^{−K₃t} − e^{−K₂t}),"
            + " solving dP₃/dt = −K₃P₃, dP₂/dt = K₃P₃ − K₂P₂ with P₃(0) = 1", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void aTriexcitonDecaysAtTheMeasuredTriexcitonRateAndFeedsTheBiexciton() {
        KineticModel m = withTriexciton().toModel();
        LadderKinetics k = LadderKinetics.on(m, m.space(4));
        LadderSpace space = k.space();
        double k3 = 1 / TAU3_S + 9 / TAU_RAD_S;
        double k2 = 1 / TAU2_S + 4 / TAU_RAD_S;
        double[] start = new double[space.size()];
        start[space.index(Charge.NEUTRAL, 3, 0)] = 1;
        double worst3 = 0;
        double worst2 = 0;
        for (double t : new double[] {1e-13, 2e-12, 7e-12, 3e-11, 1e-10, 5e-10}) {
            double[] p = k.propagate(new Populations(space, start), t).probabilities();
            double p3 = Math.exp(-k3 * t);
            double p2 = k3 / (k2 - k3) * (Math.exp(-k3 * t) - Math.exp(-k2 * t));
            worst3 = Math.max(worst3, Math.abs(p[space.index(Charge.NEUTRAL, 3, 0)] - p3));
            worst2 = Math.max(worst2, Math.abs(p[space.index(Charge.NEUTRAL, 2, 0)] - p2));
        }
        Reference.check("max_t |P₃(t) − e^{−K₃t}| with τ₃ = 7 ps", worst3, 0, 1e-13);
        Reference.check("max_t |P₂(t) − K₃/(K₂ − K₃)(e^{−K₃t} − e^{−K₂t})| with τ₃ = 7 ps", worst2, 0, 1e-13);
    }

    @Test
    void theOverrideReplacesOnlyTheNeutralTriexcitonRate() {
        KineticModel with = withTriexciton().toModel();
        KineticModel without = LadderModel.radiativeAndAuger(TAU_RAD_S, RadiativeScaling.STATISTICAL, TAU2_S,
                AugerScaling.STATISTICAL, 2).withNMax(4).toModel();
        AugerRecombination a = auger(with);
        AugerRecombination b = auger(without);
        LadderSpace space = with.space(4);
        assertThat(a.ratePerS(space, space.index(Charge.NEUTRAL, 3, 0))).isEqualTo(1 / TAU3_S);
        assertThat(b.ratePerS(space, space.index(Charge.NEUTRAL, 3, 0))).isEqualTo(AugerScaling.STATISTICAL.factor(3) / TAU2_S);
        for (int n : new int[] {2, 4}) {
            assertThat(a.ratePerS(space, space.index(Charge.NEUTRAL, n, 0)))
                    .isEqualTo(b.ratePerS(space, space.index(Charge.NEUTRAL, n, 0)));
        }
    }

    @Test
    void aSizeEnsembleScalesTheOverrideWithTheOtherAugerRates() {
        AugerRecombination a = auger(withTriexciton().toModel()).scaled(2.5);
        assertThat(a.neutralRatesPerS().get(3)).isEqualTo(2.5 / TAU3_S);
        assertThat(a.biexcitonRatePerS()).isEqualTo(2.5 / TAU2_S);
    }

    @Test
    void anOverrideWithoutAnAugerLawIsRefused() {
        LadderBuilder b = new LadderBuilder();
        assertThatThrownBy(() -> new TriexcitonAugerProcess(TAU3_S).addTo(b))
                .hasMessageContaining("triexciton").hasMessageContaining("AugerRecombination");
        assertThatThrownBy(() -> new LadderModel(List.of(new TriexcitonAugerProcess(TAU3_S)), 2, 0))
                .hasMessageContaining("radiative");
    }

    private static AugerRecombination auger(KineticModel m) {
        return m.processes().stream().filter(AugerRecombination.class::isInstance).map(AugerRecombination.class::cast)
                .findFirst().orElseThrow();
    }
}
