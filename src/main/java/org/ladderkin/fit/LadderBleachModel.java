package org.ladderkin.fit;

import java.util.function.BiFunction;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.train.PulseExcitation;

/**
 * The ladder model as a fit model for a transient-absorption fluence series: trace i is
 * ΔA_i(t) = −A·b(t; s·n_i, τ₂, τ₁), the band-edge bleach b of the pulse-train steady state with ⟨N⟩ = s·n_i, where
 * n_i are the nominal ⟨N⟩ of the series and s scales them (s = σ/σ_nominal). Shared parameters, with their keys:
 * {@code amplitudeOd} (A, OD), {@code crossSectionScale} (s), {@code tauAuger2S} (τ₂, s), {@code tauSingleS} (τ₁, s).
 * The ladder for one (τ₂, τ₁) is kept until they change, so the fitter's per-trace calls share its decomposition.
 */
public final class LadderBleachModel implements TraceModel {

    /** Parameter keys. */
    public static final String AMPLITUDE = "amplitudeOd";
    public static final String CROSS_SECTION_SCALE = "crossSectionScale";
    public static final String TAU_AUGER2 = "tauAuger2S";
    public static final String TAU_SINGLE = "tauSingleS";

    private final BiFunction<Double, Double, KineticModel> modelFor;
    private final double[] nominalN;
    private final double periodS;
    private double cachedTau2 = Double.NaN;
    private double cachedTau1 = Double.NaN;
    private double cachedScale = Double.NaN;
    private LadderKinetics cached;

    /**
     * @param modelFor  the kinetic model for given (τ₂, τ₁) in seconds
     * @param nominalN  nominal ⟨N⟩ of each trace
     * @param periodS   pulse period (s)
     */
    public LadderBleachModel(BiFunction<Double, Double, KineticModel> modelFor, double[] nominalN, double periodS) {
        this.modelFor = modelFor;
        this.nominalN = nominalN.clone();
        this.periodS = periodS;
    }

    @Override
    public int traceCount() {
        return nominalN.length;
    }

    @Override
    public synchronized double[] predict(int trace, double[] delaysS, ParameterValues p) {
        double tau2 = p.get(TAU_AUGER2);
        double tau1 = p.get(TAU_SINGLE);
        double scale = p.get(CROSS_SECTION_SCALE);
        double a = p.get(AMPLITUDE);
        if (cached == null || tau2 != cachedTau2 || tau1 != cachedTau1 || scale != cachedScale) {
            double top = 0;
            for (double n : nominalN) {
                top = Math.max(top, n * scale);
            }
            cached = LadderKinetics.forPulses(modelFor.apply(tau2, tau1), new PulseExcitation.Poisson(top));
            cachedTau2 = tau2;
            cachedTau1 = tau1;
            cachedScale = scale;
        }
        PulseExcitation pulse = new PulseExcitation.Poisson(nominalN[trace] * scale);
        double[] b = cached.trace(cached.steadyState(pulse, periodS, false).afterPulse(), delaysS).bleach();
        for (int m = 0; m < b.length; m++) {
            b[m] *= -a;
        }
        return b;
    }
}
