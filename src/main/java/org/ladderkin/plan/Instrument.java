package org.ladderkin.plan;

/**
 * A detection instrument of the campaign. All values SI.
 *
 * @param kind            what it measures
 * @param minDelayS       shortest useful delay (TA) or time bin (TCSPC) (s)
 * @param maxDelayS       longest delay the stage reaches (TA) or the TCSPC time range (s)
 * @param noiseFloor      TA: rms noise of ΔA per averaged point (OD); TCSPC: unused (0)
 * @param irfFwhmS        instrument response FWHM (s)
 * @param maxCountFraction TCSPC: highest detected-photon rate as a fraction of the repetition rate; TA: unused (0)
 */
public record Instrument(Kind kind, double minDelayS, double maxDelayS, double noiseFloor, double irfFwhmS,
                         double maxCountFraction) {

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
    }
}
