package org.ladderkin.archive;

/** Durability on a SQLite file. */
class SqliteArchiveDurabilityTest extends ArchiveDurabilityContract {

    private int made;

    @Override
    String freshArchive() {
        return dir.resolve("durable-" + (made++) + ".sqlite").toString();
    }
}
