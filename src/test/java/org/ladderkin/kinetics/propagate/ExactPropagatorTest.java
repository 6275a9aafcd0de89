package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.SplittableRandom;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.GeneratorBuilder;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class ExactPropagatorTest {

    static final String HIPPARCHUS = "Hipparchus 4.0.3 MatrixUtils.matrixExponential (Padé scaling and squaring, Higham 2005)";

    /** Largest |a − b| over all entries. */
    static double maxDiff(double[][] a, RealMatrix b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a.length; j++) {
                m = Math.max(m, Math.abs(a[i][j] - b.getEntry(i, j)));
            }
        }
        return m;
    }

    static RealMatrix reference(double[][] q, double t) {
        return MatrixUtils.matrixExponential(MatrixUtils.createRealMatrix(q).scalarMultiply(t));
    }

    /** The 31-state ladder of the benchmark: τ_rad 20 ns statistical, τ₂ 50 ps statistical. */
    static double[][] benchLadder() {
        LadderSpace space = LadderSpace.neutral(30);
        return GeneratorBuilder.build(space, List.of(
                new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE)));
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void ladderOf31StatesMatchesHipparchusAtDelaysFromFsToMs() {
        double[][] q = benchLadder();
        ExactPropagator p = ExactPropagator.of(q);
        double worst = 0;
        // beyond 10 ns the reference itself needs 30+ squarings and drifts by more than 1e-9 (at 1 ms it is 4e-6 off
        // the exact value 1 for P(ground | one exciton)), so it is not a reference there
        for (double t : new double[] {1e-15, 1e-13, 1e-12, 1e-11, 1e-10, 1e-9, 1e-8}) {
            worst = Math.max(worst, maxDiff(p.matrix(t), reference(q, t)));
        }
        Reference.check("max |exp(Qt) − reference| over entries and 7 delays 1 fs..10 ns, 31-state Auger ladder", worst, 0, 2e-10);
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void exactlyCoincidentRatesMatchHipparchus() {
        // N-state chain where all rates are equal: the Bateman form divides by zero
        int n = 8;
        double k = 1e9;
        double[][] q = new double[n][n];
        for (int i = 1; i < n; i++) {
            q[i][i] = -k;
            q[i - 1][i] = k;
        }
        ExactPropagator p = ExactPropagator.of(q);
        double worst = 0;
        for (double t : new double[] {0, 1e-12, 1e-10, 1e-9, 5e-9, 2e-8, 1e-6}) {
            worst = Math.max(worst, maxDiff(p.matrix(t), reference(q, t)));
        }
        Reference.check("max |exp(Qt) − reference|, 8-state chain with all rates equal", worst, 0, 1e-13);
    }

    @Test
    @CheckedAgainst(source = "derived: chain 2 → 1 → 0 with equal rates k, P₀(t) = 1 − e^{−kt}(1 + kt) (Erlang-2 distribution)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void exactlyCoincidentRatesMatchTheErlangClosedForm() {
        int n = 8;
        double k = 1e9;
        double[][] q = new double[n][n];
        for (int i = 1; i < n; i++) {
            q[i][i] = -k;
            q[i - 1][i] = k;
        }
        ExactPropagator p = ExactPropagator.of(q);
        double t = 1.3e-9;
        Reference.check("P(0,t) from state 2, equal rates, vs 1 − e^{−kt}(1+kt)", p.propagate(unit(n, 2), t)[0],
                1 - Math.exp(-k * t) * (1 + k * t), 1e-14);
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void nearlyCoincidentRatesMatchHipparchus() {
        double[] gaps = {1e-14, 1e-11, 1e-8, 1e-5, 1e-3, 1e-2};
        double worst = 0;
        for (double g : gaps) {
            double[][] q = new double[4][4];
            double[] k = {0, 1e9, 1e9 * (1 + g), 1e9 * (1 + 2 * g)};
            for (int i = 1; i < 4; i++) {
                q[i][i] = -k[i];
                q[i - 1][i] = k[i];
            }
            ExactPropagator p = ExactPropagator.of(q);
            for (double t : new double[] {1e-11, 1e-9, 3e-9, 1e-8}) {
                worst = Math.max(worst, maxDiff(p.matrix(t), reference(q, t)));
            }
        }
        Reference.check("max |exp(Qt) − reference|, rates 1, 1+g, 1+2g (1/ns), g = 1e-14..1e-2", worst, 0, 1e-13);
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void randomTriangularGeneratorsWithRepeatedRatesMatchHipparchus() {
        SplittableRandom rnd = new SplittableRandom(20261202L);
        double worst = 0;
        for (int trial = 0; trial < 20; trial++) {
            int n = 3 + rnd.nextInt(15);
            double[][] q = new double[n][n];
            double[] pool = {1e8, 1e9, 1e9 * (1 + 1e-9), 3e10, 1e12};
            for (int j = 1; j < n; j++) {
                double out = pool[rnd.nextInt(pool.length)];
                // split the outflow over random lower states
                double left = out;
                for (int i = 0; i < j; i++) {
                    double part = i == j - 1 ? left : left * rnd.nextDouble() * 0.5;
                    q[i][j] += part;
                    left -= part;
                }
                q[j][j] = -out;
            }
            ExactPropagator p = ExactPropagator.of(q);
            for (double t : new double[] {1e-13, 1e-11, 1e-9, 1e-7}) {
                worst = Math.max(worst, maxDiff(p.matrix(t), reference(q, t)));
            }
        }
        Reference.check("max |exp(Qt) − reference|, 20 random triangular generators with repeated rates", worst, 0, 1e-11);
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void padeExponentialMatchesHipparchusOnDenseMatrices() {
        SplittableRandom rnd = new SplittableRandom(7);
        double worstRel = 0;
        for (double scale : new double[] {1e-3, 0.1, 1, 5, 40}) {
            int n = 12;
            double[][] a = new double[n][n];
            for (double[] row : a) {
                for (int j = 0; j < n; j++) {
                    row[j] = scale * (rnd.nextDouble() - 0.5) / Math.sqrt(n);
                }
            }
            RealMatrix ref = MatrixUtils.matrixExponential(MatrixUtils.createRealMatrix(a));
            worstRel = Math.max(worstRel, maxDiff(PadeExponential.exp(a), ref) / ref.getNorm1());
        }
        Reference.check("max |expm(A) − reference| / ‖reference‖₁, random dense 12×12, ‖A‖ from 1e-3 to 40", worstRel, 0, 1e-12);
    }

    @Test
    void gridTracesAgreeWithDirectPropagation() {
        double[][] q = benchLadder();
        ExactPropagator p = ExactPropagator.of(q);
        double[] p0 = new double[31];
        p0[5] = 0.5;
        p0[30] = 0.5;
        double[] times = {0, 1e-13, 1e-12, 1e-10, 1e-8, 1e-5};
        double[] obs = new double[31];
        for (int i = 0; i < 31; i++) {
            obs[i] = Math.min(i, 2) / 2.0;
        }
        double[] trace = p.onGrid(times).observe(new double[][] {obs}, p0)[0];
        for (int j = 0; j < times.length; j++) {
            double[] pt = p.propagate(p0, times[j]);
            double direct = 0;
            for (int i = 0; i < 31; i++) {
                direct += obs[i] * pt[i];
            }
            // half the dots start at N = 30, where the modal basis has ‖V‖·‖V⁻¹‖ ≈ 2e7: rounding ≈ 1e-16 × that
            assertThat(trace[j]).isCloseTo(direct, org.assertj.core.data.Offset.offset(1e-16 * p.growth()));
        }
    }

    /** Chain of n states where every excited state decays at the same rate: one coincidence cluster of n − 1. */
    static double[][] equalRateChain(int n, double k) {
        double[][] q = new double[n][n];
        for (int i = 1; i < n; i++) {
            q[i][i] = -k;
            q[i - 1][i] = k;
        }
        return q;
    }

    @ParameterizedTest(name = "{0} states, {1} uniform times")
    @CsvSource({"8, 400", "31, 3000"})
    void uniformGridsThatStepTheClusterExponentialAgreeWithFreshExponentials(int n, int count) {
        // the 31-state case is too large to cache per time, so it also covers the uncached path
        double[][] q = equalRateChain(n, 2e11);
        ExactPropagator p = ExactPropagator.of(q);
        double h = 2.7e-15;
        double[] times = new double[count + 3];
        for (int i = 0; i < count; i++) {
            times[i] = i * h;
        }
        // irregular times after the run must not reuse its step
        times[count] = count * h + 1e-13;
        times[count + 1] = 3e-11;
        times[count + 2] = 3e-11 + h;
        double[] p0 = new double[n];
        p0[n - 1] = 0.7;
        p0[n / 2] = 0.3;
        double[][] obs = new double[2][n];
        for (int i = 0; i < n; i++) {
            obs[0][i] = Math.min(i, 2) / 2.0;
            obs[1][i] = i;
        }
        double[][] traces = p.onGrid(times).observe(obs, p0);
        double worst = 0;
        for (int j = 0; j < times.length; j++) {
            double[] pt = p.propagate(p0, times[j]);
            for (int r = 0; r < 2; r++) {
                double direct = 0;
                for (int i = 0; i < n; i++) {
                    direct += obs[r][i] * pt[i];
                }
                worst = Math.max(worst, Math.abs(traces[r][j] - direct) / Math.max(1, Math.abs(direct)));
            }
        }
        assertThat(worst).isLessThan(1e-12);
    }

    static double[] unit(int n, int i) {
        double[] e = new double[n];
        e[i] = 1;
        return e;
    }
}
