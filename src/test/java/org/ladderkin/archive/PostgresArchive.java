package org.ladderkin.archive;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.UUID;

/**
 * The PostgreSQL server the archive tests use: {@code LADDERKIN_TEST_PG_URL} (a JDBC URL with user, e.g.
 * {@code jdbc:postgresql://127.0.0.1:54329/postgres?user=postgres}; {@code .ci/run} starts a throw-away cluster and
 * sets it). Each test gets a schema of its own. Without a reachable server the tests skip, saying so.
 */
final class PostgresArchive {

    static final String ENV = "LADDERKIN_TEST_PG_URL";

    private PostgresArchive() {
    }

    /** The server's URL, or a skipped test with the reason. */
    static String serverUrl() {
        String url = System.getenv(ENV);
        assumeTrue(url != null && !url.isBlank(), "PostgreSQL archive tests skipped: no server (set " + ENV
                + " to a jdbc:postgresql: URL; .ci/run starts one)");
        try (Connection c = DriverManager.getConnection(url)) {
            assumeTrue(c.isValid(5), "PostgreSQL archive tests skipped: " + url + " does not answer");
        } catch (SQLException e) {
            assumeTrue(false, "PostgreSQL archive tests skipped: cannot reach " + url + " (" + e.getMessage() + ")");
        }
        return url;
    }

    /** A URL on a new, empty schema of the server. */
    static String freshSchemaUrl() throws SQLException {
        String url = serverUrl();
        String schema = "lk_" + UUID.randomUUID().toString().replace("-", "");
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        }
        return url + (url.contains("?") ? "&" : "?") + "currentSchema=" + schema;
    }
}
