package org.ladderkin.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SqliteArchiveStoreTest extends ArchiveStoreContract {

    @TempDir
    Path dir;

    private int made;

    @Override
    String freshUrl() {
        return ArchiveStore.sqliteUrl(dir.resolve("archive-" + (made++) + ".sqlite").toString());
    }

    @Test
    void aDamagedFileIsOneClearUnreadableError() throws Exception {
        Path f = dir.resolve("damaged.sqlite");
        Files.writeString(f, "this was a spreadsheet once\n".repeat(200));
        assertThatThrownBy(() -> ArchiveStore.open(ArchiveStore.sqliteUrl(f.toString()), f.toString()))
                .isInstanceOf(ArchiveException.class)
                .hasMessageStartingWith(f + ": not a readable archive (the file is damaged or not a SQLite database")
                .extracting(e -> ((ArchiveException) e).kind()).isEqualTo(ArchiveException.Kind.UNREADABLE);
        assertThat(Files.readString(f)).startsWith("this was a spreadsheet once");
    }
}
