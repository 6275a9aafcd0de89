package org.ladderkin.kinetics.propagate;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/** Decay ladders dP_N/dt = −k_N P_N + k_{N+1} P_{N+1}: the integrator against independent Hipparchus references. */
class LadderPropagationTest {

    private static double[] logTimes(double fromS, double toS, int perDecade) {
        int count = (int) Math.round(Math.log10(toS / fromS) * perDecade) + 1;
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = fromS * Math.pow(toS / fromS, i / (double) (count - 1));
        }
        return t;
    }

    /** Poisson occupation with mean nAvg over N = 0..n−1, the truncated tail put on the top state. */
    private static double[] poisson(int n, double nAvg) {
        double[] p = new double[n];
        double term = Math.exp(-nAvg);
        double sum = 0;
        for (int i = 0; i < n - 1; i++) {
            p[i] = term;
            sum += term;
            term *= nAvg / (i + 1);
        }
        p[n - 1] = 1 - sum;
        return p;
    }

    private static final double[] RATES_30 = StiffFixtures.logSpacedLadderRates(30, 1e6, 1e12);
    private static final double[] P0_30 = poisson(30, 6.0);

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 MatrixUtils.matrixExponential (Pade scaling and squaring, Higham 2005) "
            + "applied to P(0), single exp(G t) for t <= 1 us", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void thirtyStateLadderAgreesWithSingleMatrixExponentialUpToOneMicrosecond() {
        double[] times = logTimes(1e-12, 1e-6, 10);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-11, 1e-8))
                .integrate(StiffFixtures.ladder(RATES_30), 0, P0_30, times);
        double[][] g = StiffFixtures.ladderGenerator(RATES_30);
        double worst = 0;
        for (int i = 0; i < times.length; i++) {
            double[] ref = HipparchusReference.expmTimes(g, times[i], P0_30);
            worst = Math.max(worst, maxDifference(r.states()[i], ref) / maxAbs(ref));
            if (i % 20 == 0) {
                Reference.check("30-state ladder: max_N |P_N - exp(Gt)P0| / max P at t = " + times[i] + " s",
                        maxDifference(r.states()[i], ref) / maxAbs(ref), 0.0, 1e-8);
            }
        }
        Reference.check("30-state ladder: worst max_N |P_N - exp(Gt)P0| / max P over 61 times 1 ps..1 us", worst, 0.0,
                1e-8);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 MatrixUtils.matrixExponential applied interval by interval between the "
            + "output times on the states still populated (> 1e-30)", kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void thirtyStateLadderAgreesWithMatrixExponentialFromOnePicosecondToOneMillisecond() {
        double[] times = logTimes(1e-12, 1e-3, 10);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-11, 1e-8))
                .integrate(StiffFixtures.ladder(RATES_30), 0, P0_30, times);
        double[][] ref = HipparchusReference.expmLadderPiecewise(StiffFixtures.ladderGenerator(RATES_30), times, P0_30,
                1e-30);
        double worst = 0;
        double worstConservation = 0;
        for (int i = 0; i < times.length; i++) {
            worst = Math.max(worst, maxDifference(r.states()[i], ref[i]) / maxAbs(ref[i]));
            double sum = 0;
            for (double p : r.states()[i]) {
                sum += p;
            }
            worstConservation = Math.max(worstConservation, Math.abs(sum - 1));
        }
        Reference.check("30-state ladder P_0(1 ns)", r.states()[30][0], ref[30][0], 1e-8);
        Reference.check("30-state ladder P_1(1 us)", r.states()[60][1], ref[60][1], 1e-8);
        Reference.check("30-state ladder P_0(1 ms)", r.states()[90][0], ref[90][0], 1e-8);
        Reference.check("30-state ladder: worst max_N |P_N - expm| / max P over 91 times 1 ps..1 ms", worst, 0.0, 1e-8);
        Reference.check("30-state ladder: worst |sum P - 1| over 91 times (derived: generator columns sum to 0)",
                worstConservation, 0.0, 1e-12);
    }

    private static double maxDifference(double[] a, double[] b) {
        double d = 0;
        for (int i = 0; i < a.length; i++) {
            d = Math.max(d, Math.abs(a[i] - b[i]));
        }
        return d;
    }

    private static double maxAbs(double[] a) {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 DormandPrince853Integrator, absTol 1e-14, relTol 1e-12",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void mildlyStiffLadderAgreesWithDormandPrince853() {
        // 12 states, rates from 1/(2 ns) to 1/(20 ps): stiffness ratio 100, still fine for an explicit method
        double[] k = StiffFixtures.logSpacedLadderRates(12, 5e8, 5e10);
        double[] p0 = poisson(12, 3.0);
        double[] times = logTimes(1e-11, 1e-8, 3);
        double[][] ref = HipparchusReference.dormandPrince853(StiffFixtures.ladder(k), 0, p0, times, 1e-14, 1e-12);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-13, 1e-10))
                .integrate(StiffFixtures.ladder(k), 0, p0, times);
        double worst = 0;
        for (int i = 0; i < times.length; i++) {
            for (int n = 0; n < k.length; n++) {
                worst = Math.max(worst, Math.abs(r.states()[i][n] - ref[i][n]));
            }
        }
        Reference.check("12-state ladder P_1(100 ps)", r.states()[3][1], ref[3][1], 1e-10);
        Reference.check("12-state ladder P_0(10 ns)", r.states()[9][0], ref[9][0], 1e-10);
        Reference.check("12-state ladder: worst |P_N - DP853| over 10 times 10 ps..10 ns", worst, 0.0, 1e-10);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 DormandPrince853Integrator, absTol 1e-14, relTol 1e-12",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void gaussianPumpedLadderAgreesWithDormandPrince853() {
        // six levels, decay k_N = N/(1 ns) + N(N-1)/2 /(30 ps); pump rate g0·exp(-(t-tc)^2/(2σ^2)),
        // σ = 100 fs, tc = 1 ps, ∫g dt = 2 (about two excitations per dot if nothing saturated)
        double[] k = new double[6];
        for (int n = 1; n < 6; n++) {
            k[n] = n / 1e-9 + n * (n - 1) / 2.0 / 30e-12;
        }
        double sigma = 100e-15;
        double g0 = 2.0 / (sigma * Math.sqrt(2 * Math.PI));
        StiffSystem pumped = StiffFixtures.pumpedLadder(k, g0, 1e-12, sigma);
        double[] p0 = {1, 0, 0, 0, 0, 0};
        double[] times = {0.8e-12, 1.0e-12, 1.1e-12, 1.3e-12, 2e-12, 10e-12, 100e-12};
        double[][] ref = HipparchusReference.dormandPrince853(pumped, 0, p0, times, 1e-14, 1e-12);
        IntegrationResult r = new ImplicitStiffIntegrator(new Tolerances(1e-13, 1e-10)).integrate(pumped, 0, p0, times);
        double worst = 0;
        double worstSum = 0;
        for (int i = 0; i < times.length; i++) {
            double sum = 0;
            for (int n = 0; n < k.length; n++) {
                worst = Math.max(worst, Math.abs(r.states()[i][n] - ref[i][n]));
                sum += r.states()[i][n];
            }
            worstSum = Math.max(worstSum, Math.abs(sum - 1));
        }
        Reference.check("pumped ladder P_0 at pulse peak (1 ps)", r.states()[1][0], ref[1][0], 1e-10);
        Reference.check("pumped ladder P_2 after the pulse (1.3 ps)", r.states()[3][2], ref[3][2], 1e-10);
        Reference.check("pumped ladder: worst |P_N - DP853| over 7 times 0.8..100 ps", worst, 0.0, 1e-10);
        Reference.check("pumped ladder: worst |sum P - 1|", worstSum, 0.0, 1e-12);
    }
}
