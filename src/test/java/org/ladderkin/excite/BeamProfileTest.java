package org.ladderkin.excite;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class BeamProfileTest {

    @Test
    @CheckedAgainst(source = "derived: F(r) = F₀·exp(−2r²/w²) carries E = F₀·πw²/2, so F₀ = 2E/(πw²); "
            + "half maximum at r = w·√(ln2/2), so FWHM = w·√(2 ln 2)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void gaussianPeakFluenceAndFwhm() {
        double w = 100e-6;
        double energy = 50e-9;
        GaussianBeam g = new GaussianBeam(w);
        Reference.checkRelative("peak fluence of 50 nJ in w = 100 µm (J/cm²)", energy * g.peakFluencePerJoule() * 1e-4,
                2 * energy / (Math.PI * w * w) * 1e-4, 1e-14);
        Reference.checkRelative("FWHM of w = 100 µm (µm)", g.fwhmM() * 1e6, 100 * Math.sqrt(2 * Math.log(2)), 1e-14);
        Reference.checkRelative("w back from FWHM 117.74 µm (µm)", GaussianBeam.fromFwhm(g.fwhmM()).radiusM() * 1e6, 100, 1e-14);
        Reference.check("relative fluence at r = FWHM/2", g.shape(g.fwhmM() / 2), 0.5, 1e-14);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus IterativeLegendreGaussIntegrator: ∫ F(r)·2πr dr over the profile equals the pulse energy",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void profilesCarryThePulseEnergy() {
        IterativeLegendreGaussIntegrator rule = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-16);
        for (BeamProfile b : new BeamProfile[] {new GaussianBeam(70e-6), new FlatTopBeam(70e-6)}) {
            double scale = 70e-6;
            double integral = rule.integrate(1_000_000,
                    x -> b.peakFluencePerJoule() * b.shape(x * scale) * 2 * Math.PI * x * scale * scale, 0, b instanceof FlatTopBeam ? 1 : 6);
            Reference.checkRelative(b.describe() + ": ∫F·2πr dr per joule", integral, 1, 1e-10);
            Reference.checkRelative(b.describe() + ": cumulative at the weight limit", b.cumulative(b.weightLimitM()), 1, 1e-15);
        }
    }

    @Test
    void rejectsNonPositiveRadius() {
        assertThatThrownBy(() -> new GaussianBeam(-1e-6)).hasMessage("beam radius must be > 0 and finite, was -1.0 µm");
        assertThatThrownBy(() -> GaussianBeam.fromFwhm(0)).hasMessage("beam FWHM must be > 0 and finite, was 0.0 µm");
    }
}
