package org.ladderkin.fit.counting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ladderkin.fit.LadderBleachModel;
import org.ladderkin.fit.ParameterSpec;
import org.ladderkin.fit.ParameterValues;
import org.ladderkin.kinetics.LadderKinetics;
import org.ladderkin.kinetics.Populations;
import org.ladderkin.kinetics.process.LadderModel;
import org.ladderkin.kinetics.process.ProcessParameter;
import org.ladderkin.kinetics.process.ProcessRegistry;
import org.ladderkin.kinetics.train.PulseExcitation;

/**
 * Emission per dot from the exciton ladder: Σ_s k_rad(s)·P_s(t) with each state's radiative rate from the ladder's
 * radiative law, after a Poisson pulse of ⟨N⟩ = s·x (x the histogram's excitation, s the shared scale: σ for photon
 * fluences). Under a pulse train the populations start from the train's periodic steady state, so what earlier pulses
 * left behind (long lifetimes at high repetition rates) is in the emission exactly. The fittable lifetimes are read
 * under the keys {@link LadderBleachModel#kineticKey} uses, so a joint fit with transient absorption shares them.
 */
public final class LadderEmission implements DecayLaw {

    private final LadderModel base;
    private final String scaleKey;
    private final double[] excitation;
    private final List<ParameterSpec> parameters;
    private double[] cachedKinetic;
    private double cachedTopN;
    private LadderKinetics cached;

    /**
     * @param base       the ladder; its fittable lifetimes are the starts
     * @param scaleKey   the scale's key ("crossSectionM2" for photon fluences)
     * @param excitation each histogram's excitation (SI, &gt; 0)
     * @param parameters the shared parameters the law reads (scale and lifetimes), free or held
     */
    public LadderEmission(LadderModel base, String scaleKey, double[] excitation, List<ParameterSpec> parameters) {
        this.base = base;
        this.scaleKey = scaleKey;
        this.excitation = excitation.clone();
        for (double x : excitation) {
            if (!(x > 0) || !Double.isFinite(x)) {
                throw new IllegalArgumentException("every histogram needs an excitation (finite and > 0), was " + x);
            }
        }
        this.parameters = List.copyOf(parameters);
    }

    @Override
    public List<ParameterSpec> parameters() {
        return parameters;
    }

    /** ⟨N⟩ of histogram {@code h} at {@code p}. */
    public double meanOccupancy(int h, ParameterValues p) {
        return p.get(scaleKey) * excitation[h];
    }

    @Override
    public synchronized double[] emission(int histogram, double[] sinceLastPulseS, double periodS, ParameterValues p) {
        LadderKinetics k = kinetics(p);
        PulseExcitation pulse = new PulseExcitation.Poisson(meanOccupancy(histogram, p));
        Populations after = Double.isNaN(periodS) ? k.applyPulse(Populations.ground(k.space()), pulse)
                : k.steadyState(pulse, periodS, false).afterPulse();
        double[] sorted = Arrays.stream(sinceLastPulseS).filter(t -> t >= 0).sorted().distinct().toArray();
        double[] out = new double[sinceLastPulseS.length];
        if (sorted.length == 0) {
            return out;
        }
        double[] pl = k.propagator().onGrid(sorted).observe(new double[][] {k.photoluminescenceObservable()},
                after.probabilities())[0];
        for (int i = 0; i < out.length; i++) {
            double t = sinceLastPulseS[i];
            out[i] = t < 0 ? 0 : Math.max(0, pl[Arrays.binarySearch(sorted, t)]);
        }
        return out;
    }

    private LadderKinetics kinetics(ParameterValues p) {
        List<ProcessParameter> fittable = ProcessRegistry.fittable();
        double[] kin = new double[fittable.size()];
        LadderModel m = base;
        for (int i = 0; i < kin.length; i++) {
            ProcessParameter pp = fittable.get(i);
            int idx = p.indexOf(LadderBleachModel.kineticKey(pp));
            kin[i] = idx < 0 ? Double.NaN : p.value(idx, 0);
            if (idx >= 0) {
                if (!m.has(pp)) {
                    m = m.with(ProcessRegistry.owner(pp).startWhenFreed(m));
                }
                m = m.withSeconds(pp, kin[i]);
            }
        }
        double topN = 0;
        for (double x : excitation) {
            topN = Math.max(topN, x * p.get(scaleKey));
        }
        if (cached == null || !Arrays.equals(kin, cachedKinetic) || topN > cachedTopN) {
            double headroom = topN * 1.5;
            cached = LadderKinetics.forPulses(m.toModel(), new PulseExcitation.Poisson(headroom));
            cachedKinetic = kin;
            cachedTopN = headroom;
        }
        return cached;
    }

    /** The shared parameters of a ladder fit: the scale and every fittable lifetime the model has or frees. */
    public static List<ParameterSpec> ladderParameters(LadderModel base, String scaleKey, double scaleStart, boolean scaleFree,
                                                       java.util.Set<String> freeLifetimes) {
        List<ParameterSpec> specs = new ArrayList<>();
        ParameterSpec scale = scaleKey.endsWith("M2")
                ? ParameterSpec.positive(scaleKey.substring(0, scaleKey.length() - 2), "M2", scaleStart)
                : ParameterSpec.positive(scaleKey, "", scaleStart);
        specs.add(scaleFree ? scale : scale.fixedAt(scaleStart));
        for (ProcessParameter p : ProcessRegistry.fittable()) {
            boolean free = freeLifetimes.contains(p.fitName());
            if (base.has(p) || free) {
                double start = base.has(p) ? base.seconds(p) : ProcessRegistry.owner(p).startWhenFreed(base).seconds(p);
                ParameterSpec s = ParameterSpec.positive(p.fitKey(), "S", start);
                specs.add(free ? s : s.fixedAt(start));
            }
        }
        return specs;
    }
}
