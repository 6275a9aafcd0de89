package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.io.PlanCodec;

/** The multiplication mode on the PbSe demo (80 MHz oscillator with a pulse picker). */
class MultiplicationPlanTest {

    private static final CampaignPlan PLAN = Planner.plan(PlanCodec.read(PlannerDemoTest.HOME.resolve("experiments-plan")
            .resolve("pbse-multiplication-80mhz.plan.json")), Planner.Progress.NONE, false);

    @Test
    void aBelowThresholdReferenceAndAnAboveThresholdPumpOnALowFluenceSeries() {
        MultiplicationPlan m = PLAN.multiplicationPlan();
        assertThat(m.reference()).isNotNull();
        // below 2·E₁S energy conservation forbids multiplication, so the reference's η is 0 under every law of the range
        assertThat(m.reference().overGap()).isLessThan(2);
        assertThat(m.reference().eta()).isZero();
        assertThat(m.reference().etaHigh()).isZero();
        assertThat(m.pumps()).isNotEmpty().allSatisfy(p -> {
            assertThat(p.eta()).isPositive();
            assertThat(p.etaLow()).isLessThanOrEqualTo(p.eta());
            assertThat(p.etaHigh()).isGreaterThanOrEqualTo(p.eta());
            // the multiplication shows as a higher A/B than the reference's
            assertThat(p.interceptRatio()).isGreaterThan(m.reference().interceptRatio());
        });
        double[] n = m.nSeries();
        assertThat(n[n.length - 1]).isLessThanOrEqualTo(0.3);
        assertThat(m.twoRate()).isNotNull();
        assertThat(PLAN.risks()).anyMatch(r -> r.name().equals("multiplication photocharging check"));
        // a main (Auger) series pumped at or above 2·E₁S is said to be confounded by multiplication
        if (PLAN.chosenWavelength().energyOverGap() >= 2) {
            assertThat(PLAN.risks()).anyMatch(r -> r.name().equals("carrier-multiplication confound"));
        }
    }

    @Test
    void expectedAbErrorAgreesWithTheScatterOfSimulatedAnalyses() {
        MultiplicationPlan m = PLAN.multiplicationPlan();
        MultiplicationPlan.Pump p = m.pumps().get(0);
        double[] n = m.nSeries();
        double sigma = m.noiseOdPerSqrtS() / Math.sqrt(m.timePerPointS());
        SplittableRandom rnd = new SplittableRandom(2014);
        int runs = 4000;
        double sum2 = 0;
        for (int r = 0; r < runs; r++) {
            double[] ratios = new double[n.length];
            for (int i = 0; i < n.length; i++) {
                double a = p.earlyOd()[i] + sigma * gaussian(rnd);
                double b = p.lateOd()[i] + sigma * gaussian(rnd);
                ratios[i] = a / b;
            }
            double dev = MultiplicationPlan.Line.intercept(n, ratios, p.earlyOd(), p.lateOd(), sigma) - p.interceptRatio();
            sum2 += dev * dev;
        }
        double rms = Math.sqrt(sum2 / runs);
        assertThat(p.totalError()).isCloseTo(rms, org.assertj.core.data.Percentage.withPercentage(25));
    }

    private static double gaussian(SplittableRandom rnd) {
        // Box–Muller
        return Math.sqrt(-2 * Math.log(1 - rnd.nextDouble())) * Math.cos(2 * Math.PI * rnd.nextDouble());
    }
}
