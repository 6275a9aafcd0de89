package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.FitQuality;
import org.ladderkin.fit.FitResult;
import org.ladderkin.fit.LadderFit;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.fit.Trace;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;
import org.ladderkin.units.Rounded;

/**
 * The HTML report of a ladder fit: data with the fitted curves on a log delay axis, residuals, the parameter table
 * with standard errors (and profile intervals when asked), per-trace values, diagnostics, warnings, and the
 * comparison with the plan when one was given.
 */
public final class FitReport {

    private FitReport() {
    }

    /**
     * @param planRows rows (quantity, plan, fit, note) comparing with the plan, or empty
     */
    public static String html(Dataset data, LadderFit.Outcome outcome, List<List<String>> planRows) {
        return html(data, outcome, planRows, null);
    }

    /**
     * @param planRows rows (quantity, plan, fit, note) comparing with the plan, or empty
     * @param yields   what comes with a freed multiplication yield, or null
     */
    public static String html(Dataset data, LadderFit.Outcome outcome, List<List<String>> planRows,
                              org.ladderkin.fit.YieldSummary yields) {
        FitResult r = outcome.result();
        HtmlPage page = new HtmlPage("Global fit of a fluence series");
        page.paragraph("Data: " + String.join(", ", data.sourceFiles()) + " — " + data.size() + " traces, fitted with the "
                + "exciton ladder (shared parameters across the series).");
        if (outcome.measuredIrf() != null) {
            page.paragraph("Instrument response: " + measuredIrfNote(outcome.measuredIrf()) + ".");
        }
        page.paragraph("Status: " + r.statusText() + (r.message().isEmpty() ? "" : " — " + r.message()));
        if (!r.ok()) {
            return page.render();
        }
        page.heading(2, "Diagnostics");
        // a check that could not run is said to be not tested; nothing here claims an all-clear no test could give
        List<String> findings = new ArrayList<>(outcome.diagnostics());
        findings.addAll(outcome.checks());
        page.bullets(findings.isEmpty() ? List.of("no finding from the checks that ran (saturation curve, excitation scale)")
                : findings);
        page.heading(2, "Shared parameters");
        List<List<String>> rows = new ArrayList<>();
        for (ParameterEstimate e : r.estimates()) {
            if (!e.shared() || e.key().equals("amplitude") || e.key().equals("baseline")) {
                continue;
            }
            ParameterNaming.TradeKey t = ParameterNaming.trade(e.key());
            String profile = r.profile(e.key()).map(p -> num(p.lower() * t.factor()) + (p.lowerOpen() ? " (open)" : "") + " … "
                    + num(p.upper() * t.factor()) + (p.upperOpen() ? " (open)" : "")).orElse("");
            String total = e.fixed() ? "" : outcome.totalStdError(e.key()).stream().mapToObj(v -> Rounded.error(v * t.factor()))
                    .findFirst().orElse("—");
            // the value stops at the statistical error's last digit: more digits claim a precision the fit lacks
            rows.add(List.of(ParameterNaming.label(e.key()).withUnit(),
                    e.fixed() ? num(e.value() * t.factor()) : Rounded.value(e.value() * t.factor(), e.stdError() * t.factor()),
                    e.fixed() ? "fixed" : Double.isFinite(e.stdError()) ? Rounded.error(e.stdError() * t.factor())
                            : "not determined (the data do not constrain it)", total, profile));
        }
        page.table(List.of("parameter", "value", "statistical error", "total error (with calibration)", "68% profile interval"), rows);
        if (yields != null) {
            page.heading(2, "Multiplication yield");
            // the terminal's lines, without their margin: one wording for both
            page.bullets(yields.lines().stream().filter(l -> !l.startsWith("! ")).map(String::strip).toList());
            if (yields.upperBound()) {
                page.block("caution", yields.reason());
            }
        }
        if (outcome.fluenceScaleUncertainty() > 0) {
            page.paragraph(String.format(Locale.ROOT, "Total errors add a %s%% fluence calibration uncertainty (a common "
                    + "factor on every trace's excitation, treated as a nuisance parameter with a Gaussian prior).",
                    new java.math.BigDecimal(100 * outcome.fluenceScaleUncertainty()).round(new java.math.MathContext(3))
                            .stripTrailingZeros().toPlainString()));
        }
        page.paragraph(String.format(Locale.ROOT, "%s; %d points, %d free parameters; AIC %.6g, BIC %.6g. "
                + "Statistical errors are scaled by the residuals' own mean square (as if the reduced χ² were 1).",
                quality(data, outcome).describe(), r.points(), r.freeParameters(), r.aic(), r.bic()));
        page.heading(2, "Traces");
        List<List<String>> traceRows = new ArrayList<>();
        for (int i = 0; i < data.size(); i++) {
            int trace = i;
            double[] acf = r.autocorrelation().get(i);
            traceRows.add(List.of(data.traces().get(i).label(), num(outcome.meanN()[i]),
                    r.find("amplitude", i).map(e -> Rounded.pm(e.value(), e.stdError())).orElse("shared"),
                    r.find("baseline", i).map(e -> Rounded.pm(e.value(), e.stdError())).orElse("—"),
                    acf.length == 0 ? "—" : String.format(Locale.ROOT, "%.2f", acf[0]), String.valueOf(trace + 1)));
        }
        page.table(List.of("trace", "⟨N⟩ (fit)", "amplitude", "baseline", "residual autocorrelation, lag 1", "#"), traceRows);
        page.charts(charts(data, outcome), 760, 420);
        if (!r.warnings().isEmpty()) {
            page.heading(2, "Warnings");
            page.bullets(r.warnings());
        }
        if (!planRows.isEmpty()) {
            page.heading(2, "Compared with the plan");
            page.table(List.of("quantity", "plan", "fit", "note"), planRows);
        }
        return page.render();
    }

    /**
     * How well the fit matches the data against the data's own noise (given uncertainties, else the residuals'
     * point-to-point scatter): the outcome's, or measured here for an outcome built without one. Never the unweighted
     * mean square, whose size is that of the signal's units squared and says nothing about the fit.
     */
    public static FitQuality quality(Dataset data, LadderFit.Outcome outcome) {
        return outcome.quality() != null ? outcome.quality() : FitQuality.of(data, outcome.result());
    }

    /** One line saying which measured IRF the fit used, e.g. "measured IRF from irf.csv, FWHM 104 fs". */
    public static String measuredIrfNote(MeasuredIrf irf) {
        return "measured IRF from " + irf.origin() + ", FWHM " + Quantity.formatBest(irf.fwhmS(), Dimension.TIME, 3)
                + " (centroid at time zero)";
    }

    /** Data with fitted curves, and residuals, on a log delay axis (delays after time zero only). */
    public static List<ChartSpec> charts(Dataset data, LadderFit.Outcome outcome) {
        return List.of(overlay("Data and fit", data, outcome, "fit"), residuals("Residuals (data − fit)", data, outcome));
    }

    /**
     * Each trace as points and, with an outcome, its curve as a line in the same colour (one legend entry shows both),
     * as {@link ChartSpec#BLEACH_AXIS}. Traces are coloured on the sequential palette in order of ⟨N⟩ once the
     * outcome gives it, in file order before; {@link #residuals} colours them alike.
     *
     * @param curve what the line is ("fit", "plan's model"), for its name in CSV exports
     */
    public static ChartSpec overlay(String title, Dataset data, LadderFit.Outcome outcome, String curve) {
        List<ChartSpec.Series> series = new ArrayList<>();
        if (data != null) {
            int[] colour = traceColours(data, outcome);
            for (int i = 0; i < data.size(); i++) {
                List<double[]> kept = plotted(data.traces().get(i), outcome, i);
                double[] x = column(kept, 0);
                String name = traceName(data, outcome, i);
                series.add(ChartSpec.Series.points(name, x, bleachAxis(column(kept, 1))).colour(colour[i]));
                if (outcome != null) {
                    series.add(ChartSpec.Series.line(name + " (" + curve + ")", x, bleachAxis(column(kept, 2)))
                            .colour(colour[i]).unlisted());
                }
            }
        }
        return new ChartSpec(title, "delay after time zero (ps)", ChartSpec.BLEACH_AXIS, true, false, series,
                ChartSpec.Palette.SEQUENTIAL);
    }

    /** Data minus curve per trace, in the overlay's sign, unit and colours; no series without an outcome. */
    public static ChartSpec residuals(String title, Dataset data, LadderFit.Outcome outcome) {
        List<ChartSpec.Series> series = new ArrayList<>();
        if (data != null && outcome != null) {
            int[] colour = traceColours(data, outcome);
            for (int i = 0; i < data.size(); i++) {
                List<double[]> kept = plotted(data.traces().get(i), outcome, i);
                series.add(ChartSpec.Series.line(traceName(data, outcome, i), column(kept, 0), bleachAxis(column(kept, 3)))
                        .colour(colour[i]));
            }
        }
        return new ChartSpec(title, "delay after time zero (ps)", "residual of −ΔA (mOD)", true, false, series,
                ChartSpec.Palette.SEQUENTIAL);
    }

    private static boolean knowsMeanN(Dataset data, LadderFit.Outcome outcome) {
        return outcome != null && outcome.meanN().length == data.size();
    }

    private static int[] traceColours(Dataset data, LadderFit.Outcome outcome) {
        return knowsMeanN(data, outcome) ? ChartSpec.ranks(outcome.meanN()) : java.util.stream.IntStream.range(0, data.size()).toArray();
    }

    /** "F1, ⟨N⟩ = 0.13", or the label alone before ⟨N⟩ is known. */
    private static String traceName(Dataset data, LadderFit.Outcome outcome, int i) {
        String label = data.traces().get(i).label();
        return knowsMeanN(data, outcome) ? label + ", " + ChartSpec.meanN(outcome.meanN()[i]) : label;
    }

    /** ΔA as read (OD; the trace reader converts mOD and µOD columns) to the charts' bleach axis. */
    private static double[] bleachAxis(double[] deltaAOd) {
        double[] out = new double[deltaAOd.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = deltaAOd[i] * ChartSpec.BLEACH_AXIS_PER_OD;
        }
        return out;
    }

    /**
     * What a fit chart draws for trace {@code i}: rows {delay after time zero (ps), data, curve, residual} for the
     * present points after time zero (a log axis shows no others). Without an outcome, curve and residual are NaN.
     */
    public static List<double[]> plotted(Trace t, LadderFit.Outcome outcome, int i) {
        double t0 = outcome == null ? 0 : outcome.result().find("timeZeroS", -1).map(ParameterEstimate::value).orElse(0.0);
        double[] d = t.delaysS();
        double[] y = t.signal();
        double[] c = outcome == null ? null : outcome.curves().get(i);
        double[] rr = outcome == null ? null : outcome.result().residuals().get(i);
        List<double[]> kept = new ArrayList<>();
        int used = 0; // residuals are listed for the points used, missing ones skipped
        for (int m = 0; m < d.length; m++) {
            if (Double.isNaN(y[m])) {
                continue;
            }
            if (d[m] - t0 > 0) {
                kept.add(new double[] {(d[m] - t0) * 1e12, y[m], c == null ? Double.NaN : c[m], rr == null ? Double.NaN : rr[used]});
            }
            used++;
        }
        return kept;
    }

    /** Column {@code c} of {@link #plotted} rows. */
    public static double[] column(List<double[]> rows, int c) {
        return rows.stream().mapToDouble(v -> v[c]).toArray();
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "unavailable";
    }
}
