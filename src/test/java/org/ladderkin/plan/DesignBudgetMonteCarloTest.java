package org.ladderkin.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.LadderFitSetup;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.kinetics.process.LadderModel;

/**
 * Monte-Carlo check of the design's error budget. Campaigns of a reduced CdSe demo design are simulated with every
 * error the budget counts — a fluence-scale error drawn from the stated calibration, a drift offset per trace, pump
 * fluctuation per point and white noise — and fitted with {@link LadderFit} (per-trace amplitude and baseline; scale
 * and τ₂ free, as the design assumes). The scatter of the fitted
 * σ (the scale) and τ₂ must agree with the predicted totals within ±25 %.
 *
 * <p>Reduced for run time, and scored by the design in the same reduced form: 6 of the chosen series' fluences (every
 * other one) on the printed delay grid with its time per point; the demo's ladder without photocharging (no charged
 * rungs, a third of the states) and without IRF convolution (each convolved delay costs 24 propagations); without an
 * IRF the trace steps at time zero, so time zero is held (known) in the simulation, the fit and the design alike.
 */
class DesignBudgetMonteCarloTest {

    private static final int CAMPAIGNS = Integer.getInteger("ladderkin.mc.campaigns", 200);

    @Test
    void scatterOfFittedCampaignsMatchesThePredictedTotals() throws Exception {
        PlanInputs in = PlanCodec.read(DesignErrorBudgetTest.copy());
        // σ and τ₂ as goals: τ_rad is held at the plan's value by the fit and the design alike
        in = new PlanInputs(in.title(), in.lab(), in.sample(), in.laser(), in.instruments(),
                Set.of(Goal.CROSS_SECTION, Goal.BIEXCITON_AUGER), in.multiplicationPhotonEnergiesJ(), in.limits(), in.modelOverrides());
        CampaignPlan plan = Planner.plan(in, Planner.Progress.NONE);
        DesignSearch.Context full = plan.design().context();
        ModelAssumptions mf = full.model();
        // reduced for run time: no photocharging (the ladder has no charged rungs) and no IRF convolution
        ModelAssumptions neutral = new ModelAssumptions(mf.tauSingleExcitonS(), mf.plQuantumYield(), mf.tauBiexcitonS(),
                mf.augerScaling(), mf.radiativeScaling(), mf.tauTrionNegativeS(), mf.tauTrionPositiveS(), 0, mf.neutralisationS(),
                mf.refreshS(), mf.coolingS(), mf.bases(), mf.processes());
        DesignSearch.Errors fe = full.errors();
        DesignSearch.Context ctx = new DesignSearch.Context(neutral, full.degeneracy(), full.periodS(), full.bandEdgeAbsorbanceOd(),
                full.noiseOdPerSqrtS(), full.budgetS(), full.firstDelayS(), full.lastDelayS(), full.maxN(), full.goals(),
                new DesignSearch.Errors(fe.pumpFluctuationRel(), fe.driftRelPerHour(), fe.fluenceScale(), fe.fluenceScaleStated(),
                        fe.crossSectionRel(), 0, 0, 0, null));
        double[] chosen = plan.design().best().nValues();
        double[] n6 = IntStream.range(0, chosen.length).filter(i -> i % 2 == 1).mapToDouble(i -> chosen[i]).limit(6).toArray();
        DesignSearch.Design d = DesignSearch.score(ctx, n6, plan.design().best().grid());
        double[] n = d.nValues();
        double[] delays = d.delaysS();
        DesignSearch.Errors err = ctx.errors();
        double predictedSigma = d.expected(DesignSearch.Parameter.CROSS_SECTION).orElseThrow().totalRel();
        double predictedTau2 = d.expected(DesignSearch.Parameter.TAU_BIEXCITON).orElseThrow().totalRel();
        double calibration = err.fluenceScale().totalRel();
        assertThat(predictedSigma).isGreaterThanOrEqualTo(calibration);

        LadderModel base = PlanFitBasis.parameters(ctx.model(), ctx.degeneracy());
        double white = ctx.noiseOdPerSqrtS() / Math.sqrt(d.timePerPointS());
        double driftPrior = err.driftRelPerHour() * d.timePerPointS() * delays.length / 3600 / 2;
        double a0 = ctx.bandEdgeAbsorbanceOd();
        double tau2 = ctx.model().tauBiexcitonS();
        SplittableRandom root = new SplittableRandom(20261203L);
        long[] seeds = root.longs(CAMPAIGNS).toArray();
        double[][] out = new double[CAMPAIGNS][];
        IntStream.range(0, CAMPAIGNS).parallel().forEach(r -> {
            SplittableRandom rnd = new SplittableRandom(seeds[r]);
            double c = err.fluenceScale().totalRel() * gaussian(rnd);
            double t0 = 0;
            double[] x = new double[n.length];
            for (int i = 0; i < n.length; i++) {
                x[i] = n[i] * Math.exp(driftPrior * gaussian(rnd));
            }
            LadderBleachModel truth = LadderBleachModel.forModel(base, "occupancyScale", x, ctx.periodS());
            List<String> keys = List.of("occupancyScale", LadderBleachModel.TIME_ZERO);
            List<Trace> traces = new ArrayList<>();
            for (int i = 0; i < n.length; i++) {
                double[] y = truth.predict(i, delays, ParameterValues.shared(keys, new double[] {Math.exp(c), t0}));
                double[] up = truth.predict(i, delays, ParameterValues.shared(keys, new double[] {Math.exp(c + 1e-3), t0}));
                double[] down = truth.predict(i, delays, ParameterValues.shared(keys, new double[] {Math.exp(c - 1e-3), t0}));
                double[] signal = new double[delays.length];
                for (int m = 0; m < delays.length; m++) {
                    double dLogN = a0 * (up[m] - down[m]) / 2e-3;
                    signal[m] = a0 * y[m] + err.pumpFluctuationRel() * gaussian(rnd) * dLogN + white * gaussian(rnd);
                }
                // the experimenter records the nominal ⟨N⟩; drift and calibration errors are unknown to the fit
                traces.add(Trace.of("N=" + n[i], delays, signal).withMetadata(new TraceMetadata("N=" + n[i],
                        Optional.of(new Excitation(Excitation.Kind.MEAN_OCCUPANCY, n[i])), OptionalDouble.empty())));
            }
            LadderFitSetup setup = new LadderFitSetup(base, ctx.periodS(),
                    Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2), 1, 0,
                    Double.NaN, false, false);
            LadderFit.Outcome o = LadderFit.fit(new Dataset(traces, List.of()), setup, FitProgress.NONE);
            assertThat(o.result().ok()).as(o.result().message()).isTrue();
            out[r] = new double[] {Math.log(o.result().estimate("occupancyScale").value()),
                Math.log(o.result().estimate(LadderBleachModel.TAU_AUGER2).value() / tau2)};
        });
        double sdSigma = sd(out, 0);
        double sdTau2 = sd(out, 1);
        System.out.printf("Monte Carlo, %d campaigns of %d fluences × %d delays: σ scatter %.4g (predicted %.4g, calibration %.4g), "
                + "τ₂ scatter %.4g (predicted %.4g)%n", CAMPAIGNS, n.length, delays.length, sdSigma, predictedSigma, calibration,
                sdTau2, predictedTau2);
        // 200 campaigns: the sample standard deviation itself scatters by about 5 %
        assertThat(sdSigma / predictedSigma).isBetween(0.75, 1.25);
        assertThat(sdTau2 / predictedTau2).isBetween(0.75, 1.25);
    }

    private static double gaussian(SplittableRandom rnd) {
        double u1 = rnd.nextDouble();
        double u2 = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u1)) * Math.cos(2 * Math.PI * u2);
    }

    private static double sd(double[][] v, int k) {
        double mean = 0;
        for (double[] r : v) {
            mean += r[k] / v.length;
        }
        double s = 0;
        for (double[] r : v) {
            s += (r[k] - mean) * (r[k] - mean);
        }
        return Math.sqrt(s / (v.length - 1));
    }
}
