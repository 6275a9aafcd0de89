package org.ladderkin.kinetics.rate;

import java.util.Arrays;

/**
 * A user-supplied factor table: {@code factors[i]} is the factor for N = firstN + i. N below the table gives 0;
 * N beyond it is an error, so a ladder never silently extrapolates a measured table.
 *
 * @param firstN exciton number of the first entry (1 for radiative tables, 2 for Auger tables)
 * @param factors factors, each finite and ≥ 0
 */
public record TableScaling(int firstN, double[] factors) implements ExcitonScaling {

    public TableScaling {
        if (firstN < 1) {
            throw new IllegalArgumentException("table must start at N >= 1, was N=" + firstN);
        }
        if (factors.length == 0) {
            throw new IllegalArgumentException("scaling table is empty");
        }
        factors = factors.clone();
        for (int i = 0; i < factors.length; i++) {
            if (!(factors[i] >= 0) || !Double.isFinite(factors[i])) {
                throw new IllegalArgumentException("scaling factor for N=" + (firstN + i) + " must be finite and >= 0, was " + factors[i]);
            }
        }
    }

    @Override
    public double factor(int n) {
        if (n < firstN) {
            return 0;
        }
        int i = n - firstN;
        if (i >= factors.length) {
            throw new IllegalArgumentException("scaling table covers N=" + firstN + ".." + (firstN + factors.length - 1)
                    + " but the ladder reaches N=" + n + " (extend the table or lower Nmax)");
        }
        return factors[i];
    }

    /** Highest N the table covers. */
    public int lastN() {
        return firstN + factors.length - 1;
    }

    @Override
    public double[] factors() {
        return factors.clone();
    }

    @Override
    public String key() {
        return "table";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TableScaling t && t.firstN == firstN && Arrays.equals(t.factors, factors);
    }

    @Override
    public int hashCode() {
        return 31 * firstN + Arrays.hashCode(factors);
    }

    @Override
    public String toString() {
        return "TableScaling[N>=" + firstN + ": " + Arrays.toString(factors) + "]";
    }
}
