package org.ladderkin.kinetics.propagate;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

/**
 * Checks the Radau IIA coefficients numerically: every Runge–Kutta order condition Φ(τ) = 1/γ(τ) for the rooted
 * trees τ up to order 5 (and that order 6 fails), the simplifying assumptions, the stability function and the
 * embedded error weights.
 */
class RadauIIATableauTest {

    /** A rooted tree as the list of its subtrees. */
    private record Tree(List<Tree> children) {
        int order() {
            return 1 + children.stream().mapToInt(Tree::order).sum();
        }

        /** γ(τ) = |τ|·Π γ(τᵢ). */
        double density() {
            double g = order();
            for (Tree c : children) {
                g *= c.density();
            }
            return g;
        }

        /** Stage vector g(τ)ᵢ = Πₖ (A·g(τₖ))ᵢ; Φ(τ) = bᵀ g(τ). */
        double[] stageWeights() {
            double[] g = {1, 1, 1};
            for (Tree c : children) {
                double[] gc = c.stageWeights();
                for (int i = 0; i < 3; i++) {
                    double s = 0;
                    for (int j = 0; j < 3; j++) {
                        s += RadauIIATableau.A[i][j] * gc[j];
                    }
                    g[i] *= s;
                }
            }
            return g;
        }

        double elementaryWeight() {
            double[] g = stageWeights();
            double phi = 0;
            for (int i = 0; i < 3; i++) {
                phi += RadauIIATableau.B[i] * g[i];
            }
            return phi;
        }
    }

    /** All rooted trees of order exactly n, built as multisets of smaller trees (index non-decreasing). */
    private static List<Tree> treesOfOrder(int n, List<List<Tree>> smaller) {
        List<Tree> all = new ArrayList<>();
        List<Tree> pool = new ArrayList<>();
        for (int k = 1; k < n; k++) {
            pool.addAll(smaller.get(k));
        }
        forests(pool, 0, n - 1, new ArrayList<>(), all);
        return all;
    }

    private static void forests(List<Tree> pool, int from, int remaining, List<Tree> chosen, List<Tree> out) {
        if (remaining == 0) {
            out.add(new Tree(List.copyOf(chosen)));
            return;
        }
        for (int i = from; i < pool.size(); i++) {
            Tree t = pool.get(i);
            if (t.order() <= remaining) {
                chosen.add(t);
                forests(pool, i, remaining - t.order(), chosen, out);
                chosen.remove(chosen.size() - 1);
            }
        }
    }

    private static List<List<Tree>> treesUpTo(int maxOrder) {
        List<List<Tree>> byOrder = new ArrayList<>();
        byOrder.add(List.of());
        for (int n = 1; n <= maxOrder; n++) {
            byOrder.add(treesOfOrder(n, byOrder));
        }
        return byOrder;
    }

    @Test
    @CheckedAgainst(source = "derived: Butcher's order conditions Phi(tau) = 1/gamma(tau) for all rooted trees "
            + "(Hairer, Norsett & Wanner, Solving ODEs I, Sect. II.2)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void satisfiesAllOrderConditionsUpToOrderFive() {
        List<List<Tree>> trees = treesUpTo(6);
        // 1, 1, 2, 4, 9, 20 rooted trees of orders 1..6 (OEIS A000081)
        assertThat(trees.stream().skip(1).map(List::size).toList()).containsExactly(1, 1, 2, 4, 9, 20);
        double worst = 0;
        for (int n = 1; n <= 5; n++) {
            for (Tree t : trees.get(n)) {
                worst = Math.max(worst, Math.abs(t.elementaryWeight() - 1 / t.density()));
            }
        }
        Reference.check("max |Phi(tau) - 1/gamma(tau)| over the 17 trees of order <= 5", worst, 0.0, 1e-14);
        double worstSix = 0;
        for (Tree t : trees.get(6)) {
            worstSix = Math.max(worstSix, Math.abs(t.elementaryWeight() - 1 / t.density()));
        }
        // the method has order exactly 5: some order-6 condition must fail
        assertThat(worstSix).isGreaterThan(1e-5);
    }

    @Test
    @CheckedAgainst(source = "derived: simplifying assumptions B(5), C(3), D(2) of Radau IIA "
            + "(Hairer & Wanner, Solving ODEs II, Sect. IV.5; Butcher 1964)", kind = CheckedAgainst.Kind.CLOSED_FORM)
    void satisfiesSimplifyingAssumptions() {
        double worstB = 0;
        for (int k = 1; k <= 5; k++) {
            double s = 0;
            for (int i = 0; i < 3; i++) {
                s += RadauIIATableau.B[i] * Math.pow(RadauIIATableau.C[i], k - 1);
            }
            worstB = Math.max(worstB, Math.abs(s - 1.0 / k));
        }
        double worstC = 0;
        for (int i = 0; i < 3; i++) {
            for (int k = 1; k <= 3; k++) {
                double s = 0;
                for (int j = 0; j < 3; j++) {
                    s += RadauIIATableau.A[i][j] * Math.pow(RadauIIATableau.C[j], k - 1);
                }
                worstC = Math.max(worstC, Math.abs(s - Math.pow(RadauIIATableau.C[i], k) / k));
            }
        }
        double worstD = 0;
        for (int j = 0; j < 3; j++) {
            for (int k = 1; k <= 2; k++) {
                double s = 0;
                for (int i = 0; i < 3; i++) {
                    s += RadauIIATableau.B[i] * Math.pow(RadauIIATableau.C[i], k - 1) * RadauIIATableau.A[i][j];
                }
                worstD = Math.max(worstD, Math.abs(s - RadauIIATableau.B[j] * (1 - Math.pow(RadauIIATableau.C[j], k)) / k));
            }
        }
        Reference.check("max defect of B(5)", worstB, 0.0, 1e-15);
        Reference.check("max defect of C(3)", worstC, 0.0, 1e-15);
        Reference.check("max defect of D(2)", worstD, 0.0, 1e-15);
        Reference.check("c3", RadauIIATableau.C[2], 1.0, 0.0);
    }

    /** R(z) = 1 + z bᵀ(I − zA)⁻¹𝟙 for real z. */
    private static double stabilityFunction(double z) {
        double[][] m = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                m[i][j] = (i == j ? 1 : 0) - z * RadauIIATableau.A[i][j];
            }
        }
        double[] x = SmallDense.solve(m, new double[] {1, 1, 1});
        double s = 0;
        for (int i = 0; i < 3; i++) {
            s += RadauIIATableau.B[i] * x[i];
        }
        return 1 + z * s;
    }

    @Test
    @CheckedAgainst(source = "derived: the Radau IIA stability function is the (2,3) Pade approximant of exp(z), "
            + "(1 + 2z/5 + z^2/20)/(1 - 3z/5 + 3z^2/20 - z^3/60) (Hairer & Wanner II, Sect. IV.5 and IV.3)",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void stabilityFunctionIsThePadeApproximantAndVanishesAtInfinity() {
        for (double z : new double[] {-0.5, -3.0, -40.0, 2.0}) {
            double pade = (1 + 2 * z / 5 + z * z / 20) / (1 - 3 * z / 5 + 3 * z * z / 20 - z * z * z / 60);
            Reference.check("R(" + z + ")", stabilityFunction(z), pade, 1e-13);
        }
        Reference.check("R(-1e12) (L-stability: R(-inf) = 0)", stabilityFunction(-1e12), 0.0, 1e-10);
    }

    @Test
    @CheckedAgainst(source = "SciPy scipy/integrate/_ivp/radau.py (Radau IIA order 5 after Hairer & Wanner II, Sect. IV.8), "
            + "read in a stored copy: E = [-13 - 7·√6, -13 + 7·√6, -1]/3 (the error weights over γ₀, as Hairer's DD1..DD3); "
            + "det(A − γ₀I) = 0 because γ₀ is the real eigenvalue of A, derived",
            kind = CheckedAgainst.Kind.REFERENCE_LIBRARY)
    void embeddedErrorWeightsMatchHairersConstants() {
        double sq6 = Math.sqrt(6);
        double g0 = RadauIIATableau.GAMMA0;
        Reference.check("e1 / gamma0", RadauIIATableau.E[0] / g0, -(13 + 7 * sq6) / 3, 1e-12);
        Reference.check("e2 / gamma0", RadauIIATableau.E[1] / g0, (-13 + 7 * sq6) / 3, 1e-12);
        Reference.check("e3 / gamma0", RadauIIATableau.E[2] / g0, -1.0 / 3, 1e-12);
        // gamma0 is an eigenvalue of A: det(A - gamma0 I) = 0
        double[][] m = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                m[i][j] = RadauIIATableau.A[i][j] - (i == j ? g0 : 0);
            }
        }
        double det = m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) - m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0])
                + m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
        Reference.check("det(A - gamma0 I)", det, 0.0, 1e-15);
    }

    @Test
    void eigenbasisSplitsAIntoARealAndA2x2Block() {
        double[][] l = RadauIIATableau.LAMBDA;
        org.assertj.core.data.Offset<Double> tiny = org.assertj.core.data.Offset.offset(1e-14);
        assertThat(l[0][0]).isCloseTo(RadauIIATableau.GAMMA0, tiny);
        assertThat(l[0][1]).isCloseTo(0.0, tiny);
        assertThat(l[0][2]).isCloseTo(0.0, tiny);
        assertThat(l[1][0]).isCloseTo(0.0, tiny);
        assertThat(l[2][0]).isCloseTo(0.0, tiny);
        // the 2×2 block is α·I + β·rotation: equal diagonal, opposite off-diagonal
        assertThat(l[1][1]).isCloseTo(l[2][2], tiny);
        assertThat(l[1][2]).isCloseTo(-l[2][1], tiny);
        assertThat(Math.abs(l[1][2])).isGreaterThan(0.1);
    }

    @Test
    void lagrangeBasisInterpolatesTheNodes() {
        double[] nodes = {RadauIIATableau.C[0], RadauIIATableau.C[1], RadauIIATableau.C[2]};
        for (int i = 0; i < 3; i++) {
            assertThat(RadauIIATableau.lagrange(i, 0.0)).isZero();
            for (int j = 0; j < 3; j++) {
                assertThat(RadauIIATableau.lagrange(i, nodes[j])).isCloseTo(i == j ? 1 : 0,
                        org.assertj.core.data.Offset.offset(1e-14));
            }
        }
    }
}
