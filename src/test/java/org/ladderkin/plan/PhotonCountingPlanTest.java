package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** The photon-counting mode: the InP/ZnS demo at 5 MHz and the CdSe demo's TCSPC beside its TA at 1 kHz. */
class PhotonCountingPlanTest {

    private static CampaignPlan plan(String file) {
        return Planner.plan(PlanCodec.read(PlannerDemoTest.HOME.resolve("experiments-plan").resolve(file)),
                Planner.Progress.NONE, false);
    }

    private static DelayPlan counting(CampaignPlan plan) {
        return plan.delayPlans().stream().filter(d -> d.counting() != null).findFirst().orElseThrow();
    }

    @Test
    @CheckedAgainst(source = "hand calculation: N = F²/r² counts for a relative τ₁ error r, F² = τ²/Var(t) with "
            + "Var(t) = τ² − T²e^{−T/τ}/(1 − e^{−T/τ})² over the window T (Cramér–Rao bound of the truncated exponential, "
            + "derived in PhotonCountingStatisticsTest); acquisition time N / (detected photons per pulse × repetition rate)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void tcspcCountsAndAcquisitionTimeAgreeWithTheHandCalculation() {
        CampaignPlan plan = plan("inp-zns-tcspc-5mhz.plan.json");
        DelayPlan d = counting(plan);
        PhotonCounting c = d.counting();
        double rate = plan.chosenRate().repetitionRateHz();
        double tau = plan.model().tauSingleExcitonS();
        double window = Math.min(d.instrument().maxDelayS(), 1 / rate);
        double x = window / tau;
        double varOverTau2 = 1 - x * x * Math.exp(-x) / Math.pow(1 - Math.exp(-x), 2);
        double counts = 1 / (varOverTau2 * 0.01 * 0.01);
        Reference.checkRelative("TCSPC counts for τ₁ to 1 % (InP demo)", c.counts(), counts, 1e-9);
        double perPulse = Math.min(c.emittedPerPulse(), d.instrument().maxCountFraction());
        Reference.checkRelative("TCSPC acquisition time (s, InP demo)", c.acquisitionS(), counts / (perPulse * rate), 1e-9);
        // the decay is recorded at ⟨N⟩ ≪ 0.05, inside the laser's range, and the pile-up limit is kept by attenuating
        // the detected emission, not by pumping out of range
        assertThat(c.nAvg()).isLessThanOrEqualTo(PhotonCounting.LIFETIME_N);
        assertThat(c.reachable()).isTrue();
        assertThat(plan.fluences()).allSatisfy(f -> assertThat(f.reachable()).isTrue());
        assertThat(plan.fluences()).singleElement().satisfies(f -> assertThat(f.nProbeAveraged()).isEqualTo(c.nAvg()));
        assertThat(c.detectedPerPulse()).isLessThanOrEqualTo(d.instrument().maxCountFraction() * (1 + 1e-12));
        assertThat(plan.risks()).noneMatch(r -> r.verdict() == Verdict.FAIL);
        assertThat(plan.rates()).allSatisfy(r -> assertThat(r.nAvgProbeWeighted()).isEqualTo(c.nAvg()));
        // τ₂ = 30 ps is shorter than the 120 ps IRF: said, not planned
        assertThat(c.notPlanned()).anyMatch(s -> s.contains("biexciton decay"));
    }

    @Test
    void aKilohertzTcspcBesideTransientAbsorptionIsFlaggedAsSlow() {
        CampaignPlan plan = plan("cdse-auger-1khz.plan.json");
        PhotonCounting c = counting(plan).counting();
        Risk time = plan.risks().stream().filter(r -> r.name().equals("TCSPC acquisition time")).findFirst().orElseThrow();
        assertThat(c.countRateHz()).isLessThanOrEqualTo(counting(plan).instrument().maxCountFraction()
                * plan.chosenRate().repetitionRateHz() * (1 + 1e-12));
        assertThat(c.acquisitionS()).isGreaterThan(PhotonCounting.SLOW_S);
        assertThat(time.verdict()).isEqualTo(Verdict.WARN);
        assertThat(time.why()).contains("slow");
    }
}
