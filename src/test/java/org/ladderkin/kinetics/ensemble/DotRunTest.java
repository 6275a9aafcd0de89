package org.ladderkin.kinetics.ensemble;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.propagate.ImplicitStiffIntegrator;
import org.ladderkin.kinetics.propagate.Tolerances;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.LadderSpace;
import org.ladderkin.kinetics.train.FinitePulse;
import org.ladderkin.kinetics.train.FinitePulseSystem;
import org.ladderkin.kinetics.train.PulseExcitation;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class DotRunTest {

    private static KineticModel model(int g) {
        return LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.LINEAR, 30e-12, AugerScaling.STATISTICAL, g).toModel();
    }

    /** The same pulse by the project's implicit Radau integrator (adaptive, tight tolerances) from −H to t. */
    private static double[] implicit(FinitePulseSystem sys, double halfWindowS, double[] p0, double tS) {
        return new ImplicitStiffIntegrator(new Tolerances(1e-13, 1e-11)).integrate(sys, -halfWindowS, p0,
                new double[] {tS}).states()[0];
    }

    private static double worst(double[] a, double[] b) {
        double w = 0;
        for (int i = 0; i < a.length; i++) {
            w = Math.max(w, Math.abs(a[i] - b[i]));
        }
        return w;
    }

    private static void compare(int g, double meanN, double fwhmS) {
        LadderKinetics k = LadderKinetics.forPulses(model(g), new PulseExcitation.Poisson(meanN));
        LadderSpace space = k.space();
        FinitePulseSystem sys = new FinitePulseSystem(space, k.generator(), 1e-18, g == 2 ? 2 : 0, meanN / 1e-18, fwhmS);
        FinitePulse pulse = FinitePulse.of(sys, fwhmS);
        double[] p0 = new double[space.size()];
        p0[space.ground()] = 1;
        double h = pulse.halfWindowS();
        assertThat(worst(pulse.apply(p0), implicit(sys, h, p0, h))).as("whole window").isLessThan(1e-7);
        // inside the window, where the state is built from the stored steps and one partial step
        assertThat(worst(pulse.at(p0, 0.3 * fwhmS), implicit(sys, h, p0, 0.3 * fwhmS))).as("inside").isLessThan(1e-7);
    }

    @Test
    void magnusPropagatorAgreesWithTheImplicitIntegratorAboveTheGap() {
        // 150 fs against Auger lifetimes down to 30 ps / 1000 at the top of the ladder: stiff
        compare(8, 7.5, 150e-15);
    }

    @Test
    void magnusPropagatorAgreesWithTheImplicitIntegratorAtTheBandEdge() {
        compare(2, 3, 1e-12);
    }

    @Test
    @CheckedAgainst(source = "derived: with absorption at σ(1 − n/g) and stimulated emission at σ·n/g, detailed balance"
            + " (1 − n/g)·P(n) = ((n + 1)/g)·P(n + 1) gives P(n) = C(g, n)/2^g, mean g/2: transparency, not N = g (the mean"
            + " relaxes as e^{−2σj/g}, e^{−30} at σj = 120)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void strongResonantPumpStopsAtTransparency() {
        int g = 8;
        KineticModel slow = LadderModel.radiativeAndAuger(1.0, RadiativeScaling.LINEAR, 1.0, AugerScaling.STATISTICAL, g)
                .toModel().withFixedNMax(12);
        LadderKinetics k = LadderKinetics.forPulses(slow, new PulseExcitation.Poisson(1));
        double fwhm = 100e-15;
        FinitePulseSystem sys = new FinitePulseSystem(k.space(), k.generator(), 1e-18, g, 120 / 1e-18, fwhm);
        double[] p0 = new double[k.space().size()];
        p0[k.space().ground()] = 1;
        double[] after = FinitePulse.of(sys, fwhm).apply(p0);
        double mean = 0;
        for (int s = 0; s < after.length; s++) {
            mean += k.space().excitons(s) * after[s];
        }
        Reference.check("mean band-edge excitons after a σj = 120 resonant pulse, g = 8", mean, g / 2.0, 1e-6);
        double top = 0;
        for (int s = 0; s < after.length; s++) {
            if (k.space().excitons(s) == g) {
                top += after[s];
            }
        }
        Reference.check("P(N = g) after it, C(8, 8)/2⁸", top, 1 / 256.0, 1e-8);
    }

    @Test
    void longPulseSteadyStateIsTheFixedPointOfRepeatedPulses() {
        KineticModel m = model(8);
        PulseExcitation p = new PulseExcitation.Poisson(3);
        DotRun run = new DotRun(m, p, new PumpPulse(2e-12, false));
        double period = 1e-9;
        DotRun.After a = run.after(p, period);
        assertThat(a.why()).contains("change during the pulse");
        // brute force: many periods of pulse then exact decay for the rest of the period
        double[] state = new double[run.kinetics().space().size()];
        state[run.kinetics().space().ground()] = 1;
        for (int i = 0; i < 400; i++) {
            state = a.finite().apply(state);
            state = run.kinetics().propagator().propagate(state, period - 2 * a.finite().halfWindowS());
        }
        assertThat(worst(state, a.before())).isLessThan(1e-9);
        // and the finite pulse does differ from an instantaneous one at this width
        DotRun instant = new DotRun(m, p, PumpPulse.INSTANT);
        double[] row = run.kinetics().bleachObservable();
        double finiteBleach = run.observe(a, new double[][] {row}, new double[] {5e-12})[0][0];
        double instantBleach = instant.observe(instant.after(p, period), new double[][] {row}, new double[] {5e-12})[0][0];
        assertThat(Math.abs(finiteBleach / instantBleach - 1)).isGreaterThan(1e-3);
    }
}
