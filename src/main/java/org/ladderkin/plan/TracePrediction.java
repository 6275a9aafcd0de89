package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.ensemble.DotRun;
import org.ladderkin.kinetics.ensemble.PumpPulse;
import org.ladderkin.kinetics.ensemble.SizeEnsemble;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.observe.EarlyLate;
import org.ladderkin.observe.PulseTrainRisks;
import org.ladderkin.observe.TimeWindows;

/**
 * The plan's predicted signals, averaged over the sample's size distribution ({@link SizeEnsemble}) and with the pump
 * pulse's width where it matters ({@link DotRun}): the fluence series is stated as ⟨N⟩ of the mean size, a member of
 * volume ratio v sees v·⟨N⟩ and Auger rates 1/v times the mean size's. Each member gets one ladder and one factorised
 * delay grid, reused for every fluence. The node count is chosen on the strongest fluence's bleach and PL (the most
 * nonlinear signals of the series) with the pulse taken as instantaneous: the pulse width changes the signals, not
 * how smoothly they depend on size, and a finite pulse costs a hundred matrix exponentials per member. The pulse
 * train's build-up and its pulses to steady state are those of instantaneous pulses.
 */
final class TracePrediction {

    /** A member holding less than this share of the dots cannot keep the ensemble's transient above 1 %. */
    private static final double TRANSIENT_SHARE = 0.01;

    private TracePrediction() {
    }

    static Predictions predict(KineticModel km, double[] nSeries, double period, double[] taDelays, double bandEdgeOd,
                               ModelAssumptions model, double sizeDispersion) {
        return predict(km, nSeries, period, taDelays, bandEdgeOd, model, sizeDispersion, PumpPulse.INSTANT);
    }

    static Predictions predict(KineticModel km, double[] nSeries, double period, double[] taDelays, double bandEdgeOd,
                               ModelAssumptions model, double sizeDispersion, PumpPulse pump) {
        try {
            return averaged(km, nSeries, period, taDelays, bandEdgeOd, model, sizeDispersion, pump);
        } catch (org.ladderkin.kinetics.propagate.WorkLimitException e) {
            if (sizeDispersion == 0) {
                throw e;
            }
            // the largest dots of a wide distribution hold many times the mean ⟨N⟩: say so, or the line blames the delays
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT, "at %.3g %% size dispersion the largest "
                    + "dots of the average hold several times the mean ⟨N⟩ (%.3g at the top fluence) and the engine refuses "
                    + "them; lower sizeDispersion or the highest fluence: %s", 100 * sizeDispersion,
                    nSeries[nSeries.length - 1], e.getMessage()), e);
        }
    }

    private static Predictions averaged(KineticModel km, double[] nSeries, double period, double[] taDelays,
                                        double bandEdgeOd, ModelAssumptions model, double sizeDispersion, PumpPulse pump) {
        double[] plDelays = TimeWindows.logSpaced(1e-12, Math.min(period, 20 * model.tauSingleExcitonS()), 120);
        TimeWindows.EarlyLate windows = TimeWindows.earlyLate(model.coolingS(), model.tauBiexcitonS(), model.tauSingleExcitonS());
        double[] elTimes = {windows.earlyS(), windows.lateS()};
        double top = nSeries[nSeries.length - 1];
        // the work bound of the whole series, refused in one line before anything is built (docs/physics.md §9)
        org.ladderkin.kinetics.LadderKinetics.checkWork(km, taDelays.length + plDelays.length + 2, true, false,
                java.util.Arrays.stream(nSeries).mapToObj(org.ladderkin.kinetics.train.PulseExcitation.Poisson::new)
                        .toArray(org.ladderkin.kinetics.train.PulseExcitation[]::new));
        SizeEnsemble ensemble = SizeEnsemble.converged(sizeDispersion, e -> e.average(i -> {
            Member m = new Member(e.modelAt(km, i), e.volumeRatio(i), top, PumpPulse.INSTANT);
            DotRun.After a = m.run.after(m.pulse(top), period);
            return new double[][] {m.run.observe(a, m.bleachRow, taDelays)[0], m.run.observe(a, m.plRow, plDelays)[0]};
        }));
        int k = nSeries.length;
        double[][] bleach = new double[k][taDelays.length];
        double[][] pl = new double[k][plDelays.length];
        double[][] el = new double[k][2];
        List<double[]> occupancy = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            occupancy.add(new double[] {ensemble.darkWeight()});
        }
        List<Member> members = new ArrayList<>();
        int pulses = 1;
        double finiteFrom = Double.NaN;
        String why = "";
        for (int m = 0; m < ensemble.size(); m++) {
            Member member = new Member(ensemble.modelAt(km, m), ensemble.volumeRatio(m), top, pump);
            members.add(member);
            double w = ensemble.weight(m);
            for (int i = 0; i < k; i++) {
                DotRun.After a = member.run.after(member.pulse(nSeries[i]), period);
                if (!a.why().isEmpty() && !(nSeries[i] >= finiteFrom)) {
                    finiteFrom = nSeries[i];
                    why = a.why();
                }
                add(bleach[i], w, member.run.observe(a, member.bleachRow, taDelays)[0]);
                add(pl[i], w, member.run.observe(a, member.plRow, plDelays)[0]);
                add(el[i], w, member.run.observe(a, member.bleachRow, elTimes)[0]);
                double[] dist = excitonDistribution(member, a.after());
                if (dist.length > occupancy.get(i).length) {
                    occupancy.set(i, java.util.Arrays.copyOf(occupancy.get(i), dist.length));
                }
                add(occupancy.get(i), w, dist);
            }
            if (w >= TRANSIENT_SHARE || ensemble.size() == 1) {
                PeriodicSteadyState train = member.run.kinetics().pulseTrain(member.pulse(top), period);
                pulses = Math.max(pulses, PeriodicSteadyState.pulsesToOnePercent(train.secondEigenvalueModulus()));
            }
        }
        // a fifth past the stated pulses to steady state, so the chart shows the plateau the text quotes
        int shown = Math.min(Planner.MAX_BUILD_UP_PULSES, Math.max(10, (int) Math.ceil(1.2 * pulses)));
        double[] residual = new double[shown];
        double[] charged = new double[shown];
        for (int m = 0; m < members.size(); m++) {
            Member member = members.get(m);
            PulseTrainRisks.BuildUp b = PulseTrainRisks.buildUp(member.run.kinetics(), member.pulse(top), period, shown);
            add(residual, ensemble.weight(m), b.excitedOrCharged());
            add(charged, ensemble.weight(m), b.charged());
        }
        List<double[]> dA = new ArrayList<>();
        List<EarlyLate.Point> points = new ArrayList<>();
        for (int i = 0; i < k; i++) {
            double[] row = new double[taDelays.length];
            for (int j = 0; j < row.length; j++) {
                row[j] = -bandEdgeOd * bleach[i][j];
            }
            dA.add(row);
            points.add(new EarlyLate.Point(nSeries[i], el[i][0], el[i][1]));
        }
        String treatment = pump.fwhmS() == 0 ? "instantaneous pulses (no pulse width given)"
                : Double.isNaN(finiteFrom) ? String.format(Locale.ROOT, "instantaneous pulses: the %.3g fs pulse is short"
                        + " against every populated process (FWHM × rate ≤ %.2g) and off resonance", pump.fwhmS() * 1e15,
                        PumpPulse.SHORT)
                : String.format(Locale.ROOT, "finite-pulse propagation (%.3g fs%s) from ⟨N⟩ = %.3g of the mean size: %s",
                        pump.fwhmS() * 1e15, pump.resonant() ? ", band-edge absorption with stimulated emission" : "",
                        finiteFrom, why);
        return new Predictions(taDelays, dA, plDelays, List.of(pl), points, occupancy, residual, charged, pulses,
                sizeDispersion, ensemble.nodes(), treatment);
    }

    /** 1S line FWHM when the size dispersion gives none wider (common practice, no source; simulate's default too). */
    static final double DEFAULT_LINE_FWHM_J = 0.100 * org.ladderkin.units.PhysicalConstants.ELECTRONVOLT_J;

    /**
     * The pump as the kinetics see it: its FWHM, and resonant when its photon energy lies within a line width of E₁S.
     * The line width is the size dispersion's inhomogeneous FWHM through the sizing curve (2.355·w·d̄·|dE₁S/dd|), or
     * {@link #DEFAULT_LINE_FWHM_J} when that is narrower or unknown.
     */
    static PumpPulse pump(org.ladderkin.sample.Sample sample, double pulseFwhmS, double pumpPhotonJ) {
        double e1s = sample.firstExcitonEnergyJ();
        double width = DEFAULT_LINE_FWHM_J;
        double w = sample.spec().sizeDispersion();
        var sizing = sample.material().sizing();
        if (w > 0 && sizing.isPresent() && sample.sizeM() > 0) {
            double d = sample.sizeM();
            double slope = (sizing.get().firstExcitonEnergyJ(d * 1.001) - sizing.get().firstExcitonEnergyJ(d * 0.999))
                    / (0.002 * d);
            width = Math.max(width, 2 * Math.sqrt(2 * Math.log(2)) * w * d * Math.abs(slope));
        }
        boolean resonant = !Double.isNaN(e1s) && Math.abs(pumpPhotonJ - e1s) <= width;
        return new PumpPulse(Double.isFinite(pulseFwhmS) && pulseFwhmS > 0 ? pulseFwhmS : 0,
                resonant && pulseFwhmS > 0);
    }

    private static double[] excitonDistribution(Member member, double[] p) {
        var space = member.run.kinetics().space();
        double[] d = new double[space.nMax() + 1];
        for (int s = 0; s < p.length; s++) {
            d[space.excitons(s)] += p[s];
        }
        return d;
    }

    private static void add(double[] sum, double w, double[] x) {
        for (int j = 0; j < x.length; j++) {
            sum[j] += w * x[j];
        }
    }

    /** One size of the ensemble: its run (ladder sized for its strongest ⟨N⟩, cached delay grids). */
    private static final class Member {
        final DotRun run;
        final double volumeRatio;
        final double[][] bleachRow;
        final double[][] plRow;

        Member(KineticModel model, double volumeRatio, double topN, PumpPulse pump) {
            this.volumeRatio = volumeRatio;
            this.run = new DotRun(model, new PulseExcitation.Poisson(volumeRatio * topN), pump);
            this.bleachRow = new double[][] {run.kinetics().bleachObservable()};
            this.plRow = new double[][] {run.kinetics().photoluminescenceObservable()};
        }

        PulseExcitation pulse(double meanSizeN) {
            return new PulseExcitation.Poisson(volumeRatio * meanSizeN);
        }
    }
}
