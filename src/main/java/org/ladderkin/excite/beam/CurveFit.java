package org.ladderkin.excite.beam;

import java.util.function.Function;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * Unweighted Levenberg–Marquardt on Hipparchus with standard errors from (JᵀJ)⁻¹ scaled by the residual variance
 * χ²/(n − p): beam data come without per-point uncertainties, so the scatter about the fit is the only noise estimate.
 */
final class CurveFit {

    /** The model's values and Jacobian (rows: points, columns: parameters) at a parameter vector. */
    record Evaluation(double[] values, double[][] jacobian) {
    }

    /**
     * @param point     fitted parameters
     * @param stdErrors their standard errors
     * @param covariance the scaled covariance
     * @param rms       root-mean-square residual
     */
    record Result(double[] point, double[] stdErrors, double[][] covariance, double rms) {
    }

    private CurveFit() {
    }

    static Result fit(Function<double[], Evaluation> model, double[] start, double[] target) {
        int n = target.length;
        int p = start.length;
        LeastSquaresOptimizer.Optimum o;
        try {
            o = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .start(start)
                    .target(target)
                    .model(point -> {
                        Evaluation e = model.apply(point.toArray());
                        return new Pair<>(new ArrayRealVector(e.values(), false), new Array2DRowRealMatrix(e.jacobian(), false));
                    })
                    .maxIterations(1000)
                    .maxEvaluations(4000)
                    .build());
        } catch (MathIllegalStateException e) {
            throw new BeamException(BeamException.Reason.NO_CONVERGENCE, "the fit did not converge (" + e.getMessage() + ")");
        }
        double[] point = o.getPoint().toArray();
        for (double v : point) {
            if (!Double.isFinite(v)) {
                throw new BeamException(BeamException.Reason.NO_CONVERGENCE, "the fit ran away to a non-finite value");
            }
        }
        double ssr = o.getRMS() * o.getRMS() * n;
        double variance = n > p ? ssr / (n - p) : 0;
        double[][] cov = new double[p][p];
        double[] err = new double[p];
        try {
            RealMatrix c = o.getCovariances(1e-14).scalarMultiply(variance);
            cov = c.getData();
            for (int i = 0; i < p; i++) {
                err[i] = Math.sqrt(Math.max(0, cov[i][i]));
            }
        } catch (MathIllegalStateException | IllegalArgumentException e) {
            java.util.Arrays.fill(err, Double.NaN);
            for (double[] row : cov) {
                java.util.Arrays.fill(row, Double.NaN);
            }
        }
        return new Result(point, err, cov, o.getRMS());
    }
}
