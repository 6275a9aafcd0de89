package org.ladderkin.observe;

import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;

/**
 * Photoluminescence from the ladder: the rate Σ_s k_rad(s)·P_s(t) per dot, the photons emitted per pulse, and the
 * TCSPC histogram of a pulse train seen through the instrument response.
 */
public final class Photoluminescence {

    /**
     * A TCSPC histogram.
     *
     * @param timesS        bin centres, relative to the pulse (s); the first bins lie before it
     * @param ratePerDot    PL rate per dot in each bin convolved with the IRF (photons/s per dot)
     * @param rawRatePerDot the same without the IRF
     */
    public record Histogram(double[] timesS, double[] ratePerDot, double[] rawRatePerDot) {
    }

    private Photoluminescence() {
    }

    /**
     * Photons one dot emits in the {@code periodS} after the pulse that produced {@code afterPulse}:
     * o·∫₀ᵀ e^{Qs}·p ds, from Q·x = e^{QT}p − p solved by back-substitution over the states that decay (the generator is
     * triangular, and states without decay emit nothing). Exact, no quadrature.
     */
    public static double emittedPerPulse(LadderKinetics kinetics, Populations afterPulse, double periodS) {
        double[][] q = kinetics.generator();
        double[] p0 = afterPulse.probabilities();
        double[] pT = kinetics.propagate(afterPulse, periodS).probabilities();
        double[] o = kinetics.photoluminescenceObservable();
        int n = p0.length;
        double[] x = new double[n];
        // generator is upper triangular: transitions go to lower indices, so solve from the top index down
        for (int i = n - 1; i >= 0; i--) {
            if (q[i][i] == 0) {
                continue;
            }
            double s = pT[i] - p0[i];
            for (int j = i + 1; j < n; j++) {
                s -= q[i][j] * x[j];
            }
            x[i] = s / q[i][i];
        }
        double photons = 0;
        for (int i = 0; i < n; i++) {
            photons += o[i] * x[i];
        }
        return photons;
    }

    /**
     * The TCSPC histogram of a pulse train in its periodic steady state: bins of {@code binS} from 6 IRF standard
     * deviations before the pulse to {@code rangeS}, PL taken modulo the period (a range longer than the period sees
     * the next pulse), convolved with a Gaussian IRF.
     *
     * @param afterPulse populations right after a pulse in the steady state
     */
    public static Histogram tcspc(LadderKinetics kinetics, Populations afterPulse, double periodS, double binS,
                                  double rangeS, double irfFwhmS) {
        if (!(binS > 0) || !(rangeS > binS) || !(periodS > 0)) {
            throw new IllegalArgumentException("TCSPC needs bin > 0, range > bin and period > 0");
        }
        double lead = 6 * IrfConvolution.sigmaOfFwhm(irfFwhmS);
        int before = (int) Math.ceil(lead / binS);
        int count = before + (int) Math.ceil(rangeS / binS);
        double[] times = new double[count];
        double[] sinceLastPulse = new double[count];
        for (int i = 0; i < count; i++) {
            times[i] = (i - before) * binS;
            double t = times[i] % periodS;
            sinceLastPulse[i] = t < 0 ? t + periodS : t;
        }
        double[] raw = kinetics.propagator().onGrid(sinceLastPulse)
                .observe(new double[][] {kinetics.photoluminescenceObservable()}, afterPulse.probabilities())[0];
        double[] conv = IrfConvolution.gaussian(raw, binS, irfFwhmS);
        return new Histogram(times, conv, raw);
    }
}
