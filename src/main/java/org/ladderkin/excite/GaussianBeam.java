package org.ladderkin.excite;

/**
 * A Gaussian beam, F(r) = (2E/(πw²))·exp(−2r²/w²), described by its 1/e² intensity radius w.
 * The full width at half maximum of the intensity is w·√(2 ln 2).
 *
 * @param radiusM 1/e² intensity radius w (m)
 */
public record GaussianBeam(double radiusM) implements BeamProfile {

    private static final double FWHM_PER_W = Math.sqrt(2 * Math.log(2));

    public GaussianBeam {
        if (!(radiusM > 0) || !Double.isFinite(radiusM)) {
            throw new IllegalArgumentException("beam radius must be > 0 and finite, was " + radiusM * 1e6 + " µm");
        }
    }

    /** The Gaussian beam whose intensity FWHM is {@code fwhmM} (m). */
    public static GaussianBeam fromFwhm(double fwhmM) {
        if (!(fwhmM > 0) || !Double.isFinite(fwhmM)) {
            throw new IllegalArgumentException("beam FWHM must be > 0 and finite, was " + fwhmM * 1e6 + " µm");
        }
        return new GaussianBeam(fwhmM / FWHM_PER_W);
    }

    /** Intensity full width at half maximum (m). */
    public double fwhmM() {
        return radiusM * FWHM_PER_W;
    }

    @Override
    public double peakFluencePerJoule() {
        return 2 / (Math.PI * radiusM * radiusM);
    }

    @Override
    public double shape(double rM) {
        return Math.exp(-2 * rM * rM / (radiusM * radiusM));
    }

    @Override
    public double cumulative(double rM) {
        return -Math.expm1(-2 * rM * rM / (radiusM * radiusM));
    }

    @Override
    public double radiusAtCumulative(double t) {
        if (t >= 1) {
            return Double.POSITIVE_INFINITY;
        }
        return radiusM * Math.sqrt(-Math.log1p(-t) / 2);
    }

    @Override
    public double weightDensity(double rM) {
        return 4 * rM / (radiusM * radiusM) * shape(rM);
    }

    @Override
    public double weightLimitM() {
        // exp(-2 r²/w²) = 1e-17 at r = w·sqrt(ln(1e17)/2) ≈ 4.43 w
        return radiusM * Math.sqrt(Math.log(1e17) / 2);
    }

    @Override
    public double[] edgesM() {
        return new double[0];
    }

    @Override
    public String describe() {
        return String.format(java.util.Locale.ROOT, "Gaussian, 1/e² radius %.4g µm (FWHM %.4g µm)", radiusM * 1e6, fwhmM() * 1e6);
    }
}
