package org.ladderkin.excite.beam;

/**
 * A camera frame: pixel values in row-major order (row 0 first, x along a row), in the camera's counts.
 *
 * @param width           pixels per row
 * @param height          rows
 * @param values          width × height values, row-major
 * @param saturationLevel the value at and above which a pixel is saturated (the largest code of the camera's bit
 *                        depth), or NaN when not known
 */
public record BeamImage(int width, int height, double[] values, double saturationLevel) {

    /** Smallest frame with a border for the background and an interior for the spot. */
    public static final int MIN_SIDE = 8;

    public BeamImage {
        if (width < MIN_SIDE || height < MIN_SIDE) {
            throw new BeamException(BeamException.Reason.TOO_FEW, "a " + width + " × " + height + " image is too small (at least "
                    + MIN_SIDE + " × " + MIN_SIDE + " pixels, with unlit pixels around the spot)");
        }
        if (values.length != (long) width * height) {
            throw new IllegalArgumentException(values.length + " values for a " + width + " × " + height + " image");
        }
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("pixel values must be finite");
            }
        }
        if (!(saturationLevel > 0) && !Double.isNaN(saturationLevel)) {
            throw new IllegalArgumentException("saturation level must be > 0 or NaN, was " + saturationLevel);
        }
        values = values.clone();
    }

    /** An image without a known saturation level. */
    public BeamImage(int width, int height, double[] values) {
        this(width, height, values, Double.NaN);
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    double at(int row, int column) {
        return values[row * width + column];
    }
}
