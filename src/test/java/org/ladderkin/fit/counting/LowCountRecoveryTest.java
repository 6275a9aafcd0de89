package org.ladderkin.fit.counting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Low-count recovery: histograms simulated in closed form ({@link SimulatedHistograms}) with a peak of 100 counts and
 * 2 background counts per bin, fitted by Poisson likelihood over 200 seeds, and by least squares weighted by
 * 1/max(n, 1) (the √N weights of the trade) for comparison. The mono-exponential runs at 80 MHz with τ = 3 ns, so a
 * 1.5 % tail wraps into the next period; the biexponential (3 ns and 0.5 ns, equal amplitudes) at 20 MHz, where
 * τ₁ is known to 6 % per histogram (at 80 MHz its finite-sample bias is 3 %). Measured at these seeds: τ bias
 * +0.02 %, coverage 63.5 %; biexponential biases +0.4 % and −0.5 %, coverages 63.5 % and 65.5 %; with the background
 * held at its true value, √N-weighted least squares −6.7 %, the likelihood +0.02 %.
 */
class LowCountRecoveryTest {

    static final int BINS = 256;
    static final double PERIOD_S = 12.5e-9;
    static final double BIN_S = PERIOD_S / BINS;
    static final double START_S = -1e-9;
    static final double FWHM_S = 120e-12;
    static final double CENTRE_S = 0.0137e-9;
    static final double PEAK = 100;
    static final double BACKGROUND = 2;
    static final int SEEDS = 200;

    /** Summary of one study. */
    record Study(double[] bias, double[] coverage, double[] lsqBias) {
    }

    @Test
    @CheckedAgainst(source = "derived: the maximum-likelihood estimate is asymptotically unbiased and normal with the "
            + "inverse observed information as covariance, so ±1 standard error covers 68.3 % (accepted 60–76 % over 200 "
            + "seeds, about ±2.4 binomial standard deviations)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void monoExponentialLifetimeIsRecoveredWithHonestErrors() {
        Study s = study(new double[] {1}, new double[] {3e-9}, PERIOD_S, SEEDS, true);
        System.out.printf("mono τ: likelihood bias %.4f, coverage %.3f; background held: likelihood %.4f, √N-weighted "
                + "least squares %.4f%n", s.bias()[0], s.coverage()[0], s.lsqBias()[1], s.lsqBias()[0]);
        Reference.check("relative bias of τ (mono, 200 seeds)", s.bias()[0], 0, 0.01);
        Reference.check("coverage of τ ± SE (mono, 200 seeds)", s.coverage()[0], 0.68, 0.08);
        // with the background held at its known value, √N-weighted least squares pulls every low bin down and shortens
        // τ (−6.7 % here); the likelihood fit of the same histograms stays unbiased
        assertThat(s.lsqBias()[0]).as("√N-weighted least-squares bias of τ, background held").isLessThan(-0.03);
        assertThat(Math.abs(s.lsqBias()[1])).as("likelihood bias of τ, background held").isLessThan(0.01);
    }

    @Test
    @CheckedAgainst(source = "derived: the maximum-likelihood estimate is asymptotically unbiased and normal with the "
            + "inverse observed information as covariance, so ±1 standard error covers 68.3 % (accepted 60–76 % over 200 "
            + "seeds)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void biexponentialLifetimesAreRecoveredWithHonestErrors() {
        Study s = study(new double[] {0.5, 0.5}, new double[] {3e-9, 0.5e-9}, 50e-9, SEEDS, false);
        System.out.printf("biexp τ1, τ2: bias %.4f %.4f, coverage %.3f %.3f%n", s.bias()[0], s.bias()[1],
                s.coverage()[0], s.coverage()[1]);
        Reference.check("relative bias of τ₁ (biexponential, 200 seeds)", s.bias()[0], 0, 0.01);
        Reference.check("relative bias of τ₂ (biexponential, 200 seeds)", s.bias()[1], 0, 0.01);
        Reference.check("coverage of τ₁ ± SE (biexponential, 200 seeds)", s.coverage()[0], 0.68, 0.08);
        Reference.check("coverage of τ₂ ± SE (biexponential, 200 seeds)", s.coverage()[1], 0.68, 0.08);
    }

    @Test
    @Tag("long")
    @EnabledIfSystemProperty(named = "ladderkin.long", matches = "true")
    void monoExponentialOverTwoThousandSeeds() {
        Study s = study(new double[] {1}, new double[] {3e-9}, PERIOD_S, 2000, true);
        assertThat(Math.abs(s.bias()[0])).isLessThan(0.003);
        assertThat(s.coverage()[0]).isBetween(0.65, 0.71);
        System.out.printf("mono τ, 2000 seeds: likelihood bias %.4f, coverage %.3f; √N-weighted least squares bias %.4f%n",
                s.bias()[0], s.coverage()[0], s.lsqBias()[0]);
    }

    static Study study(double[] weights, double[] tausS, double periodS, int seeds, boolean withLeastSquares) {
        double[] mean = SimulatedHistograms.mean(BINS, START_S, BIN_S, CENTRE_S, FWHM_S, weights, tausS, periodS, 12, PEAK,
                BACKGROUND);
        int n = tausS.length;
        double[] sum = new double[n];
        double[] covered = new double[n];
        double[] sq = new double[n];
        double[] se = new double[n];
        double lsqSum = 0;
        double heldSum = 0;
        for (int seed = 0; seed < seeds; seed++) {
            double[] counts = SimulatedHistograms.poisson(mean, new SplittableRandom(1000 + seed));
            CountHistogram h = CountHistogram.of("seed " + seed, START_S, BIN_S, counts);
            LikelihoodResult r = fit(h, tausS, periodS, false, Double.NaN);
            assertThat(r.status()).as("seed " + seed + ": " + r.message()).isEqualTo(LikelihoodResult.Status.CONVERGED);
            for (int k = 0; k < n; k++) {
                var e = r.estimate("tau" + (k + 1) + "S");
                sum[k] += e.value() / tausS[k] - 1;
                sq[k] += Math.pow(e.value() / tausS[k] - 1, 2);
                se[k] += e.stdError() / tausS[k];
                if (Math.abs(e.value() - tausS[k]) <= e.stdError()) {
                    covered[k]++;
                }
            }
            if (withLeastSquares) {
                lsqSum += fit(h, tausS, periodS, true, BACKGROUND).estimate("tau1S").value() / tausS[0] - 1;
                heldSum += fit(h, tausS, periodS, false, BACKGROUND).estimate("tau1S").value() / tausS[0] - 1;
            }
        }
        for (int k = 0; k < n; k++) {
            System.out.printf("τ%d: rms error %.4f, mean SE %.4f%n", k + 1, Math.sqrt(sq[k] / seeds), se[k] / seeds);
        }
        double[] bias = new double[n];
        double[] coverage = new double[n];
        for (int k = 0; k < n; k++) {
            bias[k] = sum[k] / seeds;
            coverage[k] = covered[k] / seeds;
        }
        return new Study(bias, coverage, new double[] {lsqSum / seeds, heldSum / seeds});
    }

    /** The likelihood fit (or the √N-weighted least-squares one) of one histogram, started 20 % off the truth. */
    static LikelihoodResult fit(CountHistogram h, double[] tausS, double periodS, boolean neyman, double heldBackground) {
        DecayLaw law = tausS.length == 1 ? ExponentialDecay.single(tausS[0] * 1.2)
                : ExponentialDecay.biexponential(tausS[0] * 1.2, tausS[1] * 0.8, 0.4);
        List<ParameterSpec> shared = new ArrayList<>(law.parameters());
        shared.add(ParameterSpec.positive("countIrfFwhm", "S", FWHM_S).fixedAt(FWHM_S));
        shared.add(ParameterSpec.unbounded("shift", "S", HistogramPart.risingEdgeS(h), BIN_S));
        CountModel model = new CountModel(0, h, 4, law, InstrumentResponse.gaussian(), periodS, null);
        HistogramPart part = new HistogramPart(h, model, heldBackground, HistogramPart.amplitudeFor(h, 1));
        return LikelihoodFitter.fit(shared, List.of(neyman ? new NeymanPart(part) : part), List.of());
    }

    /** Least squares with σ² = max(n, 1): the weights the likelihood fit is compared with. */
    record NeymanPart(HistogramPart inner) implements LikelihoodPart {

        @Override
        public String label() {
            return inner.label();
        }

        @Override
        public boolean counts() {
            return false;
        }

        @Override
        public int points() {
            return inner.points();
        }

        @Override
        public List<ParameterSpec> localParameters() {
            return inner.localParameters();
        }

        @Override
        public void residuals(ParameterValues p, double[] out, int offset) {
            double[] mu = inner.fitted(p);
            double[] n = inner.data();
            for (int i = 0; i < n.length; i++) {
                out[offset + i] = (n[i] - mu[i]) / Math.sqrt(Math.max(n[i], 1));
            }
        }

        @Override
        public double[] fitted(ParameterValues p) {
            return inner.fitted(p);
        }

        @Override
        public double[] data() {
            return inner.data();
        }
    }
}
