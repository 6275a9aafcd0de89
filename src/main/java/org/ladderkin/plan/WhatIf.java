package org.ladderkin.plan;

import java.util.Objects;

/**
 * The same plan with one input changed, to show side by side what a choice costs.
 *
 * @param label  the change as the user wrote it, shown beside the result
 * @param change the change
 * @param plan   the plan with the change
 */
public record WhatIf(String label, WhatIfChange change, CampaignPlan plan) {

    public WhatIf {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(change, "change");
        Objects.requireNonNull(plan, "plan");
    }

    /** Plans the inputs with {@code change} applied. */
    public static WhatIf of(PlanInputs base, String label, WhatIfChange change) {
        return new WhatIf(label, change, Planner.plan(change.applyTo(base), Planner.Progress.NONE));
    }
}
