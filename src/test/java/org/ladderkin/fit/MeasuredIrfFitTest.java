package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.observe.MeasuredIrf;

/** The ladder fit model convolved with a measured instrument response. */
class MeasuredIrfFitTest {

    /** A Gaussian of FWHM {@code fwhmS} around {@code centreS}, sampled every {@code stepS} over ±4 FWHM. */
    static MeasuredIrf sampledGaussian(double fwhmS, double centreS, double stepS) {
        double sigma = fwhmS / (2 * Math.sqrt(2 * Math.log(2)));
        int n = (int) Math.round(8 * fwhmS / stepS);
        double[] t = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = centreS - 4 * fwhmS + (i + 0.5) * stepS;
            double z = (t[i] - centreS) / sigma;
            g[i] = Math.exp(-0.5 * z * z);
        }
        return new MeasuredIrf(t, g, "sampled Gaussian");
    }

    /**
     * An asymmetric response: a Gaussian of standard deviation {@code sigmaS} convolved with a one-sided exponential of
     * time constant {@code tailS} (closed form with erfc), sampled every {@code stepS}.
     */
    static MeasuredIrf exponentialTail(double sigmaS, double tailS, double stepS) {
        int n = (int) Math.round((6 * sigmaS + 12 * tailS) / stepS);
        double[] t = new double[n];
        double[] g = new double[n];
        double lam = 1 / tailS;
        for (int i = 0; i < n; i++) {
            t[i] = -5 * sigmaS + i * stepS;
            g[i] = Math.exp(lam / 2 * (lam * sigmaS * sigmaS - 2 * t[i]))
                    * org.hipparchus.special.Erf.erfc((lam * sigmaS * sigmaS - t[i]) / (Math.sqrt(2) * sigmaS));
        }
        return new MeasuredIrf(t, g, "tail.csv");
    }

    /** Delays from −3 ps to 2 ns: log-spaced on both sides of zero, so the grid is dense where the IRF acts. */
    static double[] delaysAcrossZero() {
        double[] after = SyntheticSeries.logDelays(0.01e-12, 2e-9, 70);
        double[] before = SyntheticSeries.logDelays(0.01e-12, 3e-12, 25);
        double[] d = new double[before.length + 1 + after.length];
        for (int i = 0; i < before.length; i++) {
            d[i] = -before[before.length - 1 - i];
        }
        System.arraycopy(after, 0, d, before.length + 1, after.length);
        return d;
    }

    /** Largest |measured − Gaussian| over both traces and the delay grid, relative to the largest |signal|. */
    static double worstDifference(double fwhm, double stepS, double periodS, double[] delays, double t0) {
        // centred far from zero on its own axis: the centroid, not the file's zero, is what lands on t₀
        MeasuredIrf irf = sampledGaussian(fwhm, 5e-12, stepS);
        double[] n = {0.5, 4};
        LadderBleachModel measured = LadderBleachModel.forModel(LadderSeries.BASE, "scale", n, periodS, irf);
        LadderBleachModel gaussian = LadderBleachModel.forModel(LadderSeries.BASE, "scale", n, periodS);
        double worst = 0;
        for (int i = 0; i < n.length; i++) {
            double[] a = measured.predict(i, delays, ParameterValues.shared(List.of("scale", "timeZeroS"), new double[] {1, t0}));
            double[] b = gaussian.predict(i, delays, ParameterValues.shared(List.of("scale", "timeZeroS", "irfFwhmS"),
                    new double[] {1, t0, fwhm}));
            double scale = 0;
            for (double v : b) {
                scale = Math.max(scale, Math.abs(v));
            }
            for (int m = 0; m < delays.length; m++) {
                worst = Math.max(worst, Math.abs(a[m] - b[m]) / scale);
            }
        }
        return worst;
    }

    @Test
    void aSampledGaussianGivesWhatTheGaussianPathGives() {
        double[] delays = delaysAcrossZero();
        for (double period : new double[] {Double.NaN, 30e-9}) {
            double fine = worstDifference(0.3e-12, 5e-15, period, delays, 0.1e-12);
            double coarse = worstDifference(0.3e-12, 10e-15, period, delays, 0.1e-12);
            // reading the samples as piecewise linear errs by h²·g″/8: 3e-5 of the signal at h = 5 fs (measured), and
            // halving h must divide the difference by about four, or it is not the sampling that limits the agreement
            assertThat(fine).as("period %g s", period).isLessThan(1e-4);
            assertThat(coarse / fine).as("period %g s", period).isBetween(3.0, 5.0);
        }
    }

    @Test
    void aPiecewiseLinearResponseMatchesAdaptiveQuadratureOfTheUnconvolvedModel() {
        // an asymmetric response that is exactly piecewise linear, so only the model's quadrature and interpolation differ
        MeasuredIrf irf = new MeasuredIrf(new double[] {-150e-15, -100e-15, 0, 200e-15, 350e-15},
                new double[] {0, 0.2, 1, 0.1, 0}, "triangle");
        double c = irf.centroidS();
        double[] t = irf.timesS();
        double[] g = irf.densityPerS();
        LadderModel fast = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 0.5e-12, AugerScaling.STATISTICAL, 2);
        double[] n = {3};
        // a 2 ns period leaves a bleach from earlier pulses, so the step part before time zero is not zero
        LadderBleachModel measured = LadderBleachModel.forModel(fast, "scale", n, 2e-9, irf);
        LadderBleachModel bare = LadderBleachModel.forModel(fast, "scale", n, 2e-9);
        ParameterValues p = ParameterValues.shared(List.of("scale"), new double[] {1});
        var integrator = new org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator(5, 1e-11, 1e-14);
        double[] taus = {-0.3e-12, -0.12e-12, -0.02e-12, 0, 0.03e-12, 0.1e-12, 0.25e-12, 0.4e-12, 1e-12, 3e-12};
        double[] model = measured.predict(0, taus, p);
        for (int m = 0; m < taus.length; m++) {
            double tau = taus[m];
            double reference = 0;
            for (int j = 0; j + 1 < t.length; j++) {
                int seg = j;
                double lo = t[j] - c;
                double hi = t[j + 1] - c;
                // the unconvolved signal jumps at x = τ: integrate the two sides apart
                double[] cuts = tau > lo && tau < hi ? new double[] {lo, tau, hi} : new double[] {lo, hi};
                for (int k = 0; k + 1 < cuts.length; k++) {
                    reference += integrator.integrate(100000, x -> {
                        double gx = g[seg] + (g[seg + 1] - g[seg]) * (x + c - t[seg]) / (t[seg + 1] - t[seg]);
                        double u = tau - x;
                        // exactly at the jump the quadrature never samples; either side is fine
                        return gx * bare.predict(0, new double[] {u}, p)[0];
                    }, cuts[k], cuts[k + 1]);
                }
            }
            assertThat(model[m]).as("τ = %g s", tau).isCloseTo(reference, org.assertj.core.data.Offset.offset(2e-6));
        }
    }

    @Test
    void aNoisySeriesMadeWithATailedIrfGivesBackTauAuger2AndTimeZero() {
        MeasuredIrf irf = exponentialTail(60e-15, 150e-15, 10e-15);
        double tau2 = 2e-12;
        double sigmaM2 = 1e-19;
        double t0 = 0.2e-12;
        LadderModel truth = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, tau2, AugerScaling.STATISTICAL, 2);
        double[] j = LadderSeries.fluencesPerM2(5, sigmaM2);
        double[] delays = delaysAcrossZero();
        for (int m = 0; m < delays.length; m++) {
            delays[m] += 0.05e-12;
        }
        LadderBleachModel maker = LadderBleachModel.forModel(truth, "crossSectionM2", j, Double.NaN, irf);
        SplittableRandom rng = new SplittableRandom(42);
        List<Trace> traces = new ArrayList<>();
        double noise = 5e-5;
        for (int i = 0; i < j.length; i++) {
            double[] y = maker.predict(i, delays, ParameterValues.shared(List.of("crossSectionM2", "timeZeroS"),
                    new double[] {sigmaM2, t0}));
            for (int m = 0; m < y.length; m++) {
                y[m] = 0.01 * y[m] + noise * SyntheticSeries.gaussian(rng);
            }
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, j[i]);
            traces.add(new Trace(delays, y, null, new TraceMetadata("J" + i, Optional.of(e), OptionalDouble.empty()), 0));
        }
        Dataset data = new Dataset(traces, List.of());
        LadderModel start = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 3.5e-12, AugerScaling.STATISTICAL, 2);
        LadderFit.Outcome o = LadderFit.fit(data, new LadderFitSetup(start, Double.NaN,
                Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2, LadderParameter.TIME_ZERO), Double.NaN, 0,
                Double.NaN, false, false, irf), FitProgress.NONE);
        FitResult r = o.result();
        assertThat(r.ok()).as(r.message()).isTrue();
        assertThat(o.measuredIrf()).isSameAs(irf);
        ParameterEstimate fittedTau = r.estimate("tauAuger2S");
        ParameterEstimate fittedT0 = r.estimate("timeZeroS");
        assertThat(fittedTau.stdError()).isFinite().isPositive().isLessThan(0.05 * tau2);
        assertThat(Math.abs(fittedTau.value() - tau2)).as("τ₂ = %g ± %g s", fittedTau.value(), fittedTau.stdError())
                .isLessThan(3 * fittedTau.stdError());
        assertThat(Math.abs(fittedT0.value() - t0)).as("t₀ = %g ± %g s", fittedT0.value(), fittedT0.stdError())
                .isLessThan(3 * fittedT0.stdError());
        assertThat(r.find("irfFwhmS", -1)).isEmpty();
        assertThat(r.reducedChiSquare() / (noise * noise)).isBetween(0.8, 1.25);
    }

    /**
     * Whatever the response looks like, where its file puts zero and in which units it counts must not matter: the
     * centroid is time zero and the area is one. Far before the response the signal is what earlier pulses left; far
     * after it, the unconvolved signal.
     */
    @org.junit.jupiter.params.ParameterizedTest(name = "seed {0}")
    @org.junit.jupiter.params.provider.ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void shiftingOrScalingTheFileChangesNothing(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        int n = 6 + rng.nextInt(60);
        double sigma = (30 + 150 * rng.nextDouble()) * 1e-15;
        double tail = (5 + 300 * rng.nextDouble()) * 1e-15;
        double span = 6 * sigma + 8 * tail;
        double[] t = new double[n];
        double[] g = new double[n];
        double lam = 1 / tail;
        double power = 0.8 + 0.4 * rng.nextDouble();
        for (int i = 0; i < n; i++) {
            // uneven spacing, as a scan with a non-linear stage readout gives
            t[i] = -3 * sigma + span * Math.pow(i / (double) (n - 1), power);
            g[i] = Math.exp(lam / 2 * (lam * sigma * sigma - 2 * t[i]))
                    * org.hipparchus.special.Erf.erfc((lam * sigma * sigma - t[i]) / (Math.sqrt(2) * sigma));
        }
        g[0] = 0;
        g[n - 1] = 0;
        MeasuredIrf irf = new MeasuredIrf(t, g, "random");
        double shift = (rng.nextDouble() - 0.5) * 1e-9;
        double[] shifted = irf.timesS();
        double[] scaled = irf.densityPerS();
        for (int i = 0; i < n; i++) {
            shifted[i] += shift;
            scaled[i] *= 1e6;
        }
        MeasuredIrf moved = new MeasuredIrf(shifted, scaled, "moved");
        double[] delays = delaysAcrossZero();
        double[] nAvg = {2};
        ParameterValues p = ParameterValues.shared(List.of("scale", "timeZeroS"), new double[] {1, 0.1e-12});
        double[] a = LadderBleachModel.forModel(LadderSeries.BASE, "scale", nAvg, 20e-9, irf).predict(0, delays, p);
        double[] b = LadderBleachModel.forModel(LadderSeries.BASE, "scale", nAvg, 20e-9, moved).predict(0, delays, p);
        double[] bare = LadderBleachModel.forModel(LadderSeries.BASE, "scale", nAvg, 20e-9).predict(0, delays, p);
        double before = bare[0];
        double c = irf.centroidS();
        double reach = Math.max(t[n - 1] - c, 50 * irf.rmsWidthS());
        for (int m = 0; m < delays.length; m++) {
            double tau = delays[m] - 0.1e-12;
            // a 0.5 ns shift costs the offsets about 1e-7 fs of rounding: far below the 1e-9 asked
            assertThat(b[m]).as("delay %g s", delays[m]).isCloseTo(a[m], org.assertj.core.data.Offset.offset(1e-9 * Math.abs(before) + 1e-9));
            if (tau <= t[0] - c) {
                assertThat(a[m]).isEqualTo(before);
            } else if (tau >= reach) {
                assertThat(a[m]).isCloseTo(bare[m], org.assertj.core.data.Offset.offset(1e-12));
            }
        }
    }

    @Test
    void theWidthOfAMeasuredIrfIsNotAFitParameter() {
        MeasuredIrf irf = sampledGaussian(0.3e-12, 0, 10e-15);
        assertThatThrownBy(() -> new LadderFitSetup(LadderSeries.BASE, Double.NaN, Set.of(LadderParameter.IRF), Double.NaN,
                0, 0.3e-12, false, false, irf))
                .hasMessage("the IRF width cannot be fitted with a measured IRF (sampled Gaussian fixes its shape and width; "
                        + "time zero stays free): remove 'irf' from the fitted parameters");
        assertThatThrownBy(() -> new LadderFitSetup(LadderSeries.BASE, Double.NaN, Set.of(LadderParameter.SCALE), Double.NaN,
                0, 0.3e-12, false, false, irf))
                .hasMessageStartingWith("give either a Gaussian IRF width (3.0E-13 s) or a measured IRF (sampled Gaussian), not both");
        LadderBleachModel model = LadderBleachModel.forModel(LadderSeries.BASE, "scale", new double[] {1}, Double.NaN, irf);
        assertThatThrownBy(() -> model.predict(0, new double[] {0, 1e-12},
                ParameterValues.shared(List.of("scale", "irfFwhmS"), new double[] {1, 0.3e-12})))
                .hasMessageContaining("a Gaussian IRF width (irfFwhmS) cannot be given as well");
    }
}
