package org.ladderkin.fit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
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
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;
import org.ladderkin.kinetics.state.Charge;

/**
 * Fits that say how far to trust them: a reduced χ² against the data's own noise, errors that carry the fluence
 * calibration, time zero freed when the data can pin it, a loud finding on structured residuals, and a photocharging
 * check that either sees a 10 % charged fraction or says it was not tested.
 */
class FitHonestyTest {

    private static final double SIGMA_M2 = 1e-18;
    private static final double NOISE = 3e-5;
    private static final Set<LadderParameter> FREE = Set.of(LadderParameter.SCALE, LadderParameter.TAU_AUGER2);

    private static Dataset series(LadderModel truth, double periodS, double[] j, double[] delays, List<String> keys,
                                  double[] values, long seed) {
        LadderBleachModel model = LadderBleachModel.forModel(truth, "crossSectionM2", j, periodS);
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < j.length; i++) {
            double[] y = model.predict(i, delays, ParameterValues.shared(keys, values));
            for (int m = 0; m < y.length; m++) {
                y[m] = 0.01 * y[m] + NOISE * SyntheticSeries.gaussian(rng);
            }
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, j[i]);
            traces.add(new Trace(delays, y, null, new TraceMetadata("J" + i, Optional.of(e), OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }

    private static LadderFitSetup setup(LadderModel base, double periodS, Set<LadderParameter> free, double scaleStart) {
        return new LadderFitSetup(base, periodS, free, scaleStart, 0, Double.NaN, false, false);
    }

    @Test
    void reducedChiSquareIsMeasuredAgainstThePointToPointScatterAndNearOneForAGoodFit() {
        double[] j = LadderSeries.fluencesPerM2(5, SIGMA_M2);
        Dataset d = series(LadderSeries.BASE, Double.NaN, j, SyntheticSeries.logDelays(0.3e-12, 2e-9, 80),
                List.of("crossSectionM2"), new double[] {SIGMA_M2}, 4);
        LadderFit.Outcome o = LadderFit.fit(d, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(o.quality().reducedChiSquare()).as(o.quality().describe()).isBetween(0.8, 1.25);
        for (double s : o.quality().noisePerTrace()) {
            assertThat(s).isBetween(0.6 * NOISE, 1.5 * NOISE);
        }
        assertThat(o.quality().structured()).isFalse();
        // the old figure, an unweighted mean square in OD², is what the noise estimate replaces
        assertThat(o.result().reducedChiSquare()).isLessThan(1e-8);
    }

    @Test
    void theFluenceCalibrationAddsToTheErrorOfAFreeSigmaAndReachesTauThroughAHeldOne() {
        double[] j = LadderSeries.fluencesPerM2(5, SIGMA_M2);
        Dataset d = series(LadderSeries.BASE, Double.NaN, j, SyntheticSeries.logDelays(0.3e-12, 2e-9, 60),
                List.of("crossSectionM2"), new double[] {SIGMA_M2}, 5);
        LadderFit.Outcome free = LadderFit.fit(d, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN)
                .withFluenceScaleUncertainty(0.08), FitProgress.NONE);
        ParameterEstimate s = free.result().estimate("crossSectionM2");
        assertThat(free.totalStdError("crossSectionM2").orElseThrow())
                .isCloseTo(Math.hypot(s.stdError(), 0.08 * s.value()), org.assertj.core.data.Percentage.withPercentage(1e-6));
        ParameterEstimate tau = free.result().estimate("tauAuger2S");
        assertThat(free.totalStdError("tauAuger2S").orElseThrow()).isEqualTo(tau.stdError());

        // σ held at its given value: a fluence 8 % off moves ⟨N⟩, which only τ₂ can answer
        LadderFit.Outcome held = LadderFit.fit(d, setup(LadderSeries.BASE, Double.NaN, Set.of(LadderParameter.TAU_AUGER2), SIGMA_M2)
                .withFluenceScaleUncertainty(0.08), FitProgress.NONE);
        ParameterEstimate heldTau = held.result().estimate("tauAuger2S");
        double total = held.totalStdError("tauAuger2S").orElseThrow();
        assertThat(total).as("τ₂ %s: stat %s, total %s", heldTau.value(), heldTau.stdError(), total)
                .isGreaterThan(2 * heldTau.stdError());
        assertThat(held.totalStdError("crossSectionM2")).isEmpty();
    }

    @Test
    void aShiftedTimeZeroIsFreedByDefaultAndHeldItRaisesALoudFindingThatNamesIt() {
        double[] j = LadderSeries.fluencesPerM2(5, SIGMA_M2);
        double[] delays = SyntheticSeries.logDelays(0.05e-12, 1e-9, 70);
        double[] early = new double[20];
        for (int m = 0; m < early.length; m++) {
            early[m] = -2e-12 + m * 0.1e-12;
        }
        double[] all = java.util.stream.DoubleStream.concat(Arrays.stream(early), Arrays.stream(delays)).sorted().distinct().toArray();
        Dataset d = series(LadderSeries.BASE, Double.NaN, j, all, List.of("crossSectionM2", "tauAuger2S", "timeZeroS", "irfFwhmS"),
                new double[] {SIGMA_M2, 14e-12, 0.35e-12, 0.15e-12}, 6);
        LadderModel base = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 40e-12, AugerScaling.STATISTICAL, 2);

        LadderFitSetup defaults = setup(base, Double.NaN, FREE, Double.NaN).withTimeZeroFreedFor(d);
        assertThat(defaults.free()).contains(LadderParameter.TIME_ZERO, LadderParameter.IRF);
        LadderFit.Outcome held = LadderFit.fit(d, setup(base, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(held.diagnostics()).as("held: %s", held.quality().describe()).anySatisfy(m -> assertThat(m)
                .startsWith("RESIDUAL STRUCTURE").contains("runs-test z = ").contains("time zero").contains("free time-zero"));
        LadderFit.Outcome freed = LadderFit.fit(d, defaults, FitProgress.NONE);
        ParameterEstimate tHeld = held.result().estimate("tauAuger2S");
        ParameterEstimate tFreed = freed.result().estimate("tauAuger2S");
        assertThat(Math.abs(tHeld.value() - 14e-12)).as("τ₂ held at t0 = 0 without IRF").isGreaterThan(0.3 * 14e-12);
        assertThat(Math.abs(tFreed.value() - 14e-12)).as("τ₂ freed").isLessThan(3 * tFreed.stdError());
        assertThat(Math.abs(freed.result().estimate("crossSectionM2").value() - SIGMA_M2))
                .isLessThan(3 * freed.result().estimate("crossSectionM2").stdError());
        assertThat(freed.diagnostics()).noneSatisfy(m -> assertThat(m).startsWith("RESIDUAL STRUCTURE"));
        // data that start after zero cannot pin time zero: the set-up is left as given
        Dataset late = series(LadderSeries.BASE, Double.NaN, j, delays, List.of("crossSectionM2"), new double[] {SIGMA_M2}, 9);
        assertThat(setup(base, Double.NaN, FREE, Double.NaN).withTimeZeroFreedFor(late).free()).isEqualTo(FREE);
    }

    private static LadderModel charging(double ionisation) {
        return new LadderModel(List.of(new RadiativeProcess(20e-9, RadiativeScaling.STATISTICAL, 2),
                new AugerProcess(40e-12, AugerScaling.STATISTICAL, 80e-12, Double.POSITIVE_INFINITY),
                new ChargingProcess(Set.of(Charge.NEGATIVE), new AugerIonisation(ionisation, Charge.NEGATIVE), 1.0)), 2, 0);
    }

    /**
     * Pump-on minus pump-off bleach of a sample in which a fraction {@code charged} of the dots carry an extra electron
     * before every pulse (long-lived: the pump-off shot sees them too), on fresh dots otherwise.
     */
    private static Dataset chargedSeries(double charged, double[] j, double[] delays, long seed) {
        LadderModel model = charging(1e-9);
        org.ladderkin.kinetics.LadderKinetics k = org.ladderkin.kinetics.LadderKinetics.forPulses(model.toModel(),
                new org.ladderkin.kinetics.train.PulseExcitation.Poisson(1.5 * SIGMA_M2 * j[j.length - 1]));
        double[] start = new double[k.space().size()];
        start[k.space().ground()] = 1 - charged;
        start[k.space().index(Charge.NEGATIVE, 0, 0)] = charged;
        org.ladderkin.kinetics.Populations before = new org.ladderkin.kinetics.Populations(k.space(), start);
        double offset = before.expectation(k.bleachObservable());
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < j.length; i++) {
            int first = 0;
            while (delays[first] < 0) {
                first++;
            }
            double[] b = k.trace(k.applyPulse(before, new org.ladderkin.kinetics.train.PulseExcitation.Poisson(SIGMA_M2 * j[i])),
                    Arrays.copyOfRange(delays, first, delays.length)).bleach();
            double[] y = new double[delays.length];
            for (int m = 0; m < y.length; m++) {
                // before the pulse the pump-on and pump-off shots see the same dots
                y[m] = (m < first ? 0 : -0.01 * (b[m - first] - offset)) + NOISE * SyntheticSeries.gaussian(rng);
            }
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, j[i]);
            traces.add(new Trace(delays, y, null, new TraceMetadata("J" + i, Optional.of(e), OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }

    private static double[] withPreZero(double[] delays) {
        double[] pre = {-3e-12, -2.5e-12, -2e-12, -1.5e-12, -1e-12};
        return java.util.stream.DoubleStream.concat(Arrays.stream(pre), Arrays.stream(delays)).toArray();
    }

    @Test
    void aTenPercentChargedFractionIsSeenInTheDataAndShortDelaysSayNotTested() {
        double[] j = LadderSeries.fluencesPerM2(6, SIGMA_M2);
        double[] delays = withPreZero(SyntheticSeries.logDelays(0.3e-12, 2e-9, 80));
        Dataset d = chargedSeries(0.1, j, delays, 7);
        LadderFit.Outcome o = LadderFit.fit(d, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(o.diagnostics()).anySatisfy(s -> assertThat(s).startsWith("photocharging").contains("charged before each pulse"));

        // the same sample, clean: the test runs and says so
        Dataset clean = chargedSeries(0, j, delays, 7);
        LadderFit.Outcome c = LadderFit.fit(clean, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(c.checks()).anySatisfy(s -> assertThat(s).startsWith("photocharging: tested, none seen"));

        Dataset shortDelays = chargedSeries(0.1, j, withPreZero(SyntheticSeries.logDelays(0.3e-12, 150e-12, 60)), 8);
        LadderFit.Outcome s = LadderFit.fit(shortDelays, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(s.checks()).anySatisfy(t -> assertThat(t).startsWith("photocharging: not tested (").contains("extend the delays"));
        assertThat(s.diagnostics()).noneSatisfy(t -> assertThat(t).contains("photocharging"));

        // without points before zero the free baselines can hide the trions: the check says it could not look
        Dataset noPreZero = chargedSeries(0.1, j, SyntheticSeries.logDelays(0.3e-12, 2e-9, 80), 9);
        LadderFit.Outcome n = LadderFit.fit(noPreZero, setup(LadderSeries.BASE, Double.NaN, FREE, Double.NaN), FitProgress.NONE);
        assertThat(n.checks()).anySatisfy(t -> assertThat(t).startsWith("photocharging: not tested (").contains("before time zero"));
    }
}
