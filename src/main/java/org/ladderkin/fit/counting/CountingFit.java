package org.ladderkin.fit.counting;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.ladderkin.fit.Dataset;
import org.ladderkin.fit.Excitation;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.fit.Trace;
import org.ladderkin.kinetics.process.LadderModel;

/**
 * Ladder fits of photon-counting histograms by Poisson likelihood, alone or jointly with transient-absorption traces
 * of the same sample: σ and the lifetimes are shared, each histogram has its own amplitude and background, each TA
 * trace its own amplitude and baseline and Gaussian noise. Every data set's excitation is a photon fluence, so σ is
 * the one scale.
 */
public final class CountingFit {

    /** The scale's key: σ in m². */
    public static final String SCALE = "crossSectionM2";
    /** Fine grid points per bin. */
    private static final int OVERSAMPLE = 4;

    /**
     * How to fit.
     *
     * @param base           the ladder; its lifetimes are the starts
     * @param scaleStartM2   start of σ (m²)
     * @param scaleFree      fit σ
     * @param freeLifetimes  fit names of the lifetimes fitted ("tau-auger2", "tau-rad", …)
     * @param periodS        pulse period (s), or NaN for pulses far apart
     * @param response       the counting instrument's response
     * @param irfFwhmS       the Gaussian response's FWHM (start when fitted; ignored for a measured response)
     * @param irfFree        fit the Gaussian width
     * @param pileUp         the dead-time correction, or null
     * @param profile        shared keys to give profile-likelihood intervals
     */
    public record Setup(LadderModel base, double scaleStartM2, boolean scaleFree, Set<String> freeLifetimes, double periodS,
                        InstrumentResponse response, double irfFwhmS, boolean irfFree, PileUp pileUp, List<String> profile) {

        public Setup {
            Objects.requireNonNull(base, "base");
            Objects.requireNonNull(response, "response");
            freeLifetimes = Set.copyOf(freeLifetimes);
            profile = List.copyOf(profile);
            if (!(scaleStartM2 > 0) || !Double.isFinite(scaleStartM2)) {
                throw new IllegalArgumentException("σ start must be finite and > 0, was " + scaleStartM2 + " m²");
            }
            if (!response.isMeasured() && !(irfFwhmS > 0 && Double.isFinite(irfFwhmS))) {
                throw new IllegalArgumentException("a Gaussian counting IRF needs its FWHM (> 0), was " + irfFwhmS + " s");
            }
        }
    }

    private CountingFit() {
    }

    /**
     * Fits {@code histograms} (each with a photon fluence) and, when {@code ta} is not null, its traces (each with a
     * photon-fluence excitation) in one likelihood.
     */
    public static LikelihoodResult fit(List<CountHistogram> histograms, Dataset ta, Setup setup) {
        List<ParameterSpec> shared = new ArrayList<>(LadderEmission.ladderParameters(setup.base(), SCALE, setup.scaleStartM2(),
                setup.scaleFree(), setup.freeLifetimes()));
        List<LikelihoodPart> parts = new ArrayList<>();
        if (!histograms.isEmpty()) {
            double[] x = new double[histograms.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = histograms.get(i).excitation();
                if (Double.isNaN(x[i])) {
                    throw new IllegalArgumentException("histogram '" + histograms.get(i).label() + "' has no photon fluence "
                            + "(give --fluences or a sidecar)");
                }
            }
            if (!setup.response().isMeasured()) {
                ParameterSpec w = ParameterSpec.positive("countIrfFwhm", "S", setup.irfFwhmS());
                shared.add(setup.irfFree() ? w : w.fixedAt(setup.irfFwhmS()));
            }
            CountHistogram first = histograms.get(0);
            double shiftStart = setup.response().isMeasured() ? 0 : HistogramPart.risingEdgeS(first);
            shared.add(ParameterSpec.unbounded("shift", "S", shiftStart, first.binWidthS()));
            LadderEmission law = new LadderEmission(setup.base(), SCALE, x, List.of());
            List<String> keys = shared.stream().map(ParameterSpec::key).toList();
            ParameterValues start = ParameterValues.shared(keys, shared.stream().mapToDouble(ParameterSpec::start).toArray());
            for (int i = 0; i < x.length; i++) {
                CountHistogram h = histograms.get(i);
                CountModel m = new CountModel(i, h, OVERSAMPLE, law, setup.response(), setup.periodS(), setup.pileUp());
                double peak = 0;
                for (double v : law.emission(i, new double[] {0}, setup.periodS(), start)) {
                    peak = Math.max(peak, v);
                }
                parts.add(new HistogramPart(h, m, Double.NaN, HistogramPart.amplitudeFor(h, peak > 0 ? peak : 1)));
            }
        }
        if (ta != null) {
            double[] x = new double[ta.size()];
            for (int i = 0; i < x.length; i++) {
                Trace t = ta.traces().get(i);
                Excitation e = t.metadata().excitation().orElseThrow(() -> new IllegalArgumentException("TA trace '" + t.label()
                        + "' has no excitation"));
                if (e.kind() != Excitation.Kind.PHOTON_FLUENCE_PER_M2) {
                    throw new IllegalArgumentException("TA trace '" + t.label() + "' must give a photon fluence to share σ with "
                            + "the histograms");
                }
                x[i] = e.value();
            }
            LadderBleachModel model = LadderBleachModel.forModel(setup.base(), SCALE, x, setup.periodS());
            for (int i = 0; i < x.length; i++) {
                parts.add(new GaussianTracePart(ta.traces().get(i), i, model, true));
            }
        }
        return LikelihoodFitter.fit(shared, parts, setup.profile());
    }
}
