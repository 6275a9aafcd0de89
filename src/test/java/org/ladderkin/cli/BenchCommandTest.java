package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The bench command runs its cases and prints a time for each; the times themselves are not judged here. */
class BenchCommandTest {

    static final Path DEMO = Path.of(System.getProperty("ladderkin.home", "."))
            .resolve("experiments-plan/cdse-auger-1khz.plan.json");

    @Test
    void thePlannerCaseTimesThePredictionAndTheChartBuild() {
        MainTest.Run r = MainTest.run("bench", "--repeats", "1", "--skip-cooling", "--planner", DEMO.toString());
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.OK);
        for (String row : new String[] {"planner update after an edit (prediction)",
            "planner update after an edit (incl. chart build)", "sweep 40 <N>, steady state at 1 kHz"}) {
            Matcher m = Pattern.compile(Pattern.quote(row) + "\\s+([0-9.]+)").matcher(r.out());
            assertThat(m.find()).as(row + " in\n" + r.out()).isTrue();
            assertThat(Double.parseDouble(m.group(1))).as(row).isPositive();
        }
        assertThat(r.out()).contains("cooling-resolved case skipped").contains("peak heap used");
    }

    @Test
    void aMissingPlanIsABadInput() {
        MainTest.Run r = MainTest.run("bench", "--repeats", "1", "--skip-cooling", "--planner", "no-such.plan.json");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("no-such.plan.json");
    }

    @Test
    void repeatsOutsideTheRangeAreRefused() {
        MainTest.Run r = MainTest.run("bench", "--repeats", "0");
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--repeats must be between 1 and 10000, was 0");
    }
}
