package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.AugerRecombination;

/**
 * A measured triexciton Auger lifetime τ₃ that replaces the scaling law's τ₂/g(3) for neutral dots with three
 * excitons (the scaling laws disagree most there, and τ₃ can be measured on its own from the early decay of high-⟨N⟩
 * traces). Charged dots keep their trion-based rates.
 *
 * @param tauAuger3S triexciton Auger lifetime τ₃ (s)
 */
public record TriexcitonAugerProcess(double tauAuger3S) implements ProcessSpec {

    public static final ProcessParameter LIFETIME = ProcessParameter.lifetime("lifetime", "Triexciton Auger lifetime τ₃",
            "--tau-auger3", "measured triexciton Auger lifetime; without it, the Auger scaling law gives it from τ₂", "ps")
            .fittedAs("tau-auger3", "tauAuger3", 4).inPlanAs("triexcitonLifetime");

    /** The registry entry. */
    public static final ProcessType<TriexcitonAugerProcess> TYPE = ProcessType.of("triexcitonAuger", false,
            List.of(LIFETIME),
            in -> new TriexcitonAugerProcess(in.seconds(LIFETIME)),
            model -> {
                AugerProcess auger = model.find(AugerProcess.TYPE).orElseThrow();
                return new TriexcitonAugerProcess(auger.tauAuger2S() / auger.scaling().factor(3));
            });

    public TriexcitonAugerProcess {
        Lifetimes.require("triexciton Auger lifetime", tauAuger3S, false);
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.change(AugerRecombination.class, a -> a.withNeutralRate(3, 1 / tauAuger3S), "the triexciton Auger lifetime");
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == LIFETIME) {
            return tauAuger3S;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public TriexcitonAugerProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == LIFETIME) {
            return new TriexcitonAugerProcess(seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
