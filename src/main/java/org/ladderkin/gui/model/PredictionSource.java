package org.ladderkin.gui.model;

import org.ladderkin.plan.PlanInputs;

/**
 * Computes what the planner shows for a valid plan. Called on a background thread, never on the event thread;
 * long computations should return early when {@link Thread#isInterrupted()} becomes true (a newer edit arrived).
 */
@FunctionalInterface
public interface PredictionSource {

    /** The prediction for {@code inputs}; must not modify shared state. */
    Prediction predict(PlanInputs inputs);
}
