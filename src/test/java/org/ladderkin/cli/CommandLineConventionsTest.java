package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** What every command shares: help that fits, usage errors, --quiet, and an output folder checked before the work. */
class CommandLineConventionsTest {

    private static final String DEMO = MainTest.HOME.resolve("experiments-plan/cdse-auger-1khz.plan.json").toString();

    private static CommandLine root() {
        return Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(new StringWriter()));
    }

    private static List<CommandLine> commands() {
        return root().getSubcommands().values().stream().filter(c -> !c.getCommandName().equals("help")).toList();
    }

    @Test
    void topLevelHelpGivesEveryCommandOneWholeLine() {
        MainTest.Run r = MainTest.run("--help");
        assertThat(r.exit()).isZero();
        List<String> lines = r.out().lines().toList();
        List<String> rows = lines.subList(lines.indexOf("Commands:") + 1, lines.indexOf("Commands:") + 1 + root().getSubcommands().size());
        for (String row : rows) {
            assertThat(row).as("one line per command, ending its sentence").matches("  [a-z]+(-[a-z]+)* +[A-Z].*\\.").hasSizeLessThanOrEqualTo(80);
        }
        assertThat(lines.get(lines.indexOf("Commands:") + 1 + rows.size())).as("nothing wraps below the list").isEmpty();
    }

    @Test
    void descriptionsAreWholeParagraphsThatPicocliWraps() {
        for (CommandLine c : commands()) {
            String[] header = c.getCommandSpec().usageMessage().header();
            assertThat(header).as(c.getCommandName() + " header").hasSize(1);
            assertThat(header[0]).hasSizeLessThanOrEqualTo(66).endsWith(".");
            for (String paragraph : c.getCommandSpec().usageMessage().description()) {
                // a hard break mid-sentence leaves an element that ends in a word, which then re-wraps as a short line
                assertThat(paragraph).as(c.getCommandName() + " description").matches("(?s).*[.:)]");
            }
            MainTest.Run help = MainTest.run(c.getCommandName(), "--help");
            assertThat(help.err()).as(c.getCommandName() + " help formats cleanly").isEmpty();
            assertThat(help.out().lines()).allSatisfy(l -> assertThat(l).hasSizeLessThanOrEqualTo(80));
        }
    }

    @Test
    void bareLadderkinPrintsUsageToStderrAndExitsTwo() {
        MainTest.Run r = MainTest.run();
        assertThat(r.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(r.out()).isEmpty();
        assertThat(r.err()).startsWith("Usage: ladderkin").contains("Commands:");
    }

    @Test
    void anUnknownWordGetsOnlyCloseSuggestions() {
        MainTest.Run far = MainTest.run("frobnicate");
        assertThat(far.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(far.err().strip()).isEqualTo("ladderkin: unknown command 'frobnicate' (see 'ladderkin --help')");
        assertThat(MainTest.run("simulat").err().strip())
                .isEqualTo("ladderkin: unknown command 'simulat'; did you mean 'simulate'? (see 'ladderkin --help')");
        assertThat(MainTest.run("fti").err()).contains("did you mean 'fit'?");
        MainTest.Run option = MainTest.run("plan", DEMO, "--qiet");
        assertThat(option.exit()).isEqualTo(ExitCodes.USAGE);
        assertThat(option.err().strip())
                .isEqualTo("ladderkin plan: unknown option '--qiet'; did you mean '--quiet'? (see 'ladderkin plan --help')");
        assertThat(MainTest.run("plan", DEMO, "--colour").err()).doesNotContain("did you mean");
    }

    @Test
    void editDistanceCountsInsertionsDeletionsSubstitutionsAndSwaps() {
        // closed form by hand: kitten → sitten → sittin → sitting
        assertThat(UsageErrorReporter.distance("kitten", "sitting")).isEqualTo(3);
        assertThat(UsageErrorReporter.distance("fti", "fit")).isEqualTo(1);
        assertThat(UsageErrorReporter.distance("", "plan")).isEqualTo(4);
        assertThat(UsageErrorReporter.closeMatches("frobnicate", Set.of("simulate", "materials", "excite"))).isEmpty();
        assertThat(UsageErrorReporter.closeMatches("bem", Set.of("beam", "bench", "gui"))).containsExactly("beam");
    }

    @Test
    void everyCommandTakesQuiet() {
        for (CommandLine c : commands()) {
            assertThat(c.getCommandSpec().optionsMap()).as(c.getCommandName()).containsKeys("--quiet", "-q");
        }
    }

    @Test
    void quietSilencesTheSummaryButNotErrors(@TempDir Path dir) throws Exception {
        MainTest.Run materials = MainTest.run("materials", "--quiet");
        assertThat(materials.exit()).isZero();
        assertThat(materials.out()).isEmpty();
        assertThat(MainTest.run("materials").out()).isNotEmpty();
        MainTest.Run excite = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "-q"));
        assertThat(excite.exit()).isZero();
        assertThat(excite.out() + excite.err()).isEmpty();
        // data a script asked for is not a summary: it still prints
        MainTest.Run json = MainTest.run(ExciteCommandTest.with(ExciteCommandTest.PBSE, "-q", "--format", "json"));
        assertThat(json.out()).startsWith("{").contains("\"nAvgPeak\"");
        MainTest.Run simulate = MainTest.run("simulate", "--tau-rad", "20ns", "--tau-auger2", "50ps", "--delays", "1ps..1ns:5log", "--quiet");
        assertThat(simulate.exit()).isZero();
        assertThat(simulate.err()).isEmpty();
        assertThat(simulate.out().lines()).hasSize(6);

        // one planning run (the slow command) serves two checks: --quiet, and a new output folder the check creates
        Path out = dir.resolve("new/deeper");
        MainTest.Run plan = MainTest.run("plan", DEMO, "--out", out.toString(), "--quiet");
        assertThat(plan.exit()).isZero();
        assertThat(plan.out() + plan.err()).isEmpty();
        assertThat(out.resolve("report.html")).isNotEmptyFile();
        try (var written = Files.list(out)) {
            assertThat(written.map(p -> p.getFileName().toString())).as("the write check leaves no probe behind")
                    .containsExactlyInAnyOrder("report.html", "plan-resolved.json", "traces.csv");
        }

        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"schema\": \"ladderkin.plan/1\",}");
        MainTest.Run error = MainTest.run("plan", bad.toString(), "--quiet");
        assertThat(error.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(error.out()).isEmpty();
        assertThat(error.err().strip()).isEqualTo("ladderkin: " + bad
                + ":1:31: malformed JSON: expected a field name after ',' (a comma after the last field is not allowed)");
    }

    @Test
    void anUnusableOutputFolderIsFoundBeforeTheWork(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("taken");
        Files.writeString(file, "x");
        // the plan does not exist: reading it would fail with code 3, so code 4 shows the folder was checked first
        MainTest.Run plan = MainTest.run("plan", dir.resolve("absent.json").toString(), "--out", file.toString());
        assertThat(plan.exit()).isEqualTo(ExitCodes.CANNOT_WRITE);
        assertThat(plan.out()).isEmpty();
        assertThat(plan.err().strip()).isEqualTo("ladderkin: cannot write output: " + file + ": is a file, not a folder");

        MainTest.Run fit = MainTest.run("fit", dir.resolve("absent.csv").toString(), "--fluences", "1,2", "--out",
                file.resolve("sub").toString());
        assertThat(fit.exit()).isEqualTo(ExitCodes.CANNOT_WRITE);
        assertThat(fit.err().strip().lines()).hasSize(1);
        assertThat(fit.err()).startsWith("ladderkin: cannot write output: " + file.resolve("sub") + ": ");
    }
}
