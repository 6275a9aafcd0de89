package org.ladderkin.kinetics.process;

import java.util.List;
import org.ladderkin.kinetics.rate.SampleRefresh;

/**
 * Sample exchange by stirring or flow ({@link SampleRefresh}).
 *
 * @param exchangeS time in which the probed volume is replaced (s)
 */
public record RefreshProcess(double exchangeS) implements ProcessSpec {

    public static final ProcessParameter EXCHANGE_TIME = ProcessParameter.lifetime("exchangeTime", "Sample exchange time",
            "--tau-refresh", "sample exchange time by stirring or flow", "ms");

    /** The registry entry. */
    public static final ProcessType<RefreshProcess> TYPE = ProcessType.of("refresh", false,
            List.of(EXCHANGE_TIME),
            in -> new RefreshProcess(in.seconds(EXCHANGE_TIME)));

    public RefreshProcess {
        Lifetimes.require("sample exchange time", exchangeS, false);
    }

    @Override
    public ProcessType<?> type() {
        return TYPE;
    }

    @Override
    public void addTo(LadderBuilder ladder) {
        ladder.add(new SampleRefresh(1 / exchangeS));
    }

    @Override
    public double seconds(ProcessParameter p) {
        if (p == EXCHANGE_TIME) {
            return exchangeS;
        }
        throw ProcessSpec.notMine(this, p);
    }

    @Override
    public RefreshProcess withSeconds(ProcessParameter p, double seconds) {
        if (p == EXCHANGE_TIME) {
            return new RefreshProcess(seconds);
        }
        throw ProcessSpec.notMine(this, p);
    }
}
