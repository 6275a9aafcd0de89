package org.ladderkin.fit.counting;

import java.util.List;
import java.util.Objects;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceModel;

/**
 * A trace with Gaussian noise (transient absorption, an integrated-PL series): residuals (y − a·shape − b)/σ, with
 * the trace's own amplitude a and baseline b solved by weighted linear least squares at every evaluation (variable
 * projection: the Hessian of the profiled −2 ln L gives the shared parameters' errors with a and b accounted for).
 * σ is the trace's own per-point uncertainty when it has one, else one value for the trace from its point-to-point
 * differences, σ² = Σ(y_{i+1} − y_i)²/(2(n − 1)), which a smooth signal sampled densely hardly inflates.
 */
public final class GaussianTracePart implements LikelihoodPart {

    private final Trace trace;
    private final int index;
    private final TraceModel model;
    private final boolean baseline;
    private final double[] delaysS;
    private final double[] y;
    private final double[] sigma;

    /**
     * @param index    the trace's index in {@code model}
     * @param baseline also solve a baseline (else amplitude only)
     */
    public GaussianTracePart(Trace trace, int index, TraceModel model, boolean baseline) {
        this.trace = Objects.requireNonNull(trace, "trace");
        this.index = index;
        this.model = Objects.requireNonNull(model, "model");
        this.baseline = baseline;
        int n = trace.presentCount();
        delaysS = new double[n];
        y = new double[n];
        double[] d = trace.delaysS();
        double[] s = trace.signal();
        double[] u = trace.sigma();
        sigma = new double[n];
        int k = 0;
        for (int i = 0; i < d.length; i++) {
            if (!Double.isNaN(s[i])) {
                delaysS[k] = d[i];
                y[k] = s[i];
                sigma[k] = u == null ? Double.NaN : u[i];
                k++;
            }
        }
        if (n < 3) {
            throw new IllegalArgumentException("trace '" + trace.label() + "' has " + n + " points (a fit needs at least 3)");
        }
        if (u == null) {
            double sum = 0;
            for (int i = 1; i < n; i++) {
                sum += (y[i] - y[i - 1]) * (y[i] - y[i - 1]);
            }
            double common = Math.sqrt(sum / (2 * (n - 1)));
            if (!(common > 0)) {
                throw new IllegalArgumentException("trace '" + trace.label() + "' has no scatter to weigh it by (give uncertainties)");
            }
            java.util.Arrays.fill(sigma, common);
        }
    }

    @Override
    public String label() {
        return trace.label();
    }

    @Override
    public boolean counts() {
        return false;
    }

    @Override
    public int points() {
        return y.length;
    }

    @Override
    public List<ParameterSpec> localParameters() {
        return List.of();
    }

    @Override
    public void residuals(ParameterValues p, double[] out, int offset) {
        double[] f = fitted(p);
        for (int i = 0; i < y.length; i++) {
            out[offset + i] = (y[i] - f[i]) / sigma[i];
        }
    }

    @Override
    public double[] fitted(ParameterValues p) {
        double[] shape = model.predict(index, delaysS, p);
        // weighted normal equations for a·shape + b
        double sww = 0;
        double sws = 0;
        double wss = 0;
        double swy = 0;
        double wsy = 0;
        for (int i = 0; i < y.length; i++) {
            double w = 1 / (sigma[i] * sigma[i]);
            sww += w;
            sws += w * shape[i];
            wss += w * shape[i] * shape[i];
            swy += w * y[i];
            wsy += w * shape[i] * y[i];
        }
        double a;
        double b = 0;
        if (baseline) {
            double det = wss * sww - sws * sws;
            a = det == 0 ? 0 : (wsy * sww - sws * swy) / det;
            b = det == 0 ? swy / sww : (wss * swy - sws * wsy) / det;
        } else {
            a = wss == 0 ? 0 : wsy / wss;
        }
        double[] f = new double[y.length];
        for (int i = 0; i < f.length; i++) {
            f[i] = a * shape[i] + b;
        }
        return f;
    }

    @Override
    public double[] data() {
        return y.clone();
    }
}
