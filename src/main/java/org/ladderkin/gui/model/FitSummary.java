package org.ladderkin.gui.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitProgress;
import org.ladderkin.fit.FitQuality;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.report.FitReport;
import org.ladderkin.units.Rounded;

/**
 * The fit tab's words: the parameter table (labels with trade units from {@link ParameterNaming}, as in the report)
 * and the diagnostics, with the reduced χ² measured against the data's own noise ({@link FitQuality}) rather than the
 * unweighted mean square, whose size is the signal unit squared and says nothing about the fit.
 */
final class FitSummary {

    private FitSummary() {
    }

    /** Rows for the shared parameters (amplitudes and baselines are per trace and left out). */
    static List<FitCharts.ParameterRow> rows(LadderFit.Outcome outcome) {
        FitResult r = outcome.result();
        List<FitCharts.ParameterRow> rows = new ArrayList<>();
        for (ParameterEstimate e : r.estimates()) {
            if (!e.shared() || e.key().equals("amplitude") || e.key().equals("baseline")) {
                continue;
            }
            double f = ParameterNaming.trade(e.key()).factor();
            String error = e.fixed() ? "" : !r.converged() ? "not converged"
                    : Double.isFinite(e.stdError()) ? "± " + Rounded.error(e.stdError() * f) : "± unavailable";
            String value = e.fixed() || !r.converged() ? num(e.value() * f) : Rounded.value(e.value() * f, e.stdError() * f);
            rows.add(new FitCharts.ParameterRow(ParameterNaming.label(e.key()).withUnit(), value, error, !e.fixed()));
        }
        return List.copyOf(rows);
    }

    /** Status, the reduced χ² against the data's noise, diagnostics and warnings, one line each. */
    static List<String> diagnostics(Dataset data, LadderFit.Outcome outcome, boolean fitted) {
        FitResult r = outcome.result();
        List<String> lines = new ArrayList<>();
        if (!fitted) {
            lines.add("Before a fit: the plan's model at each trace's excitation; only amplitude and baseline per trace are solved.");
        }
        if (r.status() == FitResult.Status.NOT_CONVERGED) {
            lines.add("Not converged — the values are the best point met so far: " + r.message());
        } else if (!r.message().isEmpty()) {
            lines.add(r.message());
        }
        FitQuality q = FitReport.quality(data, outcome);
        lines.add(String.format(Locale.ROOT, "reduced χ² = %.3g, against the noise from %s; %d points, %d free parameters "
                + "(amplitudes and baselines included)", q.reducedChiSquare(), q.noiseBasis(), r.points(), r.freeParameters()));
        lines.addAll(outcome.diagnostics());
        for (String w : r.warnings()) {
            lines.add("warning: " + w);
        }
        return List.copyOf(lines);
    }

    /**
     * "best point so far (not converged): χ²/ν 3.21 with τ₂ = 41.3 ps, σ = 2.1e-15 cm²" — the values that moved away
     * from the start (the freed ones), in trade units.
     */
    static String bestSoFar(FitProgress.Best first, FitProgress.Best best) {
        List<String> moved = new ArrayList<>();
        for (Map.Entry<String, Double> e : best.values().entrySet()) {
            Double start = first == null ? null : first.values().get(e.getKey());
            if (start == null || !start.equals(e.getValue())) {
                moved.add(ParameterNaming.shown(e.getKey(), e.getValue()));
            }
        }
        return String.format(Locale.ROOT, "best point so far (not converged): χ²/ν %.3g", best.reducedChiSquare())
                + (moved.isEmpty() ? "" : " with " + String.join(", ", moved));
    }

    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "unavailable";
    }
}
