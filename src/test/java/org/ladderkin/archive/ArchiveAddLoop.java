package org.ladderkin.archive;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.ladderkin.cli.Main;

/**
 * A child process for the durability tests: runs {@code ladderkin archive add DIR --archive A} COUNT times and prints
 * "added" after each success, so the parent knows how far it got before it kills or waits for it.
 */
public final class ArchiveAddLoop {

    private ArchiveAddLoop() {
    }

    /** Arguments: archive (file or JDBC URL), folder, count. */
    public static void main(String[] args) {
        int count = Integer.parseInt(args[2]);
        for (int i = 0; i < count; i++) {
            StringWriter err = new StringWriter();
            int code = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(err, true))
                    .execute("archive", "add", args[1], "--archive", args[0], "--quiet");
            if (code != 0) {
                System.out.println("failed " + code + ": " + err);
                System.exit(code);
            }
            System.out.println("added");
            System.out.flush();
        }
    }
}
