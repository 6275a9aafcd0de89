package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.PulseTrainRisks;
import org.ladderkin.observe.Risk;
import org.ladderkin.sample.Refresh;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A film moved under the beam: its refresh time, the charging judgement and advice, and its heating. */
class FilmTranslationTest {

    private static final String DEMO = "cdse-cds-gain-film.plan.json";

    private static PlanInputs inputs() {
        return PlanCodec.read(PlannerDemoTest.HOME.resolve("experiments-plan").resolve(DEMO));
    }

    private static double charged(KineticModel km, double n, double periodS) {
        PulseExcitation pulse = new PulseExcitation.Poisson(n);
        return LadderKinetics.forPulses(km, pulse).steadyState(pulse, periodS, false).chargedFraction();
    }

    @Test
    @CheckedAgainst(source = "hand calculation: a spot of 1/e² diameter D = 2w moved at speed v is replaced in D/v "
            + "(gain-film demo: w = 150 µm, v = 1 mm/s)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void theRefreshTimeIsThePumpDiameterOverTheSpeed() {
        PlanInputs in = inputs();
        Refresh r = in.sample().spec().refresh();
        assertThat(r.mode()).isEqualTo(Refresh.Mode.TRANSLATED);
        ModelAssumptions m = ModelAssumptions.forSample(in.sample(), in.modelOverrides(), 2 * in.laser().pumpRadiusM());
        Reference.checkRelative("refresh time of a translated film (s)", m.refreshS(), 2 * 150e-6 / 1e-3, 1e-12);
        assertThat(m.bases()).anyMatch(b -> b.startsWith("refresh: translated"));
        // a translation without a pump spot has no refresh time
        assertThat(org.assertj.core.api.Assertions.catchThrowable(
                () -> ModelAssumptions.forSample(in.sample(), in.modelOverrides()))).hasMessageContaining("pump diameter");
    }

    @Test
    void theGainFilmDemoIsJudgedWithItsTranslationAndAdvisedASpeedThatPasses() {
        CampaignPlan plan = Planner.plan(inputs(), Planner.Progress.NONE, false);
        int g = (int) Math.round(plan.inputs().sample().material().electronDegeneracy().value());
        KineticModel km = plan.model().kineticModel(g);
        double period = 1 / plan.chosenRate().repetitionRateHz();
        double n = plan.chosenRate().nAvgProbeWeighted();
        double diameter = 2 * plan.inputs().laser().pumpRadiusM();
        // the charging the plan judges is the translated film's: below that of the same film at rest
        double still = charged(PulseTrainRisks.withRefresh(km, 0), n, period);
        assertThat(plan.chosenRate().charged()).isCloseTo(charged(km, n, period), org.assertj.core.data.Offset.offset(1e-12));
        assertThat(plan.chosenRate().charged()).isLessThan(still);

        Risk charging = plan.risks().stream().filter(r -> r.name().equals("photocharging")).findFirst().orElseThrow();
        assertThat(charging.why()).contains("translate the film at").contains("now 1 mm/s").doesNotContain("stir");
        assertThat(plan.risks()).noneMatch(r -> r.why().contains("stir or flow"));
        assertThat(plan.gain().notPlanned()).noneMatch(s -> s.contains("static film"));
        // the advised speed renews the spot often enough that the row would pass
        double limit = plan.inputs().limits().maxChargedFraction();
        double speed = FilmTranslation.speedForCharging(km, n, period, FilmTranslation.PASS_FRACTION * limit, diameter);
        assertThat(charging.why()).contains("at " + org.ladderkin.units.Quantity.formatBest(speed,
                org.ladderkin.units.Dimension.SPEED, 2) + " or faster");
        double atAdvice = charged(PulseTrainRisks.withRefresh(km, speed / diameter), n, period);
        assertThat(atAdvice).isLessThanOrEqualTo(FilmTranslation.PASS_FRACTION * limit * (1 + 1e-6));

        // heating: a spot under the beam for D/v gathers at most that many pulses' rise
        HeatBudget heat = plan.heat();
        double pulsesPerSpot = plan.chosenRate().repetitionRateHz() * diameter / 1e-3;
        assertThat(heat.steadyRiseK()).isLessThanOrEqualTo(heat.perPulseRiseK() * pulsesPerSpot * (1 + 1e-12));
    }
}
