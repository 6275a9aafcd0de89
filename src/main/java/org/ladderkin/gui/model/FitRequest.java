package org.ladderkin.gui.model;

import java.util.Objects;
import org.ladderkin.fit.Dataset;
import org.ladderkin.plan.PlanInputs;

/**
 * Everything one fit (or one preview) is computed from, captured on the caller's thread so the worker never reads a
 * model that may change under it.
 *
 * @param data    the traces, each carrying the excitation the user gave it
 * @param plan    the plan's last valid state; the fit starts from its model
 * @param options what is freed and how the model runs
 */
record FitRequest(Dataset data, PlanInputs plan, FitOptions options) {

    FitRequest {
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(options, "options");
    }
}
