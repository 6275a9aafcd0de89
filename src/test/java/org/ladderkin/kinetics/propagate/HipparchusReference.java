package org.ladderkin.kinetics.propagate;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/** Independent references from Hipparchus: the explicit Dormand–Prince 8(5,3) integrator and the matrix exponential. */
final class HipparchusReference {

    private HipparchusReference() {
    }

    /** States at each output time from DormandPrince853Integrator with the given tolerances. */
    static double[][] dormandPrince853(StiffSystem system, double t0, double[] y0, double[] outputTimesS,
                                       double absTol, double relTol) {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return system.dimension();
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] d = new double[y.length];
                system.derivatives(t, y, d);
                return d;
            }
        };
        double span = outputTimesS[outputTimesS.length - 1] - t0;
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-18 * span, span, absTol, relTol);
        dp.setMaxEvaluations(Integer.MAX_VALUE);
        double[][] out = new double[outputTimesS.length][];
        ODEState state = new ODEState(t0, y0.clone());
        for (int i = 0; i < outputTimesS.length; i++) {
            if (outputTimesS[i] > state.getTime()) {
                ODEStateAndDerivative s = dp.integrate(ode, state, outputTimesS[i]);
                state = new ODEState(s.getTime(), s.getPrimaryState());
            }
            out[i] = state.getPrimaryState().clone();
        }
        return out;
    }

    /** exp(G·t)·p0 with Hipparchus MatrixUtils.matrixExponential. */
    static double[] expmTimes(double[][] generator, double tS, double[] p0) {
        RealMatrix gt = new Array2DRowRealMatrix(generator).scalarMultiply(tS);
        return MatrixUtils.matrixExponential(gt).operate(p0);
    }
}
