package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.observe.Heating;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.ThermalMedium;
import org.ladderkin.observe.Verdict;
import org.ladderkin.sample.Refresh;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A flowing cell is refreshed by the flow through the beam, not by exchanging the whole cell. */
class FlowingCellRefreshTest {

    private static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");
    private static final double ML_PER_MIN = 1e-6 / 60;

    @Test
    @CheckedAgainst(source = "derived: the liquid crosses the beam at v = Q/A (flow rate over the channel's cross-section), "
            + "so the pumped volume is replaced in D/v; 5 mL/min through 1 mm × 10 mm is 8.33 mm/s, D = 0.3 mm gives 36 ms",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void renewalIsThePumpDiameterOverTheFlowSpeedInTheBeam() {
        Refresh byDefault = Refresh.flowing(5 * ML_PER_MIN, 0.5e-6);
        Reference.checkRelative("flow speed, 5 mL/min through 1 mm × 10 mm (m/s)", byDefault.flowSpeedMPerS(1e-3),
                5 * ML_PER_MIN / 1e-5, 1e-12);
        Reference.checkRelative("renewal of a 0.3 mm pump spot (s)", byDefault.flowRenewalS(300e-6, 1e-3), 0.036, 1e-12);
        Refresh narrow = Refresh.flowing(5 * ML_PER_MIN, 0.5e-6, 2e-6);
        Reference.checkRelative("renewal through a 2 mm² channel (s)", narrow.flowRenewalS(300e-6, 1e-3), 0.0072, 1e-12);
        assertThat(byDefault.exchangeTimeS()).as("the whole-cell exchange, no longer the refresh").isCloseTo(6.0,
                org.assertj.core.data.Offset.offset(1e-9));
        assertThat(Refresh.stirred().flowRenewalS(300e-6, 1e-3)).isInfinite();
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> Refresh.flowing(5 * ML_PER_MIN, 0.5e-6, -1))
                .hasMessageContaining("cell cross-section must be > 0");
    }

    @Test
    @CheckedAgainst(source = "derived: a parcel crossing the beam at v is heated for 2w/v at the on-axis power density "
            + "2P/(πw²L): ΔT = 4P/(π·w·L·v·ρc) (docs/physics.md, Heating)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void aFlowingSampleIsHeatedByTheFlowFormulaNotRadialConduction(@TempDir Path dir) throws Exception {
        PlanInputs in = PlanCodec.read(flowing(dir, "\"flowRate\": \"5 mL/min\", \"cellVolume\": \"0.5 mL\""));
        Excitation ex = Excitation.of(in.sample(), new Pulse(in.laser().maxPulseEnergyJ(), 400e-9, 1e3),
                new GaussianBeam(in.laser().pumpRadiusM()), new GaussianBeam(in.laser().probeRadiusM()), true);
        HeatBudget h = HeatBudget.of(ex, 0.2, ex.nAvgProbeWeighted(), 0.1);
        var matrix = in.sample().spec().matrix().orElseThrow();
        var medium = new ThermalMedium(matrix.densityKgPerM3().value(), matrix.specificHeatJPerKgK().value(),
                matrix.thermalConductivityWPerMK().value(), matrix.boilingPointK().value());
        double v = 5 * ML_PER_MIN / (in.sample().spec().pathLengthM() * Refresh.DEFAULT_FLOW_CELL_WIDTH_M);
        double w = in.laser().pumpRadiusM();
        double expected = 4 * h.heatPowerW() / (Math.PI * w * in.sample().spec().pathLengthM() * v
                * medium.volumetricHeatCapacityJPerM3K());
        Reference.checkRelative("steady rise of a flowing sample (K)", h.steadyRiseK(), expected, 1e-12);
        assertThat(h.steadyRiseK()).as("flow removes heat faster than conduction alone")
                .isLessThan(Heating.steadyRiseLiquidK(h.heatPowerW(), w, in.sample().spec().pathLengthM(),
                        HeatBudget.WALL_DISTANCE_M, medium));
        assertThat(h.model()).startsWith("flowing liquid").doesNotContain("radial conduction");
    }

    @Test
    void theDemoFlowingAtFiveMlPerMinutePassesAtLeastAsFastAsStirred(@TempDir Path dir) throws Exception {
        CampaignPlan stirred = Planner.plan(PlanCodec.read(DEMO), Planner.Progress.NONE, false);
        CampaignPlan flowing = Planner.plan(PlanCodec.read(flowing(dir, "\"flowRate\": \"5 mL/min\", \"cellVolume\": "
                + "\"0.5 mL\"")), Planner.Progress.NONE, false);
        assertThat(flowing.model().refreshS()).as("refresh of the flowing demo (s), D/v = 0.3 mm / 8.33 mm/s")
                .isCloseTo(0.036, org.assertj.core.data.Percentage.withPercentage(1e-6));
        assertThat(flowing.chosenRate().repetitionRateHz()).as("flowing rate against the stirred one")
                .isGreaterThanOrEqualTo(stirred.chosenRate().repetitionRateHz());
        assertThat(flowing.chosenRate().charged()).as("charged fraction, flowing vs stirred at its rate")
                .isLessThanOrEqualTo(stirred.chosenRate().charged() + 1e-12);
        for (CampaignPlan p : java.util.List.of(stirred, flowing)) {
            Risk charging = p.risks().stream().filter(r -> r.name().equals("photocharging")).findFirst().orElseThrow();
            assertThat(charging.verdict()).as("photocharging verdict").isNotEqualTo(Verdict.FAIL);
        }
        assertThat(String.join("\n", flowing.model().bases())).contains("flowing, pump 1/e² diameter / flow speed")
                .contains("path length 1.00 mm × 10.0 mm").contains("common practice, no source");
    }

    static Path flowing(Path dir, String fields) throws Exception {
        String demo = Files.readString(DEMO);
        String changed = demo.replace("\"refresh\": { \"mode\": \"stirred\" }", "\"refresh\": { \"mode\": \"flowing\", "
                + fields + " }");
        assertThat(changed).as("the demo's refresh was replaced").isNotEqualTo(demo);
        Path p = dir.resolve("flowing.plan.json");
        Files.writeString(p, changed);
        return p;
    }
}
