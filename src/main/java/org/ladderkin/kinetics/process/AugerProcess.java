package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.AugerIonisation;
import org.ladderkin.kinetics.rate.AugerRecombination;
import org.ladderkin.kinetics.rate.AugerScaling;
import org.ladderkin.kinetics.rate.ExcitonScaling;

/**
 * Auger recombination ({@link AugerRecombination}): the biexciton lifetime τ₂ and a scaling law give every neutral
 * rate; trion lifetimes give the charged ones (+∞ when the model has no such charge).
 *
 * @param tauAuger2S         biexciton Auger lifetime τ₂ (s)
 * @param scaling            g(N)
 * @param tauTrionNegativeS  negative-trion Auger lifetime (s), +∞ when not given
 * @param tauTrionPositiveS  positive-trion Auger lifetime (s), +∞ when not given
 */
public record AugerProcess(double tauAuger2S, ExcitonScaling scaling, double tauTrionNegativeS, double tauTrionPositiveS)
        implements ProcessSpec {

    public static final ProcessParameter BIEXCITON_LIFETIME = ProcessParameter.lifetime("biexcitonLifetime",
            "Biexciton Auger lifetime τ₂", "--tau-auger2", "biexciton Auger lifetime (flag model)", "ps")
            .fittedAs("tau-auger2", "tauAuger2", 1);
    public static final ProcessParameter SCALING = ProcessParameter.choice("scaling", ParameterKind.SCALING_LAW,
            "Auger scaling", "--auger-scaling", "Auger N-scaling", List.of("statistical", "pairs", "quadratic"),
            "statistical");
    public static final ProcessParameter NEGATIVE_TRION_LIFETIME = ProcessParameter.lifetime("negativeTrionLifetime",
            "Negative-trion Auger lifetime", "--tau-trion-negative", "negative-trion Auger lifetime", "ps").optional();
    public static final ProcessParameter POSITIVE_TRION_LIFETIME = ProcessParameter.lifetime("positiveTrionLifetime",
            "Positive-trion Auger lifetime", "--tau-trion-positive", "positive-trion Auger lifetime", "ps").optional();

    /** The registry entry. */
    public static final ProcessType<AugerProcess> TYPE = ProcessType.of("auger", true,
            List.of(BIEXCITON_LIFETIME, SCALING, NEGATIVE_TRION_LIFETIME, POSITIVE_TRION_LIFETIME),
            in -> new AugerProcess(in.seconds(BIEXCITON_LIFETIME), in.scaling(SCALING, 2, AugerProcess::law),
                    in.seconds(NEGATIVE_TRION_LIFETIME), in.seconds(POSITIVE_TRION_LIFETIME)));

    public AugerProcess {
        Lifetimes.require("biexciton Auger lifetime", tauAuger2S, false);
        Lifetimes.require("negative-trion Auger lifetime", tauTrionNegativeS, true);
        Lifetimes.require("positive-trion Auger lifetime", tauTrionPositiveS, true);
        if (scaling == null) {
            throw new IllegalArgumentException("Auger scaling must be given");
        }
    }

    /** An Auger law by name: statistical, pairs or quadratic. */
    public static AugerScaling law(String key) {
        for (AugerScaling s : AugerScaling.values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("Auger scaling '" + key + "' is not one of: statistical, pairs, quadratic (or a table)");
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.add(new AugerRecombination(1 / tauAuger2S, scaling, Lifetimes.rate(tauTrionNegativeS),
                Lifetimes.rate(tauTrionPositiveS), AugerIonisation.NONE));
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == BIEXCITON_LIFETIME) {
            return tauAuger2S;
        } else if (p == NEGATIVE_TRION_LIFETIME) {
            return tauTrionNegativeS;
        } else if (p == POSITIVE_TRION_LIFETIME) {
            return tauTrionPositiveS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public AugerProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == BIEXCITON_LIFETIME) {
            return new AugerProcess(seconds, scaling, tauTrionNegativeS, tauTrionPositiveS);
        } else if (p == NEGATIVE_TRION_LIFETIME) {
            return new AugerProcess(tauAuger2S, scaling, seconds, tauTrionPositiveS);
        } else if (p == POSITIVE_TRION_LIFETIME) {
            return new AugerProcess(tauAuger2S, scaling, tauTrionNegativeS, seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
