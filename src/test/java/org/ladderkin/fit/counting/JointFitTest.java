package org.ladderkin.fit.counting;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.Trace;
import org.ladderkin.fit.TraceMetadata;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;

/**
 * A joint TA + TCSPC fit of one simulated sample (σ = 5·10⁻¹⁵ cm², τ_rad = 20 ns, τ₂ = 200 ps; three fluences, ⟨N⟩
 * 0.3, 1 and 3): both data sets alone and together recover the truth, and together with smaller errors than either
 * alone, because the information of independent data sets adds.
 */
public class JointFitTest {

    static final double SIGMA_M2 = 5e-19;
    static final double TAU_RAD_S = 20e-9;
    static final double TAU2_S = 200e-12;
    static final LadderModel TRUTH = LadderModel.radiativeAndAuger(TAU_RAD_S, RadiativeScaling.STATISTICAL, TAU2_S,
            AugerScaling.STATISTICAL, 2);
    static final double[] FLUENCES = {0.3 / SIGMA_M2, 1 / SIGMA_M2, 3 / SIGMA_M2};
    static final double BIN_S = 100e-12;
    static final double FWHM_S = 80e-12;

    public static List<CountHistogram> histograms(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        LadderEmission law = new LadderEmission(TRUTH, CountingFit.SCALE, FLUENCES, List.of());
        ParameterValues p = ParameterValues.shared(List.of(CountingFit.SCALE, "tauRadS", "tauAuger2S", InstrumentResponse.FWHM,
                "shiftS", "amplitude", "background"), new double[] {SIGMA_M2, TAU_RAD_S, TAU2_S, FWHM_S, 0.52e-9, 1, 2});
        List<CountHistogram> out = new ArrayList<>();
        for (int i = 0; i < FLUENCES.length; i++) {
            CountHistogram geometry = CountHistogram.of("pl" + i, 0, BIN_S, new double[400]);
            CountModel m = new CountModel(i, geometry, 4, law, InstrumentResponse.gaussian(), Double.NaN, null);
            double[] shape = m.shape(p);
            double max = 0;
            for (double s : shape) {
                max = Math.max(max, s);
            }
            double[] mean = new double[shape.length];
            for (int b = 0; b < mean.length; b++) {
                mean[b] = 300 * shape[b] / max + 2;
            }
            out.add(CountHistogram.of("pl" + i, 0, BIN_S, SimulatedHistograms.poisson(mean, rng)).withExcitation(FLUENCES[i]));
        }
        return out;
    }

    public static Dataset ta(long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        double[] delays = new double[60];
        for (int m = 0; m < delays.length; m++) {
            delays[m] = 1e-12 * Math.pow(10, 3.3 * m / (delays.length - 1));
        }
        LadderBleachModel model = LadderBleachModel.forModel(TRUTH, CountingFit.SCALE, FLUENCES, Double.NaN);
        ParameterValues p = ParameterValues.shared(List.of(CountingFit.SCALE, "tauRadS", "tauAuger2S"),
                new double[] {SIGMA_M2, TAU_RAD_S, TAU2_S});
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < FLUENCES.length; i++) {
            double[] y = model.predict(i, delays, p);
            double[] sigma = new double[y.length];
            for (int m = 0; m < y.length; m++) {
                sigma[m] = 0.01;
                y[m] = 0.5 * y[m] + sigma[m] * gaussian(rng);
            }
            traces.add(new Trace(delays, y, sigma, new TraceMetadata("ta" + i,
                    Optional.of(new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, FLUENCES[i])), OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }

    private static double gaussian(SplittableRandom rng) {
        return Math.sqrt(-2 * Math.log(1 - rng.nextDouble())) * Math.cos(2 * Math.PI * rng.nextDouble());
    }

    public static CountingFit.Setup setup() {
        LadderModel start = TRUTH.withSeconds(org.ladderkin.kinetics.process.RadiativeProcess.LIFETIME, 15e-9)
                .withSeconds(org.ladderkin.kinetics.process.AugerProcess.BIEXCITON_LIFETIME, 150e-12);
        return new CountingFit.Setup(start, 0.7 * SIGMA_M2, true, Set.of("tau-rad", "tau-auger2"), Double.NaN,
                InstrumentResponse.gaussian(), FWHM_S, false, null, List.of());
    }

    @Test
    void jointFitHasSmallerErrorsThanEitherDataSetAlone() {
        List<CountHistogram> pl = histograms(3);
        Dataset ta = ta(4);
        LikelihoodResult counts = CountingFit.fit(pl, null, setup());
        LikelihoodResult absorption = CountingFit.fit(List.of(), ta, setup());
        LikelihoodResult joint = CountingFit.fit(pl, ta, setup());
        for (LikelihoodResult r : List.of(counts, absorption, joint)) {
            assertThat(r.status()).as(r.message()).isEqualTo(LikelihoodResult.Status.CONVERGED);
        }
        String[] keys = {CountingFit.SCALE, "tauRadS", "tauAuger2S"};
        double[] truth = {SIGMA_M2, TAU_RAD_S, TAU2_S};
        for (int k = 0; k < keys.length; k++) {
            double se = joint.estimate(keys[k]).stdError();
            System.out.printf("%s: TCSPC %.4g ± %.2g, TA %.4g ± %.2g, joint %.4g ± %.2g%n", keys[k],
                    counts.estimate(keys[k]).value(), counts.estimate(keys[k]).stdError(),
                    absorption.estimate(keys[k]).value(), absorption.estimate(keys[k]).stdError(),
                    joint.estimate(keys[k]).value(), se);
            assertThat(se).as(keys[k] + " joint vs TCSPC alone").isLessThan(counts.estimate(keys[k]).stdError());
            assertThat(se).as(keys[k] + " joint vs TA alone").isLessThan(absorption.estimate(keys[k]).stdError());
            assertThat(Math.abs(joint.estimate(keys[k]).value() - truth[k])).as(keys[k] + " within 3 SE").isLessThan(3 * se);
        }
        assertThat(joint.poissonDeviance()).isPositive();
        assertThat(joint.chiSquare()).isPositive();
        assertThat(joint.degreesOfFreedom()).isEqualTo(3 * 400 + 3 * 60 - joint.freeParameters());
    }
}
