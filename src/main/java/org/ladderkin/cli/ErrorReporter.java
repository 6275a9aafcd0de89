package org.ladderkin.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import org.ladderkin.io.InputException;
import org.ladderkin.units.QuantityFormatException;
import picocli.CommandLine;

/**
 * Turns exceptions into one line on standard error and an exit code. Input problems never show a stack trace;
 * only genuine bugs do, so they can be reported.
 */
final class ErrorReporter implements CommandLine.IExecutionExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, CommandLine.ParseResult parseResult) {
        var err = cmd.getErr();
        if (ex instanceof InputException || ex instanceof QuantityFormatException) {
            err.println("ladderkin: " + ex.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof IllegalArgumentException) {
            err.println("ladderkin: " + ex.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof IOException || ex instanceof UncheckedIOException) {
            err.println("ladderkin: cannot write output: " + ex.getMessage());
            return ExitCodes.CANNOT_WRITE;
        }
        err.println("ladderkin: internal error (please report with the input that caused it): " + ex);
        ex.printStackTrace(err);
        return ExitCodes.INTERNAL;
    }
}
