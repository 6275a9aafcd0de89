package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.observe.EarlyLate;
import org.ladderkin.observe.Risk;
import org.ladderkin.observe.Verdict;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.DelayPlan;
import org.ladderkin.plan.DesignSearch;
import org.ladderkin.plan.ExpectedError;
import org.ladderkin.plan.FluencePoint;
import org.ladderkin.plan.Instrument;
import org.ladderkin.plan.Predictions;
import org.ladderkin.plan.RateOption;
import org.ladderkin.plan.WavelengthOption;
import org.ladderkin.plan.WhatIf;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;

/**
 * The campaign report: a summary a lab member can act on (the settings to dial in), then the evidence (risks,
 * predicted signals, the design search, the alternatives), then the model and its assumptions, then the safety
 * cautions. One self-contained HTML page.
 */
public final class PlanReport {

    private PlanReport() {
    }

    /**
     * The charts of a plan, shared by the report, CSV export and the desktop planner. Fluence series are coloured on
     * the sequential palette in order of ⟨N⟩ and named by it; ΔA is shown as {@link ChartSpec#BLEACH_AXIS}.
     */
    public static List<ChartSpec> charts(CampaignPlan plan) {
        Predictions p = plan.predictions();
        List<ChartSpec> charts = new ArrayList<>();
        double[] ps = scale(p.delaysS(), 1e12);
        double[] plNs = scale(p.plDelaysS(), 1e9);
        double[] meanN = plan.fluences().stream().mapToDouble(FluencePoint::nProbeAveraged).toArray();
        int[] rank = ChartSpec.ranks(meanN);
        List<ChartSpec.Series> ta = new ArrayList<>();
        List<ChartSpec.Series> pl = new ArrayList<>();
        for (int i = 0; i < meanN.length; i++) {
            String name = ChartSpec.meanN(meanN[i]);
            ta.add(ChartSpec.Series.line(name, ps, scale(p.deltaAOd().get(i), ChartSpec.BLEACH_AXIS_PER_OD)).colour(rank[i]));
            pl.add(ChartSpec.Series.line(name, plNs, p.plPerDot().get(i)).colour(rank[i]));
        }
        charts.add(new ChartSpec("Band-edge bleach (steady state)", "delay (ps)", ChartSpec.BLEACH_AXIS, true, false, ta,
                ChartSpec.Palette.SEQUENTIAL));
        charts.add(new ChartSpec("Photoluminescence per dot", "delay (ns)", "PL rate (photons/s per dot)", true, true, pl,
                ChartSpec.Palette.SEQUENTIAL));
        double[] n = p.earlyLate().stream().mapToDouble(EarlyLate.Point::meanExcitons).toArray();
        double[] early = p.earlyLate().stream().mapToDouble(EarlyLate.Point::early).toArray();
        double[] late = p.earlyLate().stream().mapToDouble(EarlyLate.Point::late).toArray();
        double[] ratio = p.earlyLate().stream().mapToDouble(EarlyLate.Point::ratio).toArray();
        // A and B share a unit and belong on one axis; their ratio is a pure number of another size and gets its own
        charts.add(new ChartSpec("Early and late bleach", "⟨N⟩ (probe-averaged)", "bleach (filled band-edge levels)", true, false,
                List.of(ChartSpec.Series.line("early A", n, early), ChartSpec.Series.line("late B", n, late))));
        charts.add(new ChartSpec("Early/late ratio", "⟨N⟩ (probe-averaged)", "A/B", true, false,
                List.of(ChartSpec.Series.line("A/B", n, ratio))));
        List<ChartSpec.Series> occ = new ArrayList<>();
        int[] picks = java.util.stream.IntStream.of(0, meanN.length / 2, meanN.length - 1).filter(i -> i >= 0).distinct().toArray();
        int[] pickRank = ChartSpec.ranks(java.util.Arrays.stream(picks).mapToDouble(i -> meanN[i]).toArray());
        // the Poisson tail beyond 0.1 % in every shown series is a row of invisible bars
        int shownN = 3;
        for (int i : picks) {
            double[] d = p.occupancy().get(i);
            for (int j = 0; j < d.length; j++) {
                if (d[j] >= 1e-3) {
                    shownN = Math.max(shownN, j);
                }
            }
        }
        for (int k = 0; k < picks.length; k++) {
            double[] all = p.occupancy().get(picks[k]);
            double[] d = java.util.Arrays.copyOf(all, Math.min(all.length, shownN + 1));
            double[] x = new double[d.length];
            for (int j = 0; j < d.length; j++) {
                x[j] = j;
            }
            occ.add(ChartSpec.Series.bars(ChartSpec.meanN(meanN[picks[k]]), x, d).colour(pickRank[k]));
        }
        charts.add(new ChartSpec("Excitons per dot after a pulse", "N (excitons in a dot)", "probability P(N)", false, false, occ,
                ChartSpec.Palette.SEQUENTIAL));
        double[] pulse = new double[p.buildUpResidual().length];
        for (int k = 0; k < pulse.length; k++) {
            pulse[k] = k + 1;
        }
        charts.add(new ChartSpec("Pulse-train build-up (highest fluence)", "pulse number", "fraction of dots", false, false,
                List.of(ChartSpec.Series.line("excited or charged before the pulse", pulse, p.buildUpResidual()),
                        ChartSpec.Series.line("charged before the pulse", pulse, p.buildUpCharged()))));
        return List.copyOf(charts);
    }

    /** The complete HTML page. */
    public static String html(CampaignPlan plan) {
        return html(plan, List.of());
    }

    /** The complete HTML page with what-if variants side by side. */
    public static String html(CampaignPlan plan, List<WhatIf> whatIfs) {
        HtmlPage page = new HtmlPage("Campaign plan — " + plan.inputs().title());
        if (!plan.inputs().lab().isEmpty()) {
            page.block("note", plan.inputs().lab());
        }
        org.ladderkin.sample.Sample sample = plan.inputs().sample();
        // the report must say which sample it plans for: a folder of reports is read long after the plan file is gone
        page.paragraph(String.format(Locale.ROOT, "Sample %s: %s, diameter %s, first exciton %.3f eV.", sample.spec().name(),
                sample.spec().material().name(), q(sample.sizeM(), Dimension.LENGTH),
                sample.firstExcitonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J));
        summary(page, plan);
        String top = highest(plan);
        page.heading(2, "Risks");
        page.paragraph("Heating, photocharging and residual excitation at " + top + " and the chosen rate ("
                + q(plan.chosenRate().repetitionRateHz(), Dimension.FREQUENCY) + ").");
        page.table(List.of("risk", "value", "limit", "unit", "what it means", "verdict"),
                plan.risks().stream().map(r -> List.of(r.name(), num(r.value()), num(r.limit()), r.unit(), r.why(),
                        r.verdict().name())).toList());
        if (!plan.advisories().isEmpty()) {
            page.heading(3, "Advisories on the inputs");
            page.bullets(plan.advisories());
        }
        page.heading(2, "Predicted signals");
        page.paragraph(String.format(Locale.ROOT, "Periodic steady state of the pulse train at the chosen repetition rate, "
                + "for every fluence of the series; residual excitation from earlier pulses included. The pulse-train "
                + "build-up is at %s: it takes %d pulses to come within 1 %% of the steady state; %d pulses are drawn.", top,
                plan.predictions().pulsesToSteadyState(), plan.predictions().buildUpCharged().length));
        page.paragraph(String.format(Locale.ROOT, "Averaged over a size dispersion of %.3g %% (%d quadrature nodes; ⟨N⟩ is "
                + "the mean size's). Pump: %s.", 100 * plan.predictions().sizeDispersion(), plan.predictions().sizeNodes(),
                plan.predictions().pulseTreatment()));
        page.charts(charts(plan), 520, 340);
        designSection(page, plan);
        multiplicationSection(page, plan);
        gainSection(page, plan);
        multiplicationPlanSection(page, plan);
        whatIfSection(page, plan, whatIfs);
        page.heading(2, "Pump wavelengths compared");
        page.table(List.of("wavelength", "photon energy", "σ (cm²)", "absorbance (OD)", "ħω/E₁S", "max ⟨N⟩", "score", "reasons"),
                plan.wavelengths().stream().map(w -> List.of(q(w.wavelengthM(), Dimension.LENGTH),
                        String.format(Locale.ROOT, "%.3f eV", w.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J),
                        num(w.crossSectionM2() * 1e4), num(w.absorbanceOd()), num(w.energyOverGap()),
                        num(w.maxProbeAveragedN()), String.format(Locale.ROOT, "%.2f", w.score()),
                        String.join("; ", w.reasons()))).toList());
        page.heading(2, "Repetition rates compared (at " + top + ")");
        page.paragraph(plan.rateChoice() + " The rule: every rate is judged at the series' highest ⟨N⟩. With a design "
                + "search the rates are first judged at the highest ⟨N⟩ the design can reach, which sets the period the "
                + "design is scored at, then again at the designed series' top; the rate used is the fastest that passes "
                + "there, never faster than the rate the design was scored at, and only if that is slower is the design "
                + "searched once more at it.");
        page.table(List.of("division", "rate", "excited or charged at next pulse", "charged at next pulse", "steady rise (K)", "verdict"),
                plan.rates().stream().map(r -> List.of("÷" + r.division(), q(r.repetitionRateHz(), Dimension.FREQUENCY),
                        num(r.residual()), num(r.charged()), num(r.steadyRiseK()), r.verdict().name())).toList());
        page.heading(2, "Heating at " + top + ", " + q(plan.chosenRate().repetitionRateHz(), Dimension.FREQUENCY));
        var h = plan.heat();
        page.table(List.of("quantity", "value"), List.of(
                List.of("share of absorbed energy left as heat", num(h.heatFraction())),
                List.of("heating power in the excited volume (W)", num(h.heatPowerW())),
                List.of("steady-state rise on the beam axis (K)", num(h.steadyRiseK())),
                List.of("rise of the excited volume per pulse, probe- and depth-averaged (K)", num(h.perPulseRiseK())),
                List.of("lattice temperature jump of one dot, probe- and depth-averaged (K)", num(h.dotJumpK())),
                List.of("⟨N⟩ of the hottest dots (pump axis, front face)", num(h.hottest().nAvg())),
                List.of("rise per pulse at the hottest dots (K)", num(h.hottest().perPulseRiseK())),
                List.of("lattice temperature jump of a hottest dot (K)", num(h.hottest().dotJumpK())),
                List.of("highest rise: steady + hottest pulse (K), judged in the risks", num(h.peakRiseK())),
                List.of("conduction model", h.model())));
        page.heading(2, "Model and assumptions");
        var m = plan.model();
        page.table(List.of("parameter", "value"), List.of(
                List.of("single-exciton lifetime τ₁", q(m.tauSingleExcitonS(), Dimension.TIME)),
                List.of("PL quantum yield", num(m.plQuantumYield())),
                List.of("biexciton Auger lifetime τ₂", q(m.tauBiexcitonS(), Dimension.TIME)),
                List.of("Auger scaling", m.augerScaling().key()),
                List.of("radiative scaling", m.radiativeScaling().key()),
                List.of("negative / positive trion lifetime", q(m.tauTrionNegativeS(), Dimension.TIME) + " / "
                        + q(m.tauTrionPositiveS(), Dimension.TIME)),
                List.of("Auger ionisation probability", num(m.ionisationProbability())),
                List.of("photocharge lifetime", q(m.neutralisationS(), Dimension.TIME)),
                List.of("excited-volume refresh time", Double.isFinite(m.refreshS()) ? q(m.refreshS(), Dimension.TIME) : "none (static)"),
                List.of("cooling time", q(m.coolingS(), Dimension.TIME))));
        page.bullets(m.bases());
        page.paragraph("Each dot is independent; between pulses its state (charge, exciton number) follows a linear master "
                + "equation solved exactly; pulses add Poisson-distributed excitons (instantaneous, no saturation); the "
                + "steady state of the pulse train is the fixed point of the one-period map. Cooling is treated as "
                + "instantaneous here. Beyond ⟨N⟩ ≈ 10, for band-edge pumping and for dense films these assumptions weaken: "
                + "see docs/physics.md.");
        page.heading(2, "Safety");
        page.cautions(Cautions.texts(plan.cautions()));
        page.block("note", "ladderkin plan report. Numbers are planning estimates from the model above; they do not "
                + "replace measurements, the institution's laser safety officer or local rules.");
        return page.render();
    }

    private static void summary(HtmlPage page, CampaignPlan plan) {
        WavelengthOption w = plan.chosenWavelength();
        RateOption r = plan.chosenRate();
        Verdict worst = plan.risks().stream().map(Risk::verdict).reduce(Verdict.PASS, Verdict::worst);
        page.heading(2, "Settings to dial in");
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "Pump at %s (%.3f eV): %s.", q(w.wavelengthM(), Dimension.LENGTH),
                w.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J, String.join("; ", w.reasons())));
        lines.add(String.format(Locale.ROOT, "Repetition rate %s (pulse picker ÷%d): the fastest offered that keeps the dots "
                        + "excited or charged at the next pulse (%.3g), charging (%.3g) and heating (%.3g K) within the limits at %s%s.",
                q(r.repetitionRateHz(), Dimension.FREQUENCY), r.division(), r.residual(), r.charged(), r.steadyRiseK(),
                highest(plan), r.verdict() == Verdict.FAIL ? " — NONE does; this is the slowest available" : ""));
        for (DelayPlan d : plan.delayPlans()) {
            if (d.instrument().kind() == Instrument.Kind.TRANSIENT_ABSORPTION) {
                lines.add(String.format(Locale.ROOT, "TA delays: %d points from %s to %s (a baseline before the pulse, the rise, "
                                + "then log); stage travel %s; average %s per point, %s per fluence.", d.delaysS().length,
                        q(d.delaysS()[0], Dimension.TIME), q(d.delaysS()[d.delaysS().length - 1], Dimension.TIME),
                        q(d.stageTravelM(), Dimension.LENGTH), q(d.timePerPointS(), Dimension.TIME),
                        q(d.timePerFluenceS(), Dimension.TIME)));
                lines.add(String.format(Locale.ROOT, "Early/late windows: early %s, late %s%s.", q(d.windows().earlyS(), Dimension.TIME),
                        q(d.windows().lateS(), Dimension.TIME), d.windows().separated() ? "" : " (time scales overlap)"));
                lines.add(ModeSections.defaultsLine(plan, ModeSections.Mode.TRANSIENT_ABSORPTION));
            } else {
                lines.add(ModeSections.countingLine(d));
                d.counting().notPlanned().forEach(n -> lines.add("Not planned by photon counting: " + n + "."));
                lines.add(ModeSections.defaultsLine(plan, ModeSections.Mode.COUNTING));
            }
        }
        lines.add("Overall risk verdict: " + worst.name() + " (see the risk table).");
        page.bullets(lines);
        page.heading(3, "Fluence series");
        page.table(List.of("#", "⟨N⟩ probe-averaged", "± (largest source)", "⟨N⟩ on axis", "pulse energy", "attenuation (OD)",
                        "peak fluence (µJ/cm²)", "peak photons/cm²", "in range"),
                indexed(plan.fluences(), plan.chosenWavelength().photonEnergyJ()));
    }

    private static List<List<String>> indexed(List<FluencePoint> fluences, double photonEnergyJ) {
        List<List<String>> rows = new ArrayList<>();
        int i = 1;
        for (FluencePoint f : fluences) {
            rows.add(List.of(String.valueOf(i++), num(f.nProbeAveraged()),
                    f.nAvgBudget().items().isEmpty() ? "—" : pct(f.nAvgRel()) + " (" + f.nAvgDominant() + ")",
                    num(f.nPeak()), q(f.pulseEnergyJ(), Dimension.ENERGY),
                    String.format(Locale.ROOT, "%.2f", f.attenuatorOd()),
                    // J/m² → µJ/cm²: × 1e6 / 1e4
                    num(f.photonFluencePeakPerM2() * photonEnergyJ * 100), num(f.photonFluencePeakPerM2() * 1e-4),
                    f.reachable() ? "yes" : "NO"));
        }
        return rows;
    }

    private static void designSection(HtmlPage page, CampaignPlan plan) {
        DesignSearch.Result d = plan.design();
        page.heading(2, "Optimal design");
        if (d == null) {
            page.paragraph("No design search: it needs a transient-absorption instrument and a goal among the Auger "
                    + "lifetime, the cross-section and the single-exciton lifetime.");
            return;
        }
        page.paragraph(String.format(Locale.ROOT, "Expected errors of the goal parameters from the Fisher information of "
                + "the traces a fit will model (per-trace amplitude and baseline, time zero, the instrument's IRF) on the "
                + "delays listed above, with the beam time shared evenly among all points. Statistical: white noise and "
                + "pump fluctuation per point; systematic: the fluence-scale calibration (pulse energy, pump and probe "
                + "radius), drift between traces, time zero and the IRF width, each a nuisance parameter with a Gaussian "
                + "prior. σ and the fluence scale enter only as a product, so σ is never known better than the "
                + "calibration. %d candidate designs scored; the naive design is 8 log-spaced fluences from ⟨N⟩ = 0.05 "
                + "to 3.", d.evaluated()));
        List<List<String>> rows = new ArrayList<>();
        for (ExpectedError e : d.best().expected()) {
            rows.add(List.of(e.parameter().label(), pct(e.statisticalRel()), pct(e.systematicRel()), pct(e.totalRel()),
                    pct(d.naive().error(e.parameter())), e.dominant()));
        }
        page.table(List.of("goal parameter", "statistical", "systematic", "total", "naive design (total)", "dominant source"), rows);
        page.bullets(d.best().expected().stream().map(e -> e.advice() + ".").toList());
        List<List<String>> sources = new ArrayList<>();
        for (ExpectedError e : d.best().expected()) {
            for (var i : e.sources().items()) {
                sources.add(List.of(e.parameter().label(), i.source(), pct(i.rel())));
            }
        }
        page.table(List.of("goal parameter", "source", "contribution"), sources);
        page.paragraph(String.format(Locale.ROOT, "Chosen design: %d fluences from ⟨N⟩ = %.3g to %.3g; delay grid '%s' "
                        + "(%d points, %s per point).", d.best().nValues().length, d.best().nValues()[0],
                d.best().nValues()[d.best().nValues().length - 1], d.best().grid(), d.best().delaysS().length,
                q(d.best().timePerPointS(), Dimension.TIME)));
    }

    private static void multiplicationSection(HtmlPage page, CampaignPlan plan) {
        if (plan.multiplication().isEmpty()) {
            return;
        }
        page.heading(2, "Carrier multiplication forecast");
        page.paragraph("Low-fluence (⟨N_abs⟩ = 0.05) early/late ratio A/B at each requested photon energy, with an assumed "
                + "threshold-linear quantum yield (E_th = 2.5·E₁S, ε_eh = 1.5·E₁S; replace with your expectation). "
                + "'Apparent' ratios subtract the signal just before the pulse, as negative delays show it.");
        page.table(List.of("photon energy (eV)", "ħω/E₁S", "assumed η", "ideal A/B", "A/B at chosen rate", "charged at chosen rate",
                        "A/B at full rate", "charged at full rate", "pump available"),
                plan.multiplication().stream().map(m -> List.of(
                        String.format(Locale.ROOT, "%.3f", m.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J),
                        num(m.energyOverGap()), num(m.eta()), num(m.idealRatio()), num(m.apparentRatioChosen()),
                        num(m.chargedChosen()), num(m.apparentRatioFullRate()), num(m.chargedFullRate()),
                        m.offered() ? "yes" : "NO")).toList());
    }

    private static void multiplicationPlanSection(HtmlPage page, CampaignPlan plan) {
        if (plan.multiplicationPlan() == null) {
            return;
        }
        page.heading(2, "Carrier multiplication plan");
        page.bullets(ModeSections.multiplicationLines(plan));
    }

    private static void gainSection(HtmlPage page, CampaignPlan plan) {
        if (plan.gain() == null) {
            return;
        }
        page.heading(2, "Optical gain");
        page.bullets(ModeSections.gainLines(plan));
    }

    private static void whatIfSection(HtmlPage page, CampaignPlan plan, List<WhatIf> whatIfs) {
        if (whatIfs.isEmpty()) {
            return;
        }
        page.heading(2, "What if");
        List<List<String>> rows = new ArrayList<>();
        rows.add(whatIfRow("as planned", plan));
        for (var w : whatIfs) {
            rows.add(whatIfRow(w.label(), w.plan()));
        }
        page.paragraph("Each variant's residual, charging and heating are at its own series' highest ⟨N⟩.");
        page.table(List.of("variant", "rate", "at ⟨N⟩", "excited or charged at next pulse", "charged", "steady rise (K)", "τ₂ rel. error", "worst risk"),
                rows);
    }

    private static List<String> whatIfRow(String label, CampaignPlan p) {
        Verdict worst = p.risks().stream().map(Risk::verdict).reduce(Verdict.PASS, Verdict::worst);
        String tau2 = p.design() == null ? "—" : pct(p.design().best().error(DesignSearch.Parameter.TAU_BIEXCITON));
        return List.of(label, q(p.chosenRate().repetitionRateHz(), Dimension.FREQUENCY),
                num(p.chosenRate().nAvgProbeWeighted()), num(p.chosenRate().residual()),
                num(p.chosenRate().charged()), num(p.chosenRate().steadyRiseK()), tau2, worst.name());
    }

    /** "the series' highest ⟨N⟩ = 7.499 (879.9 nJ)": where every "at the highest fluence" number is evaluated. */
    static String highest(CampaignPlan plan) {
        var f = plan.highestFluence();
        return "the series' highest ⟨N⟩ = " + num(f.nProbeAveraged()) + " (" + q(f.pulseEnergyJ(), Dimension.ENERGY) + ")";
    }

    private static String pct(double relative) {
        return Double.isFinite(relative) ? String.format(Locale.ROOT, "%.3g %%", 100 * relative) : "not determined";
    }

    private static String q(double si, Dimension d) {
        return Double.isFinite(si) ? Quantity.formatBest(si, d, 4) : "—";
    }

    static String num(double v) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }

    private static double[] scale(double[] v, double f) {
        double[] o = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            o[i] = v[i] * f;
        }
        return o;
    }
}
