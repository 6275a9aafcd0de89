package org.ladderkin.excite;

/**
 * A flat-top (top-hat) beam of radius R: uniform fluence E/(πR²) inside, none outside.
 *
 * @param radiusM edge radius R (m)
 */
public record FlatTopBeam(double radiusM) implements BeamProfile {

    public FlatTopBeam {
        if (!(radiusM > 0) || !Double.isFinite(radiusM)) {
            throw new IllegalArgumentException("beam radius must be > 0 and finite, was " + radiusM * 1e6 + " µm");
        }
    }

    @Override
    public double peakFluencePerJoule() {
        return 1 / (Math.PI * radiusM * radiusM);
    }

    @Override
    public double shape(double rM) {
        return rM <= radiusM ? 1 : 0;
    }

    @Override
    public double cumulative(double rM) {
        return Math.min(1, rM * rM / (radiusM * radiusM));
    }

    @Override
    public double radiusAtCumulative(double t) {
        return radiusM * Math.sqrt(Math.min(1, Math.max(0, t)));
    }

    @Override
    public double weightDensity(double rM) {
        return rM <= radiusM ? 2 * rM / (radiusM * radiusM) : 0;
    }

    @Override
    public double weightLimitM() {
        return radiusM;
    }

    @Override
    public double[] edgesM() {
        return new double[] {radiusM};
    }

    @Override
    public String describe() {
        return String.format(java.util.Locale.ROOT, "flat top, radius %.4g µm", radiusM * 1e6);
    }
}
