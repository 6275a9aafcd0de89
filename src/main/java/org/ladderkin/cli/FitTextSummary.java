package org.ladderkin.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.report.FitReport;
import org.ladderkin.units.Rounded;

/** The terminal summary of a least-squares fit: parameters with their errors, quality, diagnostics and warnings. */
final class FitTextSummary {

    private FitTextSummary() {
    }

    /** Prints the summary; a free parameter the data do not constrain is said to be not determined, never ± NaN. */
    static void print(PrintWriter out, LadderFit.Outcome outcome) {
        FitResult r = outcome.result();
        out.println("Fit: " + r.statusText() + (r.message().isEmpty() ? "" : " — " + r.message()));
        if (!r.ok()) {
            return;
        }
        List<String> undetermined = new ArrayList<>();
        for (ParameterEstimate e : r.estimates()) {
            if (!e.shared() || e.key().equals("amplitude") || e.key().equals("baseline")) {
                continue;
            }
            ParameterNaming.TradeKey t = ParameterNaming.trade(e.key());
            String total = outcome.totalStdError(e.key()).stream()
                    .mapToObj(v -> " (stat), ± " + Rounded.error(v * t.factor()) + " total").findFirst().orElse("");
            boolean determined = e.fixed() || Double.isFinite(e.stdError());
            if (!determined) {
                undetermined.add(t.key());
            }
            String value = e.fixed() || !determined ? String.format(Locale.ROOT, "%.5g", e.value() * t.factor())
                    : Rounded.value(e.value() * t.factor(), e.stdError() * t.factor());
            out.println(String.format(Locale.ROOT, "  %-16s %-12s %s", t.key(), value,
                    e.fixed() ? "(fixed)" : !determined ? "not determined (the data do not constrain it)"
                            : "± " + Rounded.error(e.stdError() * t.factor()) + total));
        }
        if (!undetermined.isEmpty()) {
            out.println("! " + String.join(", ", undetermined) + (undetermined.size() == 1 ? " is" : " are")
                    + " not determined: the data do not constrain " + (undetermined.size() == 1 ? "it" : "them")
                    + "; fix " + (undetermined.size() == 1 ? "it" : "them") + " or add data that depend on " + (undetermined.size() == 1 ? "it" : "them"));
        }
        if (outcome.fluenceScaleUncertainty() > 0) {
            out.println(String.format(Locale.ROOT, "  total errors include a %s%% fluence calibration uncertainty",
                    new java.math.BigDecimal(100 * outcome.fluenceScaleUncertainty()).round(new java.math.MathContext(3))
                            .stripTrailingZeros().toPlainString()));
        }
        if (outcome.measuredIrf() != null) {
            out.println("  " + FitReport.measuredIrfNote(outcome.measuredIrf()));
        }
        if (outcome.quality() != null) {
            out.println(String.format(Locale.ROOT, "  %s, over %d points (statistical errors scaled by the residuals' own "
                    + "mean square)", outcome.quality().describe(), r.points()));
        }
        for (String d : outcome.diagnostics()) {
            out.println("! " + d);
        }
        for (String c : outcome.checks()) {
            out.println("  " + c);
        }
        for (String w : r.warnings()) {
            out.println("warning: " + w);
        }
    }
}
