package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.observe.Heating;
import org.ladderkin.observe.ThermalMedium;
import org.ladderkin.observe.Verdict;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The dots on the pump axis at the front face are the hottest; the heating risk is judged on them, not on averages. */
class HottestDotsHeatingTest {

    private static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");

    /** The CdSe demo at 400 nm and 1 kHz, at the pulse energy that gives probe- and depth-averaged ⟨N⟩ = 8. */
    private static Excitation demoAtN8(PlanInputs in) {
        Excitation ex = Excitation.of(in.sample(), new Pulse(in.laser().maxPulseEnergyJ(), 400e-9, 1e3),
                new GaussianBeam(in.laser().pumpRadiusM()), new GaussianBeam(in.laser().probeRadiusM()), true);
        return ex.withEnergyJ(8 / (ex.nAvgProbeWeighted() / in.laser().maxPulseEnergyJ()));
    }

    @Test
    @CheckedAgainst(source = "derived: a dot absorbing ⟨N⟩ photons keeps ⟨N⟩·ħω·f as heat (f the heat share), so its lattice "
            + "jump and the per-pulse rise of the liquid around it scale as ⟨N⟩·f; ΔT_pulse = ⟨N⟩ħω·f·n_dots/(ρc)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void theHottestDotsScaleWithTheirOwnNAndHeatShare() {
        PlanInputs in = PlanCodec.read(DEMO);
        Excitation ex = demoAtN8(in);
        HeatBudget h = HeatBudget.of(ex, 0.3, 8, 0.2);
        double nHot = ex.nAvgPeak();
        assertThat(h.hottest().nAvg()).as("hottest ⟨N⟩ is the front-face on-axis ⟨N⟩").isEqualTo(nHot);
        assertThat(nHot).as("front-face on-axis ⟨N⟩ above the averaged 8").isGreaterThan(8);
        Reference.checkRelative("hottest/averaged dot jump", h.hottest().dotJumpK() / h.dotJumpK(),
                nHot * h.hottest().heatFraction() / (8 * h.heatFraction()), 1e-12);
        var matrix = in.sample().spec().matrix().orElseThrow();
        var medium = new ThermalMedium(matrix.densityKgPerM3().value(), matrix.specificHeatJPerKgK().value(),
                matrix.thermalConductivityWPerMK().value(), matrix.boilingPointK().value());
        double expected = nHot * ex.pulse().photonEnergyJ() * h.hottest().heatFraction()
                * in.sample().numberDensityPerM3() / medium.volumetricHeatCapacityJPerM3K();
        Reference.checkRelative("per-pulse rise at the hottest dots (K)", h.hottest().perPulseRiseK(), expected, 1e-12);
        double e1 = in.sample().firstExcitonEnergyJ();
        Reference.checkRelative("hottest heat share 1 − 0.2·E₁S/ħω", h.hottest().heatFraction(),
                1 - 0.2 * e1 / ex.pulse().photonEnergyJ(), 1e-12);
        assertThat(h.peakRiseK()).as("highest rise = steady + hottest pulse")
                .isEqualTo(h.steadyRiseK() + h.hottest().perPulseRiseK());
    }

    @Test
    void theDemoAtNEightReportsTheIssuesHottestNumbersAndJudgesOnThem() {
        // issue 24 quoted 66.8 K and 0.0059 K per pulse at the averaged ⟨N⟩ = 8 against 127 K and 0.0112 K at the
        // front-face on-axis ⟨N⟩ = 14.8 (a ratio of 1.9 from another build's geometry). This build's demo (0.29 OD at
        // 400 nm, probe 50 µm in a 150 µm pump) gives the ratio 1.53; these are its numbers, pinned as a regression.
        PlanInputs in = PlanCodec.read(DEMO);
        Excitation ex = demoAtN8(in);
        ModelAssumptions model = ModelAssumptions.forSample(in.sample(), in.modelOverrides(), 2 * in.laser().pumpRadiusM());
        KineticModel km = model.kineticModel(2);
        HeatBudget h = RateJudge.heatAt(km, ex, 8, 1e-3);
        assertThat(h.hottest().nAvg()).as("front-face on-axis ⟨N⟩").isCloseTo(12.218, org.assertj.core.data.Offset.offset(0.01));
        assertThat(h.dotJumpK()).as("averaged dot jump (K)").isCloseTo(87.07, org.assertj.core.data.Percentage.withPercentage(0.5));
        assertThat(h.hottest().dotJumpK()).as("hottest dot jump (K)").isCloseTo(135.06, org.assertj.core.data.Percentage.withPercentage(0.5));
        assertThat(h.perPulseRiseK()).as("averaged rise per pulse (K)").isCloseTo(0.007647, org.assertj.core.data.Percentage.withPercentage(0.5));
        assertThat(h.hottest().perPulseRiseK()).as("hottest rise per pulse (K)")
                .isCloseTo(0.011862, org.assertj.core.data.Percentage.withPercentage(0.5));
        assertThat(h.hottest().heatFraction()).as("more Auger on the axis leaves a larger heat share")
                .isGreaterThan(h.heatFraction());
        var risk = h.risk(295, 5);
        assertThat(risk.value()).as("the risk is judged on the highest rise").isEqualTo(h.peakRiseK());
        assertThat(risk.verdict()).isEqualTo(Heating.risk("x", h.peakRiseK(), 295, 5, h.boilingPointK()).verdict());
        assertThat(risk.why()).contains("pump axis, front face, ⟨N⟩ = 12.2").contains("jumps 135 K there")
                .contains("87.1 K");
        // a limit between the steady rise and the highest rise: the averages would pass, the maximum does not
        var tight = h.risk(295, (h.steadyRiseK() + h.peakRiseK()) / 2);
        assertThat(tight.verdict()).as("judged on the maximum").isEqualTo(Verdict.FAIL);
    }
}
