package org.ladderkin.fit.counting;

import java.util.ArrayList;
import java.util.List;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;

/**
 * A sum of exponentials, (1 − Σ f_k) e^{−t/τ₁} + Σ_{k≥2} f_k e^{−t/τ_k}, with parameters {@code tau1S}, {@code tau2S}, …
 * and {@code fraction2}, …; under a pulse train every term is summed over all earlier pulses in closed form,
 * e^{−t/τ}/(1 − e^{−T/τ}), which is exact for emission linear in the excitation.
 */
public final class ExponentialDecay implements DecayLaw {

    private final double[] tauStartsS;
    private final double[] fractionStarts;

    /**
     * @param tauStartsS     start of each lifetime (s)
     * @param fractionStarts start of the fractions of components 2, 3, …
     */
    public ExponentialDecay(double[] tauStartsS, double[] fractionStarts) {
        if (tauStartsS.length == 0 || fractionStarts.length != tauStartsS.length - 1) {
            throw new IllegalArgumentException("need one lifetime per component and a fraction for each after the first");
        }
        this.tauStartsS = tauStartsS.clone();
        this.fractionStarts = fractionStarts.clone();
    }

    /** One exponential. */
    public static ExponentialDecay single(double tauStartS) {
        return new ExponentialDecay(new double[] {tauStartS}, new double[0]);
    }

    /** Two exponentials. */
    public static ExponentialDecay biexponential(double tau1StartS, double tau2StartS, double fraction2Start) {
        return new ExponentialDecay(new double[] {tau1StartS, tau2StartS}, new double[] {fraction2Start});
    }

    @Override
    public List<ParameterSpec> parameters() {
        List<ParameterSpec> specs = new ArrayList<>();
        for (int k = 0; k < tauStartsS.length; k++) {
            specs.add(ParameterSpec.positive("tau" + (k + 1), "S", tauStartsS[k]));
        }
        for (int k = 0; k < fractionStarts.length; k++) {
            specs.add(ParameterSpec.shared("fraction" + (k + 2), "", fractionStarts[k], 0, 1));
        }
        return specs;
    }

    @Override
    public double[] emission(int histogram, double[] sinceLastPulseS, double periodS, ParameterValues p) {
        int n = tauStartsS.length;
        double[] tau = new double[n];
        double[] w = new double[n];
        w[0] = 1;
        for (int k = 0; k < n; k++) {
            tau[k] = p.get("tau" + (k + 1) + "S");
            if (k > 0) {
                w[k] = p.get("fraction" + (k + 1));
                w[0] -= w[k];
            }
        }
        double[] wrap = new double[n];
        for (int k = 0; k < n; k++) {
            wrap[k] = Double.isNaN(periodS) ? 1 : 1 / -Math.expm1(-periodS / tau[k]);
        }
        double[] out = new double[sinceLastPulseS.length];
        for (int i = 0; i < out.length; i++) {
            double t = sinceLastPulseS[i];
            if (t < 0) {
                continue;
            }
            double s = 0;
            for (int k = 0; k < n; k++) {
                s += w[k] * wrap[k] * Math.exp(-t / tau[k]);
            }
            out[i] = s;
        }
        return out;
    }
}
