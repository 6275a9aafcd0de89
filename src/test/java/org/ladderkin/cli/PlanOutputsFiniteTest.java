package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every demo plan gives a complete report: the command succeeds and no output (the text, the report, the CSV
 * traces, the resolved JSON) holds a NaN or an infinity. A prediction that cannot be made is an error or a printed
 * warning that says what is missing, never a silent NaN.
 */
class PlanOutputsFiniteTest {

    static final Path HOME = Path.of(System.getProperty("ladderkin.home", "."));
    /** A non-finite number as Java, Jackson, the CSV writer or a formatter would print it. */
    private static final Pattern NOT_FINITE = Pattern.compile("NaN|-?Infinity|∞");

    static Stream<String> demos() throws IOException {
        try (Stream<Path> files = Files.list(HOME.resolve("experiments-plan"))) {
            return files.map(p -> p.getFileName().toString()).filter(n -> n.endsWith(".plan.json")).sorted().toList().stream();
        }
    }

    @ParameterizedTest
    @MethodSource("demos")
    void everyOutputOfEveryDemoPlanIsFinite(String file, @TempDir Path out) throws IOException {
        MainTest.Run run = MainTest.run("plan", HOME.resolve("experiments-plan").resolve(file).toString(), "--out",
                out.toString());
        assertThat(run.exit()).as(run.err()).isZero();
        List<String> found = new ArrayList<>(nonFinite("text output", run.out()));
        try (Stream<Path> written = Files.list(out)) {
            for (Path p : written.sorted().toList()) {
                found.addAll(nonFinite(p.getFileName().toString(), Files.readString(p)));
            }
        }
        assertThat(found).as("non-finite numbers in the outputs of " + file).isEmpty();
    }

    @Test
    void theDemosCoverFiveCampaigns() throws IOException {
        assertThat(demos().count()).isGreaterThanOrEqualTo(5);
    }

    /** Each occurrence with its line, so a failure says where. */
    private static List<String> nonFinite(String name, String text) {
        List<String> hits = new ArrayList<>();
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            Matcher m = NOT_FINITE.matcher(lines[i]);
            if (m.find()) {
                int from = Math.max(0, m.start() - 60);
                hits.add(name + ":" + (i + 1) + ": …" + lines[i].substring(from, Math.min(lines[i].length(), m.end() + 20)));
            }
        }
        return hits;
    }
}
