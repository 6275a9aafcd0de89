package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.SplittableRandom;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.ladderkin.cli.BenchCases;
import org.ladderkin.kinetics.propagate.ExactPropagator;
import org.ladderkin.kinetics.propagate.SettlingPropagator;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.RateLaw;
import org.ladderkin.kinetics.rate.SampleRefresh;
import org.ladderkin.kinetics.rate.Trapping;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.PulseMatrix;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Ladders that resolve hot excitons, propagated by {@link SettlingPropagator} (uniformization up to the settle time,
 * then the plain-ladder modes on the cold states), against Hipparchus and against the dense modal path.
 */
class CoolingPropagationTest {

    static final String HIPPARCHUS = "Hipparchus 4.0.3 MatrixUtils.matrixExponential (Padé scaling and squaring, Higham 2005)";

    /** Every process on: statistical radiative and Auger, trions, ionisation, trapping, neutralisation, refresh. */
    static KineticModel hotModel(int nMax, double tauCoolS, boolean charged) {
        List<RateLaw> laws = new ArrayList<>();
        laws.add(new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2));
        laws.add(new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 1 / 200e-12, 1 / 300e-12,
                charged ? new AugerIonisation(0.1, Charge.NEGATIVE) : AugerIonisation.NONE));
        laws.add(new Trapping(1 / 5e-9));
        laws.add(new Cooling(1 / tauCoolS));
        if (charged) {
            laws.add(new Neutralisation(1 / 1e-6));
            laws.add(new SampleRefresh(1 / 1e-3));
        }
        EnumSet<Charge> charges = charged ? EnumSet.allOf(Charge.class) : EnumSet.of(Charge.NEUTRAL);
        return new KineticModel(laws, charges, true, 2, nMax);
    }

    static LadderKinetics engine(KineticModel model) {
        return LadderKinetics.on(model, model.space(model.fixedNMax()));
    }

    static double maxDiff(double[][] a, RealMatrix b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a.length; j++) {
                m = Math.max(m, Math.abs(a[i][j] - b.getEntry(i, j)));
            }
        }
        return m;
    }

    static double maxDiff(double[] a, double[] b) {
        double m = 0;
        for (int i = 0; i < a.length; i++) {
            m = Math.max(m, Math.abs(a[i] - b[i]));
        }
        return m;
    }

    @Test
    @CheckedAgainst(source = HIPPARCHUS, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void smallHotLaddersMatchHipparchusFromZeroToTenNanoseconds() {
        double worst = 0;
        for (int nMax = 3; nMax <= 6; nMax++) {
            for (boolean charged : new boolean[] {false, true}) {
                LadderKinetics k = engine(hotModel(nMax, 0.5e-12, charged));
                assertThat(k.propagator()).isInstanceOf(SettlingPropagator.class);
                double[][] q = k.generator();
                // beyond 10 ns the reference's own squaring drifts (2.3e-10 at 1 µs, 2.4e-7 at 1 ms on these ladders,
                // in powers of two), so longer delays are checked against the closed form and the dense path below
                for (double t : new double[] {0, 1e-15, 1e-13, 1e-12, 5e-12, 2e-11, 1e-10, 1e-9, 1e-8}) {
                    RealMatrix ref = MatrixUtils.matrixExponential(MatrixUtils.createRealMatrix(q).scalarMultiply(t));
                    worst = Math.max(worst, maxDiff(k.propagator().matrix(t), ref));
                }
            }
        }
        Reference.check("max |exp(Qt) − reference| over entries, hot-resolved Nmax 3–6 (± charges), 0..10 ns", worst, 0, 1e-10);
    }

    @Test
    @CheckedAgainst(source = "derived: every state but the neutral ground state leaves at >= 1/(1 µs) (neutralisation), "
            + "so after 1 ms all of the population is in the ground state to within e^-1000",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void afterOneMillisecondEveryStartEndsInTheGroundState() {
        double worst = 0;
        for (int nMax = 3; nMax <= 6; nMax++) {
            for (boolean charged : new boolean[] {false, true}) {
                double[][] m = engine(hotModel(nMax, 0.5e-12, charged)).propagator().matrix(1e-3);
                for (int i = 0; i < m.length; i++) {
                    for (int j = 0; j < m.length; j++) {
                        worst = Math.max(worst, Math.abs(m[i][j] - (i == 0 ? 1 : 0)));
                    }
                }
            }
        }
        Reference.check("max |exp(Q·1 ms) − (all to ground)|, hot-resolved Nmax 3–6 (± charges)", worst, 0, 1e-12);
    }

    @Test
    void smallHotLaddersAgreeWithTheDenseModalPathAtOneMicrosecond() {
        double worst = 0;
        for (int nMax = 3; nMax <= 6; nMax++) {
            LadderKinetics k = engine(hotModel(nMax, 0.5e-12, true));
            double[][] a = k.propagator().matrix(1e-6);
            double[][] b = ExactPropagator.of(k.generator()).matrix(1e-6);
            for (int i = 0; i < a.length; i++) {
                worst = Math.max(worst, maxDiff(a[i], b[i]));
            }
        }
        assertThat(worst).isLessThan(1e-12);
    }

    @Test
    void cooling21AgreesWithTheDenseModalPathAtChosenDelays() {
        LadderKinetics k = engine(BenchCases.cooling21());
        assertThat(k.propagator()).isInstanceOf(SettlingPropagator.class);
        ExactPropagator dense = ExactPropagator.of(k.generator());
        double[] p0 = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(3)).probabilities();
        double worst = 0;
        for (double t : new double[] {1e-13, 1e-12, 5e-12, 2e-11, 3e-11, 1e-10, 1e-9, 1e-7, 1e-3}) {
            worst = Math.max(worst, maxDiff(k.propagator().propagate(p0, t), dense.propagate(p0, t)));
        }
        assertThat(worst).isLessThan(1e-10);
    }

    @Test
    void chargedTenExcitonLadderAgreesWithTheDenseModalPath() {
        LadderKinetics k = engine(hotModel(10, 0.3e-12, true));
        ExactPropagator dense = ExactPropagator.of(k.generator());
        double[] p0 = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(2)).probabilities();
        double worst = 0;
        for (double t : new double[] {2e-13, 3e-12, 1.5e-11, 4e-11, 1e-9, 1e-6, 1e-3}) {
            worst = Math.max(worst, maxDiff(k.propagator().propagate(p0, t), dense.propagate(p0, t)));
        }
        double[][] a = k.propagator().matrix(12.5e-9);
        double[][] b = dense.matrix(12.5e-9);
        for (int i = 0; i < a.length; i++) {
            worst = Math.max(worst, maxDiff(a[i], b[i]));
        }
        assertThat(worst).isLessThan(1e-10);
    }

    @Test
    void slowCoolingTakesManyStepsAndStaysExact() {
        LadderKinetics k = engine(hotModel(8, 500e-12, true));
        assertThat(k.propagator()).isInstanceOf(SettlingPropagator.class);
        assertThat(((SettlingPropagator) k.propagator()).stepsToSettle()).isGreaterThan(30_000);
        ExactPropagator dense = ExactPropagator.of(k.generator());
        double[] p0 = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(2)).probabilities();
        double worst = 0;
        for (double t : new double[] {1e-12, 1e-10, 2e-9, 1e-8, 1e-6}) {
            double[] p = k.propagate(new Populations(k.space(), p0), t).probabilities();
            worst = Math.max(worst, maxDiff(p, dense.propagate(p0, t)));
        }
        assertThat(worst).isLessThan(1e-10);
    }

    @Test
    void traceOnAGridMatchesSinglePropagations() {
        LadderKinetics k = engine(BenchCases.cooling21());
        Populations after = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(3));
        Trace trace = k.trace(after, BenchCases.DELAYS_S);
        double[] bleach = k.bleachObservable();
        double worst = 0;
        for (int j = 0; j < BenchCases.DELAYS_S.length; j += 37) {
            double[] p = k.propagator().propagate(after.probabilities(), BenchCases.DELAYS_S[j]);
            double s = 0;
            for (int i = 0; i < p.length; i++) {
                s += bleach[i] * p[i];
            }
            worst = Math.max(worst, Math.abs(s - trace.bleach()[j]));
        }
        assertThat(worst).isLessThan(1e-12);
    }

    @Test
    void repeatedTracesFromCachedRowsMatchTheFirstUniformizationRun() {
        KineticModel model = hotModel(12, 0.4e-12, true);
        LadderKinetics k = engine(model);
        double[][] obs = {k.bleachObservable(), k.photoluminescenceObservable()};
        double[] p1 = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(1)).probabilities();
        double[] p2 = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(4)).probabilities();
        var grid = k.propagator().onGrid(BenchCases.DELAYS_S);
        grid.observe(obs, p1);
        double[][] cached = grid.observe(obs, p2);
        double[][] fresh = k.propagator().onGrid(BenchCases.DELAYS_S).observe(obs, p2);
        double worstBleach = maxDiff(cached[0], fresh[0]);
        double plScale = 0;
        for (double x : fresh[1]) {
            plScale = Math.max(plScale, Math.abs(x));
        }
        assertThat(worstBleach).isLessThan(1e-12);
        // PL is in photons/s per dot: compare relative to its largest value
        assertThat(maxDiff(cached[1], fresh[1])).isLessThan(1e-12 * plScale);
        // other observables on the same grid go back to the uniformization run and are still right
        double[][] other = grid.observe(new double[][] {obs[1]}, p1);
        double[][] otherFresh = k.propagator().onGrid(BenchCases.DELAYS_S).observe(new double[][] {obs[1]}, p1);
        assertThat(maxDiff(other[0], otherFresh[0])).isEqualTo(0.0);
    }

    @Test
    void steadyStateIsThatOfTheDenseOnePeriodMap() {
        KineticModel model = hotModel(8, 0.5e-12, true);
        LadderKinetics k = engine(model);
        ExactPropagator dense = ExactPropagator.of(k.generator());
        PulseExcitation pulse = new PulseExcitation.Poisson(1.5);
        double worst = 0;
        for (double period : new double[] {1e-3, 12.5e-9}) {
            SteadyState fast = k.steadyState(pulse, period, false);
            double[] ref = new PeriodicSteadyState(k.space(), dense.matrix(period), PulseMatrix.of(k.space(), pulse))
                    .fixedPoint();
            worst = Math.max(worst, maxDiff(fast.beforePulse().probabilities(), ref));
        }
        assertThat(worst).isLessThan(1e-10);
    }

    @Test
    void slowCoolingFallsBackToTheDensePath() {
        LadderKinetics k = engine(hotModel(4, 1e-6, false));
        assertThat(k.propagator()).isInstanceOf(ExactPropagator.class);
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void probabilityIsConservedOnRandomHotLadders(long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        KineticModel model = hotModel(3 + rnd.nextInt(10), 0.1e-12 * Math.pow(10, rnd.nextDouble() * 2), rnd.nextBoolean());
        LadderKinetics k = engine(model);
        Populations p = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(rnd.nextDouble() * 3));
        for (double t : new double[] {0, 1e-14, 1e-12, 1e-11, 1e-10, 1e-8, 1e-6, 1e-3}) {
            double[] q = k.propagate(p, t).probabilities();
            double s = 0;
            for (double x : q) {
                assertThat(x).isGreaterThanOrEqualTo(-PopulationGuard.NEGATIVE_TOLERANCE);
                s += x;
            }
            assertThat(Math.abs(s - 1)).isLessThan(PopulationGuard.SUM_TOLERANCE);
        }
    }
}
