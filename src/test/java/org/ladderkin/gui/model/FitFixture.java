package org.ladderkin.gui.model;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Executor;
import java.util.function.BooleanSupplier;
import org.ladderkin.fit.Dataset;
import org.ladderkin.plan.PlanInputs;

/**
 * What the fit tab's model tests start from: the CdSe demo plan opened in an editor (a copy in a temporary folder, so
 * tests may edit it) and a series simulated from its own ladder, written as a table with its sidecar.
 */
record FitFixture(PlanEditor editor, PlanInputs plan, FitDemoSeries.Series series, Path csv) {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    static final Path DEMO = HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json");
    /** Callbacks run on the worker thread itself: the models must be as safe with it as with the event thread. */
    static final Executor DIRECT = Runnable::run;

    static FitFixture in(Path dir) throws Exception {
        Path copy = dir.resolve("demo.plan.json");
        Files.copy(DEMO, copy);
        PlanEditor editor = new PlanEditor();
        editor.open(copy);
        PlanInputs plan = editor.lastValid().orElseThrow();
        FitDemoSeries.Series series = FitDemoSeries.simulate(plan, 40, 5);
        return new FitFixture(editor, plan, series, FitDemoSeries.write(series, dir, "series"));
    }

    /** The series loaded, each trace carrying its excitation from the sidecar. */
    Dataset excited() {
        FitData data = new FitData();
        if (data.load(List.of(csv)).isPresent()) {
            throw new AssertionError(data.loadProblem());
        }
        return data.excited().orElseThrow();
    }

    FieldSpec formField(String path) {
        return editor.fields().stream().filter(f -> f.path().toString().equals(path)).findFirst().orElseThrow();
    }

    /** Waits for work on a worker thread (a guard against hanging, not a speed requirement). */
    static void waitFor(String what, BooleanSupplier condition) {
        long end = System.nanoTime() + 300_000_000_000L;
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > end) {
                throw new AssertionError("gave up waiting for " + what);
            }
            try {
                Thread.sleep(20);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError(e);
            }
        }
    }
}
