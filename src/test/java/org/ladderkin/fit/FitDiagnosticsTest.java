package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.LadderFitSetup.LadderParameter;
import org.ladderkin.kinetics.process.AugerProcess;
import org.ladderkin.kinetics.process.ChargingProcess;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.RadiativeProcess;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.state.Charge;

/** The ladder fit's diagnostics: quiet on clean data, a flag for each sample or set-up problem it is meant to catch. */
class FitDiagnosticsTest {

    private static final double SIGMA_M2 = 1e-18;
    private static final double[] DELAYS = SyntheticSeries.logDelays(0.3e-12, 2e-9, 80);
    private static final Set<LadderParameter> FREE = Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2);

    /** Traces made by averaging the bleach over ⟨N⟩ = f·σ·J for each weight/factor pair, with noise. */
    private static Dataset series(LadderModel truth, double periodS, double[] j, double[][] spread, long seed) {
        LadderBleachModel model = LadderBleachModel.forModel(truth, "crossSectionM2", j, periodS);
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < j.length; i++) {
            double[] y = new double[DELAYS.length];
            for (double[] wf : spread) {
                double[] part = model.predict(i, DELAYS, ParameterValues.shared(List.of("crossSectionM2"), new double[] {SIGMA_M2 * wf[1]}));
                for (int m = 0; m < y.length; m++) {
                    y[m] += wf[0] * 0.01 * part[m];
                }
            }
            for (int m = 0; m < y.length; m++) {
                y[m] += 3e-5 * SyntheticSeries.gaussian(rng);
            }
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, j[i]);
            traces.add(new Trace(DELAYS, y, null, new TraceMetadata("J" + i, Optional.of(e), OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }

    private static LadderFit.Outcome fit(Dataset d, double periodS) {
        LadderFit.Outcome o = LadderFit.fit(d, new LadderFitSetup(LadderSeries.BASE, periodS, FREE, Double.NaN, 0, Double.NaN,
                false, false), FitProgress.NONE);
        assertThat(o.result().ok()).as(o.result().message()).isTrue();
        return o;
    }

    @Test
    void cleanSeriesRaisesNoFlag() {
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        LadderFit.Outcome o = fit(series(LadderSeries.BASE, Double.NaN, j, new double[][] {{1, 1}}, 1), Double.NaN);
        assertThat(o.diagnostics()).isEmpty();
        assertThat(o.result().estimate("tauAuger2S").value()).isCloseTo(40e-12, org.assertj.core.data.Percentage.withPercentage(5));
    }

    @Test
    void aModelThatHoldsDotsChargedAtLowFluenceIsFlaggedWithWhatToChange() {
        LadderModel charging = charging(0.02);
        double[] j = LadderSeries.fluencesPerM2(4, SIGMA_M2);
        Dataset d = series(charging, 1e-4, j, new double[][] {{1, 1}}, 2);
        LadderFit.Outcome o = LadderFit.fit(d, new LadderFitSetup(charging, 1e-4, FREE, Double.NaN, 0, Double.NaN, false, false),
                FitProgress.NONE);
        assertThat(o.result().ok()).as(o.result().message()).isTrue();
        assertThat(o.diagnostics()).anySatisfy(m -> assertThat(m).contains("photocharging").contains("charged").contains("stir"));
    }

    private static LadderModel charging(double ionisation) {
        return new LadderModel(List.of(new RadiativeProcess(20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerProcess(40e-12, AugerScaling.STATISTICAL, 80e-12, Double.POSITIVE_INFINITY),
                new ChargingProcess(Set.of(Charge.NEGATIVE), new AugerIonisation(ionisation, Charge.NEGATIVE), 1.0)), 2, 0);
    }

    @Test
    void photochargedDotsFittedWithANeutralLadderAreFlaggedWithWhatToChange() {
        // Auger ionisation leaves long-lived negative dots; at 10 kHz without stirring they pile up even at low ⟨N⟩
        LadderModel charging = charging(0.2);
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        Dataset d = series(charging, 1e-4, j, new double[][] {{1, 1}}, 2);
        // σ given as measured from the absorption spectrum: the neutral fit has to inflate it to mimic the trions
        LadderFit.Outcome o = LadderFit.fit(d, new LadderFitSetup(LadderSeries.BASE, 1e-4, FREE, SIGMA_M2, 0, Double.NaN,
                false, false), FitProgress.NONE);
        assertThat(o.result().ok()).as(o.result().message()).isTrue();
        assertThat(o.diagnostics()).anySatisfy(m -> assertThat(m).contains("times the value given").contains("photocharged")
                .contains("stir"));
    }

    @Test
    void nonUniformExcitationBendsTheSaturationCurveAndIsFlagged() {
        // half the probed dots see 0.2×, half 1.8× the mean fluence: an optically thick sample or a pump spot close to the probe's
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        for (int i = 0; i < j.length; i++) {
            j[i] *= 3; // up to ⟨N⟩ ≈ 10, where Poisson filling is flat
        }
        LadderFit.Outcome o = fit(series(LadderSeries.BASE, Double.NaN, j, new double[][] {{0.5, 0.2}, {0.5, 1.8}}, 3), Double.NaN);
        assertThat(o.diagnostics()).anySatisfy(d -> assertThat(d).contains("saturation curve").contains("optically thick"));
    }
}
