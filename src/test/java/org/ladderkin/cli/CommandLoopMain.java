package org.ladderkin.cli;

import java.io.PrintWriter;
import java.io.Writer;
import java.util.Arrays;

/**
 * Runs real ladderkin command lines in turn, forever, for {@link KilledCommandTest} (run in its own JVM and killed
 * with SIGKILL). Arguments: command lines separated by a lone {@code ;}.
 */
public final class CommandLoopMain {

    private CommandLoopMain() {
    }

    public static void main(String[] args) {
        String[][] lines = split(args);
        PrintWriter quiet = new PrintWriter(Writer.nullWriter());
        for (long i = 0; ; i++) {
            String[] line = lines[(int) (i % lines.length)];
            int exit = Main.commandLine(quiet, quiet).execute(line);
            if (exit != 0) {
                System.err.println("exit " + exit + " from " + String.join(" ", line));
                System.exit(2);
            }
        }
    }

    static String[][] split(String[] args) {
        java.util.List<String[]> lines = new java.util.ArrayList<>();
        int start = 0;
        for (int i = 0; i <= args.length; i++) {
            if (i == args.length || ";".equals(args[i])) {
                lines.add(Arrays.copyOfRange(args, start, i));
                start = i + 1;
            }
        }
        return lines.toArray(String[][]::new);
    }
}
