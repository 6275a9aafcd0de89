package org.ladderkin.plan;

import java.util.List;
import java.util.Locale;
import org.ladderkin.sample.Refresh;
import org.ladderkin.sample.Sample;
import org.ladderkin.units.Dimension;
import org.ladderkin.units.Quantity;

/**
 * The same plan with one input changed, to show side by side what a choice costs. Changes are written as
 * {@code refresh=static}, {@code refresh=stirred}, {@code refresh=flowing:5 mL/min:0.5 mL} or {@code rate=80 MHz}
 * (the laser at that rate with no pulse picking).
 *
 * @param change what was changed, as written
 * @param plan   the plan with the change
 */
public record WhatIf(String change, CampaignPlan plan) {

    /** Applies one change to the inputs. */
    public static PlanInputs apply(PlanInputs in, String change) {
        String[] kv = change.split("=", 2);
        if (kv.length != 2) {
            throw new IllegalArgumentException("what-if '" + change + "' must look like refresh=static or rate=80 MHz");
        }
        String key = kv[0].strip();
        String value = kv[1].strip();
        switch (key) {
            case "refresh" -> {
                String[] parts = value.split(":");
                Refresh r = switch (parts[0].strip()) {
                    case "static" -> Refresh.stationary();
                    case "stirred" -> Refresh.stirred();
                    case "flowing" -> {
                        if (parts.length != 3) {
                            throw new IllegalArgumentException("what-if refresh=flowing needs flow rate and cell volume, e.g. "
                                    + "refresh=flowing:5 mL/min:0.5 mL");
                        }
                        yield Refresh.flowing(Quantity.parseSi(parts[1], Dimension.VOLUMETRIC_FLOW),
                                Quantity.parseSi(parts[2], Dimension.VOLUME));
                    }
                    default -> throw new IllegalArgumentException("what-if refresh must be static, stirred or flowing, was '"
                            + parts[0] + "'");
                };
                Sample s = Sample.resolve(in.sample().spec().withRefresh(r));
                return new PlanInputs(in.title(), in.lab(), s, in.laser(), in.instruments(), in.goals(),
                        in.multiplicationPhotonEnergiesJ(), in.limits(), in.modelOverrides());
            }
            case "rate" -> {
                double hz = Quantity.parseSi(value, Dimension.FREQUENCY);
                LaserSetup l = in.laser();
                LaserSetup changed = new LaserSetup(l.pumpWavelengthsM(), hz, List.of(1), l.pulseFwhmS(), l.minPulseEnergyJ(),
                        l.maxPulseEnergyJ(), l.pumpRadiusM(), l.probeRadiusM());
                return new PlanInputs(in.title(), in.lab(), in.sample(), changed, in.instruments(), in.goals(),
                        in.multiplicationPhotonEnergiesJ(), in.limits(), in.modelOverrides());
            }
            default -> throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "unknown what-if '%s' (known: refresh=static|stirred|flowing:<flow>:<cell volume>, rate=<frequency>)", key));
        }
    }

    /** Plans the changed inputs. */
    public static WhatIf of(PlanInputs base, String change) {
        return new WhatIf(change, Planner.plan(apply(base, change), Planner.Progress.NONE));
    }
}
