package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.Cooling;

/**
 * Intraband cooling ({@link Cooling}); switching it on makes the ladder resolve hot excitons.
 *
 * @param tauCoolS cooling time per hot exciton (s)
 */
public record CoolingProcess(double tauCoolS) implements ProcessSpec {

    public static final ProcessParameter LIFETIME = ProcessParameter.lifetime("lifetime", "Cooling time per hot exciton",
            "--tau-cool", "intraband cooling time per hot exciton (off when omitted)", "ps");

    /** The registry entry. */
    public static final ProcessType<CoolingProcess> TYPE = ProcessType.of("cooling", false,
            List.of(LIFETIME),
            in -> new CoolingProcess(in.seconds(LIFETIME)));

    public CoolingProcess {
        Lifetimes.require("cooling time", tauCoolS, false);
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.add(new Cooling(1 / tauCoolS));
        ladder.resolveHotExcitons();
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == LIFETIME) {
            return tauCoolS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public CoolingProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == LIFETIME) {
            return new CoolingProcess(seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
