package org.ladderkin.archive;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.ladderkin.cli.Main;

/** Runs the command line in this JVM with captured output. */
final class Cli {

    record Run(int exit, String out, String err) {
    }

    private Cli() {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }
}
