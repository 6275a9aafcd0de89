package org.ladderkin.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.fit.ThresholdLawFit;

/** The {@code fit-yields} report: the threshold law across photon energies, its numbers and one chart. */
public final class FitYieldsReport {

    private FitYieldsReport() {
    }

    /** The chart: QY against ħω/E_g with ±1 standard-error bars, the fitted law and the energy-conservation limit. */
    public static ChartSpec chart(ThresholdLawFit.Result r) {
        List<ChartSpec.Series> series = new ArrayList<>();
        List<ThresholdLawFit.Point> pts = r.points();
        double[] x = new double[pts.size()];
        double[] y = new double[pts.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = pts.get(i).photonEnergyOverGap();
            y[i] = pts.get(i).quantumYield();
        }
        series.add(ChartSpec.Series.points("measured QY (±1 standard error)", x, y).colour(0));
        for (int i = 0; i < x.length; i++) {
            double e = pts.get(i).stdError();
            series.add(ChartSpec.Series.line("error bar " + (i + 1), new double[] {x[i], x[i]}, new double[] {y[i] - e, y[i] + e})
                    .colour(0).unlisted());
        }
        double lo = Math.min(1, x[0] - 0.2);
        double hi = Math.max(x[x.length - 1] + 0.2, r.thresholdOverGap() + 0.5);
        series.add(ChartSpec.Series.line(String.format(Locale.ROOT, "fit: E_th = %.3g E_g, ε_eh = %.3g E_g",
                r.thresholdOverGap(), r.pairEnergyOverGap()), knots(lo, hi, r.thresholdOverGap()), lawAt(knots(lo, hi,
                r.thresholdOverGap()), r.thresholdOverGap(), r.pairEnergyOverGap())).colour(1));
        double[] k = knots(lo, hi, ThresholdLawFit.CONSERVATION_THRESHOLD_OVER_GAP);
        series.add(ChartSpec.Series.line("energy conservation: E_th = 2 E_g, ε_eh = E_g", k,
                lawAt(k, ThresholdLawFit.CONSERVATION_THRESHOLD_OVER_GAP, ThresholdLawFit.CONSERVATION_PAIR_ENERGY_OVER_GAP))
                .colour(2));
        return new ChartSpec("Quantum yield against photon energy", "photon energy ħω / E_g", "quantum yield QY = 1 + η",
                false, false, series);
    }

    private static double[] knots(double lo, double hi, double threshold) {
        return threshold > lo && threshold < hi ? new double[] {lo, threshold, hi} : new double[] {lo, hi};
    }

    private static double[] lawAt(double[] x, double a, double b) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = ThresholdLawFit.law(a, b, x[i]);
        }
        return y;
    }

    /** The whole page. */
    public static String html(ThresholdLawFit.Result r, double gapEv) {
        HtmlPage page = new HtmlPage("Multiplication yields across photon energies");
        page.heading(1, "Multiplication yields across photon energies");
        page.paragraph(String.format(Locale.ROOT, "Threshold-linear law QY = 1 + (ħω − E_th)/ε_eh above E_th, 1 below, "
                + "fitted by weighted least squares to %d yields (E_g = %.4g eV). The energy-conservation limit is "
                + "E_th = 2 E_g with ε_eh = E_g.", r.points().size(), gapEv));
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("E_th / E_g", num(r.thresholdOverGap()), num(r.thresholdStdError()),
                num(r.thresholdOverGap() * gapEv) + " eV"));
        rows.add(List.of("ε_eh / E_g", num(r.pairEnergyOverGap()), num(r.pairEnergyStdError()),
                num(r.pairEnergyOverGap() * gapEv) + " eV"));
        rows.add(List.of("η_CM = E_g / ε_eh", num(r.efficiency()), num(r.efficiencyStdError()), ""));
        page.table(List.of("quantity", "value", "standard error", "in eV"), rows);
        page.paragraph(String.format(Locale.ROOT, "χ² = %.3g over %d degrees of freedom, %d of %d points above the "
                + "threshold; errors take each yield's standard error as known.", r.chiSquare(), r.degreesOfFreedom(),
                r.pointsAbove(), r.points().size()));
        List<List<String>> pts = new ArrayList<>();
        for (ThresholdLawFit.Point p : r.points()) {
            pts.add(List.of(p.label(), num(p.photonEnergyOverGap()), num(p.quantumYield()), num(p.stdError()),
                    num(r.quantumYield(p.photonEnergyOverGap()))));
        }
        page.table(List.of("result", "ħω / E_g", "QY", "standard error", "law"), pts);
        page.charts(List.of(chart(r)), 760, 420);
        return page.render();
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
