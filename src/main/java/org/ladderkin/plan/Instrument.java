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
 */
public record Instrument(Kind kind, double minDelayS, double maxDelayS, double noiseFloor, double irfFwhmS,
                         double maxCountFraction, MeasuredIrf measuredIrf) {

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

    /** This instrument with a measured response; its FWHM replaces {@link #irfFwhmS()} (the instance is not changed). */
    public Instrument withMeasuredIrf(MeasuredIrf irf) {
        return new Instrument(kind, minDelayS, maxDelayS, noiseFloor, irf.fwhmS(), maxCountFraction, irf);
    }
}
