package org.ladderkin.fit.counting;

/**
 * The Poisson deviance D = 2 Σ [μ − n + n ln(n/μ)] of counts n against expected counts μ: −2 ln L up to a constant
 * that does not depend on μ, and zero for a perfect fit. Minimising it is Poisson maximum likelihood; at the optimum
 * it is approximately χ²-distributed with (bins − free parameters) degrees of freedom when the expected counts are
 * not too small.
 */
public final class PoissonDeviance {

    private PoissonDeviance() {
    }

    /** One bin's share of the deviance; μ must be &gt; 0 (or n = 0 and μ = 0). */
    public static double term(double n, double mu) {
        if (n == 0) {
            return 2 * mu;
        }
        return 2 * (mu - n + n * Math.log(n / mu));
    }

    /**
     * The signed deviance residual sign(n − μ)·√term: the squares sum to the deviance, so a least-squares optimiser on
     * these residuals minimises the deviance itself. It is smooth in μ where n &gt; 0 (near μ = n it is (n − μ)/√n).
     */
    public static double residual(double n, double mu) {
        double d = Math.max(0, term(n, mu));
        return n >= mu ? Math.sqrt(d) : -Math.sqrt(d);
    }

    /** The deviance of a whole histogram. */
    public static double of(double[] counts, double[] expected) {
        if (counts.length != expected.length) {
            throw new IllegalArgumentException(counts.length + " bins of counts but " + expected.length + " expected values");
        }
        double d = 0;
        for (int i = 0; i < counts.length; i++) {
            d += term(counts[i], expected[i]);
        }
        return d;
    }
}
