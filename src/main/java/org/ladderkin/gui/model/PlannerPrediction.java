package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.plan.CampaignPlan;
import org.ladderkin.plan.FluencePoint;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.plan.Planner;
import org.ladderkin.plan.WavelengthOption;
import org.ladderkin.report.Cautions;
import org.ladderkin.report.PlanReport;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.PhysicalConstants;
import org.ladderkin.units.Quantity;

/**
 * The live prediction of the desktop planner: the campaign planner's charts (steady-state bleach and PL per fluence,
 * early/late curve, ⟨N⟩ distribution, pulse-train build-up), its risk table and cautions, and the derived numbers
 * with the formula behind each. The optimal-design search is left to the report so an edit updates quickly.
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

    @Override
    public Prediction predict(PlanInputs plan) {
        CampaignPlan p = Planner.plan(plan, STOP_WHEN_INTERRUPTED, false);
        return new Prediction(PlanReport.charts(p), p.risks(), derived(p), Cautions.texts(p.cautions()),
                "multiexciton ladder, periodic steady state at " + Quantity.formatBest(p.chosenRate().repetitionRateHz(),
                        Dimension.FREQUENCY, 3) + "; log-spaced series (the report adds the optimal design)");
    }

    static List<Prediction.DerivedNumber> derived(CampaignPlan p) {
        List<Prediction.DerivedNumber> out = new ArrayList<>();
        WavelengthOption w = p.chosenWavelength();
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
        out.add(new Prediction.DerivedNumber("steady-state temperature rise", String.format(Locale.ROOT, "%.3g K",
                p.heat().steadyRiseK()), "ΔT = P_heat/(4πκL)·Ein(2R²/w²), P_heat = absorbed power × heat share (" + p.heat().model() + ")"));
        out.add(new Prediction.DerivedNumber("residual excitation at the next pulse", String.format(Locale.ROOT, "%.3g",
                p.chosenRate().residual()), "fixed point of the one-period map M = exp(QT)·E, fraction excited or charged"));
        out.add(new Prediction.DerivedNumber("steady-state charged fraction", String.format(Locale.ROOT, "%.3g",
                p.chosenRate().charged()), String.format(Locale.ROOT, "charged states' weight in the fixed point of the "
                + "one-period map before a pulse, at the highest fluence and %s (limit %.3g)",
                Quantity.formatBest(p.chosenRate().repetitionRateHz(), Dimension.FREQUENCY, 3),
                p.inputs().limits().maxChargedFraction())));
        out.add(new Prediction.DerivedNumber("pulses to steady state", String.valueOf(p.predictions().pulsesToSteadyState()),
                "⌈ln 0.01 / ln|λ₂|⌉ with λ₂ the second eigenvalue of the one-period map"));
        return List.copyOf(out);
    }
}
