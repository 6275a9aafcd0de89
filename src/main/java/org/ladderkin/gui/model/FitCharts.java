package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.FitReport;
import org.ladderkin.units.Rounded;

/**
 * What the fit view draws, as plain data: the traces as points over model curves and the residuals on a log delay
 * axis (delays after time zero only, as in the fit report), the parameter table in trade units and the diagnostics.
 */
public final class FitCharts {

    private FitCharts() {
    }

    /**
     * One row of the parameter table.
     *
     * @param name   what the parameter is, e.g. "τ₂ (biexciton Auger)"
     * @param value  value with its unit, e.g. "41.3 ps"
     * @param error  "± 1.2 ps", "" when held, "± unavailable" when the fit could not give one
     * @param free   whether the fit varied it
     */
    public record ParameterRow(String name, String value, String error, boolean free) {
    }

    /** A trade unit: how a key is named and shown. */
    private record Trade(String name, String unit, double factor) {
    }

    private static Trade trade(String key) {
        return switch (key) {
            case "crossSectionM2" -> new Trade("σ at the pump (scale)", "cm²", 1e4);
            case "occupancyPerJ" -> new Trade("⟨N⟩ per pulse energy (scale)", "per nJ", 1e-9);
            case "occupancyScale" -> new Trade("factor on the given ⟨N⟩ (scale)", "", 1);
            case "tauAuger2S" -> new Trade("τ₂ (biexciton Auger)", "ps", 1e12);
            case "tauRadS" -> new Trade("τ_rad (radiative)", "ns", 1e9);
            case "tauTrapS" -> new Trade("τ_trap (trapping)", "ns", 1e9);
            case "timeZeroS" -> new Trade("time zero", "ps", 1e12);
            case "irfFwhmS" -> new Trade("IRF FWHM", "ps", 1e12);
            default -> new Trade(key, "", 1);
        };
    }

    /** Traces as points; with an outcome, its curves as lines in each trace's colour. */
    static ChartSpec overlay(Dataset data, LadderFit.Outcome outcome, boolean fitted) {
        String title = outcome == null ? "Measured traces" : fitted ? "Measured traces and the fit" : "Measured traces over the plan's model";
        return FitReport.overlay(title, data, outcome, fitted ? "fit" : "plan's model");
    }

    /** Data minus curve per trace, in the overlay's colours; empty without an outcome. */
    static ChartSpec residuals(Dataset data, LadderFit.Outcome outcome, boolean fitted) {
        return FitReport.residuals(fitted ? "Residuals (data − fit)" : "Residuals (data − plan's model)", data, outcome);
    }

    /** Rows for the shared parameters (amplitudes and baselines are per trace and left out). */
    static List<ParameterRow> rows(LadderFit.Outcome outcome) {
        List<ParameterRow> rows = new ArrayList<>();
        for (ParameterEstimate e : outcome.result().estimates()) {
            if (!e.shared() || e.key().equals("amplitude") || e.key().equals("baseline")) {
                continue;
            }
            Trade t = trade(e.key());
            String unit = t.unit().isEmpty() ? "" : " " + t.unit();
            String error = e.fixed() ? "" : Double.isFinite(e.stdError()) ? "± " + Rounded.error(e.stdError() * t.factor()) + unit : "± unavailable";
            String value = e.fixed() ? num(e.value() * t.factor()) : Rounded.value(e.value() * t.factor(), e.stdError() * t.factor());
            rows.add(new ParameterRow(t.name(), value + unit, error, !e.fixed()));
        }
        return List.copyOf(rows);
    }

    /** Status, fit quality, diagnostics and warnings, one line each. */
    static List<String> diagnostics(LadderFit.Outcome outcome, boolean fitted) {
        FitResult r = outcome.result();
        List<String> lines = new ArrayList<>();
        if (!fitted) {
            lines.add("Before a fit: the plan's model at each trace's excitation; only amplitude and baseline per trace are solved.");
        }
        if (!r.message().isEmpty()) {
            lines.add(r.message());
        }
        lines.add(String.format(Locale.ROOT, "χ²/dof = %.4g over %d points, %d free parameters (amplitudes and baselines included)",
                r.reducedChiSquare(), r.points(), r.freeParameters()));
        lines.addAll(outcome.diagnostics());
        for (String w : r.warnings()) {
            lines.add("warning: " + w);
        }
        return List.copyOf(lines);
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "unavailable";
    }
}
