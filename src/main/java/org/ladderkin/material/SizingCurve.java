package org.ladderkin.material;

/**
 * An empirical relation between the diameter of a dot and the photon energy of its first-exciton absorption peak,
 * valid over a stated range of diameters. Both directions refuse to extrapolate: a size outside the range, or a peak
 * that no size can produce, is an {@link IllegalArgumentException} whose message carries the value and the range.
 */
public sealed interface SizingCurve permits WavelengthPolynomialSizing, ReciprocalQuadraticSizing {

    /** First-exciton peak photon energy (J) of a dot of diameter {@code diameterM} (m). */
    double firstExcitonEnergyJ(double diameterM);

    /** Diameter (m) of a dot whose first-exciton peak lies at photon energy {@code energyJ} (J). */
    double diameterM(double energyJ);

    /** Smallest diameter the curve covers (m). */
    double minDiameterM();

    /** Largest diameter the curve covers (m). */
    double maxDiameterM();

    /** Where the curve comes from. */
    String source();

    /** The curve as a formula a reader can check against the paper, e.g. "E = 0.41 + 1/(0.0252 d² + 0.283 d) eV". */
    String formula();

    /** Throws unless {@code diameterM} lies in the validity range. */
    default void requireDiameterInRange(double diameterM) {
        if (!(diameterM > 0) || !Double.isFinite(diameterM)) {
            throw new IllegalArgumentException("diameter must be > 0 and finite, was " + diameterM * 1e9 + " nm");
        }
        double tolerance = 1e-12 * maxDiameterM();
        if (diameterM < minDiameterM() - tolerance || diameterM > maxDiameterM() + tolerance) {
            throw new IllegalArgumentException("diameter " + Numbers.sig(diameterM * 1e9, 3) + " nm is outside the sizing "
                    + "curve's validity range " + Numbers.sig(minDiameterM() * 1e9, 3) + "–" + Numbers.sig(maxDiameterM() * 1e9, 3)
                    + " nm (" + source() + "); check the size: the curve is not extrapolated");
        }
    }
}
