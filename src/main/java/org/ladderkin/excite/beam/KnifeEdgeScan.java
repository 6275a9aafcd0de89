package org.ladderkin.excite.beam;

/**
 * One knife-edge scan: blade positions and the power transmitted past the blade (any unit: only the shape matters).
 * Positions must change strictly in one direction; both directions are accepted.
 *
 * @param positionsM blade positions
 * @param powers     transmitted power at each position
 */
public record KnifeEdgeScan(double[] positionsM, double[] powers) {

    /** Four fit parameters and at least two degrees of freedom for the noise estimate. */
    public static final int MIN_POINTS = 6;

    public KnifeEdgeScan {
        if (positionsM.length != powers.length) {
            throw new IllegalArgumentException(positionsM.length + " positions but " + powers.length + " powers");
        }
        if (positionsM.length < MIN_POINTS) {
            throw new BeamException(BeamException.Reason.TOO_FEW, "only " + positionsM.length + " points (a knife-edge fit needs at least "
                    + MIN_POINTS + ")");
        }
        for (int i = 0; i < positionsM.length; i++) {
            if (!Double.isFinite(positionsM[i]) || !Double.isFinite(powers[i])) {
                throw new IllegalArgumentException("point " + i + " is not finite");
            }
        }
        double direction = Math.signum(positionsM[1] - positionsM[0]);
        for (int i = 1; i < positionsM.length; i++) {
            if (direction == 0 || Math.signum(positionsM[i] - positionsM[i - 1]) != direction) {
                throw new BeamException(BeamException.Reason.NOT_MONOTONIC, "blade position at point " + i
                        + " does not continue the scan's direction (positions must increase or decrease strictly)", i, 1);
            }
        }
        positionsM = positionsM.clone();
        powers = powers.clone();
    }

    @Override
    public double[] positionsM() {
        return positionsM.clone();
    }

    @Override
    public double[] powers() {
        return powers.clone();
    }

    int size() {
        return positionsM.length;
    }

    double position(int i) {
        return positionsM[i];
    }

    double power(int i) {
        return powers[i];
    }
}
