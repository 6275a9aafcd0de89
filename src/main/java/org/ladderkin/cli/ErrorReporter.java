package org.ladderkin.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.InvalidPathException;
import java.util.ArrayList;
import java.util.List;
import org.ladderkin.io.InputException;
import org.ladderkin.sample.SampleException;
import org.ladderkin.units.Excerpt;
import org.ladderkin.units.QuantityFormatException;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Turns exceptions into one line on standard error and an exit code. Input problems never show a stack trace;
 * only genuine bugs do, so they can be reported. A problem with a value given on the command line names the option
 * it came from, as a file's problem names its field.
 */
final class ErrorReporter implements CommandLine.IExecutionExceptionHandler {

    /** Longest message shown whole; the middle of a longer one is left out. */
    static final int MAX_SHOWN = 600;

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, CommandLine.ParseResult parseResult) {
        var err = cmd.getErr();
        if (ex instanceof InputException) {
            err.println("ladderkin: " + ex.getMessage());
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof InvalidPathException p) {
            String option = optionHolding(parseResult, p.getInput(), true);
            err.println("ladderkin: " + (option == null ? "" : option + ": ") + "'" + Excerpt.of(p.getInput())
                    + "' is not a usable path (" + oneLine(p.getReason()) + ")");
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof QuantityFormatException q) {
            String option = optionHolding(parseResult, q.text(), true);
            String message = String.valueOf(q.getMessage());
            boolean named = option != null && message.contains(option.substring("option '".length(), option.length() - 1));
            err.println("ladderkin: " + (option == null || named ? "" : option + ": ") + oneLine(message));
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof SampleException s && s.part() == SampleException.Part.CROSS_SECTION && optionGiven(parseResult, "--pump")) {
            // a cross-section is asked for at the pump's wavelength; only the pump (or a measured σ) can change it
            err.println("ladderkin: option '--pump': " + oneLine(s.getMessage()));
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof IllegalArgumentException) {
            String message = String.valueOf(ex.getMessage());
            String option = message.startsWith("--") || message.startsWith("option '") ? null : optionQuotedIn(parseResult, message);
            err.println("ladderkin: " + (option == null ? "" : option + ": ") + oneLine(message));
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof IOException || ex instanceof UncheckedIOException) {
            err.println("ladderkin: cannot write output: " + oneLine(String.valueOf(ex.getMessage())));
            return ExitCodes.CANNOT_WRITE;
        }
        err.println("ladderkin: internal error (please report with the input that caused it): " + ex);
        ex.printStackTrace(err);
        return ExitCodes.INTERNAL;
    }

    /** {@code text} on one line (control characters escaped), its middle left out past {@link #MAX_SHOWN} characters. */
    static String oneLine(String text) {
        String t = text.length() <= MAX_SHOWN ? text
                : text.substring(0, MAX_SHOWN * 2 / 3) + "… (" + (text.length() - MAX_SHOWN) + " characters left out) …"
                        + text.substring(text.length() - MAX_SHOWN / 3);
        return Excerpt.escaped(t);
    }

    /** The options and parameters the innermost command matched, with the text each was given. */
    private static List<ArgSpec> given(CommandLine.ParseResult parseResult) {
        List<ArgSpec> args = new ArrayList<>();
        CommandLine.ParseResult pr = parseResult;
        while (pr != null) {
            args.addAll(pr.matchedArgs());
            pr = pr.hasSubcommand() ? pr.subcommand() : null;
        }
        return args;
    }

    /** "option '--x'" for the option whose text is {@code text} (or holds it as one list item), else null. */
    static String optionHolding(CommandLine.ParseResult parseResult, String text, boolean itemsToo) {
        if (parseResult == null || text == null) {
            return null;
        }
        // a quantity reader trims what it reads, control characters included
        String wanted = text.trim();
        for (ArgSpec a : given(parseResult)) {
            for (String v : a.originalStringValues()) {
                if (v.trim().equals(wanted) || itemsToo && List.of(v.split(",")).stream().anyMatch(i -> i.trim().equals(wanted))) {
                    return name(a);
                }
            }
        }
        return null;
    }

    /** The option whose whole text the message quotes ('text'), else null. */
    private static String optionQuotedIn(CommandLine.ParseResult parseResult, String message) {
        if (parseResult == null) {
            return null;
        }
        for (ArgSpec a : given(parseResult)) {
            for (String v : a.originalStringValues()) {
                // the whole value, the key of a KEY=VALUE, or one item of a list
                List<String> parts = new ArrayList<>(List.of(v, v.trim(), v.split("=", 2)[0]));
                parts.addAll(List.of(v.split(",")));
                for (String part : parts) {
                    if (!part.isEmpty() && message.contains("'" + part + "'")) {
                        return nameUnlessNamed(a, message);
                    }
                }
            }
        }
        return null;
    }

    private static boolean optionGiven(CommandLine.ParseResult parseResult, String name) {
        return parseResult != null && given(parseResult).stream().anyMatch(a -> a instanceof OptionSpec o && List.of(o.names()).contains(name));
    }

    /** "option '--x'" for {@code a}, or null when the message already names it (as "--x: …" or "unknown --x …"). */
    private static String nameUnlessNamed(ArgSpec a, String message) {
        if (a instanceof OptionSpec o && List.of(o.names()).stream().anyMatch(message::contains)) {
            return null;
        }
        return name(a);
    }

    private static String name(ArgSpec a) {
        return a instanceof OptionSpec o ? "option '" + o.longestName() + "'" : "argument '" + a.paramLabel() + "'";
    }
}
