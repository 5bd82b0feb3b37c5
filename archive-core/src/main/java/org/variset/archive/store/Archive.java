package org.variset.archive.store;

import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import java.util.function.Function;
import org.h2.jdbcx.JdbcDataSource;
import org.hibernate.Session;
import org.hibernate.SessionFactory;
import org.hibernate.StatelessSession;
import org.variset.archive.store.ArchiveException.Problem;

/**
 * An open archive. It holds one JDBC connection for its whole life, so the database file is opened once per
 * command; Hibernate is booted only on first use of {@link #sessionFactory()}.
 */
public final class Archive implements AutoCloseable {

    /** The database file's base name inside the archive folder ({@code archive.mv.db} on disk). */
    static final String DB_NAME = "archive";
    private static final int H2_DATABASE_IN_USE = 90020;
    private static final AtomicInteger MEMORY_IDS = new AtomicInteger();

    private final Path dir;
    private final JdbcDataSource dataSource;
    private final Connection keeper;
    private final SchemaVersion schema;
    private ArchiveLock lock;
    private SessionFactory sessionFactory;

    private Archive(Path dir, JdbcDataSource dataSource, Connection keeper, SchemaVersion schema) {
        this.dir = dir;
        this.dataSource = dataSource;
        this.keeper = keeper;
        this.schema = schema;
    }

    /** True when a folder holds an archive. */
    public static boolean existsAt(Path dir) {
        return Files.isRegularFile(dir.resolve(DB_NAME + ".mv.db"));
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
            createPrivateDirectories(dir);
        } catch (IOException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot create the archive folder " + dir + ": "
                    + e.getMessage(), e);
        }
        ArchiveLock lock = ArchiveLock.acquire(dir, ArchiveLock.DEFAULT_WAIT);
        try {
            Archive archive = connect(dir, url(dir, false));
            archive.lock = lock;
            restrictToOwner(dir.resolve(DB_NAME + ".mv.db"));
            return archive;
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /** Archive files are readable by their owner only; where the file system has no POSIX modes, left as is. */
    static void restrictToOwner(Path file) {
        try {
            if (Files.exists(file) && FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
                Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
            }
        } catch (IOException e) {
            throw new ArchiveException(Problem.DAMAGED, "Cannot restrict access to " + file + ": " + e.getMessage(),
                    e);
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
            throw new ArchiveException(Problem.MISSING, "No archive at " + dir + ". Create one with: variset "
                    + "--archive " + dir + " init");
        }
        ArchiveLock lock = ArchiveLock.acquire(dir, wait);
        try {
            Archive archive = connect(dir, url(dir, true));
            archive.lock = lock;
            return archive;
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /** A new, empty, migrated archive in memory, gone when closed (for tests and dry runs). */
    public static Archive inMemory() {
        return connect(null, "jdbc:h2:mem:variset-" + MEMORY_IDS.incrementAndGet());
    }

    /**
     * The JDBC URL of an archive's database. {@code WRITE_DELAY=0}: H2 writes each commit to the file before the
     * commit returns, instead of leaving it to a background writer; without it a process killed just after a commit
     * can come back with part of that transaction (seen in KillDuringImportIT), since H2's store has no redo log.
     */
    private static String url(Path dir, boolean mustExist) {
        return "jdbc:h2:file:" + dir.toAbsolutePath().resolve(DB_NAME) + ";WRITE_DELAY=0"
                + (mustExist ? ";IFEXISTS=TRUE" : "");
    }

    private static Archive connect(Path dir, String url) {
        JdbcDataSource ds = new JdbcDataSource();
        ds.setURL(url);
        Connection keeper;
        try {
            keeper = ds.getConnection();
        } catch (SQLException e) {
            throw openFailure(dir, e);
        }
        try {
            SchemaVersion version = SchemaVersion.read(keeper);
            if (version.version() > SchemaVersion.LATEST) {
                throw new ArchiveException(Problem.TOO_NEW, "The archive at " + dir + " has schema version "
                        + version.version() + ", newer than this Variset knows (" + SchemaVersion.LATEST
                        + "). Use a newer Variset; this one will not change the archive.");
            }
            if (version.behind()) {
                SchemaMigrator.migrate(ds, dir);
                version = SchemaVersion.read(keeper);
            }
            return new Archive(dir, ds, keeper, version);
        } catch (SQLException | RuntimeException e) {
            closeQuietly(keeper);
            if (e instanceof ArchiveException ae) {
                throw ae;
            }
            throw new ArchiveException(Problem.DAMAGED, "Cannot read the archive at " + dir + ": " + e.getMessage()
                    + ". Run 'variset check' for details.", e);
        }
    }

    private static ArchiveException openFailure(Path dir, SQLException e) {
        if (e.getErrorCode() == H2_DATABASE_IN_USE) {
            return new ArchiveException(Problem.IN_USE, "The archive at " + dir + " is in use by another Variset "
                    + "process. Wait for it to finish and try again.", e);
        }
        return new ArchiveException(Problem.DAMAGED, "Cannot open the archive at " + dir + ": "
                + e.getMessage(), e);
    }

    static void createPrivateDirectories(Path dir) throws IOException {
        if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix")) {
            Files.createDirectories(dir, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString(
                    "rwx------")));
        } else {
            Files.createDirectories(dir);
        }
    }

    /** The archive folder, or null for an archive in memory. */
    public Path dir() {
        return dir;
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

    /** Hibernate's session factory, booted on first call. */
    public synchronized SessionFactory sessionFactory() {
        if (sessionFactory == null) {
            sessionFactory = OrmBootstrap.build(dataSource);
        }
        return sessionFactory;
    }

    /** Runs work in one transaction: committed when it returns, rolled back when it throws. */
    public <T> T fromTransaction(Function<Session, T> work) {
        return sessionFactory().fromTransaction(work);
    }

    /** Runs work in one transaction: committed when it returns, rolled back when it throws. */
    public void inTransaction(Consumer<Session> work) {
        sessionFactory().inTransaction(work);
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
