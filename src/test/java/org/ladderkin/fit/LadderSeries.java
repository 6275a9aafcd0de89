package org.ladderkin.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.RadiativeScaling;

/** Seeded noisy fluence series from the ladder model, for fit tests and the benchmark. */
public final class LadderSeries {

    /** A neutral CdSe-like ladder: τ_rad 20 ns, τ₂ 40 ps, statistical scaling, g = 2. */
    public static final LadderModel BASE = LadderModel.radiativeAndAuger(20e-9, RadiativeScaling.STATISTICAL, 40e-12,
            AugerScaling.STATISTICAL, 2);

    private LadderSeries() {
    }

    /** Photon fluences (photons/m²) giving ⟨N⟩ = σ·J spaced by factors of ~2 from 0.1 upward. */
    public static double[] fluencesPerM2(int traces, double crossSectionM2) {
        double[] j = new double[traces];
        for (int i = 0; i < traces; i++) {
            j[i] = 0.1 * Math.pow(2, i * 5.0 / Math.max(1, traces - 1)) / crossSectionM2;
        }
        return j;
    }

    /** Traces amplitude·shape + baseline + N(0, noise²) with the model evaluated at {@code truth}. */
    public static Dataset make(LadderBleachModel model, List<String> keys, double[] truth, double[] delaysS,
                               double amplitude, double baseline, double noise, long seed) {
        ParameterValues p = ParameterValues.shared(keys, truth);
        SplittableRandom rng = new SplittableRandom(seed);
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < model.traceCount(); i++) {
            double[] y = model.predict(i, delaysS, p);
            for (int m = 0; m < y.length; m++) {
                y[m] = amplitude * y[m] + baseline + noise * SyntheticSeries.gaussian(rng);
            }
            traces.add(Trace.of("trace" + i, delaysS, y));
        }
        return new Dataset(traces, List.of());
    }

    /** The same traces, each recorded at photon fluence {@code fluencesPerM2[i]}. */
    public static Dataset withFluences(Dataset d, double[] fluencesPerM2) {
        List<Trace> traces = new ArrayList<>();
        for (int i = 0; i < d.size(); i++) {
            Trace t = d.traces().get(i);
            Excitation e = new Excitation(Excitation.Kind.PHOTON_FLUENCE_PER_M2, fluencesPerM2[i]);
            traces.add(new Trace(t.delaysS(), t.signal(), null, new TraceMetadata(t.label(), java.util.Optional.of(e),
                    java.util.OptionalDouble.empty()), 0));
        }
        return new Dataset(traces, List.of());
    }
}
