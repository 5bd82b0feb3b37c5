package org.variset.archive.store;

import java.io.IOException;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.Function;
import javax.sql.DataSource;
import org.h2.jdbcx.JdbcDataSource;
import org.hibernate.Session;
import org.hibernate.SessionFactory;
import org.hibernate.StatelessSession;
import org.variset.archive.location.ArchiveLocation;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.ArchiveException.Problem;
import org.variset.archive.problem.Remedy;
import org.variset.archive.schema.SchemaMigrator;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.server.ServerAddress;
import org.variset.archive.server.ServerConnection;

/**
 * An open archive: embedded (an H2 database in a folder, the default) or shared (a PostgreSQL server, see
 * {@link ServerAddress}). It holds one JDBC connection for its whole life, so the database is opened once per
 * command; Hibernate is booted only on first use of {@link #sessionFactory()}.
 *
 * <p>An embedded archive is used by one process at a time (a lock file in its folder). A shared one is used by many
 * clients at once: the database's transactions keep them apart, and writers take turns ({@link #takeWriterTurn}).
 * Each client keeps its own search index, under a folder of its cache that the archive is given.
 */
public final class Archive implements AutoCloseable {

    private static final int H2_DATABASE_IN_USE = 90020;
    private static final AtomicInteger MEMORY_IDS = new AtomicInteger();

    /**
     * The key of the PostgreSQL advisory lock that writers hold for their transaction, so that two clients never
     * write at once (two imports adding the same setter, say); readers never wait for it. Any number: it only has to
     * be the same in every Variset ("VARI" in ASCII).
     */
    private static final long WRITER_LOCK = 0x5641_5249L;

    private final Path dir;
    private final ServerAddress server;
    private final Path indexDir;
    private final DataSource dataSource;
    private final Connection keeper;
    private final SchemaVersion schema;
    private ArchiveLock lock;
    private SessionFactory sessionFactory;
    /** True when this open made the archive's tables (a new archive). */
    private boolean created;

    private Archive(
            Path dir,
            ServerAddress server,
            Path indexDir,
            DataSource dataSource,
            Connection keeper,
            SchemaVersion schema) {
        this.dir = dir;
        this.server = server;
        this.indexDir = indexDir;
        this.dataSource = dataSource;
        this.keeper = keeper;
        this.schema = schema;
    }

    /** True when a folder holds an archive. */
    public static boolean existsAt(Path dir) {
        return ArchiveFolder.holdsArchive(dir);
    }

    /**
     * Creates a new archive in a folder (created if needed, readable by its owner only).
     *
     * @throws ArchiveException when an archive is already there
     */
    public static Archive create(Path dir) {
        if (existsAt(dir)) {
            throw new ArchiveException(Problem.EXISTS, "There is already an archive at " + dir + ".");
        }
        try {
            ArchiveFolder.createPrivate(dir);
        } catch (IOException e) {
            throw new ArchiveException(
                    Problem.DAMAGED, "Cannot create the archive folder " + dir + ": " + e.getMessage(), e);
        }
        ArchiveLock lock = ArchiveLock.acquire(dir, ArchiveLock.DEFAULT_WAIT);
        try {
            Archive archive = connect(dir, h2(url(dir, false)));
            archive.lock = lock;
            ArchiveFolder.restrictToOwner(dir.resolve(ArchiveFolder.DATABASE_FILE));
            return archive;
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /**
     * Opens the archive in a folder, migrating its schema when it is behind.
     *
     * @throws ArchiveException when there is none, it is in use, or it is newer than this code
     */
    public static Archive open(Path dir) {
        return open(dir, ArchiveLock.DEFAULT_WAIT);
    }

    /**
     * Opens the archive in a folder, waiting up to {@code wait} when another process is using it.
     *
     * @throws ArchiveException when there is none, it stays in use, or it is newer than this code
     */
    public static Archive open(Path dir, java.time.Duration wait) {
        if (!existsAt(dir)) {
            throw new ArchiveException(
                    Problem.MISSING,
                    "No archive at " + dir,
                    Remedy.of(Remedy.Kind.CREATE_ARCHIVE, "where", dir.toString(), "shared", "false"),
                    null);
        }
        ArchiveLock lock = ArchiveLock.acquire(dir, wait);
        try {
            Archive archive = connect(dir, h2(url(dir, true)));
            archive.lock = lock;
            return archive;
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /**
     * Opens the archive a location names: embedded, or shared on a server (which must already hold an archive).
     *
     * @throws ArchiveException when there is none, it stays in use, the server cannot be reached, or it is newer
     *     than this code
     */
    public static Archive open(ArchiveLocation where, java.time.Duration wait) {
        return where.shared() ? openServer(where.server(), where.clientDir(), false, wait) : open(where.dir(), wait);
    }

    /** A new, empty, migrated archive in memory, gone when closed (for tests and dry runs). */
    public static Archive inMemory() {
        return connect(null, h2("jdbc:h2:mem:variset-" + MEMORY_IDS.incrementAndGet()));
    }

    /**
     * A new archive in memory made from a script of another ({@link #script()}), gone when closed: the same schema
     * and rows without running the migrations again (tests make hundreds). It gets an identity of its own.
     *
     * @throws ArchiveException when the script cannot be run
     */
    public static Archive inMemoryFrom(String script) {
        JdbcDataSource ds = h2("jdbc:h2:mem:variset-" + MEMORY_IDS.incrementAndGet());
        Connection keeper;
        try {
            keeper = ds.getConnection();
            org.h2.tools.RunScript.execute(keeper, new java.io.StringReader(script));
            try (java.sql.Statement st = keeper.createStatement()) {
                st.execute("DELETE FROM archive_info WHERE info_key = 'identity'");
            }
        } catch (SQLException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot copy an archive into memory: " + e.getMessage(), e);
        }
        return connect(null, null, null, ds, keeper);
    }

    /**
     * The whole database of an embedded or in-memory archive as an SQL script (H2's {@code SCRIPT}), for
     * {@link #inMemoryFrom}.
     *
     * @throws ArchiveException on a shared archive, or when the database cannot be read
     */
    public String script() {
        if (server != null) {
            throw new ArchiveException(Problem.DAMAGED, "A shared archive's server writes its own dumps (pg_dump).");
        }
        StringBuilder b = new StringBuilder();
        try (java.sql.Statement st = keeper.createStatement();
                java.sql.ResultSet rs = st.executeQuery("SCRIPT")) {
            while (rs.next()) {
                b.append(rs.getString(1)).append('\n');
            }
        } catch (SQLException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot script the archive: " + e.getMessage(), e);
        }
        return b.toString();
    }

    /**
     * Opens the shared archive on a PostgreSQL server. This client's own files (its search index, in {@code index})
     * live in {@code clientDir}, whose lock keeps two processes of this client from using them at once.
     *
     * @param create true to make the archive's tables when the database (or schema) has none yet ({@code init});
     *     false to refuse such a database, saying how to make one
     * @throws ArchiveException when the server cannot be reached, the database holds no archive (and
     *     {@code create} is false), or its schema is newer than this code
     */
    public static Archive openServer(ServerAddress address, Path clientDir, boolean create, java.time.Duration wait) {
        ServerConnection.Opened opened = ServerConnection.open(address, create);
        Connection probe = opened.connection();
        ArchiveLock clientLock;
        try {
            ArchiveFolder.createPrivate(clientDir);
            clientLock = ArchiveLock.acquire(
                    clientDir, wait, "This client's search index of " + address.shown() + " (in " + clientDir + ")");
        } catch (IOException e) {
            closeQuietly(probe);
            throw new ArchiveException(
                    Problem.DAMAGED, "Cannot create this client's folder " + clientDir + ": " + e.getMessage(), e);
        } catch (RuntimeException e) {
            closeQuietly(probe);
            throw e;
        }
        try {
            Archive archive = connect(null, address, clientDir.resolve("index"), opened.dataSource(), probe);
            archive.lock = clientLock;
            return archive;
        } catch (RuntimeException e) {
            clientLock.close();
            throw e;
        }
    }

    private static JdbcDataSource h2(String url) {
        JdbcDataSource ds = new JdbcDataSource();
        ds.setURL(url);
        return ds;
    }

    /**
     * The JDBC URL of an archive's database. {@code WRITE_DELAY=0}: H2 writes each commit to the file before the
     * commit returns, instead of leaving it to a background writer; without it a process killed just after a commit
     * can come back with part of that transaction (seen in KillDuringImportIT), since H2's store has no redo log.
     */
    private static String url(Path dir, boolean mustExist) {
        return "jdbc:h2:file:" + dir.toAbsolutePath().resolve(ArchiveFolder.DB_NAME) + ";WRITE_DELAY=0"
                + (mustExist ? ";IFEXISTS=TRUE" : "");
    }

    private static Archive connect(Path dir, JdbcDataSource ds) {
        Connection keeper;
        try {
            keeper = ds.getConnection();
        } catch (SQLException e) {
            throw openFailure(dir, e);
        }
        return connect(dir, null, dir == null ? null : dir.resolve("index"), ds, keeper);
    }

    private static Archive connect(Path dir, ServerAddress server, Path indexDir, DataSource ds, Connection keeper) {
        Object where = server != null ? server.shown() : dir;
        try {
            SchemaVersion version = SchemaVersion.read(keeper);
            if (version.version() > SchemaVersion.LATEST) {
                throw new ArchiveException(
                        Problem.TOO_NEW,
                        "The archive at " + where + " has schema version "
                                + version.version() + ", newer than this Variset knows (" + SchemaVersion.LATEST
                                + "). Use a newer Variset; this one will not change the archive.");
            }
            boolean empty = version.version() == 0;
            if (version.behind()) {
                SchemaMigrator.migrate(ds, where);
                version = SchemaVersion.read(keeper);
            }
            SchemaVersion.ensureIdentity(keeper);
            Archive archive = new Archive(dir, server, indexDir, ds, keeper, version);
            archive.created = empty;
            return archive;
        } catch (SQLException | RuntimeException e) {
            closeQuietly(keeper);
            if (e instanceof ArchiveException ae) {
                throw ae;
            }
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "Cannot read the archive at " + where + ": " + e.getMessage(),
                    Remedy.of(Remedy.Kind.CHECK_ARCHIVE),
                    e);
        }
    }

    private static ArchiveException openFailure(Path dir, SQLException e) {
        if (e.getErrorCode() == H2_DATABASE_IN_USE) {
            return new ArchiveException(
                    Problem.IN_USE,
                    "The archive at " + dir + " is in use by another Variset "
                            + "process. Wait for it to finish and try again.",
                    e);
        }
        return new ArchiveException(Problem.DAMAGED, "Cannot open the archive at " + dir + ": " + e.getMessage(), e);
    }

    /** The archive folder, or null for an archive in memory or on a server. */
    public Path dir() {
        return dir;
    }

    /** True when opening this archive made its tables: it is new. */
    public boolean wasCreated() {
        return created;
    }

    /** The server of a shared archive, or null for an embedded one. */
    public ServerAddress server() {
        return server;
    }

    /** True for a shared archive on a PostgreSQL server. */
    public boolean shared() {
        return server != null;
    }

    /**
     * The folder of this client's search index: the archive folder's {@code index}, the folder a shared archive was
     * opened with, or null for an archive in memory.
     */
    public Path indexDir() {
        return indexDir;
    }

    /** Where the archive is, for messages: its folder or its server address (never a password). */
    public String describe() {
        return server != null ? server.shown() : dir != null ? dir.toString() : "(memory)";
    }

    /**
     * Says what this process is doing with the archive, for another process that finds it in use (an embedded
     * archive's lock file); a shared archive has no lock, so nothing is written.
     */
    public synchronized void describeUse(String doing) {
        if (lock != null) {
            lock.describe(doing);
        }
    }

    /** The data source of the archive's database (each connection from it is new; close it when done). */
    public DataSource dataSource() {
        return dataSource;
    }

    /**
     * Waits for this client's turn to write, until the session's transaction ends. On a shared archive this takes a
     * PostgreSQL transaction-level advisory lock, so that writers of several clients take turns; an embedded
     * archive's lock file already lets one process at a time in, so there it does nothing.
     */
    public void takeWriterTurn(Session s) {
        if (server != null) {
            s.doWork(this::takeWriterTurn);
        }
    }

    /** As {@link #takeWriterTurn(Session)}, for plain JDBC work in a transaction of one of this archive's connections. */
    public void takeWriterTurn(Connection c) throws SQLException {
        if (server != null) {
            try (java.sql.Statement st = c.createStatement()) {
                st.execute("SELECT pg_advisory_xact_lock(" + WRITER_LOCK + ")");
            }
        }
    }

    /** The schema version the archive had once opened (after any migration). */
    public SchemaVersion schemaVersion() {
        return schema;
    }

    /** The connection held for the archive's life, for plain read-only queries; do not close it. */
    public Connection connection() {
        return keeper;
    }

    /** Counts of what the archive holds, read with plain JDBC (no Hibernate boot). */
    public ArchiveStats stats() {
        try {
            return ArchiveStats.read(keeper, schema.version());
        } catch (SQLException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot read the archive: " + e.getMessage(), e);
        }
    }

    /** The database engine and version, as the driver reports them. */
    DatabaseEngine engine() {
        try {
            return DatabaseEngine.of(keeper);
        } catch (SQLException e) {
            throw new ArchiveException(
                    Problem.DAMAGED, "Cannot read the archive's database version: " + e.getMessage(), e);
        }
    }

    /** Hibernate's session factory, booted on first call. */
    public synchronized SessionFactory sessionFactory() {
        if (sessionFactory == null) {
            sessionFactory = OrmBootstrap.build(dataSource, engine());
        }
        return sessionFactory;
    }

    /**
     * Runs work in one transaction: committed when it returns, rolled back when it throws. On a shared archive the
     * transaction first waits for its turn among writers ({@link #takeWriterTurn}).
     */
    public <T> T fromTransaction(Function<Session, T> work) {
        return sessionFactory().fromTransaction(s -> {
            takeWriterTurn(s);
            return work.apply(s);
        });
    }

    /**
     * Runs writes in one transaction, for the layers above the archive: committed when the work returns, rolled back
     * when it throws; on a shared archive it first waits for its turn among writers.
     */
    public <T> T write(Function<Transaction, T> work) {
        return fromTransaction(s -> work.apply(new Transaction(s, this)));
    }

    /** As {@link #fromTransaction}, for work that returns nothing. */
    public void inTransaction(Consumer<Session> work) {
        fromTransaction(s -> {
            work.accept(s);
            return null;
        });
    }

    /** Runs bulk work in one stateless-session transaction. */
    public <T> T inStatelessTransaction(Function<StatelessSession, T> work) {
        return sessionFactory().fromStatelessTransaction(work);
    }

    @Override
    public synchronized void close() {
        if (sessionFactory != null) {
            sessionFactory.close();
            sessionFactory = null;
        }
        closeQuietly(keeper);
        if (lock != null) {
            lock.close();
            lock = null;
        }
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // Closing is best effort: the database file is consistent after every commit.
        }
    }
}
