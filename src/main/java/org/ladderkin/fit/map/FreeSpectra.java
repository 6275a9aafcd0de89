package org.ladderkin.fit.map;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Variable projection for free state spectra: ΔA_j(λ, t) = Σ_s P_js(t)·S_s(λ) with the populations fixed is one
 * linear least-squares problem per wavelength, and every wavelength shares the design matrix (the fluences' delays
 * stacked as rows, the states as columns). The design is factorised once (an SVD of the column-scaled matrix, so the
 * rank test does not depend on how populations are normalised) and all complete wavelengths are solved together;
 * a wavelength with missing cells gets its own factorisation of the rows it has.
 *
 * <p>Singular values below {@link #RANK_TOLERANCE} times the largest mark directions the data cannot see. A state
 * whose unit vector has a part in those directions cannot be separated from the others: its spectrum is reported as
 * NaN with the reason, not as the arbitrary large numbers a plain solve would give. States outside those directions
 * are still estimable and keep their (unique) spectra.
 */
public final class FreeSpectra {

    /** Relative singular value below which the scaled design counts as rank-deficient. */
    public static final double RANK_TOLERANCE = 1e-10;

    /** Squared part of a state's unit vector in the unseen directions above which the state counts as unseparable. */
    private static final double UNSEEN_PART = 1e-8;

    private FreeSpectra() {
    }

    /**
     * Spectra shared by a fluence series.
     *
     * @param populations per fluence, {@code [delay][state]} on that map's delays
     * @param maps        per fluence, all on the same wavelengths
     * @param stateNames  one name per state column, for the rank message
     */
    public static SpectraSolution solve(List<double[][]> populations, List<DeltaAMap> maps, List<String> stateNames) {
        if (populations.size() != maps.size() || maps.isEmpty()) {
            throw new IllegalArgumentException("need one population matrix per map, got " + populations.size() + " for "
                    + maps.size() + " maps");
        }
        double[] lambda = maps.get(0).wavelengthsM();
        int rows = 0;
        for (int j = 0; j < maps.size(); j++) {
            if (!Arrays.equals(lambda, maps.get(j).wavelengthsM())) {
                throw new IllegalArgumentException("map " + (j + 1) + " has other wavelengths than map 1 (resample first)");
            }
            if (populations.get(j).length != maps.get(j).delayCount()) {
                throw new IllegalArgumentException("fluence " + (j + 1) + ": " + populations.get(j).length + " population rows for "
                        + maps.get(j).delayCount() + " delays");
            }
            rows += maps.get(j).delayCount();
        }
        int n = lambda.length;
        double[][] design = new double[rows][];
        double[] data = new double[rows * n];
        int r = 0;
        for (int j = 0; j < maps.size(); j++) {
            double[][] p = populations.get(j);
            DeltaAMap m = maps.get(j);
            System.arraycopy(m.deltaAOd(), 0, data, r * n, m.deltaAOd().length);
            for (double[] row : p) {
                design[r++] = row;
            }
        }
        return solve(design, data, n, stateNames);
    }

    /**
     * The general form.
     *
     * @param design      {@code [row][state]} populations
     * @param data        {@code data[row * wavelengths + w]} in OD, NaN where missing
     * @param wavelengths number of wavelengths
     * @param stateNames  one per design column
     */
    public static SpectraSolution solve(double[][] design, double[] data, int wavelengths, List<String> stateNames) {
        int m = design.length;
        int k = stateNames.size();
        int n = wavelengths;
        if (k == 0 || m < k) {
            throw new IllegalArgumentException(m + " rows cannot determine " + k + " state spectra");
        }
        if ((long) m * n != data.length) {
            throw new IllegalArgumentException(data.length + " data values for " + m + " rows × " + n + " wavelengths");
        }
        for (double[] row : design) {
            if (row.length != k) {
                throw new IllegalArgumentException("a design row has " + row.length + " populations for " + k + " states");
            }
            for (double v : row) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("populations must be finite, found " + v);
                }
            }
        }
        boolean[] complete = new boolean[n];
        Arrays.fill(complete, true);
        for (int i = 0; i < m; i++) {
            for (int w = 0; w < n; w++) {
                if (Double.isNaN(data[i * n + w])) {
                    complete[w] = false;
                }
            }
        }
        double[][] spectra = new double[k][n];
        double[][] errors = new double[k][n];
        double[] rss = new double[n];
        boolean[] all = new boolean[m];
        Arrays.fill(all, true);
        Factor full = new Factor(design, all);
        full.solve(design, data, n, complete, spectra, errors, rss);
        for (int w = 0; w < n; w++) {
            if (!complete[w]) {
                boolean[] present = new boolean[m];
                int count = 0;
                for (int i = 0; i < m; i++) {
                    present[i] = !Double.isNaN(data[i * n + w]);
                    count += present[i] ? 1 : 0;
                }
                boolean[] only = new boolean[n];
                only[w] = true;
                if (count < k) {
                    for (int s = 0; s < k; s++) {
                        spectra[s][w] = Double.NaN;
                        errors[s][w] = Double.NaN;
                    }
                    rss[w] = 0;
                    continue;
                }
                new Factor(design, present).solve(design, data, n, only, spectra, errors, rss);
            }
        }
        double total = 0;
        for (double v : rss) {
            total += v;
        }
        List<String> unseparable = new ArrayList<>();
        for (int s = 0; s < k; s++) {
            if (!full.estimable[s]) {
                unseparable.add(stateNames.get(s));
            }
        }
        String message = unseparable.isEmpty() ? "" : "the populations of " + String.join(", ", unseparable)
                + " are linearly dependent on this series (rank " + full.rank + " of " + k + "), so their spectra cannot be "
                + "separated: add fluences at which these states' weights change differently, or lump them into one state";
        return new SpectraSolution(stateNames, spectra, errors, rss, total, unseparable, message);
    }

    /** The scaled SVD of the design's present rows, as the pseudo-inverse and the per-state variance factors. */
    private static final class Factor {
        final int[] rows;
        final double[][] pinv;
        final double[] varianceFactor;
        final boolean[] estimable;
        final int rank;

        Factor(double[][] design, boolean[] present) {
            int k = design[0].length;
            int count = 0;
            for (boolean p : present) {
                count += p ? 1 : 0;
            }
            rows = new int[count];
            int c = 0;
            for (int i = 0; i < present.length; i++) {
                if (present[i]) {
                    rows[c++] = i;
                }
            }
            double[] norm = new double[k];
            for (int i : rows) {
                for (int s = 0; s < k; s++) {
                    norm[s] += design[i][s] * design[i][s];
                }
            }
            double[][] scaled = new double[count][k];
            for (int s = 0; s < k; s++) {
                norm[s] = Math.sqrt(norm[s]);
                for (int r = 0; r < count; r++) {
                    // a state never populated on these rows has a zero column: left zero, it shows up as unseen
                    scaled[r][s] = norm[s] > 0 ? design[rows[r]][s] / norm[s] : 0;
                }
            }
            RealMatrix a = new Array2DRowRealMatrix(scaled, false);
            SingularValueDecomposition svd = new SingularValueDecomposition(a);
            double[] sigma = svd.getSingularValues();
            RealMatrix u = svd.getU();
            RealMatrix v = svd.getV();
            double tol = RANK_TOLERANCE * sigma[0];
            int kept = 0;
            while (kept < sigma.length && sigma[kept] > tol) {
                kept++;
            }
            rank = kept;
            estimable = new boolean[k];
            varianceFactor = new double[k];
            for (int s = 0; s < k; s++) {
                double unseen = 0;
                for (int q = kept; q < k; q++) {
                    unseen += v.getEntry(s, q) * v.getEntry(s, q);
                }
                estimable[s] = norm[s] > 0 && unseen < UNSEEN_PART;
                double f = 0;
                for (int q = 0; q < kept; q++) {
                    f += v.getEntry(s, q) * v.getEntry(s, q) / (sigma[q] * sigma[q]);
                }
                varianceFactor[s] = norm[s] > 0 ? f / (norm[s] * norm[s]) : Double.NaN;
            }
            // pinv[s][r] = Σ_q V[s][q] U[r][q] / σ_q, back in the unscaled states' units
            pinv = new double[k][count];
            for (int s = 0; s < k; s++) {
                for (int q = 0; q < kept; q++) {
                    double vs = v.getEntry(s, q) / sigma[q];
                    if (vs == 0) {
                        continue;
                    }
                    for (int r = 0; r < count; r++) {
                        pinv[s][r] += vs * u.getEntry(r, q);
                    }
                }
                for (int r = 0; r < count; r++) {
                    pinv[s][r] = norm[s] > 0 ? pinv[s][r] / norm[s] : 0;
                }
            }
        }

        /** Solves the wavelengths marked in {@code which} in one pass over the rows, writing spectra, errors and rss. */
        void solve(double[][] design, double[] data, int n, boolean[] which, double[][] spectra, double[][] errors, double[] rss) {
            int k = pinv.length;
            double[][] x = new double[k][n];
            for (int r = 0; r < rows.length; r++) {
                int base = rows[r] * n;
                for (int s = 0; s < k; s++) {
                    double p = pinv[s][r];
                    double[] xs = x[s];
                    for (int w = 0; w < n; w++) {
                        if (which[w]) {
                            xs[w] += p * data[base + w];
                        }
                    }
                }
            }
            double[] sum = new double[n];
            for (int r = 0; r < rows.length; r++) {
                int base = rows[r] * n;
                double[] pop = design[rows[r]];
                for (int w = 0; w < n; w++) {
                    if (which[w]) {
                        double model = 0;
                        for (int s = 0; s < k; s++) {
                            model += pop[s] * x[s][w];
                        }
                        double e = data[base + w] - model;
                        sum[w] += e * e;
                    }
                }
            }
            int dof = rows.length - rank;
            for (int w = 0; w < n; w++) {
                if (!which[w]) {
                    continue;
                }
                rss[w] = sum[w];
                double variance = dof > 0 ? sum[w] / dof : Double.NaN;
                for (int s = 0; s < k; s++) {
                    spectra[s][w] = estimable[s] ? x[s][w] : Double.NaN;
                    errors[s][w] = estimable[s] ? Math.sqrt(varianceFactor[s] * variance) : Double.NaN;
                }
            }
        }
    }
}
