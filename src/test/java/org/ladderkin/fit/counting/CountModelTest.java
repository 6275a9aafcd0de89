package org.ladderkin.fit.counting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.observe.MeasuredIrf;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class CountModelTest {

    private static ParameterValues at(double tauS, double shiftS) {
        return ParameterValues.shared(List.of("tau1S", InstrumentResponse.FWHM, "shiftS", "amplitude", "background"),
                new double[] {tauS, 80e-12, shiftS, 50, 1.5});
    }

    @Test
    @CheckedAgainst(source = "derived: the exponentially modified Gaussian's distribution function integrated over each "
            + "bin, with the tails of twelve earlier pulses added (SimulatedHistograms)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void expectedCountsMatchTheClosedFormWithWrapAround() {
        double binS = 40e-12;
        CountHistogram h = CountHistogram.of("h", -0.4e-9, binS, new double[250]);
        double periodS = 10e-9;
        CountModel m = new CountModel(0, h, 8, ExponentialDecay.single(1e-9), InstrumentResponse.gaussian(), periodS, null);
        double[] mu = m.expected(at(4e-9, 0.013e-9));
        double sigma = 80e-12 / (2 * Math.sqrt(2 * Math.log(2)));
        for (int i : new int[] {0, 5, 10, 11, 12, 40, 249}) {
            double a = -0.4e-9 + i * binS;
            double s = 0;
            for (int k = 0; k < 12; k++) {
                s += SimulatedHistograms.binIntegral(a + k * periodS, a + binS + k * periodS, 0.013e-9, sigma, 4e-9);
            }
            // the model's amplitude is counts per bin of a unit rate: the bin's mean rate times 50, plus 1.5; the
            // fine grid's midpoint rule errs by h²f″/24, a few 1e-4 on the rise
            Reference.checkRelative("expected counts in bin " + i, mu[i], 50 * s / binS + 1.5, 1e-3);
        }
    }

    @Test
    void aSubBinShiftMovesTheModelSmoothly() {
        CountHistogram h = CountHistogram.of("h", -0.4e-9, 40e-12, new double[100]);
        CountModel m = new CountModel(0, h, 4, ExponentialDecay.single(1e-9), InstrumentResponse.gaussian(), Double.NaN, null);
        // the derivative in the shift from steps of 2 ps and 1 ps agree: no jumps as kernel samples cross grid points
        double[] a2 = m.expected(at(1e-9, 3e-12 - 2e-12));
        double[] b2 = m.expected(at(1e-9, 3e-12 + 2e-12));
        double[] a1 = m.expected(at(1e-9, 3e-12 - 1e-12));
        double[] b1 = m.expected(at(1e-9, 3e-12 + 1e-12));
        int checked = 0;
        for (int i = 0; i < 40; i++) {
            double d2 = (b2[i] - a2[i]) / 4e-12;
            double d1 = (b1[i] - a1[i]) / 2e-12;
            if (Math.abs(d1) > 1e10) {
                assertThat(d2).as("bin " + i).isCloseTo(d1, org.assertj.core.data.Percentage.withPercentage(1));
                checked++;
            }
        }
        assertThat(checked).isGreaterThan(3);
    }

    @Test
    @CheckedAgainst(source = "derived: the forward dead-time model n_i = N_i(1 − Σ_{j<i} n_j/N_E) inverted by Coates' "
            + "correction N_i = n_i/(1 − Σ_{j<i} n_j/N_E) returns the counts it started from", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void pileUpForwardModelIsInvertedByTheCorrection() {
        PileUp p = new PileUp(1e5);
        double[] arriving = {200, 1500, 900, 300, 100};
        double[] recorded = arriving.clone();
        p.apply(recorded);
        assertThat(recorded[1]).isLessThan(arriving[1]);
        double[] back = p.correct(recorded);
        for (int i = 0; i < arriving.length; i++) {
            Reference.checkRelative("corrected bin " + i, back[i], arriving[i], 1e-12);
        }
    }

    @Test
    void devianceResidualsSquareToTheDeviance() {
        double[] n = {0, 1, 3, 10, 100};
        double[] mu = {0.5, 2, 3, 8.5, 120};
        double s = 0;
        for (int i = 0; i < n.length; i++) {
            double r = PoissonDeviance.residual(n[i], mu[i]);
            s += r * r;
            assertThat(Math.signum(r)).isEqualTo(Math.signum(n[i] - mu[i]));
        }
        assertThat(s).isCloseTo(PoissonDeviance.of(n, mu), org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void anIrfLongerThanTheWindowIsRefused() {
        double[] t = new double[30];
        double[] v = new double[30];
        for (int i = 0; i < t.length; i++) {
            t[i] = i * 1e-10;
            v[i] = Math.exp(-Math.pow((i - 15) / 4.0, 2));
        }
        MeasuredIrf irf = new MeasuredIrf(t, v, "irf.csv");
        CountHistogram h = CountHistogram.of("short", 0, 1e-10, new double[20]);
        assertThatThrownBy(() -> new CountModel(0, h, 4, ExponentialDecay.single(1e-9), InstrumentResponse.measured(irf),
                Double.NaN, null)).hasMessageContaining("longer than the histogram");
    }

    @Test
    void countsMustBeWholeAndNotNegative() {
        assertThatThrownBy(() -> CountHistogram.of("h", 0, 1e-10, new double[] {1, -1})).hasMessageContaining("whole numbers");
        assertThatThrownBy(() -> CountHistogram.of("h", 0, 1e-10, new double[] {1, 2.5})).hasMessageContaining("whole numbers");
        assertThatThrownBy(() -> CountHistogram.of("h", 0, 1e-10, new double[0])).hasMessageContaining("no bins");
    }
}
