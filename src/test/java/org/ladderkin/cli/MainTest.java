package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MainTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));

    record Run(int exit, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = Main.commandLine(new PrintWriter(out), new PrintWriter(err)).execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void helpListsTheCommands() {
        Run r = run("--help");
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("Usage: ladderkin").contains("plan");
    }

    @Test
    void versionPrintsTheVersion() {
        Run r = run("--version");
        assertThat(r.exit()).isZero();
        assertThat(r.out()).startsWith("ladderkin ");
    }

    @Test
    void planWritesTheResolvedPlan(@TempDir Path out) throws Exception {
        Run r = run("plan", HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json").toString(), "--out", out.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        assertThat(r.out()).contains("FH-CdSe-0412").contains("laser safety officer");
        String json = Files.readString(out.resolve("plan-resolved.json"));
        assertThat(json).contains("\"repetitionRateHz\" : 1000.0").contains("\"schema\" : \"ladderkin.plan-resolved/1\"");
    }

    @Test
    void badInputIsOneLineAndExitCodeThree(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"schema\": \"ladderkin.plan/1\", \"title\": 3}");
        Run r = run("plan", bad.toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).isEqualTo("ladderkin: " + bad + ":1:41: field 'title': expected a string, found the number 3");
    }

    @Test
    void missingFileExitCodeThree(@TempDir Path dir) {
        Run r = run("plan", dir.resolve("absent.json").toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("absent.json: file not found");
    }

    @Test
    void unknownOptionIsAUsageError() {
        Run r = run("plan", "--no-such-flag");
        assertThat(r.exit()).isEqualTo(ExitCodes.USAGE);
    }

    @picocli.CommandLine.Command(name = "exhausts")
    static final class Exhausts implements java.util.concurrent.Callable<Integer> {
        @Override
        public Integer call() {
            throw new OutOfMemoryError("Requested array size exceeds VM limit");
        }
    }

    /** An Error is not an Exception, so picocli does not hand it to the error reporter; main must still print one line. */
    @Test
    void anOutOfMemoryErrorEndsInOneLineAndAnExitCode() {
        StringWriter err = new StringWriter();
        picocli.CommandLine cmd = new picocli.CommandLine(new Exhausts());
        cmd.setErr(new PrintWriter(err));
        int exit = Main.run(cmd);
        assertThat(exit).isEqualTo(ExitCodes.INTERNAL);
        assertThat(err.toString().strip()).startsWith("ladderkin: out of memory: the input asks for more than the Java heap holds")
                .contains("Requested array size exceeds VM limit").doesNotContain("\n").doesNotContain("at org.");
    }
}
