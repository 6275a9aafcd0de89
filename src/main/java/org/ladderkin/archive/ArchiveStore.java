package org.ladderkin.archive;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;

/**
 * The sample-series archive behind one JDBC URL: a SQLite file ({@code jdbc:sqlite:/path}) or a shared PostgreSQL
 * database ({@code jdbc:postgresql://host:port/db}), with the same SQL. Nothing is overwritten: an add is one
 * transaction that writes new rows (a sample is written once, by name, and later rows link to it), and the only change
 * to an existing row is marking a fit superseded.
 *
 * <p>Two processes may add at once: SQLite writers take the write lock at the start of their transaction and wait up
 * to {@link #BUSY_TIMEOUT_MS} for each other; PostgreSQL rows are independent and a sample both add is written once
 * ({@code ON CONFLICT DO NOTHING}).
 */
public final class ArchiveStore implements AutoCloseable {

    /** How long a SQLite writer waits for another one before giving up (ms). */
    static final int BUSY_TIMEOUT_MS = 60_000;

    private final Connection connection;
    private final Dialect dialect;
    private final String where;

    private ArchiveStore(Connection connection, Dialect dialect, String where) {
        this.connection = connection;
        this.dialect = dialect;
        this.where = where;
    }

    /** The JDBC URL of the SQLite file at {@code absolutePath}. */
    public static String sqliteUrl(String absolutePath) {
        return "jdbc:sqlite:" + absolutePath;
    }

    /**
     * Opens (and creates or migrates) the archive at {@code jdbcUrl}; {@code where} names it in messages (a file path,
     * or the URL without credentials).
     */
    public static ArchiveStore open(String jdbcUrl, String where) {
        Dialect d = Dialect.of(jdbcUrl);
        Properties props = new Properties();
        if (d == Dialect.SQLITE) {
            props.setProperty("busy_timeout", Integer.toString(BUSY_TIMEOUT_MS));
            props.setProperty("journal_mode", "WAL");
            props.setProperty("foreign_keys", "true");
            // the write lock at BEGIN: two writers that both read first would otherwise deadlock on the upgrade
            props.setProperty("transaction_mode", "IMMEDIATE");
        }
        Connection c;
        try {
            c = DriverManager.getConnection(jdbcUrl, props);
        } catch (SQLException e) {
            throw unreadable(where, e);
        }
        try {
            Schema.migrate(c, d, where);
            return new ArchiveStore(c, d, where);
        } catch (SQLException e) {
            closeQuietly(c);
            throw unreadable(where, e);
        } catch (RuntimeException e) {
            closeQuietly(c);
            throw e;
        }
    }

    /** The schema version of the open archive. */
    public int schemaVersion() {
        return query("SELECT MAX(version) FROM " + Schema.VERSION_TABLE, List.of(), r -> r.getInt(1)).get(0);
    }

    /** Adds {@code fit} under {@code sample} (written if new) in one transaction; returns the fit's id. */
    public long addFit(SampleEntry sample, FitEntry fit) {
        return inTransaction(() -> {
            long sampleId = sampleId(sample);
            long id = insert("INSERT INTO fit (sample_id, added_at, status, model, chi_square, source_dir, tool_version,"
                    + " warning, superseded, result_json) VALUES (?, ?, ?, ?, ?, ?, ?, ?, 0, ?)", sampleId, now(), fit.status(),
                    fit.model(), fit.chiSquare(), fit.sourceDir(), fit.toolVersion(), fit.warning(), fit.resultJson());
            for (FitParameter p : fit.parameters()) {
                insertNoKey("INSERT INTO fit_parameter (fit_id, name, value, std_error, total_std_error, fixed)"
                        + " VALUES (?, ?, ?, ?, ?, ?)", id, p.key(), p.value(), p.stdError(), p.totalStdError(), p.fixed() ? 1 : 0);
            }
            int position = 0;
            for (DataFileHash f : fit.dataFiles()) {
                insertNoKey("INSERT INTO fit_data_file (fit_id, position, path, sha256) VALUES (?, ?, ?, ?)", id, position++,
                        f.path(), f.sha256());
            }
            return id;
        });
    }

    /** Adds {@code plan} under {@code sample} (written if new) in one transaction; returns the plan's id. */
    public long addPlan(SampleEntry sample, PlanEntry plan) {
        return inTransaction(() -> insert("INSERT INTO plan (sample_id, added_at, title, source_dir, tool_version,"
                + " resolved_json) VALUES (?, ?, ?, ?, ?, ?)", sampleId(sample), now(), plan.title(), plan.sourceDir(),
                plan.toolVersion(), plan.resolvedJson()));
    }

    /** Marks fit {@code id} superseded (kept, left out of listings and trends unless asked for). */
    public void markSuperseded(long id) {
        inTransaction(() -> {
            int n = update("UPDATE fit SET superseded = 1 WHERE id = ?", id);
            if (n == 0) {
                throw new ArchiveException(ArchiveException.Kind.NOT_FOUND, where + ": no fit " + id);
            }
            return (long) n;
        });
    }

    /** Every sample, with how many plans and fits it has, in the order added. */
    public List<ArchivedSample> samples(FitQuery q) {
        List<ArchivedSample> out = new ArrayList<>();
        for (ArchivedSample s : query("SELECT s.*, (SELECT COUNT(*) FROM plan p WHERE p.sample_id = s.id) AS plans,"
                + " (SELECT COUNT(*) FROM fit f WHERE f.sample_id = s.id) AS fits FROM sample s ORDER BY s.id", List.of(),
                r -> new ArchivedSample(r.getLong("id"), r.getString("added_at"), sample(r), r.getInt("plans"), r.getInt("fits")))) {
            if (q.accepts(s.sample(), false)) {
                out.add(s);
            }
        }
        return out;
    }

    /** The fits {@code q} selects, oldest first. */
    public List<ArchivedFit> fits(FitQuery q) {
        return fitsWhere("", List.of(), q);
    }

    /** Fit {@code id}. */
    public ArchivedFit fit(long id) {
        List<ArchivedFit> f = fitsWhere(" WHERE f.id = ?", List.of(id), new FitQuery(List.of(), null, true));
        if (f.isEmpty()) {
            throw new ArchiveException(ArchiveException.Kind.NOT_FOUND, where + ": no fit " + id);
        }
        return f.get(0);
    }

    /** The plans {@code q} selects, oldest first. */
    public List<ArchivedPlan> plans(FitQuery q) {
        return plansWhere("", List.of(), q);
    }

    /** Plan {@code id}. */
    public ArchivedPlan plan(long id) {
        List<ArchivedPlan> p = plansWhere(" WHERE p.id = ?", List.of(id), new FitQuery(List.of(), null, true));
        if (p.isEmpty()) {
            throw new ArchiveException(ArchiveException.Kind.NOT_FOUND, where + ": no plan " + id);
        }
        return p.get(0);
    }

    @Override
    public void close() {
        closeQuietly(connection);
    }

    // ---- rows

    private List<ArchivedFit> fitsWhere(String condition, List<Object> args, FitQuery q) {
        List<Object[]> rows = query("SELECT f.*, s.id AS sid, s.name, s.material, s.size_m, s.volume_m3, s.first_exciton_j,"
                + " s.size_dispersion, s.shell, s.batch, s.made_on, s.notes FROM fit f JOIN sample s ON s.id = f.sample_id"
                + condition + " ORDER BY f.id", args, r -> new Object[] {r.getLong("id"), r.getString("added_at"), r.getLong("sid"),
                    sample(r), r.getInt("superseded") != 0, r.getString("result_json"), r.getString("status"), r.getString("model"),
                    nullable(r, "chi_square"), r.getString("source_dir"), r.getString("tool_version"), r.getString("warning")});
        Map<Long, List<FitParameter>> params = new LinkedHashMap<>();
        Map<Long, List<DataFileHash>> files = new LinkedHashMap<>();
        query("SELECT fit_id, name, value, std_error, total_std_error, fixed FROM fit_parameter ORDER BY fit_id, name", List.of(),
                r -> params.computeIfAbsent(r.getLong(1), k -> new ArrayList<>()).add(new FitParameter(r.getString(2),
                        r.getDouble(3), nullable(r, "std_error"), nullable(r, "total_std_error"), r.getInt(6) != 0)));
        query("SELECT fit_id, path, sha256 FROM fit_data_file ORDER BY fit_id, position", List.of(),
                r -> files.computeIfAbsent(r.getLong(1), k -> new ArrayList<>()).add(new DataFileHash(r.getString(2), r.getString(3))));
        List<ArchivedFit> out = new ArrayList<>();
        for (Object[] o : rows) {
            SampleEntry s = (SampleEntry) o[3];
            boolean superseded = (Boolean) o[4];
            if (!q.accepts(s, superseded)) {
                continue;
            }
            long id = (Long) o[0];
            FitEntry fit = new FitEntry((String) o[5], (String) o[6], (String) o[7], (Double) o[8],
                    params.getOrDefault(id, List.of()), files.getOrDefault(id, List.of()), (String) o[9], (String) o[10], (String) o[11]);
            out.add(new ArchivedFit(id, (String) o[1], (Long) o[2], s, superseded, fit));
        }
        return out;
    }

    private List<ArchivedPlan> plansWhere(String condition, List<Object> args, FitQuery q) {
        List<ArchivedPlan> all = query("SELECT p.*, s.id AS sid, s.name, s.material, s.size_m, s.volume_m3, s.first_exciton_j,"
                + " s.size_dispersion, s.shell, s.batch, s.made_on, s.notes FROM plan p JOIN sample s ON s.id = p.sample_id"
                + condition + " ORDER BY p.id", args, r -> new ArchivedPlan(r.getLong("id"), r.getString("added_at"), r.getLong("sid"),
                    sample(r), new PlanEntry(r.getString("resolved_json"), r.getString("title"), r.getString("source_dir"),
                    r.getString("tool_version"))));
        return all.stream().filter(p -> q.accepts(p.sample(), false)).toList();
    }

    private static SampleEntry sample(ResultSet r) throws SQLException {
        return new SampleEntry(r.getString("name"), r.getString("material"), nullable(r, "size_m"), nullable(r, "volume_m3"),
                nullable(r, "first_exciton_j"), nullable(r, "size_dispersion"), r.getString("shell"), r.getString("batch"),
                r.getString("made_on"), r.getString("notes"));
    }

    /** The id of the sample named as {@code s}, writing it first if the archive has none by that name. */
    private long sampleId(SampleEntry s) throws SQLException {
        update("INSERT INTO sample (name, material, size_m, volume_m3, first_exciton_j, size_dispersion, shell, batch, made_on,"
                + " notes, added_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (name) DO NOTHING", s.name(), s.material(),
                s.sizeM(), s.volumeM3(), s.firstExcitonJ(), s.sizeDispersion(), s.shell(), s.batch(), s.madeOn(), s.notes(), now());
        List<Object[]> found = query("SELECT id, material FROM sample WHERE name = ?", List.of(s.name()),
                r -> new Object[] {r.getLong(1), r.getString(2)});
        String material = (String) found.get(0)[1];
        if (!material.equalsIgnoreCase(s.material())) {
            throw new ArchiveException(ArchiveException.Kind.INVALID, where + ": sample '" + s.name() + "' is " + material
                    + " in the archive, not " + s.material() + " (give the new sample another name)");
        }
        return (Long) found.get(0)[0];
    }

    // ---- JDBC plumbing

    private interface Work<T> {
        T run() throws SQLException;
    }

    private interface RowReader<T> {
        T read(ResultSet r) throws SQLException;
    }

    private <T> T inTransaction(Work<T> work) {
        try {
            // outside a transaction the connection auto-commits: a SQLite connection left in a transaction would hold
            // the write lock (taken at BEGIN IMMEDIATE) and keep every other process waiting
            connection.setAutoCommit(false);
            T result = work.run();
            connection.commit();
            return result;
        } catch (SQLException e) {
            Schema.rollbackQuietly(connection);
            throw unreadable(where, e);
        } catch (RuntimeException e) {
            Schema.rollbackQuietly(connection);
            throw e;
        } finally {
            autoCommit(connection);
        }
    }

    private <T> List<T> query(String sql, List<Object> args, RowReader<T> reader) {
        try (PreparedStatement s = connection.prepareStatement(sql)) {
            bind(s, args.toArray());
            List<T> out = new ArrayList<>();
            try (ResultSet r = s.executeQuery()) {
                while (r.next()) {
                    out.add(reader.read(r));
                }
            }
            return out;
        } catch (SQLException e) {
            throw unreadable(where, e);
        }
    }

    private long insert(String sql, Object... args) throws SQLException {
        try (PreparedStatement s = connection.prepareStatement(sql, Statement.RETURN_GENERATED_KEYS)) {
            bind(s, args);
            s.executeUpdate();
            try (ResultSet k = s.getGeneratedKeys()) {
                if (!k.next()) {
                    throw new SQLException("no id returned for a new row");
                }
                return k.getLong(1);
            }
        }
    }

    private void insertNoKey(String sql, Object... args) throws SQLException {
        update(sql, args);
    }

    private int update(String sql, Object... args) throws SQLException {
        try (PreparedStatement s = connection.prepareStatement(sql)) {
            bind(s, args);
            return s.executeUpdate();
        }
    }

    private static void bind(PreparedStatement s, Object[] args) throws SQLException {
        for (int i = 0; i < args.length; i++) {
            Object a = args[i];
            if (a instanceof Double d && !Double.isFinite(d)) {
                // NaN means "not known": NULL in both databases (PostgreSQL would keep a NaN, SQLite would not)
                s.setNull(i + 1, java.sql.Types.DOUBLE);
            } else if (a instanceof Double d) {
                s.setDouble(i + 1, d);
            } else if (a instanceof Long l) {
                s.setLong(i + 1, l);
            } else if (a instanceof Integer n) {
                s.setInt(i + 1, n);
            } else {
                s.setString(i + 1, (String) a);
            }
        }
    }

    private static double nullable(ResultSet r, String column) throws SQLException {
        double v = r.getDouble(column);
        return r.wasNull() ? Double.NaN : v;
    }

    private static String now() {
        return Instant.now().toString();
    }

    private static ArchiveException unreadable(String where, SQLException e) {
        String m = String.valueOf(e.getMessage()).lines().findFirst().orElse("").trim();
        if (m.contains("SQLITE_NOTADB") || m.contains("SQLITE_CORRUPT")) {
            return new ArchiveException(ArchiveException.Kind.UNREADABLE, where + ": not a readable archive (the file is "
                    + "damaged or not a SQLite database: " + m + ")", e);
        }
        return new ArchiveException(ArchiveException.Kind.UNREADABLE, where + ": archive not usable (" + m + ")", e);
    }

    static void autoCommit(Connection c) {
        try {
            c.setAutoCommit(true);
        } catch (SQLException ignored) {
            // a broken connection shows itself on the next statement
        }
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // closing after a failure: the failure is what the user needs to see
        }
    }

    /** For messages: the archive's place. */
    public String where() {
        return where;
    }

    /** The plans of {@code sampleName}, newest last. */
    public Optional<ArchivedPlan> latestPlan(String sampleName) {
        List<ArchivedPlan> p = plans(new FitQuery(List.of(), sampleName, true));
        return p.isEmpty() ? Optional.empty() : Optional.of(p.get(p.size() - 1));
    }
}
