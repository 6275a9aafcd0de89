package org.ladderkin.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Durability of {@code archive add} with real processes, on each database: two processes adding at once lose nothing,
 * and a process killed with SIGKILL while adding leaves only whole fits behind (each add is one transaction).
 */
abstract class ArchiveDurabilityContract {

    /** Parameters per archived fit: enough rows that a kill lands inside an add's transaction. */
    static final int PARAMETERS = 400;

    @TempDir
    Path dir;

    /** A fresh archive: a file path or a JDBC URL, as {@code --archive} takes it. */
    abstract String freshArchive() throws Exception;

    /** A fit output folder with many parameters and one data file, as {@code fit --out} would leave it. */
    Path fitFolder(String sampleName) throws Exception {
        Path d = Files.createDirectories(dir.resolve("fit-" + sampleName));
        Path data = d.resolve("data.csv");
        Files.writeString(data, "delay (ps),F1\n1,0.01\n2,0.008\n");
        StringBuilder params = new StringBuilder();
        for (int i = 0; i < PARAMETERS; i++) {
            params.append(i == 0 ? "" : ",").append("\"p").append(i).append("Ps\": {\"value\": ").append(1 + i)
                    .append(", \"stdError\": 0.1, \"fixed\": false}");
        }
        Files.writeString(d.resolve("fit-result.json"), "{\"schema\": \"ladderkin.fit-result/1\", \"status\": \"converged\","
                + " \"dataFiles\": [\"" + data + "\"], \"parameters\": {" + params + "}, \"statistics\": {\"chiSquare\": 80.5}}");
        Files.writeString(d.resolve("fit-provenance.json"), "{\"schema\": \"ladderkin.fit-provenance/1\", \"toolVersion\": \"test\","
                + " \"model\": \"ladder\", \"sample\": {\"name\": \"" + sampleName + "\", \"material\": \"CdSe\", \"sizeNm\": 4.0,"
                + " \"volumeNm3\": 33.5, \"firstExcitonEv\": 2.1, \"sizeDispersion\": 0.06}, \"dataFiles\": [{\"path\": \""
                + data + "\", \"sha256\": \"" + org.ladderkin.archive.DigestsForTests.sha256(data) + "\"}]}");
        return d;
    }

    static Process child(String archive, Path folder, int count) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-XX:+UseSerialGC", "-XX:TieredStopAtLevel=1",
                "-Dladderkin.home=" + System.getProperty("ladderkin.home", "."), "-cp", System.getProperty("java.class.path"),
                ArchiveAddLoop.class.getName(), archive, folder.toString(), Integer.toString(count));
        pb.redirectErrorStream(true);
        return pb.start();
    }

    static String jdbc(String archive) {
        return archive.startsWith("jdbc:") ? archive : ArchiveStore.sqliteUrl(archive);
    }

    /** Every fit row whole: all its parameters and its data file. */
    static void assertEveryFitWhole(String archive, int atLeast) {
        try (ArchiveStore a = ArchiveStore.open(jdbc(archive), "check")) {
            List<ArchivedFit> fits = a.fits(FitQuery.all());
            assertThat(fits).hasSizeGreaterThanOrEqualTo(atLeast);
            assertThat(fits).allSatisfy(f -> {
                assertThat(f.fit().parameters()).hasSize(PARAMETERS);
                assertThat(f.fit().dataFiles()).hasSize(1);
            });
        }
    }

    @Test
    void twoProcessesAddingAtOnceLoseNothing() throws Exception {
        String archive = freshArchive();
        Path a = fitFolder("FH-CdSe-shared");
        Path b = fitFolder("FH-CdSe-other");
        int each = 12;
        Process p1 = child(archive, a, each);
        Process p2 = child(archive, b, each);
        String out1 = new String(p1.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String out2 = new String(p2.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertThat(p1.waitFor(5, TimeUnit.MINUTES)).isTrue();
        assertThat(p2.waitFor(5, TimeUnit.MINUTES)).isTrue();
        assertThat(p1.exitValue()).as(out1).isZero();
        assertThat(p2.exitValue()).as(out2).isZero();
        assertEveryFitWhole(archive, 2 * each);
        try (ArchiveStore s = ArchiveStore.open(jdbc(archive), "check")) {
            assertThat(s.fits(FitQuery.all())).hasSize(2 * each);
            assertThat(s.samples(FitQuery.all())).extracting(x -> x.sample().name() + ":" + x.fits())
                    .containsExactlyInAnyOrder("FH-CdSe-shared:" + each, "FH-CdSe-other:" + each);
        }
    }

    @Test
    void aProcessKilledWhileAddingLeavesOnlyWholeFits() throws Exception {
        String archive = freshArchive();
        Path folder = fitFolder("FH-CdSe-killed");
        Process p = child(archive, folder, 100_000);
        BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        List<String> lines = new ArrayList<>();
        while (lines.size() < 5) {
            String line = r.readLine();
            assertThat(line).as("child output so far: " + lines).isNotNull().isEqualTo("added");
            lines.add(line);
        }
        // SIGKILL on Linux: no shutdown hooks, no rollback by the child; whatever it was writing is cut off
        p.destroyForcibly();
        assertThat(p.waitFor(1, TimeUnit.MINUTES)).isTrue();
        assertEveryFitWhole(archive, 5);
        // and the archive still takes new rows
        try (ArchiveStore s = ArchiveStore.open(jdbc(archive), "check")) {
            int before = s.fits(FitQuery.all()).size();
            s.addFit(SampleEntry.of("FH-after", "CdSe", 4e-9, Double.NaN, Double.NaN), new FitEntry("{}", "converged", "",
                    Double.NaN, List.of(), List.of(), "", "", ""));
            assertThat(s.fits(FitQuery.all())).hasSize(before + 1);
        }
    }
}
