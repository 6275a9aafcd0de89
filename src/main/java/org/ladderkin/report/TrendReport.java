package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.units.Rounded;
import org.ladderkin.archive.PowerLawFit;
import org.ladderkin.archive.Trend;
import org.ladderkin.archive.TrendPoint;

/**
 * The trend report: a log-log chart with every material's samples, its fitted power law and the library's published
 * scaling, a table of the line's numbers, a table of samples, and links to each fit's own report.
 */
public final class TrendReport {

    private TrendReport() {
    }

    /** The chart: per material its points, its line over the points' span and the reference line, one colour each. */
    public static ChartSpec chart(Trend t, String markedSample) {
        List<ChartSpec.Series> series = new ArrayList<>();
        int colour = 0;
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (Trend.MaterialTrend m : t.materials()) {
            for (TrendPoint p : m.points()) {
                lo = Math.min(lo, p.x());
                hi = Math.max(hi, p.x());
            }
        }
        for (Trend.MaterialTrend m : t.materials()) {
            double[] x = m.points().stream().mapToDouble(TrendPoint::x).toArray();
            double[] y = m.points().stream().mapToDouble(TrendPoint::y).toArray();
            series.add(ChartSpec.Series.points(m.material() + " samples", x, y).colour(colour));
            double[] span = {lo / 1.2, hi * 1.2};
            if (m.fit() != null) {
                PowerLawFit.Result f = m.fit();
                series.add(ChartSpec.Series.line(m.material() + String.format(Locale.ROOT, " fit, p = %.2f", f.exponent()), span,
                        new double[] {f.at(span[0]), f.at(span[1])}).colour(colour));
            }
            if (m.reference().isPresent()) {
                Trend.ReferenceLine r = m.reference().get();
                series.add(ChartSpec.Series.line(m.material() + " library scaling", span, new double[] {
                    r.prefactor() * Math.pow(span[0], r.exponent()), r.prefactor() * Math.pow(span[1], r.exponent())}));
            }
            colour++;
        }
        if (markedSample != null) {
            for (Trend.MaterialTrend m : t.materials()) {
                for (TrendPoint p : m.points()) {
                    if (p.sample().equals(markedSample)) {
                        series.add(ChartSpec.Series.points("this sample (" + p.sample() + ")", new double[] {p.x()},
                                new double[] {p.y()}));
                    }
                }
            }
        }
        return new ChartSpec(t.y().label() + " against " + t.x().label(), t.x().label(), t.y().label(), true, true, series);
    }

    /** The self-contained HTML page. */
    public static String html(Trend t) {
        HtmlPage page = new HtmlPage("Trend: " + t.y().key() + " against " + t.x().key());
        page.heading(1, "Trend of " + t.y().label() + " against " + t.x().label());
        page.paragraph("Each sample's newest current fit is one point; the line is y = C·x^p fitted in log-log with each fit's "
                + "standard error and an intrinsic scatter τ found by restricted maximum likelihood, so a few over-precise "
                + "fits cannot pull the line through themselves. Points beyond " + (int) PowerLawFit.OUTLIER_SIGMAS
                + "σ of the line (their own error and τ together) are flagged.");
        page.charts(List.of(chart(t, null)), 760, 480);
        List<List<String>> lines = new ArrayList<>();
        for (Trend.MaterialTrend m : t.materials()) {
            PowerLawFit.Result f = m.fit();
            lines.add(List.of(m.material(), Integer.toString(m.points().size()),
                    f == null ? "too few samples" : pm(f.exponent(), f.exponentStdError()),
                    f == null ? "" : pm(f.prefactor(), f.prefactorStdError()),
                    f == null ? "" : pm(f.scatterLn(), f.scatterLnStdError()),
                    m.augerVolumeConstant() == null ? "" : pm(m.augerVolumeConstant().prefactor(),
                            m.augerVolumeConstant().prefactorStdError()),
                    m.reference().map(r -> String.format(Locale.ROOT, "%.4g·x^%.3g (%s)", r.prefactor(), r.exponent(), r.source()))
                            .orElse("none in the library")));
        }
        page.heading(2, "Power law per material");
        page.table(List.of("material", "samples", "exponent p", "prefactor C", "intrinsic scatter τ (rel.)",
                "τ₂/V (ps/nm³), p held at 1", "library scaling"), lines);
        List<List<String>> rows = new ArrayList<>();
        List<String> links = new ArrayList<>();
        for (Trend.MaterialTrend m : t.materials()) {
            for (int i = 0; i < m.points().size(); i++) {
                TrendPoint p = m.points().get(i);
                boolean out = m.fit() != null && m.fit().outlier(i);
                rows.add(List.of(p.sample(), p.material(), g(p.x()), g(p.y()), g(p.yStdError()), "F" + p.fitId(),
                        m.fit() == null ? "" : String.format(Locale.ROOT, "%.2f", m.fit().residualSigmas()[i]), out ? "WARN" : "PASS"));
                if (!p.reportPath().isEmpty()) {
                    links.add("<li><a href=\"" + HtmlPage.escape(fileUri(p.reportPath())) + "\">" + HtmlPage.escape(p.sample()
                            + " (fit F" + p.fitId() + ")") + "</a></li>");
                }
            }
        }
        page.heading(2, "Samples");
        page.table(List.of("sample", "material", t.x().label(), t.y().label(), "standard error", "fit", "residual (σ)",
                "within 3σ"), rows);
        if (!t.skipped().isEmpty()) {
            page.heading(2, "Left out");
            page.bullets(t.skipped().stream().map(s -> s.sample() + " (fit F" + s.fitId() + "): " + s.reason()).toList());
        }
        String html = page.render();
        if (links.isEmpty()) {
            return html;
        }
        String section = "<h2>Fit reports</h2>\n<ul>\n" + String.join("\n", links) + "\n</ul>\n";
        int end = html.lastIndexOf("</body>");
        return end < 0 ? html + section : html.substring(0, end) + section + html.substring(end);
    }

    private static String fileUri(String path) {
        return path.startsWith("/") ? "file://" + path : path;
    }

    private static String pm(double v, double e) {
        return Double.isNaN(e) ? g(v) : Rounded.pm(v, e);
    }

    private static String g(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
