package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.FluencePoint;
import org.ladderkin.plan.ModelAssumptions;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.plan.Planner;
import org.ladderkin.plan.WavelengthOption;
import org.ladderkin.report.Cautions;
import org.ladderkin.sample.Sample;
import org.ladderkin.sample.SampleSpec;
import org.ladderkin.report.PlanReport;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;

/**
 * The live prediction of the desktop planner: the campaign planner's charts (steady-state bleach and PL per fluence,
 * early/late curve, ⟨N⟩ distribution, pulse-train build-up), its risk table and cautions, and the derived numbers
 * with the formula behind each. The live prediction skips the optimal-design search so an edit updates quickly: it is
 * a preview on a log-spaced series and says so in its basis and labels; {@link #designed(CampaignPlan)} turns the full
 * plan (the report's, computed by {@link ErrorBudgetService}) into the prediction that replaces it.
 */
public final class PlannerPrediction implements PredictionSource {

    /**
     * Ends a prediction between the planner's steps once a newer edit has interrupted its thread, so an outdated
     * computation does not hold up the one the user is waiting for.
     */
    static final Planner.Progress STOP_WHEN_INTERRUPTED = (done, total, what) -> {
        if (Thread.currentThread().isInterrupted()) {
            throw new java.util.concurrent.CancellationException("a newer edit replaced this prediction (at: " + what + ")");
        }
    };

    /** Label of the derived number that echoes the highest pulse energy the prediction was computed for. */
    public static final String HIGHEST_ENERGY = "highest pulse energy";

    /** Marks the numbers of the quick preview, which is evaluated on the preview series, not the designed one. */
    public static final String PREVIEW = "preview";

    @Override
    public Prediction predict(PlanInputs plan) {
        CampaignPlan p = Planner.plan(plan, STOP_WHEN_INTERRUPTED, false);
        double top = p.highestFluence().nProbeAveraged();
        return new Prediction(PlanReport.charts(p), p.risks(), derived(p, true), Cautions.texts(p.cautions()),
                String.format(Locale.ROOT, "%s: log-spaced ⟨N⟩ %s–%s (%d values), the designed series follows; "
                        + "multiexciton ladder, periodic steady state at %s", PREVIEW,
                        short3(p.fluences().get(0).nProbeAveraged()), short3(top), p.fluences().size(),
                        Quantity.formatBest(p.chosenRate().repetitionRateHz(), Dimension.FREQUENCY, 3)), false);
    }

    /** Three significant digits without trailing zeros: "0.05", "3". */
    private static String short3(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }

    /** The prediction of a full plan (with its design search): the report's numbers, charts and risks. */
    public static Prediction designed(CampaignPlan p) {
        return new Prediction(PlanReport.charts(p), p.risks(), derived(p, false), Cautions.texts(p.cautions()),
                String.format(Locale.ROOT, "designed series of %d fluences, ⟨N⟩ %.3g–%.3g, as in the report; "
                        + "multiexciton ladder, periodic steady state at %s", p.fluences().size(),
                        p.fluences().get(0).nProbeAveraged(), p.highestFluence().nProbeAveraged(),
                        Quantity.formatBest(p.chosenRate().repetitionRateHz(), Dimension.FREQUENCY, 3)), true);
    }

    static List<Prediction.DerivedNumber> derived(CampaignPlan p, boolean preview) {
        List<Prediction.DerivedNumber> out = new ArrayList<>();
        WavelengthOption w = p.chosenWavelength();
        // numbers at the series' top name it; the preview's top is the preview series', not the design's
        String atTop = String.format(Locale.ROOT, " at ⟨N⟩ = %.4g%s", p.highestFluence().nProbeAveraged(),
                preview ? " (" + PREVIEW + " series)" : "");
        out.addAll(usedValues(p, w));
        out.add(new Prediction.DerivedNumber(HIGHEST_ENERGY, Quantity.formatBest(p.inputs().laser().maxPulseEnergyJ(),
                Dimension.ENERGY, 6), String.format(Locale.ROOT, "reaches ⟨N⟩ = %.3g probe-averaged at %s",
                w.maxProbeAveragedN(), Quantity.formatBest(w.wavelengthM(), Dimension.LENGTH, 4))));
        out.add(new Prediction.DerivedNumber("chosen pump", Quantity.formatBest(w.wavelengthM(), Dimension.LENGTH, 4),
                "best score among the laser's wavelengths: " + String.join("; ", w.reasons())));
        out.add(new Prediction.DerivedNumber("cross-section σ at the pump", String.format(Locale.ROOT, "%.3g cm²",
                w.crossSectionM2() * 1e4), w.crossSectionBasis()));
        out.add(new Prediction.DerivedNumber("photon energy", String.format(Locale.ROOT, "%.3f eV",
                w.photonEnergyJ() / PhysicalConstants.ELECTRONVOLT_J), "E = hc/λ, hc = 1239.841984 eV·nm"));
        for (FluencePoint f : p.fluences()) {
            double rel = f.nAvgBudget().totalRel();
            String dominant = f.nAvgBudget().dominant().map(d -> String.format(Locale.ROOT, "; largest: %s (± %.2g %%)",
                    d.source(), 100 * d.rel())).orElse("");
            out.add(new Prediction.DerivedNumber(String.format(Locale.ROOT, "pulse energy for ⟨N⟩ = %.3g ± %.2g %%",
                    f.nProbeAveraged(), 100 * rel), Quantity.formatBest(f.pulseEnergyJ(), Dimension.ENERGY, 4),
                    String.format(Locale.ROOT, "⟨N⟩ = σ·j averaged over probe and depth; on axis ⟨N⟩ = σ·2E/(πw²)/(hc/λ) = %.3g;"
                            + " j_peak = %.3g photons/cm²; ⟨N⟩ uncertainty from the pulse energy, both radii and σ%s",
                    f.nPeak(), f.photonFluencePeakPerM2() * 1e-4, dominant)));
        }
        out.add(new Prediction.DerivedNumber("steady-state temperature rise" + atTop, String.format(Locale.ROOT, "%.3g K",
                p.heat().steadyRiseK()), "ΔT = P_heat/(4πκL)·Ein(2R²/w²), P_heat = absorbed power × heat share (" + p.heat().model() + ")"));
        out.add(new Prediction.DerivedNumber("residual excitation at the next pulse" + atTop, String.format(Locale.ROOT, "%.3g",
                p.chosenRate().residual()), "fixed point of the one-period map M = exp(QT)·E, fraction excited or charged"));
        out.add(new Prediction.DerivedNumber("steady-state charged fraction" + atTop, String.format(Locale.ROOT, "%.3g",
                p.chosenRate().charged()), String.format(Locale.ROOT, "charged states' weight in the fixed point of the "
                + "one-period map before a pulse, at the highest fluence and %s (limit %.3g)",
                Quantity.formatBest(p.chosenRate().repetitionRateHz(), Dimension.FREQUENCY, 3),
                p.inputs().limits().maxChargedFraction())));
        out.add(new Prediction.DerivedNumber("pulses to steady state" + atTop, String.valueOf(p.predictions().pulsesToSteadyState()),
                "⌈ln 0.01 / ln|λ₂|⌉ with λ₂ the second eigenvalue of the one-period map"));
        out.add(new Prediction.DerivedNumber("size dispersion averaged over", String.format(Locale.ROOT, "%.3g %% (%d nodes)",
                100 * p.predictions().sizeDispersion(), p.predictions().sizeNodes()), "σ and ⟨N⟩ ∝ V, Auger rates ∝ 1/V; "
                + "quadrature nodes raised until the traces change by less than 1e-6"));
        out.add(new Prediction.DerivedNumber("pump pulse", p.predictions().pulseTreatment(), "finite width when FWHM × "
                + "fastest populated rate > 0.01 or the pump is within a line width of E₁S"));
        return List.copyOf(out);
    }

    /** The values the prediction rests on (size, concentration, σ, τ₁, τ₂), each with where it comes from. */
    private static List<Prediction.DerivedNumber> usedValues(CampaignPlan p, WavelengthOption w) {
        List<Prediction.DerivedNumber> out = new ArrayList<>();
        Sample s = p.inputs().sample();
        String sizeBasis = s.spec().size() instanceof SampleSpec.ByFirstPeak peak
                ? s.material().sizing().map(c -> String.format(Locale.ROOT, "from the first-exciton peak at %s through the "
                        + "sizing curve %s (%s)", Quantity.formatBest(peak.wavelengthM(), Dimension.LENGTH, 4), c.formula(),
                        c.source())).orElse("from the first-exciton peak")
                : "diameter given in the plan";
        out.add(new Prediction.DerivedNumber("diameter", String.format(Locale.ROOT, "%.3g nm", s.sizeM() * 1e9), sizeBasis));
        out.add(new Prediction.DerivedNumber("concentration", String.format(Locale.ROOT, "%.3g µM",
                s.concentrationMolPerM3() * 1e3), s.concentrationBasis()));
        ModelAssumptions m = p.model();
        out.add(new Prediction.DerivedNumber("τ₁ single exciton", Quantity.formatBest(m.tauSingleExcitonS(), Dimension.TIME, 4),
                basis(m, "τ₁") + String.format(Locale.ROOT, "; radiative lifetime τ_rad = τ₁/QY = %s with QY = %.3g",
                        Quantity.formatBest(m.tauSingleExcitonS() / m.plQuantumYield(), Dimension.TIME, 4), m.plQuantumYield())));
        out.add(new Prediction.DerivedNumber("τ₂ biexciton Auger", Quantity.formatBest(m.tauBiexcitonS(), Dimension.TIME, 4),
                basis(m, "τ₂") + String.format(Locale.ROOT, "; dot volume V = %.3g nm³", s.dotVolumeM3() * 1e27)));
        return out;
    }

    private static String basis(ModelAssumptions m, String symbol) {
        return m.bases().stream().filter(b -> b.startsWith(symbol + ":")).findFirst().orElse(symbol + ": model");
    }
}
