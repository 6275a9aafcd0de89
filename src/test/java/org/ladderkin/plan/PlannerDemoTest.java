package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.Pulse;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.EarlyLate;
import org.ladderkin.observe.Heating;
import org.ladderkin.observe.PulseTrainRisks;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;

/**
 * Builds the plan of every demo and checks its numbers against the observables computed here directly from the
 * engine, the excitation geometry and the heating formulas — never against files the program wrote.
 */
class PlannerDemoTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));

    static CampaignPlan plan(String file) {
        return Planner.plan(PlanCodec.read(HOME.resolve("experiments-plan").resolve(file)), Planner.Progress.NONE);
    }

    @ParameterizedTest
    @ValueSource(strings = {"cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json"})
    void demoPlanAgreesWithDirectlyComputedObservables(String file) {
        CampaignPlan plan = plan(file);
        PlanInputs in = plan.inputs();
        int g = (int) in.sample().material().electronDegeneracy().value();
        KineticModel km = plan.model().kineticModel(g);
        double period = 1 / plan.chosenRate().repetitionRateHz();
        WavelengthOption w = plan.chosenWavelength();

        // each setting of the series gives its target ⟨N⟩ when the excitation is computed afresh
        for (FluencePoint f : plan.fluences()) {
            Excitation ex = Excitation.of(in.sample(), new Pulse(f.pulseEnergyJ(), w.wavelengthM(),
                    plan.chosenRate().repetitionRateHz()), new GaussianBeam(in.laser().pumpRadiusM()),
                    new GaussianBeam(in.laser().probeRadiusM()), true);
            assertThat(ex.nAvgProbeWeighted()).isCloseTo(f.nProbeAveraged(), org.assertj.core.data.Percentage.withPercentage(1e-6));
            assertThat(ex.nAvgPeak()).isCloseTo(f.nPeak(), org.assertj.core.data.Percentage.withPercentage(1e-6));
            assertThat(Math.pow(10, f.attenuatorOd()) * f.pulseEnergyJ())
                    .isCloseTo(in.laser().maxPulseEnergyJ(), org.assertj.core.data.Percentage.withPercentage(1e-9));
        }

        // predicted traces: the engine's steady state at the chosen rate, ΔA = −A₀·bleach
        double a0 = in.sample().absorbanceAt(in.sample().firstExcitonWavelengthM());
        Predictions p = plan.predictions();
        int last = plan.fluences().size() - 1;
        // averaged over the sample's size dispersion, with the pump's width where the plan says it matters
        double dispersion = in.sample().spec().sizeDispersion();
        assertThat(p.sizeDispersion()).isEqualTo(dispersion);
        org.ladderkin.kinetics.ensemble.SizeEnsemble sizes = org.ladderkin.kinetics.ensemble.SizeEnsemble.of(dispersion,
                p.sizeNodes());
        var pump = TracePrediction.pump(in.sample(), in.laser().pulseFwhmS(), w.photonEnergyJ());
        double nTopSeries = plan.fluences().get(last).nProbeAveraged();
        double[] bleach = new double[p.delaysS().length];
        for (int i = 0; i < sizes.size(); i++) {
            PulseExcitation top = new PulseExcitation.Poisson(sizes.volumeRatio(i) * nTopSeries);
            var run = new org.ladderkin.kinetics.ensemble.DotRun(sizes.modelAt(km, i), top, pump);
            double[] b = run.observe(run.after(top, period), new double[][] {run.kinetics().bleachObservable()},
                    p.delaysS())[0];
            for (int m = 0; m < b.length; m++) {
                bleach[m] += sizes.weight(i) * b[m];
            }
        }
        for (int m = 0; m < bleach.length; m += 7) {
            assertThat(p.deltaAOd().get(last)[m]).isCloseTo(-a0 * bleach[m], org.assertj.core.data.Offset.offset(1e-12));
        }

        // the chosen repetition rate: residual recomputed at the series' highest ⟨N⟩ (where every rate is judged), and
        // it is the fastest option that does not fail there
        double nTop = plan.highestFluence().nProbeAveraged();
        assertThat(plan.rates()).allSatisfy(r -> assertThat(r.nAvgProbeWeighted()).isEqualTo(nTop));
        assertThat(plan.heat()).isEqualTo(plan.chosenRate().heat());
        PulseExcitation rateProbe = new PulseExcitation.Poisson(nTop);
        double residual = PulseTrainRisks.residualBeforePulse(LadderKinetics.forPulses(km, rateProbe), rateProbe, period);
        assertThat(plan.chosenRate().residual()).isCloseTo(residual, org.assertj.core.data.Offset.offset(1e-12));
        SteadyState atTop = LadderKinetics.forPulses(km, rateProbe).steadyState(rateProbe, period, false);
        assertThat(plan.chosenRate().charged()).isCloseTo(atTop.chargedFraction(), org.assertj.core.data.Offset.offset(1e-12));
        // the build-up chart at the same ⟨N⟩ runs past the stated pulses to steady state and ends at that steady state
        double[] charged = p.buildUpCharged();
        assertThat(charged.length).isGreaterThanOrEqualTo(p.pulsesToSteadyState());
        assertThat(charged[charged.length - 1]).isCloseTo(atTop.chargedFraction(),
                org.assertj.core.data.Offset.offset(0.02 * atTop.chargedFraction() + 1e-9));
        assertThat(plan.risks()).filteredOn(r -> r.name().equals("photocharging")).singleElement()
                .satisfies(r -> assertThat(r.value()).isEqualTo(plan.chosenRate().charged()));
        List<RateOption> passing = plan.rates().stream().filter(r -> r.verdict() != Verdict.FAIL).toList();
        if (!passing.isEmpty()) {
            RateOption fastest = passing.stream().max(Comparator.comparingDouble(RateOption::repetitionRateHz)).get();
            // never faster than the rate the design's expected errors were scored at
            double designHz = plan.design() == null ? Double.POSITIVE_INFINITY : 1 / plan.design().context().periodS();
            assertThat(plan.chosenRate().repetitionRateHz())
                    .isCloseTo(Math.min(fastest.repetitionRateHz(), designHz), org.assertj.core.data.Percentage.withPercentage(1e-9));
            if (plan.design() != null) {
                assertThat(1 / plan.design().context().periodS())
                        .isCloseTo(plan.chosenRate().repetitionRateHz(), org.assertj.core.data.Percentage.withPercentage(1e-9));
            }
        } else {
            assertThat(plan.chosenRate().repetitionRateHz())
                    .isEqualTo(plan.rates().stream().mapToDouble(RateOption::repetitionRateHz).min().getAsDouble());
        }

        // the fit tab's pulse train runs at the rate this plan chose (the basis plans without the design search)
        assertThat(PlanFitBasis.of(in).repetitionRateHz()).isEqualTo(plan.chosenRate().repetitionRateHz());

        // heating: the liquid conduction formula on the absorbed power at the highest setting
        HeatBudget h = plan.heat();
        Excitation exTop = Excitation.of(in.sample(), new Pulse(plan.fluences().get(last).pulseEnergyJ(), w.wavelengthM(),
                plan.chosenRate().repetitionRateHz()), new GaussianBeam(in.laser().pumpRadiusM()),
                new GaussianBeam(in.laser().probeRadiusM()), true);
        var matrix = in.sample().spec().matrix().orElseThrow();
        var medium = new org.ladderkin.observe.ThermalMedium(matrix.densityKgPerM3().value(), matrix.specificHeatJPerKgK().value(),
                matrix.thermalConductivityWPerMK().value(), matrix.boilingPointK().value());
        double rise = Heating.steadyRiseLiquidK(exTop.absorbedPowerW() * h.heatFraction(), in.laser().pumpRadiusM(),
                in.sample().spec().pathLengthM(), HeatBudget.WALL_DISTANCE_M, medium);
        assertThat(h.steadyRiseK()).isCloseTo(rise, org.assertj.core.data.Percentage.withPercentage(1e-9));

        // every risk's verdict follows from its number and limit where the rule is a plain limit
        for (Risk r : plan.risks()) {
            if (r.name().equals("photocharging") || r.name().startsWith("residual excitation")) {
                assertThat(r.verdict()).isEqualTo(Verdict.against(r.value(), r.limit(), 0.5));
            }
        }
        assertThat(plan.cautions()).contains(new Caution.Laser(), new Caution.HeavyMetals());
    }

    @ParameterizedTest
    @ValueSource(strings = {"pbse-multiplication-80mhz.plan.json"})
    void multiplicationForecastMatchesTheEarlyLateObservable(String file) {
        CampaignPlan plan = plan(file);
        KineticModel km = plan.model().kineticModel((int) plan.inputs().sample().material().electronDegeneracy().value());
        var windows = plan.delayPlans().get(0).windows();
        assertThat(plan.multiplication()).hasSize(2);
        for (MultiplicationPrediction m : plan.multiplication()) {
            double direct = EarlyLate.lowFluenceRatio(km, MultiplicationForecast.LOW_FLUENCE_N, m.eta(), windows.earlyS(),
                    windows.lateS());
            assertThat(m.idealRatio()).isCloseTo(direct, org.assertj.core.data.Offset.offset(1e-12));
            // the 80 MHz trap: without pulse picking the apparent ratio is inflated by residual excitation and trions
            assertThat(m.apparentRatioFullRate()).isGreaterThan(m.idealRatio() * 1.1);
            assertThat(m.chargedFullRate()).isGreaterThan(m.chargedChosen());
        }
        assertThat(plan.chosenRate().repetitionRateHz()).isLessThan(plan.inputs().laser().repetitionRateHz());
        assertThat(plan.risks()).anyMatch(r -> r.name().startsWith("false multiplication"));
    }

    @org.junit.jupiter.api.Test
    void aSampleWithoutAKnownFirstExcitonIsRefusedNotPlannedAsNaN() throws java.io.IOException {
        String text = java.nio.file.Files.readString(HOME.resolve("experiments-plan").resolve("inp-zns-tcspc-5mhz.plan.json"))
                .replaceAll("\\s*\"firstExcitonPeak\": \"[^\"]*\",", "");
        PlanInputs in = PlanCodec.read(org.ladderkin.io.json.JsonTree.parse(text, HOME.resolve("experiments-plan").resolve("inp-without-peak.plan.json").toString()));
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> Planner.plan(in, Planner.Progress.NONE, false))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("first-exciton peak").hasMessageContaining("InP has no sizing curve")
                .hasMessageContaining("give 'firstExcitonPeak' beside 'diameter'");
    }
}
