package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputSetTest {

    static final List<String> NAMES = List.of("report.html", "plan-resolved.json", "traces.csv");

    /** A file's content for run {@code run}: large enough that a write takes a while, ending in a line that marks it whole. */
    static String content(String name, long run) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < 4_000; i++) {
            b.append(name).append(' ').append(run).append(' ').append(i).append('\n');
        }
        return b.append("END ").append(run).append('\n').toString();
    }

    /** The run a whole file belongs to; fails on a torn file. */
    private static long runOf(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file);
        String last = lines.get(lines.size() - 1);
        assertThat(last).as("last line of %s (a torn file has none)", file.getFileName()).startsWith("END ");
        long run = Long.parseLong(last.substring(4));
        assertThat(String.join("\n", lines) + "\n").isEqualTo(content(file.getFileName().toString(), run));
        return run;
    }

    @Test
    void aCommittedSetReplacesTheOldOneAndAnUncommittedOneLeavesIt(@TempDir Path dir) throws IOException {
        try (OutputSet set = OutputSet.begin(dir)) {
            for (String n : NAMES) {
                AtomicFiles.writeString(set.resolve(n), content(n, 1));
            }
            set.commit();
        }
        try (OutputSet set = OutputSet.begin(dir)) {
            AtomicFiles.writeString(set.resolve("report.html"), content("report.html", 2));
        }
        for (String n : NAMES) {
            assertThat(runOf(dir.resolve(n))).isEqualTo(1);
        }
        try (var left = Files.list(dir)) {
            assertThat(left.map(p -> p.getFileName().toString())).containsExactlyInAnyOrderElementsOf(NAMES);
        }
    }

    @Test
    void recoveryFinishesADeadWritersReadySetAndRemovesItsStaging(@TempDir Path dir) throws Exception {
        for (String n : NAMES) {
            Files.writeString(dir.resolve(n), content(n, 1));
        }
        Process finished = new ProcessBuilder("true").start();
        finished.waitFor();
        Path ready = Files.createDirectory(dir.resolve(".ladderkin-set." + finished.pid() + "-a.ready"));
        Files.writeString(ready.resolve("report.html"), content("report.html", 2));
        Files.writeString(ready.resolve("traces.csv"), content("traces.csv", 2));
        Files.writeString(dir.resolve("plan-resolved.json"), content("plan-resolved.json", 2));
        Path staging = Files.createDirectory(dir.resolve(".ladderkin-set." + finished.pid() + "-b.staging"));
        Files.writeString(staging.resolve("report.html"), "half");
        Path running = Files.createDirectory(dir.resolve(".ladderkin-set." + ProcessHandle.current().pid() + "-c.staging"));
        OutputSet.recover(dir);
        for (String n : NAMES) {
            assertThat(runOf(dir.resolve(n))).isEqualTo(2);
        }
        assertThat(ready).doesNotExist();
        assertThat(staging).doesNotExist();
        assertThat(running).exists();
    }

    /**
     * A writer killed with SIGKILL at random moments, 50 times: every file left is whole, and once the next writer (or
     * recovery) has run, all files belong to the same run and nothing temporary is left.
     */
    @Test
    void killedAtRandomMomentsNeverLeavesATornFileOrAMixedSet(@TempDir Path dir) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        SplittableRandom random = new SplittableRandom(25);
        Set<Long> runsSeen = new HashSet<>();
        int killedMidSet = 0;
        for (int k = 0; k < 50; k++) {
            Process p = new ProcessBuilder(java, "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-cp", System.getProperty("java.class.path"),
                    OutputSetWriterMain.class.getName(), dir.toString()).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            Thread.sleep(150 + random.nextInt(400));
            p.destroyForcibly();
            assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
            List<Long> before = new ArrayList<>();
            for (String n : NAMES) {
                if (Files.exists(dir.resolve(n))) {
                    before.add(runOf(dir.resolve(n)));
                }
            }
            if (new HashSet<>(before).size() > 1) {
                killedMidSet++;
            }
            OutputSet.recover(dir);
            Set<Long> runs = new HashSet<>();
            for (String n : NAMES) {
                if (Files.exists(dir.resolve(n))) {
                    runs.add(runOf(dir.resolve(n)));
                }
            }
            assertThat(runs).as("runs of the set after kill %d and recovery", k).hasSizeLessThanOrEqualTo(1);
            runsSeen.addAll(runs);
            try (var left = Files.list(dir)) {
                assertThat(left.map(f -> f.getFileName().toString()).filter(f -> f.startsWith("."))).as("left after recovery").isEmpty();
            }
        }
        // the kills must have landed inside writes, or the test proves nothing
        assertThat(runsSeen).hasSizeGreaterThan(10);
        System.out.println("OutputSetTest: 50 kills, " + runsSeen.size() + " distinct sets kept, " + killedMidSet
                + " kills left a ready set that recovery finished");
    }
}
