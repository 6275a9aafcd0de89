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

    /**
     * P(t) on an ascending time grid for a ladder generator (transitions only downwards, N+1 → N), by
     * MatrixUtils.matrixExponential interval by interval on the states still populated: the top states whose
     * populations all fell below {@code dropBelow} are left out, which is exact up to that population because no
     * transition leads back up. This keeps ‖G·Δt‖ moderate; a single exp(G·t) with ‖G·t‖ ~ 1e9 loses ~3e-8 of the
     * probability in scaling and squaring.
     */
    static double[][] expmLadderPiecewise(double[][] generator, double[] timesS, double[] p0, double dropBelow) {
        RealMatrix g = new Array2DRowRealMatrix(generator);
        double[][] out = new double[timesS.length][];
        double[] p = p0.clone();
        double t = 0;
        for (int i = 0; i < timesS.length; i++) {
            int active = p.length;
            while (active > 1 && Math.abs(p[active - 1]) < dropBelow) {
                active--;
            }
            RealMatrix sub = g.getSubMatrix(0, active - 1, 0, active - 1).scalarMultiply(timesS[i] - t);
            double[] head = MatrixUtils.matrixExponential(sub).operate(java.util.Arrays.copyOf(p, active));
            double[] next = new double[p.length];
            System.arraycopy(head, 0, next, 0, active);
            p = next;
            t = timesS[i];
            out[i] = p.clone();
        }
        return out;
    }
}
