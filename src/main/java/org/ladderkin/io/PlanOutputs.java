package org.ladderkin.io;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.ladderkin.observe.Risk;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.DelayPlan;
import org.ladderkin.plan.DesignSearch;
import org.ladderkin.plan.ExpectedError;
import org.ladderkin.plan.FluencePoint;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.Predictions;
import org.ladderkin.plan.RateOption;
import org.ladderkin.plan.WavelengthOption;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.PhysicalConstants;

/**
 * Machine-readable outputs of a plan: {@code plan-resolved.json} (every input with its unit in the key and every
 * derived number) and {@code traces.csv} (the predicted traces). Both written atomically.
 */
public final class PlanOutputs {

    private PlanOutputs() {
    }

    /**
     * Writes plan-resolved.json and traces.csv into {@code dir}.
     *
     * @param cautionTexts the plan's cautions as the report words them (io stays below report)
     */
    public static void write(CampaignPlan plan, List<String> cautionTexts, Path dir) throws IOException {
        ResolvedJson.write(dir.resolve("plan-resolved.json"), resolved(plan, cautionTexts));
        AtomicFiles.writeString(dir.resolve("traces.csv"), tracesCsv(plan));
    }

    /** The resolved plan as a JSON tree, with the cautions as the report words them. */
    public static ObjectNode resolved(CampaignPlan plan, List<String> cautionTexts) {
        ObjectNode root = ResolvedJson.object();
        root.put("schema", "ladderkin.plan-resolved/1");
        root.put("title", plan.inputs().title());
        root.put("lab", plan.inputs().lab());
        Sample s = plan.inputs().sample();
        ObjectNode sample = root.putObject("sample");
        sample.put("name", s.spec().name());
        sample.put("material", s.material().key());
        sample.put("sizeNm", s.sizeM() * 1e9);
        sample.put("firstExcitonEv", s.firstExcitonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J);
        sample.put("concentrationUm", s.concentrationMolPerM3() * 1e3);
        sample.put("pathLengthMm", s.spec().pathLengthM() * 1e3);
        sample.put("matrix", s.spec().matrix().map(m -> m.key()).orElse(null));
        sample.put("refresh", s.spec().refresh().mode().name().toLowerCase(Locale.ROOT));
        LaserSetup l = plan.inputs().laser();
        ObjectNode laser = root.putObject("laser");
        ArrayNode wl = laser.putArray("pumpWavelengthsNm");
        l.pumpWavelengthsM().forEach(w -> wl.add(w * 1e9));
        laser.put("repetitionRateHz", l.repetitionRateHz());
        ArrayNode div = laser.putArray("pulsePickerDivisions");
        l.pulsePickerDivisions().forEach(div::add);
        laser.put("pulseFwhmFs", l.pulseFwhmS() * 1e15);
        laser.put("minPulseEnergyNj", l.minPulseEnergyJ() * 1e9);
        laser.put("maxPulseEnergyNj", l.maxPulseEnergyJ() * 1e9);
        laser.put("pumpRadiusUm", l.pumpRadiusM() * 1e6);
        laser.put("probeRadiusUm", l.probeRadiusM() * 1e6);
        // stated values only (null: the planner's default, which the design section shows applied)
        ObjectNode cal = laser.putObject("calibration");
        putRel(cal, "pulseEnergyRel", l.calibration().pulseEnergyRel());
        putRel(cal, "pumpRadiusRel", l.calibration().pumpRadiusRel());
        putRel(cal, "probeRadiusRel", l.calibration().probeRadiusRel());
        putRel(cal, "crossSectionRel", l.calibration().crossSectionRel());
        putRel(cal, "pumpFluctuationRel", l.pumpFluctuationRel());
        putRel(cal, "pumpDriftRelPerHour", l.driftRelPerHour());
        ObjectNode model = root.putObject("model");
        var m = plan.model();
        model.put("tauSingleExcitonNs", m.tauSingleExcitonS() * 1e9);
        model.put("plQuantumYield", m.plQuantumYield());
        model.put("tauBiexcitonPs", m.tauBiexcitonS() * 1e12);
        model.put("augerScaling", m.augerScaling().key());
        model.put("radiativeScaling", m.radiativeScaling().key());
        model.put("tauTrionNegativePs", m.tauTrionNegativeS() * 1e12);
        model.put("tauTrionPositivePs", m.tauTrionPositiveS() * 1e12);
        model.put("ionisationProbability", m.ionisationProbability());
        model.put("photochargeLifetimeS", m.neutralisationS());
        model.put("refreshTimeS", Double.isFinite(m.refreshS()) ? m.refreshS() : null);
        model.put("coolingPs", m.coolingS() * 1e12);
        ArrayNode bases = model.putArray("bases");
        m.bases().forEach(bases::add);
        ArrayNode wls = root.putArray("wavelengthRanking");
        for (WavelengthOption w : plan.wavelengths()) {
            ObjectNode o = wls.addObject();
            o.put("wavelengthNm", w.wavelengthM() * 1e9);
            o.put("photonEnergyEv", w.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J);
            o.put("crossSectionCm2", w.crossSectionM2() * 1e4);
            o.put("absorbanceOd", w.absorbanceOd());
            o.put("energyOverFirstExciton", w.energyOverGap());
            o.put("maxNProbeAveraged", w.maxProbeAveragedN());
            o.put("score", w.score());
            ArrayNode r = o.putArray("reasons");
            w.reasons().forEach(r::add);
        }
        ObjectNode chosen = root.putObject("settings");
        chosen.put("pumpWavelengthNm", plan.chosenWavelength().wavelengthM() * 1e9);
        chosen.put("repetitionRateHz", plan.chosenRate().repetitionRateHz());
        chosen.put("pulsePickerDivision", plan.chosenRate().division());
        chosen.put("rateChoice", plan.rateChoice());
        ArrayNode series = chosen.putArray("fluenceSeries");
        for (FluencePoint f : plan.fluences()) {
            ObjectNode o = series.addObject();
            o.put("nAvgProbeWeighted", f.nProbeAveraged());
            o.put("nAvgPeak", f.nPeak());
            o.put("pulseEnergyNj", f.pulseEnergyJ() * 1e9);
            o.put("attenuatorOd", f.attenuatorOd());
            o.put("photonFluencePeakPerCm2", f.photonFluencePeakPerM2() * 1e-4);
            o.put("reachable", f.reachable());
            o.put("nAvgRel", f.nAvgRel());
            o.put("nAvgDominant", f.nAvgDominant());
        }
        ArrayNode rates = root.putArray("repetitionRates");
        for (RateOption r : plan.rates()) {
            ObjectNode o = rates.addObject();
            o.put("division", r.division());
            o.put("repetitionRateHz", r.repetitionRateHz());
            o.put("nAvgProbeWeighted", r.nAvgProbeWeighted());
            o.put("pulseEnergyNj", r.pulseEnergyJ() * 1e9);
            o.put("excitedOrChargedFractionAtNextPulse", r.residual());
            o.put("chargedFractionAtNextPulse", r.charged());
            o.put("steadyRiseK", Double.isFinite(r.steadyRiseK()) ? r.steadyRiseK() : null);
            o.put("verdict", r.verdict().name());
        }
        ObjectNode heat = root.putObject("heatingAtHighestFluence");
        heat.put("nAvgProbeWeighted", plan.chosenRate().nAvgProbeWeighted());
        heat.put("pulseEnergyNj", plan.chosenRate().pulseEnergyJ() * 1e9);
        heat.put("repetitionRateHz", plan.chosenRate().repetitionRateHz());
        heat.put("heatFraction", plan.heat().heatFraction());
        heat.put("heatPowerW", plan.heat().heatPowerW());
        heat.put("steadyRiseK", Double.isFinite(plan.heat().steadyRiseK()) ? plan.heat().steadyRiseK() : null);
        heat.put("perPulseRiseK", Double.isFinite(plan.heat().perPulseRiseK()) ? plan.heat().perPulseRiseK() : null);
        heat.put("dotJumpK", plan.heat().dotJumpK());
        // the hottest dots (pump axis, front face) beside the probe- and depth-averaged numbers above
        ObjectNode hot = heat.putObject("hottest");
        hot.put("nAvg", plan.heat().hottest().nAvg());
        hot.put("heatFraction", plan.heat().hottest().heatFraction());
        hot.put("perPulseRiseK", Double.isFinite(plan.heat().hottest().perPulseRiseK()) ? plan.heat().hottest().perPulseRiseK() : null);
        hot.put("dotJumpK", plan.heat().hottest().dotJumpK());
        heat.put("peakRiseK", Double.isFinite(plan.heat().peakRiseK()) ? plan.heat().peakRiseK() : null);
        heat.put("model", plan.heat().model());
        Predictions pr = plan.predictions();
        ObjectNode train = root.putObject("pulseTrainAtHighestFluence");
        train.put("nAvgProbeWeighted", plan.highestFluence().nProbeAveraged());
        train.put("pulsesToSteadyState", pr.pulsesToSteadyState());
        ObjectNode used = root.putObject("predictionModel");
        used.put("sizeDispersion", pr.sizeDispersion());
        used.put("sizeQuadratureNodes", pr.sizeNodes());
        used.put("pulse", pr.pulseTreatment());
        double[] charged = pr.buildUpCharged();
        double[] excited = pr.buildUpResidual();
        train.put("buildUpPulses", charged.length);
        train.put("chargedBeforeLastPulse", charged[charged.length - 1]);
        train.put("excitedOrChargedBeforeLastPulse", excited[excited.length - 1]);
        if (!plan.multiplication().isEmpty()) {
            ArrayNode cm = root.putArray("multiplicationForecast");
            for (var mp : plan.multiplication()) {
                ObjectNode o = cm.addObject();
                o.put("photonEnergyEv", mp.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J);
                o.put("energyOverFirstExciton", mp.energyOverGap());
                o.put("eta", mp.eta());
                o.put("idealRatio", mp.idealRatio());
                o.put("apparentRatioChosenRate", mp.apparentRatioChosen());
                o.put("chargedChosenRate", mp.chargedChosen());
                o.put("apparentRatioFullRate", mp.apparentRatioFullRate());
                o.put("chargedFullRate", mp.chargedFullRate());
                o.put("offered", mp.offered());
            }
        }
        if (plan.design() != null) {
            ObjectNode d = root.putObject("design");
            d.put("candidatesScored", plan.design().evaluated());
            designNode(d.putObject("chosen"), plan.design().best());
            designNode(d.putObject("naive"), plan.design().naive());
            ArrayNode expected = d.putArray("expectedErrors");
            for (ExpectedError e : plan.design().best().expected()) {
                ObjectNode o = expected.addObject();
                o.put("parameter", e.parameter().key());
                o.put("statisticalRel", e.statisticalRel());
                o.put("systematicRel", e.systematicRel());
                o.put("totalRel", e.totalRel());
                o.put("dominant", e.dominant());
                ObjectNode src = o.putObject("sources");
                e.sources().items().forEach(i -> src.put(i.source(), i.rel()));
                o.put("advice", e.advice());
            }
        }
        ArrayNode delays = root.putArray("delayPlans");
        for (DelayPlan dp : plan.delayPlans()) {
            ObjectNode o = delays.addObject();
            o.put("instrument", dp.instrument().kind().key());
            if (dp.instrument().measuredIrf() != null) {
                // echoed only for a measured response, so plans with a Gaussian FWHM keep their output unchanged
                o.put("irfFile", dp.instrument().measuredIrf().origin());
                o.put("irfFwhmPs", dp.instrument().irfFwhmS() * 1e12);
            }
            if (dp.instrument().kind() == Instrument.Kind.TRANSIENT_ABSORPTION) {
                ArrayNode g = o.putArray("delaysPs");
                for (double t : dp.delaysS()) {
                    g.add(t * 1e12);
                }
                o.put("stageTravelMm", dp.stageTravelM() * 1e3);
            }
            if (dp.counting() == null) {
                // early/late windows are a transient-absorption analysis
                o.put("earlyDelayPs", dp.windows().earlyS() * 1e12);
                o.put("lateDelayPs", dp.windows().lateS() * 1e12);
            } else {
                var c = dp.counting();
                ObjectNode pc = o.putObject("photonCounting");
                pc.put("nAvgProbeWeighted", c.nAvg());
                pc.put("pulseEnergyNj", c.pulseEnergyJ() * 1e9);
                pc.put("reachable", c.reachable());
                pc.put("emittedPerPulse", c.emittedPerPulse());
                pc.put("detectionAttenuation", c.detectionAttenuation());
                pc.put("detectedPerPulse", c.detectedPerPulse());
                pc.put("countRatePerS", c.countRateHz());
                pc.put("decayWindowNs", c.windowS() * 1e9);
                pc.put("targetTau1Rel", c.targetRel());
                pc.put("precisionFactor", c.precisionFactor());
                pc.put("counts", c.counts());
                pc.put("acquisitionS", c.acquisitionS());
                pc.put("availableS", c.availableS());
            }
            o.put("timePerPointS", dp.timePerPointS());
            o.put("timePerFluenceS", dp.timePerFluenceS());
        }
        if (plan.multiplicationPlan() != null) {
            var mp0 = plan.multiplicationPlan();
            ObjectNode mp = root.putObject("multiplicationPlan");
            ArrayNode ns = mp.putArray("nAvgSeries");
            for (double x : mp0.nSeries()) {
                ns.add(x);
            }
            mp.put("timePerPointS", mp0.timePerPointS());
            ArrayNode pumps = mp.putArray("pumps");
            List<org.ladderkin.plan.MultiplicationPlan.Pump> all = new java.util.ArrayList<>();
            if (mp0.reference() != null) {
                all.add(mp0.reference());
            }
            all.addAll(mp0.pumps());
            for (var p : all) {
                ObjectNode o = pumps.addObject();
                o.put("role", p == mp0.reference() ? "reference" : "pump");
                o.put("wavelengthNm", p.wavelengthM() * 1e9);
                o.put("energyOverFirstExciton", p.overGap());
                o.put("etaAssumed", p.eta());
                o.put("etaLow", p.etaLow());
                o.put("etaHigh", p.etaHigh());
                o.put("interceptRatio", p.interceptRatio());
                o.put("expectedError", p.totalError());
                o.put("statisticalError", p.statisticalError());
                o.put("bias", p.bias());
            }
            if (mp0.twoRate() != null) {
                ObjectNode t = mp.putObject("photochargingCheck");
                t.put("slowRateHz", mp0.twoRate().slowRateHz());
                t.put("ratioChosenRate", mp0.twoRate().ratioChosen());
                t.put("ratioSlowRate", mp0.twoRate().ratioSlow());
                t.put("chargedChosenRate", mp0.twoRate().chargedChosen());
            }
        }
        if (plan.gain() != null) {
            var g = plan.gain();
            ObjectNode gain = root.putObject("gain");
            gain.put("degeneracy", g.degeneracy());
            gain.put("thresholdNAvg", g.thresholdN());
            gain.put(g.shiftApplied() ? "thresholdNAvgWithBiexcitonShift" : "thresholdNAvgFarBiexcitonShift",
                    g.thresholdShiftedN());
            if (!Double.isNaN(g.shiftOverWidth())) {
                gain.put("biexcitonShiftOverLineWidth", g.shiftOverWidth());
            }
            gain.put("thresholdPulseEnergyNj", g.thresholdEnergyJ() * 1e9);
            gain.put("thresholdPeakFluenceUjPerCm2", g.thresholdFluenceJPerM2() * 100);
            gain.put("thresholdReachable", g.thresholdReachable());
            gain.put("gainLifetimeAtNAvg", g.gainAtN());
            gain.put("gainLifetimePs", g.gainLifetimeS() * 1e12);
            gain.put("tauBiexcitonPs", g.augerLifetimeS() * 1e12);
            gain.put("perPulseRiseK", g.perPulseRiseK());
            gain.put("steadyRiseK", g.steadyRiseK());
        }
        ArrayNode risks = root.putArray("risks");
        for (Risk r : plan.risks()) {
            ObjectNode o = risks.addObject();
            o.put("name", r.name());
            o.put("verdict", r.verdict().name());
            o.put("value", Double.isFinite(r.value()) ? r.value() : null);
            o.put("limit", Double.isFinite(r.limit()) ? r.limit() : null);
            o.put("unit", r.unit());
            o.put("why", r.why());
        }
        ArrayNode adv = root.putArray("advisories");
        plan.advisories().forEach(adv::add);
        ArrayNode cautions = root.putArray("cautions");
        cautionTexts.forEach(cautions::add);
        return root;
    }

    private static void designNode(ObjectNode o, DesignSearch.Design d) {
        ArrayNode n = o.putArray("nAvgProbeWeighted");
        for (double v : d.nValues()) {
            n.add(v);
        }
        o.put("grid", d.grid());
        o.put("pointsPerDecade", d.pointsPerDecade());
        o.put("delayPoints", d.delaysS().length);
        o.put("timePerPointS", d.timePerPointS());
        ObjectNode e = o.putObject("totalRelativeErrors");
        for (DesignSearch.Parameter p : DesignSearch.Parameter.values()) {
            double v = d.error(p);
            e.put(p.key(), Double.isFinite(v) ? v : null);
        }
    }

    private static void putRel(ObjectNode o, String key, double v) {
        o.put(key, Double.isNaN(v) ? null : v);
    }

    /**
     * Predicted traces as CSV: {@code delay_ps}, then {@code deltaA_od@N=<⟨N⟩>} per fluence; then a blank line and
     * {@code delay_ns}, {@code pl_per_dot_per_s@N=<⟨N⟩>}. Numbers with 12 significant digits.
     */
    public static String tracesCsv(CampaignPlan plan) {
        Predictions p = plan.predictions();
        StringBuilder b = new StringBuilder();
        b.append("delay_ps");
        for (FluencePoint f : plan.fluences()) {
            b.append(",deltaA_od@N=").append(String.format(Locale.ROOT, "%.4g", f.nProbeAveraged()));
        }
        b.append('\n');
        double[] t = p.delaysS();
        for (int m = 0; m < t.length; m++) {
            b.append(fmt(t[m] * 1e12));
            for (int i = 0; i < plan.fluences().size(); i++) {
                b.append(',').append(fmt(p.deltaAOd().get(i)[m]));
            }
            b.append('\n');
        }
        b.append('\n').append("delay_ns");
        for (FluencePoint f : plan.fluences()) {
            b.append(",pl_per_dot_per_s@N=").append(String.format(Locale.ROOT, "%.4g", f.nProbeAveraged()));
        }
        b.append('\n');
        double[] tp = p.plDelaysS();
        for (int m = 0; m < tp.length; m++) {
            b.append(fmt(tp[m] * 1e9));
            for (int i = 0; i < plan.fluences().size(); i++) {
                b.append(',').append(fmt(p.plPerDot().get(i)[m]));
            }
            b.append('\n');
        }
        return b.toString();
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.12g", v);
    }
}
