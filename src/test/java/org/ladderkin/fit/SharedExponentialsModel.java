package org.ladderkin.fit;

/**
 * Analytic test model for a fluence series: up to three exponential decays with shared lifetimes, the k-th weighted
 * by x_i^(k−1), where x_i = g_i / (1 + g_i / saturation) grows with each trace's relative excitation g_i. It mimics the
 * structure of the ladder fit (fast components that grow with fluence) in closed form, with an analytic Jacobian.
 * Parameters: tau1S, tau2S, tau3S, weight2, weight3, saturation (absent ones contribute nothing / no saturation);
 * any of them may be shared or per trace.
 */
public final class SharedExponentialsModel implements TraceModel {

    private final double[] excitation;

    public SharedExponentialsModel(double... relativeExcitation) {
        this.excitation = relativeExcitation.clone();
    }

    @Override
    public int traceCount() {
        return excitation.length;
    }

    private record Values(double tau1, double tau2, double tau3, double w2, double w3, double sat, int iSat) {
    }

    private static Values read(ParameterValues p, int t) {
        int i1 = p.indexOf("tau1S");
        int i2 = p.indexOf("tau2S");
        int i3 = p.indexOf("tau3S");
        int iw2 = p.indexOf("weight2");
        int iw3 = p.indexOf("weight3");
        int is = p.indexOf("saturation");
        return new Values(p.value(i1, t), i2 < 0 ? 1 : p.value(i2, t), i3 < 0 ? 1 : p.value(i3, t),
                iw2 < 0 ? 0 : p.value(iw2, t), iw3 < 0 ? 0 : p.value(iw3, t), is < 0 ? Double.POSITIVE_INFINITY : p.value(is, t), is);
    }

    private double x(int trace, double sat) {
        double g = excitation[trace];
        return Double.isInfinite(sat) ? g : g * sat / (sat + g);
    }

    @Override
    public double[] predict(int trace, double[] t, ParameterValues p) {
        Values v = read(p, trace);
        double x = x(trace, v.sat());
        double[] f = new double[t.length];
        for (int j = 0; j < t.length; j++) {
            f[j] = Math.exp(-t[j] / v.tau1()) + v.w2() * x * Math.exp(-t[j] / v.tau2()) + v.w3() * x * x * Math.exp(-t[j] / v.tau3());
        }
        return f;
    }

    @Override
    public boolean hasJacobian() {
        return true;
    }

    @Override
    public double[][] jacobian(int trace, double[] t, ParameterValues p) {
        Values v = read(p, trace);
        double g = excitation[trace];
        double x = x(trace, v.sat());
        double dxdSat = Double.isInfinite(v.sat()) ? 0 : g * g / ((v.sat() + g) * (v.sat() + g));
        double[][] d = new double[p.size()][];
        int i1 = p.indexOf("tau1S");
        int i2 = p.indexOf("tau2S");
        int i3 = p.indexOf("tau3S");
        int iw2 = p.indexOf("weight2");
        int iw3 = p.indexOf("weight3");
        for (int k = 0; k < d.length; k++) {
            d[k] = new double[t.length];
        }
        for (int j = 0; j < t.length; j++) {
            double e1 = Math.exp(-t[j] / v.tau1());
            double e2 = Math.exp(-t[j] / v.tau2());
            double e3 = Math.exp(-t[j] / v.tau3());
            d[i1][j] = e1 * t[j] / (v.tau1() * v.tau1());
            if (i2 >= 0) {
                d[i2][j] = v.w2() * x * e2 * t[j] / (v.tau2() * v.tau2());
            }
            if (i3 >= 0) {
                d[i3][j] = v.w3() * x * x * e3 * t[j] / (v.tau3() * v.tau3());
            }
            if (iw2 >= 0) {
                d[iw2][j] = x * e2;
            }
            if (iw3 >= 0) {
                d[iw3][j] = x * x * e3;
            }
            if (v.iSat() >= 0) {
                d[v.iSat()][j] = (v.w2() * e2 + 2 * v.w3() * x * e3) * dxdSat;
            }
        }
        return d;
    }
}
