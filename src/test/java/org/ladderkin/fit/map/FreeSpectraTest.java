package org.ladderkin.fit.map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.optim.univariate.UnivariatePointValuePair;
import org.hipparchus.util.Pair;
import org.junit.jupiter.api.Test;

class FreeSpectraTest {

    private static final double TAU1_S = 2e-9;
    private static final List<String> TWO = List.of("X", "XX");

    /**
     * The test's own two-state model: dots holding at least one exciton decay with τ₁, the extra population of dots
     * holding at least two with τ₂; each weighted by the Poisson probability of that occupancy at ⟨N⟩.
     */
    private static double[][] twoStatePopulations(double occupancy, double[] delaysS, double tau2S) {
        double p0 = Math.exp(-occupancy);
        double atLeastOne = 1 - p0;
        double atLeastTwo = 1 - p0 - occupancy * p0;
        double[][] p = new double[delaysS.length][2];
        for (int t = 0; t < delaysS.length; t++) {
            double d = Math.max(delaysS[t], 0);
            p[t][0] = atLeastOne * Math.exp(-d / TAU1_S);
            p[t][1] = atLeastTwo * Math.exp(-d / tau2S);
        }
        return p;
    }

    private static double[] delays(int n, double lastS) {
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = -0.5e-12 + lastS * Math.pow(i / (n - 1.0), 2);
        }
        return d;
    }

    private static double[] wavelengths(int n) {
        double[] l = new double[n];
        for (int i = 0; i < n; i++) {
            l[i] = 560e-9 + 2e-9 * i;
        }
        return l;
    }

    /** A bleach line per state (different centres, signs), as invented demo spectra. */
    private static double[][] spectra(double[] lambdaM, int states) {
        double[][] s = new double[states][lambdaM.length];
        for (int k = 0; k < states; k++) {
            double centre = 580e-9 - 6e-9 * k;
            for (int w = 0; w < lambdaM.length; w++) {
                double x = (lambdaM[w] - centre) / 12e-9;
                s[k][w] = (k % 2 == 0 ? -1 : 0.6) * 0.01 * Math.exp(-x * x) + 1e-4 * (k + 1);
            }
        }
        return s;
    }

    private static DeltaAMap map(double[] lambdaM, double[] delaysS, double[][] populations, double[][] spectra,
                                 Random noise, double sigmaOd) {
        int n = lambdaM.length;
        double[] v = new double[n * delaysS.length];
        for (int t = 0; t < delaysS.length; t++) {
            for (int w = 0; w < n; w++) {
                double sum = 0;
                for (int s = 0; s < spectra.length; s++) {
                    sum += populations[t][s] * spectra[s][w];
                }
                v[t * n + w] = sum + (noise == null ? 0 : sigmaOd * noise.nextGaussian());
            }
        }
        return new DeltaAMap(lambdaM, delaysS, v);
    }

    @Test
    void noiseFreeMapsGiveBackTheirSpectraIncludingWavelengthsWithMissingCells() {
        double[] lambda = wavelengths(50);
        double[] d = delays(40, 800e-12);
        double[][] truth = spectra(lambda, 2);
        double[] occupancies = {0.3, 1.0, 3.0};
        List<double[][]> pops = new ArrayList<>();
        List<DeltaAMap> maps = new ArrayList<>();
        for (double n : occupancies) {
            double[][] p = twoStatePopulations(n, d, 60e-12);
            pops.add(p);
            maps.add(map(lambda, d, p, truth, null, 0));
        }
        // a few missing cells send their wavelengths through the per-wavelength path
        double[] withHoles = maps.get(1).deltaAOd().clone();
        withHoles[3 * 50 + 7] = Double.NaN;
        withHoles[20 * 50 + 7] = Double.NaN;
        withHoles[0 * 50 + 31] = Double.NaN;
        maps.set(1, new DeltaAMap(lambda, d, withHoles));

        SpectraSolution s = FreeSpectra.solve(pops, maps, TWO);
        assertThat(s.separable()).isTrue();
        assertThat(s.message()).isEmpty();
        for (int k = 0; k < 2; k++) {
            for (int w = 0; w < 50; w++) {
                assertThat(s.spectraOd()[k][w]).as("state %d, wavelength %d", k, w).isCloseTo(truth[k][w], within(1e-10 * 0.01));
                assertThat(s.standardErrorsOd()[k][w]).isLessThan(1e-10 * 0.01);
            }
        }
        assertThat(s.residualSumOfSquares()).isLessThan(1e-24);
    }

    @Test
    void standardErrorsAreTheLeastSquaresCovarianceTimesEachWavelengthsResidualVariance() {
        double[] lambda = wavelengths(8);
        double[] d = delays(30, 500e-12);
        double[][] truth = spectra(lambda, 2);
        Random noise = new Random(17);
        List<double[][]> pops = new ArrayList<>();
        List<DeltaAMap> maps = new ArrayList<>();
        for (double n : new double[] {0.5, 2.0}) {
            double[][] p = twoStatePopulations(n, d, 40e-12);
            pops.add(p);
            maps.add(map(lambda, d, p, truth, noise, 2e-4));
        }
        SpectraSolution s = FreeSpectra.solve(pops, maps, TWO);

        // the textbook route, unscaled: (AᵀA)⁻¹ Aᵀb and (AᵀA)⁻¹ · rss/(m − k)
        double[][] stacked = new double[60][];
        for (int i = 0; i < 60; i++) {
            stacked[i] = pops.get(i / 30)[i % 30];
        }
        RealMatrix a = new Array2DRowRealMatrix(stacked);
        RealMatrix inverse = MatrixUtils.inverse(a.transpose().multiply(a));
        for (int w = 0; w < 8; w++) {
            double[] b = new double[60];
            for (int i = 0; i < 60; i++) {
                b[i] = maps.get(i / 30).value(i % 30, w);
            }
            RealVector x = inverse.operate(a.transpose().operate(new ArrayRealVector(b)));
            RealVector r = new ArrayRealVector(b).subtract(a.operate(x));
            double rss = r.dotProduct(r);
            assertThat(s.residualSumsOfSquares()[w]).isCloseTo(rss, within(1e-9 * rss));
            for (int k = 0; k < 2; k++) {
                assertThat(s.spectraOd()[k][w]).isCloseTo(x.getEntry(k), within(1e-9 * 0.01));
                double se = Math.sqrt(inverse.getEntry(k, k) * rss / (60 - 2));
                assertThat(s.standardErrorsOd()[k][w]).isCloseTo(se, within(1e-8 * se));
            }
        }
    }

    @Test
    void aWavelengthWithMissingCellsIsSolvedOnTheRowsItHas() {
        double[] lambda = wavelengths(4);
        double[] d = delays(20, 300e-12);
        double[][] truth = spectra(lambda, 2);
        Random noise = new Random(3);
        double[][] pop = twoStatePopulations(1.5, d, 30e-12);
        double[] values = map(lambda, d, pop, truth, noise, 3e-4).deltaAOd().clone();
        values[2 * 4 + 1] = Double.NaN;
        values[15 * 4 + 1] = Double.NaN;
        SpectraSolution s = FreeSpectra.solve(pop, values, 4, TWO);

        // the same wavelength as its own problem, the two rows taken out by hand
        double[][] kept = new double[18][];
        double[] column = new double[18];
        int r = 0;
        for (int t = 0; t < 20; t++) {
            if (t != 2 && t != 15) {
                kept[r] = pop[t];
                column[r++] = values[t * 4 + 1];
            }
        }
        SpectraSolution alone = FreeSpectra.solve(kept, column, 1, TWO);
        for (int k = 0; k < 2; k++) {
            assertThat(s.spectraOd()[k][1]).isCloseTo(alone.spectraOd()[k][0], within(1e-12));
            assertThat(s.standardErrorsOd()[k][1]).isCloseTo(alone.standardErrorsOd()[k][0], within(1e-12));
        }
        assertThat(s.residualSumsOfSquares()[1]).isCloseTo(alone.residualSumOfSquares(), within(1e-15));
        assertThat(s.residualSumOfSquares()).isGreaterThan(alone.residualSumOfSquares());
        // a wavelength missing a cell is not solved with the shared factorisation: its neighbours keep all 20 rows
        assertThat(s.spectraOd()[0][1]).isNotEqualTo(FreeSpectra.solve(pop, fill(values), 4, TWO).spectraOd()[0][1]);
    }

    private static double[] fill(double[] values) {
        double[] out = values.clone();
        for (int i = 0; i < out.length; i++) {
            out[i] = Double.isNaN(out[i]) ? 0 : out[i];
        }
        return out;
    }

    @Test
    void theProjectedObjectiveOverTau2AgreesWithAJointLevenbergMarquardtFit() {
        double[] lambda = wavelengths(6);
        double[] d = delays(25, 400e-12);
        double[][] truth = spectra(lambda, 2);
        double[] occupancies = {0.5, 2.5};
        Random noise = new Random(5);
        List<DeltaAMap> maps = new ArrayList<>();
        for (double n : occupancies) {
            maps.add(map(lambda, d, twoStatePopulations(n, d, 50e-12), truth, noise, 1e-4));
        }

        // variable projection: one nonlinear parameter, the spectra solved inside the objective (τ₂ in ps for the optimiser)
        UnivariateObjectiveFunction objective = new UnivariateObjectiveFunction(tau2Ps -> {
            List<double[][]> pops = new ArrayList<>();
            for (double n : occupancies) {
                pops.add(twoStatePopulations(n, d, tau2Ps * 1e-12));
            }
            return FreeSpectra.solve(pops, maps, TWO).residualSumOfSquares();
        });
        UnivariatePointValuePair best = new BrentOptimizer(1e-12, 1e-14).optimize(new MaxEval(500), objective,
                GoalType.MINIMIZE, new SearchInterval(10, 200, 70));
        double tau2VarProPs = best.getPoint();
        List<double[][]> pops = new ArrayList<>();
        for (double n : occupancies) {
            pops.add(twoStatePopulations(n, d, tau2VarProPs * 1e-12));
        }
        SpectraSolution atBest = FreeSpectra.solve(pops, maps, TWO);

        // brute force: τ₂ and all 12 spectrum values as parameters of one least-squares problem
        int nw = lambda.length;
        int nt = d.length;
        double[] target = new double[occupancies.length * nt * nw];
        for (int j = 0; j < occupancies.length; j++) {
            System.arraycopy(maps.get(j).deltaAOd(), 0, target, j * nt * nw, nt * nw);
        }
        LeastSquaresOptimizer.Optimum joint = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-15).withOrthoTolerance(1e-15)
                .optimize(new LeastSquaresBuilder()
                        .model(point -> jointModel(point, occupancies, d, nw))
                        .target(target)
                        .maxEvaluations(10_000).maxIterations(10_000)
                        .start(startAt(70, nw))
                        .build());
        double tau2JointPs = joint.getPoint().getEntry(0);

        assertThat(tau2VarProPs).isCloseTo(50, within(5.0));
        assertThat(tau2VarProPs).isCloseTo(tau2JointPs, within(1e-6 * tau2JointPs));
        for (int k = 0; k < 2; k++) {
            for (int w = 0; w < nw; w++) {
                double joined = joint.getPoint().getEntry(1 + k * nw + w);
                assertThat(atBest.spectraOd()[k][w]).as("state %d, wavelength %d", k, w)
                        .isCloseTo(joined, within(1e-6 * Math.abs(joined)));
            }
        }
        assertThat(atBest.residualSumOfSquares()).isCloseTo(joint.getCost() * joint.getCost(), within(1e-9 * atBest.residualSumOfSquares()));
    }

    private static double[] startAt(double tau2Ps, int nw) {
        double[] p = new double[1 + 2 * nw];
        p[0] = tau2Ps;
        return p;
    }

    /** Values and Jacobian of the joint model: parameters τ₂ (ps), then S_X(λ), then S_XX(λ). */
    private static Pair<RealVector, RealMatrix> jointModel(RealVector point, double[] occupancies, double[] d, int nw) {
        double tau2Ps = point.getEntry(0);
        int nt = d.length;
        int rows = occupancies.length * nt * nw;
        double[] value = new double[rows];
        double[][] jac = new double[rows][1 + 2 * nw];
        int i = 0;
        for (double n : occupancies) {
            double[][] p = twoStatePopulations(n, d, tau2Ps * 1e-12);
            for (int t = 0; t < nt; t++) {
                double tPs = Math.max(d[t], 0) / 1e-12;
                double dP2dTau = p[t][1] * tPs / (tau2Ps * tau2Ps);
                for (int w = 0; w < nw; w++) {
                    double s1 = point.getEntry(1 + w);
                    double s2 = point.getEntry(1 + nw + w);
                    value[i] = p[t][0] * s1 + p[t][1] * s2;
                    jac[i][0] = dP2dTau * s2;
                    jac[i][1 + w] = p[t][0];
                    jac[i][1 + nw + w] = p[t][1];
                    i++;
                }
            }
        }
        return new Pair<>(new ArrayRealVector(value, false), new Array2DRowRealMatrix(jac, false));
    }

    @Test
    void oneFluenceCannotSeparateStatesThatShareTheirKineticsAndTheSeriesCan() {
        double[] lambda = wavelengths(10);
        double[] d = delays(30, 600e-12);
        double[][] truth = spectra(lambda, 3);
        List<String> states = List.of("X", "XX", "X-");
        double[] one = {1.2};
        SpectraSolution alone = FreeSpectra.solve(threeStatePopulations(one, d), mapsOf(lambda, d, one, truth), states);
        assertThat(alone.separable()).isFalse();
        assertThat(alone.unseparable()).containsExactly("X", "X-");
        assertThat(alone.message()).contains("X, X-").contains("cannot be separated");
        for (int w = 0; w < 10; w++) {
            assertThat(alone.spectraOd()[0][w]).isNaN();
            assertThat(alone.spectraOd()[2][w]).isNaN();
            // the biexciton's own kinetics set it apart even at one fluence: its spectrum stays determined
            assertThat(alone.spectraOd()[1][w]).isCloseTo(truth[1][w], within(1e-10 * 0.01));
        }

        double[] series = {0.4, 1.2, 3.0};
        SpectraSolution all = FreeSpectra.solve(threeStatePopulations(series, d), mapsOf(lambda, d, series, truth), states);
        assertThat(all.separable()).isTrue();
        for (int k = 0; k < 3; k++) {
            for (int w = 0; w < 10; w++) {
                assertThat(all.spectraOd()[k][w]).isCloseTo(truth[k][w], within(1e-10 * 0.01));
            }
        }
    }

    /**
     * X and XX as in {@link #twoStatePopulations}, plus a charged single exciton X- decaying with the same τ₁ whose
     * share grows with ⟨N⟩ in another way (∝ ⟨N⟩·e^−⟨N⟩, an invented weight): at one fluence X and X- are proportional.
     */
    private static List<double[][]> threeStatePopulations(double[] occupancies, double[] d) {
        List<double[][]> out = new ArrayList<>();
        for (double n : occupancies) {
            double[][] two = twoStatePopulations(n, d, 60e-12);
            double[][] p = new double[d.length][3];
            for (int t = 0; t < d.length; t++) {
                p[t][0] = two[t][0];
                p[t][1] = two[t][1];
                p[t][2] = 0.3 * n * Math.exp(-n) * Math.exp(-Math.max(d[t], 0) / TAU1_S);
            }
            out.add(p);
        }
        return out;
    }

    private static List<DeltaAMap> mapsOf(double[] lambda, double[] d, double[] occupancies, double[][] truth) {
        List<double[][]> pops = threeStatePopulations(occupancies, d);
        List<DeltaAMap> maps = new ArrayList<>();
        for (double[][] p : pops) {
            maps.add(map(lambda, d, p, truth, null, 0));
        }
        return maps;
    }
}
