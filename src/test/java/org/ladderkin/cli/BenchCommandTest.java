package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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
    void jsonListsEveryCaseWithMedianMinAndMaxAndThePeakHeap() throws Exception {
        MainTest.Run r = MainTest.run("bench", "--repeats", "3", "--skip-cooling", "--format", "json");
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.OK);
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertThat(root.fieldNames()).toIterable().containsExactly("cases", "peakHeapMb");
        assertThat(root.get("peakHeapMb").asDouble()).isPositive();
        List<String> names = new ArrayList<>();
        for (JsonNode c : root.get("cases")) {
            assertThat(c.fieldNames()).toIterable().containsExactly("name", "medianMs", "minMs", "maxMs");
            names.add(c.get("name").asText());
            double min = c.get("minMs").asDouble();
            assertThat(min).isPositive();
            assertThat(c.get("medianMs").asDouble()).isBetween(min, c.get("maxMs").asDouble());
        }
        assertThat(names).contains("sweep 40 <N>, steady state at 80 MHz", "trace, 31 states, 1000 delays (incl. set-up)",
                BenchCases.SIMULATE_CASE);
        assertThat(names).filteredOn(n -> n.contains("sweep") && n.contains("80 MHz")).isNotEmpty();
    }

    @Test
    void theSimulateCaseRunsTheWholeCommand() {
        // the case's text is what the command prints for its arguments
        MainTest.Run r = MainTest.run(BenchCases.simulateArguments());
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(BenchCases.simulateCommand()).isEqualTo(r.out().length());
        assertThat(r.out().lines().count()).isEqualTo(1001);
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
