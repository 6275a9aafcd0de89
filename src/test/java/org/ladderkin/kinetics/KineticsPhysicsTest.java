package org.ladderkin.kinetics;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.kinetics.train.PeriodicSteadyState;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.kinetics.train.SteadyState;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class KineticsPhysicsTest {

    @Test
    @CheckedAgainst(source = "derived: Poisson statistics of independent absorption, P(N) = ⟨N⟩^N e^{−⟨N⟩}/N!, excited"
            + " fraction 1 − e^{−⟨N⟩} (as in Klimov, Annu. Rev. Phys. Chem. 58, 635 (2007))", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void onePulseOnGroundStateDotsGivesThePoissonDistribution() {
        for (double mean : new double[] {0.05, 1.0, 6.5}) {
            LadderKinetics k = LadderKinetics.forPulses(TestModels.ladder(20e-9, RadiativeScaling.LINEAR, 50e-12,
                    AugerScaling.STATISTICAL, 2, 0), new PulseExcitation.Poisson(mean));
            Populations after = k.applyPulse(Populations.ground(k.space()), new PulseExcitation.Poisson(mean));
            double[] d = after.excitonDistribution();
            double worst = 0;
            double factorial = 1;
            for (int n = 0; n < d.length - 1; n++) {
                factorial *= Math.max(1, n);
                double ref = Math.pow(mean, n) * Math.exp(-mean) / factorial;
                worst = Math.max(worst, Math.abs(d[n] - ref));
            }
            Reference.check("max_N |P(N) − ⟨N⟩^N e^{−⟨N⟩}/N!| at ⟨N⟩ = " + mean, worst, 0, 1e-15);
            Reference.checkRelative("excited fraction at ⟨N⟩ = " + mean, after.excitedFraction(), -Math.expm1(-mean), 1e-13);
        }
    }

    @Test
    @CheckedAgainst(source = "derived: biexciton → exciton → ground with total rates K₂ (N=2) and K₁ (N=1): P₂ = e^{−K₂t},"
            + " P₁ = K₂/(K₂ − K₁)·(e^{−K₁t} − e^{−K₂t}), solving dP₂/dt = −K₂P₂, dP₁/dt = K₂P₂ − K₁P₁ with P₂(0) = 1",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void biexcitonToExcitonToGroundFollowsTheTwoStateClosedForm() {
        double kRad = 1 / 20e-9;
        double kA = 1 / 50e-12;
        KineticModel m = TestModels.ladder(20e-9, RadiativeScaling.STATISTICAL, 50e-12, AugerScaling.STATISTICAL, 2, 2);
        LadderKinetics k = LadderKinetics.on(m, m.space(2));
        double k2 = 4 * kRad + kA; // statistical radiative scaling: f(2) = 4
        double k1 = kRad;
        double[] start = new double[3];
        start[2] = 1;
        double worst2 = 0;
        double worst1 = 0;
        for (double t : new double[] {1e-13, 1e-11, 5e-11, 2e-10, 1e-9, 2e-8, 1e-7}) {
            double[] p = k.propagate(new Populations(k.space(), start), t).probabilities();
            worst2 = Math.max(worst2, Math.abs(p[2] - Math.exp(-k2 * t)));
            worst1 = Math.max(worst1, Math.abs(p[1] - k2 / (k2 - k1) * (Math.exp(-k1 * t) - Math.exp(-k2 * t))));
        }
        Reference.check("max_t |P₂(t) − e^{−K₂t}|", worst2, 0, 1e-14);
        Reference.check("max_t |P₁(t) − K₂/(K₂−K₁)(e^{−K₁t} − e^{−K₂t})|", worst1, 0, 1e-14);
    }

    @Test
    @CheckedAgainst(source = "derived for g = 2 after Schaller & Klimov, Phys. Rev. Lett. 92, 186601 (2004) early/late"
            + " analysis: early bleach ∝ Σ min(N,2)P(N) = 2 − 2e^{−m} − m·e^{−m}, late (all Auger over, no single-exciton"
            + " decay) ∝ 2·(1 − e^{−m}); normalised bleach = those over g = 2", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void earlyToLateBleachRatioForTwofoldBandEdge() {
        // pure Auger (1 ps), single excitons live forever: late time 1 ns is after all Auger decay
        KineticModel m = new KineticModel(List.of(new RadiativeDecay(0, RadiativeScaling.LINEAR, 2),
                new AugerRecombination(1e12, AugerScaling.STATISTICAL, 0, 0, AugerIonisation.NONE)),
                EnumSet.of(Charge.NEUTRAL), false, 2, 0);
        for (double mean : new double[] {0.1, 1.0, 4.0}) {
            PulseExcitation pulse = new PulseExcitation.Poisson(mean);
            LadderKinetics k = LadderKinetics.forPulses(m, pulse);
            Trace tr = k.singlePulse(pulse, new double[] {0, 1e-9});
            double early = tr.bleach()[0];
            double late = tr.bleach()[1];
            double e = Math.exp(-mean);
            Reference.checkRelative("early/late bleach ratio, g = 2, ⟨N⟩ = " + mean, early / late,
                    (2 - 2 * e - mean * e) / (1 - e), 1e-9);
            Reference.checkRelative("late bleach (normalised), g = 2, ⟨N⟩ = " + mean, late, (1 - e) / 2, 1e-9);
        }
    }

    @Test
    @CheckedAgainst(source = "derived: two-level dot (N ≤ 1) decaying at k, pulse excites a ground dot with probability"
            + " a = 1 − e^{−⟨N⟩}; pre-pulse excited fraction x = e^{−kT}(x + (1−x)a) ⇒ x = a·e^{−kT}/(1 − e^{−kT}(1−a));"
            + " the one-period map's second eigenvalue is e^{−kT}(1 − a)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void singleExponentialPeriodicSteadyState() {
        double tau = 20e-9;
        KineticModel m = TestModels.ladder(tau, RadiativeScaling.LINEAR, 50e-12, AugerScaling.STATISTICAL, 2, 1);
        LadderKinetics k = LadderKinetics.on(m, m.space(1));
        for (double periodS : new double[] {12.5e-9, 100e-9}) {
            double mean = 0.7;
            SteadyState ss = k.steadyState(new PulseExcitation.Poisson(mean), periodS, true);
            double a = -Math.expm1(-mean);
            double decay = Math.exp(-periodS / tau);
            double x = a * decay / (1 - decay * (1 - a));
            Reference.checkRelative("pre-pulse excited fraction, T = " + periodS + " s", ss.residualExcitedFraction(), x, 1e-12);
            Reference.checkRelative("|λ₂| of the one-period map, T = " + periodS + " s", ss.secondEigenvalueModulus(),
                    decay * (1 - a), 1e-10);
        }
    }

    @Test
    @CheckedAgainst(source = "derived from the Auger scaling laws with g(2) = 1: τ_N = τ₂/g(N); statistical g = N²(N−1)/4"
            + " gives τ₂:τ₃:τ₄ = 1 : 2/9 : 1/12, pairs N(N−1)/2 gives 1 : 1/3 : 1/6, quadratic N²/4 gives 1 : 4/9 : 1/4",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void augerLifetimeRatiosFollowEachScalingLaw() {
        double[][] expected = {{2.0 / 9, 1.0 / 12}, {1.0 / 3, 1.0 / 6}, {4.0 / 9, 1.0 / 4}};
        AugerScaling[] laws = {AugerScaling.STATISTICAL, AugerScaling.PAIRS, AugerScaling.QUADRATIC};
        double tau2 = 50e-12;
        for (int l = 0; l < laws.length; l++) {
            KineticModel m = TestModels.ladder(0, RadiativeScaling.LINEAR, tau2, laws[l], 2, 4);
            LadderKinetics k = LadderKinetics.on(m, m.space(4));
            double[] tauN = new double[5];
            double t = 3e-12;
            for (int n = 2; n <= 4; n++) {
                double[] p0 = new double[5];
                p0[n] = 1;
                double survive = k.propagate(new Populations(k.space(), p0), t).probability(n);
                tauN[n] = -t / Math.log(survive);
            }
            Reference.checkRelative("τ₃/τ₂, " + laws[l].key() + " Auger scaling", tauN[3] / tauN[2], expected[l][0], 1e-12);
            Reference.checkRelative("τ₄/τ₂, " + laws[l].key() + " Auger scaling", tauN[4] / tauN[2], expected[l][1], 1e-12);
        }
    }

    @Test
    @CheckedAgainst(source = "brute force: iterating the one-period map from dots in the ground state until the distance"
            + " to the fixed point falls to 1 % of its start (derived)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void pulsesToSteadyStateAgreeWithBruteForceIteration() {
        // slow single-exciton decay at 80 MHz: build-up over many pulses dominated by the slowest transient
        KineticModel m = TestModels.ladder(200e-9, RadiativeScaling.LINEAR, 50e-12, AugerScaling.STATISTICAL, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(0.05);
        LadderKinetics k = LadderKinetics.forPulses(m, pulse);
        SteadyState ss = k.steadyState(pulse, 12.5e-9, true);
        PeriodicSteadyState train = k.pulseTrain(pulse, 12.5e-9);
        double[] fixed = ss.beforePulse().probabilities();
        double[] p = Populations.ground(k.space()).probabilities();
        double d0 = distance(p, fixed);
        int pulses = 0;
        while (distance(p, fixed) > 0.01 * d0) {
            p = train.apply(p);
            pulses++;
        }
        Reference.check("pulses to within 1 % of steady state: eigenvalue estimate vs brute force", ss.pulsesToOnePercent(),
                pulses, 1);
        assertThat(ss.pulsesToOnePercent()).isGreaterThan(10);
    }

    @Test
    void deflatedSpectralRadiusAgreesWithTheEigenvalue() {
        KineticModel m = TestModels.ladder(200e-9, RadiativeScaling.LINEAR, 50e-12, AugerScaling.STATISTICAL, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(0.3);
        LadderKinetics k = LadderKinetics.forPulses(m, pulse);
        PeriodicSteadyState train = k.pulseTrain(pulse, 12.5e-9);
        assertThat(train.deflatedSpectralRadius()).isCloseTo(train.secondEigenvalueModulus(),
                org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void buildUpApproachesTheFixedPoint() {
        KineticModel m = TestModels.ladder(200e-9, RadiativeScaling.LINEAR, 50e-12, AugerScaling.STATISTICAL, 2, 0);
        PulseExcitation pulse = new PulseExcitation.Poisson(0.5);
        LadderKinetics k = LadderKinetics.forPulses(m, pulse);
        PeriodicSteadyState train = k.pulseTrain(pulse, 12.5e-9);
        java.util.List<double[]> build = train.buildUp(200);
        assertThat(build).hasSize(200);
        assertThat(build.get(0)[0]).isEqualTo(1.0);
        assertThat(distance(build.get(199), train.fixedPoint())).isLessThan(1e-9);
        assertThat(distance(build.get(1), train.fixedPoint())).isGreaterThan(1e-3);
    }

    private static double distance(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += Math.abs(a[i] - b[i]);
        }
        return s;
    }

    @Test
    void nMaxIsChosenFromThePoissonTail() {
        LadderKinetics k = LadderKinetics.forPulses(TestModels.benchLadder().withFixedNMax(0), new PulseExcitation.Poisson(10));
        LadderSpace s = k.space();
        assertThat(org.ladderkin.excite.Occupancy.poissonTail(10, s.nMax())).isLessThan(KineticModel.TAIL);
        assertThat(org.ladderkin.excite.Occupancy.poissonTail(10, s.nMax() - 1)).isGreaterThanOrEqualTo(KineticModel.TAIL);
    }
}
