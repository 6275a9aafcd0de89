package org.ladderkin.excite.beam;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.ladderkin.validation.CheckedAgainst;
import org.ladderkin.validation.Reference;

class KnifeEdgeFitTest {

    @Test
    @CheckedAgainst(source = "closed form: a blade at x uncovers ∫ of a Gaussian beam of 1/e² radius w, "
            + "P(x) = P0 + (Pmax − P0)/2·(1 + erf(√2 (x − x0)/w)); x₉₀ − x₁₀ = √2·erf⁻¹(0.8)·w = 1.2816·w",
            kind = CheckedAgainst.Kind.CLOSED_FORM)
    void radiusFromTheErfProfile() {
        double[] x = SyntheticBeams.grid(-300e-6, 300e-6, 61);
        double[] p = SyntheticBeams.knifeEdge(x, 20e-6, 100e-6, 0.02, 1.0, 0.003, 21);
        KnifeEdgeFit f = KnifeEdgeFit.of(new KnifeEdgeScan(x, p));
        Reference.checkRelative("knife-edge 1/e² radius, w = 100 µm, noise 0.3 % (µm)", f.radius().radiusM() * 1e6, 100, 0.01);
        Reference.check("knife-edge beam centre, x0 = 20 µm (µm)", f.centreM() * 1e6, 20, 1);
        Reference.checkRelative("10–90 % radius (x₉₀ − x₁₀)/1.2816, w = 100 µm (µm)", f.tenNinetyRadiusM() * 1e6, 100, 0.02);
        Reference.checkRelative("√2·erf⁻¹(0.8)", KnifeEdgeFit.TEN_NINETY_PER_RADIUS, 1.2816, 1e-4);

        // blade moving into the beam, positions decreasing: the same radius
        double[] xd = new double[x.length];
        double[] pd = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            xd[i] = x[x.length - 1 - i];
            pd[i] = 1.02 - p[x.length - 1 - i];
        }
        Reference.checkRelative("knife-edge radius, blade moving in, positions decreasing (µm)",
                KnifeEdgeFit.fit(xd, pd).radiusM() * 1e6, 100, 0.01);
    }

    @Test
    void standardErrorMatchesTheScatterOfRepeatedScans() {
        double[] x = SyntheticBeams.grid(-200e-6, 200e-6, 41);
        int runs = 60;
        double[] w = new double[runs];
        double meanError = 0;
        for (int k = 0; k < runs; k++) {
            BeamRadius r = KnifeEdgeFit.fit(x, SyntheticBeams.knifeEdge(x, 0, 60e-6, 0, 5, 0.05, 300 + k));
            w[k] = r.radiusM();
            meanError += r.stdErrorM() / runs;
            assertThat(r.method()).isEqualTo(BeamRadius.Method.KNIFE_EDGE);
        }
        double mean = java.util.Arrays.stream(w).average().orElseThrow();
        double sd = Math.sqrt(java.util.Arrays.stream(w).map(v -> (v - mean) * (v - mean)).sum() / (runs - 1));
        assertThat(meanError / sd).as("stated error / observed scatter").isBetween(0.7, 1.4);
    }

    @Test
    void aScanWithoutAnEdgeIsRefused() {
        double[] x = SyntheticBeams.grid(0, 1e-3, 30);
        double[] flat = SyntheticBeams.knifeEdge(x, 0.5e-3, 1e-4, 1, 1, 0.01, 4);
        assertThatThrownBy(() -> KnifeEdgeFit.fit(x, flat)).isInstanceOfSatisfying(BeamException.class,
                e -> assertThat(e.reason()).isEqualTo(BeamException.Reason.NO_EDGE));
        // the beam is far off to one side: the whole scan sits on the plateau
        double[] off = SyntheticBeams.knifeEdge(x, 5e-3, 1e-4, 0, 1, 0.01, 5);
        assertThatThrownBy(() -> KnifeEdgeFit.fit(x, off)).isInstanceOf(BeamException.class);
    }

    @Test
    void nonMonotonicPositionsAreRefusedAtTheirPoint() {
        double[] x = {0, 1e-5, 2e-5, 1.5e-5, 4e-5, 5e-5, 6e-5};
        double[] p = {0, 0.1, 0.4, 0.5, 0.8, 0.9, 1};
        assertThatThrownBy(() -> new KnifeEdgeScan(x, p)).isInstanceOfSatisfying(BeamException.class, e -> {
            assertThat(e.reason()).isEqualTo(BeamException.Reason.NOT_MONOTONIC);
            assertThat(e.index()).isEqualTo(3);
        });
    }
}
