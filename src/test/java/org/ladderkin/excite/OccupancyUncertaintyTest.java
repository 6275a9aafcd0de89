package org.ladderkin.excite;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class OccupancyUncertaintyTest {

    @Test
    @CheckedAgainst(source = "derived: Gaussian pump (w_p) and probe (w_r), thin sample: probe-averaged ⟨N⟩ ∝ σ·E/(w_p² + w_r²),"
            + " so ∂ln⟨N⟩/∂ln w_p = 2w_p²/(w_p² + w_r²), ∂ln⟨N⟩/∂ln w_r = 2w_r²/(w_p² + w_r²); independent inputs add in"
            + " quadrature (JCGM 100:2008 (GUM), eq. 10 with relative sensitivities)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void gaussianSpotsWeighTheRadiiByTheirShareOfTheArea() {
        double wp = 150e-6;
        double wr = 50e-6;
        Excitation e = ExcitationTest.excite(ExcitationTest.pbse(0.001), wp, wr);
        OccupancyUncertainty.Result r = OccupancyUncertainty.of(e, new Calibration(0.05, 0.04, 0.10, 0.2), Double.NaN);
        double sp = 2 * wp * wp / (wp * wp + wr * wr);
        double sr = 2 * wr * wr / (wp * wp + wr * wr);
        double expected = Math.sqrt(0.05 * 0.05 + Math.pow(sp * 0.04, 2) + Math.pow(sr * 0.10, 2) + 0.2 * 0.2);
        Reference.checkRelative("relative uncertainty of probe-averaged ⟨N⟩, w_p = 150 µm, w_r = 50 µm", r.nAvgProbeWeighted().totalRel(),
                expected, 1e-4);
        Reference.checkRelative("relative uncertainty of the peak photon fluence (energy 5 %, pump radius 4 %)",
                r.photonFluencePeak().totalRel(), Math.sqrt(0.05 * 0.05 + Math.pow(2 * 0.04, 2)), 1e-6);
        assertThat(r.nAvgProbeWeighted().dominant().orElseThrow().source()).isEqualTo("cross-section σ");
    }

    @Test
    void unstatedValuesTakeTheDefaultsAndSigmaFallsBackToItsOwnUncertainty() {
        Calibration c = Calibration.UNSTATED.orDefaults();
        assertThat(c.pulseEnergyRel()).isEqualTo(Calibration.DEFAULT_PULSE_ENERGY_REL);
        assertThat(c.probeRadiusRel()).isEqualTo(Calibration.DEFAULT_RADIUS_REL);
        Excitation e = ExcitationTest.excite(ExcitationTest.pbse(0.001), 100e-6, 100e-6);
        assertThat(OccupancyUncertainty.of(e, c, 0.3).nAvgProbeWeighted().items())
                .extracting(RelativeBudget.Item::source).contains("cross-section σ");
        assertThat(OccupancyUncertainty.of(e, c, Double.NaN).nAvgProbeWeighted().items())
                .extracting(RelativeBudget.Item::source).doesNotContain("cross-section σ");
    }
}
