package org.ladderkin.plan;

import org.ladderkin.observe.MeasuredIrf;

/**
 * A detection instrument of the campaign. All values SI.
 *
 * @param kind            what it measures
 * @param minDelayS       shortest useful delay (TA) or time bin (TCSPC) (s)
 * @param maxDelayS       longest delay the stage reaches (TA) or the TCSPC time range (s)
 * @param noiseFloor      TA: rms noise of ΔA per averaged point (OD); TCSPC: unused (0)
 * @param irfFwhmS        instrument response FWHM (s); with a measured response, that curve's FWHM
 * @param maxCountFraction TCSPC: highest detected-photon rate as a fraction of the repetition rate; TA: unused (0)
 * @param measuredIrf     the measured instrument response, or null when only its FWHM is known (a Gaussian is assumed)
 * @param timeZeroUncertaintyS how well time zero is known before the fit (s; NaN: not stated)
 * @param irfWidthRel     relative uncertainty of the IRF FWHM (NaN: not stated)
 */
public record Instrument(Kind kind, double minDelayS, double maxDelayS, double noiseFloor, double irfFwhmS,
                         double maxCountFraction, MeasuredIrf measuredIrf, double timeZeroUncertaintyS, double irfWidthRel) {

    /**
     * Defaults when the plan states nothing (common practice, no source): time zero located to a quarter of the IRF
     * FWHM before the fit, and the IRF FWHM known to 10 %.
     */
    public static final double DEFAULT_TIME_ZERO_PER_IRF = 0.25;
    public static final double DEFAULT_IRF_WIDTH_REL = 0.10;

    /** Instrument families. The key is how plan files name them. */
    public enum Kind {
        TRANSIENT_ABSORPTION("transient-absorption"),
        TCSPC("tcspc");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    public Instrument {
        if (!Double.isNaN(timeZeroUncertaintyS) && !(timeZeroUncertaintyS >= 0 && Double.isFinite(timeZeroUncertaintyS))) {
            throw new IllegalArgumentException("time-zero uncertainty must be finite and >= 0, was " + timeZeroUncertaintyS + " s");
        }
        if (!Double.isNaN(irfWidthRel) && !(irfWidthRel >= 0 && irfWidthRel < 1)) {
            throw new IllegalArgumentException("IRF width uncertainty must be in [0, 1), was " + irfWidthRel);
        }
        if (!(minDelayS < maxDelayS)) {
            throw new IllegalArgumentException("delay range is empty or reversed: " + minDelayS + " s to " + maxDelayS + " s");
        }
        if (measuredIrf != null && Math.abs(irfFwhmS - measuredIrf.fwhmS()) > 1e-9 * measuredIrf.fwhmS()) {
            throw new IllegalArgumentException("IRF FWHM " + irfFwhmS + " s differs from the measured response's "
                    + measuredIrf.fwhmS() + " s (use withMeasuredIrf)");
        }
    }

    /** An instrument whose response is a Gaussian of FWHM {@code irfFwhmS}. */
    public Instrument(Kind kind, double minDelayS, double maxDelayS, double noiseFloor, double irfFwhmS, double maxCountFraction) {
        this(kind, minDelayS, maxDelayS, noiseFloor, irfFwhmS, maxCountFraction, null);
    }

    /** An instrument whose time zero and IRF width uncertainties are not stated. */
    public Instrument(Kind kind, double minDelayS, double maxDelayS, double noiseFloor, double irfFwhmS, double maxCountFraction,
                      MeasuredIrf measuredIrf) {
        this(kind, minDelayS, maxDelayS, noiseFloor, irfFwhmS, maxCountFraction, measuredIrf, Double.NaN, Double.NaN);
    }

    /** Time zero's uncertainty, stated or the default. */
    public double timeZeroUncertaintyOrDefault() {
        return Double.isNaN(timeZeroUncertaintyS) ? DEFAULT_TIME_ZERO_PER_IRF * irfFwhmS : timeZeroUncertaintyS;
    }

    /** The IRF width's relative uncertainty, stated or the default. */
    public double irfWidthRelOrDefault() {
        return Double.isNaN(irfWidthRel) ? DEFAULT_IRF_WIDTH_REL : irfWidthRel;
    }

    /** This instrument with a measured response; its FWHM replaces {@link #irfFwhmS()} (the instance is not changed). */
    public Instrument withMeasuredIrf(MeasuredIrf irf) {
        return new Instrument(kind, minDelayS, maxDelayS, noiseFloor, irf.fwhmS(), maxCountFraction, irf, timeZeroUncertaintyS, irfWidthRel);
    }
}
