package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Clusters of 2, 3 and 5 exactly or nearly coincident rates on a 40-point log grid (0.1 fs to 30 ns), where the grid
 * takes each cluster's exponential from divided differences instead of a Padé exponential per time. The reference
 * populations were computed at test-writing time by {@code coincident-clusters-scipy.py} beside the data file, in
 * double precision by SciPy and in 50 digits by mpmath. SciPy's own error on the nearly coincident cases reaches
 * 8e-8 (against mpmath), so the SciPy comparison holds the engine to 1e-7, the 50-digit one to 1e-12.
 */
class CoincidentClusterTest {

    private static final String SCIPY = "SciPy 1.17.1 scipy.linalg.expm (coincident-clusters-scipy.py, values stored in"
            + " coincident-clusters-scipy.csv)";
    private static final String MPMATH = "mpmath 1.3.0 mpmath.expm at 50 digits (coincident-clusters-scipy.py, values"
            + " stored in coincident-clusters-scipy.csv)";

    /** The ladder of the reference script: rates 1e9, m cluster rates 3e10·(1 + eps·i), 2e11, 4e11 (1/s). */
    static double[][] generator(int m, double eps) {
        int n = m + 4;
        double[] rates = new double[n];
        rates[1] = 1e9;
        for (int i = 0; i < m; i++) {
            rates[2 + i] = 3e10 * (1 + eps * i);
        }
        rates[n - 2] = 2e11;
        rates[n - 1] = 4e11;
        double[][] q = new double[n][n];
        for (int i = 1; i < n; i++) {
            double k = rates[i];
            q[i][i] = -k;
            if (i >= 2) {
                q[i - 1][i] = 0.8 * k;
                q[i - 2][i] = 0.2 * k;
            } else {
                q[0][1] = k;
            }
        }
        return q;
    }

    /** Reference rows keyed by "m,eps": times and p(t) per time; column 4 is SciPy's value, column 5 mpmath's. */
    private static Map<String, List<double[]>> reference(Map<String, List<Double>> timesOut, int column)
            throws IOException {
        Map<String, List<double[]>> out = new LinkedHashMap<>();
        try (InputStream in = CoincidentClusterTest.class.getResourceAsStream("coincident-clusters-scipy.csv");
             BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split(",");
                int m = Integer.parseInt(f[0]);
                String key = m + "," + f[1];
                double t = Double.parseDouble(f[2]);
                int state = Integer.parseInt(f[3]);
                List<double[]> rows = out.computeIfAbsent(key, k -> new ArrayList<>());
                List<Double> times = timesOut.computeIfAbsent(key, k -> new ArrayList<>());
                if (state == 0) {
                    rows.add(new double[m + 4]);
                    times.add(t);
                }
                rows.get(rows.size() - 1)[state] = Double.parseDouble(f[column]);
            }
        }
        return out;
    }

    @Test
    @CheckedAgainst(source = SCIPY, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void clustersOfTwoThreeAndFiveCoincidentRatesMatchScipyOnALogGrid() throws IOException {
        compare(4, "SciPy", 1e-7);
    }

    @Test
    @CheckedAgainst(source = MPMATH, kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void clustersOfTwoThreeAndFiveCoincidentRatesMatchFiftyDigitExponentialsOnALogGrid() throws IOException {
        compare(5, "mpmath", 1e-12);
    }

    private static void compare(int column, String library, double tolerance) throws IOException {
        Map<String, List<Double>> times = new LinkedHashMap<>();
        Map<String, List<double[]>> ref = reference(times, column);
        assertThat(ref).hasSize(9);
        for (Map.Entry<String, List<double[]>> e : ref.entrySet()) {
            String[] key = e.getKey().split(",");
            int m = Integer.parseInt(key[0]);
            double eps = Double.parseDouble(key[1]);
            int n = m + 4;
            ExactPropagator p = ExactPropagator.of(generator(m, eps));
            // the cluster must really be one block handled by the divided-difference path
            assertThat(p.clusteredStates()).as("clustered states, m = %d, eps = %s", m, eps).isEqualTo(m);
            double[] t = times.get(e.getKey()).stream().mapToDouble(Double::doubleValue).toArray();
            double[][] unitRows = new double[n][n];
            for (int i = 0; i < n; i++) {
                unitRows[i][i] = 1;
            }
            double[] p0 = new double[n];
            p0[n - 1] = 1;
            double[][] onGrid = p.onGrid(t).observe(unitRows, p0);
            double worstGrid = 0;
            double worstDirect = 0;
            for (int j = 0; j < t.length; j++) {
                double[] direct = p.propagate(p0, t[j]);
                for (int i = 0; i < n; i++) {
                    double r = e.getValue().get(j)[i];
                    worstGrid = Math.max(worstGrid, Math.abs(onGrid[i][j] - r));
                    worstDirect = Math.max(worstDirect, Math.abs(direct[i] - r));
                }
            }
            String what = "cluster of " + m + " rates 3e10·(1 + " + eps + "·i) 1/s, 40 log times 0.1 fs..30 ns";
            Reference.check("max |p(t) − " + library + " expm(Qt)p0| on the grid, " + what, worstGrid, 0, tolerance);
            Reference.check("max |p(t) − " + library + " expm(Qt)p0| propagated, " + what, worstDirect, 0, tolerance);
        }
    }
}
