package org.ladderkin.archive;

/** Durability on a PostgreSQL server (skipped, with a message, when none is reachable). */
class PostgresArchiveDurabilityTest extends ArchiveDurabilityContract {

    @Override
    String freshArchive() throws Exception {
        return PostgresArchive.freshSchemaUrl();
    }
}
