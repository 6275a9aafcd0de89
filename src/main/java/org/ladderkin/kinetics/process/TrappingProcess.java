package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.Trapping;

/**
 * Non-radiative trapping ({@link Trapping}).
 *
 * @param tauTrapS trapping lifetime per exciton (s)
 */
public record TrappingProcess(double tauTrapS) implements ProcessSpec {

    /** Start of a freed trapping lifetime when the model has none (s): between typical τ₂ and τ_rad. */
    public static final double START_WHEN_FREED_S = 1e-9;

    public static final ProcessParameter LIFETIME = ProcessParameter.lifetime("lifetimePerExciton",
            "Trapping lifetime per exciton", "--tau-trap", "trapping lifetime per exciton (off when omitted)", "ps")
            .fittedAs("tau-trap", "tauTrap", 3);

    /** The registry entry. */
    public static final ProcessType<TrappingProcess> TYPE = ProcessType.of("trapping", false,
            List.of(LIFETIME),
            in -> new TrappingProcess(in.seconds(LIFETIME)),
            model -> new TrappingProcess(START_WHEN_FREED_S));

    public TrappingProcess {
        Lifetimes.require("trapping lifetime", tauTrapS, false);
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.add(new Trapping(1 / tauTrapS));
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == LIFETIME) {
            return tauTrapS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public TrappingProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == LIFETIME) {
            return new TrappingProcess(seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
