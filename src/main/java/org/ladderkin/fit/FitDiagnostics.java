package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ladderkin.units.Rounded;

/**
 * Findings about the sample and the set-up read from a finished ladder fit, each with what to change: a model that
 * holds dots charged before each pulse even at the lowest fluence, so that it explains the weakest trace's fast decay by
 * trion Auger recombination (photocharging); an early-amplitude saturation curve that bends more gently or more sharply
 * than Poisson filling of the band edge (optically thick sample, pump not uniform over the probe); and a fitted
 * excitation scale far from the one given (pump spot other than assumed, or photocharging seen through a neutral model).
 * <p>
 * A neutral ladder fitted to photocharged data does not leave a clean fast-component residual in the weakest trace:
 * the fit raises σ until biexcitons mimic the trions. That case shows as a σ far above the value given.
 */
final class FitDiagnostics {

    /** Smallest excess that is worth a flag, as a fraction of the early signal. */
    private static final double MIN_EFFECT = 0.05;
    /** Standard errors an effect must exceed. */
    private static final double SIGNIFICANCE = 3;
    /** Charged fraction before a pulse that the model may carry before the user is told. */
    private static final double CHARGED_FRACTION = 0.05;

    private FitDiagnostics() {
    }

    static List<String> find(Dataset data, LadderBleachModel model, ParameterValues best, FitResult r, double[] n,
                             double scaleGiven, String scaleKey) {
        List<String> out = new ArrayList<>();
        photocharging(model, best, n).ifPresent(out::add);
        saturation(data, model, best, r, n).ifPresent(out::add);
        if (!Double.isNaN(scaleGiven)) {
            double ratio = best.get(scaleKey) / scaleGiven;
            if (ratio < 0.6 || ratio > 1.7) {
                out.add(String.format(Locale.ROOT, "the fitted excitation scale is %.2g times the value given: %s", ratio,
                        ratio < 1 ? "the dots fill more slowly with fluence than assumed; the pump spot may be larger than "
                                + "assumed (fluence overestimated) or the sample optically thick at the pump"
                                : "the dots fill faster than assumed; the pump spot may be smaller than assumed, or "
                                + "photocharged dots add a trion decay at every fluence that a neutral ladder can only take for "
                                + "biexcitons (stir or flow the sample, or lower the repetition rate, and compare)"));
            }
        }
        return out;
    }

    private static int lowest(double[] n) {
        int i0 = 0;
        for (int i = 1; i < n.length; i++) {
            if (n[i] < n[i0]) {
                i0 = i;
            }
        }
        return i0;
    }

    private static java.util.Optional<String> photocharging(LadderBleachModel model, ParameterValues best, double[] n) {
        int i0 = lowest(n);
        double charged = model.chargedFractionBeforePulse(i0, best);
        if (charged > CHARGED_FRACTION) {
            return java.util.Optional.of(String.format(Locale.ROOT, "photocharging: the fitted model holds %.0f%% of the "
                    + "dots charged before each pulse even in the weakest trace (⟨N⟩ = %.2g), so its fast decay is trion "
                    + "Auger recombination; stir or flow the sample (or lower the repetition rate) so each pulse meets fresh "
                    + "neutral dots", 100 * charged, n[i0]));
        }
        return java.util.Optional.empty();
    }

    private static java.util.Optional<String> saturation(Dataset data, LadderBleachModel model, ParameterValues best,
                                                         FitResult r, double[] n) {
        if (n.length < 3) {
            return java.util.Optional.empty();
        }
        int top = 0;
        for (int i = 1; i < n.length; i++) {
            if (n[i] > n[top]) {
                top = i;
            }
        }
        if (n[top] < 1) {
            return java.util.Optional.empty();
        }
        double t0 = optional(best, LadderBleachModel.TIME_ZERO);
        double irf = model.measuredIrf().map(org.ladderkin.observe.MeasuredIrf::fwhmS)
                .orElse(optional(best, LadderBleachModel.IRF_FWHM));
        double[] e = new double[n.length];
        double[] mShape = new double[n.length];
        double[] noise = new double[n.length];
        double sem = 0;
        double smm = 0;
        for (int i = 0; i < n.length; i++) {
            Trace t = data.traces().get(i);
            double[] d = t.delaysS();
            double[] y = t.signal();
            double b = r.find("baseline", i).map(ParameterEstimate::value).orElse(0.0);
            List<Integer> idx = new ArrayList<>();
            for (int m = 0; m < d.length && idx.size() < 3; m++) {
                if (d[m] - t0 >= 2 * irf && !Double.isNaN(y[m])) {
                    idx.add(m);
                }
            }
            if (idx.isEmpty()) {
                return java.util.Optional.empty();
            }
            double[] at = new double[idx.size()];
            double sy = 0;
            for (int k = 0; k < at.length; k++) {
                at[k] = d[idx.get(k)];
                sy += y[idx.get(k)] - b;
            }
            double[] shape = model.predict(i, at, best);
            double sm = 0;
            for (double v : shape) {
                sm += v;
            }
            e[i] = sy / at.length;
            mShape[i] = sm / at.length;
            double s2 = 0;
            int cnt = 0;
            for (double v : r.residuals().get(i)) {
                s2 += v * v;
                cnt++;
            }
            noise[i] = Math.sqrt(s2 / Math.max(1, cnt) / at.length);
            sem += e[i] * mShape[i];
            smm += mShape[i] * mShape[i];
        }
        if (!(smm > 0)) {
            return java.util.Optional.empty();
        }
        double a = sem / smm;
        double dev = e[top] / (a * mShape[top]) - 1;
        double se = noise[top] / Math.abs(a * mShape[top]);
        if (Math.abs(dev) > 2 * MIN_EFFECT && Math.abs(dev) > SIGNIFICANCE * se) {
            return java.util.Optional.of(String.format(Locale.ROOT, "saturation curve: at ⟨N⟩ = %.2g the early signal is "
                    + "%.0f%% %s than Poisson filling of the band edge predicts from the weaker traces; %s", n[top], 100 * Math.abs(dev),
                    dev > 0 ? "higher" : "lower", dev > 0
                            ? "the curve bends more gently, as in an optically thick sample (the pump weakens with depth) or "
                            + "with a pump spot not much larger than the probe (⟨N⟩ varies across the probed area): dilute the "
                            + "sample to a pump OD below about 0.1 or enlarge the pump spot"
                            : "the curve bends more sharply than it can for a uniform thin sample: check the fluence calibration "
                            + "(spot size, pulse energy at the sample) and for signal not from the band edge"));
        }
        return java.util.Optional.empty();
    }

    private static double optional(ParameterValues p, String key) {
        int i = p.indexOf(key);
        return i < 0 ? 0 : p.value(i, 0);
    }

    /** Window after time zero in which a misplaced time zero or a missing IRF leaves its residual (s). */
    private static final double EARLY_WINDOW_S = 2e-12;
    /** Excess early/late ratio at zero fluence above which (and 3 standard errors) photocharging is reported. */
    private static final double MIN_EXCESS = 0.03;
    /** Standard error of that intercept the data must reach for the test to count. */
    private static final double MAX_EXCESS_ERROR = 0.03;
    /** Late window starts this many τ₂ after time zero (trion decay over), early window ends at this fraction of τ₂. */
    private static final double LATE_TAU2 = 10;
    private static final double EARLY_TAU2 = 0.25;
    /** Points before time zero that fix the level before the pulse, and their least distance from it (s). */
    private static final int MIN_PRE_ZERO = 3;
    private static final double PRE_ZERO_GAP_S = 0.2e-12;
    /** Traces up to this probe-averaged ⟨N⟩ enter the zero-fluence extrapolation. */
    private static final double LOW_N = 1;

    /**
     * A loud finding when the normalised residuals are not noise: names the runs-test z, the lag-1 autocorrelation and
     * the reduced χ², where the excess sits (near time zero or later) and what to free.
     */
    static java.util.Optional<String> residualStructure(Dataset data, FitResult r, FitQuality q, ParameterValues best,
                                                        LadderBleachModel model, java.util.Set<LadderFitSetup.LadderParameter> free) {
        if (!q.structured()) {
            return java.util.Optional.empty();
        }
        double t0 = optional(best, LadderBleachModel.TIME_ZERO);
        double irf = model.measuredIrf().map(org.ladderkin.observe.MeasuredIrf::fwhmS).orElse(optional(best, LadderBleachModel.IRF_FWHM));
        double window = Math.max(EARLY_WINDOW_S, 5 * irf);
        double[] noise = q.noisePerTrace();
        double early = 0;
        double total = 0;
        for (int i = 0; i < data.size(); i++) {
            Trace t = data.traces().get(i);
            double[] d = t.delaysS();
            double[] y = t.signal();
            double[] res = r.residuals().get(i);
            int k = 0;
            for (int m = 0; m < d.length && k < res.length; m++) {
                if (Double.isNaN(y[m])) {
                    continue;
                }
                double z2 = noise[i] > 0 ? res[k] * res[k] / (noise[i] * noise[i]) : 0;
                double excess = Math.max(0, z2 - 1);
                total += excess;
                if (d[m] - t0 < window) {
                    early += excess;
                }
                k++;
            }
        }
        double share = total > 0 ? early / total : 0;
        String stats = String.format(Locale.ROOT, "runs-test z = %.1f (noise: above %.0f), lag-1 autocorrelation %.2f "
                + "(noise: near 0, limit %.1f), reduced χ² %.3g", q.runsZ(), FitQuality.RUNS_Z_LIMIT, q.lag1(),
                FitQuality.LAG1_LIMIT, q.reducedChiSquare());
        String cause;
        if (share >= 0.5) {
            List<String> toFree = new ArrayList<>();
            if (!free.contains(LadderFitSetup.LadderParameter.TIME_ZERO)) {
                toFree.add("time-zero");
            }
            if (model.measuredIrf().isEmpty() && !free.contains(LadderFitSetup.LadderParameter.IRF)) {
                toFree.add("irf (with --irf as its start, e.g. --irf 0.15ps)");
            }
            cause = String.format(Locale.ROOT, "%.0f%% of the excess sits within %.3g ps of time zero, so the likely cause is "
                    + "time zero or the instrument response: %s", 100 * share, window * 1e12, toFree.isEmpty()
                    ? "both are free already; give a measured IRF (--irf-file) or drop the points before the pulse has ended"
                    : "free " + String.join(" and ", toFree) + " (add them to --free)");
        } else {
            cause = String.format(Locale.ROOT, "%.0f%% of the excess sits later than %.3g ps after time zero, so the ladder "
                    + "misses a decay: free tau-trap or tau-rad, consider photocharged dots (stir or flow the sample and compare), "
                    + "or a signal that is not band-edge bleach", 100 * (1 - share), window * 1e12);
        }
        return java.util.Optional.of("RESIDUAL STRUCTURE: the residuals are not noise (" + stats + "); " + cause
                + "; until then the values and errors above are biased");
    }

    /**
     * Looks for photocharged dots in the data rather than in the model: in a neutral ladder the fast (Auger) part of the
     * bleach vanishes as the fluence goes to zero, while dots charged before the pulse add a trion decay whose share of
     * the early signal does not depend on fluence. For each weak trace the early/late ratio of the data (measured from
     * the level before time zero) minus that of the fitted curve (which removes the single-exciton decay both share) is
     * extrapolated linearly to zero excitation; an intercept a of about f/(1 − f) means a fraction f charged (one
     * exciton's bleach lost to the trion, g = 2).
     *
     * @return a finding (first) or a statement of what was tested or why nothing could be (second); one of them is null
     */
    static String[] photochargingInData(Dataset data, FitResult r, FitQuality q, ParameterValues best, double[] x,
                                        double[] n, List<double[]> curves) {
        int tauIndex = best.indexOf(LadderBleachModel.TAU_AUGER2);
        if (tauIndex < 0) {
            return new String[] {null, "photocharging: not tested (the model has no biexciton Auger lifetime to set the "
                    + "early and late windows by)"};
        }
        double tau2 = best.value(tauIndex, 0);
        double t0 = optional(best, LadderBleachModel.TIME_ZERO);
        double irf = optional(best, LadderBleachModel.IRF_FWHM);
        double[] noise = q.noisePerTrace();
        List<double[]> rows = new ArrayList<>();
        boolean preZeroMissing = false;
        double lastDelay = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < data.size(); i++) {
            Trace t = data.traces().get(i);
            lastDelay = Math.max(lastDelay, t.delaysS()[t.size() - 1] - t0);
            if (n[i] > LOW_N) {
                continue;
            }
            double[] d = t.delaysS();
            double[] y = t.signal();
            double[] c = curves.get(i);
            // the level before the pulse, from the points before time zero (a per-trace baseline fitted to the decay
            // can take up a fluence-independent fast component, so it cannot serve); none needed without baselines
            boolean baselines = r.find("baseline", i).isPresent();
            double py = 0;
            double pc = 0;
            int np = 0;
            for (int m = 0; m < d.length; m++) {
                if (d[m] - t0 < -Math.max(3 * irf, PRE_ZERO_GAP_S) && !Double.isNaN(y[m])) {
                    py += y[m];
                    pc += c[m];
                    np++;
                }
            }
            if (baselines && np < MIN_PRE_ZERO) {
                preZeroMissing = true;
                continue;
            }
            double b = np == 0 ? 0 : py / np;
            double bc = np == 0 ? 0 : pc / np;
            double ey = 0;
            double ec = 0;
            int ne = 0;
            double ly = 0;
            double lc = 0;
            int nl = 0;
            for (int m = 0; m < d.length; m++) {
                double tau = d[m] - t0;
                if (Double.isNaN(y[m])) {
                    continue;
                }
                if (tau >= 2 * irf && tau > 0 && tau <= EARLY_TAU2 * tau2) {
                    ey += y[m] - b;
                    ec += c[m] - bc;
                    ne++;
                } else if (tau >= LATE_TAU2 * tau2) {
                    ly += y[m] - b;
                    lc += c[m] - bc;
                    nl++;
                }
            }
            if (ne < 2 || nl < 2 || lc == 0 || ly == 0) {
                continue;
            }
            double e = ey / ne;
            double l = ly / nl;
            double fData = e / l - 1;
            double fModel = (ec / ne) / (lc / nl) - 1;
            double var = noise[i] * noise[i] * (1.0 / ne + e * e / (l * l) / nl) / (l * l);
            if (!(var > 0) || !Double.isFinite(var)) {
                continue;
            }
            rows.add(new double[] {x[i], fData - fModel, var});
        }
        if (lastDelay < LATE_TAU2 * tau2) {
            return new String[] {null, String.format(Locale.ROOT, "photocharging: not tested (the delays end %.3g ps after "
                    + "time zero, before the trion decay is over at about %.0f τ₂ = %.3g ps; extend the delays to %.3g ps "
                    + "and include traces at ⟨N⟩ ≤ %.0f)", lastDelay * 1e12, LATE_TAU2, LATE_TAU2 * tau2 * 1e12,
                    2 * LATE_TAU2 * tau2 * 1e12, LOW_N)};
        }
        if (rows.size() < 2 && preZeroMissing) {
            return new String[] {null, String.format(Locale.ROOT, "photocharging: not tested (the weak traces have fewer "
                    + "than %d points before time zero, so the level before the pulse is unknown and each trace's fitted "
                    + "baseline can take up a trion decay; record a few delays before zero, or fit with --shared-amplitude)",
                    MIN_PRE_ZERO)};
        }
        if (rows.size() < 2) {
            return new String[] {null, String.format(Locale.ROOT, "photocharging: not tested (%d trace%s at ⟨N⟩ ≤ %.0f with "
                    + "points both before %.2g τ₂ and after %.0f τ₂; the test extrapolates the fast share of the signal to zero "
                    + "fluence and needs at least two weak traces, e.g. ⟨N⟩ ≈ 0.1 and 0.3)", rows.size(),
                    rows.size() == 1 ? "" : "s", LOW_N, EARLY_TAU2, LATE_TAU2)};
        }
        // weighted straight line D = a + b·x
        double sw = 0;
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (double[] row : rows) {
            double w = 1 / row[2];
            sw += w;
            sx += w * row[0];
            sy += w * row[1];
            sxx += w * row[0] * row[0];
            sxy += w * row[0] * row[1];
        }
        double det = sw * sxx - sx * sx;
        if (!(det > 0)) {
            return new String[] {null, "photocharging: not tested (the weak traces share one excitation, so nothing can "
                    + "be extrapolated to zero fluence; add a trace at a different low fluence)"};
        }
        double a = (sxx * sy - sx * sxy) / det;
        double se = Math.sqrt(sxx / det);
        if (se > MAX_EXCESS_ERROR) {
            return new String[] {null, String.format(Locale.ROOT, "photocharging: not tested (the zero-fluence fast share is "
                    + "known only to ±%.2f from %d weak traces; ±%.2f would show 10%% charged dots: average the weakest "
                    + "traces longer or add more at ⟨N⟩ ≤ %.0f)", se, rows.size(), MAX_EXCESS_ERROR, LOW_N)};
        }
        if (a > MIN_EXCESS && a > SIGNIFICANCE * se) {
            double f = a / (1 + a);
            return new String[] {String.format(Locale.ROOT, "photocharging: the fast decay of the weakest traces does not "
                    + "vanish as the fluence goes to zero (excess early/late ratio %s at zero fluence, from %d traces "
                    + "at ⟨N⟩ ≤ %.0f): about %.0f%% of the dots are charged before each pulse and their trion decay is read "
                    + "as biexcitons, which raises σ and τ₂; stir or flow the sample (or lower the repetition rate) and "
                    + "compare, or fit with a charging process", Rounded.pm(a, se), rows.size(), LOW_N, 100 * f), null};
        }
        return new String[] {null, String.format(Locale.ROOT, "photocharging: tested, none seen (excess early/late ratio "
                + "%s at zero fluence from %d weak traces; 10%% charged dots would give about 0.11)", Rounded.pm(a, se), rows.size())};
    }
}
