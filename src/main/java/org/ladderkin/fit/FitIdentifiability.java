package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.RealMatrix;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * Whether the freed parameters can be told apart by the data, judged before a fit from the Jacobian at the start
 * point: the correlation matrix (JᵀJ)⁻¹ of the free parameters, amplitudes and baselines included (so a pair is
 * judged after the per-trace linear terms have taken what they can), and the condition number of the column-scaled
 * Jacobian. A pair whose estimates would be correlated beyond {@link #CORRELATION_LIMIT} moves together: the
 * optimiser wanders along the valley between them and the fit ends at its evaluation limit or with standard errors
 * that mean nothing. Without such a pair, a parameter whose expected standard error (from the same matrix, with the
 * noise of each trace taken from the scatter of its residuals at the start) exceeds its value is flagged alone. The check costs one Jacobian (two model evaluations per free parameter with finite differences).
 *
 * @param free            keys of the free nonlinear parameters checked
 * @param conditionNumber condition number of the column-scaled Jacobian (∞ when it is singular, NaN when not formed)
 * @param first           key of the first parameter of the worst pair ("" with fewer than two free parameters)
 * @param second          key of the second one ("" likewise)
 * @param correlation     the pair's correlation at the start point (±1 when exactly degenerate, NaN without a pair)
 * @param lastDelayS      the latest delay in the data (s)
 * @param warning         a sentence a user can act on, "" when the data tell the parameters apart
 */
public record FitIdentifiability(List<String> free, double conditionNumber, String first, String second, double correlation,
                                 double lastDelayS, String warning) {

    /** Above this |correlation| two parameters are called not told apart. */
    public static final double CORRELATION_LIMIT = 0.99;
    /** Below this ratio of smallest to largest eigenvalue of the column-scaled JᵀJ the matrix is called singular. */
    private static final double SINGULAR_RATIO = 1e-20;
    /** A lifetime this many times the last delay has hardly begun to act within the data. */
    private static final double FAR_BEYOND = 3;

    public FitIdentifiability {
        free = List.copyOf(Objects.requireNonNull(free, "free"));
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        Objects.requireNonNull(warning, "warning");
    }

    /** Whether the data leave a pair of freed parameters (or one alone) undetermined. */
    public boolean warns() {
        return !warning.isEmpty();
    }

    /** "τ_trap and τ_rad move together (correlation 0.9998)", or "" without a pair. */
    public String pairPhrase() {
        if (first.isEmpty() || second.isEmpty()) {
            return "";
        }
        return symbol(first) + " and " + symbol(second) + " move together (correlation " + corr(correlation) + ")";
    }

    /** Checks {@code problem} at its spec starts. */
    public static FitIdentifiability of(FitProblem problem, boolean analyticJacobian) {
        Projection p = new Projection(problem, null, analyticJacobian);
        double[] u = p.startU();
        return at(p, u, p.evaluate(u));
    }

    /** Checks the projection at internal point {@code u}, where the model gave {@code e}. */
    static FitIdentifiability at(Projection p, double[] u, Projection.Evaluation e) {
        int nSlots = p.slots.size();
        List<String> keys = new ArrayList<>();
        for (Projection.Slot s : p.slots) {
            keys.add(s.label());
        }
        double last = Double.NEGATIVE_INFINITY;
        for (double[] d : p.delays) {
            for (double v : d) {
                last = Math.max(last, v);
            }
        }
        if (nSlots == 0) {
            return new FitIdentifiability(keys, Double.NaN, "", "", Double.NaN, last, "");
        }
        double[][] j = p.fullJacobian(u, e);
        int k = p.freeCount();
        // rows in units of each trace's noise (the given uncertainties are already in J; else the scatter of the
        // residuals at this point), so that the inverse is a covariance and not only a shape
        if (!p.weighted) {
            for (int i = 0; i < p.traces; i++) {
                double[] r = new double[p.offset[i + 1] - p.offset[i]];
                for (int m = 0; m < r.length; m++) {
                    r[m] = p.data[i][m] - e.value[p.offset[i] + m];
                }
                double s = FitQuality.scatter(r);
                for (int m = p.offset[i]; m < p.offset[i + 1] && s > 0; m++) {
                    for (int c = 0; c < k; c++) {
                        j[m][c] /= s;
                    }
                }
            }
        }
        double[] norm = new double[k];
        for (double[] row : j) {
            for (int c = 0; c < k; c++) {
                norm[c] += row[c] * row[c];
            }
        }
        for (int c = 0; c < k; c++) {
            norm[c] = Math.sqrt(norm[c]);
        }
        for (int c = 0; c < nSlots; c++) {
            if (!(norm[c] > 0)) {
                return new FitIdentifiability(keys, Double.POSITIVE_INFINITY, keys.get(c), "", Double.NaN, last,
                        symbol(keys.get(c)) + " does not change the fit at its start value (the data end at "
                                + time(last) + "): hold it, or add data where it acts");
            }
        }
        double[][] jtj = scaledNormalMatrix(j, norm, k);
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
        double condition = min > 0 ? Math.sqrt(max / min) : Double.POSITIVE_INFINITY;
        int worstA = -1;
        int worstB = -1;
        double worst = Double.NaN;
        double[] variance = null;
        if (!(min > SINGULAR_RATIO * max)) {
            // exactly degenerate: the direction the data cannot see names the pair
            double[] v = eig.getEigenvector(minIndex).toArray();
            for (int a = 0; a < nSlots; a++) {
                if (worstA < 0 || Math.abs(v[a]) > Math.abs(v[worstA])) {
                    worstB = worstA;
                    worstA = a;
                } else if (worstB < 0 || Math.abs(v[a]) > Math.abs(v[worstB])) {
                    worstB = a;
                }
            }
            worst = worstB < 0 ? Double.NaN : -Math.signum(v[worstA] * v[worstB]);
        } else {
            RealMatrix vm = eig.getV();
            double[][] cov = new double[nSlots][nSlots];
            for (int a = 0; a < nSlots; a++) {
                for (int b = 0; b < nSlots; b++) {
                    double sum = 0;
                    for (int c = 0; c < k; c++) {
                        sum += vm.getEntry(a, c) * vm.getEntry(b, c) / ev[c];
                    }
                    cov[a][b] = sum;
                }
            }
            variance = new double[nSlots];
            for (int a = 0; a < nSlots; a++) {
                variance[a] = cov[a][a];
            }
            for (int a = 0; a < nSlots; a++) {
                for (int b = a + 1; b < nSlots; b++) {
                    double r = cov[a][b] / Math.sqrt(cov[a][a] * cov[b][b]);
                    if (worstA < 0 || Math.abs(r) > Math.abs(worst)) {
                        worstA = a;
                        worstB = b;
                        worst = r;
                    }
                }
            }
        }
        if (worstA < 0 || worstB < 0) {
            return new FitIdentifiability(keys, condition, "", "", Double.NaN, last, "");
        }
        int a = Math.min(worstA, worstB);
        int b = Math.max(worstA, worstB);
        double[][] phys = p.physical(u);
        String warning = "";
        if (Math.abs(worst) >= CORRELATION_LIMIT) {
            warning = sentence(keys.get(a), value(p, phys, a), keys.get(b), value(p, phys, b), worst, last);
        } else if (variance != null) {
            // no pair moves together, but one parameter alone may hardly change the traces within their noise
            int loosest = -1;
            double loosestRelative = 1;
            for (int c = 0; c < nSlots; c++) {
                ParameterSpec spec = p.specs.get(p.slots.get(c).spec());
                double se = Math.sqrt(variance[c]) / norm[c] * Math.abs(p.transforms[c].derivative(u[c]));
                double relative = se / Math.max(Math.abs(value(p, phys, c)), spec.lower() == Double.NEGATIVE_INFINITY ? spec.scale() : 0);
                if (relative > loosestRelative) {
                    loosest = c;
                    loosestRelative = relative;
                }
            }
            if (loosest >= 0) {
                String name = symbol(keys.get(loosest));
                warning = String.format(Locale.ROOT, "%s is hardly determined by data that end at %s: its expected error "
                        + "(%.0f %%) exceeds its value; hold it, or add data where it acts", name, time(last), 100 * loosestRelative);
            }
        }
        return new FitIdentifiability(keys, condition, keys.get(a), keys.get(b), worst, last, warning);
    }

    private static double value(Projection p, double[][] phys, int slot) {
        return phys[p.slots.get(slot).spec()][Math.max(p.slots.get(slot).trace(), 0)];
    }

    private static String sentence(String a, double va, String b, double vb, double correlation, double lastS) {
        String names = symbol(a) + " and " + symbol(b) + " cannot be told apart";
        String c = "(correlation " + corr(correlation) + ")";
        if (lifetime(a) && lifetime(b) && va > FAR_BEYOND * lastS && vb > FAR_BEYOND * lastS) {
            return names + ": the data end at " + time(lastS) + ", far before either acts " + c
                    + "; hold one or add later delays";
        }
        if (lifetime(a) && lifetime(b)) {
            return names + " by data that end at " + time(lastS) + " " + c + "; hold one, or add delays where they act differently";
        }
        return names + " by these data " + c + "; hold one, or add data where they act differently";
    }

    private static boolean lifetime(String key) {
        return key.startsWith("tau") && key.endsWith("S");
    }

    static String symbol(String key) {
        return ParameterNaming.label(key).symbol();
    }

    /**
     * Enough decimals to show how far from ±1 it is (0.95, 0.9998, 0.99996), cut rather than rounded so that a
     * correlation short of 1 never reads as 1 (−0.9999996 reads −0.999999).
     */
    static String corr(double c) {
        if (Math.abs(c) >= 1) {
            return String.format(Locale.ROOT, "%.0f", c);
        }
        int digits = (int) Math.max(2, Math.min(6, Math.ceil(-Math.log10(1 - Math.abs(c)))));
        double scale = Math.pow(10, digits);
        double cut = Math.copySign(Math.floor(Math.abs(c) * scale + 1e-9) / scale, c);
        return String.format(Locale.ROOT, "%." + digits + "f", cut);
    }

    private static String time(double s) {
        return Quantity.formatBest(s, Dimension.TIME, 2);
    }

    /**
     * JᵀJ of the first {@code k} columns of {@code j}, each column divided by its norm: unit diagonal, so its
     * eigenvalues and inverse compare parameters of any units. Shared with {@link GlobalFitter}'s covariance.
     */
    static double[][] scaledNormalMatrix(double[][] j, double[] norm, int k) {
        double[][] jtj = new double[k][k];
        for (double[] row : j) {
            for (int a = 0; a < k; a++) {
                double ra = row[a] / norm[a];
                if (ra == 0) {
                    continue;
                }
                for (int b = a; b < k; b++) {
                    jtj[a][b] += ra * row[b] / norm[b];
                }
            }
        }
        for (int a = 0; a < k; a++) {
            for (int b = 0; b < a; b++) {
                jtj[a][b] = jtj[b][a];
            }
        }
        return jtj;
    }
}
