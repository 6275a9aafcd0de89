package org.ladderkin.report;

import java.awt.Color;

/**
 * The chart colours. Both palettes keep every pair of their first twelve colours at least 15 CIELAB units apart
 * (ΔE*ab, CIE 1976) and stay between lightness 20 and 75, so each reads on the light report background and on the
 * planner's dark one.
 */
final class ChartColours {

    /** Twelve hues for unrelated quantities; a thirteenth series repeats the first. */
    private static final Color[] CATEGORICAL = {
        new Color(0x1f77b4), new Color(0xd62728), new Color(0x2ca02c), new Color(0x9467bd), new Color(0xff7f0e),
        new Color(0x17becf), new Color(0x8c564b), new Color(0xe377c2), new Color(0x7f7f7f), new Color(0xbcbd22),
        new Color(0x393b79), new Color(0x637939)};

    /**
     * Anchors of the ordered ramp, cool (low ⟨N⟩) to warm (high ⟨N⟩), interpolated in CIELAB so equal steps look
     * about equally different.
     */
    private static final Color[] RAMP = {
        new Color(0x3b1c8c), new Color(0x2166ac), new Color(0x1a9a8a), new Color(0x6aa534), new Color(0xe08214),
        new Color(0xb2182b)};

    private ChartColours() {
    }

    /** Colour {@code index} of {@code count} in {@code palette}. */
    static Color of(ChartSpec.Palette palette, int index, int count) {
        if (palette == ChartSpec.Palette.CATEGORICAL) {
            return CATEGORICAL[index % CATEGORICAL.length];
        }
        // one colour of an ordered family sits mid-ramp rather than at its dark end
        double t = count <= 1 ? 0.5 : (double) Math.min(index, count - 1) / (count - 1);
        double s = t * (RAMP.length - 1);
        int k = Math.min(RAMP.length - 2, (int) Math.floor(s));
        double u = s - k;
        double[] a = lab(RAMP[k]);
        double[] b = lab(RAMP[k + 1]);
        return fromLab(new double[] {a[0] + u * (b[0] - a[0]), a[1] + u * (b[1] - a[1]), a[2] + u * (b[2] - a[2])});
    }

    /** CIE 1976 colour difference ΔE*ab of two sRGB colours (D65 white). */
    static double distance(Color p, Color q) {
        double[] a = lab(p);
        double[] b = lab(q);
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
    }

    /** CIELAB L*, a*, b* of an sRGB colour (IEC 61966-2-1 transfer curve, D65 white). */
    static double[] lab(Color c) {
        double r = linear(c.getRed() / 255.0);
        double g = linear(c.getGreen() / 255.0);
        double b = linear(c.getBlue() / 255.0);
        double x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
        double y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
        double z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
        return new double[] {116 * f(y) - 16, 500 * (f(x) - f(y)), 200 * (f(y) - f(z))};
    }

    private static Color fromLab(double[] lab) {
        double fy = (lab[0] + 16) / 116;
        double x = fInverse(fy + lab[1] / 500) * 0.95047;
        double y = fInverse(fy);
        double z = fInverse(fy - lab[2] / 200) * 1.08883;
        return new Color(encoded(3.2406 * x - 1.5372 * y - 0.4986 * z), encoded(-0.9689 * x + 1.8758 * y + 0.0415 * z),
                encoded(0.0557 * x - 0.2040 * y + 1.0570 * z));
    }

    private static double linear(double v) {
        return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
    }

    private static int encoded(double v) {
        double e = v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055;
        return (int) Math.round(Math.max(0, Math.min(1, e)) * 255);
    }

    private static final double EPSILON = 216.0 / 24389;
    private static final double KAPPA = 24389.0 / 27;

    private static double f(double t) {
        return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
    }

    private static double fInverse(double t) {
        return t * t * t > EPSILON ? t * t * t : (116 * t - 16) / KAPPA;
    }
}
