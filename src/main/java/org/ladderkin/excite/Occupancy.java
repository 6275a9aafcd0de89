package org.ladderkin.excite;

/**
 * Distributions of the number of excitons a pulse creates in one dot.
 * <ul>
 *   <li>Poisson: P(k) = ⟨N⟩ᵏ e^{−⟨N⟩}/k! (independent absorption events; e.g. Klimov, Annu. Rev. Phys. Chem. 58, 635 (2007)).</li>
 *   <li>Compound Poisson for carrier multiplication: the number of absorbed photons m is Poisson(⟨N_abs⟩) and each
 *       photon yields two excitons with probability η, else one; so P(k) = Σ_m Pois(m)·Binom(k−m; m, η).</li>
 * </ul>
 */
public final class Occupancy {

    private Occupancy() {
    }

    /** Poisson probabilities P(0..count−1) for mean {@code mean} ≥ 0. */
    public static double[] poisson(double mean, int count) {
        requireMean(mean);
        double[] p = new double[count];
        if (mean == 0) {
            if (count > 0) {
                p[0] = 1;
            }
            return p;
        }
        double logMean = Math.log(mean);
        double logFactorial = 0;
        for (int k = 0; k < count; k++) {
            if (k > 0) {
                logFactorial += Math.log(k);
            }
            p[k] = Math.exp(k * logMean - mean - logFactorial);
        }
        return p;
    }

    /**
     * Compound-Poisson probabilities P(0..count−1) of exciton numbers when Poisson({@code meanPhotons}) photons are
     * absorbed and each gives two excitons with probability {@code eta}.
     */
    public static double[] compoundPoisson(double meanPhotons, double eta, int count) {
        requireMean(meanPhotons);
        if (!(eta >= 0 && eta <= 1)) {
            throw new IllegalArgumentException("multiplication probability η must be between 0 and 1, was " + eta);
        }
        if (eta == 0) {
            return poisson(meanPhotons, count);
        }
        double[] photons = poisson(meanPhotons, count);
        double[] p = new double[count];
        for (int m = 0; m < count; m++) {
            if (photons[m] == 0) {
                continue;
            }
            // j doubled photons among m: k = m + j excitons
            double logBinom = 0;
            for (int j = 0; j <= m && m + j < count; j++) {
                if (j > 0) {
                    logBinom += Math.log(m - j + 1) - Math.log(j);
                }
                double logTerm = logBinom + (j == 0 ? 0 : j * Math.log(eta)) + (m - j == 0 ? 0 : (m - j) * Math.log1p(-eta));
                if (eta == 1 && j < m) {
                    continue;
                }
                p[m + j] += photons[m] * Math.exp(logTerm);
            }
        }
        return p;
    }

    /** Poisson tail Σ_{k > n} P(k). */
    public static double poissonTail(double mean, int n) {
        return tailOf(poisson(mean, tableLength(mean, 0)), n);
    }

    /** Compound-Poisson tail Σ_{k > n} P(k). */
    public static double compoundPoissonTail(double meanPhotons, double eta, int n) {
        return tailOf(compoundPoisson(meanPhotons, eta, tableLength(meanPhotons, eta)), n);
    }

    /** Smallest n with the Poisson tail beyond n below {@code tail}. */
    public static int poissonCutoff(double mean, double tail) {
        return cutoff(poisson(mean, tableLength(mean, 0)), tail);
    }

    /** Smallest n with the compound-Poisson tail beyond n below {@code tail}. */
    public static int compoundPoissonCutoff(double meanPhotons, double eta, double tail) {
        return cutoff(compoundPoisson(meanPhotons, eta, tableLength(meanPhotons, eta)), tail);
    }

    /** Long enough that the neglected part is far below 1e-15. */
    private static int tableLength(double mean, double eta) {
        double m = mean * (1 + eta);
        return (int) Math.ceil(m + 20 * Math.sqrt(m + 1) + 60);
    }

    private static double tailOf(double[] p, int n) {
        double s = 0;
        for (int k = p.length - 1; k > n; k--) {
            s += p[k];
        }
        return s;
    }

    private static int cutoff(double[] p, double tail) {
        double s = 0;
        for (int k = p.length - 1; k >= 0; k--) {
            if (s + p[k] >= tail) {
                return k;
            }
            s += p[k];
        }
        return 0;
    }

    private static void requireMean(double mean) {
        if (!(mean >= 0) || !Double.isFinite(mean)) {
            throw new IllegalArgumentException("mean occupancy must be finite and >= 0, was " + mean);
        }
    }
}
