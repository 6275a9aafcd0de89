package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.gui.model.ErrorBudgetService;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.gui.model.Prediction;
import org.ladderkin.gui.model.PredictionReport;
import org.ladderkin.gui.model.RecomputeService;
import org.ladderkin.io.PlanCodec;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * One set of numbers everywhere: every number the report (HTML), the {@code plan} text output and the window (the
 * prediction it shows once the full plan arrived) print is read back from the printed text by its label and compared
 * with {@code plan-resolved.json}, within the rounding of the printed digits. Every "at the highest fluence" number
 * must be evaluated at the series' highest ⟨N⟩ as the JSON writes it.
 */
class PrintedNumbersAgreeTest {

    private static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    private static final String NUM = "(−?-?[0-9][0-9.]*(?:e[+-]?[0-9]+)?)";

    @ParameterizedTest
    @ValueSource(strings = {"cdse-auger-1khz.plan.json", "pbse-multiplication-80mhz.plan.json"})
    void reportTextAndWindowPrintTheResolvedJsonsNumbers(String file, @TempDir Path out) throws Exception {
        Path plan = HOME.resolve("experiments-plan").resolve(file);
        MainTest.Run run = MainTest.run("plan", plan.toString(), "--out", out.toString());
        assertThat(run.exit()).as(run.err()).isZero();
        JsonNode json = new ObjectMapper().readTree(Files.readString(out.resolve("plan-resolved.json")));
        Html report = new Html(Files.readString(out.resolve("report.html")));

        JsonNode series = json.at("/settings/fluenceSeries");
        JsonNode topPoint = series.get(series.size() - 1);
        double topN = topPoint.get("nAvgProbeWeighted").asDouble();
        double topEnergyJ = topPoint.get("pulseEnergyNj").asDouble() * 1e-9;
        JsonNode chosenRate = chosenRate(json);

        // every "at the highest fluence" number is evaluated at the series' top as plan-resolved.json writes it
        for (JsonNode r : json.get("repetitionRates")) {
            assertThat(r.get("nAvgProbeWeighted").asDouble()).isEqualTo(topN);
            assertThat(r.get("pulseEnergyNj").asDouble()).isCloseTo(topPoint.get("pulseEnergyNj").asDouble(),
                    org.assertj.core.data.Percentage.withPercentage(1e-9));
        }
        JsonNode heat = json.get("heatingAtHighestFluence");
        assertThat(heat.get("nAvgProbeWeighted").asDouble()).isEqualTo(topN);
        assertThat(heat.get("repetitionRateHz").asDouble()).isEqualTo(json.at("/settings/repetitionRateHz").asDouble());
        assertThat(heat.get("steadyRiseK").asDouble()).isEqualTo(chosenRate.get("steadyRiseK").asDouble());
        JsonNode train = json.get("pulseTrainAtHighestFluence");
        assertThat(train.get("nAvgProbeWeighted").asDouble()).isEqualTo(topN);
        assertThat(train.get("buildUpPulses").asInt()).isGreaterThanOrEqualTo(train.get("pulsesToSteadyState").asInt());
        assertThat(risk(json, org.ladderkin.plan.HeatBudget.RISK_NAME).get("value").asDouble()).isEqualTo(heat.get("peakRiseK").asDouble());
        assertThat(risk(json, "photocharging").get("value").asDouble()).isEqualTo(chosenRate.get("chargedFractionAtNextPulse").asDouble());
        assertThat(risk(json, "residual excitation at the next pulse").get("value").asDouble())
                .isEqualTo(chosenRate.get("excitedOrChargedFractionAtNextPulse").asDouble());
        // the build-up runs past the stated pulses to steady state, so it ends at the steady state's charged fraction
        double steadyCharged = chosenRate.get("chargedFractionAtNextPulse").asDouble();
        assertThat(train.get("chargedBeforeLastPulse").asDouble()).isCloseTo(steadyCharged,
                org.assertj.core.data.Offset.offset(0.02 * steadyCharged + 1e-9));

        checkReport(report, json, topN, topEnergyJ, chosenRate);
        checkText(run.out(), json, topN, topEnergyJ, chosenRate);
        checkModes(run.out(), json);
        checkModes(report.text, json);
        checkWindow(PlanCodec.read(plan), json, topN, chosenRate);
    }

    // ---- the report -------------------------------------------------------------------------------------------

    private static void checkReport(Html h, JsonNode json, double topN, double topEnergyJ, JsonNode rate) {
        JsonNode series = json.at("/settings/fluenceSeries");
        String atTop = "the series' highest ⟨N⟩ = " + NUM + " \\(" + NUM + " ([a-zµ]?J)\\)";

        Matcher m = find(h.text, "Repetition rate " + NUM + " ([kMG]?Hz) \\(pulse picker ÷([0-9]+)\\): the fastest offered that "
                + "keeps the dots excited or charged at the next pulse \\(" + NUM + "\\), charging \\(" + NUM + "\\) and heating \\(" + NUM
                + " K\\) within the limits at " + atTop);
        quantity(m.group(1) + " " + m.group(2), Dimension.FREQUENCY, json.at("/settings/repetitionRateHz").asDouble(), "rate");
        assertThat(Integer.parseInt(m.group(3))).isEqualTo(json.at("/settings/pulsePickerDivision").asInt());
        printed(m.group(4), rate.get("excitedOrChargedFractionAtNextPulse").asDouble(), "settings residual");
        printed(m.group(5), rate.get("chargedFractionAtNextPulse").asDouble(), "settings charging");
        printed(m.group(6), rate.get("steadyRiseK").asDouble(), "settings heating");
        printed(m.group(6), json.at("/heatingAtHighestFluence/steadyRiseK").asDouble(), "settings heating vs heating table");
        printed(m.group(7), topN, "settings ⟨N⟩");
        quantity(m.group(8) + " " + m.group(9), Dimension.ENERGY, topEnergyJ, "settings energy");

        List<List<String>> rows = h.table("Fluence series");
        assertThat(rows).hasSize(series.size());
        double photonJ = json.at("/wavelengthRanking/0/photonEnergyEv").asDouble() * 1.602176634e-19;
        for (int i = 0; i < rows.size(); i++) {
            List<String> r = rows.get(i);
            JsonNode f = series.get(i);
            printed(r.get(1), f.get("nAvgProbeWeighted").asDouble(), "series ⟨N⟩");
            printed(r.get(2).replaceAll(" %.*", ""), 100 * f.get("nAvgRel").asDouble(), "series ±");
            assertThat(r.get(2)).contains(f.get("nAvgDominant").asText());
            printed(r.get(3), f.get("nAvgPeak").asDouble(), "series on axis");
            quantity(r.get(4), Dimension.ENERGY, f.get("pulseEnergyNj").asDouble() * 1e-9, "series energy");
            printed(r.get(5), f.get("attenuatorOd").asDouble(), "series attenuation");
            printed(r.get(6), f.get("photonFluencePeakPerCm2").asDouble() * photonJ * 1e6, "series µJ/cm²");
            printed(r.get(7), f.get("photonFluencePeakPerCm2").asDouble(), "series photons/cm²");
            assertThat(r.get(8)).isEqualTo(f.get("reachable").asBoolean() ? "yes" : "NO");
        }

        Matcher risksAt = find(h.text, "Heating, photocharging and residual excitation at " + atTop + " and the chosen rate \\("
                + NUM + " ([kMG]?Hz)\\)");
        printed(risksAt.group(1), topN, "risks ⟨N⟩");
        quantity(risksAt.group(2) + " " + risksAt.group(3), Dimension.ENERGY, topEnergyJ, "risks energy");
        quantity(risksAt.group(4) + " " + risksAt.group(5), Dimension.FREQUENCY, json.at("/settings/repetitionRateHz").asDouble(),
                "risks rate");
        rows = h.table("Risks");
        JsonNode risks = json.get("risks");
        assertThat(rows).hasSize(risks.size());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode r = risks.get(i);
            assertThat(rows.get(i).get(0)).isEqualTo(r.get("name").asText());
            printedOrNull(rows.get(i).get(1), r.get("value"), r.get("name").asText());
            printedOrNull(rows.get(i).get(2), r.get("limit"), r.get("name").asText() + " limit");
            assertThat(rows.get(i).get(3)).isEqualTo(r.get("unit").asText());
            assertThat(rows.get(i).get(4)).isEqualTo(r.get("why").asText());
            assertThat(rows.get(i).get(5)).isEqualTo(r.get("verdict").asText());
        }

        Matcher pulses = find(h.text, "The pulse-train build-up is at " + atTop + ": it takes ([0-9]+) pulses to come within 1 % of "
                + "the steady state; ([0-9]+) pulses are drawn");
        printed(pulses.group(1), topN, "build-up ⟨N⟩");
        assertThat(Integer.parseInt(pulses.group(4))).isEqualTo(json.at("/pulseTrainAtHighestFluence/pulsesToSteadyState").asInt());
        assertThat(Integer.parseInt(pulses.group(5))).isEqualTo(json.at("/pulseTrainAtHighestFluence/buildUpPulses").asInt());

        if (json.has("design")) {
            JsonNode design = json.get("design");
            rows = h.table("Optimal design");
            JsonNode expected = design.get("expectedErrors");
            assertThat(rows).hasSize(expected.size());
            for (int i = 0; i < rows.size(); i++) {
                JsonNode e = expected.get(i);
                percent(rows.get(i).get(1), e.get("statisticalRel").asDouble(), "statistical");
                percent(rows.get(i).get(2), e.get("systematicRel").asDouble(), "systematic");
                percent(rows.get(i).get(3), e.get("totalRel").asDouble(), "total");
                percent(rows.get(i).get(4), design.at("/naive/totalRelativeErrors/" + e.get("parameter").asText()).asDouble(),
                        "naive");
                assertThat(rows.get(i).get(5)).isEqualTo(e.get("dominant").asText());
            }
            List<List<String>> sources = h.tableAfter("Optimal design", 1);
            int k = 0;
            for (JsonNode e : expected) {
                for (Iterator<Map.Entry<String, JsonNode>> it = e.get("sources").fields(); it.hasNext(); k++) {
                    Map.Entry<String, JsonNode> s = it.next();
                    assertThat(sources.get(k).get(1)).isEqualTo(s.getKey());
                    percent(sources.get(k).get(2), s.getValue().asDouble(), "source " + s.getKey());
                }
            }
            assertThat(sources).hasSize(k);
            Matcher chosen = find(h.text, "Chosen design: ([0-9]+) fluences from ⟨N⟩ = " + NUM + " to " + NUM
                    + "; delay grid '([^']+)' \\(([0-9]+) points, " + NUM + " ([a-zµ]*s|min|h) per point\\)");
            JsonNode n = design.at("/chosen/nAvgProbeWeighted");
            assertThat(Integer.parseInt(chosen.group(1))).isEqualTo(n.size());
            printed(chosen.group(2), n.get(0).asDouble(), "design lowest");
            printed(chosen.group(3), n.get(n.size() - 1).asDouble(), "design highest");
            printed(chosen.group(3), topN, "design highest is the series' top");
            assertThat(chosen.group(4)).isEqualTo(design.at("/chosen/grid").asText());
            assertThat(Integer.parseInt(chosen.group(5))).isEqualTo(design.at("/chosen/delayPoints").asInt());
            quantity(chosen.group(6) + " " + chosen.group(7), Dimension.TIME, design.at("/chosen/timePerPointS").asDouble(),
                    "design time per point");
        }

        if (json.has("multiplicationForecast")) {
            rows = h.table("Carrier multiplication forecast");
            JsonNode cm = json.get("multiplicationForecast");
            assertThat(rows).hasSize(cm.size());
            String[] keys = {"photonEnergyEv", "energyOverFirstExciton", "eta", "idealRatio", "apparentRatioChosenRate",
                "chargedChosenRate", "apparentRatioFullRate", "chargedFullRate"};
            for (int i = 0; i < rows.size(); i++) {
                for (int c = 0; c < keys.length; c++) {
                    printed(rows.get(i).get(c), cm.get(i).get(keys[c]).asDouble(), "multiplication " + keys[c]);
                }
                assertThat(rows.get(i).get(8)).isEqualTo(cm.get(i).get("offered").asBoolean() ? "yes" : "NO");
            }
        }

        rows = h.table("Pump wavelengths compared");
        JsonNode wl = json.get("wavelengthRanking");
        assertThat(rows).hasSize(wl.size());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode w = wl.get(i);
            quantity(rows.get(i).get(0), Dimension.LENGTH, w.get("wavelengthNm").asDouble() * 1e-9, "wavelength");
            printed(rows.get(i).get(1).replace(" eV", ""), w.get("photonEnergyEv").asDouble(), "photon energy");
            printed(rows.get(i).get(2), w.get("crossSectionCm2").asDouble(), "σ");
            printed(rows.get(i).get(3), w.get("absorbanceOd").asDouble(), "absorbance");
            printed(rows.get(i).get(4), w.get("energyOverFirstExciton").asDouble(), "ħω/E₁S");
            printed(rows.get(i).get(5), w.get("maxNProbeAveraged").asDouble(), "max ⟨N⟩");
            printed(rows.get(i).get(6), w.get("score").asDouble(), "score");
        }

        String rateHeading = h.heading("Repetition rates compared");
        Matcher rh = find(rateHeading, "at " + atTop);
        printed(rh.group(1), topN, "rate table ⟨N⟩");
        quantity(rh.group(2) + " " + rh.group(3), Dimension.ENERGY, topEnergyJ, "rate table energy");
        rows = h.table("Repetition rates compared");
        JsonNode rates = json.get("repetitionRates");
        assertThat(rows).hasSize(rates.size());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode r = rates.get(i);
            assertThat(rows.get(i).get(0)).isEqualTo("÷" + r.get("division").asInt());
            quantity(rows.get(i).get(1), Dimension.FREQUENCY, r.get("repetitionRateHz").asDouble(), "rate");
            printed(rows.get(i).get(2), r.get("excitedOrChargedFractionAtNextPulse").asDouble(), "rate residual");
            printed(rows.get(i).get(3), r.get("chargedFractionAtNextPulse").asDouble(), "rate charged");
            printedOrNull(rows.get(i).get(4), r.get("steadyRiseK"), "rate rise");
            assertThat(rows.get(i).get(5)).isEqualTo(r.get("verdict").asText());
        }
        assertThat(h.text).contains(json.at("/settings/rateChoice").asText());

        String heatHeading = h.heading("Heating at ");
        Matcher hh = find(heatHeading, "at " + atTop + ", " + NUM + " ([kMG]?Hz)");
        printed(hh.group(1), topN, "heating ⟨N⟩");
        quantity(hh.group(2) + " " + hh.group(3), Dimension.ENERGY, topEnergyJ, "heating energy");
        quantity(hh.group(4) + " " + hh.group(5), Dimension.FREQUENCY, json.at("/settings/repetitionRateHz").asDouble(),
                "heating rate");
        rows = h.table("Heating at ");
        JsonNode heat = json.get("heatingAtHighestFluence");
        printed(rows.get(0).get(1), heat.get("heatFraction").asDouble(), "heat share");
        printed(rows.get(1).get(1), heat.get("heatPowerW").asDouble(), "heat power");
        printedOrNull(rows.get(2).get(1), heat.get("steadyRiseK"), "steady rise");
        printedOrNull(rows.get(3).get(1), heat.get("perPulseRiseK"), "per-pulse rise");
        printed(rows.get(4).get(1), heat.get("dotJumpK").asDouble(), "dot jump");
        printed(rows.get(5).get(1), heat.at("/hottest/nAvg").asDouble(), "hottest ⟨N⟩");
        printedOrNull(rows.get(6).get(1), heat.at("/hottest/perPulseRiseK"), "hottest per-pulse rise");
        printed(rows.get(7).get(1), heat.at("/hottest/dotJumpK").asDouble(), "hottest dot jump");
        printedOrNull(rows.get(8).get(1), heat.get("peakRiseK"), "highest rise");
        assertThat(rows.get(9).get(1)).isEqualTo(heat.get("model").asText());

        rows = h.table("Model and assumptions");
        JsonNode model = json.get("model");
        quantity(rows.get(0).get(1), Dimension.TIME, model.get("tauSingleExcitonNs").asDouble() * 1e-9, "τ₁");
        printed(rows.get(1).get(1), model.get("plQuantumYield").asDouble(), "QY");
        quantity(rows.get(2).get(1), Dimension.TIME, model.get("tauBiexcitonPs").asDouble() * 1e-12, "τ₂");
        assertThat(rows.get(3).get(1)).isEqualTo(model.get("augerScaling").asText());
        assertThat(rows.get(4).get(1)).isEqualTo(model.get("radiativeScaling").asText());
        String[] trions = rows.get(5).get(1).split(" / ");
        quantity(trions[0], Dimension.TIME, model.get("tauTrionNegativePs").asDouble() * 1e-12, "negative trion");
        quantity(trions[1], Dimension.TIME, model.get("tauTrionPositivePs").asDouble() * 1e-12, "positive trion");
        printed(rows.get(6).get(1), model.get("ionisationProbability").asDouble(), "ionisation");
        quantity(rows.get(7).get(1), Dimension.TIME, model.get("photochargeLifetimeS").asDouble(), "photocharge lifetime");
        if (!model.get("refreshTimeS").isNull()) {
            quantity(rows.get(8).get(1), Dimension.TIME, model.get("refreshTimeS").asDouble(), "refresh");
        }
        quantity(rows.get(9).get(1), Dimension.TIME, model.get("coolingPs").asDouble() * 1e-12, "cooling");
    }

    // ---- the mode rows (photon counting, multiplication), worded once for the report and the text ----------------

    private static void checkModes(String text, JsonNode json) {
        for (JsonNode dp : json.get("delayPlans")) {
            if (!dp.has("photonCounting")) {
                continue;
            }
            JsonNode c = dp.get("photonCounting");
            Matcher m = find(text, "one decay at ⟨N⟩ = " + NUM + " \\(" + NUM + " ([a-zµ]?J) per pulse\\), " + NUM
                    + " detected photons per pulse[^,]*, " + NUM + " counts/s; " + NUM + " counts for τ₁ to ± " + NUM
                    + " % \\(F = " + NUM + "\\) take " + NUM + " (\\S+) ");
            printed(m.group(1), c.get("nAvgProbeWeighted").asDouble(), "TCSPC ⟨N⟩");
            quantity(m.group(2) + " " + m.group(3), Dimension.ENERGY, c.get("pulseEnergyNj").asDouble() * 1e-9, "TCSPC energy");
            printed(m.group(4), c.get("detectedPerPulse").asDouble(), "TCSPC detected per pulse");
            printed(m.group(5), c.get("countRatePerS").asDouble(), "TCSPC count rate");
            printed(m.group(6), c.get("counts").asDouble(), "TCSPC counts");
            printed(m.group(7), 100 * c.get("targetTau1Rel").asDouble(), "TCSPC target");
            printed(m.group(8), c.get("precisionFactor").asDouble(), "TCSPC F");
            quantity(m.group(9) + " " + m.group(10), Dimension.TIME, c.get("acquisitionS").asDouble(), "TCSPC time");
        }
        if (json.has("multiplicationPlan")) {
            for (JsonNode p : json.at("/multiplicationPlan/pumps")) {
                Matcher m = find(text, "\\(ħω = " + NUM + "·E₁S\\): assumed η = " + NUM + " \\(range " + NUM + "–" + NUM
                        + "\\); A/B at ⟨N⟩ → 0 = " + Pattern.quote(String.format(java.util.Locale.ROOT, "%.4g",
                        p.get("interceptRatio").asDouble())) + ", expected error ± " + NUM + " \\(statistical " + NUM);
                printed(m.group(1), p.get("energyOverFirstExciton").asDouble(), "multiplication ħω/E₁S");
                printed(m.group(2), p.get("etaAssumed").asDouble(), "multiplication η");
                printed(m.group(5), p.get("expectedError").asDouble(), "multiplication A/B error");
                printed(m.group(6), p.get("statisticalError").asDouble(), "multiplication statistical error");
            }
        }
    }

    // ---- the plan command's text --------------------------------------------------------------------------------

    private static void checkText(String text, JsonNode json, double topN, double topEnergyJ, JsonNode rate) {
        Matcher m = find(text, "\n  rate +" + NUM + " ([kMG]?Hz) +\\(picker ÷([0-9]+)\\)");
        quantity(m.group(1) + " " + m.group(2), Dimension.FREQUENCY, json.at("/settings/repetitionRateHz").asDouble(), "text rate");
        assertThat(Integer.parseInt(m.group(3))).isEqualTo(json.at("/settings/pulsePickerDivision").asInt());
        m = find(text, "\n  at the top +⟨N⟩ = " + NUM + " \\(" + NUM + " ([a-zµ]?J)\\): excited or charged " + NUM + ", charged " + NUM
                + ", steady rise " + NUM + " K");
        printed(m.group(1), topN, "text ⟨N⟩");
        quantity(m.group(2) + " " + m.group(3), Dimension.ENERGY, topEnergyJ, "text energy");
        printed(m.group(4), rate.get("excitedOrChargedFractionAtNextPulse").asDouble(), "text residual");
        printed(m.group(5), rate.get("chargedFractionAtNextPulse").asDouble(), "text charged");
        printed(m.group(6), json.at("/heatingAtHighestFluence/steadyRiseK").asDouble(), "text rise");
        assertThat(text).contains(json.at("/settings/rateChoice").asText());

        JsonNode series = json.at("/settings/fluenceSeries");
        Matcher s = Pattern.compile("\n +" + NUM + " ± ([0-9]+) % \\(([^)]*)\\) → " + NUM + " ([a-zµ]?J) +\\(" + NUM
                + " OD\\)").matcher(text);
        int i = 0;
        while (s.find()) {
            JsonNode f = series.get(i++);
            printed(s.group(1), f.get("nAvgProbeWeighted").asDouble(), "text series ⟨N⟩");
            printed(s.group(2), 100 * f.get("nAvgRel").asDouble(), "text series ±");
            assertThat(s.group(3)).isEqualTo(f.get("nAvgDominant").asText());
            quantity(s.group(4) + " " + s.group(5), Dimension.ENERGY, f.get("pulseEnergyNj").asDouble() * 1e-9, "text energy");
            printed(s.group(6), f.get("attenuatorOd").asDouble(), "text attenuation");
        }
        assertThat(i).isEqualTo(series.size());

        if (json.has("design")) {
            JsonNode design = json.get("design");
            for (JsonNode e : design.get("expectedErrors")) {
                Matcher x = find(text, "\n  expected +[^\n]*? ± " + NUM + " % \\(statistical " + NUM + " %, systematic " + NUM
                        + " %; naive series ± " + NUM + " %\\); largest source: " + Pattern.quote(e.get("dominant").asText())
                        + "\n +" + Pattern.quote(e.get("advice").asText()));
                printed(x.group(1), 100 * e.get("totalRel").asDouble(), "text total");
                printed(x.group(2), 100 * e.get("statisticalRel").asDouble(), "text statistical");
                printed(x.group(3), 100 * e.get("systematicRel").asDouble(), "text systematic");
                printed(x.group(4), 100 * design.at("/naive/totalRelativeErrors/" + e.get("parameter").asText()).asDouble(),
                        "text naive");
            }
            Matcher d = find(text, "\n  delays +([0-9]+) points \\(([^)]+)\\), " + NUM + " (\\S+) to " + NUM + " (\\S+), " + NUM
                    + " (\\S+) per point");
            assertThat(Integer.parseInt(d.group(1))).isEqualTo(design.at("/chosen/delayPoints").asInt());
            assertThat(d.group(2)).isEqualTo(design.at("/chosen/grid").asText());
            JsonNode grid = json.at("/delayPlans/0/delaysPs");
            quantity(d.group(3) + " " + d.group(4), Dimension.TIME, grid.get(0).asDouble() * 1e-12, "text first delay");
            quantity(d.group(5) + " " + d.group(6), Dimension.TIME, grid.get(grid.size() - 1).asDouble() * 1e-12, "text last delay");
            quantity(d.group(7) + " " + d.group(8), Dimension.TIME, design.at("/chosen/timePerPointS").asDouble(), "text per point");
        }
        int r = text.indexOf("\nRisks\n");
        assertThat(r).isPositive();
        String[] lines = text.substring(r + 7).split("\n");
        for (int k = 0; k < json.get("risks").size(); k++) {
            JsonNode risk = json.get("risks").get(k);
            assertThat(lines[k]).isEqualTo(String.format("  %-5s %s: %s", risk.get("verdict").asText(),
                    risk.get("name").asText(), risk.get("why").asText()));
        }
    }

    // ---- the window ---------------------------------------------------------------------------------------------

    private static void checkWindow(PlanInputs in, JsonNode json, double topN, JsonNode rate) throws Exception {
        // as the planner window does it: the preview first, then the full plan's prediction from the design search
        List<RecomputeService.Result> shown = new CopyOnWriteArrayList<>();
        List<ErrorBudgetService.Result> budgets = new CopyOnWriteArrayList<>();
        try (RecomputeService recompute = new RecomputeService(new PlannerPrediction(), 0, Runnable::run, shown::add);
             ErrorBudgetService budget = new ErrorBudgetService(0, Runnable::run, budgets::add)) {
            recompute.request(in);
            budget.request(in);
            long deadline = System.nanoTime() + 600_000_000_000L;
            while ((shown.isEmpty() || budgets.isEmpty()) && System.nanoTime() < deadline) {
                Thread.sleep(50);
            }
            assertThat(budgets).hasSize(1);
            assertThat(shown).hasSize(1);
            Prediction preview = shown.get(0).prediction();
            assertThat(preview.designed()).isFalse();
            assertThat(preview.basis()).startsWith("preview: log-spaced ⟨N⟩").contains("the designed series follows");
            assertThat(preview.derived()).filteredOn(d -> d.label().startsWith("steady-state temperature rise"))
                    .singleElement().satisfies(d -> assertThat(d.label()).endsWith("(preview series)"));
            recompute.showDesigned(budgets.get(0).prediction(), budgets.get(0).computeNanos());
        }
        Prediction p = shown.get(shown.size() - 1).prediction();
        assertThat(p.designed()).isTrue();
        assertThat(p.basis()).contains("designed series").doesNotContain("preview");
        Html window = new Html(PredictionReport.html(in, "demo", p));

        List<List<String>> rows = window.table("Risks");
        JsonNode risks = json.get("risks");
        assertThat(rows).hasSize(risks.size());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode r = risks.get(i);
            assertThat(rows.get(i).get(0)).isEqualTo(r.get("name").asText());
            String unit = r.get("unit").asText();
            String value = rows.get(i).get(1);
            if ("fraction".equals(unit)) {
                percent(value, r.get("value").asDouble(), "window " + r.get("name").asText());
            } else if (!r.get("value").isNull()) {
                printed(value.substring(0, value.length() - unit.length()).strip(), r.get("value").asDouble(),
                        "window " + r.get("name").asText());
            }
            assertThat(rows.get(i).get(3)).isEqualTo(r.get("why").asText());
            assertThat(rows.get(i).get(4)).isEqualTo(r.get("verdict").asText());
        }

        rows = window.table("Derived numbers");
        JsonNode series = json.at("/settings/fluenceSeries");
        int seriesRows = 0;
        boolean[] seen = new boolean[8];
        for (List<String> d : rows) {
            String label = d.get(0);
            String value = d.get(1);
            assertThat(label).doesNotContain("preview");
            switch (label.replaceAll(" at ⟨N⟩ = .*", "")) {
                case "diameter" -> {
                    quantity(value, Dimension.LENGTH, json.at("/sample/sizeNm").asDouble() * 1e-9, "window diameter");
                    seen[0] = true;
                }
                case "concentration" -> {
                    printed(value.replace(" µM", ""), json.at("/sample/concentrationUm").asDouble(), "window concentration");
                    seen[1] = true;
                }
                case "cross-section σ at the pump" -> {
                    printed(value.replace(" cm²", ""), json.at("/wavelengthRanking/0/crossSectionCm2").asDouble(), "window σ");
                    seen[2] = true;
                }
                case "τ₁ single exciton" -> {
                    quantity(value, Dimension.TIME, json.at("/model/tauSingleExcitonNs").asDouble() * 1e-9, "window τ₁");
                    seen[3] = true;
                }
                case "τ₂ biexciton Auger" -> {
                    quantity(value, Dimension.TIME, json.at("/model/tauBiexcitonPs").asDouble() * 1e-12, "window τ₂");
                    seen[4] = true;
                }
                case "steady-state temperature rise" -> {
                    topOf(label, topN);
                    printed(value.replace(" K", ""), json.at("/heatingAtHighestFluence/steadyRiseK").asDouble(), "window rise");
                    seen[5] = true;
                }
                case "residual excitation at the next pulse" -> {
                    topOf(label, topN);
                    printed(value, rate.get("excitedOrChargedFractionAtNextPulse").asDouble(), "window residual");
                }
                case "steady-state charged fraction" -> {
                    topOf(label, topN);
                    printed(value, rate.get("chargedFractionAtNextPulse").asDouble(), "window charged");
                    seen[6] = true;
                }
                case "pulses to steady state" -> {
                    topOf(label, topN);
                    assertThat(Integer.parseInt(value)).isEqualTo(json.at("/pulseTrainAtHighestFluence/pulsesToSteadyState").asInt());
                    seen[7] = true;
                }
                case "chosen pump" -> quantity(value, Dimension.LENGTH, json.at("/settings/pumpWavelengthNm").asDouble() * 1e-9,
                        "window pump");
                case "photon energy" -> printed(value.replace(" eV", ""), json.at("/wavelengthRanking/0/photonEnergyEv").asDouble(),
                        "window photon energy");
                case "highest pulse energy" -> quantity(value, Dimension.ENERGY, json.at("/laser/maxPulseEnergyNj").asDouble() * 1e-9,
                        "window highest energy");
                default -> {
                    Matcher m = Pattern.compile("pulse energy for ⟨N⟩ = " + NUM + " ± " + NUM + " %").matcher(label);
                    if (m.matches()) {
                        JsonNode f = series.get(seriesRows++);
                        printed(m.group(1), f.get("nAvgProbeWeighted").asDouble(), "window series ⟨N⟩");
                        printed(m.group(2), 100 * f.get("nAvgRel").asDouble(), "window series ±");
                        quantity(value, Dimension.ENERGY, f.get("pulseEnergyNj").asDouble() * 1e-9, "window series energy");
                    }
                }
            }
        }
        assertThat(seriesRows).isEqualTo(series.size());
        assertThat(seen).as("diameter, concentration, σ, τ₁, τ₂, rise, charged, pulses").containsOnly(true);

        // the charts the window draws hold the same data: the build-up at the series' top, the bleach on the TA grid
        ChartSpec buildUp = p.charts().stream().filter(c -> c.title().toLowerCase(java.util.Locale.ROOT).contains("build-up"))
                .findFirst().orElseThrow();
        ChartSpec.Series charged = buildUp.series().stream().filter(s -> s.name().startsWith("charged")).findFirst().orElseThrow();
        double[] y = charged.y();
        assertThat(y).hasSize(json.at("/pulseTrainAtHighestFluence/buildUpPulses").asInt());
        assertThat(y[y.length - 1]).isCloseTo(json.at("/pulseTrainAtHighestFluence/chargedBeforeLastPulse").asDouble(),
                org.assertj.core.data.Offset.offset(1e-15));
        ChartSpec bleach = p.charts().get(0);
        double firstPositivePs = java.util.stream.StreamSupport.stream(json.at("/delayPlans/0/delaysPs").spliterator(), false)
                .mapToDouble(JsonNode::asDouble).filter(t -> t > 0).findFirst().orElseThrow();
        for (ChartSpec.Series s : bleach.series()) {
            assertThat(s.x()[0]).isCloseTo(firstPositivePs, org.assertj.core.data.Percentage.withPercentage(1e-9));
        }
        assertThat(bleach.series()).hasSize(series.size());
    }

    // ---- helpers ------------------------------------------------------------------------------------------------

    private static void topOf(String label, double topN) {
        Matcher m = Pattern.compile(".* at ⟨N⟩ = " + NUM).matcher(label);
        assertThat(m.matches()).as(label).isTrue();
        printed(m.group(1), topN, label);
    }

    private static JsonNode chosenRate(JsonNode json) {
        for (JsonNode r : json.get("repetitionRates")) {
            if (r.get("division").asInt() == json.at("/settings/pulsePickerDivision").asInt()) {
                return r;
            }
        }
        throw new AssertionError("no rate row for the chosen division");
    }

    private static JsonNode risk(JsonNode json, String name) {
        for (JsonNode r : json.get("risks")) {
            if (r.get("name").asText().equals(name)) {
                return r;
            }
        }
        throw new AssertionError("no risk '" + name + "'");
    }

    private static Matcher find(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertThat(m.find()).as("/%s/ in the printed text", regex).isTrue();
        return m;
    }

    /** A printed plain number agrees with {@code expected} within the rounding of its last printed digit. */
    static void printed(String printed, double expected, String what) {
        String t = printed.strip().replace('−', '-');
        double value = Double.parseDouble(t);
        assertThat(Math.abs(value - expected)).as("%s: printed %s, resolved JSON %s", what, printed, expected)
                .isLessThanOrEqualTo(halfLastDigit(t) * (1 + 1e-9) + 1e-12 * Math.abs(expected));
    }

    private static void printedOrNull(String printed, JsonNode expected, String what) {
        if (expected.isNull()) {
            assertThat(printed).as(what).isIn("—", "∞", "−∞");
        } else {
            printed(printed, expected.asDouble(), what);
        }
    }

    /** "12.3 %" against a relative value. */
    private static void percent(String printed, double expectedRel, String what) {
        if (!Double.isFinite(expectedRel)) {
            assertThat(printed).as(what).isEqualTo("not determined");
            return;
        }
        assertThat(printed).as(what).endsWith(" %");
        printed(printed.substring(0, printed.length() - 2), 100 * expectedRel, what);
    }

    /** A printed quantity with its unit ("879.9 nJ") against an SI value, within the rounding of the printed digits. */
    private static void quantity(String printed, Dimension d, double expectedSi, String what) {
        String number = printed.strip().split(" ")[0].replace('−', '-');
        double si = Quantity.parseSi(printed.strip().replace('−', '-'), d);
        double perUnit = si / Double.parseDouble(number);
        assertThat(Math.abs(si - expectedSi)).as("%s: printed %s, resolved JSON %s (SI)", what, printed, expectedSi)
                .isLessThanOrEqualTo(halfLastDigit(number) * Math.abs(perUnit) * (1 + 1e-9) + 1e-12 * Math.abs(expectedSi));
    }

    /** Half a unit of the last printed digit of a decimal or e-notation number. */
    private static double halfLastDigit(String t) {
        String mantissa = t;
        int exponent = 0;
        int e = t.toLowerCase(java.util.Locale.ROOT).indexOf('e');
        if (e >= 0) {
            mantissa = t.substring(0, e);
            exponent = Integer.parseInt(t.substring(e + 1).replace("+", ""));
        }
        int dot = mantissa.indexOf('.');
        int decimals = dot < 0 ? 0 : mantissa.length() - dot - 1;
        return 0.5 * Math.pow(10, exponent - decimals);
    }

    /** The text of an HTML page and its tables, read as a user sees them. */
    private static final class Html {
        final String source;
        final String text;

        Html(String source) {
            this.source = source.replaceAll("(?s)<svg.*?</svg>", "");
            this.text = unescape(this.source.replaceAll("<[^>]+>", " ").replaceAll("[ \t]+", " "));
        }

        String heading(String start) {
            Matcher m = Pattern.compile("<h[23]>(" + Pattern.quote(escape(start)) + ".*?)</h[23]>").matcher(source);
            assertThat(m.find()).as("heading '%s'", start).isTrue();
            return unescape(m.group(1));
        }

        List<List<String>> table(String headingStart) {
            return tableAfter(headingStart, 0);
        }

        /** The rows (without the header) of the {@code skip}+1-th table after the heading that starts so. */
        List<List<String>> tableAfter(String headingStart, int skip) {
            Matcher m = Pattern.compile("<h[23]>" + Pattern.quote(escape(headingStart))).matcher(source);
            assertThat(m.find()).as("heading '%s'", headingStart).isTrue();
            int at = m.end();
            for (int i = 0; i <= skip; i++) {
                at = source.indexOf("<table>", at) + 1;
            }
            String table = source.substring(at, source.indexOf("</table>", at));
            List<List<String>> rows = new ArrayList<>();
            Matcher row = Pattern.compile("(?s)<tr[^>]*>(.*?)</tr>").matcher(table);
            while (row.find()) {
                if (row.group(1).contains("<th>")) {
                    continue;
                }
                List<String> cells = new ArrayList<>();
                Matcher cell = Pattern.compile("(?s)<td[^>]*>(.*?)</td>").matcher(row.group(1));
                while (cell.find()) {
                    cells.add(unescape(cell.group(1)));
                }
                rows.add(cells);
            }
            return rows;
        }

        private static String escape(String s) {
            return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("'", "&#39;");
        }

        private static String unescape(String s) {
            return s.replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&#39;", "'").replace("&amp;", "&");
        }
    }
}
