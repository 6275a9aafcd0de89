package org.ladderkin.excite.beam;

import java.util.Objects;

/**
 * One measured 1/e² radius at one position along the beam, for a caustic.
 *
 * @param zM      position along the beam
 * @param axis    which transverse axis the radius belongs to (e.g. "x", "y"); caustics are fitted per axis
 * @param radiusM the 1/e² radius there
 */
public record BeamPlane(double zM, String axis, double radiusM) {

    public BeamPlane {
        if (!Double.isFinite(zM)) {
            throw new IllegalArgumentException("z must be finite, was " + zM);
        }
        Objects.requireNonNull(axis, "axis");
        if (!(radiusM > 0) || Double.isInfinite(radiusM)) {
            throw new IllegalArgumentException("radius must be > 0 and finite, was " + radiusM + " m");
        }
    }
}
