package org.ladderkin.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The {@code ladderkin} command: a top command whose subcommands do the work. */
@Command(name = "ladderkin",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Plan and analyse pump-probe and time-resolved PL campaigns on semiconductor nanocrystals: "
            + "multiexciton kinetics, fluence series, risks and global fits.",
        subcommands = {PlanCommand.class, SimulateCommand.class, FitCommand.class, ExciteCommand.class, BeamCommand.class, MaterialsCommand.class,
            FitYieldsCommand.class, ArchiveCommand.class, TrendCommand.class,
            GuiCommand.class, BenchCommand.class, CommandLine.HelpCommand.class},
        footer = {"", "Quantities take units as written in the lab: 50 ps, 1 kHz, 2.5 µJ (or uJ), 0.3 mJ/cm², 400 nm.",
            "Exit codes: 0 ok, 2 bad command line, 3 bad input, 4 cannot write output, 1 internal error."})
public final class Main implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    /** No command given: a script that forgot its command must not pass, so the usage goes to stderr with code 2. */
    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.USAGE;
    }

    /** A configured command line, used by {@link #main} and by tests with captured streams. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cmd = new CommandLine(new Main());
        cmd.setOut(out);
        cmd.setErr(err);
        cmd.setExecutionExceptionHandler(new ErrorReporter());
        cmd.setParameterExceptionHandler(new UsageErrorReporter());
        cmd.setExitCodeExceptionMapper(ex -> ExitCodes.USAGE);
        cmd.setCaseInsensitiveEnumValuesAllowed(true);
        return cmd;
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(run(commandLine(out, err), args));
    }

    /**
     * Runs a command line; an {@link Error} (out of memory, stack overflow) that escapes the command still ends in one
     * line and an exit code, since picocli hands only exceptions to {@link ErrorReporter}.
     */
    static int run(CommandLine cmd, String... args) {
        try {
            return cmd.execute(args);
        } catch (OutOfMemoryError e) {
            cmd.getErr().println("ladderkin: out of memory: the input asks for more than the Java heap holds (" + e.getMessage()
                    + "); lower the ladder size, the delay count or the fluence range, or raise the heap with LADDERKIN_JAVA_OPTS=-Xmx...");
            cmd.getErr().flush();
            return ExitCodes.INTERNAL;
        } catch (StackOverflowError e) {
            cmd.getErr().println("ladderkin: internal error (please report with the input that caused it): stack overflow");
            cmd.getErr().flush();
            return ExitCodes.INTERNAL;
        }
    }
}
