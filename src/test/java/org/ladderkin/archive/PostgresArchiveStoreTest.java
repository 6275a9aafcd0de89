package org.ladderkin.archive;

/** The archive contract on a real PostgreSQL server (skipped, with a message, when none is reachable). */
class PostgresArchiveStoreTest extends ArchiveStoreContract {

    @Override
    String freshUrl() throws Exception {
        return PostgresArchive.freshSchemaUrl();
    }
}
