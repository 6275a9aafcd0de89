package org.ladderkin.plan;

import java.util.List;
import java.util.Objects;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;

/** One input of a plan changed, for a what-if comparison. */
public sealed interface WhatIfChange {

    /** The inputs with this change applied. */
    PlanInputs applyTo(PlanInputs in);

    /** The sample refreshed another way (static, stirred, or flowing with its flow rate and cell volume). */
    record RefreshChange(Refresh refresh) implements WhatIfChange {
        public RefreshChange {
            Objects.requireNonNull(refresh, "refresh");
        }

        @Override
        public PlanInputs applyTo(PlanInputs in) {
            Sample s = Sample.resolve(in.sample().spec().withRefresh(refresh));
            return new PlanInputs(in.title(), in.lab(), s, in.laser(), in.instruments(), in.goals(),
                    in.multiplicationPhotonEnergiesJ(), in.limits(), in.modelOverrides());
        }
    }

    /** The laser at another repetition rate with no pulse picking. */
    record RepetitionRateChange(double rateHz) implements WhatIfChange {
        public RepetitionRateChange {
            if (!(rateHz > 0) || Double.isInfinite(rateHz)) {
                throw new IllegalArgumentException("what-if repetition rate must be finite and > 0 Hz, got " + rateHz);
            }
        }

        @Override
        public PlanInputs applyTo(PlanInputs in) {
            LaserSetup l = in.laser();
            LaserSetup changed = new LaserSetup(l.pumpWavelengthsM(), rateHz, List.of(1), l.pulseFwhmS(), l.minPulseEnergyJ(),
                    l.maxPulseEnergyJ(), l.pumpRadiusM(), l.probeRadiusM(), l.calibration(), l.pumpFluctuationRel(),
                    l.driftRelPerHour());
            return new PlanInputs(in.title(), in.lab(), in.sample(), changed, in.instruments(), in.goals(),
                    in.multiplicationPhotonEnergiesJ(), in.limits(), in.modelOverrides());
        }
    }
}
