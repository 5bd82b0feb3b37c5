package org.variset.archive.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Assumptions;
import org.variset.archive.server.ServerAddress;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;

/**
 * Fresh, empty archives for tests, on the database the run is testing. By default that is H2 in memory; with
 * {@code -Dvariset.test.db=postgresql} (the Maven executions named {@code postgresql}) it is a new schema of a real
 * PostgreSQL server, {@code postgresql://127.0.0.1:5432/test} unless {@code VARISET_TEST_POSTGRES} names another.
 *
 * <p>When that server does not answer, the tests that need it are skipped, and one line on standard error says so,
 * unless {@code -Dvariset.test.requirePostgres=true} (set by {@code .ci/run}), which makes them fail instead.
 * Schemas are named after the test process and dropped when it ends, and those of test processes that are gone are
 * dropped when the next one starts.
 */
public final class TestArchives {
    /** The system property that names the database under test: {@code h2} (the default) or {@code postgresql}. */
    public static final String DB_PROPERTY = "variset.test.db";
    /** The system property that turns a skip for want of PostgreSQL into a failure. */
    public static final String REQUIRE_PROPERTY = "variset.test.requirePostgres";
    /** The environment variable naming the PostgreSQL server for tests. */
    public static final String SERVER_ENV = "VARISET_TEST_POSTGRES";

    private static final String DEFAULT_SERVER = "postgresql://127.0.0.1:5432/test";
    private static final String PREFIX = "vt_" + ProcessHandle.current().pid() + "_";
    private static final AtomicInteger SCHEMAS = new AtomicInteger();
    private static final List<String> MADE = new ArrayList<>();
    private static volatile String unreachable;
    private static volatile boolean checked;

    private TestArchives() {}

    /** True when this run tests PostgreSQL. */
    public static boolean onPostgres() {
        return "postgresql".equalsIgnoreCase(System.getProperty(DB_PROPERTY, "h2"));
    }

    /**
     * A new, empty archive on the database under test (H2 in memory, or a new PostgreSQL schema). The migrations run
     * once per test process, into a template; each archive is a copy of it (same SQL, same history), which saves the
     * few hundred milliseconds Flyway takes for each of hundreds of archives.
     */
    public static Archive fresh() {
        return onPostgres() ? freshOnPostgres() : Archive.inMemoryFrom(h2Template());
    }

    private static volatile String h2Template;
    private static ServerAddress pgTemplate;

    /** The script of an empty archive migrated once in this process. */
    private static String h2Template() {
        if (h2Template == null) {
            synchronized (TestArchives.class) {
                if (h2Template == null) {
                    try (Archive a = Archive.inMemory()) {
                        h2Template = a.script();
                    }
                }
            }
        }
        return h2Template;
    }

    /** The name of the database under test, for messages and test names. */
    public static String engine() {
        return onPostgres() ? "PostgreSQL" : "H2";
    }

    /**
     * A new, empty archive in a new schema of the test server, whatever the run tests; skipped (or failed, when
     * required) when the server does not answer.
     */
    public static Archive freshOnPostgres() {
        return Archive.openServer(migratedSchema(), indexDir(), true, ArchiveLock.DEFAULT_WAIT);
    }

    /**
     * A new schema with an empty archive's tables: the migration scripts the template schema ran (by Flyway, once
     * per process), run again as they are (its Java steps only rewrite rows, and there are none), and the template's migration history copied, so that Flyway finds the
     * schema current.
     */
    private static ServerAddress migratedSchema() {
        ServerAddress template;
        synchronized (TestArchives.class) {
            if (pgTemplate == null) {
                ServerAddress t = newSchema();
                Archive.openServer(t, indexDir(), true, ArchiveLock.DEFAULT_WAIT)
                        .close();
                pgTemplate = t;
            }
            template = pgTemplate;
        }
        ServerAddress a = newSchema();
        try (Connection c = connect(a);
                Statement s = c.createStatement()) {
            List<String> scripts = new ArrayList<>();
            try (ResultSet rs = s.executeQuery("SELECT script FROM " + template.schema() + ".flyway_schema_history"
                    + " WHERE success AND version IS NOT NULL ORDER BY installed_rank")) {
                while (rs.next()) {
                    scripts.add(rs.getString(1));
                }
            }
            s.execute("SET search_path TO " + a.schema());
            for (String script : scripts) {
                if (!script.endsWith(".sql")) {
                    continue; // a Java step (db.migration.V5__...) rewrites rows; an empty archive has none
                }
                try (var in = TestArchives.class.getResourceAsStream("/db/migration/" + script)) {
                    s.execute(new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8));
                }
            }
            s.execute("CREATE TABLE flyway_schema_history (LIKE " + template.schema()
                    + ".flyway_schema_history INCLUDING ALL)");
            s.execute(
                    "INSERT INTO flyway_schema_history SELECT * FROM " + template.schema() + ".flyway_schema_history");
        } catch (SQLException | IOException e) {
            throw new IllegalStateException("cannot copy the test schema " + template + ": " + e.getMessage(), e);
        }
        return a;
    }

    /** The address of a new, empty schema on the test server (no tables yet). */
    public static ServerAddress newSchema() {
        ServerAddress base = server();
        requireServer(base);
        String schema = PREFIX + SCHEMAS.incrementAndGet();
        try (Connection c = connect(base);
                Statement s = c.createStatement()) {
            s.execute("CREATE SCHEMA " + schema);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a test schema on " + base + ": " + e.getMessage(), e);
        }
        synchronized (MADE) {
            MADE.add(schema);
        }
        return new ServerAddress(base.host(), base.port(), base.database(), schema, base.user(), base.password());
    }

    /** A URL for the command line naming a server schema ({@code --db}). */
    public static String url(ServerAddress a) {
        return "postgresql://" + a.user() + "@" + a.host() + ":" + a.port() + "/" + a.database()
                + (a.schema() == null ? "" : "?currentSchema=" + a.schema());
    }

    /** The test server, as {@code VARISET_TEST_POSTGRES} or the default names it. */
    public static ServerAddress server() {
        String url = System.getenv(SERVER_ENV);
        return ServerAddress.parse(
                url == null || url.isBlank() ? DEFAULT_SERVER : url,
                System.getenv(),
                Path.of(System.getProperty("user.home")));
    }

    /** A plain connection to a server (no archive), for test set-up. */
    public static Connection connect(ServerAddress a) throws SQLException {
        Properties p = new Properties();
        p.setProperty("user", a.user());
        if (a.password() != null) {
            p.setProperty("password", a.password());
        }
        return DriverManager.getConnection(a.jdbcUrl(), p);
    }

    /**
     * Runs statements with foreign keys unchecked, to make the damage a check must find: H2's
     * {@code REFERENTIAL_INTEGRITY}, PostgreSQL's {@code session_replication_role} (which needs a superuser).
     */
    public static void withoutForeignKeys(Connection c, String... statements) throws SQLException {
        boolean pg = org.variset.archive.changelog.ChangeLog.isShared(c);
        try (Statement s = c.createStatement()) {
            s.execute(pg ? "SET session_replication_role = replica" : "SET REFERENTIAL_INTEGRITY FALSE");
            try {
                for (String sql : statements) {
                    s.execute(sql);
                }
            } finally {
                s.execute(pg ? "SET session_replication_role = DEFAULT" : "SET REFERENTIAL_INTEGRITY TRUE");
            }
        }
    }

    private static Path indexDir() {
        try {
            return Files.createTempDirectory("variset-test-index");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Why the test server cannot be used, or null when it answers. Checked once per test process; says so on
     * standard error the first time it does not answer (unless a skip is not allowed).
     */
    static synchronized String unreachable() {
        ServerAddress a = server();
        try {
            requireServer(a);
            return null;
        } catch (org.opentest4j.TestAbortedException | AssertionError e) {
            return e.getMessage();
        }
    }

    /** Skips (or fails, when required) unless the server answers; drops leftovers of dead test processes once. */
    private static synchronized void requireServer(ServerAddress a) {
        if (!checked) {
            checked = true;
            try (Connection c = connect(a)) {
                dropLeftovers(c);
                Runtime.getRuntime().addShutdownHook(new Thread(TestArchives::dropOwn));
            } catch (SQLException e) {
                unreachable = e.getMessage();
                if (!Boolean.getBoolean(REQUIRE_PROPERTY)) {
                    System.err.println("[variset tests] PostgreSQL at " + a + " does not answer (" + e.getMessage()
                            + "): the tests on PostgreSQL are SKIPPED. Start a server, or set " + SERVER_ENV + ".");
                }
            }
        }
        if (unreachable != null) {
            String why = "PostgreSQL at " + a + " does not answer: " + unreachable;
            if (Boolean.getBoolean(REQUIRE_PROPERTY)) {
                throw new AssertionError(
                        why + " (and " + REQUIRE_PROPERTY + " is set, so this fails instead of " + "skipping)");
            }
            Assumptions.abort(why);
        }
    }

    private static void dropLeftovers(Connection c) throws SQLException {
        List<String> gone = new ArrayList<>();
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT nspname FROM pg_namespace WHERE nspname LIKE 'vt\\_%'")) {
            while (rs.next()) {
                String name = rs.getString(1);
                String[] parts = name.split("_");
                boolean alive = parts.length >= 3
                        && parts[1].chars().allMatch(Character::isDigit)
                        && ProcessHandle.of(Long.parseLong(parts[1])).isPresent();
                if (!alive) {
                    gone.add(name);
                }
            }
        }
        drop(c, gone);
    }

    private static void dropOwn() {
        List<String> own;
        synchronized (MADE) {
            own = new ArrayList<>(MADE);
        }
        try (Connection c = connect(server())) {
            drop(c, own);
        } catch (SQLException | RuntimeException e) {
            // Left for the next test process to drop.
        }
    }

    private static void drop(Connection c, List<String> schemas) throws SQLException {
        try (Statement s = c.createStatement()) {
            for (String name : schemas) {
                s.execute("DROP SCHEMA IF EXISTS " + name + " CASCADE");
            }
        }
    }
}
