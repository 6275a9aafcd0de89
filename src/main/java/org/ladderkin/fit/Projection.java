// Over 400 lines: the per-trace variable projection, its bound transforms and the weighted Jacobian share one cached evaluation.
package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The fit's view of a {@link FitProblem}: the present points of each trace with their weights, the free nonlinear
 * parameters as internal unbounded coordinates u, and the variable projection that solves the per-trace amplitude and
 * baseline exactly for every u. The optimiser sees only u and the weighted, projected prediction.
 */
final class Projection {

    /** A free nonlinear coordinate: which parameter, and which trace (-1 for a shared one). */
    record Slot(int spec, int trace, String label) {
    }

    /** The model at one u: shapes, linear coefficients and the weighted prediction. */
    static final class Evaluation {
        final double[][] shape;
        final double[] amplitude;
        final double[] baseline;
        final double[] value;

        Evaluation(int traces, int points) {
            shape = new double[traces][];
            amplitude = new double[traces];
            baseline = new double[traces];
            value = new double[points];
        }
    }

    /** A model or data problem that stops the fit, with a message for the user. */
    static final class FitFailure extends RuntimeException {
        FitFailure(String message) {
            super(message);
        }
    }

    final FitProblem problem;
    final int traces;
    final double[][] delays;
    final double[][] data;
    final double[][] weight;
    final int[] offset;
    final int points;
    final boolean weighted;
    final List<ParameterSpec> specs;
    final Map<String, Integer> index = new HashMap<>();
    final double[][] base;
    final List<Slot> slots = new ArrayList<>();
    final BoundTransform[] transforms;
    final boolean analytic;

    /**
     * @param initial starting physical values [spec][1 or traces]; null takes the spec starts
     */
    Projection(FitProblem problem, double[][] initial, boolean useAnalytic) {
        this.problem = problem;
        Dataset d = problem.data();
        traces = d.size();
        delays = new double[traces][];
        data = new double[traces][];
        weight = new double[traces][];
        offset = new int[traces + 1];
        boolean allWeighted = true;
        for (int i = 0; i < traces; i++) {
            Trace t = d.traces().get(i);
            int n = t.presentCount();
            if (n == 0) {
                throw new FitFailure("trace '" + t.label() + "' has no values (all " + t.size() + " are missing)");
            }
            double[] td = t.delaysS();
            double[] ty = t.signal();
            double[] ts = t.sigma();
            delays[i] = new double[n];
            data[i] = new double[n];
            weight[i] = new double[n];
            int k = 0;
            for (int j = 0; j < td.length; j++) {
                if (!Double.isNaN(ty[j])) {
                    delays[i][k] = td[j];
                    data[i][k] = ty[j];
                    weight[i][k] = ts == null ? 1 : 1 / ts[j];
                    k++;
                }
            }
            allWeighted &= ts != null;
            offset[i + 1] = offset[i] + n;
        }
        points = offset[traces];
        weighted = allWeighted;
        specs = problem.parameters();
        base = new double[specs.size()][];
        for (int s = 0; s < specs.size(); s++) {
            ParameterSpec p = specs.get(s);
            index.put(p.key(), s);
            int width = p.scope() == ParameterSpec.Scope.SHARED ? 1 : traces;
            base[s] = new double[width];
            for (int i = 0; i < width; i++) {
                base[s][i] = initial == null ? p.start() : initial[s][Math.min(i, initial[s].length - 1)];
            }
            if (!p.fixed()) {
                for (int i = 0; i < width; i++) {
                    slots.add(new Slot(s, width == 1 ? -1 : i, width == 1 ? p.key() : p.key() + "[" + i + "]"));
                }
            }
        }
        transforms = new BoundTransform[slots.size()];
        for (int k = 0; k < slots.size(); k++) {
            transforms[k] = new BoundTransform(specs.get(slots.get(k).spec()));
        }
        analytic = useAnalytic && problem.model().hasJacobian();
    }

    int linearPerTrace() {
        return switch (problem.linear()) {
            case NONE -> 0;
            case AMPLITUDE -> 1;
            case AMPLITUDE_AND_BASELINE -> 2;
        };
    }

    /** Free nonlinear plus linear parameters. */
    int freeCount() {
        return slots.size() + traces * linearPerTrace();
    }

    double[] target() {
        double[] t = new double[points];
        for (int i = 0; i < traces; i++) {
            for (int j = 0; j < data[i].length; j++) {
                t[offset[i] + j] = weight[i][j] * data[i][j];
            }
        }
        return t;
    }

    double[] startU() {
        double[] u = new double[slots.size()];
        for (int k = 0; k < u.length; k++) {
            Slot s = slots.get(k);
            u[k] = transforms[k].toInternal(base[s.spec()][Math.max(s.trace(), 0)]);
        }
        return u;
    }

    /** Physical values [spec][1 or traces] at u. */
    double[][] physical(double[] u) {
        double[][] v = new double[base.length][];
        for (int s = 0; s < base.length; s++) {
            v[s] = base[s].clone();
        }
        for (int k = 0; k < u.length; k++) {
            Slot s = slots.get(k);
            v[s.spec()][Math.max(s.trace(), 0)] = transforms[k].toExternal(u[k]);
        }
        return v;
    }

    ParameterValues values(double[] u) {
        return new ParameterValues(index, physical(u));
    }

    Evaluation evaluate(double[] u) {
        Evaluation e = new Evaluation(traces, points);
        ParameterValues p = values(u);
        for (int i = 0; i < traces; i++) {
            evaluateTrace(i, p, e);
        }
        return e;
    }

    /** Shape, linear solve and weighted prediction of trace i into e. */
    void evaluateTrace(int i, ParameterValues p, Evaluation e) {
        double[] f = predict(i, p);
        double[] w = weight[i];
        double[] y = data[i];
        double a = 1;
        double b = 0;
        switch (problem.linear()) {
            case NONE -> { }
            case AMPLITUDE -> {
                double sff = 0;
                double sfy = 0;
                for (int j = 0; j < f.length; j++) {
                    double w2 = w[j] * w[j];
                    sff += w2 * f[j] * f[j];
                    sfy += w2 * f[j] * y[j];
                }
                a = sff > 0 ? sfy / sff : 0;
            }
            case AMPLITUDE_AND_BASELINE -> {
                double sff = 0;
                double sf = 0;
                double s1 = 0;
                double sfy = 0;
                double sy = 0;
                for (int j = 0; j < f.length; j++) {
                    double w2 = w[j] * w[j];
                    sff += w2 * f[j] * f[j];
                    sf += w2 * f[j];
                    s1 += w2;
                    sfy += w2 * f[j] * y[j];
                    sy += w2 * y[j];
                }
                double det = sff * s1 - sf * sf;
                if (det > 1e-12 * sff * s1) {
                    a = (sfy * s1 - sf * sy) / det;
                    b = (sff * sy - sf * sfy) / det;
                } else {
                    // a flat shape cannot be told from the baseline: give it all to the baseline
                    a = 0;
                    b = sy / s1;
                }
            }
        }
        e.shape[i] = f;
        e.amplitude[i] = a;
        e.baseline[i] = b;
        int o = offset[i];
        for (int j = 0; j < f.length; j++) {
            e.value[o + j] = w[j] * (a * f[j] + b);
        }
    }

    private double[] predict(int i, ParameterValues p) {
        GlobalFitter.checkCancelled();
        double[] f = problem.model().predict(i, delays[i], p);
        if (f == null || f.length != delays[i].length) {
            throw new FitFailure("model returned " + (f == null ? "nothing" : f.length + " values") + " for trace '"
                    + label(i) + "' with " + delays[i].length + " points");
        }
        for (int j = 0; j < f.length; j++) {
            if (!Double.isFinite(f[j])) {
                throw new FitFailure("model returned " + f[j] + " for trace '" + label(i) + "' at delay " + delays[i][j]
                        + " s with " + describe(p));
            }
        }
        return f;
    }

    String label(int trace) {
        return problem.data().traces().get(trace).label();
    }

    String describe(ParameterValues p) {
        StringBuilder b = new StringBuilder();
        for (int s = 0; s < specs.size(); s++) {
            b.append(s == 0 ? "" : ", ").append(specs.get(s).key()).append('=').append(brief(p.value(s, 0)));
        }
        return b.toString();
    }

    /** Six significant digits without trailing zeros, e.g. 5e-06 or 0.5. */
    static String brief(double v) {
        String t = String.format(java.util.Locale.ROOT, "%.6g", v);
        int e = t.indexOf('e');
        String mantissa = e < 0 ? t : t.substring(0, e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return e < 0 ? mantissa : mantissa + t.substring(e);
    }

    /**
     * Jacobian of the weighted projected prediction with respect to u, [point][slot]. Finite differences are central
     * differences of the whole projection (exact derivative of what the optimiser minimises, up to O(h²)); the analytic
     * path uses the model's derivatives projected onto the complement of the linear terms (Kaufman's approximation,
     * which drops a term proportional to the residual).
     */
    double[][] projectedJacobian(double[] u, Evaluation at) {
        double[][] jac = new double[points][slots.size()];
        if (analytic) {
            ParameterValues p = values(u);
            for (int i = 0; i < traces; i++) {
                double[][] df = modelJacobian(i, p);
                for (int k = 0; k < slots.size(); k++) {
                    Slot s = slots.get(k);
                    if (s.trace() >= 0 && s.trace() != i) {
                        continue;
                    }
                    double[] col = scaledColumn(i, df[s.spec()], at.amplitude[i] * transforms[k].derivative(u[k]));
                    projectOut(i, at.shape[i], col);
                    for (int j = 0; j < col.length; j++) {
                        jac[offset[i] + j][k] = col[j];
                    }
                }
            }
            return jac;
        }
        for (int k = 0; k < slots.size(); k++) {
            Slot s = slots.get(k);
            double h = transforms[k].step(u[k]);
            double[] up = u.clone();
            double[] down = u.clone();
            up[k] += h;
            down[k] -= h;
            double width = up[k] - down[k];
            Evaluation plus = new Evaluation(traces, points);
            Evaluation minus = new Evaluation(traces, points);
            ParameterValues pu = values(up);
            ParameterValues pd = values(down);
            for (int i = 0; i < traces; i++) {
                if (s.trace() >= 0 && s.trace() != i) {
                    continue;
                }
                evaluateTrace(i, pu, plus);
                evaluateTrace(i, pd, minus);
                for (int j = offset[i]; j < offset[i + 1]; j++) {
                    jac[j][k] = (plus.value[j] - minus.value[j]) / width;
                }
            }
        }
        return jac;
    }

    /**
     * Jacobian of the weighted prediction amplitude·shape + baseline with the linear terms as parameters of their own:
     * columns are the free slots (in u) followed by amplitude and baseline of each trace. This is what the covariance
     * is formed from.
     */
    double[][] fullJacobian(double[] u, Evaluation at) {
        int lin = linearPerTrace();
        double[][] jac = new double[points][slots.size() + traces * lin];
        ParameterValues p = values(u);
        for (int i = 0; i < traces; i++) {
            double[][] df = analytic ? modelJacobian(i, p) : null;
            for (int k = 0; k < slots.size(); k++) {
                Slot s = slots.get(k);
                if (s.trace() >= 0 && s.trace() != i) {
                    continue;
                }
                double[] col;
                if (analytic) {
                    col = scaledColumn(i, df[s.spec()], at.amplitude[i] * transforms[k].derivative(u[k]));
                } else {
                    double h = transforms[k].step(u[k]);
                    double[] up = u.clone();
                    double[] down = u.clone();
                    up[k] += h;
                    down[k] -= h;
                    double[] fu = predict(i, values(up));
                    double[] fd = predict(i, values(down));
                    col = new double[fu.length];
                    for (int j = 0; j < col.length; j++) {
                        col[j] = weight[i][j] * at.amplitude[i] * (fu[j] - fd[j]) / (up[k] - down[k]);
                    }
                }
                for (int j = 0; j < col.length; j++) {
                    jac[offset[i] + j][k] = col[j];
                }
            }
            int c = slots.size() + i * lin;
            for (int j = 0; j < data[i].length; j++) {
                if (lin >= 1) {
                    jac[offset[i] + j][c] = weight[i][j] * at.shape[i][j];
                }
                if (lin == 2) {
                    jac[offset[i] + j][c + 1] = weight[i][j];
                }
            }
        }
        return jac;
    }

    private double[][] modelJacobian(int i, ParameterValues p) {
        double[][] df = problem.model().jacobian(i, delays[i], p);
        if (df == null || df.length != specs.size()) {
            throw new FitFailure("model Jacobian for trace '" + label(i) + "' has " + (df == null ? "no" : df.length)
                    + " rows for " + specs.size() + " parameters");
        }
        return df;
    }

    private double[] scaledColumn(int i, double[] dfRow, double factor) {
        double[] col = new double[data[i].length];
        if (dfRow == null) {
            return col;
        }
        for (int j = 0; j < col.length; j++) {
            col[j] = weight[i][j] * factor * dfRow[j];
            if (!Double.isFinite(col[j])) {
                throw new FitFailure("model derivative is " + dfRow[j] + " for trace '" + label(i) + "' at delay " + delays[i][j] + " s");
            }
        }
        return col;
    }

    /** Removes from col its least-squares component along the trace's linear basis (w·shape, and w for a baseline). */
    private void projectOut(int i, double[] shape, double[] col) {
        double[] w = weight[i];
        switch (problem.linear()) {
            case NONE -> { }
            case AMPLITUDE -> {
                double sff = 0;
                double sfc = 0;
                for (int j = 0; j < col.length; j++) {
                    double g = w[j] * shape[j];
                    sff += g * g;
                    sfc += g * col[j];
                }
                double c = sff > 0 ? sfc / sff : 0;
                for (int j = 0; j < col.length; j++) {
                    col[j] -= c * w[j] * shape[j];
                }
            }
            case AMPLITUDE_AND_BASELINE -> {
                double sff = 0;
                double sf1 = 0;
                double s11 = 0;
                double sfc = 0;
                double s1c = 0;
                for (int j = 0; j < col.length; j++) {
                    double g = w[j] * shape[j];
                    sff += g * g;
                    sf1 += g * w[j];
                    s11 += w[j] * w[j];
                    sfc += g * col[j];
                    s1c += w[j] * col[j];
                }
                double det = sff * s11 - sf1 * sf1;
                double a;
                double b;
                if (det > 1e-12 * sff * s11) {
                    a = (sfc * s11 - sf1 * s1c) / det;
                    b = (sff * s1c - sf1 * sfc) / det;
                } else {
                    a = 0;
                    b = s1c / s11;
                }
                for (int j = 0; j < col.length; j++) {
                    col[j] -= a * w[j] * shape[j] + b * w[j];
                }
            }
        }
    }
}
