package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

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
}
