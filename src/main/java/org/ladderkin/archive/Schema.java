package org.ladderkin.archive;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;

/**
 * The archive's schema as numbered migrations, each run with its version row in one transaction, so a process killed
 * half-way leaves the previous version intact. An archive whose version is above {@link #CURRENT} was written by a
 * newer ladderkin and is refused before anything is read or written: an older binary cannot know what the newer
 * columns mean.
 *
 * <p>Plain numbered SQL rather than a migration library: the two statements that differ between SQLite and
 * PostgreSQL are one id column type ({@link Dialect}), and the refusal of a newer schema and the lock that keeps two
 * first starts apart must be exact, which is a dozen lines here.
 */
final class Schema {

    /** The newest schema version this program writes and reads. */
    static final int CURRENT = 1;

    /** Table holding one row per applied migration. */
    static final String VERSION_TABLE = "ladderkin_schema";

    /** Any fixed number: the PostgreSQL advisory lock that serialises migrations across processes. */
    private static final long MIGRATION_LOCK = 0x6c61646465726bL;

    private Schema() {
    }

    /** Migration {@code version} (1-based) as statements. */
    static List<String> migration(int version, Dialect d) {
        String id = d.idColumn();
        return switch (version) {
            case 1 -> List.of(
                    "CREATE TABLE sample (id " + id + ", name TEXT NOT NULL UNIQUE, material TEXT NOT NULL,"
                            + " size_m DOUBLE PRECISION, volume_m3 DOUBLE PRECISION, first_exciton_j DOUBLE PRECISION,"
                            + " size_dispersion DOUBLE PRECISION, shell TEXT NOT NULL, batch TEXT NOT NULL,"
                            + " made_on TEXT NOT NULL, notes TEXT NOT NULL, added_at TEXT NOT NULL)",
                    "CREATE TABLE plan (id " + id + ", sample_id BIGINT NOT NULL REFERENCES sample(id),"
                            + " added_at TEXT NOT NULL, title TEXT NOT NULL, source_dir TEXT NOT NULL,"
                            + " tool_version TEXT NOT NULL, resolved_json TEXT NOT NULL)",
                    "CREATE TABLE fit (id " + id + ", sample_id BIGINT NOT NULL REFERENCES sample(id),"
                            + " added_at TEXT NOT NULL, status TEXT NOT NULL, model TEXT NOT NULL, chi_square DOUBLE PRECISION,"
                            + " source_dir TEXT NOT NULL, tool_version TEXT NOT NULL, warning TEXT NOT NULL,"
                            + " superseded INTEGER NOT NULL DEFAULT 0, result_json TEXT NOT NULL)",
                    "CREATE TABLE fit_parameter (fit_id BIGINT NOT NULL REFERENCES fit(id), name TEXT NOT NULL,"
                            + " value DOUBLE PRECISION NOT NULL, std_error DOUBLE PRECISION, total_std_error DOUBLE PRECISION,"
                            + " fixed INTEGER NOT NULL, PRIMARY KEY (fit_id, name))",
                    "CREATE TABLE fit_data_file (fit_id BIGINT NOT NULL REFERENCES fit(id), position INTEGER NOT NULL,"
                            + " path TEXT NOT NULL, sha256 TEXT NOT NULL, PRIMARY KEY (fit_id, position))",
                    "CREATE INDEX fit_by_sample ON fit (sample_id)",
                    "CREATE INDEX plan_by_sample ON plan (sample_id)");
            default -> throw new IllegalArgumentException("no migration " + version);
        };
    }

    /**
     * Brings the archive behind {@code c} to {@link #CURRENT}, or refuses it when it is newer. Leaves {@code c} in
     * auto-commit on with the migration committed.
     */
    static void migrate(Connection c, Dialect d, String where) throws SQLException {
        c.setAutoCommit(false);
        try (Statement s = c.createStatement()) {
            if (d == Dialect.POSTGRESQL) {
                // two first starts at once would both create the tables; the second waits here and then finds them
                s.execute("SELECT pg_advisory_xact_lock(" + MIGRATION_LOCK + ")");
            }
            s.execute("CREATE TABLE IF NOT EXISTS " + VERSION_TABLE + " (version INTEGER NOT NULL, applied_at TEXT NOT NULL)");
            int have = 0;
            try (ResultSet r = s.executeQuery("SELECT MAX(version) FROM " + VERSION_TABLE)) {
                if (r.next()) {
                    have = r.getInt(1);
                }
            }
            if (have > CURRENT) {
                c.rollback();
                throw new ArchiveException(ArchiveException.Kind.NEWER_SCHEMA, where + ": archive schema version " + have
                        + " is newer than this ladderkin reads (" + CURRENT + "); use a newer ladderkin");
            }
            for (int v = have + 1; v <= CURRENT; v++) {
                for (String sql : migration(v, d)) {
                    s.execute(sql);
                }
                s.execute("INSERT INTO " + VERSION_TABLE + " (version, applied_at) VALUES (" + v + ", '" + Instant.now() + "')");
            }
            c.commit();
        } catch (SQLException | RuntimeException e) {
            rollbackQuietly(c);
            throw e;
        } finally {
            ArchiveStore.autoCommit(c);
        }
    }

    static void rollbackQuietly(Connection c) {
        try {
            c.rollback();
        } catch (SQLException ignored) {
            // the original failure is the one worth reporting
        }
    }
}
