package org.ladderkin.excite;

/**
 * How well the excitation is known: relative standard uncertainties of the quantities ⟨N⟩ is computed from. NaN
 * means "not stated"; {@link #orDefaults()} fills each with this project's default.
 *
 * @param pulseEnergyRel  pulse energy (power meter reading and its conversion by the repetition rate)
 * @param pumpRadiusRel   pump 1/e² radius at the sample
 * @param probeRadiusRel  probe 1/e² radius at the sample
 * @param crossSectionRel σ at the pump wavelength (NaN: take the cross-section's own stated uncertainty)
 */
public record Calibration(double pulseEnergyRel, double pumpRadiusRel, double probeRadiusRel, double crossSectionRel) {

    /**
     * Defaults when a plan or a command states nothing (common practice, no source): a thermal power meter's
     * calibration and reading about 5 %; a 1/e² radius from a knife-edge scan or camera about 5 % (beam ellipticity
     * and distance from the waist included).
     */
    public static final double DEFAULT_PULSE_ENERGY_REL = 0.05;
    public static final double DEFAULT_RADIUS_REL = 0.05;

    /** Nothing stated. */
    public static final Calibration UNSTATED = new Calibration(Double.NaN, Double.NaN, Double.NaN, Double.NaN);

    public Calibration {
        for (double r : new double[] {pulseEnergyRel, pumpRadiusRel, probeRadiusRel, crossSectionRel}) {
            if (!Double.isNaN(r) && !(r >= 0 && r < 1)) {
                throw new IllegalArgumentException("relative uncertainties must be in [0, 1) (e.g. 0.05 for 5 %), was " + r);
            }
        }
    }

    /** Stated values, each unstated energy and radius uncertainty replaced by its default (σ's stays NaN if unstated). */
    public Calibration orDefaults() {
        return new Calibration(Double.isNaN(pulseEnergyRel) ? DEFAULT_PULSE_ENERGY_REL : pulseEnergyRel,
                Double.isNaN(pumpRadiusRel) ? DEFAULT_RADIUS_REL : pumpRadiusRel,
                Double.isNaN(probeRadiusRel) ? (Double.isNaN(pumpRadiusRel) ? DEFAULT_RADIUS_REL : pumpRadiusRel) : probeRadiusRel,
                crossSectionRel);
    }
}
