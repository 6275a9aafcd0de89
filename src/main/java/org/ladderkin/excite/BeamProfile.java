package org.ladderkin.excite;

/**
 * The transverse fluence profile of a beam at the sample, normalised to unit pulse energy. For a probe the same
 * profile is the weight with which each radius contributes to the measured signal.
 */
public sealed interface BeamProfile permits GaussianBeam, FlatTopBeam {

    /** The characteristic radius (m): 1/e² intensity radius of a Gaussian, edge of a flat top. */
    double radiusM();

    /** Peak fluence per unit pulse energy (1/m²); its inverse is the effective area. */
    double peakFluencePerJoule();

    /** Fluence at radius {@code rM} relative to the peak, in [0, 1]. */
    double shape(double rM);

    /** Fraction of the pulse energy inside radius {@code rM}, in [0, 1]. */
    double cumulative(double rM);

    /** The radius inside which a fraction {@code t} of the energy lies (inverse of {@link #cumulative}). */
    double radiusAtCumulative(double t);

    /** d(cumulative)/dr (1/m): the weight of radius r when this beam is the probe. */
    double weightDensity(double rM);

    /** Radius (m) beyond which the probe weight is negligible (below 1e-16 of the total). */
    double weightLimitM();

    /** Radii where the profile jumps (m); quadrature splits there. */
    double[] edgesM();

    /** Effective area E/F_peak (m²): πw²/2 for a Gaussian, πR² for a flat top. */
    default double effectiveAreaM2() {
        return 1.0 / peakFluencePerJoule();
    }

    /** Short description, e.g. "Gaussian, w = 100 µm (FWHM 117.7 µm)". */
    String describe();
}
