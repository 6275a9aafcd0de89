package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.GraphicsEnvironment;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class GuiCommandTest {

    static MainTest.Run run(GuiCommand command, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cmd = new CommandLine(command);
        cmd.setOut(new PrintWriter(out));
        cmd.setErr(new PrintWriter(err));
        cmd.setExecutionExceptionHandler(new ErrorReporter());
        int exit = cmd.execute(args);
        return new MainTest.Run(exit, out.toString(), err.toString());
    }

    @Test
    void withoutADisplayItSaysSoInOneLineWithExitCodeThree() {
        GuiCommand command = new GuiCommand();
        command.display = () -> false;
        MainTest.Run r = run(command);
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).startsWith("ladderkin: gui: no display available").doesNotContain("\n");
    }

    @Test
    void onAHeadlessMachineTheRealCommandFailsCleanly() {
        assumeTrue(GraphicsEnvironment.isHeadless(), "a display is available: the window test covers this case");
        MainTest.Run r = MainTest.run("gui");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err().strip()).startsWith("ladderkin: gui: no display available").doesNotContain("Exception");
    }

    @Test
    void aMissingPlanIsBadInputBeforeAnyWindow(@TempDir Path dir) {
        GuiCommand command = new GuiCommand();
        command.display = () -> {
            throw new AssertionError("must not get as far as the display");
        };
        MainTest.Run r = run(command, dir.resolve("absent.plan.json").toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("absent.plan.json: file not found");
    }

    @Test
    void helpListsTheGuiCommand() {
        assertThat(MainTest.run("--help").out()).contains("gui");
    }
}
