package org.ladderkin.fit;

import java.util.EnumSet;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.kinetics.ModelParameters;
import org.ladderkin.observe.MeasuredIrf;

/**
 * How to fit a fluence series with the ladder model: the model to start from, which shared parameters are free, and
 * the starts of those the model file does not hold.
 *
 * @param base           the ladder (rate laws, scaling law, charges …); its τ₂, τ_rad and trapping are the starts
 * @param periodS        pulse period (s), or NaN for one pulse on fresh dots
 * @param free           shared parameters fitted; the others are held at their starts
 * @param scaleStart     start of the excitation scale (σ in m², ⟨N⟩ per J, or a factor), or NaN to try a few
 * @param timeZeroStartS start of time zero (s)
 * @param irfFwhmS       Gaussian IRF FWHM start (s), or NaN for no Gaussian IRF
 * @param sharedAmplitude one amplitude for all traces and no baselines, instead of per-trace amplitude and baseline
 * @param profile        add profile-likelihood intervals for τ₂ and the scale
 * @param measuredIrf    a measured instrument response to convolve with instead of a Gaussian (its width is then
 *                       fixed, its centroid at time zero), or null
 */
public record LadderFitSetup(ModelParameters base, double periodS, Set<LadderParameter> free, double scaleStart,
                             double timeZeroStartS, double irfFwhmS, boolean sharedAmplitude, boolean profile,
                             MeasuredIrf measuredIrf) {

    /** Trapping lifetime tried when trapping is freed but the model has none (s). */
    public static final double DEFAULT_TRAP_START_S = 1e-9;

    public LadderFitSetup {
        Objects.requireNonNull(base, "base");
        free = free.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(free));
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
        if (free.contains(LadderParameter.TAU_AUGER2) && !(base.biexcitonAugerRatePerS() > 0)) {
            throw new IllegalArgumentException("fitting τ₂ needs a model with biexciton Auger decay switched on");
        }
        if (free.contains(LadderParameter.TAU_RAD) && !(base.radiativeRatePerS() > 0)) {
            throw new IllegalArgumentException("fitting τ_rad needs a model with radiative decay switched on");
        }
    }

    /** A set-up with no measured IRF (a Gaussian of {@code irfFwhmS}, or none when it is NaN). */
    public LadderFitSetup(ModelParameters base, double periodS, Set<LadderParameter> free, double scaleStart,
                          double timeZeroStartS, double irfFwhmS, boolean sharedAmplitude, boolean profile) {
        this(base, periodS, free, scaleStart, timeZeroStartS, irfFwhmS, sharedAmplitude, profile, null);
    }

    /** The shared parameters a ladder fit can free. */
    public enum LadderParameter {
        /** σ, ⟨N⟩ per joule or a factor on the given ⟨N⟩. */
        SCALE("scale"),
        /** Biexciton Auger lifetime; higher Auger rates follow the model's scaling law. */
        TAU_AUGER2("tau-auger2"),
        /** Single-exciton radiative lifetime. */
        TAU_RAD("tau-rad"),
        /** Trapping lifetime per exciton. */
        TAU_TRAP("tau-trap"),
        /** Time zero. */
        TIME_ZERO("time-zero"),
        /** Gaussian IRF FWHM (never with a measured IRF). */
        IRF("irf");

        private final String key;

        LadderParameter(String key) {
            this.key = key;
        }

        /** The name users write, e.g. "tau-auger2". */
        public String key() {
            return key;
        }

        /** By user name. */
        public static LadderParameter of(String name) {
            for (LadderParameter p : values()) {
                if (p.key.equals(name.trim())) {
                    return p;
                }
            }
            throw new IllegalArgumentException("'" + name.trim() + "' is not a ladder fit parameter (one of: scale, tau-auger2, "
                    + "tau-rad, tau-trap, time-zero, irf)");
        }
    }
}
