package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.excite.ExcitationGeometry;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.process.TrappingProcess;
import org.ladderkin.observe.MeasuredIrf;

/**
 * How to fit a fluence series with the ladder model: the model to start from, which shared parameters are free, and
 * the starts of those the model file does not hold.
 *
 * @param base           the ladder (processes, scaling laws, charges …); its fittable lifetimes are the starts
 * @param periodS        pulse period (s), or NaN for one pulse on fresh dots
 * @param free           shared parameters fitted; the others are held at their starts
 * @param scaleStart     start of the excitation scale (σ in m², ⟨N⟩ per J, or a factor), or NaN to try a few
 * @param timeZeroStartS start of time zero (s)
 * @param irfFwhmS       Gaussian IRF FWHM start (s), or NaN for no Gaussian IRF
 * @param sharedAmplitude one amplitude for all traces and no baselines, instead of per-trace amplitude and baseline
 * @param profile        add profile-likelihood intervals for τ₂ and the scale
 * @param measuredIrf    a measured instrument response to convolve with instead of a Gaussian (its width is then
 *                       fixed, its centroid at time zero), or null
 * @param geometry       pump and probe spots and the pump's absorbance through the sample, or null for a pump uniform
 *                       over the probe in a thin sample; with it, each trace's excitation is its on-axis (peak),
 *                       front-face value and the model is averaged over the spot and the depth
 * @param fluenceScaleUncertainty relative standard uncertainty of the excitation calibration (0 for none): a Gaussian
 *                       prior on a common factor on every trace's excitation, carried into the total errors
 */
public record LadderFitSetup(LadderModel base, double periodS, Set<LadderParameter> free, double scaleStart,
                             double timeZeroStartS, double irfFwhmS, boolean sharedAmplitude, boolean profile,
                             MeasuredIrf measuredIrf, ExcitationGeometry geometry, double fluenceScaleUncertainty) {

    public LadderFitSetup {
        if (!(fluenceScaleUncertainty >= 0 && fluenceScaleUncertainty < 1)) {
            throw new IllegalArgumentException("fluence calibration uncertainty must be in [0, 1) (a fraction), was "
                    + fluenceScaleUncertainty);
        }
        Objects.requireNonNull(base, "base");
        free = Set.copyOf(free);
        if (!Double.isNaN(scaleStart) && !(scaleStart > 0 && Double.isFinite(scaleStart))) {
            throw new IllegalArgumentException("excitation scale start must be finite and > 0, was " + scaleStart);
        }
        if (!Double.isFinite(timeZeroStartS)) {
            throw new IllegalArgumentException("time zero start must be finite, was " + timeZeroStartS + " s");
        }
        if (!Double.isNaN(irfFwhmS) && !(irfFwhmS > 0 && Double.isFinite(irfFwhmS))) {
            throw new IllegalArgumentException("IRF FWHM must be finite and > 0, was " + irfFwhmS + " s");
        }
        if (measuredIrf != null && free.contains(LadderParameter.IRF)) {
            throw new IllegalArgumentException("the IRF width cannot be fitted with a measured IRF (" + measuredIrf.origin()
                    + " fixes its shape and width; time zero stays free): remove 'irf' from the fitted parameters");
        }
        if (measuredIrf != null && !Double.isNaN(irfFwhmS)) {
            throw new IllegalArgumentException("give either a Gaussian IRF width (" + irfFwhmS + " s) or a measured IRF ("
                    + measuredIrf.origin() + "), not both");
        }
        if (free.contains(LadderParameter.IRF) && Double.isNaN(irfFwhmS)) {
            throw new IllegalArgumentException("fitting the IRF width needs a start value for it");
        }
        for (LadderParameter p : free) {
            ProcessParameter pp = p.process();
            if (pp != null && !base.has(pp) && ProcessRegistry.owner(pp).startWhenFreed(base) == null) {
                throw new IllegalArgumentException("fitting " + p.key() + " needs a model with the '"
                        + ProcessRegistry.owner(pp).section() + "' process switched on");
            }
        }
    }

    /** A set-up without beam geometry or calibration uncertainty. */
    public LadderFitSetup(LadderModel base, double periodS, Set<LadderParameter> free, double scaleStart,
                          double timeZeroStartS, double irfFwhmS, boolean sharedAmplitude, boolean profile,
                          MeasuredIrf measuredIrf) {
        this(base, periodS, free, scaleStart, timeZeroStartS, irfFwhmS, sharedAmplitude, profile, measuredIrf, null, 0);
    }

    /** A copy averaging the model over {@code newGeometry} (null: uniform pump, thin sample). */
    public LadderFitSetup withGeometry(ExcitationGeometry newGeometry) {
        return new LadderFitSetup(base, periodS, free, scaleStart, timeZeroStartS, irfFwhmS, sharedAmplitude, profile,
                measuredIrf, newGeometry, fluenceScaleUncertainty);
    }

    /** A copy with a relative calibration uncertainty on the excitation scale. */
    public LadderFitSetup withFluenceScaleUncertainty(double relative) {
        return new LadderFitSetup(base, periodS, free, scaleStart, timeZeroStartS, irfFwhmS, sharedAmplitude, profile,
                measuredIrf, geometry, relative);
    }

    /** Start of the Gaussian IRF width freed by {@link #withTimeZeroFreedFor} (s): a typical amplified-laser response. */
    public static final double DEFAULT_IRF_START_S = 0.2e-12;

    /**
     * The default for data that hold delays before zero: time zero freed (the points before the pulse pin it; held at
     * 0, a shifted time zero is absorbed by σ and τ₂) and, unless an IRF is given, a Gaussian IRF freed from
     * {@link #DEFAULT_IRF_START_S}, because without one the model is a step and its misfit jumps from point to point as
     * time zero moves, which leaves the optimiser stuck. Data that start at or after zero get this set-up unchanged.
     */
    public LadderFitSetup withTimeZeroFreedFor(Dataset data) {
        if (data.traces().stream().noneMatch(t -> t.delaysS()[0] < 0)) {
            return this;
        }
        Set<LadderParameter> more = new java.util.LinkedHashSet<>(free);
        more.add(LadderParameter.TIME_ZERO);
        double irf = irfFwhmS;
        if (measuredIrf == null && Double.isNaN(irfFwhmS)) {
            irf = DEFAULT_IRF_START_S;
            more.add(LadderParameter.IRF);
        }
        return new LadderFitSetup(base, periodS, more, scaleStart, timeZeroStartS, irf, sharedAmplitude, profile,
                measuredIrf, geometry, fluenceScaleUncertainty);
    }

    /** A set-up with no measured IRF (a Gaussian of {@code irfFwhmS}, or none when it is NaN). */
    public LadderFitSetup(LadderModel base, double periodS, Set<LadderParameter> free, double scaleStart,
                          double timeZeroStartS, double irfFwhmS, boolean sharedAmplitude, boolean profile) {
        this(base, periodS, free, scaleStart, timeZeroStartS, irfFwhmS, sharedAmplitude, profile, null);
    }

    /**
     * A shared parameter a ladder fit can free: the excitation scale, time zero, the Gaussian IRF width, or a fittable
     * lifetime of a process in {@link ProcessRegistry} (whose user name, e.g. "tau-auger2", comes from the registry).
     *
     * @param key     the name users write, e.g. "tau-auger2"
     * @param process the process parameter, or null for scale, time zero and IRF
     */
    public record LadderParameter(String key, ProcessParameter process) {

        /** σ, ⟨N⟩ per joule or a factor on the given ⟨N⟩. */
        public static final LadderParameter SCALE = new LadderParameter("scale", null);
        /** Time zero. */
        public static final LadderParameter TIME_ZERO = new LadderParameter("time-zero", null);
        /** Gaussian IRF FWHM (never with a measured IRF). */
        public static final LadderParameter IRF = new LadderParameter("irf", null);
        /**
         * Carrier-multiplication probability η per absorbed photon, shared across the series (one photon energy); the
         * excitation scale then gives absorbed photons and each pulse follows the compound-Poisson law.
         */
        public static final LadderParameter MULTIPLICATION_YIELD = new LadderParameter("multiplication-yield", null);
        /** Biexciton Auger lifetime; higher Auger rates follow the model's scaling law. */
        public static final LadderParameter TAU_AUGER2 = of(AugerProcess.BIEXCITON_LIFETIME);
        /** Single-exciton radiative lifetime. */
        public static final LadderParameter TAU_RAD = of(RadiativeProcess.LIFETIME);
        /** Trapping lifetime per exciton. */
        public static final LadderParameter TAU_TRAP = of(TrappingProcess.LIFETIME);

        public LadderParameter {
            Objects.requireNonNull(key, "key");
            if (process != null && !process.fittable()) {
                throw new IllegalArgumentException(process.key() + " cannot be fitted");
            }
        }

        /** The fit parameter of a fittable process lifetime. */
        public static LadderParameter of(ProcessParameter p) {
            return new LadderParameter(p.fitName(), p);
        }

        /** Every parameter a ladder fit can free, in the order results list them. */
        public static List<LadderParameter> values() {
            List<LadderParameter> all = new ArrayList<>();
            all.add(SCALE);
            ProcessRegistry.fittable().forEach(p -> all.add(of(p)));
            all.add(MULTIPLICATION_YIELD);
            all.add(TIME_ZERO);
            all.add(IRF);
            return List.copyOf(all);
        }

        /** By user name. */
        public static LadderParameter of(String name) {
            for (LadderParameter p : values()) {
                if (p.key.equals(name.trim())) {
                    return p;
                }
            }
            throw new IllegalArgumentException("'" + name.trim() + "' is not a ladder fit parameter (one of: "
                    + String.join(", ", values().stream().map(LadderParameter::key).toList()) + ")");
        }

        /** What a person reads, e.g. "Biexciton Auger lifetime τ₂". */
        public String label() {
            if (process != null) {
                return process.label();
            }
            return switch (key) {
                case "scale" -> "scale (σ, ⟨N⟩ per J or factor)";
                case "time-zero" -> "time zero";
                case "multiplication-yield" -> "multiplication yield η (second exciton per absorbed photon)";
                default -> "IRF FWHM";
            };
        }
    }
}
