// Over 400 lines: the bleach, its pulse-train steady state and both instrument-response convolutions share one cached ladder.
package org.ladderkin.fit;

import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.hipparchus.special.Erf;
import org.ladderkin.excite.ExcitationGeometry;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.observe.MeasuredIrf;

/**
 * The ladder model as a fit model for a transient-absorption fluence series: trace i is
 * ΔA_i(t) = −A·(g ⊗ b)(t − t₀; ⟨N⟩_i), where b is the band-edge bleach of the ladder (in the pulse-train steady state
 * when a period is given, else after one pulse on fresh dots), ⟨N⟩_i = s·x_i with x_i the trace's recorded excitation
 * (photon fluence, pulse energy or nominal ⟨N⟩) and s the shared scale (σ, ⟨N⟩ per joule, or a factor), and g an
 * optional Gaussian instrument response. Before time zero the signal is the bleach left over from earlier pulses.
 * <p>
 * With a beam geometry (pump and probe spots, pump attenuation over the depth) x_i is the on-axis, front-face value
 * and b is the probe-weighted average of the ladder's bleach over ⟨N⟩(r, z) = s·x_i·shape(r)·10^(−A·z/L), taken as
 * in {@link org.ladderkin.excite.ExcitationGeometry#average}; the post-pulse populations are averaged over a fixed
 * quadrature ({@link GeometryQuadrature}) and propagated once, which the ladder's linearity in populations allows.
 * <p>
 * Optional parameters (absent from the problem: A = 1, t₀ = 0, no IRF): {@link #AMPLITUDE}, {@link #TIME_ZERO},
 * {@link #IRF_FWHM}. The kinetic parameters (τ₂, τ₁, trapping, …) are whatever the {@code ladder} function reads; the
 * ladder is rebuilt only when one of {@code kineticKeys} changes, so the fitter's per-trace calls and its derivatives
 * in s, A, t₀ and the IRF share one decomposition.
 * <p>
 * The IRF is applied by Gauss–Legendre quadrature of the convolution integral at each delay, so any delay grid
 * (log-spaced included) works; beyond 50 IRF widths after time zero it is skipped, where it changes the signal by
 * less than about 1e-4 of the fast component (the worst case, a decay time of 25 σ, gives (σ/τ)²·e⁻²/2).
 * <p>
 * A {@link MeasuredIrf} replaces the Gaussian when given: its centroid sits at t₀, its width is fixed (giving
 * {@link #IRF_FWHM} as well is an error), and the same reasoning skips it beyond both its last sample and 50 of its
 * root-mean-square widths (with zero mean the first-order change vanishes, as for the Gaussian).
 */
public final class LadderBleachModel implements TraceModel {

    /** Shared amplitude A (OD); leave it out when per-trace amplitudes come from {@link LinearTerms}. */
    public static final String AMPLITUDE = "amplitudeOd";
    /** Time zero t₀ (s). */
    public static final String TIME_ZERO = "timeZeroS";
    /** FWHM of the Gaussian instrument response (s). */
    public static final String IRF_FWHM = "irfFwhmS";
    /**
     * Carrier-multiplication probability η per absorbed photon (pure number in [0, 1]); with it, s·x_i is the mean
     * number of absorbed photons and each pulse adds excitons by the compound-Poisson law of
     * {@link org.ladderkin.excite.Occupancy#compoundPoisson}. Absent: Poisson excitation with mean s·x_i.
     */
    public static final String MULTIPLICATION_YIELD = "multiplicationYield";
    /** Biexciton Auger lifetime τ₂ (s), read by {@link #forModel}. */
    public static final String TAU_AUGER2 = kineticKey(AugerProcess.BIEXCITON_LIFETIME);

    private static final double IRF_REACH = 50;
    /** Node of two-point Gauss–Legendre on [−1, 1] (weights 1). */
    private static final double GL2 = 1 / Math.sqrt(3);
    /** Grid points per FWHM of a measured response on which the ladder is evaluated and interpolated. */
    private static final int IRF_GRID_PER_FWHM = 40;
    private static final double[] GL_NODES = org.ladderkin.observe.GaussLegendre.nodes24();
    private static final double[] GL_WEIGHTS = org.ladderkin.observe.GaussLegendre.weights24();

    private final List<String> kineticKeys;
    private final Function<ParameterValues, KineticModel> ladder;
    private final String scaleKey;
    private final double[] excitation;
    private final double periodS;
    private final MeasuredIrf measuredIrf;
    private final ExcitationGeometry geometry;
    private final GeometryQuadrature spots;
    /** The measured response's sample times minus its centroid (s), and its density there (1/s). */
    private final double[] irfOffsetsS;
    private final double[] irfDensityPerS;
    /** Past this τ (s) the measured convolution is skipped; the ladder grid's spacing (s). */
    private final double irfReachS;
    private final double irfGridStepS;
    private double[] cachedKinetic;
    private double cachedTopN;
    private boolean cachedForYield;
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
        this(kineticKeys, ladder, scaleKey, excitation, periodS, null);
    }

    /**
     * As {@link #LadderBleachModel(List, Function, String, double[], double)}, convolved with a measured instrument
     * response instead of the Gaussian.
     *
     * @param measuredIrf the measured response (its centroid at t₀), or null for none / the Gaussian {@link #IRF_FWHM}
     */
    public LadderBleachModel(List<String> kineticKeys, Function<ParameterValues, KineticModel> ladder, String scaleKey,
                             double[] excitation, double periodS, MeasuredIrf measuredIrf) {
        this(kineticKeys, ladder, scaleKey, excitation, periodS, measuredIrf, null);
    }

    /**
     * As {@link #LadderBleachModel(List, Function, String, double[], double, MeasuredIrf)}, averaged over the beam
     * geometry; x_i are then on-axis, front-face values.
     *
     * @param geometry pump and probe spots and the pump's absorbance, or null for a pump uniform over the probe in a
     *                 thin sample
     */
    public LadderBleachModel(List<String> kineticKeys, Function<ParameterValues, KineticModel> ladder, String scaleKey,
                             double[] excitation, double periodS, MeasuredIrf measuredIrf, ExcitationGeometry geometry) {
        this.measuredIrf = measuredIrf;
        this.geometry = geometry;
        this.spots = geometry == null ? GeometryQuadrature.uniform() : GeometryQuadrature.of(geometry);
        if (measuredIrf == null) {
            irfOffsetsS = null;
            irfDensityPerS = null;
            irfReachS = Double.NaN;
            irfGridStepS = Double.NaN;
        } else {
            double c = measuredIrf.centroidS();
            irfOffsetsS = measuredIrf.timesS();
            for (int j = 0; j < irfOffsetsS.length; j++) {
                irfOffsetsS[j] -= c;
            }
            irfDensityPerS = measuredIrf.densityPerS();
            irfReachS = Math.max(irfOffsetsS[irfOffsetsS.length - 1], IRF_REACH * measuredIrf.rmsWidthS());
            irfGridStepS = measuredIrf.fwhmS() / IRF_GRID_PER_FWHM;
        }
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
     * The ladder of {@code base} with every fittable process lifetime ({@link ProcessRegistry#fittable()}, keys
     * {@link #kineticKey}) taken from the fit when it has it; a freed lifetime whose process {@code base} lacks adds
     * that process. Every other process (scaling laws, charges, cooling, refresh) stays as in {@code base}.
     */
    public static LadderBleachModel forModel(LadderModel base, String scaleKey, double[] excitation, double periodS) {
        return forModel(base, scaleKey, excitation, periodS, null);
    }

    /** As {@link #forModel(LadderModel, String, double[], double)}, with a measured response (or null). */
    public static LadderBleachModel forModel(LadderModel base, String scaleKey, double[] excitation, double periodS,
                                             MeasuredIrf measuredIrf) {
        return forModel(base, scaleKey, excitation, periodS, measuredIrf, null);
    }

    /** As {@link #forModel(LadderModel, String, double[], double, MeasuredIrf)}, averaged over a beam geometry (or null). */
    public static LadderBleachModel forModel(LadderModel base, String scaleKey, double[] excitation, double periodS,
                                             MeasuredIrf measuredIrf, ExcitationGeometry geometry) {
        List<ProcessParameter> fittable = ProcessRegistry.fittable();
        List<String> keys = fittable.stream().map(LadderBleachModel::kineticKey).toList();
        return new LadderBleachModel(keys, p -> {
            LadderModel m = base;
            for (ProcessParameter pp : fittable) {
                int i = p.indexOf(kineticKey(pp));
                if (i >= 0) {
                    if (!m.has(pp)) {
                        m = m.with(ProcessRegistry.owner(pp).startWhenFreed(m));
                    }
                    m = m.withSeconds(pp, p.value(i, 0));
                }
            }
            return m.toModel();
        }, scaleKey, excitation, periodS, measuredIrf, geometry);
    }

    /** The fit key of a fittable process lifetime, e.g. "tauAuger2S". */
    public static String kineticKey(ProcessParameter p) {
        return p.fitKey() + "S";
    }

    /** The measured instrument response the model convolves with, if any. */
    public java.util.Optional<MeasuredIrf> measuredIrf() {
        return java.util.Optional.ofNullable(measuredIrf);
    }

    @Override
    public int traceCount() {
        return excitation.length;
    }

    /** The beam geometry averaged over, if any. */
    public java.util.Optional<ExcitationGeometry> geometry() {
        return java.util.Optional.ofNullable(geometry);
    }

    /** ⟨N⟩ of trace {@code trace} at these parameters, as the probe sees it (averaged over spot and depth). */
    public double meanOccupancy(int trace, ParameterValues p) {
        return peakOccupancy(trace, p) * spots.linearFactor();
    }

    /**
     * Largest on-axis ⟨N⟩ the model evaluates in a fit. Its ladder then needs about 160 states; a fluence series that
     * reaches further has left the regime a Poisson-filled exciton ladder describes, and only a wandering optimiser
     * step asks for it.
     */
    public static final double MAX_FIT_OCCUPANCY = 100;

    /** ⟨N⟩ of trace {@code trace} on the pump axis at the front face (= {@link #meanOccupancy} without a geometry). */
    public double peakOccupancy(int trace, ParameterValues p) {
        return p.get(scaleKey) * excitation[trace];
    }

    /** The on-axis ⟨N⟩ of a trace, refused beyond {@link #MAX_FIT_OCCUPANCY} before any ladder is built for it. */
    private double reachableOccupancy(int trace, ParameterValues p) {
        double n = peakOccupancy(trace, p);
        if (!(n <= MAX_FIT_OCCUPANCY)) {
            throw new ExcitationOutOfReach(n, MAX_FIT_OCCUPANCY);
        }
        return n;
    }

    /** Populations just before and just after a pulse of on-axis ⟨N⟩ {@code nPeak}, averaged over the geometry. */
    private Populations[] averagedPulse(LadderKinetics k, double nPeak, double eta) {
        if (spots.size() == 1 && spots.factor(0) == 1) {
            return pulse(k, nPeak, eta);
        }
        int size = k.space().size();
        double[] before = new double[size];
        double[] after = new double[size];
        double total = 0;
        for (int q = 0; q < spots.size(); q++) {
            Populations[] ba = pulse(k, nPeak * spots.factor(q), eta);
            double w = spots.weight(q);
            total += w;
            double[] pb = ba[0].probabilities();
            double[] pa = ba[1].probabilities();
            for (int s = 0; s < size; s++) {
                before[s] += w * pb[s];
                after[s] += w * pa[s];
            }
        }
        for (int s = 0; s < size; s++) {
            before[s] /= total;
            after[s] /= total;
        }
        return new Populations[] {new Populations(k.space(), before), new Populations(k.space(), after)};
    }

    private Populations[] pulse(LadderKinetics k, double n, double eta) {
        PulseExcitation pulse = Double.isNaN(eta) ? new PulseExcitation.Poisson(n) : new PulseExcitation.Multiplication(n, eta);
        if (Double.isNaN(periodS)) {
            Populations ground = Populations.ground(k.space());
            return new Populations[] {ground, k.applyPulse(ground, pulse)};
        }
        SteadyState ss = k.steadyState(pulse, periodS, false);
        return new Populations[] {ss.beforePulse(), ss.afterPulse()};
    }

    @Override
    public synchronized double[] predict(int trace, double[] delaysS, ParameterValues p) {
        LadderKinetics k = kinetics(p);
        Populations[] ba = averagedPulse(k, reachableOccupancy(trace, p), optional(p, MULTIPLICATION_YIELD, Double.NaN));
        Populations before = ba[0];
        Populations after = ba[1];
        double t0 = optional(p, TIME_ZERO, 0);
        double fwhm = optional(p, IRF_FWHM, 0);
        double bBefore = dot(bleachObservable, before.probabilities());
        double[] b;
        if (measuredIrf != null) {
            if (p.indexOf(IRF_FWHM) >= 0) {
                throw new IllegalArgumentException("the model convolves with the measured IRF from " + measuredIrf.origin()
                        + "; a Gaussian IRF width (" + IRF_FWHM + ") cannot be given as well");
            }
            b = measuredConvolved(k, after, bBefore, delaysS, t0);
        } else {
            b = fwhm > 0 ? convolved(k, after, bBefore, delaysS, t0, fwhm) : stepped(k, after, bBefore, delaysS, t0);
        }
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
        return averagedPulse(k, reachableOccupancy(trace, p), optional(p, MULTIPLICATION_YIELD, Double.NaN))[0].chargedFraction();
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
        if (!(topN <= MAX_FIT_OCCUPANCY)) {
            throw new ExcitationOutOfReach(topN, MAX_FIT_OCCUPANCY);
        }
        // the ladder's Nmax depends on the strongest pulse: build with headroom so small steps in s reuse it
        boolean yield = p.indexOf(MULTIPLICATION_YIELD) >= 0;
        if (cached == null || !Arrays.equals(kin, cachedKinetic) || topN > cachedTopN || yield && !cachedForYield) {
            double headroom = Math.min(topN * 1.5, MAX_FIT_OCCUPANCY);
            // with multiplication the ladder is sized for η = 1, the widest law, so trying another η never rebuilds it
            cached = LadderKinetics.forPulses(ladder.apply(p), yield
                    ? new PulseExcitation.Multiplication(headroom, 1) : new PulseExcitation.Poisson(headroom));
            cachedKinetic = kin;
            cachedTopN = headroom;
            cachedForYield = yield;
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

    /**
     * (g ⊗ s)(τ) with g the measured response, read as piecewise linear between its samples, centred on its centroid:
     * the step part bBefore·∫_τ^∞ g exactly, the decay part ∫ g(x) b(τ − x) dx over x &lt; τ by two-point
     * Gauss–Legendre on each segment between samples (split into pieces of at most FWHM/{@value #IRF_GRID_PER_FWHM}·2),
     * cut at x = τ, so the integrand is smooth on every piece and the result moves smoothly with t₀.
     * <p>
     * The ladder is evaluated once per call, on one sorted list of distinct times: a uniform grid in u = τ − x of
     * spacing FWHM/{@value #IRF_GRID_PER_FWHM} from 0 to the largest u needed, where b is read by four-point
     * (cubic) Lagrange interpolation, plus the delays past the response. Evaluating b at every node τ − x instead
     * would cost one ladder time per node (hundreds per delay for a finely sampled response); the cubic's error,
     * at most (h/T)⁴/24 of a component of decay time T, stays below 1e-5 for T ≥ FWHM/4.
     */
    private double[] measuredConvolved(LadderKinetics k, Populations after, double bBefore, double[] delaysS, double t0) {
        double[] x = irfOffsetsS;
        double[] g = irfDensityPerS;
        int segments = x.length - 1;
        double reach = irfReachS;
        double centroid = measuredIrf.centroidS();
        int n = delaysS.length;
        double[] tau = new double[n];
        double uMax = 0;
        int direct = 0;
        for (int m = 0; m < n; m++) {
            tau[m] = delaysS[m] - t0;
            if (tau[m] >= reach) {
                direct++;
            } else if (tau[m] > x[0]) {
                uMax = Math.max(uMax, tau[m] - x[0]);
            }
        }
        int cells = uMax > 0 ? Math.max(3, (int) Math.ceil(uMax / irfGridStepS)) : 0;
        double h = cells > 0 ? uMax / cells : 0;
        double[] times = new double[(cells > 0 ? cells + 1 : 0) + direct];
        int c = 0;
        for (int i = 0; i <= cells && cells > 0; i++) {
            times[c++] = i * h;
        }
        for (int m = 0; m < n; m++) {
            if (tau[m] >= reach) {
                times[c++] = tau[m];
            }
        }
        double[] sorted = times.clone();
        Arrays.sort(sorted);
        double[] uniq = distinct(sorted);
        double[] bu = uniq.length == 0 ? new double[0] : k.trace(after, uniq).bleach();
        double[] grid = new double[cells > 0 ? cells + 1 : 0];
        for (int i = 0; i < grid.length; i++) {
            grid[i] = lookup(uniq, bu, times[i]);
        }
        double[] out = new double[n];
        for (int m = 0; m < n; m++) {
            if (tau[m] >= reach) {
                out[m] = lookup(uniq, bu, tau[m]);
            } else if (tau[m] > x[0]) {
                double sum = 0;
                for (int j = 0; j < segments && x[j] < tau[m]; j++) {
                    double end = Math.min(x[j + 1], tau[m]);
                    double slope = (g[j + 1] - g[j]) / (x[j + 1] - x[j]);
                    // pieces no longer than two grid steps, so a coarsely sampled response still meets b smoothly
                    int pieces = (int) Math.ceil((end - x[j]) / (2 * irfGridStepS));
                    double width = (end - x[j]) / pieces;
                    for (int q = 0; q < pieces; q++) {
                        double mid = x[j] + (q + 0.5) * width;
                        double half = width / 2 * GL2;
                        double x1 = mid - half;
                        double x2 = mid + half;
                        sum += width / 2 * ((g[j] + slope * (x1 - x[j])) * cubic(grid, h, tau[m] - x1)
                                + (g[j] + slope * (x2 - x[j])) * cubic(grid, h, tau[m] - x2));
                    }
                }
                out[m] = bBefore * measuredIrf.areaAfter(tau[m] + centroid) + sum;
            } else {
                out[m] = bBefore;
            }
        }
        return out;
    }

    /** Four-point Lagrange interpolation of y, sampled at 0, h, 2h, …, at u (clamped to the sampled range). */
    private static double cubic(double[] y, double h, double u) {
        int last = y.length - 1;
        double s = Math.min(Math.max(u / h, 0), last);
        int i = Math.min(Math.max((int) Math.floor(s) - 1, 0), last - 3);
        double r = s - i;
        // nodes at r = 0, 1, 2, 3
        double l0 = -(r - 1) * (r - 2) * (r - 3) / 6;
        double l1 = r * (r - 2) * (r - 3) / 2;
        double l2 = -r * (r - 1) * (r - 3) / 2;
        double l3 = r * (r - 1) * (r - 2) / 6;
        return l0 * y[i] + l1 * y[i + 1] + l2 * y[i + 2] + l3 * y[i + 3];
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
