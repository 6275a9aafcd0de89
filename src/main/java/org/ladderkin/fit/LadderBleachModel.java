package org.ladderkin.fit;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.hipparchus.special.Erf;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.ModelParameters;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;

/**
 * The ladder model as a fit model for a transient-absorption fluence series: trace i is
 * ΔA_i(t) = −A·(g ⊗ b)(t − t₀; ⟨N⟩_i), where b is the band-edge bleach of the ladder (in the pulse-train steady state
 * when a period is given, else after one pulse on fresh dots), ⟨N⟩_i = s·x_i with x_i the trace's recorded excitation
 * (photon fluence, pulse energy or nominal ⟨N⟩) and s the shared scale (σ, ⟨N⟩ per joule, or a factor), and g an
 * optional Gaussian instrument response. Before time zero the signal is the bleach left over from earlier pulses.
 * <p>
 * Optional parameters (absent from the problem: A = 1, t₀ = 0, no IRF): {@link #AMPLITUDE}, {@link #TIME_ZERO},
 * {@link #IRF_FWHM}. The kinetic parameters (τ₂, τ₁, trapping, …) are whatever the {@code ladder} function reads; the
 * ladder is rebuilt only when one of {@code kineticKeys} changes, so the fitter's per-trace calls and its derivatives
 * in s, A, t₀ and the IRF share one decomposition.
 * <p>
 * The IRF is applied by Gauss–Legendre quadrature of the convolution integral at each delay, so any delay grid
 * (log-spaced included) works; beyond 50 IRF widths after time zero it is skipped, where it changes the signal by
 * less than about 1e-4 of the fast component (the worst case, a decay time of 25 σ, gives (σ/τ)²·e⁻²/2).
 */
public final class LadderBleachModel implements TraceModel {

    /** Shared amplitude A (OD); leave it out when per-trace amplitudes come from {@link LinearTerms}. */
    public static final String AMPLITUDE = "amplitudeOd";
    /** Time zero t₀ (s). */
    public static final String TIME_ZERO = "timeZeroS";
    /** FWHM of the Gaussian instrument response (s). */
    public static final String IRF_FWHM = "irfFwhmS";
    /** Biexciton Auger lifetime τ₂ (s), read by {@link #forModel}. */
    public static final String TAU_AUGER2 = "tauAuger2S";
    /** Single-exciton radiative lifetime τ₁ (s), read by {@link #forModel}. */
    public static final String TAU_RAD = "tauRadS";
    /** Trapping lifetime per exciton (s), read by {@link #forModel}. */
    public static final String TAU_TRAP = "tauTrapS";
    /** Kinetic keys of {@link #forModel}. */
    public static final List<String> LADDER_KEYS = List.of(TAU_AUGER2, TAU_RAD, TAU_TRAP);

    private static final double IRF_REACH = 50;
    private static final double[] GL_NODES;
    private static final double[] GL_WEIGHTS;

    static {
        var rule = new org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory().legendre(24);
        GL_NODES = new double[rule.getNumberOfPoints()];
        GL_WEIGHTS = new double[rule.getNumberOfPoints()];
        for (int i = 0; i < GL_NODES.length; i++) {
            GL_NODES[i] = rule.getPoint(i);
            GL_WEIGHTS[i] = rule.getWeight(i);
        }
    }

    private final List<String> kineticKeys;
    private final Function<ParameterValues, KineticModel> ladder;
    private final String scaleKey;
    private final double[] excitation;
    private final double periodS;
    private double[] cachedKinetic;
    private double cachedTopN;
    private LadderKinetics cached;
    private double[] bleachObservable;

    /**
     * @param kineticKeys parameter keys {@code ladder} reads (absent ones are fine if {@code ladder} has defaults)
     * @param ladder      the kinetic model at given parameter values
     * @param scaleKey    key of the shared scale s with ⟨N⟩_i = s·x_i
     * @param excitation  x_i, the recorded excitation of each trace (SI, &gt; 0)
     * @param periodS     pulse period (s), or NaN for one pulse on fresh dots
     */
    public LadderBleachModel(List<String> kineticKeys, Function<ParameterValues, KineticModel> ladder, String scaleKey,
                             double[] excitation, double periodS) {
        this.kineticKeys = List.copyOf(kineticKeys);
        this.ladder = ladder;
        this.scaleKey = scaleKey;
        this.excitation = excitation.clone();
        this.periodS = periodS;
        if (excitation.length == 0) {
            throw new IllegalArgumentException("a fluence series needs at least one trace");
        }
        for (double x : excitation) {
            if (!(x > 0) || !Double.isFinite(x)) {
                throw new IllegalArgumentException("trace excitations must be finite and > 0, was " + x);
            }
        }
        if (!Double.isNaN(periodS) && !(periodS > 0 && Double.isFinite(periodS))) {
            throw new IllegalArgumentException("pulse period must be finite and > 0 (or NaN for one pulse), was " + periodS + " s");
        }
    }

    /**
     * The ladder of {@code base} with τ₂, τ₁ and the trapping lifetime taken from the fit when it has them
     * ({@link #TAU_AUGER2}, {@link #TAU_RAD}, {@link #TAU_TRAP}); every other process (Auger scaling law, charges,
     * cooling, refresh) stays as in {@code base}.
     */
    public static LadderBleachModel forModel(ModelParameters base, String scaleKey, double[] excitation, double periodS) {
        return new LadderBleachModel(LADDER_KEYS, p -> base.withRates(
                rate(p, TAU_RAD, base.radiativeRatePerS()),
                rate(p, TAU_AUGER2, base.biexcitonAugerRatePerS()),
                rate(p, TAU_TRAP, base.trappingRatePerS())).toModel(), scaleKey, excitation, periodS);
    }

    private static double rate(ParameterValues p, String key, double fallback) {
        int i = p.indexOf(key);
        return i < 0 ? fallback : 1 / p.value(i, 0);
    }

    @Override
    public int traceCount() {
        return excitation.length;
    }

    /** ⟨N⟩ of trace {@code trace} at these parameters. */
    public double meanOccupancy(int trace, ParameterValues p) {
        return p.get(scaleKey) * excitation[trace];
    }

    @Override
    public synchronized double[] predict(int trace, double[] delaysS, ParameterValues p) {
        LadderKinetics k = kinetics(p);
        PulseExcitation pulse = new PulseExcitation.Poisson(meanOccupancy(trace, p));
        Populations before;
        Populations after;
        if (Double.isNaN(periodS)) {
            before = Populations.ground(k.space());
            after = k.applyPulse(before, pulse);
        } else {
            SteadyState ss = k.steadyState(pulse, periodS, false);
            before = ss.beforePulse();
            after = ss.afterPulse();
        }
        double t0 = optional(p, TIME_ZERO, 0);
        double fwhm = optional(p, IRF_FWHM, 0);
        double bBefore = dot(bleachObservable, before.probabilities());
        double[] b = fwhm > 0 ? convolved(k, after, bBefore, delaysS, t0, fwhm) : stepped(k, after, bBefore, delaysS, t0);
        double a = optional(p, AMPLITUDE, 1);
        for (int m = 0; m < b.length; m++) {
            b[m] *= -a;
        }
        return b;
    }

    /** Fraction of dots carrying an excess charge just before a pulse of trace {@code trace} (0 without a period). */
    public synchronized double chargedFractionBeforePulse(int trace, ParameterValues p) {
        if (Double.isNaN(periodS)) {
            return 0;
        }
        LadderKinetics k = kinetics(p);
        return k.steadyState(new PulseExcitation.Poisson(meanOccupancy(trace, p)), periodS, false).beforePulse().chargedFraction();
    }

    private LadderKinetics kinetics(ParameterValues p) {
        double[] kin = new double[kineticKeys.size()];
        for (int i = 0; i < kin.length; i++) {
            int idx = p.indexOf(kineticKeys.get(i));
            kin[i] = idx < 0 ? Double.NaN : p.value(idx, 0);
        }
        double topN = 0;
        for (double x : excitation) {
            topN = Math.max(topN, x * p.get(scaleKey));
        }
        // the ladder's Nmax depends on the strongest pulse: build with headroom so small steps in s reuse it
        if (cached == null || !Arrays.equals(kin, cachedKinetic) || topN > cachedTopN) {
            double headroom = topN * 1.5;
            cached = LadderKinetics.forPulses(ladder.apply(p), new PulseExcitation.Poisson(headroom));
            cachedKinetic = kin;
            cachedTopN = headroom;
            bleachObservable = cached.bleachObservable();
        }
        return cached;
    }

    private static double[] stepped(LadderKinetics k, Populations after, double bBefore, double[] delaysS, double t0) {
        int first = 0;
        while (first < delaysS.length && delaysS[first] - t0 < 0) {
            first++;
        }
        double[] out = new double[delaysS.length];
        Arrays.fill(out, 0, first, bBefore);
        if (first < delaysS.length) {
            double[] shifted = new double[delaysS.length - first];
            for (int m = 0; m < shifted.length; m++) {
                shifted[m] = delaysS[first + m] - t0;
            }
            double[] b = k.trace(after, shifted).bleach();
            System.arraycopy(b, 0, out, first, b.length);
        }
        return out;
    }

    /**
     * (g ⊗ s)(t) with s = bBefore before time zero and the ladder's bleach after it: the step part in closed form
     * (bBefore·Φ(−τ/σ)), the decay part ∫₀^∞ g(τ − u) b(u) du by 24-point Gauss–Legendre over u ∈ [τ − 8σ, τ + 8σ] ∩ [0, ∞).
     */
    private static double[] convolved(LadderKinetics k, Populations after, double bBefore, double[] delaysS, double t0,
                                      double fwhm) {
        double sigma = org.ladderkin.observe.IrfConvolution.sigmaOfFwhm(fwhm);
        int n = delaysS.length;
        double[] tau = new double[n];
        boolean[] quad = new boolean[n];
        int nodes = 0;
        for (int m = 0; m < n; m++) {
            tau[m] = delaysS[m] - t0;
            quad[m] = tau[m] < IRF_REACH * sigma && tau[m] + 8 * sigma > 0;
            nodes += quad[m] ? GL_NODES.length : tau[m] >= 0 ? 1 : 0;
        }
        double[] times = new double[nodes];
        int c = 0;
        for (int m = 0; m < n; m++) {
            if (quad[m]) {
                double lo = Math.max(0, tau[m] - 8 * sigma);
                double hi = tau[m] + 8 * sigma;
                for (double x : GL_NODES) {
                    times[c++] = lo + (hi - lo) * (x + 1) / 2;
                }
            } else if (tau[m] >= 0) {
                times[c++] = tau[m];
            }
        }
        double[] sorted = times.clone();
        Arrays.sort(sorted);
        double[] uniq = distinct(sorted);
        double[] bu = uniq.length == 0 ? new double[0] : k.trace(after, uniq).bleach();
        double[] out = new double[n];
        c = 0;
        for (int m = 0; m < n; m++) {
            double step = bBefore * 0.5 * Erf.erfc(tau[m] / (Math.sqrt(2) * sigma));
            if (quad[m]) {
                double lo = Math.max(0, tau[m] - 8 * sigma);
                double hi = tau[m] + 8 * sigma;
                double sum = 0;
                for (int q = 0; q < GL_NODES.length; q++) {
                    double u = times[c++];
                    double z = (tau[m] - u) / sigma;
                    sum += GL_WEIGHTS[q] * Math.exp(-0.5 * z * z) * lookup(uniq, bu, u);
                }
                out[m] = step + sum * (hi - lo) / 2 / (sigma * Math.sqrt(2 * Math.PI));
            } else if (tau[m] >= 0) {
                out[m] = lookup(uniq, bu, times[c++]);
            } else {
                out[m] = bBefore;
            }
        }
        return out;
    }

    private static double[] distinct(double[] sorted) {
        int w = 0;
        double[] out = new double[sorted.length];
        for (double v : sorted) {
            if (w == 0 || v > out[w - 1]) {
                out[w++] = v;
            }
        }
        return Arrays.copyOf(out, w);
    }

    private static double lookup(double[] x, double[] y, double at) {
        return y[Arrays.binarySearch(x, at)];
    }

    private static double optional(ParameterValues p, String key, double fallback) {
        int i = p.indexOf(key);
        return i < 0 ? fallback : p.value(i, 0);
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }
}
