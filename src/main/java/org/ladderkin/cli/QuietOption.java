package org.ladderkin.cli;

import java.io.PrintWriter;
import java.io.Writer;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code --quiet}, the same on every command: no summary for people on standard output and no notes or progress on
 * standard error, only errors; the exit code tells the outcome and files named by {@code --out} are still written.
 * Data a script asked for ({@code --format json}, {@code simulate}'s table) still goes to standard output, so
 * {@code --format json --quiet > result.json} works. Usage help and errors keep their own writers.
 */
final class QuietOption {

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    @Option(names = {"-q", "--quiet"}, description = "no summary, notes or progress, only errors (data asked for with "
            + "--format json still prints; files named by --out are still written)")
    boolean quiet;

    /** Where the command prints its summary for people: standard output, or nowhere with --quiet. */
    PrintWriter summary() {
        return quiet ? new PrintWriter(Writer.nullWriter()) : command.commandLine().getOut();
    }

    /** Where the command prints data a script asked for: standard output, quiet or not. */
    PrintWriter data() {
        return command.commandLine().getOut();
    }

    boolean on() {
        return quiet;
    }
}
