package org.ladderkin.kinetics.train;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.kinetics.KineticModel;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.propagate.DenseLinear;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.Cooling;
import org.ladderkin.kinetics.rate.Neutralisation;
import org.ladderkin.kinetics.rate.RadiativeDecay;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;

/**
 * The periodic steady state of an ill-conditioned hot-resolved train (a charged state that lives 6 s under an 80 MHz
 * train: 1 − |λ₂| ≈ 2e-9) is a fixed point of the one-period map to rounding level.
 */
class FixedPointResidualTest {

    @Test
    void illConditionedHotTrainHasARoundingLevelResidual() {
        KineticModel model = new KineticModel(List.of(new RadiativeDecay(1 / 20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerRecombination(1 / 50e-12, AugerScaling.STATISTICAL, 1 / 200e-12, 1 / 200e-12,
                        new AugerIonisation(5e-9, Charge.NEGATIVE)),
                new Cooling(1 / 0.5e-12), new Neutralisation(1 / 6.25)), EnumSet.of(Charge.NEGATIVE), true, 2, 16);
        PulseExcitation pulse = new PulseExcitation.Poisson(4);
        LadderKinetics k = LadderKinetics.on(model, model.space(16));
        PeriodicSteadyState train = k.pulseTrain(pulse, 1 / 80e6);
        double gap = 1 - train.secondEigenvalueModulus();
        assertThat(gap).as("the slow mode is within a few 1e-9 of 1").isBetween(1e-10, 1e-7);

        double[] p = train.fixedPoint();
        double sum = 0;
        for (double x : p) {
            assertThat(x).isGreaterThanOrEqualTo(0.0);
            sum += x;
        }
        assertThat(Math.abs(sum - 1)).isLessThanOrEqualTo(1e-15);

        // the plain solve, for contrast: its residual is what the refinement removes
        double[][] m = train.map();
        int n = m.length;
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                a[i][j] = i == 0 ? 1 : m[i][j] - (i == j ? 1 : 0);
            }
        }
        double[] b = new double[n];
        b[0] = 1;
        double plain = train.residual(DenseLinear.solve(a, b));
        System.out.println("fixed-point residual: plain solve " + plain + ", refined " + train.residual(p)
                + ", 1 - |λ2| = " + gap);
        assertThat(train.residual(p)).as("max |M·p − p| within two units in the last place of 1")
                .isLessThanOrEqualTo(2 * Math.ulp(1.0));
    }
}
