package org.ladderkin.observe;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** A measured instrument response: its width, centroid and area, and the curves it refuses. */
class MeasuredIrfTest {

    /** A Gaussian of standard deviation {@code sigmaS} centred on {@code centreS}, sampled every {@code stepS} over ±{@code spanS}. */
    static MeasuredIrf sampledGaussian(double sigmaS, double centreS, double stepS, double spanS) {
        int n = (int) Math.round(2 * spanS / stepS) + 1;
        double[] t = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            // the grid starts half a step off the centre, so the peak falls between two samples (the worst case)
            t[i] = centreS - spanS + (i + 0.5) * stepS;
            double z = (t[i] - centreS) / sigmaS;
            g[i] = 1000 * Math.exp(-0.5 * z * z);
        }
        return new MeasuredIrf(t, g, "gaussian");
    }

    @Test
    @CheckedAgainst(source = "derived: a Gaussian of standard deviation σ has FWHM = 2√(2 ln 2)·σ (solve exp(−x²/2σ²) = 1/2); "
            + "sampled every h with the peak between samples, the sample maximum is low by at most h²/8σ² and linear "
            + "interpolation at the crossing x = 1.177σ errs by h²·g″/(8g′) = 0.041·h²/σ, together about 0.1 fs for h = 5 fs, "
            + "σ = 85 fs; the tolerance asked is 0.3 fs", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void fwhmOfASampledGaussianIsTheGaussiansFwhm() {
        double sigma = 85e-15;
        MeasuredIrf irf = sampledGaussian(sigma, 1.234e-12, 5e-15, 600e-15);
        double fwhm = 2 * Math.sqrt(2 * Math.log(2)) * sigma;
        Reference.check("FWHM of a Gaussian (σ = 85 fs) sampled every 5 fs, read at half maximum (fs)", irf.fwhmS() * 1e15,
                fwhm * 1e15, 0.3);
        Reference.check("centroid of that sampled Gaussian, centred at 1234 fs (fs)", irf.centroidS() * 1e15, 1234, 0.01);
    }

    @Test
    void unitAreaAndTheAreaAfterATime() {
        MeasuredIrf irf = sampledGaussian(50e-15, 0, 5e-15, 400e-15);
        double[] t = irf.timesS();
        double[] g = irf.densityPerS();
        double area = 0;
        for (int i = 1; i < t.length; i++) {
            area += (t[i] - t[i - 1]) * (g[i] + g[i - 1]) / 2;
        }
        assertThat(area).isCloseTo(1, within(1e-12));
        assertThat(irf.areaAfter(-1e-12)).isEqualTo(1);
        assertThat(irf.areaAfter(1e-12)).isEqualTo(0);
        assertThat(irf.areaAfter(0)).isCloseTo(0.5, within(1e-12));
        assertThat(irf.areaAfter(t[10])).isCloseTo(irf.areaAfter(t[10] - 1e-21), within(1e-9));
        // between samples the tail area falls by the density there, as its derivative must
        double h = 1e-18;
        assertThat((irf.areaAfter(12e-15) - irf.areaAfter(12e-15 + h)) / h)
                .isCloseTo(g[81] + (g[82] - g[81]) * 0.9, within(1e-3 * g[80]));
        assertThat(irf.rmsWidthS()).isCloseTo(50e-15, within(0.05e-15));
    }

    @Test
    void refusesCurvesThatAreNotOneCompleteNonNegativePeak() {
        double[] t = {0, 1, 2, 3, 4, 5, 6};
        assertThatThrownBy(() -> new MeasuredIrf(new double[] {0, 1, 2, 3}, new double[] {0, 1, 2, 0}, "a.csv"))
                .hasMessage("a.csv: IRF needs at least 5 samples, has 4");
        assertThatThrownBy(() -> new MeasuredIrf(t, new double[] {0, 1, 4, 1, -0.1, 0, 0}, "a.csv"))
                .hasMessage("a.csv: IRF value at 4.00000 s is negative (-0.1; subtract the background and clip the noise first)");
        assertThatThrownBy(() -> new MeasuredIrf(new double[] {0, 1, 3, 2, 4, 5, 6}, new double[] {0, 1, 4, 1, 0, 0, 0}, "a.csv"))
                .hasMessage("a.csv: IRF times must increase strictly, but 2.00000 s follows 3.00000 s");
        assertThatThrownBy(() -> new MeasuredIrf(t, new double[] {0, 4, 1, 0, 3, 1, 0}, "a.csv"))
                .hasMessage("a.csv: IRF has more than one peak above half maximum: it drops to 25 % of the peak at 2.00000 s "
                        + "and rises to 75 % again at 4.00000 s (one pulse expected: cut the curve to the main peak)");
        assertThatThrownBy(() -> new MeasuredIrf(t, new double[] {3, 4, 1, 0, 0, 0, 0}, "a.csv"))
                .hasMessage("a.csv: IRF does not fall below half maximum before its first sample at 0.00000 s (record a wider time window)");
        assertThatThrownBy(() -> new MeasuredIrf(t, new double[] {0, 0, 0, 0, 0, 0, 0}, "a.csv"))
                .hasMessage("a.csv: IRF has no positive area (all values are zero)");
        assertThatThrownBy(() -> new MeasuredIrf(t, new double[] {0, 1, Double.NaN, 1, 0, 0, 0}, "a.csv"))
                .hasMessageStartingWith("a.csv: IRF sample 3 is not finite");
    }

    @Test
    void aBumpBelowHalfMaximumIsPartOfTheResponse() {
        MeasuredIrf irf = new MeasuredIrf(new double[] {0, 1, 2, 3, 4, 5, 6, 7}, new double[] {0, 2, 10, 2, 0, 3, 0, 0}, "echo");
        assertThat(irf.fwhmS()).isCloseTo(1.25, within(1e-12));
        assertThat(irf.centroidS()).isGreaterThan(2);
    }
}
