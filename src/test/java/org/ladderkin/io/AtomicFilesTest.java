package org.ladderkin.io;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @Test
    void failureMidwayLeavesTheOldFileIntactAndNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("report.html");
        Files.writeString(target, "the old, complete report");
        assertThatThrownBy(() -> AtomicFiles.write(target, out -> {
            out.write("<html><body>half a new rep".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full (simulated)");
        })).isInstanceOf(IOException.class).hasMessage("disk full (simulated)");
        assertThat(Files.readString(target)).isEqualTo("the old, complete report");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(target);
        }
    }

    @Test
    void aWriteCheckFileLeftByAKilledRunIsRemovedByTheNextCheck(@TempDir Path dir) throws Exception {
        Process dead = new ProcessBuilder("true").start();
        dead.waitFor();
        Path left = Files.createFile(dir.resolve(".ladderkin-write-check." + dead.pid() + "-123.tmp"));
        Path running = Files.createFile(dir.resolve(".ladderkin-write-check." + ProcessHandle.current().pid() + "-456.tmp"));
        AtomicFiles.checkWritableFolder(dir);
        assertThat(left).doesNotExist();
        assertThat(running).exists();
    }

    @Test
    void runtimeFailureMidwayAlsoLeavesTheOldFile(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("plan.json");
        Files.writeString(target, "{}");
        assertThatThrownBy(() -> AtomicFiles.writeText(target, w -> {
            w.write("{\"half\": ");
            throw new IllegalStateException("bug while serialising");
        })).isInstanceOf(IllegalStateException.class);
        assertThat(Files.readString(target)).isEqualTo("{}");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(target);
        }
    }

    @Test
    void replacingAFileKeepsItsPermissions(@TempDir Path dir) throws IOException {
        org.junit.jupiter.api.Assumptions.assumeTrue(dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path target = dir.resolve("shared.plan.json");
        Files.writeString(target, "{}");
        var perms = java.nio.file.attribute.PosixFilePermissions.fromString("rw-rw-r--");
        Files.setPosixFilePermissions(target, perms);
        AtomicFiles.writeString(target, "{\"a\": 1}");
        assertThat(Files.getPosixFilePermissions(target)).isEqualTo(perms);
        Path fresh = dir.resolve("new.csv");
        AtomicFiles.writeString(fresh, "x\n");
        assertThat(Files.getPosixFilePermissions(fresh)).isEqualTo(java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--"));
    }

    @Test
    void successReplacesTheFileAndCreatesFolders(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("a/b/out.csv");
        AtomicFiles.writeString(target, "x,y\n1,2\n");
        assertThat(Files.readString(target)).isEqualTo("x,y\n1,2\n");
        AtomicFiles.writeString(target, "x,y\n3,4\n");
        assertThat(Files.readString(target)).isEqualTo("x,y\n3,4\n");
        try (Stream<Path> files = Files.list(target.getParent())) {
            assertThat(files).containsExactly(target);
        }
    }

    /** A run killed while writing left ".report.html.<random>.tmp" behind, and no later run removed it. */
    @Test
    void temporaryFilesOfKilledWritersAreRemovedByTheNextWrite(@TempDir Path dir) throws Exception {
        Process finished = new ProcessBuilder("true").start();
        finished.waitFor();
        long deadPid = finished.pid();
        long alivePid = ProcessHandle.current().pid();
        Path dead = Files.writeString(dir.resolve(".report.html." + deadPid + "-123456.tmp"), "torn");
        Path alive = Files.writeString(dir.resolve(".report.html." + alivePid + "-42.tmp"), "being written");
        Path oldUnowned = Files.writeString(dir.resolve(".report.html.987654321.tmp"), "old");
        Files.setLastModifiedTime(oldUnowned, java.nio.file.attribute.FileTime.from(java.time.Instant.now().minusSeconds(3600)));
        Path recentUnowned = Files.writeString(dir.resolve(".report.html.123.tmp"), "recent");
        Path otherFile = Files.writeString(dir.resolve(".traces.csv." + deadPid + "-1.tmp"), "another file's");
        AtomicFiles.writeString(dir.resolve("report.html"), "new");
        assertThat(Files.readString(dir.resolve("report.html"))).isEqualTo("new");
        assertThat(dead).doesNotExist();
        assertThat(oldUnowned).doesNotExist();
        assertThat(alive).exists();
        assertThat(recentUnowned).exists();
        assertThat(otherFile).exists();
        try (var left = Files.list(dir)) {
            assertThat(left.map(p -> p.getFileName().toString())).containsExactlyInAnyOrder("report.html",
                    alive.getFileName().toString(), recentUnowned.getFileName().toString(), otherFile.getFileName().toString());
        }
    }
}
