package org.ladderkin.excite.beam;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class CausticFitTest {

    static final double LAMBDA_M = 400e-9;
    static final double PITCH_M = 5.5e-6;

    /** D4σ radii of camera frames of a beam with waist w0 at z0 and quality m2, at seven planes across ±2 zR. */
    private static List<BeamPlane> planes(double w0M, double z0M, double m2) {
        double zR = Math.PI * w0M * w0M / (m2 * LAMBDA_M);
        List<BeamPlane> out = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            double z = z0M + zR * (-2 + 4.0 * i / 6) + 0.3e-3;
            double w = w0M * Math.sqrt(1 + Math.pow((z - z0M) / zR, 2));
            int side = 180;
            double[] v = SyntheticBeams.gaussian(side, side, 90.2, 89.7, w / PITCH_M, w / PITCH_M, 0, 3000, 40, 3, 40 + i);
            SecondMoments m = SecondMoments.of(new BeamImage(side, side, v), PITCH_M);
            out.add(new BeamPlane(z, "x", m.radiusXM()));
            out.add(new BeamPlane(z, "y", m.radiusYM()));
        }
        return out;
    }

    @Test
    @CheckedAgainst(source = "closed form of a Gaussian beam, w(z) = w0·√(1 + ((z − z0)/zR)²) with zR = π·w0²/(M²·λ), "
            + "imaged at 7 planes and measured by the second-moment widths (definition of ISO 11146-1); the caustic fit "
            + "must return M² = π·w0²/(λ·zR) of the beam drawn", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void mSquaredRecoveredFromSimulatedImages() {
        Map<String, CausticFit> ideal = CausticFit.byAxis(planes(40e-6, 2e-3, 1.0), LAMBDA_M);
        assertThat(ideal).containsOnlyKeys("x", "y");
        CausticFit x = ideal.get("x");
        Reference.checkRelative("M² of a Gaussian beam (M² = 1), 7 planes across ±2 zR", x.mSquared(), 1.0, 0.03);
        Reference.checkRelative("waist radius w0 = 40 µm from the caustic (µm)", x.waistRadiusM() * 1e6, 40, 0.01);
        Reference.check("waist position z0 = 2 mm from the caustic (mm)", x.waistPositionM() * 1e3, 2, 0.1);
        Reference.checkRelative("Rayleigh range πw0²/λ = 12.57 mm (mm)", x.rayleighRangeM() * 1e3,
                Math.PI * 40e-6 * 40e-6 / LAMBDA_M * 1e3, 0.02);
        Reference.checkRelative("M² of a Gaussian beam from the y widths", ideal.get("y").mSquared(), 1.0, 0.03);

        CausticFit scaled = CausticFit.byAxis(planes(55e-6, -1e-3, 1.5), LAMBDA_M).get("x");
        Reference.checkRelative("M² of a beam with M² = 1.5, 7 planes across ±2 zR", scaled.mSquared(), 1.5, 0.03);
        Reference.checkRelative("waist radius w0 = 55 µm of the M² = 1.5 beam (µm)", scaled.waistRadiusM() * 1e6, 55, 0.01);
    }

    @Test
    void standardErrorsAndSamplingAdvice() {
        CausticFit f = CausticFit.byAxis(planes(40e-6, 0, 1.0), LAMBDA_M).get("x");
        assertThat(f.mSquaredStdError()).isPositive().isLessThan(0.05);
        assertThat(f.waistRadiusStdErrorM()).isPositive();
        assertThat(f.points()).isEqualTo(7);
        assertThat(f.isoSampling()).as("7 planes are fewer than ISO 11146-1 asks for").isFalse();
        assertThat(f.planesNearWaist() + f.planesFarFromWaist()).isLessThanOrEqualTo(7);
        CausticFit noWavelength = CausticFit.fit(new double[] {-2, -1, 0, 1, 2}, new double[] {2.2, 1.4, 1, 1.4, 2.2}, Double.NaN);
        assertThat(noWavelength.mSquared()).isNaN();
        assertThat(noWavelength.waistPositionM()).isCloseTo(0, org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void tooFewPlanesAreRefused() {
        assertThatThrownBy(() -> CausticFit.fit(new double[] {0, 1, 1, 0}, new double[] {1, 2, 2, 1}, LAMBDA_M))
                .isInstanceOfSatisfying(BeamException.class, e -> assertThat(e.reason()).isEqualTo(BeamException.Reason.TOO_FEW));
    }
}
