// Over 400 lines: the one pass from inputs to plan (choices that depend on each other); mode rows live in their own classes
package org.ladderkin.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.excite.BeamProfile;
import org.ladderkin.excite.Calibration;
import org.ladderkin.excite.Excitation;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.excite.OccupancyUncertainty;
import org.ladderkin.excite.Pulse;
import org.ladderkin.excite.RelativeBudget;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.EarlyLate;
import org.ladderkin.observe.Heating;
import org.ladderkin.observe.PulseTrainRisks;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.TimeWindows;
import org.ladderkin.observe.Verdict;
import org.ladderkin.sample.Advisory;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;

/**
 * Turns a sample and a laser into a campaign plan: pump wavelength, repetition rate, an optimal fluence series and
 * delay grid, predicted signals and a risk table. Pure computation: no files, no printing.
 */
public final class Planner {

    /** Share of the beam time that goes into recording data (the rest is alignment and checks): common practice. */
    public static final double DATA_SHARE_OF_BEAM_TIME = 0.5;
    /** Above this ⟨N⟩ the ladder, Poisson statistics and the Auger scaling laws are extrapolations. */
    public static final double MODEL_VALIDITY_N = 10;
    /** Sample temperature before the pump (K), a laboratory at about 22 °C: common practice, no source. */
    public static final double SAMPLE_TEMPERATURE_K = 295;
    /** Assumed PL collection × detection efficiency for the TCSPC pile-up estimate (common practice, no source). */
    public static final double TCSPC_COLLECTION_EFFICIENCY = 1e-4;

    /**
     * σ's relative uncertainty when neither the plan nor the cross-section states one: an absorption law transferred
     * from another batch, size or wavelength is good to about 20 % (common practice, no source).
     */
    public static final double DEFAULT_CROSS_SECTION_REL = 0.20;

    /** Progress of a long computation. */
    @FunctionalInterface
    public interface Progress {
        void step(int done, int total, String what);

        /** Ignores progress. */
        Progress NONE = (d, t, w) -> { };
    }

    private Planner() { }

    /** Plans the campaign the inputs describe. */
    public static CampaignPlan plan(PlanInputs in, Progress progress) {
        return plan(in, progress, true);
    }

    /**
     * Plans the campaign; without the design search the series is the naive log-spaced one (for interactive views:
     * the search dominates the cost) and the rate is chosen as the design would choose it.
     */
    public static CampaignPlan plan(PlanInputs in, Progress progress, boolean searchDesign) {
        int totalSteps = 6;
        Sample sample = in.sample();
        if (Double.isNaN(sample.firstExcitonEnergyJ())) {
            // the bleach, the wavelength ranking and the carrier-multiplication threshold all need E₁S
            throw new IllegalArgumentException("sample: the first-exciton peak of " + sample.spec().name() + " is unknown ("
                    + sample.material().key() + " has no sizing curve in the library): give 'firstExcitonPeak' beside "
                    + "'diameter' (the peak sets E₁S, the size the volume)");
        }
        LaserSetup laser = in.laser();
        int g = (int) Math.round(sample.material().electronDegeneracy().value());
        ModelAssumptions model = ModelAssumptions.forSample(sample, in.modelOverrides(), 2 * laser.pumpRadiusM());
        KineticModel km = model.kineticModel(g);
        BeamProfile pump = new GaussianBeam(laser.pumpRadiusM());
        BeamProfile probe = new GaussianBeam(laser.probeRadiusM());

        progress.step(0, totalSteps, "ranking pump wavelengths");
        List<WavelengthOption> wavelengths = WavelengthRanking.rank(sample, laser.pumpWavelengthsM(),
                laser.maxPulseEnergyJ(), laser.repetitionRateHz(), pump, probe, in.goals());
        WavelengthOption chosen = wavelengths.get(0);
        Excitation atMax = Excitation.of(sample, new Pulse(laser.maxPulseEnergyJ(), chosen.wavelengthM(),
                laser.repetitionRateHz()), pump, probe, true);
        double nReach = Math.min(atMax.nAvgProbeWeighted(), MODEL_VALIDITY_N);

        Instrument ta = in.instruments().stream().filter(i -> i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION)
                .findFirst().orElse(null);
        double bandEdgeOd = Double.isNaN(sample.firstExcitonEnergyJ()) ? Double.NaN
                : sample.absorbanceAt(sample.firstExcitonWavelengthM());
        var goalParams = DesignSearch.parametersFor(in.goals());
        Instrument tcspc = in.instruments().stream().filter(i -> i.kind() == Instrument.Kind.TCSPC).findFirst().orElse(null);
        double countingN = PhotonCounting.lifetimeN(atMax.nAvgProbeWeighted() * laser.minPulseEnergyJ()
                / laser.maxPulseEnergyJ(), nReach);
        double firstDelay = ta == null ? 1e-12 : Math.max(ta.minDelayS(), 5 * model.coolingS());
        double lastDelay = ta == null ? 3e-9 : ta.maxDelayS();
        Calibration cal = laser.calibration().orDefaults();
        DesignSearch.Result design = null;
        double[] nSeries;
        List<RateOption> rates;
        RateOption chosenRate;
        String rateChoice;
        boolean designable = ta != null && !goalParams.isEmpty() && !Double.isNaN(bandEdgeOd) && nReach > 0.2;
        if (designable) {
            // the rate sets the design's period and the design the ⟨N⟩ the rate must survive: judged at the highest
            // ⟨N⟩ the design can reach, the rate survives any series it picks, so one search suffices
            progress.step(1, totalSteps, "judging repetition rates");
            RateOption designRate = RateJudge.fastestPassing(RateJudge.rates(in, km, atMax, nReach));
            if (searchDesign) {
                progress.step(2, totalSteps, "searching the fluence and delay design");
                design = DesignSearch.search(designContext(in, model, g, designRate, bandEdgeOd, ta, firstDelay, lastDelay,
                        nReach, goalParams, atMax, cal));
                nSeries = design.best().nValues();
            } else {
                nSeries = previewSeries(nReach);
            }
            rates = RateJudge.rates(in, km, atMax, top(nSeries));
            chosenRate = notFasterThan(RateJudge.fastestPassing(rates), designRate, rates);
            String rule = String.format(Locale.ROOT, "Rates first judged at the highest ⟨N⟩ the design can reach, %.3g, to "
                    + "set the period the design is scored at (%s); then again at the %s highest ⟨N⟩ = %.3g, where the "
                    + "fastest that passes, never faster than the design's, is used", nReach, RateJudge.hz(designRate),
                    searchDesign ? "designed series'" : "series'", top(nSeries));
            if (chosenRate.repetitionRateHz() >= designRate.repetitionRateHz() || !searchDesign) {
                rateChoice = rule + ": " + RateJudge.hz(chosenRate) + ".";
            } else {
                // slower at the designed top than at nReach (every rate failed there, or a limit is not monotonic in ⟨N⟩)
                RateOption second = chosenRate;
                double firstTop = top(nSeries);
                progress.step(2, totalSteps, "searching the design again at " + RateJudge.hz(second));
                design = DesignSearch.search(designContext(in, model, g, second, bandEdgeOd, ta, firstDelay, lastDelay,
                        nReach, goalParams, atMax, cal));
                nSeries = design.best().nValues();
                rates = RateJudge.rates(in, km, atMax, top(nSeries));
                chosenRate = notFasterThan(RateJudge.fastestPassing(rates), second, rates);
                rateChoice = String.format(Locale.ROOT, "%s: %s at ⟨N⟩ = %.3g, slower than the design's, so the design "
                        + "was searched again at that rate; its series goes to ⟨N⟩ = %.3g, where the rates are judged "
                        + "again: %s.", rule, RateJudge.hz(second), firstTop, top(nSeries), RateJudge.hz(chosenRate));
            }
        } else if (ta == null && tcspc != null) {
            // photon counting alone: one decay at a low ⟨N⟩, and the rates judged where it is recorded
            nSeries = new double[] {countingN};
            progress.step(1, totalSteps, "judging repetition rates");
            rates = RateJudge.rates(in, km, atMax, countingN);
            // a decay needs its period: the fastest passing rate whose period holds 5 τ₁, if one does
            double minPeriod = 5 * model.tauSingleExcitonS();
            List<RateOption> long5 = rates.stream().filter(r -> 1 / r.repetitionRateHz() >= minPeriod).toList();
            chosenRate = RateJudge.fastestPassing(long5.isEmpty() ? rates : long5);
            rateChoice = String.format(Locale.ROOT, "Rates judged at the photon-counting decay's ⟨N⟩ = %.3g; the fastest "
                    + "that passes with a period of at least 5 τ₁ (%s)%s.", countingN, Quantity.formatBest(minPeriod,
                    Dimension.TIME, 3), long5.isEmpty() ? ": none is that slow, so the fastest that passes" : "");
        } else {
            // without a design the series does not depend on the rate: judge the rates at its own top
            nSeries = previewSeries(nReach);
            progress.step(1, totalSteps, "judging repetition rates");
            rates = RateJudge.rates(in, km, atMax, top(nSeries));
            chosenRate = RateJudge.fastestPassing(rates);
            rateChoice = String.format(Locale.ROOT, "Rates judged at the series' highest ⟨N⟩ = %.3g.", top(nSeries));
        }
        double period = 1 / chosenRate.repetitionRateHz();
        Excitation atChosenRate = Excitation.of(sample, new Pulse(laser.maxPulseEnergyJ(), chosen.wavelengthM(),
                chosenRate.repetitionRateHz()), pump, probe, true);

        progress.step(3, totalSteps, "converting the series to pulse energies");
        List<FluencePoint> fluences = new ArrayList<>();
        // the probe- and depth-averaged ⟨N⟩ is linear in the pulse energy, so one evaluation gives every setting
        double nPerJoule = atChosenRate.nAvgProbeWeighted() / laser.maxPulseEnergyJ();
        for (double n : nSeries) {
            double e = n / nPerJoule;
            Excitation ex = atChosenRate.withEnergyJ(e);
            boolean reachable = e <= laser.maxPulseEnergyJ() * (1 + 1e-9) && e >= laser.minPulseEnergyJ() * (1 - 1e-9);
            fluences.add(new FluencePoint(n, ex.nAvgPeak(), e, Math.log10(laser.maxPulseEnergyJ() / e),
                    ex.photonFluencePeakPerM2(), reachable,
                    OccupancyUncertainty.of(ex, cal, crossSectionRel(in, ex)).nAvgProbeWeighted()));
        }

        progress.step(4, totalSteps, "predicting traces");
        Excitation top = atChosenRate.withEnergyJ(fluences.get(fluences.size() - 1).pulseEnergyJ());
        // the chosen option was judged at the series' top: its heating is the plan's, not a second evaluation
        HeatBudget heat = chosenRate.heat();
        List<DelayPlan> delayPlans = new ArrayList<>();
        for (Instrument inst : in.instruments()) {
            delayPlans.add(delayPlan(inst, model, design, nSeries.length, km, countingN, period, atChosenRate, in));
        }
        // the predicted traces are drawn on log axes: the printed TA grid's positive delays, so they start where it does
        double[] taDelays = delayPlans.stream().filter(d -> d.instrument().kind() == Instrument.Kind.TRANSIENT_ABSORPTION)
                .findFirst().map(d -> java.util.Arrays.stream(d.delaysS()).filter(t -> t > 0).toArray())
                .filter(t -> t.length >= 2).orElseGet(() -> TimeWindows.logSpaced(firstDelay, lastDelay, 60));
        Predictions predictions = predict(km, nSeries, period, taDelays, bandEdgeOd, model);

        progress.step(5, totalSteps, "delay plans and risks");
        String at = String.format(Locale.ROOT, "at the series' highest ⟨N⟩ = %.3g (%s) and %s", top(nSeries),
                Quantity.formatBest(top.pulse().energyJ(), Dimension.ENERGY, 4),
                Quantity.formatBest(chosenRate.repetitionRateHz(), Dimension.FREQUENCY, 3));
        List<Risk> risks = new ArrayList<>();
        risks.add(evaluatedAt(Heating.risk("steady-state heating", heat.steadyRiseK(), SAMPLE_TEMPERATURE_K,
                in.limits().maxTemperatureRiseK(), heat.boilingPointK()), at));
        Risk charging = evaluatedAt(PulseTrainRisks.chargingRisk(chosenRate.charged(), in.limits().maxChargedFraction()), at);
        if (sample.spec().matrix().map(m -> m.kind() == org.ladderkin.sample.Matrix.Kind.FILM).orElse(false)) {
            charging = FilmTranslation.advise(charging, km, top(nSeries), period, in.limits().maxChargedFraction(),
                    sample.spec().refresh(), 2 * laser.pumpRadiusM());
        }
        risks.add(charging);
        risks.add(evaluatedAt(PulseTrainRisks.residualRisk(chosenRate.residual(), in.limits().maxResidualExcitation()), at));
        for (DelayPlan d : delayPlans) {
            risks.addAll(d.risks());
        }
        risks.add(thickness(chosen));
        risks.add(new Risk("fluence within the model's range", nSeries[nSeries.length - 1] > MODEL_VALIDITY_N ? Verdict.WARN
                : Verdict.PASS, nSeries[nSeries.length - 1], MODEL_VALIDITY_N, "⟨N⟩", String.format(Locale.ROOT,
                "highest ⟨N⟩ %.3g; above %.0f the ladder, Poisson statistics and the Auger scaling laws are extrapolated",
                nSeries[nSeries.length - 1], MODEL_VALIDITY_N)));
        if (chosen.energyOverGap() >= 2) {
            risks.add(new Risk("carrier-multiplication confound", Verdict.WARN, chosen.energyOverGap(), 2, "E₁S",
                    in.goals().contains(Goal.MULTIPLICATION_YIELD) ? "the main series' pump can create two excitons per "
                            + "photon: fit its Auger and σ analysis with the multiplication yield, or pump it at the "
                            + "multiplication plan's reference" : "the chosen pump can create two excitons per photon; no "
                            + "lower-energy pump was acceptable"));
        }
        long unreachable = fluences.stream().filter(f -> !f.reachable()).count();
        if (unreachable > 0) {
            risks.add(new Risk("fluence series within the laser's range", Verdict.FAIL, unreachable, 0, "points",
                    unreachable + " point(s) of the series need pulse energies outside the laser's range"));
        }
        List<MultiplicationPrediction> cm = List.of();
        if (in.goals().contains(Goal.MULTIPLICATION_YIELD) && !Double.isNaN(sample.firstExcitonEnergyJ())) {
            cm = MultiplicationForecast.forecast(km, model, MultiplicationForecast.defaultLaw(sample.firstExcitonEnergyJ()),
                    sample.firstExcitonEnergyJ(), in.multiplicationPhotonEnergiesJ(), laser.pumpWavelengthsM(), period,
                    1 / laser.repetitionRateHz());
            for (MultiplicationPrediction p : cm) {
                double inflation = p.apparentRatioFullRate() / p.idealRatio() - 1;
                if (inflation > 0.02) {
                    risks.add(new Risk(String.format(Locale.ROOT, "false multiplication at %.2f·E₁S without pulse picking",
                            p.energyOverGap()), Verdict.WARN, inflation, 0.02, "relative", String.format(Locale.ROOT,
                            "at the full %s rate residual excitation and trions inflate A/B by %.0f %% (charged fraction "
                                    + "%.2g): use the pulse picker (%s) and refresh the sample",
                            Quantity.formatBest(laser.repetitionRateHz(), Dimension.FREQUENCY, 3), 100 * inflation,
                            p.chargedFullRate(), Quantity.formatBest(chosenRate.repetitionRateHz(), Dimension.FREQUENCY, 3))));
                }
                if (!p.offered()) {
                    risks.add(new Risk("multiplication photon energy available", Verdict.FAIL, p.photonEnergyJ(), 0, "J",
                            String.format(Locale.ROOT, "the laser offers no pump at %.3f eV", p.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J)));
                }
            }
        }
        MultiplicationPlan multiplication = null;
        if (in.goals().contains(Goal.MULTIPLICATION_YIELD) && ta != null) {
            // the multiplication measurement shares the beam time with the other goals' series
            double share = in.goals().size() > 1 ? 0.5 : 1;
            multiplication = MultiplicationPlan.of(km, model, sample.firstExcitonEnergyJ(), laser.pumpWavelengthsM(),
                    bandEdgeOd, ta.noiseFloor(), share * in.limits().beamTimeS() * DATA_SHARE_OF_BEAM_TIME,
                    chosenRate.repetitionRateHz(), in.limits());
            risks.addAll(multiplication.risks());
        }
        boolean film = sample.spec().matrix().map(m -> m.kind() == org.ladderkin.sample.Matrix.Kind.FILM).orElse(false);
        GainPlan gain = !in.goals().contains(Goal.GAIN_THRESHOLD) ? null
                : GainPlan.of(g, km, model, atChosenRate, laser, top(nSeries), heat, in.limits(), film);
        if (gain != null) {
            risks.addAll(gain.risks());
        }
        List<String> advisories = atChosenRate.advisories().stream().map(Advisory::message).distinct().toList();
        String matrixKey = sample.spec().matrix().map(m -> m.key()).orElse("unknown matrix");
        double peakFluence = 0;
        for (FluencePoint f : fluences) {
            peakFluence = Math.max(peakFluence, f.photonFluencePeakPerM2() * chosen.photonEnergyJ());
        }
        List<Caution> cautions = CautionRules.forCampaign(sample.material().key(), matrixKey, heat.steadyRiseK(),
                SAMPLE_TEMPERATURE_K, heat.boilingPointK(), peakFluence);
        progress.step(6, totalSteps, "done");
        return new CampaignPlan(in, model, wavelengths, rates, chosenRate, rateChoice, fluences, heat, design, delayPlans, cm, predictions,
                risks, advisories, cautions, gain, multiplication);
    }

    private static double[] previewSeries(double nReach) {
        return TimeWindows.logSpaced(0.05, Math.max(0.1, Math.min(3, nReach)), 8);
    }

    /** {@code passing} unless it is faster than {@code cap}, else the option of {@code rates} at {@code cap}'s division. */
    private static RateOption notFasterThan(RateOption passing, RateOption cap, List<RateOption> rates) {
        return passing.repetitionRateHz() <= cap.repetitionRateHz() ? passing : rates.stream().filter(r -> r.division() == cap.division()).findFirst().orElseThrow();
    }

    /** Longest pulse-train build-up kept for the chart (one point a pulse). */
    public static final int MAX_BUILD_UP_PULSES = 20_000;

    /** The risk with the fluence and rate it was evaluated at added to its explanation. */
    private static Risk evaluatedAt(Risk r, String at) {
        return new Risk(r.name(), r.verdict(), r.value(), r.limit(), r.unit(), r.why() + " (" + at + ")");
    }

    private static double top(double[] nSeries) {
        return nSeries[nSeries.length - 1];
    }

    private static DesignSearch.Context designContext(PlanInputs in, ModelAssumptions model, int g, RateOption rate,
                                                      double bandEdgeOd, Instrument ta, double firstDelay, double lastDelay,
                                                      double nReach, java.util.Set<DesignSearch.Parameter> goalParams,
                                                      Excitation atMax, Calibration cal) {
        LaserSetup laser = in.laser();
        Excitation atRate = Excitation.of(atMax.sample(), new Pulse(laser.maxPulseEnergyJ(), atMax.pulse().wavelengthM(),
                rate.repetitionRateHz()), atMax.geometry().pump(), atMax.geometry().probe(), true);
        double budget = in.limits().beamTimeS() * DATA_SHARE_OF_BEAM_TIME;
        return new DesignSearch.Context(model, g, 1 / rate.repetitionRateHz(), bandEdgeOd, ta.noiseFloor(), budget,
                firstDelay, lastDelay, nReach, goalParams, designErrors(in, ta, atRate, cal));
    }

    /**
     * σ's relative uncertainty at the pump: the plan's stated value, else the uncertainty the cross-section states for
     * itself (its law's or measurement's, with its regime), else {@link #DEFAULT_CROSS_SECTION_REL}. The one place the
     * planner reads it.
     */
    private static double crossSectionRel(PlanInputs in, Excitation atPump) {
        double stated = in.laser().calibration().crossSectionRel();
        if (!Double.isNaN(stated)) {
            return stated;
        }
        double own = atPump.crossSection().relativeUncertainty();
        return Double.isNaN(own) ? DEFAULT_CROSS_SECTION_REL : own;
    }

    /**
     * The design's error terms. The fluence scale's prior is the probe-averaged ⟨N⟩ budget without σ: σ enters the
     * design as its own parameter (free when it is a goal, with its stated uncertainty as prior when not), so its
     * share must not be counted twice.
     */
    private static DesignSearch.Errors designErrors(PlanInputs in, Instrument ta, Excitation ex, Calibration cal) {
        Calibration withoutSigma = new Calibration(cal.pulseEnergyRel(), cal.pumpRadiusRel(), cal.probeRadiusRel(), Double.NaN);
        RelativeBudget scale = OccupancyUncertainty.of(ex, withoutSigma, Double.NaN).nAvgProbeWeighted();
        RelativeBudget stated = RelativeBudget.NONE.plus("pulse energy", cal.pulseEnergyRel())
                .plus("pump radius", cal.pumpRadiusRel()).plus("probe radius", cal.probeRadiusRel());
        LaserSetup l = in.laser();
        return new DesignSearch.Errors(l.pumpFluctuationOrDefault(), l.driftPerHourOrDefault(), scale, stated,
                crossSectionRel(in, ex), ta.timeZeroUncertaintyOrDefault(), ta.irfFwhmS(), ta.irfWidthRelOrDefault(), ta.measuredIrf());
    }

    private static Predictions predict(KineticModel km, double[] nSeries, double period, double[] taDelays,
                                       double bandEdgeOd, ModelAssumptions model) {
        PulseExcitation strongest = new PulseExcitation.Poisson(nSeries[nSeries.length - 1]);
        double[] plDelays = TimeWindows.logSpaced(1e-12, Math.min(period, 20 * model.tauSingleExcitonS()), 120);
        TimeWindows.EarlyLate windows = TimeWindows.earlyLate(model.coolingS(), model.tauBiexcitonS(), model.tauSingleExcitonS());
        int k = nSeries.length;
        double[][] dA = new double[k][];
        double[][] pl = new double[k][];
        double[][] occupancy = new double[k][];
        EarlyLate.Point[] el = new EarlyLate.Point[k];
        // the work bound of the whole series, refused in one line before anything is built (docs/physics.md §9)
        LadderKinetics.checkWork(km, taDelays.length + plDelays.length + 2, true, false,
                java.util.Arrays.stream(nSeries).mapToObj(PulseExcitation.Poisson::new).toArray(PulseExcitation[]::new));
        LadderKinetics kin = LadderKinetics.forPulses(km, strongest);
        // one ladder and one factorised grid per delay set, reused for every fluence
        var taGrid = kin.propagator().onGrid(taDelays);
        var plGrid = kin.propagator().onGrid(plDelays);
        var elGrid = kin.propagator().onGrid(new double[] {windows.earlyS(), windows.lateS()});
        double[][] bleachRow = {kin.bleachObservable()};
        double[][] plRow = {kin.photoluminescenceObservable()};
        for (int i = 0; i < k; i++) {
            PulseExcitation pulse = new PulseExcitation.Poisson(nSeries[i]);
            SteadyState ss = kin.steadyState(pulse, period, false);
            double[] after = ss.afterPulse().probabilities();
            double[] bleach = taGrid.observe(bleachRow, after)[0];
            dA[i] = new double[bleach.length];
            for (int m = 0; m < bleach.length; m++) {
                dA[i][m] = -bandEdgeOd * bleach[m];
            }
            pl[i] = plGrid.observe(plRow, after)[0];
            occupancy[i] = ss.afterPulse().excitonDistribution();
            double[] two = elGrid.observe(bleachRow, after)[0];
            el[i] = new EarlyLate.Point(nSeries[i], two[0], two[1]);
        }
        PeriodicSteadyState train = kin.pulseTrain(strongest, period);
        int pulses = PeriodicSteadyState.pulsesToOnePercent(train.secondEigenvalueModulus());
        // a fifth past the stated pulses to steady state, so the chart shows the plateau the text quotes
        int shown = Math.min(MAX_BUILD_UP_PULSES, Math.max(10, (int) Math.ceil(1.2 * pulses)));
        PulseTrainRisks.BuildUp buildUp = PulseTrainRisks.buildUp(kin, strongest, period, shown);
        return new Predictions(taDelays, List.of(dA), plDelays, List.of(pl), List.of(el), List.of(occupancy),
                buildUp.excitedOrCharged(), buildUp.charged(), pulses);
    }

    private static DelayPlan delayPlan(Instrument inst, ModelAssumptions model, DesignSearch.Result design, int fluenceCount,
                                       KineticModel km, double countingN, double period, Excitation atChosenRate,
                                       PlanInputs in) {
        TimeWindows.EarlyLate windows = TimeWindows.earlyLate(model.coolingS(), model.tauBiexcitonS(), model.tauSingleExcitonS());
        List<Risk> risks = new ArrayList<>();
        double budget = in.limits().beamTimeS() * DATA_SHARE_OF_BEAM_TIME;
        if (inst.kind() == Instrument.Kind.TRANSIENT_ABSORPTION) {
            double[] grid;
            double perPoint;
            if (design != null) {
                // exactly the grid and averaging time the design was scored on
                grid = design.best().delaysS();
                perPoint = design.best().timePerPointS();
            } else {
                grid = TimeWindows.grid(-2 * inst.irfFwhmS(), Math.max(inst.irfFwhmS() / 2, 20e-15),
                        Math.max(2e-12, 10 * inst.irfFwhmS()), inst.maxDelayS(), 10);
                perPoint = budget / (fluenceCount * grid.length);
            }
            if (!windows.separated()) {
                risks.add(new Risk("early/late windows", Verdict.WARN, windows.lateS(), windows.earlyS(), "s",
                        "cooling, Auger and radiative time scales are too close for a clean early/late analysis"));
            }
            if (inst.maxDelayS() < 5 * model.tauBiexcitonS()) {
                risks.add(new Risk("TA delay range", Verdict.WARN, inst.maxDelayS() / model.tauBiexcitonS(), 5, "τ₂",
                        "the delay stage does not reach 5 τ₂: the Auger decay will not be complete"));
            }
            return new DelayPlan(inst, grid, TimeWindows.stageTravelM(inst.maxDelayS()), windows, perPoint,
                    perPoint * grid.length, risks, null);
        }
        // TCSPC: one decay at a low ⟨N⟩, planned from its count rate (with TA beside it, a fluence's share of the time)
        boolean alone = in.instruments().stream().noneMatch(i -> i.kind() == Instrument.Kind.TRANSIENT_ABSORPTION);
        PhotonCounting counting = PhotonCounting.plan(inst, model, km, atChosenRate, in.laser(), countingN, period,
                alone ? budget : budget / fluenceCount);
        return new DelayPlan(inst, new double[0], 0, windows, counting.acquisitionS(), counting.acquisitionS(),
                counting.risks(), counting);
    }

    private static Risk thickness(WavelengthOption chosen) {
        double od = chosen.absorbanceOd();
        Verdict v = od >= 3 ? Verdict.FAIL : od > 1 ? Verdict.WARN : Verdict.PASS;
        return new Risk("optically thick sample", v, od, 1, "OD", String.format(Locale.ROOT,
                "absorbance %.3g OD at the pump; above 1 OD the fluence falls through the depth and the fluence "
                        + "dependence bends (depth averaging is applied), at 3 OD absorbance readings are unreliable", od));
    }
}
