// Over 400 lines: the multi-start loop, the optimiser run and the result's covariance and statistics share one projection.
package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;

/**
 * Global least-squares fit of a {@link TraceModel} to a {@link Dataset} with Hipparchus' Levenberg–Marquardt optimiser.
 * Bounds are removed by transformation ({@link BoundTransform}); per-trace amplitude and baseline are solved by variable
 * projection ({@link LinearTerms}); points are weighted by 1/σ when uncertainties are given. Each start vector is
 * tried and the lowest χ² kept. Standard errors come from the covariance (JᵀJ)⁻¹ of the full problem (nonlinear and
 * linear parameters) scaled by the reduced χ², formed in the internal coordinates and carried back to the physical
 * ones by the delta method. Nothing here throws for bad data or a misbehaving model: such fits come back
 * {@link FitResult.Status#FAILED} with a message. A fit is cancelled by interrupting the thread it runs on: every model
 * evaluation checks the thread's interrupt flag first and the fit then ends with a {@link CancellationException}
 * (the flag is left set, so the caller's thread still knows it was interrupted).
 */
public final class GlobalFitter {

    /** Below this ratio of smallest to largest eigenvalue of the column-scaled JᵀJ the covariance is called singular. */
    private static final double SINGULAR_RATIO = 1e-20;

    private GlobalFitter() {
    }

    /** Fits {@code problem}. */
    public static FitResult fit(FitProblem problem, FitOptions options) {
        List<String> warnings = new ArrayList<>();
        Projection proj;
        try {
            proj = new Projection(problem, null, options.analyticJacobian());
        } catch (Projection.FitFailure e) {
            return FitResult.failed(e.getMessage(), 0, warnings);
        }
        int dropped = problem.data().droppedMissing();
        if (dropped > 0) {
            warnings.add(dropped + " missing value" + (dropped == 1 ? " was" : "s were") + " dropped on import");
        }
        int dof = proj.points - proj.freeCount();
        if (dof <= 0) {
            return FitResult.failed(proj.points + " data points for " + proj.freeCount() + " free parameters ("
                    + proj.slots.size() + " nonlinear, " + (proj.freeCount() - proj.slots.size())
                    + " amplitudes/baselines): a fit needs more points than parameters", 0, warnings);
        }
        if (!proj.weighted && problem.data().traces().stream().anyMatch(Trace::hasUncertainty)) {
            warnings.add("only some traces have uncertainties: all points are weighted equally");
        }

        List<Map<String, Double>> starts = new ArrayList<>();
        starts.add(Map.of());
        starts.addAll(options.starts());
        Run best = null;
        Stopped stopped = null;
        String firstFailure = null;
        int failed = 0;
        int[] evaluations = {0};
        for (int i = 0; i < starts.size(); i++) {
            String failure;
            double[][] startValues;
            try {
                startValues = i == 0 ? null : startValues(problem, starts.get(i));
            } catch (IllegalArgumentException e) {
                failed++;
                options.progress().update("start", i + 1, starts.size());
                String unusable = "start " + (i + 1) + " is unusable: " + e.getMessage();
                firstFailure = firstFailure == null ? unusable : firstFailure;
                continue;
            }
            BestSoFar tracker = null;
            try {
                Projection p = i == 0 ? proj : new Projection(problem, startValues, options.analyticJacobian());
                tracker = new BestSoFar(p, options.progress(), evaluations, best == null ? Double.POSITIVE_INFINITY : best.chiSquare);
                Run r = optimise(p, options, tracker);
                if (best == null || r.chiSquare < best.chiSquare) {
                    best = r;
                }
                options.progress().update("start", i + 1, starts.size());
                continue;
            } catch (CancellationException e) {
                throw e;
            } catch (Projection.FitFailure e) {
                failure = e.getMessage();
            } catch (MathRuntimeException e) {
                failure = "optimiser stopped: " + e.getMessage();
                if (tracker != null && tracker.bestU != null && (stopped == null || tracker.bestChi2 < stopped.run().chiSquare())) {
                    stopped = new Stopped(tracker.run(), tracker, e.getMessage());
                }
            } catch (RuntimeException e) {
                // a model that throws must not take the caller down with it; the message says what it was
                failure = "model failed: " + e.getClass().getSimpleName() + ": " + e.getMessage();
            }
            failed++;
            firstFailure = firstFailure == null ? failure : firstFailure;
            options.progress().update("start", i + 1, starts.size());
        }
        if (best == null && stopped != null) {
            // no start converged: the best point met is still worth showing, marked as such and explained
            try {
                String why = explainStop(stopped, options);
                if (failed > 1) {
                    warnings.add(failed + " of " + starts.size() + " starts did not converge; the first: " + firstFailure);
                }
                return assemble(stopped.run(), problem, options, starts.size(), failed, warnings, why);
            } catch (Projection.FitFailure e) {
                return FitResult.failed(e.getMessage(), starts.size(), warnings);
            }
        }
        if (best == null) {
            return FitResult.failed(starts.size() == 1 ? firstFailure
                    : "all " + starts.size() + " starts failed; the first: " + firstFailure, starts.size(), warnings);
        }
        if (failed > 0) {
            warnings.add(failed + " of " + starts.size() + " starts failed; the first: " + firstFailure);
        }
        try {
            return assemble(best, problem, options, starts.size(), failed, warnings, null);
        } catch (Projection.FitFailure e) {
            return FitResult.failed(e.getMessage(), starts.size(), warnings);
        }
    }

    /**
     * Ends the fit when its thread has been interrupted. Called before every model evaluation, so a cancelled fit
     * stops within one evaluation of the series.
     *
     * @throws CancellationException when the current thread's interrupt flag is set
     */
    static void checkCancelled() {
        if (Thread.currentThread().isInterrupted()) {
            throw new CancellationException("fit cancelled");
        }
    }

    /** One optimiser run. */
    record Run(Projection projection, double[] u, Projection.Evaluation at, double chiSquare, int iterations, int evaluations) {
    }

    static Run optimise(Projection p, FitOptions options) {
        return optimise(p, options, null);
    }

    /**
     * One Levenberg–Marquardt run from the projection's start. {@code tracker}, when given, sees every evaluation and
     * keeps the best point, which outlives an optimiser that stops at its limits.
     */
    static Run optimise(Projection p, FitOptions options, BestSoFar tracker) {
        double[] u0 = p.startU();
        double[] target = p.target();
        // the optimiser asks for value and Jacobian at the same point separately: evaluate the series once per point
        Projection.Evaluation[] last = new Projection.Evaluation[1];
        double[][] lastU = new double[1][];
        java.util.function.Function<double[], Projection.Evaluation> at = u -> {
            if (lastU[0] == null || !java.util.Arrays.equals(lastU[0], u)) {
                try {
                    last[0] = p.evaluate(u);
                    if (tracker != null) {
                        tracker.offer(u, last[0]);
                    }
                } catch (ExcitationOutOfReach e) {
                    if (lastU[0] == null) {
                        throw new Projection.FitFailure("the starting values give " + e.getMessage() + ": start the cross-section "
                                + "(or the scale) lower");
                    }
                    // a step that far is refused like any step that makes the fit worse: the optimiser shortens it
                    last[0] = rejected(p, target);
                } catch (IllegalArgumentException e) {
                    if (lastU[0] == null) {
                        throw e;
                    }
                    // a step to where the model is undefined (a lifetime overflowing to infinity) is refused the same way
                    last[0] = rejected(p, target);
                }
                lastU[0] = u.clone();
            }
            return last[0];
        };
        Projection.Evaluation first = at.apply(u0);
        LeastSquaresOptimizer.Optimum o;
        if (u0.length == 0) {
            return new Run(p, u0, first, chiSquare(first.value, target), 0, 1);
        }
        LeastSquaresProblem lsp = new LeastSquaresBuilder()
                .start(u0)
                .target(target)
                .model(u -> at.apply(u).value, u -> jacobian(p, u, at.apply(u)))
                .lazyEvaluation(true)
                .maxIterations(options.maxIterations())
                .maxEvaluations(options.maxEvaluations())
                .build();
        o = new LevenbergMarquardtOptimizer().optimize(lsp);
        double[] u = o.getPoint().toArray();
        for (double v : u) {
            if (!Double.isFinite(v)) {
                throw new Projection.FitFailure("optimiser returned a non-finite parameter vector");
            }
        }
        Projection.Evaluation atU = at.apply(u);
        return new Run(p, u, atU, chiSquare(atU.value, target), o.getIterations(), o.getEvaluations());
    }

    /** An evaluation whose prediction is far from every data point, so the optimiser refuses the step that led to it. */
    private static Projection.Evaluation rejected(Projection p, double[] target) {
        Projection.Evaluation e = new Projection.Evaluation(p.traces, p.points);
        double scale = 1;
        for (double y : target) {
            scale = Math.max(scale, Math.abs(y));
        }
        for (int j = 0; j < target.length; j++) {
            e.value[j] = target[j] + 1e6 * scale;
        }
        return e;
    }

    /** The Jacobian at an accepted point; its difference steps may still cross the excitation limit near it. */
    private static double[][] jacobian(Projection p, double[] u, Projection.Evaluation at) {
        try {
            return p.projectedJacobian(u, at);
        } catch (ExcitationOutOfReach e) {
            throw new Projection.FitFailure("the fit reached " + e.getMessage() + " while estimating its slopes");
        }
    }

    /** An optimiser run that stopped at a limit, with its best point. */
    private record Stopped(Run run, BestSoFar tracker, String reason) {
    }

    /**
     * Why the optimiser stopped, in words a user can act on: the limit reached, the pair the data cannot tell apart at
     * the best point, which parameters were still moving, and that the values shown are the best point so far.
     */
    private static String explainStop(Stopped stopped, FitOptions options) {
        String reason = stopped.reason();
        String limit;
        if (reason.contains("(" + options.maxIterations() + ")")) {
            limit = "the optimiser reached its " + options.maxIterations() + "-iteration limit before converging";
        } else if (reason.contains("(" + options.maxEvaluations() + ")")) {
            limit = "the optimiser reached its " + options.maxEvaluations() + "-evaluation limit before converging";
        } else {
            limit = "the optimiser stopped before converging (" + reason + ")";
        }
        List<String> parts = new ArrayList<>();
        parts.add(limit);
        Run run = stopped.run();
        FitIdentifiability id = FitIdentifiability.at(run.projection(), run.u(), run.at());
        if (id.warns()) {
            parts.add(id.pairPhrase().isEmpty() ? id.warning() : id.pairPhrase() + "; " + id.warning()
                    .substring(id.warning().lastIndexOf("; ") + 2).replace("hold one", "hold one of them"));
        }
        List<String> moving = stopped.tracker().stillMoving();
        if (!moving.isEmpty()) {
            parts.add("still moving at the end: " + String.join(", ", moving));
        }
        parts.add(String.format(java.util.Locale.ROOT, "the values shown are the best point so far (after %d evaluations), "
                + "not converged", run.evaluations()));
        return String.join("; ", parts);
    }

    static double chiSquare(double[] value, double[] target) {
        double c = 0;
        for (int j = 0; j < value.length; j++) {
            double r = target[j] - value[j];
            c += r * r;
        }
        return c;
    }

    private static double[][] startValues(FitProblem problem, Map<String, Double> start) {
        double[][] v = new double[problem.parameters().size()][];
        for (int s = 0; s < v.length; s++) {
            ParameterSpec p = problem.parameters().get(s);
            double value = start.getOrDefault(p.key(), p.start());
            if (!p.fixed() && !(value > p.lower() && value < p.upper())) {
                throw new IllegalArgumentException("start value " + value + " for " + p.key() + " is outside its bounds ("
                        + p.lower() + ", " + p.upper() + ")");
            }
            v[s] = new double[] {p.fixed() ? p.start() : value};
        }
        for (String key : start.keySet()) {
            problem.parameter(key);
        }
        return v;
    }

    /**
     * The result at {@code run}'s point. With {@code notConverged} (why the optimiser stopped) the point is the best one
     * met, not an optimum: no covariance is formed there (standard errors would describe a point the fit had not
     * settled on) and no profiles are traced.
     */
    private static FitResult assemble(Run run, FitProblem problem, FitOptions options, int startsTried, int startsFailed,
                                      List<String> warnings, String notConverged) {
        Projection p = run.projection();
        int nSlots = p.slots.size();
        int lin = p.linearPerTrace();
        int k = p.freeCount();
        int dof = p.points - k;
        double s2 = run.chiSquare() / dof;

        // covariance in internal coordinates, columns scaled to unit length so that parameters of very different size
        // (a 1e-12 s lifetime next to an amplitude of 100) do not make the matrix look singular
        double[][] j = p.fullJacobian(run.u(), run.at());
        double[] norm = new double[k];
        for (double[] row : j) {
            for (int c = 0; c < k; c++) {
                norm[c] += row[c] * row[c];
            }
        }
        String status = "";
        List<String> keys = new ArrayList<>();
        for (Projection.Slot s : p.slots) {
            keys.add(s.label());
        }
        for (int i = 0; i < p.traces; i++) {
            if (lin >= 1) {
                keys.add("amplitude[" + i + "]");
            }
            if (lin == 2) {
                keys.add("baseline[" + i + "]");
            }
        }
        double[][] cov = null;
        for (int c = 0; c < k; c++) {
            norm[c] = Math.sqrt(norm[c]);
            if (!(norm[c] > 0)) {
                status = "the data do not depend on " + FitIdentifiability.symbol(keys.get(c))
                        + " at the best fit (fix it, or widen the delay range)";
            }
        }
        if (notConverged != null) {
            status = notConverged;
        } else if (status.isEmpty() && k > 0) {
            double[][] jtj = FitIdentifiability.scaledNormalMatrix(j, norm, k);
            EigenDecompositionSymmetric eig = new EigenDecompositionSymmetric(new Array2DRowRealMatrix(jtj, false));
            double[] ev = eig.getEigenvalues();
            double max = 0;
            double min = Double.POSITIVE_INFINITY;
            int minIndex = 0;
            for (int a = 0; a < ev.length; a++) {
                max = Math.max(max, ev[a]);
                if (ev[a] < min) {
                    min = ev[a];
                    minIndex = a;
                }
            }
            if (!(min > SINGULAR_RATIO * max)) {
                status = mostInvolved(eig.getEigenvector(minIndex).toArray(), keys);
            } else {
                RealMatrix v = eig.getV();
                cov = new double[k][k];
                for (int a = 0; a < k; a++) {
                    for (int b = 0; b < k; b++) {
                        double sum = 0;
                        for (int e = 0; e < k; e++) {
                            sum += v.getEntry(a, e) * v.getEntry(b, e) / ev[e];
                        }
                        // unscale, scale by the reduced χ², and carry to physical coordinates (delta method)
                        cov[a][b] = sum / (norm[a] * norm[b]) * s2 * slope(p, run.u(), a) * slope(p, run.u(), b);
                    }
                }
            }
        }

        double[][] phys = p.physical(run.u());
        List<String> atBound = new ArrayList<>();
        for (int c = 0; c < nSlots; c++) {
            Projection.Slot slot = p.slots.get(c);
            ParameterSpec spec = p.specs.get(slot.spec());
            double value = phys[slot.spec()][Math.max(slot.trace(), 0)];
            double near = 1e-6 * spec.scale();
            if (value - spec.lower() <= near || spec.upper() - value <= near) {
                atBound.add(ParameterNaming.shown(slot.label(), value) + " ran to its bound "
                        + ParameterNaming.shown(slot.label(), value - spec.lower() <= near ? spec.lower() : spec.upper()).replaceFirst("^.* = ", ""));
            }
        }
        if (!atBound.isEmpty()) {
            String note = String.join("; ", atBound) + " (the data do not hold it away from the bound: fix it or drop that part of the model)";
            warnings.add(note);
            if (!status.isEmpty()) {
                status = notConverged != null ? status + "; " + note : note + "; " + status;
            }
        }
        List<ParameterEstimate> estimates = new ArrayList<>();
        for (int s = 0; s < p.specs.size(); s++) {
            ParameterSpec spec = p.specs.get(s);
            for (int i = 0; i < phys[s].length; i++) {
                int trace = spec.scope() == ParameterSpec.Scope.SHARED ? -1 : i;
                double se = 0;
                if (!spec.fixed()) {
                    int slot = slotOf(p, s, trace);
                    se = cov == null ? Double.NaN : Math.sqrt(cov[slot][slot]);
                }
                estimates.add(new ParameterEstimate(spec.key(), trace, phys[s][i], se, spec.fixed()));
            }
        }
        for (int i = 0; i < p.traces; i++) {
            int c = nSlots + i * lin;
            if (lin >= 1) {
                estimates.add(new ParameterEstimate("amplitude", i, run.at().amplitude[i], cov == null ? Double.NaN : Math.sqrt(cov[c][c]), false));
            }
            if (lin == 2) {
                estimates.add(new ParameterEstimate("baseline", i, run.at().baseline[i], cov == null ? Double.NaN : Math.sqrt(cov[c + 1][c + 1]), false));
            }
        }
        double[][] corr = new double[cov == null ? 0 : k][cov == null ? 0 : k];
        if (cov != null) {
            for (int a = 0; a < k; a++) {
                for (int b = 0; b < k; b++) {
                    corr[a][b] = cov[a][b] / Math.sqrt(cov[a][a] * cov[b][b]);
                }
            }
        }

        List<double[]> residuals = new ArrayList<>();
        List<double[]> acf = new ArrayList<>();
        double rss = 0;
        for (int i = 0; i < p.traces; i++) {
            double[] r = new double[p.data[i].length];
            double[] wr = new double[r.length];
            for (int jj = 0; jj < r.length; jj++) {
                r[jj] = p.data[i][jj] - (run.at().amplitude[i] * run.at().shape[i][jj] + run.at().baseline[i]);
                wr[jj] = r[jj] * p.weight[i][jj];
                rss += r[jj] * r[jj];
            }
            residuals.add(r);
            acf.add(ResidualStatistics.autocorrelation(wr, options.autocorrelationLags()));
        }
        int n = p.points;
        double aic;
        double bic;
        if (p.weighted) {
            // known uncertainties: −2 ln L = χ² + const
            aic = run.chiSquare() + 2.0 * k;
            bic = run.chiSquare() + k * Math.log(n);
        } else {
            // unknown common σ, estimated: −2 ln L = n ln(RSS/n) + const, one more parameter (σ)
            aic = n * Math.log(run.chiSquare() / n) + 2.0 * (k + 1);
            bic = n * Math.log(run.chiSquare() / n) + (k + 1) * Math.log(n);
        }
        for (int i = 0; i < p.traces; i++) {
            double[] a = acf.get(i);
            if (a.length > 0 && a[0] > 0.5) {
                warnings.add(String.format(java.util.Locale.ROOT,
                        "residuals of trace '%s' are strongly correlated (lag-1 autocorrelation %.2f): the model misses a feature",
                        p.label(i), a[0]));
            }
        }
        FitResult.Status st = notConverged != null ? FitResult.Status.NOT_CONVERGED
                : cov != null || k == 0 ? FitResult.Status.CONVERGED : FitResult.Status.UNCERTAINTY_UNAVAILABLE;
        FitResult result = new FitResult(st, status, estimates, cov == null ? List.of() : keys, corr, run.chiSquare(), n, k,
                run.chiSquare() / dof, aic, bic, residuals, acf, run.iterations(), run.evaluations(), startsTried, startsFailed,
                List.of(), warnings);
        if (options.profile().isEmpty() || notConverged != null) {
            return result;
        }
        List<ProfileInterval> profiles = new ArrayList<>();
        List<String> allWarnings = new ArrayList<>(warnings);
        for (String key : options.profile()) {
            try {
                profiles.add(ProfileLikelihood.interval(problem, options, run, result, key));
            } catch (Projection.FitFailure | MathRuntimeException e) {
                allWarnings.add("profile of " + FitIdentifiability.symbol(key) + " failed: " + e.getMessage());
            }
        }
        return new FitResult(st, status, estimates, result.correlationKeys(), corr, run.chiSquare(), n, k, run.chiSquare() / dof,
                aic, bic, residuals, acf, run.iterations(), run.evaluations(), startsTried, startsFailed, profiles, allWarnings);
    }

    private static double slope(Projection p, double[] u, int column) {
        return column < p.slots.size() ? p.transforms[column].derivative(u[column]) : 1;
    }

    private static int slotOf(Projection p, int spec, int trace) {
        for (int s = 0; s < p.slots.size(); s++) {
            if (p.slots.get(s).spec() == spec && p.slots.get(s).trace() == trace) {
                return s;
            }
        }
        throw new IllegalStateException("no slot for parameter " + spec + " trace " + trace);
    }

    private static String mostInvolved(double[] vector, List<String> keys) {
        int first = -1;
        int second = -1;
        for (int i = 0; i < vector.length; i++) {
            if (first < 0 || Math.abs(vector[i]) > Math.abs(vector[first])) {
                second = first;
                first = i;
            } else if (second < 0 || Math.abs(vector[i]) > Math.abs(vector[second])) {
                second = i;
            }
        }
        return second < 0 ? FitIdentifiability.symbol(keys.get(first)) + " is not determined by these data (fix it or add data)"
                : FitIdentifiability.symbol(keys.get(Math.min(first, second))) + " and "
                + FitIdentifiability.symbol(keys.get(Math.max(first, second)))
                + " are not separately determined by these data (fix one of them or add data)";
    }
}
