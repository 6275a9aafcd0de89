package org.ladderkin.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.function.BooleanSupplier;
import org.ladderkin.gui.app.PlannerApp;
import org.ladderkin.io.InputException;
import org.ladderkin.io.InputProblem;
import org.ladderkin.io.SourceLocation;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code ladderkin gui [PLAN.json]}: the desktop planner. */
@Command(name = "gui", mixinStandardHelpOptions = true,
        header = "Open the desktop planner on a campaign plan.",
        description = "Open the desktop planner on a campaign plan (default: the bundled demo plan"
            + " experiments-plan/cdse-auger-1khz.plan.json). Needs a display.")
final class GuiCommand implements Callable<Integer> {

    static final String DEMO_PLAN = "experiments-plan/cdse-auger-1khz.plan.json";

    @Spec
    CommandSpec spec;

    @Mixin
    QuietOption quiet;

    @Parameters(index = "0", arity = "0..1", paramLabel = "PLAN.json", description = "campaign plan file to open")
    Path planFile;

    /** Whether a display is available; replaced in tests. */
    BooleanSupplier display = PlannerApp::displayAvailable;

    @Override
    public Integer call() throws Exception {
        Path plan = planFile != null ? planFile : demoPlan();
        if (!Files.isRegularFile(plan)) {
            throw new InputException(SourceLocation.of(plan.toString()), null, InputProblem.NOT_FOUND, "file not found");
        }
        if (!display.getAsBoolean()) {
            spec.commandLine().getErr().println("ladderkin: gui: no display available (headless environment); "
                    + "run it on a desktop, or under xvfb-run for tests");
            spec.commandLine().getErr().flush();
            return ExitCodes.BAD_INPUT;
        }
        try {
            PlannerApp.runUntilClosed(plan);
        } catch (java.awt.AWTError | java.awt.HeadlessException e) {
            // DISPLAY is set but no X server answers
            spec.commandLine().getErr().println("ladderkin: gui: cannot open a window: " + e.getMessage());
            spec.commandLine().getErr().flush();
            return ExitCodes.BAD_INPUT;
        }
        return ExitCodes.OK;
    }

    private static Path demoPlan() {
        String home = System.getProperty("ladderkin.home");
        if (home == null || home.isBlank()) {
            throw new InputException(SourceLocation.of(DEMO_PLAN), null, InputProblem.NOT_FOUND,
                    "cannot find the demo plan: the 'ladderkin.home' property is not set (start through ./ladderkin, "
                            + "or give a plan file)");
        }
        return Path.of(home).resolve(DEMO_PLAN);
    }
}
