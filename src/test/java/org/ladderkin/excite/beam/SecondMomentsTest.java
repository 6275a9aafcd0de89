package org.ladderkin.excite.beam;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class SecondMomentsTest {

    static final double PITCH_M = 5.5e-6;

    private static SecondMoments moments(int w, int h, double[] v) {
        return SecondMoments.of(new BeamImage(w, h, v), PITCH_M);
    }

    @Test
    @CheckedAgainst(source = "definition of ISO 11146-1 (second-moment widths dσ = 4σ, integration area 3 × the widths, "
            + "iterated): for I ∝ exp(−2r²/w²) the closed form gives σ² = w²/4, so D4σ = 2w and the 1/e² radius is D4σ/2",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void roundGaussianWithBackgroundAndNoise() {
        double wPx = 25;
        SecondMoments m = moments(200, 200, SyntheticBeams.gaussian(200, 200, 97.3, 104.6, wPx, wPx, 0, 3000, 100, 5, 11));
        double wUm = wPx * PITCH_M * 1e6;
        Reference.checkRelative("D4σx of a round Gaussian, w = 137.5 µm, background 100, noise 5 (µm)", m.d4SigmaXM() * 1e6,
                2 * wUm, 0.01);
        Reference.checkRelative("D4σy of a round Gaussian, w = 137.5 µm, background 100, noise 5 (µm)", m.d4SigmaYM() * 1e6,
                2 * wUm, 0.01);
        Reference.checkRelative("1/e² radius √(wx·wy) of a round Gaussian (µm)", m.radius().radiusM() * 1e6, wUm, 0.01);
        Reference.check("centroid x of a round Gaussian (px)", m.centroidXM() / PITCH_M, 97.3, 0.05);
        Reference.check("centroid y of a round Gaussian (px)", m.centroidYM() / PITCH_M, 104.6, 0.05);
        assertThat(m.backgroundCounts()).isCloseTo(100, org.assertj.core.data.Offset.offset(0.5));
        assertThat(m.windowClipped()).isFalse();
        assertThat(m.iterations()).isGreaterThan(1);
    }

    @Test
    @CheckedAgainst(source = "definition of ISO 11146-1 (dσx,y from σ²x, σ²y, σ²xy; φ = ½·arctan(2σ²xy/(σ²x − σ²y)); "
            + "ε = dmin/dmax): for an elliptical Gaussian exp(−2u²/wu² − 2v²/wv²) rotated by θ the closed form gives "
            + "principal widths 2wu and 2wv along u and v, and φ = θ folded into (−45°, 45°]",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void ellipticalAndRotatedGaussians() {
        SecondMoments aligned = moments(240, 200, SyntheticBeams.gaussian(240, 200, 120, 100, 30, 15, 0, 2000, 50, 3, 12));
        Reference.checkRelative("D4σx of an aligned elliptical Gaussian, wx = 30 px (px)", aligned.d4SigmaXM() / PITCH_M, 60, 0.01);
        Reference.checkRelative("D4σy of an aligned elliptical Gaussian, wy = 15 px (px)", aligned.d4SigmaYM() / PITCH_M, 30, 0.01);
        Reference.checkRelative("ellipticity of a 2:1 Gaussian", aligned.ellipticity(), 0.5, 0.01);
        Reference.check("principal-axes angle of an aligned Gaussian (°)", aligned.angleDeg(), 0, 0.5);

        SecondMoments r30 = moments(240, 240, SyntheticBeams.gaussian(240, 240, 118, 121, 30, 15, Math.toRadians(30), 2000, 50, 3, 13));
        Reference.checkRelative("D4σx of a 2:1 Gaussian rotated by 30° (px)", r30.d4SigmaXM() / PITCH_M, 60, 0.01);
        Reference.checkRelative("D4σy of a 2:1 Gaussian rotated by 30° (px)", r30.d4SigmaYM() / PITCH_M, 30, 0.01);
        Reference.check("principal-axes angle of a Gaussian rotated by 30° (°)", r30.angleDeg(), 30, 0.5);
        Reference.checkRelative("equivalent radius √(wx·wy) of a 30 × 15 px Gaussian (px)", r30.radius().radiusM() / PITCH_M,
                Math.sqrt(30 * 15), 0.01);

        // rotated by 60°, the long axis is nearer y: dσx is the short width, along −30°
        SecondMoments r60 = moments(240, 240, SyntheticBeams.gaussian(240, 240, 120, 120, 30, 15, Math.toRadians(60), 2000, 50, 3, 14));
        Reference.checkRelative("D4σx of a 2:1 Gaussian rotated by 60° (px)", r60.d4SigmaXM() / PITCH_M, 30, 0.01);
        Reference.checkRelative("D4σy of a 2:1 Gaussian rotated by 60° (px)", r60.d4SigmaYM() / PITCH_M, 60, 0.01);
        Reference.check("principal-axes angle of a Gaussian rotated by 60° (°)", r60.angleDeg(), -30, 0.5);
    }

    @Test
    @CheckedAgainst(source = "definition of ISO 11146-1 (second-moment widths): a uniform disc of radius R has σ²x = R²/4 "
            + "(closed form), so D4σ = 2R, the disc's diameter", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void flatTopDisc() {
        double rPx = 40;
        SecondMoments m = moments(280, 280, SyntheticBeams.flatTop(280, 280, 139.5, 140.2, rPx, 1000, 20, 2, 15));
        Reference.checkRelative("D4σx of a flat-top disc, R = 40 px (px)", m.d4SigmaXM() / PITCH_M, 2 * rPx, 0.01);
        Reference.checkRelative("D4σy of a flat-top disc, R = 40 px (px)", m.d4SigmaYM() / PITCH_M, 2 * rPx, 0.01);
        Reference.checkRelative("ellipticity of a disc", m.ellipticity(), 1, 0.01);
    }

    @Test
    void standardErrorOfTheRadiusMatchesTheScatterOfNoisyFrames() {
        int runs = 40;
        double[] radii = new double[runs];
        double meanError = 0;
        for (int k = 0; k < runs; k++) {
            SecondMoments m = moments(96, 96, SyntheticBeams.gaussian(96, 96, 48, 47, 12, 12, 0, 400, 30, 8, 100 + k));
            radii[k] = m.radius().radiusM();
            meanError += m.radius().stdErrorM() / runs;
        }
        double mean = java.util.Arrays.stream(radii).average().orElseThrow();
        double sd = Math.sqrt(java.util.Arrays.stream(radii).map(r -> (r - mean) * (r - mean)).sum() / (runs - 1));
        assertThat(meanError).isGreaterThan(0);
        assertThat(meanError / sd).as("stated error / observed scatter").isBetween(0.7, 1.4);
    }

    @Test
    void saturatedPixelsAreRefusedWithTheirCount() {
        double[] v = SyntheticBeams.gaussian(64, 64, 32, 32, 8, 8, 0, 300, 10, 0, 1);
        for (int i = 0; i < v.length; i++) {
            v[i] = Math.min(v[i], 255);
        }
        long clipped = java.util.Arrays.stream(v).filter(x -> x >= 255).count();
        assertThat(clipped).isGreaterThan(1);
        assertThatThrownBy(() -> SecondMoments.of(new BeamImage(64, 64, v, 255), PITCH_M))
                .isInstanceOfSatisfying(BeamException.class, e -> {
                    assertThat(e.reason()).isEqualTo(BeamException.Reason.SATURATED);
                    assertThat(e.count()).isEqualTo((int) clipped);
                    assertThat(e.getMessage()).startsWith(clipped + " saturated pixels");
                });
        // the same frame with a level above its maximum is measured
        assertThat(SecondMoments.of(new BeamImage(64, 64, v, 4095), PITCH_M).d4SigmaXM()).isPositive();
    }

    @Test
    void aFrameWithoutASpotIsRefused() {
        double[] flat = SyntheticBeams.gaussian(64, 64, 32, 32, 8, 8, 0, 0, 100, 4, 2);
        assertThatThrownBy(() -> moments(64, 64, flat)).isInstanceOfSatisfying(BeamException.class,
                e -> assertThat(e.reason()).isEqualTo(BeamException.Reason.NO_SPOT));
        double[] uniform = new double[64 * 64];
        java.util.Arrays.fill(uniform, 7);
        assertThatThrownBy(() -> moments(64, 64, uniform)).isInstanceOfSatisfying(BeamException.class,
                e -> assertThat(e.reason()).isEqualTo(BeamException.Reason.NO_SPOT));
    }

    @Test
    void aSpotRunningOffTheFrameIsFlagged() {
        SecondMoments m = moments(64, 64, SyntheticBeams.gaussian(64, 64, 32, 32, 14, 14, 0, 1000, 0, 0, 3));
        assertThat(m.windowClipped()).isTrue();
    }
}
