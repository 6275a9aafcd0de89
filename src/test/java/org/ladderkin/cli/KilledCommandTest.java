package org.ladderkin.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.ladderkin.io.AtomicFiles;
import org.ladderkin.io.OutputSet;

/**
 * The real {@code plan}, {@code fit} and {@code archive add} commands killed with SIGKILL at random moments, 50 times
 * each: every file left is whole and belongs to one run, the set is never mixed once the next run has recovered it,
 * nothing temporary is left, and the archive holds only whole rows.
 */
class KilledCommandTest {

    private static final int KILLS = 50;
    private static final ObjectMapper JSON = new ObjectMapper();

    private static Process loop(List<String> args) throws IOException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-Dladderkin.home=" + MainTest.HOME.toAbsolutePath(),
                "-cp", System.getProperty("java.class.path"), CommandLoopMain.class.getName()));
        cmd.addAll(args);
        return new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
    }

    private static void kill(Process p, SplittableRandom random, long minMs, long maxMs) throws InterruptedException {
        Thread.sleep(minMs + random.nextLong(maxMs - minMs));
        assertThat(p.isAlive()).as("the command loop died on its own (exit %s)", p.isAlive() ? "" : p.exitValue()).isTrue();
        p.destroyForcibly();
        assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
    }

    private static List<String> hidden(Path dir) throws IOException {
        try (var s = Files.list(dir)) {
            return s.map(f -> f.getFileName().toString()).filter(n -> n.startsWith(".")).toList();
        }
    }

    /**
     * Kills a loop writing variants "a" and "b" of one output set into {@code out}; {@code whichRun} names the variant a
     * whole file belongs to and fails on a torn one.
     */
    private static void killOutputSet(List<String> loopArgs, Path out, List<String> names,
            Function<Path, String> whichRun, long minMs, long maxMs) throws Exception {
        SplittableRandom random = new SplittableRandom(7);
        int changes = 0;
        int killedMidSet = 0;
        String last = null;
        for (int k = 0; k < KILLS; k++) {
            kill(loop(loopArgs), random, minMs, maxMs);
            if (Files.isDirectory(out) && !hidden(out).isEmpty()) {
                killedMidSet++;
            }
            for (String n : names) {
                if (Files.exists(out.resolve(n))) {
                    whichRun.apply(out.resolve(n));
                }
            }
            if (Files.isDirectory(out)) {
                // what the next run does before it writes
                AtomicFiles.checkWritableFolder(out);
                OutputSet.recover(out);
                Set<String> runs = new HashSet<>();
                for (String n : names) {
                    if (Files.exists(out.resolve(n))) {
                        runs.add(whichRun.apply(out.resolve(n)));
                    }
                }
                assertThat(runs).as("runs of the set after kill %d and recovery", k).hasSizeLessThanOrEqualTo(1);
                assertThat(hidden(out)).as("temporary files after kill %d and recovery", k).isEmpty();
                String now = runs.isEmpty() ? null : runs.iterator().next();
                if (now != null && !now.equals(last)) {
                    changes++;
                }
                last = now;
            }
        }
        // the kills must have let runs finish between them, or the test proves nothing
        assertThat(changes).as("times the kept set changed between kills").isGreaterThan(5);
        System.out.println("KilledCommandTest: " + KILLS + " kills of " + loopArgs.get(0) + ", the kept set changed "
                + changes + " times, " + killedMidSet + " kills left a temporary set that recovery cleared");
    }

    private static String ending(Path html) {
        try {
            String text = Files.readString(html);
            assertThat(text).as("%s is whole", html.getFileName()).endsWith("</html>\n");
            return text;
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }

    private static JsonNode json(Path file) {
        try {
            return JSON.readTree(file.toFile());
        } catch (IOException e) {
            throw new AssertionError(file.getFileName() + " is torn: " + e.getMessage(), e);
        }
    }

    /** Two plans that differ in title and in the biexciton lifetime, so every file of their output sets differs. */
    private static Path planVariant(Path dir, String tag, String tau2) throws IOException {
        Path home = MainTest.HOME.resolve("experiments-plan").toAbsolutePath();
        String text = Files.readString(home.resolve("inp-zns-tcspc-5mhz.plan.json"))
                .replace("\"title\": \"", "\"title\": \"Kill test " + tag + ": ")
                .replace("\"biexcitonLifetime\": \"30 ps\"", "\"biexcitonLifetime\": \"" + tau2 + "\"")
                // one size and a short pulse: runs must finish between kills for the kills to land in their writes
                .replace("\"sizeDispersion\": \"10 %\"", "\"sizeDispersion\": \"0 %\"")
                .replace("\"pulseWidth\": \"60 ps\"", "\"pulseWidth\": \"0.1 ps\"")
                .replace("\"fh-inp-0031.absorption.csv\"", JSON.writeValueAsString(home.resolve("fh-inp-0031.absorption.csv").toString()));
        Path plan = dir.resolve("plan-" + tag + ".json");
        Files.writeString(plan, text);
        return plan;
    }

    @Test
    void planKilledAtRandomMomentsLeavesTheOldOrTheNewSetWhole(@TempDir Path dir) throws Exception {
        Path a = planVariant(dir, "a", "30 ps");
        Path b = planVariant(dir, "b", "36 ps");
        Map<String, String> traces = new HashMap<>();
        for (String tag : List.of("a", "b")) {
            Path ref = dir.resolve("ref-" + tag);
            MainTest.Run r = MainTest.run("plan", (tag.equals("a") ? a : b).toString(), "--out", ref.toString(), "--quiet");
            assertThat(r.exit()).as(r.err()).isZero();
            traces.put(Files.readString(ref.resolve("traces.csv")), tag);
        }
        assertThat(traces).as("the variants' traces differ").hasSize(2);
        Path out = dir.resolve("out");
        Function<Path, String> whichRun = f -> switch (f.getFileName().toString()) {
            case "plan-resolved.json" -> json(f).get("title").asText().substring(10, 11);
            case "report.html" -> ending(f).contains("Kill test a:") ? "a" : "b";
            default -> {
                try {
                    String tag = traces.get(Files.readString(f));
                    assertThat(tag).as("traces.csv is one of the two runs' files").isNotNull();
                    yield tag;
                } catch (IOException e) {
                    throw new AssertionError(e);
                }
            }
        };
        killOutputSet(List.of("plan", a.toString(), "--out", out.toString(), "--quiet", ";",
                "plan", b.toString(), "--out", out.toString(), "--quiet"), out,
                List.of("report.html", "plan-resolved.json", "traces.csv"), whichRun, 1_000, 7_000);
        MainTest.Run next = MainTest.run("plan", a.toString(), "--out", out.toString(), "--quiet");
        assertThat(next.exit()).as(next.err()).isZero();
        assertThat(hidden(out)).isEmpty();
    }

    @Test
    void fitKilledAtRandomMomentsLeavesTheOldOrTheNewSetWhole(@TempDir Path dir) throws Exception {
        Path csv = FitCommandTest.simulatedSeries(dir, 3);
        Path a = Files.copy(csv, dir.resolve("series-a.csv"));
        Path b = Files.copy(csv, dir.resolve("series-b.csv"));
        Path out = dir.resolve("out");
        Function<Path, String> whichRun = f -> {
            String text = f.getFileName().toString().endsWith(".html") ? ending(f) : json(f).toString();
            boolean isA = text.contains("series-a.csv");
            assertThat(isA).as("%s names exactly one of the runs' data files", f.getFileName()).isNotEqualTo(text.contains("series-b.csv"));
            return isA ? "a" : "b";
        };
        List<String> fit = List.of("--tau-rad", "20ns", "--tau-auger2", "70ps", "--fluences", "1e13,3e13,1e14,3e14",
                "--out", out.toString(), "--quiet");
        List<String> args = new ArrayList<>(List.of("fit", a.toString()));
        args.addAll(fit);
        args.addAll(List.of(";", "fit", b.toString()));
        args.addAll(fit);
        killOutputSet(args, out, List.of("fit-report.html", "fit-result.json", "fit-provenance.json"), whichRun, 1_000, 6_000);
        List<String> next = new ArrayList<>(List.of("fit", a.toString()));
        next.addAll(fit);
        MainTest.Run r = MainTest.run(next.toArray(String[]::new));
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(hidden(out)).isEmpty();
    }

    @Test
    void archiveAddKilledAtRandomMomentsKeepsOnlyWholeRows(@TempDir Path dir) throws Exception {
        Path csv = FitCommandTest.simulatedSeries(dir, 5);
        Path fitDir = dir.resolve("fit");
        MainTest.Run fit = MainTest.run("fit", csv.toString(), "--tau-rad", "20ns", "--tau-auger2", "70ps",
                "--fluences", "1e13,3e13,1e14,3e14", "--out", fitDir.toString(), "--quiet");
        assertThat(fit.exit()).as(fit.err()).isZero();
        Path planDir = dir.resolve("plan");
        MainTest.Run plan = MainTest.run("plan", planVariant(dir, "a", "30 ps").toString(), "--out", planDir.toString(), "--quiet");
        assertThat(plan.exit()).as(plan.err()).isZero();
        Path archiveDir = Files.createDirectory(dir.resolve("archive"));
        Path db = archiveDir.resolve("series.sqlite");
        List<String> addFit = List.of("archive", "add", "--archive", db.toString(), "--quiet", "--sample-name", "FH-kill-test",
                "--material", "CdSe", "--diameter", "4nm", fitDir.toString());
        List<String> addPlan = List.of("archive", "add", "--archive", db.toString(), "--quiet", planDir.toString());
        MainTest.Run first = MainTest.run(addFit.toArray(String[]::new));
        assertThat(first.exit()).as(first.err()).isZero();
        int parametersPerFit = count(db, "SELECT COUNT(*) FROM fit_parameter");
        assertThat(parametersPerFit).isGreaterThan(1);

        List<String> args = new ArrayList<>(addFit);
        args.add(";");
        args.addAll(addPlan);
        SplittableRandom random = new SplittableRandom(11);
        int rows = 1;
        int grew = 0;
        for (int k = 0; k < KILLS; k++) {
            kill(loop(args), random, 600, 3_000);
            try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db)) {
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("PRAGMA integrity_check")) {
                    r.next();
                    assertThat(r.getString(1)).as("integrity after kill %d", k).isEqualTo("ok");
                }
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(
                        "SELECT f.id, COUNT(p.name), (SELECT COUNT(*) FROM fit_data_file d WHERE d.fit_id = f.id)"
                                + " FROM fit f LEFT JOIN fit_parameter p ON p.fit_id = f.id GROUP BY f.id")) {
                    while (r.next()) {
                        assertThat(r.getInt(2)).as("parameters of fit F%d after kill %d", r.getLong(1), k).isEqualTo(parametersPerFit);
                        assertThat(r.getInt(3)).as("data files of fit F%d after kill %d", r.getLong(1), k).isEqualTo(1);
                    }
                }
                try (Statement s = c.createStatement(); ResultSet r = s.executeQuery("SELECT resolved_json FROM plan")) {
                    while (r.next()) {
                        assertThat(JSON.readTree(r.getString(1)).get("title").asText()).startsWith("Kill test a:");
                    }
                }
            }
            int now = count(db, "SELECT (SELECT COUNT(*) FROM fit) + (SELECT COUNT(*) FROM plan)");
            assertThat(now).as("committed rows survive kill %d", k).isGreaterThanOrEqualTo(rows);
            if (now > rows) {
                grew++;
            }
            rows = now;
        }
        assertThat(grew).as("kills after which rows had been added").isGreaterThan(5);
        MainTest.Run next = MainTest.run(addPlan.toArray(String[]::new));
        assertThat(next.exit()).as(next.err()).isZero();
        try (var left = Files.list(archiveDir)) {
            assertThat(left.map(f -> f.getFileName().toString())).as("nothing but the archive left").containsExactly("series.sqlite");
        }
        System.out.println("KilledCommandTest: " + KILLS + " kills of archive add, rows added between kills " + grew + " times, "
                + rows + " rows kept");
    }

    private static int count(Path db, String sql) throws Exception {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
                Statement s = c.createStatement(); ResultSet r = s.executeQuery(sql)) {
            r.next();
            return r.getInt(1);
        }
    }
}
