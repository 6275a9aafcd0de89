package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.ladderkin.excite.ExcitationGeometry;
import org.ladderkin.excite.FlatTopBeam;
import org.ladderkin.excite.GaussianBeam;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;

/** Fits that average over the pump and probe spots and the depth, as the excitation and planner do. */
class GeometryFitTest {

    private static final double SIGMA_M2 = 1e-19;

    @Test
    void fixedQuadratureAgreesWithTheAdaptiveSpotAndDepthAverage() {
        List<ExcitationGeometry> cases = List.of(
                new ExcitationGeometry(new GaussianBeam(300e-6), new GaussianBeam(100e-6), 0, false),
                new ExcitationGeometry(new GaussianBeam(100e-6), new GaussianBeam(100e-6), 0.3, true),
                new ExcitationGeometry(new FlatTopBeam(150e-6), new GaussianBeam(100e-6), 0.5, true),
                new ExcitationGeometry(new GaussianBeam(80e-6), new GaussianBeam(120e-6), 0, false));
        for (ExcitationGeometry g : cases) {
            GeometryQuadrature q = GeometryQuadrature.of(g);
            for (double n0 : new double[] {0.1, 1, 5}) {
                double fixed = 0;
                double weights = 0;
                for (int k = 0; k < q.size(); k++) {
                    fixed += q.weight(k) * -Math.expm1(-n0 * q.factor(k));
                    weights += q.weight(k);
                }
                double adaptive = g.average(n -> -Math.expm1(-n), n0);
                assertThat(fixed).as(g + " at N0 = " + n0).isCloseTo(adaptive, org.assertj.core.data.Offset.offset(1e-4 * adaptive));
                assertThat(weights).isCloseTo(1, org.assertj.core.data.Offset.offset(1e-9));
            }
            assertThat(q.linearFactor()).isCloseTo(g.linearFactor(), org.assertj.core.data.Offset.offset(1e-4 * g.linearFactor()));
            assertThat(q.size()).as("nodes").isLessThanOrEqualTo(120);
        }
    }

    @Test
    void aPumpThreeTimesTheProbeGivenByPeakFluencesIsFittedWithinThreeStandardErrorsOnlyWithTheGeometry() {
        ExcitationGeometry geometry = new ExcitationGeometry(new GaussianBeam(300e-6), new GaussianBeam(100e-6), 0, false);
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        LadderBleachModel truthModel = LadderBleachModel.forModel(LadderSeries.BASE, "crossSectionM2", j, Double.NaN, null, geometry);
        double[] delays = SyntheticSeries.logDelays(0.5e-12, 2e-9, 60);
        Dataset d = LadderSeries.withFluences(LadderSeries.make(truthModel, List.of("crossSectionM2", "tauAuger2S"),
                new double[] {SIGMA_M2, 40e-12}, delays, 0.01, 0, 2e-5, 11), j);
        LadderFitSetup plain = new LadderFitSetup(LadderSeries.BASE, Double.NaN, Set.of(LadderParameter.SCALE,
                LadderParameter.TAU_AUGER2), 0.8e-19, 0, Double.NaN, false, false);

        ParameterEstimate with = LadderFit.fit(d, plain.withGeometry(geometry), FitProgress.NONE).result().estimate("crossSectionM2");
        assertThat(Math.abs(with.value() - SIGMA_M2)).as("σ = %s ± %s with the geometry", with.value(), with.stdError())
                .isLessThan(3 * with.stdError());

        // the same data read as if the pump were uniform over the probe: the fit has to call σ smaller
        ParameterEstimate without = LadderFit.fit(d, plain, FitProgress.NONE).result().estimate("crossSectionM2");
        assertThat(Math.abs(without.value() - SIGMA_M2)).as("σ = %s ± %s without the geometry", without.value(), without.stdError())
                .isGreaterThan(5 * without.stdError());
        assertThat(without.value()).isLessThan(0.95 * SIGMA_M2);
    }
}
