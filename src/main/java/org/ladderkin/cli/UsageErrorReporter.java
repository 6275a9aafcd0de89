package org.ladderkin.cli;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * A command-line mistake as one line on standard error, exit code 2. An unknown command or option is answered with
 * the names that are a typo away from it (edit distance), or with none: picocli's own guesses offer unrelated
 * commands for an unrelated word.
 */
final class UsageErrorReporter implements CommandLine.IParameterExceptionHandler {

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        String name = cmd.getCommandSpec().qualifiedName();
        String problem = ex.getMessage();
        if (ex instanceof UnmatchedArgumentException u && !u.getUnmatched().isEmpty()) {
            String word = u.getUnmatched().get(0);
            boolean option = word.startsWith("-");
            boolean command = !option && !cmd.getSubcommands().isEmpty();
            Collection<String> known = option ? cmd.getCommandSpec().optionsMap().keySet() : cmd.getSubcommands().keySet();
            List<String> close = option || command ? closeMatches(option ? word.split("=", 2)[0] : word, known) : List.of();
            problem = (option ? "unknown option '" : command ? "unknown command '" : "unexpected argument '") + word + "'"
                    + (close.isEmpty() ? "" : "; did you mean " + String.join(" or ", close.stream().map(c -> "'" + c + "'").toList()) + "?");
        }
        cmd.getErr().println(name + ": " + ErrorReporter.oneLine(withoutJavaNames(problem)) + " (see '" + name + " --help')");
        cmd.getErr().flush();
        return ExitCodes.USAGE;
    }

    /**
     * picocli ends a value it could not convert with the Java exception behind it ("(java.nio.file.InvalidPathException:
     * Nul character not allowed…)"); the user needs the reason, not the class.
     */
    static String withoutJavaNames(String problem) {
        String p = problem.replace(" to interface java.nio.file.Path ", " to a path ");
        int open = p.indexOf("(java.");
        if (open < 0) {
            return p;
        }
        int colon = p.indexOf(": ", open);
        return colon < 0 ? p : p.substring(0, open + 1) + p.substring(colon + 2);
    }

    /** The candidates within a typo or two of {@code word} (more allowed for longer words), closest first. */
    static List<String> closeMatches(String word, Collection<String> candidates) {
        String w = word.toLowerCase(Locale.ROOT);
        int allowed = w.replaceFirst("^-+", "").length() <= 4 ? 1 : 2;
        List<String> close = new ArrayList<>();
        for (int d = 0; d <= allowed; d++) {
            for (String c : candidates) {
                if (distance(w, c.toLowerCase(Locale.ROOT)) == d) {
                    close.add(c);
                }
            }
        }
        return close;
    }

    /** Levenshtein distance with adjacent transpositions counted as one edit (optimal string alignment). */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
