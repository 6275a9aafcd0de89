package org.ladderkin.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The archive's commands on bad input: one located line and exit 3, never a stack trace. */
class ArchiveCommandTest {

    @TempDir
    Path dir;

    private String archive() {
        return dir.resolve("a.sqlite").toString();
    }

    @Test
    void aFolderWithNeitherAPlanNorAFitIsRefused() throws Exception {
        Path empty = Files.createDirectories(dir.resolve("notes"));
        Files.writeString(empty.resolve("readme.txt"), "nothing to archive");
        Cli.Run r = Cli.run("archive", "add", empty.toString(), "--archive", archive());
        assertThat(r.exit()).isEqualTo(3);
        assertThat(r.err().strip()).isEqualTo("ladderkin: " + empty + ": holds neither a plan output (plan-resolved.json) "
                + "nor a fit output (fit-result.json)");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void aFitWhoseDataChangedIsKeptWithAWarning() throws Exception {
        Path csv = dir.resolve("fh-cdse.csv");
        SizeSeriesEndToEndTest.writeSeries(csv, 4.0, new SplittableRandom(7));
        Path out = dir.resolve("fit");
        Cli.Run fit = Cli.run("fit", csv.toString(), "--fluences", SizeSeriesEndToEndTest.fluences(), "--tau-rad", "20ns",
                "--tau-auger2", "10ps", "--cross-section", "2e-15cm2", "--quiet", "--sample-name", "FH-CdSe-W",
                "--material", "CdSe", "--first-peak", "560nm", "--out", out.toString());
        assertThat(fit.exit()).as(fit.err()).isZero();
        assertThat(out.resolve("fit-provenance.json")).content().contains(DigestsForTests.sha256(csv));
        Files.writeString(csv, Files.readString(csv).replace("delay (ps)", "delay (ps) "));

        Cli.Run add = Cli.run("archive", "add", out.toString(), "--archive", archive());
        assertThat(add.exit()).isZero();
        assertThat(add.out()).startsWith("added fit F1 (sample FH-CdSe-W)");
        assertThat(add.err().strip()).startsWith("warning: fit F1 from " + out + ": data file " + csv.toAbsolutePath()
                + " changed since the fit (SHA-256 ");
        Cli.Run show = Cli.run("archive", "show", "F1", "--archive", archive());
        assertThat(show.out()).contains("FH-CdSe-W (CdSe", "tauAuger2Ps", "warning: data file", "sha256 ");
        Cli.Run list = Cli.run("archive", "list", "--archive", archive());
        assertThat(list.out()).contains("F1 ", "(warning)");
        Cli.Run csvExport = Cli.run("archive", "export", "--format", "csv", "--archive", archive());
        assertThat(csvExport.out().lines().toList()).hasSize(2);
        assertThat(csvExport.out()).contains("tauAuger2Ps,tauAuger2PsStdError", "FH-CdSe-W,CdSe");
        Cli.Run json = Cli.run("archive", "export", "--format", "json", "--archive", archive());
        assertThat(json.out()).contains("\"schema\" : \"ladderkin.archive-export/1\"", "\"tauAuger2Ps\"");
    }

    @Test
    void anUnknownYQuantityIsOneLine() {
        Cli.Run r = Cli.run("trend", "--x", "volume", "--y", "tauAuger9", "--archive", archive());
        assertThat(r.exit()).isEqualTo(3);
        assertThat(r.err().strip()).isEqualTo("ladderkin: unknown --y quantity 'tauAuger9' (tauAuger2, tauAuger3, crossSection, "
                + "tauRad, multiplicationYield)");
    }

    @Test
    void aCorruptedArchiveFileIsOneLineAndExitThree() throws Exception {
        Path bad = dir.resolve("broken.sqlite");
        byte[] junk = new byte[8192];
        new SplittableRandom(3).nextBytes(junk);
        Files.write(bad, junk);
        Cli.Run r = Cli.run("archive", "list", "--archive", bad.toString());
        assertThat(r.exit()).isEqualTo(3);
        assertThat(r.err().lines().toList()).hasSize(1);
        assertThat(r.err()).startsWith("ladderkin: " + bad + ": not a readable archive (the file is damaged or not a SQLite "
                + "database").doesNotContain("at org.");
    }

    @Test
    void aNewerSchemaIsRefusedByThisBinary() throws Exception {
        assertThat(Cli.run("archive", "list", "--archive", archive()).exit()).isZero();
        try (Connection c = DriverManager.getConnection(ArchiveStore.sqliteUrl(archive())); Statement s = c.createStatement()) {
            s.execute("INSERT INTO ladderkin_schema (version, applied_at) VALUES (99, 'later')");
        }
        Cli.Run r = Cli.run("archive", "list", "--archive", archive());
        assertThat(r.exit()).isEqualTo(3);
        assertThat(r.err().strip()).isEqualTo("ladderkin: " + archive() + ": archive schema version 99 is newer than this "
                + "ladderkin reads (" + Schema.CURRENT + "); use a newer ladderkin");
    }

    @Test
    void fitArchiveWithoutASampleIsRefusedBeforeTheWork() throws Exception {
        Path csv = dir.resolve("x.csv");
        Files.writeString(csv, "delay (ps),F1\n1,0.01\n2,0.008\n");
        Cli.Run r = Cli.run("fit", csv.toString(), "--fluences", "1e13", "--out", dir.resolve("o").toString(),
                "--archive", archive());
        assertThat(r.exit()).isEqualTo(3);
        assertThat(r.err().strip()).startsWith("ladderkin: --archive needs the fit's sample");
        assertThat(dir.resolve("o")).doesNotExist();
    }

    @Test
    void planArchiveKeepsTheResolvedPlanUnderItsSample() throws Exception {
        Path home = Path.of(System.getProperty("ladderkin.home", "."));
        Path out = dir.resolve("plan");
        Cli.Run r = Cli.run("plan", home.resolve("experiments-plan/cdse-auger-1khz.plan.json").toString(), "--out", out.toString(),
                "--quiet", "--archive", archive());
        assertThat(r.exit()).as(r.err()).isZero();
        try (ArchiveStore a = ArchiveStore.open(ArchiveStore.sqliteUrl(archive()), "check")) {
            ArchivedPlan p = a.plans(FitQuery.all()).get(0);
            assertThat(p.sample().name()).isEqualTo("FH-CdSe-0412 (invented batch)");
            assertThat(p.sample().material()).isEqualTo("CdSe");
            assertThat(p.sample().volumeM3()).isPositive();
            assertThat(p.plan().resolvedJson()).isEqualTo(Files.readString(out.resolve("plan-resolved.json")));
        }
        // the plan folder can be added again later: a new row, nothing overwritten
        assertThat(Cli.run("archive", "add", out.toString(), "--archive", archive()).out()).startsWith("added plan P2");
        assertThat(Cli.run("archive", "show", "P1", "--archive", archive()).out()).contains("FH-CdSe-0412");
    }
}
