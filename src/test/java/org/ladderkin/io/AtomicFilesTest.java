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
}
