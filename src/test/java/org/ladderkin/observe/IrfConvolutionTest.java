package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class IrfConvolutionTest {

    private static final double TAU = 2e-9;
    private static final double FWHM = 0.5e-9;

    @Test
    @CheckedAgainst(source = "derived: e^{-kt}H(t) convolved with a unit-area Gaussian N(0,σ²) is the exponentially "
            + "modified Gaussian ½exp(k²σ²/2 − kt)·erfc((kσ² − t)/(√2σ)); evaluated here at t = 0, 1 ns, 5 ns",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void gaussianIrfConvolutionOfAnExponentialIsTheExponentiallyModifiedGaussian() {
        double step = 1e-12;
        int start = 3000; // grid starts 3 ns before the pulse so the IRF's leading edge is on it
        double[] signal = new double[start + 12000];
        for (int i = start; i < signal.length; i++) {
            signal[i] = Math.exp(-(i - start) * step / TAU);
        }
        double[] conv = IrfConvolution.gaussian(signal, step, FWHM);
        double sigma = IrfConvolution.sigmaOfFwhm(FWHM);
        for (double t : new double[] {0, 1e-9, 5e-9}) {
            int i = start + (int) Math.round(t / step);
            double expected = ExponentiallyModifiedGaussian.value(t, 1 / TAU, sigma, 0);
            double computed = conv[i];
            Reference.check("IRF-convolved decay at t = " + t * 1e9 + " ns (relative to e^0)", computed, expected, 2e-3);
        }
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 IterativeLegendreGaussIntegrator: direct quadrature of ∫ e^{-k s} "
            + "N(t − s; 0, σ²) ds", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void exponentiallyModifiedGaussianAgreesWithQuadratureFarInTheTails() {
        double k = 1 / TAU;
        double sigma = IrfConvolution.sigmaOfFwhm(FWHM);
        IterativeLegendreGaussIntegrator quad = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-16);
        for (double t : new double[] {-1e-9, 0, 0.3e-9, 4e-9, 40e-9}) {
            double upper = Math.max(t + 12 * sigma, 12 * sigma);
            double lower = Math.max(0, t - 12 * sigma);
            double ref = quad.integrate(100000, s -> Math.exp(-k * s)
                    * Math.exp(-(t - s) * (t - s) / (2 * sigma * sigma)) / (Math.sqrt(2 * Math.PI) * sigma), lower, upper);
            double value = ExponentiallyModifiedGaussian.value(t, k, sigma, 0);
            Reference.checkRelative("EMG at t = " + t * 1e9 + " ns (1/s)", value, ref, 1e-9);
        }
    }

    @Test
    void emgStaysFiniteWhereNaiveFormulaOverflows() {
        // k·σ large and t far before the peak: exp(k²σ²/2) alone overflows double
        double v = ExponentiallyModifiedGaussian.value(-1e-9, 1 / 1e-13, 1e-10, 0);
        assertThat(v).isFinite().isGreaterThanOrEqualTo(0);
        assertThat(ExponentiallyModifiedGaussian.erfcx(30)).isCloseTo(1 / (30 * Math.sqrt(Math.PI)), org.assertj.core.data.Percentage.withPercentage(0.1));
    }

    @Test
    void convolutionKeepsTheArea() {
        double[] s = new double[2000];
        s[500] = 1;
        double[] c = IrfConvolution.gaussian(s, 1e-12, 30e-12);
        double sum = 0;
        for (double v : c) {
            sum += v;
        }
        assertThat(sum).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-12));
        double[] irfT = {-50e-12, 0, 50e-12};
        double[] irfV = {0, 1, 0};
        double[] c2 = IrfConvolution.sampled(s, 1e-12, irfT, irfV);
        double sum2 = 0;
        for (double v : c2) {
            sum2 += v;
        }
        assertThat(sum2).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(c2[500]).isGreaterThan(c2[480]);
    }

    @Test
    void rejectsBadIrf() {
        double[] s = {1, 2, 3};
        assertThatThrownBy(() -> IrfConvolution.gaussian(s, 1e-12, 0)).hasMessageContaining("IRF FWHM must be > 0");
        assertThatThrownBy(() -> IrfConvolution.sampled(s, 1e-12, new double[] {0, 0}, new double[] {1, 1}))
                .hasMessageContaining("IRF times must increase strictly");
        assertThatThrownBy(() -> IrfConvolution.gaussian(s, -1, 1e-12)).hasMessageContaining("time step must be > 0");
    }
}
