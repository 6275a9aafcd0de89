package org.ladderkin.kinetics.ensemble;

/**
 * The pump pulse's shape as far as the kinetics need it.
 *
 * @param fwhmS    intensity FWHM (s); 0 for a pulse taken as instantaneous
 * @param resonant whether the pump is within a line width of the band edge (absorption saturates and stimulates
 *                 emission)
 */
public record PumpPulse(double fwhmS, boolean resonant) {

    /** An instantaneous pulse far above the gap. */
    public static final PumpPulse INSTANT = new PumpPulse(0, false);

    /**
     * Pulse width × fastest rate of a populated state above which the pulse is not short: the populations then change
     * by more than about 1 % during the pulse.
     */
    public static final double SHORT = 0.01;
    /** Probability above which a state counts as populated for the fastest rate. */
    public static final double POPULATED = 1e-3;

    public PumpPulse {
        if (!(fwhmS >= 0) || !Double.isFinite(fwhmS)) {
            throw new IllegalArgumentException("pulse FWHM must be finite and >= 0 s, was " + fwhmS);
        }
        if (resonant && fwhmS == 0) {
            throw new IllegalArgumentException("a resonant pump needs its pulse width (saturation depends on the flux)");
        }
    }
}
