package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Observables;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class TransientAbsorptionTest {

    static KineticModel cdseLike() {
        return new KineticModel(List.of(
                new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 1 / 200e-12, 1 / 100e-12, AugerIonisation.NONE)),
                EnumSet.of(Charge.NEUTRAL), false, 2, 0);
    }

    @Test
    @CheckedAgainst(source = "derived: state filling of a twofold level under Poisson excitation, bleach = "
            + "Σ min(N,2)P(N)/2 = 1 − e^{−n}(1 + n/2); 1 − 1.5/e at ⟨N⟩ = 1 and → 1 (one filled level) as ⟨N⟩ grows",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void bleachSaturatesAtOneFilledLevel() {
        KineticModel model = cdseLike();
        for (double n : new double[] {1, 4, 12}) {
            PulseExcitation pulse = new PulseExcitation.Poisson(n);
            LadderKinetics kin = LadderKinetics.forPulses(model, pulse);
            Populations after = kin.applyPulse(Populations.ground(kin.space()), pulse);
            double bleach = after.expectation(BandEdgeFilling.electronsOnly(2).observable(kin.space()));
            Reference.check("bleach at zero delay, ⟨N⟩ = " + n + " (filled levels)", bleach,
                    1 - Math.exp(-n) * (1 + n / 2), 1e-12);
        }
    }

    @Test
    void electronOnlyFillingIsTheEngineBleach() {
        LadderSpace space = new LadderSpace(EnumSet.allOf(Charge.class), 6, true);
        assertThat(BandEdgeFilling.electronsOnly(2).observable(space)).containsExactly(Observables.bleach(space, 2));
        double[] twoLevel = BandEdgeFilling.twoLevel(8).observable(space);
        assertThat(twoLevel[space.index(Charge.NEUTRAL, 6, 0)]).isEqualTo(1.5);
        assertThat(twoLevel[space.index(Charge.POSITIVE, 0, 0)]).isEqualTo(1 / 8.0);
        assertThat(twoLevel[space.index(Charge.NEUTRAL, 3, 3)]).isZero();
    }

    @Test
    @CheckedAgainst(source = "derived: T = 10^{−A} gives ΔT/T = 10^{−ΔA} − 1 (Beer–Lambert); −ln10·ΔA to first order",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void differentialTransmissionFromAbsorbanceChange() {
        Reference.check("ΔT/T for ΔA = −0.01 OD", BandEdgeFilling.deltaTOverT(-0.01), Math.pow(10, 0.01) - 1, 1e-15);
        Reference.checkRelative("ΔT/T for ΔA = −1e-5 OD vs −ln10·ΔA", BandEdgeFilling.deltaTOverT(-1e-5),
                Math.log(10) * 1e-5, 2e-5);
        assertThat(BandEdgeFilling.deltaA(0.5, 0.2)).isEqualTo(-0.1);
    }

    @Test
    @CheckedAgainst(source = "derived: one cold exciton in a twofold band-edge level halves the 1S line and shifts it "
            + "by Δ_XX; ½G(E; E₁−Δ) = G(E; E₁) at E* = E₁ − Δ/2 − σ²ln2/Δ, induced absorption (ΔA > 0) below E*",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void positiveBiexcitonBindingGivesInducedAbsorptionBelowTheBandEdge() {
        double ev = PhysicalConstants.ELECTRONVOLT_J;
        double e1 = 2.1 * ev;
        double fwhm = 0.1 * ev;
        double delta = 0.03 * ev;
        SpectralModel model = new SpectralModel(List.of(new Transition("1S", e1, fwhm, 0.2, Transition.Role.BAND_EDGE)),
                BandEdgeFilling.electronsOnly(2), 6, delta, 0);
        LadderSpace space = LadderSpace.neutral(3);
        double[] p = new double[space.size()];
        p[space.index(Charge.NEUTRAL, 1, 0)] = 1;
        Populations oneExciton = new Populations(space, p);
        double sigma = fwhm / (2 * Math.sqrt(2 * Math.log(2)));
        double crossing = e1 - delta / 2 - sigma * sigma * Math.log(2) / delta;
        // find the sign change of ΔA on a fine grid and compare with the closed form
        double[] grid = new double[20001];
        for (int i = 0; i < grid.length; i++) {
            grid[i] = e1 - 0.3 * ev + i * (0.6 * ev / (grid.length - 1));
        }
        double[] dA = model.spectrum(oneExciton, grid);
        double found = Double.NaN;
        for (int i = 1; i < grid.length; i++) {
            if (dA[i - 1] > 0 && dA[i] <= 0) {
                found = grid[i - 1] + (grid[i] - grid[i - 1]) * dA[i - 1] / (dA[i - 1] - dA[i]);
                break;
            }
        }
        Reference.check("zero crossing of ΔA below the 1S line (eV)", found / ev, crossing / ev, 1e-6);
        assertThat(model.spectrum(oneExciton, new double[] {e1 - 0.15 * ev})[0]).as("induced absorption below E*").isPositive();
        assertThat(model.spectrum(oneExciton, new double[] {e1})[0]).as("bleach at the line").isNegative();
    }

    @Test
    void mapEqualsSpectraOfPropagatedPopulations() {
        double ev = PhysicalConstants.ELECTRONVOLT_J;
        SpectralModel model = new SpectralModel(List.of(
                new Transition("1S", 2.1 * ev, 0.1 * ev, 0.2, Transition.Role.BAND_EDGE),
                new Transition("1P", 2.35 * ev, 0.15 * ev, 0.3, Transition.Role.HOT)),
                BandEdgeFilling.electronsOnly(2), 6, 0.02 * ev, 0.01 * ev);
        KineticModel km = new KineticModel(List.of(
                new RadiativeDecay(1 / 20e-9, RadiativeScaling.LINEAR, 2),
                new org.ladderkin.kinetics.rate.Cooling(1 / 0.3e-12),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE)),
                EnumSet.of(Charge.NEUTRAL), true, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(1.5);
        LadderKinetics kin = LadderKinetics.forPulses(km, pulse);
        Populations after = kin.applyPulse(Populations.ground(kin.space()), pulse);
        double[] energies = {1.9 * ev, 2.05 * ev, 2.1 * ev, 2.3 * ev};
        double[] delays = {0, 0.2e-12, 5e-12, 300e-12};
        double[][] map = model.map(kin, after, energies, delays);
        for (int t = 0; t < delays.length; t++) {
            double[] direct = model.spectrum(kin.propagate(after, delays[t]), energies);
            for (int e = 0; e < energies.length; e++) {
                assertThat(map[e][t]).isCloseTo(direct[e], org.assertj.core.data.Offset.offset(1e-12));
            }
        }
        // hot carriers bleach the 1P line at zero delay, not after cooling
        assertThat(map[3][0]).isLessThan(map[3][2]);
    }
}
