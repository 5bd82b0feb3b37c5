package org.variset.archive.server;

import java.sql.Connection;
import java.sql.SQLException;
import javax.sql.DataSource;
import org.postgresql.ds.PGSimpleDataSource;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.ArchiveException.Problem;
import org.variset.archive.problem.Remedy;
import org.variset.archive.schema.SchemaVersion;

/** The first connection to a shared archive's server, made only once the server is known to be able to hold one. */
public final class ServerConnection {
    /**
     * The oldest PostgreSQL a shared archive runs on: 14. Hibernate 7.4's PostgreSQL dialect supports 14 and later
     * (its {@code PostgreSQLDialect.MINIMUM_VERSION}); the change log needs {@code pg_current_xact_id()}, from 13.
     */
    public static final int MIN_POSTGRESQL = 14;

    private ServerConnection() {}

    /**
     * A connection to the server and the data source it came from.
     *
     * @param dataSource where further connections come from
     * @param connection the first connection, checked
     */
    public record Opened(DataSource dataSource, Connection connection) {}

    /**
     * Connects and checks the server.
     *
     * @param create true when a database (or schema) without an archive's tables is welcome ({@code init})
     * @throws ArchiveException when the server cannot be reached, runs a PostgreSQL older than {@link #MIN_POSTGRESQL},
     *     or (unless {@code create}) holds no archive
     */
    public static Opened open(ServerAddress address, boolean create) {
        PGSimpleDataSource ds = new PGSimpleDataSource();
        ds.setURL(address.jdbcUrl());
        ds.setUser(address.user());
        if (address.password() != null) {
            ds.setPassword(address.password());
        }
        Connection c;
        try {
            c = ds.getConnection();
        } catch (SQLException e) {
            String why = String.valueOf(e.getMessage()).replaceAll("\\.+$", "");
            throw new ArchiveException(
                    Problem.MISSING,
                    "Cannot connect to the archive at " + address.shown() + ": " + why + ". Check the address, that "
                            + "the server is running, and the user's password (PGPASSWORD or ~/.pgpass).",
                    e);
        }
        try {
            check(address, c, create);
            return new Opened(ds, c);
        } catch (SQLException e) {
            closeQuietly(c);
            throw new ArchiveException(
                    Problem.DAMAGED, "Cannot read the archive at " + address.shown() + ": " + e.getMessage(), e);
        } catch (RuntimeException e) {
            closeQuietly(c);
            throw e;
        }
    }

    private static void check(ServerAddress address, Connection c, boolean create) throws SQLException {
        int major = c.getMetaData().getDatabaseMajorVersion();
        if (major < MIN_POSTGRESQL) {
            throw new ArchiveException(
                    Problem.DAMAGED,
                    "The server at " + address.shown() + " runs PostgreSQL " + major + "; a shared archive needs "
                            + "PostgreSQL " + MIN_POSTGRESQL + " or later (the oldest Hibernate 7.4 supports)");
        }
        if (!create && SchemaVersion.read(c).version() == 0) {
            throw new ArchiveException(
                    Problem.MISSING,
                    "The database at " + address.shown() + " holds no Variset archive",
                    Remedy.of(Remedy.Kind.CREATE_ARCHIVE, "where", address.shown(), "shared", "true"),
                    null);
        }
    }

    private static void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException ignored) {
            // Closing a connection that failed its check: nothing was written on it.
        }
    }
}
