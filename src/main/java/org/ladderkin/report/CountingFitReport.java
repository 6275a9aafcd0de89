package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.ParameterEstimate;
import org.ladderkin.fit.ParameterNaming;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.counting.CountHistogram;
import org.ladderkin.fit.counting.CountModel;
import org.ladderkin.fit.counting.CountingFit;
import org.ladderkin.fit.counting.InstrumentResponse;
import org.ladderkin.fit.counting.LikelihoodResult;
import org.ladderkin.fit.counting.PoissonDeviance;
import org.ladderkin.units.Rounded;

/**
 * The HTML report of a photon-counting fit ({@code fit --counts}): the histograms with the model on a log-count axis,
 * their deviance residuals, the parameter table with observed-information errors (and profile intervals when asked),
 * the Poisson deviance with its degrees of freedom and goodness of fit; for a joint fit also the TA traces with their
 * fit, and which parameters the two data sets share.
 */
public final class CountingFitReport {

    /** Keys only the histograms use: the response's width and shift have no meaning for a TA trace. */
    private static final List<String> HISTOGRAM_ONLY = List.of(InstrumentResponse.FWHM, CountModel.SHIFT);

    private CountingFitReport() {
    }

    /**
     * What the report shows.
     *
     * @param sourceFiles the files read, as the user named them
     * @param histograms  the fitted histograms, in the result's part order
     * @param ta          the TA traces fitted with them, or null; their parts follow the histograms'
     * @param result      the fit
     * @param notes       one line each on the response, the pile-up correction and the like
     */
    public record Input(List<String> sourceFiles, List<CountHistogram> histograms, Dataset ta, LikelihoodResult result,
                        List<String> notes) {
        public Input {
            sourceFiles = List.copyOf(sourceFiles);
            histograms = List.copyOf(histograms);
            Objects.requireNonNull(result, "result");
            notes = List.copyOf(notes);
            if (histograms.isEmpty()) {
                throw new IllegalArgumentException("a counting report needs at least one histogram");
            }
        }

        boolean joint() {
            return ta != null && ta.size() > 0;
        }
    }

    public static String html(Input in) {
        LikelihoodResult r = in.result();
        HtmlPage page = new HtmlPage(in.joint() ? "Joint fit of TA traces and photon-counting histograms"
                : "Photon-counting fit (Poisson likelihood)");
        page.paragraph("Data: " + String.join(", ", in.sourceFiles()) + " — " + in.histograms().size() + " histograms"
                + (in.joint() ? " and " + in.ta().size() + " TA traces" : "") + ", fitted with the exciton ladder's emission "
                + "convolved with the instrument response.");
        for (String note : in.notes()) {
            page.paragraph(note);
        }
        page.paragraph("Status: " + r.status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                + (r.message().isEmpty() ? "" : " — " + r.message()));
        if (!r.ok()) {
            return page.render();
        }
        page.heading(2, "Shared parameters");
        List<String> header = new ArrayList<>(List.of("parameter", "value", "standard error", "68% profile interval"));
        if (in.joint()) {
            header.add("used by");
        }
        List<List<String>> rows = new ArrayList<>();
        List<String> both = new ArrayList<>();
        for (ParameterEstimate e : r.estimates()) {
            if (!e.shared()) {
                continue;
            }
            Shown s = shown(e.key());
            String profile = r.profile(e.key()).map(p -> num(p.lower() * s.factor()) + (p.lowerOpen() ? " (open)" : "")
                    + " … " + num(p.upper() * s.factor()) + (p.upperOpen() ? " (open)" : "")).orElse("");
            List<String> row = new ArrayList<>(List.of(s.label(),
                    e.fixed() ? num(e.value() * s.factor()) : Rounded.value(e.value() * s.factor(), e.stdError() * s.factor()),
                    e.fixed() ? "fixed" : Rounded.error(e.stdError() * s.factor()), profile));
            if (in.joint()) {
                boolean shared = !HISTOGRAM_ONLY.contains(e.key());
                row.add(shared ? "TA and histograms" : "histograms only");
                if (shared && !e.fixed()) {
                    both.add(s.label());
                }
            }
            rows.add(row);
        }
        page.table(header, rows);
        page.paragraph("Standard errors from the observed information (the curvature of −2 ln L at the optimum)"
                + (r.profiles().isEmpty() ? "." : "; profile intervals where −2 ln L rises by one."));
        if (in.joint()) {
            page.paragraph("Shared by both data sets: " + (both.isEmpty() ? "none freed" : String.join(", ", both))
                    + ". Each histogram has its own amplitude and background, each TA trace its own amplitude and baseline "
                    + "(solved at each step).");
        }
        page.heading(2, "Goodness of fit");
        page.paragraph(String.format(Locale.ROOT, "Poisson deviance %s over %d bins; %d degrees of freedom (%d points, %d free "
                + "parameters); goodness of fit P = %s (the chance of a deviance at least this large if the model were right).",
                num(r.poissonDeviance()), r.countBins(), r.degreesOfFreedom(), r.points(), r.freeParameters(),
                num(r.goodnessOfFit())));
        if (in.joint()) {
            page.paragraph(String.format(Locale.ROOT, "TA traces: χ² %s over %d points (weighted by their uncertainties, or "
                    + "by their point-to-point scatter where none were given).", num(r.chiSquare()), r.points() - r.countBins()));
        }
        page.heading(2, "Histograms");
        List<List<String>> hRows = new ArrayList<>();
        double scale = r.find(CountingFit.SCALE, -1).map(ParameterEstimate::value).orElse(Double.NaN);
        for (int i = 0; i < in.histograms().size(); i++) {
            CountHistogram h = in.histograms().get(i);
            int part = i;
            hRows.add(List.of(h.label(), num(h.excitation() * 1e-4), num(scale * h.excitation()),
                    r.find("amplitude", part).map(e -> withError(e)).orElse("—"),
                    r.find("background", part).map(e -> withError(e)).orElse("—"),
                    num(PoissonDeviance.of(h.counts(), r.fitted().get(i))), String.valueOf(h.bins())));
        }
        page.table(List.of("histogram", "photon fluence (photons/cm²)", "⟨N⟩ (fit)", "amplitude", "background (counts/bin)",
                "deviance", "bins"), hRows);
        page.charts(List.of(histogramChart(in), devianceResiduals(in)), 760, 420);
        if (in.joint()) {
            page.heading(2, "TA traces");
            page.charts(List.of(taChart(in, false), taChart(in, true)), 760, 420);
        }
        return page.render();
    }

    /** Counts and model per histogram on a log-count axis against the bin centre. */
    static ChartSpec histogramChart(Input in) {
        List<ChartSpec.Series> series = new ArrayList<>();
        int[] colour = histogramColours(in);
        for (int i = 0; i < in.histograms().size(); i++) {
            CountHistogram h = in.histograms().get(i);
            double[] x = centresNs(h);
            series.add(ChartSpec.Series.points(h.label(), x, h.counts()).colour(colour[i]));
            series.add(ChartSpec.Series.line(h.label() + " (fit)", x, in.result().fitted().get(i)).colour(colour[i]).unlisted());
        }
        return new ChartSpec("Histograms and fit", "time (ns)", "counts per bin", false, true, series, ChartSpec.Palette.SEQUENTIAL);
    }

    /** sign(n − μ)·√(deviance term) per bin: their squares sum to the deviance, and low counts are not overweighted. */
    static ChartSpec devianceResiduals(Input in) {
        List<ChartSpec.Series> series = new ArrayList<>();
        int[] colour = histogramColours(in);
        for (int i = 0; i < in.histograms().size(); i++) {
            CountHistogram h = in.histograms().get(i);
            double[] n = h.counts();
            double[] mu = in.result().fitted().get(i);
            double[] d = new double[n.length];
            for (int b = 0; b < d.length; b++) {
                d[b] = PoissonDeviance.residual(n[b], mu[b]);
            }
            series.add(ChartSpec.Series.line(h.label(), centresNs(h), d).colour(colour[i]));
        }
        return new ChartSpec("Deviance residuals", "time (ns)", "deviance residual", false, false, series,
                ChartSpec.Palette.SEQUENTIAL);
    }

    /** The TA traces with their fit (or data − fit) on a log delay axis, delays after zero only. */
    static ChartSpec taChart(Input in, boolean residual) {
        List<ChartSpec.Series> series = new ArrayList<>();
        int first = in.histograms().size();
        for (int i = 0; i < in.ta().size(); i++) {
            Trace t = in.ta().traces().get(i);
            double[] f = in.result().fitted().get(first + i);
            List<double[]> kept = new ArrayList<>();
            double[] d = t.delaysS();
            double[] y = t.signal();
            int used = 0; // fitted values are listed for the points present
            for (int m = 0; m < d.length; m++) {
                if (Double.isNaN(y[m])) {
                    continue;
                }
                if (d[m] > 0) {
                    kept.add(new double[] {d[m] * 1e12, y[m] * ChartSpec.BLEACH_AXIS_PER_OD,
                        f[used] * ChartSpec.BLEACH_AXIS_PER_OD});
                }
                used++;
            }
            double[] x = FitReport.column(kept, 0);
            double[] data = FitReport.column(kept, 1);
            double[] fit = FitReport.column(kept, 2);
            if (residual) {
                double[] res = new double[x.length];
                for (int k = 0; k < res.length; k++) {
                    res[k] = data[k] - fit[k];
                }
                series.add(ChartSpec.Series.line(t.label(), x, res).colour(i));
            } else {
                series.add(ChartSpec.Series.points(t.label(), x, data).colour(i));
                series.add(ChartSpec.Series.line(t.label() + " (fit)", x, fit).colour(i).unlisted());
            }
        }
        return new ChartSpec(residual ? "TA residuals (data − fit)" : "TA traces and fit", "delay (ps)",
                residual ? "residual of −ΔA (mOD)" : ChartSpec.BLEACH_AXIS, true, false, series, ChartSpec.Palette.SEQUENTIAL);
    }

    private static int[] histogramColours(Input in) {
        return ChartSpec.ranks(in.histograms().stream().mapToDouble(CountHistogram::excitation).toArray());
    }

    private static double[] centresNs(CountHistogram h) {
        double[] x = new double[h.bins()];
        for (int b = 0; b < x.length; b++) {
            x[b] = h.centreS(b) * 1e9;
        }
        return x;
    }

    private record Shown(String label, double factor) {
    }

    /** The response's own keys are shown in ps here; the naming table serves the ladder's. */
    private static Shown shown(String key) {
        if (key.equals(InstrumentResponse.FWHM)) {
            return new Shown("IRF FWHM (ps)", 1e12);
        }
        if (key.equals(CountModel.SHIFT)) {
            return new Shown("IRF shift (ps)", 1e12);
        }
        return new Shown(ParameterNaming.label(key).withUnit(), ParameterNaming.trade(key).factor());
    }

    private static String withError(ParameterEstimate e) {
        return e.fixed() ? num(e.value()) + " (fixed)" : Rounded.pm(e.value(), e.stdError());
    }

    private static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "unavailable";
    }
}
