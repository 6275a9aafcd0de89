package org.ladderkin.cli;

import org.ladderkin.gui.model.Prediction;
import org.ladderkin.gui.model.PlannerPrediction;
import org.ladderkin.plan.LaserSetup;
import org.ladderkin.plan.PlanInputs;
import org.ladderkin.report.ChartSpec;
import org.ladderkin.report.Charts;

/**
 * The work the desktop planner does after a typical edit: the highest pulse energy changes (so nothing can be reused
 * from the previous prediction), the prediction is recomputed, and each chart is built as the window builds it.
 * Drawing to the screen is left out: it happens only for the visible chart and depends on the display.
 */
final class PlannerUpdateBench {

    private final PlanInputs base;
    private final PlannerPrediction source = new PlannerPrediction();
    private int edits;

    PlannerUpdateBench(PlanInputs base) {
        this.base = base;
    }

    /** One edit's prediction; returns a number derived from it so the work cannot be skipped. */
    double predict() {
        return next().risks().size();
    }

    /** One edit's prediction and the chart objects the window would show. */
    double predictAndBuildCharts() {
        Prediction p = next();
        double sink = 0;
        for (ChartSpec spec : p.charts()) {
            sink += Charts.build(spec).getXYPlot().getDatasetCount();
        }
        return sink;
    }

    private Prediction next() {
        LaserSetup l = base.laser();
        // 1 % steps up and down, as a user nudging the energy would make
        double factor = 1 + 0.01 * ((edits++ % 7) - 3);
        LaserSetup edited = new LaserSetup(l.pumpWavelengthsM(), l.repetitionRateHz(), l.pulsePickerDivisions(),
                l.pulseFwhmS(), Math.min(l.minPulseEnergyJ(), l.maxPulseEnergyJ() * factor), l.maxPulseEnergyJ() * factor,
                l.pumpRadiusM(), l.probeRadiusM());
        PlanInputs in = new PlanInputs(base.title(), base.lab(), base.sample(), edited, base.instruments(), base.goals(),
                base.multiplicationPhotonEnergiesJ(), base.limits(), base.modelOverrides());
        return source.predict(in);
    }
}
