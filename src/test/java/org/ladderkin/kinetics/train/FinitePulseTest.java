package org.ladderkin.kinetics.train;

import java.util.List;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.ladderkin.excite.Occupancy;
import org.ladderkin.kinetics.rate.GeneratorBuilder;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.propagate.ImplicitStiffIntegrator;
import org.ladderkin.kinetics.propagate.Tolerances;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class FinitePulseTest {

    @Test
    @CheckedAgainst(source = "derived: absorption at a rate σ·φ(t) independent of N is a pure-birth process whose count after"
            + " the pulse is Poisson with mean σ·∫φ dt = σ·j", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void shortNonResonantPulseGivesPoissonWithMeanSigmaTimesFluence() {
        LadderSpace space = LadderSpace.neutral(25);
        // no decay during the pulse: the closed form holds exactly
        double[][] q = GeneratorBuilder.build(space, List.of(new RadiativeDecay(0, RadiativeScaling.LINEAR, 2)));
        double sigma = 5e-19;
        double fluence = 4e18;
        double fwhm = 100e-15;
        FinitePulseSystem sys = new FinitePulseSystem(space, q, sigma, 0, fluence, fwhm);
        double[] p0 = new double[space.size()];
        p0[0] = 1;
        double[] after = new ImplicitStiffIntegrator(new Tolerances(1e-13, 1e-10))
                .integrate(sys, -8 * fwhm, p0, new double[] {8 * fwhm}).states()[0];
        double[] ref = Occupancy.poisson(sigma * fluence, space.size());
        double worst = 0;
        for (int n = 0; n < space.size() - 1; n++) {
            worst = Math.max(worst, Math.abs(after[n] - ref[n]));
        }
        Reference.check("max_N |P(N) after a 100 fs pulse − Poisson(σj = 2)|", worst, 0, 1e-9);
    }

    @Test
    @CheckedAgainst(source = "Hipparchus 4.0.3 DormandPrince853Integrator (explicit, non-stiff) on the same generator",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void bandEdgePulseWithDecayAgreesWithDormandPrince() {
        LadderSpace space = LadderSpace.neutral(4);
        double[][] q = GeneratorBuilder.build(space, List.of(new RadiativeDecay(1 / 2e-12, RadiativeScaling.LINEAR, 2)));
        double fwhm = 1e-12;
        FinitePulseSystem sys = new FinitePulseSystem(space, q, 1e-18, 2, 3e18, fwhm);
        double[] p0 = new double[space.size()];
        p0[0] = 1;
        double end = 4 * fwhm;
        double[] implicit = new ImplicitStiffIntegrator(new Tolerances(1e-13, 1e-10))
                .integrate(sys, -4 * fwhm, p0, new double[] {end}).states()[0];
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return sys.dimension();
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] d = new double[y.length];
                sys.derivatives(t, y, d);
                return d;
            }
        };
        double[] explicit = new DormandPrince853Integrator(1e-18, 1e-12, 1e-14, 1e-12)
                .integrate(ode, new ODEState(-4 * fwhm, p0), end).getPrimaryState();
        double worst = 0;
        for (int i = 0; i < implicit.length; i++) {
            worst = Math.max(worst, Math.abs(implicit[i] - explicit[i]));
        }
        Reference.check("max |P_implicit − P_DormandPrince853|, band-edge (g = 2) 1 ps pulse with 2 ps decay", worst, 0, 1e-9);
        // band-edge saturation: no dot can hold more than g = 2 excitons
        org.assertj.core.api.Assertions.assertThat(implicit[3] + implicit[4]).isLessThanOrEqualTo(1e-15);
    }
}
